import { ChemError, Composition, conductivityAt, scaleComposition, solvePh, speciate } from '../../../src/chem';
import { createLibrary, defaultLibrary, findForm } from '../../../src/chem/library';
import { RecipeInput, RecipePlan, formatRecipe, planRecipe } from '../../../src/chem/planner';
import { volumeText } from '../../../src/chem/planner/protocol';

/** Warnings are compared by code (and field), never by message text. */
const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);
const texts = (ws: readonly { message: string }[]) => ws.map((w) => w.message);

/** The bar for round trips: a recipe's own printed numbers solve back to the target within 0.001 pH (a tenth of a bench meter's 0.01 resolution). */
const ROUND_TRIP_PH = 0.001;

/**
 * Rebuilds the solution from the printed amounts alone (grams → mol/L with the molar mass
 * and purity; titrant mL × stock M), the way a colleague checking the sheet would.
 */
function fromAmounts(plan: RecipePlan, madeVolumeMl: number): Composition {
  const items = plan.components
    .filter((c) => c.grams !== undefined)
    .map((c) => ({ form: c.name, concentrationM: (c.grams! * (c.purityPercent! / 100)) / c.molarMass! / (madeVolumeMl / 1000) }));
  if (plan.titration) {
    items.push({ form: plan.titration.titrant, concentrationM: (plan.titration.volumeMl * plan.titration.stockM) / madeVolumeMl });
  }
  return defaultLibrary().compositionFromForms(items, { temperatureC: plan.predictions.useTemperatureC, activityModel: plan.activityModel });
}

const RECIPES: [string, RecipeInput][] = [
  [
    'cold-room HEPES saline, NaOH, adjusted at 22 °C',
    {
      buffer: 'HEPES',
      targetPh: 7.4,
      useTemperatureC: 4,
      benchTemperatureC: 22,
      concentrationMm: 25,
      volumeMl: 500,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      salts: [{ form: 'NaCl', concentrationMm: 150 }],
    },
  ],
  ['gel tris with 6 M HCl at 25 °C', { buffer: 'tris', targetPh: 8.3, concentrationMm: 50, volumeMl: 1000, form: 'tris base', titrant: { form: 'HCl', concentrationM: 6 } }],
  [
    'acetate from sodium acetate trihydrate with 1 M HCl, 90 % part volume',
    {
      buffer: 'acetate',
      targetPh: 4.8,
      concentrationMm: 100,
      volumeMl: 250,
      form: 'sodium acetate trihydrate',
      titrant: { form: 'HCl', concentrationM: 1 },
      partVolumeFraction: 0.9,
    },
  ],
  [
    'MES with 5 M NaOH at 37 °C, 98 % pure',
    {
      buffer: 'MES',
      targetPh: 6.1,
      useTemperatureC: 37,
      benchTemperatureC: 20,
      concentrationMm: 20,
      volumeMl: 2000,
      form: 'MES free acid',
      titrant: { form: 'NaOH', concentrationM: 5 },
      purityPercent: { 'MES free acid': 98 },
    },
  ],
  [
    'tris base titrated with glacial-acid dilution (weak titrant: 1 M acetic acid)',
    { buffer: 'tris', targetPh: 7.8, concentrationMm: 40, volumeMl: 500, form: 'tris base', titrant: { form: 'acetic acid', concentrationM: 1 } },
  ],
  [
    'phosphate two forms, monohydrate and heptahydrate',
    { buffer: 'phosphate', targetPh: 7.0, concentrationMm: 100, volumeMl: 1000, route: 'two-forms', acidForm: 'NaH2PO4·H2O', baseForm: 'Na2HPO4·7H2O' },
  ],
  [
    'tris two forms (base and hydrochloride), at 4 °C',
    { buffer: 'tris', targetPh: 7.5, useTemperatureC: 4, concentrationMm: 20, volumeMl: 500, route: 'two-forms', acidForm: 'tris HCl', baseForm: 'tris base' },
  ],
  [
    'HEPES with NaCl to an ideal osmolarity of 290 mOsm/L',
    {
      buffer: 'HEPES',
      targetPh: 7.2,
      concentrationMm: 10,
      volumeMl: 1000,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      saltTarget: { form: 'NaCl', idealOsmolarityMosm: 290 },
    },
  ],
];

describe('recipe planner: round trips (within 0.001 pH)', () => {
  it.each(RECIPES)('%s: the finished buffer gives the target at the temperature of use', (_label, input) => {
    const plan = planRecipe(input);
    expect(Math.abs(solvePh(plan.composition) - plan.targetPh)).toBeLessThan(ROUND_TRIP_PH);
    expect(Math.abs(plan.predictions.pHAtUse - plan.targetPh)).toBeLessThan(ROUND_TRIP_PH);
  });

  it.each(RECIPES)('%s: the printed grams and mL solve back to the target and to the meter reading', (_label, input) => {
    const plan = planRecipe(input);
    const made = fromAmounts(plan, plan.volumeMl);
    expect(Math.abs(solvePh(made) - plan.targetPh)).toBeLessThan(ROUND_TRIP_PH);
    const atBench = { ...scaleComposition(made, 1 / plan.meter.partVolumeFraction), temperatureC: plan.meter.benchTemperatureC };
    expect(Math.abs(solvePh(atBench) - plan.meter.pH)).toBeLessThan(ROUND_TRIP_PH);
  });

  it('stock route: the printed stock amounts, diluted by the fold, give the target; the stock meter reading solves back', () => {
    const plan = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.4,
      concentrationMm: 50,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 10, volumeMl: 500 },
      form: 'NaH2PO4·H2O',
      titrant: { form: 'NaOH', concentrationM: 5 },
    });
    const stock = fromAmounts(plan, plan.stock!.stockVolumeMl);
    expect(Math.abs(solvePh(scaleComposition(stock, 0.1)) - 7.4)).toBeLessThan(ROUND_TRIP_PH);
    const atBench = { ...scaleComposition(stock, 1 / plan.meter.partVolumeFraction), temperatureC: plan.meter.benchTemperatureC };
    expect(Math.abs(solvePh(atBench) - plan.meter.pH)).toBeLessThan(ROUND_TRIP_PH);
    expect(plan.stock!.stockPerBatchMl).toBeCloseTo(100, 10);
    expect(plan.stock!.waterPerBatchMl).toBeCloseTo(900, 10);
  });

  it('stock route with the default Pitzer model: a 10× saline phosphate stock is adjusted to a meter reading several tenths below the 1× target (common practice: 10× stocks read 0.2–0.6 lower)', () => {
    const input: RecipeInput = {
      buffer: 'phosphate',
      targetPh: 7.4,
      concentrationMm: 11.8,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 10, volumeMl: 500 },
      form: 'NaH2PO4·H2O',
      titrant: { form: 'NaOH', concentrationM: 5 },
      salts: [
        { form: 'NaCl', concentrationMm: 137 },
        { form: 'KCl', concentrationMm: 2.7 },
      ],
      partVolumeFraction: 1,
    };
    const stock = planRecipe(input);
    const shift = stock.meter.pH - 7.4;
    expect(shift).toBeLessThan(-0.2);
    expect(shift).toBeGreaterThan(-0.6);
    expect(codes(stock.warnings)).not.toContain('beyondActivityModel');
    expect(codes(stock.warnings)).not.toContain('beyondPitzerRange');
    // Davies put the stock above the target, the wrong way.
    expect(planRecipe({ ...input, activityModel: 'davies' }).meter.pH).toBeGreaterThan(7.4);
  });

  it('stock route: a concentrated HEPES stock warns that HEPES has no Pitzer parameters, for the meter reading', () => {
    const plan = planRecipe({
      buffer: 'HEPES',
      targetPh: 7.4,
      concentrationMm: 200,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 10, volumeMl: 500 },
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 10 },
    });
    expect(plan.warnings).toContainEqual(
      expect.objectContaining({ code: 'pitzerFallback', message: expect.stringMatching(/^Stock \(10×\) at the meter: Ions without published Pitzer parameters \(HEPES\)/) }),
    );
    expect(
      codes(planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 20, volumeMl: 1000, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } }).warnings),
    ).not.toContain('pitzerFallback');
  });

  it('salt target: the finished buffer has the asked ideal osmolarity within 0.01 mOsm/L', () => {
    const plan = planRecipe(RECIPES[7][1]);
    expect(Math.abs(plan.predictions.idealOsmolarityMosm - 290)).toBeLessThan(0.01);
    expect(plan.components.some((c) => c.name === 'sodium chloride' && c.grams! > 7)).toBe(true);
  });

  it('salt target by osmolality: HEPES saline to 290 mOsm/kg on the osmometer, within 0.01 mOsm/kg, needing more NaCl than the same ideal osmolarity', () => {
    const input = {
      buffer: 'HEPES',
      targetPh: 7.2,
      concentrationMm: 10,
      volumeMl: 1000,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      saltTarget: { form: 'NaCl', osmolalityMosmKg: 290 },
    };
    const plan = planRecipe(input);
    expect(Math.abs(plan.predictions.osmolalityMosmKg - 290)).toBeLessThan(0.01);
    const grams = (p: typeof plan) => p.components.find((c) => c.name === 'sodium chloride')!.grams!;
    expect(grams(plan)).toBeGreaterThan(grams(planRecipe(RECIPES[7][1])));
    expect(formatRecipe(plan)).toMatch(/osmolality +290 mOsm\/kg/);
  });

  it('salt target by ionic strength: 0.15 M reached within 1e-6 M', () => {
    const plan = planRecipe({
      buffer: 'MOPS',
      targetPh: 7.2,
      concentrationMm: 20,
      volumeMl: 1000,
      form: 'MOPS free acid',
      titrant: { form: 'KOH', concentrationM: 1 },
      saltTarget: { form: 'KCl', ionicStrengthM: 0.15 },
    });
    expect(Math.abs(plan.predictions.ionicStrengthM - 0.15)).toBeLessThan(1e-6);
  });
});

describe('recipe planner: routes agree', () => {
  it('route 1 (tris base + HCl) and route 2 (tris base + tris HCl) give the same final composition', () => {
    const common = { buffer: 'tris', targetPh: 7.6, useTemperatureC: 20, concentrationMm: 50, volumeMl: 1000 } as const;
    const one = planRecipe({ ...common, form: 'tris base', titrant: { form: 'HCl', concentrationM: 1 } }).composition;
    const two = planRecipe({ ...common, route: 'two-forms', acidForm: 'tris HCl', baseForm: 'tris base' }).composition;
    const tris = (c: Composition) => c.systems.filter((s) => s.name === 'tris').reduce((a, s) => a + s.totalM, 0);
    const chloride = (c: Composition) =>
      Object.entries(c.strongIons ?? {})
        .filter(([k]) => k === 'Cl-')
        .reduce((a, [, v]) => a + v, 0);
    expect(Math.abs(tris(one) - tris(two))).toBeLessThan(1e-12);
    expect(Math.abs(chloride(one) - chloride(two)) / chloride(one)).toBeLessThan(1e-9);
  });

  it('ideal model, equal acid and base forms: the mole-ratio Henderson–Hasselbalch answer (pH = pKa gives a 1:1 split within 0.1 %)', () => {
    // At 100 mM and pH near 7, [H+] and [OH−] are ~1e-7 M: re-equilibration is negligible, as HH assumes.
    const plan = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.198,
      concentrationMm: 100,
      volumeMl: 1000,
      route: 'two-forms',
      acidForm: 'NaH2PO4',
      baseForm: 'Na2HPO4',
      activityModel: 'ideal',
    });
    const acid = plan.components.find((c) => c.role === 'acid form')!.concentrationMm!;
    const base = plan.components.find((c) => c.role === 'base form')!.concentrationMm!;
    expect(Math.abs(base / acid - 1)).toBeLessThan(1e-3);
  });

  it('ideal model at pH = pKa + 0.5: base/acid = 10^0.5 within 0.1 % (Henderson–Hasselbalch)', () => {
    const plan = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.698,
      concentrationMm: 100,
      volumeMl: 1000,
      route: 'two-forms',
      acidForm: 'NaH2PO4',
      baseForm: 'Na2HPO4',
      activityModel: 'ideal',
    });
    const acid = plan.components.find((c) => c.role === 'acid form')!.concentrationMm!;
    const base = plan.components.find((c) => c.role === 'base form')!.concentrationMm!;
    expect(Math.abs(base / acid / Math.pow(10, 0.5) - 1)).toBeLessThan(1e-3);
  });
});

describe('recipe planner: common practice', () => {
  it('a tris buffer adjusted warm reads higher when cold (adjusted at 25 °C for use at 4 °C: the bench reading is lower than the target)', () => {
    const plan = planRecipe({
      buffer: 'tris',
      targetPh: 8.0,
      useTemperatureC: 4,
      benchTemperatureC: 25,
      concentrationMm: 50,
      volumeMl: 1000,
      form: 'tris base',
      titrant: { form: 'HCl', concentrationM: 1 },
    });
    expect(plan.meter.pH).toBeLessThan(8.0 - 0.4);
    expect(plan.predictions.pHAtBench).toBeLessThan(plan.predictions.pHAtUse - 0.4);
    expect(plan.predictions.pHPerDegreeC).toBeLessThan(-0.02);
  });

  it('a tenfold phosphate stock made to the working pH lands above it after dilution', () => {
    // 200 mM stock for 20 mM working buffer: the stock's ionic strength (≈ 0.45 M) stays within Davies' range.
    const stockAtWorkingPh = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.2,
      concentrationMm: 200,
      volumeMl: 1000,
      form: 'NaH2PO4·H2O',
      titrant: { form: 'NaOH', concentrationM: 10 },
    });
    expect(solvePh(scaleComposition(stockAtWorkingPh.composition, 0.1))).toBeGreaterThan(7.2 + 0.05);
    const viaStockRoute = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.2,
      concentrationMm: 20,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 10 },
      form: 'NaH2PO4·H2O',
      titrant: { form: 'NaOH', concentrationM: 10 },
    });
    expect(viaStockRoute.stock!.stockPhAtUse).toBeLessThan(7.2 - 0.05);
  });
});

describe('recipe planner: bench numbers', () => {
  const plan = planRecipe(RECIPES[0][1]);

  it('the titrant band brackets the expected volume and the first portion sits below the band', () => {
    const t = plan.titration!;
    expect(t.lowMl).toBeLessThan(t.volumeMl);
    expect(t.highMl).toBeGreaterThan(t.volumeMl);
    expect(t.firstPortionMl).toBeLessThan(t.lowMl);
    expect(t.direction).toBe('raises');
  });

  it('grams use the molar mass of the exact form and the purity', () => {
    const mes = planRecipe(RECIPES[3][1]).components.find((c) => c.role === 'buffer')!;
    const m = findForm('MES free acid').molarMass;
    expect(mes.grams).toBeCloseTo((0.02 * 2 * m) / 0.98, 10);
  });

  it('the protocol names the meter reading, the bench temperature and the part volume', () => {
    const text = plan.steps.join(' ');
    expect(text).toMatch(new RegExp(`reads ${plan.meter.pH.toFixed(2)} at 22 °C`));
    expect(text).toMatch(/in about 400 mL \(80 % of the 500 mL\)/);
    expect(text).toMatch(/calibrate the pH meter/);
  });

  it('cautions name the corrosive titrant and defer to safety data sheets', () => {
    expect(plan.cautions.join(' ')).toMatch(/sodium hydroxide: corrosive/);
    expect(plan.cautions.join(' ')).toMatch(/safety data sheets/);
  });

  it('cacodylate carries its arsenic caution', () => {
    const caco = planRecipe({
      buffer: 'cacodylate',
      targetPh: 6.5,
      concentrationMm: 100,
      volumeMl: 100,
      form: 'sodium cacodylate trihydrate',
      titrant: { form: 'HCl', concentrationM: 1 },
    });
    expect(caco.cautions.join(' ')).toMatch(/arsenic/);
  });

  it('formatRecipe prints amounts, steps, predictions and cautions', () => {
    const text = formatRecipe(plan);
    for (const heading of ['Amounts', 'Steps', 'Predicted', 'Cautions']) expect(text).toContain(heading);
    expect(text).toMatch(/ideal osmolarity\s+\d+ mOsm\/L/);
  });

  it('user substances work like library ones', () => {
    const library = createLibrary([
      { name: 'lab amine X', chargeOfMostProtonated: 1, pKa: [8.4], deltaHkJ: [45], forms: [{ name: 'lab amine X base', molarMass: 150.2, protonsLost: 1 }] },
    ]);
    const p = planRecipe(
      { buffer: 'lab amine X', targetPh: 8.2, concentrationMm: 20, volumeMl: 100, form: 'lab amine X base', titrant: { form: 'HCl', concentrationM: 1 } },
      library,
    );
    expect(Math.abs(solvePh(p.composition) - 8.2)).toBeLessThan(ROUND_TRIP_PH);
  });
});

describe('recipe planner: warnings', () => {
  it('warns when the target is more than 1 unit from every pKa', () => {
    const p = planRecipe({ buffer: 'HEPES', targetPh: 9.2, concentrationMm: 20, volumeMl: 100, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } });
    expect(codes(p.warnings)).toContain('weakBuffering');
  });

  it('warns when the ionic strength is beyond the activity model (Davies past 0.5 M; Pitzer holds there)', () => {
    const input = {
      buffer: 'HEPES',
      targetPh: 7.4,
      concentrationMm: 20,
      volumeMl: 100,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      salts: [{ form: 'NaCl', concentrationMm: 1000 }],
    };
    expect(codes(planRecipe({ ...input, activityModel: 'davies' }).warnings)).toContain('beyondActivityModel');
    expect(codes(planRecipe(input).warnings)).not.toContain('beyondActivityModel');
    expect(codes(planRecipe(input).warnings)).not.toContain('beyondPitzerRange');
  });

  it('warns when the titrant is more than half the volume', () => {
    const p = planRecipe({ buffer: 'tris', targetPh: 7.5, concentrationMm: 200, volumeMl: 100, form: 'tris base', titrant: { form: 'HCl', concentrationM: 0.25 } });
    expect(p.titration!.volumeMl).toBeGreaterThan(50);
    expect(codes(p.warnings)).toContain('titrantOverHalf');
  });

  it('refuses a titrant that does not fit in the part volume, naming a stock strong enough (infeasible, never a plan)', () => {
    let caught: ChemError | undefined;
    try {
      planRecipe({ buffer: 'tris', targetPh: 7.5, concentrationMm: 200, volumeMl: 100, form: 'tris base', titrant: { form: 'HCl', concentrationM: 0.2 } });
    } catch (e) {
      caught = e as ChemError;
    }
    expect(caught).toMatchObject({ kind: 'infeasible-target', code: 'titrantTooLarge', field: 'titrant.concentrationM', allowed: 'a 2 M stock' });
    // HEPES to pH 0 would need more 1 M HCl than the whole buffer holds: no stock is strong enough at a tenth of the volume either.
    expect(() => planRecipe({ buffer: 'HEPES', targetPh: 0, concentrationMm: 50, volumeMl: 500, titrant: { form: 'HCl', concentrationM: 1 } })).toThrow(ChemError);
  });

  it('says no titrant is needed when the weighed form alone is within 0.005 of the target', () => {
    const lone = planRecipe({ buffer: 'acetate', form: 'sodium acetate trihydrate', targetPh: 7, concentrationMm: 50, volumeMl: 500 });
    const startPh = lone.unadjustedPh!;
    for (const target of [startPh, startPh + 0.004]) {
      const p = planRecipe({ buffer: 'acetate', form: 'sodium acetate trihydrate', targetPh: target, concentrationMm: 50, volumeMl: 500 });
      expect(p.titration).toBeUndefined();
      expect(codes(p.warnings)).toContain('noTitrantNeeded');
    }
  });

  it('caps the stock-dilution advice: a target a hair off the unadjusted pH gets "check with the meter", not a 10^10-fold dilution', () => {
    const lone = planRecipe({ buffer: 'acetate', form: 'sodium acetate trihydrate', targetPh: 7, concentrationMm: 50, volumeMl: 500 });
    const p = planRecipe({ buffer: 'acetate', form: 'sodium acetate trihydrate', targetPh: lone.unadjustedPh! + 0.006, concentrationMm: 50, volumeMl: 500 });
    const text = texts(p.warnings).join(' ');
    expect(codes(p.warnings)).toContain('titrantTinyCheckMeter');
    expect(text).not.toMatch(/dilute the stock \d{5,}×/);
    expect(text).toMatch(/check it with the meter/);
  });

  it('warns when the whole titrant is too small to add in portions, and gives the volumes in µL', () => {
    const p = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 10, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 10 } });
    expect(p.titration!.volumeMl).toBeLessThan(0.1);
    const warning = p.warnings.find((w) => w.code === 'titrantTiny')?.message;
    expect(warning).toMatch(/^The whole titrant is only 1\d\.\d µL: .* dilute the stock 10× \(1\.00 M\) to add about 1\d\d µL\.$/);
    expect(p.steps.join(' ')).toMatch(/expect 1\d\.\d–1\d\.\d µL in all, about 1\d\.\d µL/);
    // With the 1 M stock it advises, the warning is gone.
    const diluted = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 10, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } });
    expect(codes(diluted.warnings)).not.toContain('titrantTiny');
  });

  it('warns when a weighing is below about 10 mg, and not at 25 mM in 1 L', () => {
    const tiny = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 1, volumeMl: 10, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 0.01 } });
    expect(tiny.warnings).toContainEqual(expect.objectContaining({ code: 'smallWeighing', message: expect.stringMatching(/^2\.38 mg of HEPES free acid/) }));
    const usual = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 1000, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } });
    expect(codes(usual.warnings)).not.toContain('smallWeighing');
  });

  it("warns for the temperature of use and the bench temperature against the constants' data: malate (no ΔH°) used at 4 °C and adjusted at 20 °C; histidine at pH 6 not (only its far carboxyl step lacks ΔH°)", () => {
    const p = planRecipe({
      buffer: 'malate',
      targetPh: 4.5,
      concentrationMm: 20,
      volumeMl: 500,
      form: 'DL-malic acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      useTemperatureC: 4,
      benchTemperatureC: 20,
    });
    expect(p.warnings).toContainEqual(
      expect.objectContaining({ code: 'noEnthalpy', message: expect.stringMatching(/^malate has no ΔH° for steps 1, 2: .* at the temperature of use 4 °C/) }),
    );
    expect(p.warnings).toContainEqual(
      expect.objectContaining({ code: 'noEnthalpy', message: expect.stringMatching(/^malate has no ΔH° for steps 1, 2: .* at the bench temperature 20 °C/) }),
    );
    const histidine = planRecipe({
      buffer: 'histidine',
      targetPh: 6.0,
      concentrationMm: 20,
      volumeMl: 500,
      form: 'L-histidine',
      titrant: { form: 'HCl', concentrationM: 1 },
      useTemperatureC: 4,
      benchTemperatureC: 20,
    });
    expect(codes(histidine.warnings)).not.toContain('noEnthalpy');
    const tris = planRecipe({
      buffer: 'tris',
      targetPh: 7.5,
      concentrationMm: 50,
      volumeMl: 500,
      form: 'tris base',
      titrant: { form: 'HCl', concentrationM: 1 },
      useTemperatureC: 55,
      benchTemperatureC: 22,
    });
    expect(tris.warnings).toContainEqual(
      expect.objectContaining({
        code: 'outsideDataRange',
        message: expect.stringMatching(/^The temperature of use 55 °C lies outside 0–50 °C, the temperatures the data for tris/),
      }),
    );
    expect(texts(tris.warnings).some((w) => w.includes('bench temperature'))).toBe(false);
  });

  it('speaks of litres and a tank for a 200 L batch', () => {
    const p = planRecipe({ buffer: 'tris', targetPh: 8.0, concentrationMm: 50, volumeMl: 200000, form: 'tris base', titrant: { form: 'HCl', concentrationM: 6 } });
    expect(p.steps.join(' ')).toMatch(/about 160 L \(80 % of the 200 L\)/);
    expect(p.steps.join(' ')).toMatch(/Transfer to a graduated vessel or tank, rinse in, and bring to 200 L/);
  });

  it('warns when a solid is above its solubility in the part volume', () => {
    const p = planRecipe({
      buffer: 'tris',
      targetPh: 8.0,
      concentrationMm: 50,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 100 },
      form: 'tris base',
      titrant: { form: 'HCl', concentrationM: 12 },
    });
    expect(codes(p.warnings)).toContain('aboveSolubility');
  });

  it('warns that metal–buffer complexes are not modelled when MgCl2 joins a phosphate recipe, not a HEPES one', () => {
    const phosphate = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.2,
      concentrationMm: 50,
      volumeMl: 500,
      route: 'two-forms',
      acidForm: 'NaH2PO4·H2O',
      baseForm: 'Na2HPO4·7H2O',
      salts: [{ form: 'MgCl2·6H2O', concentrationMm: 2 }],
    });
    expect(phosphate.warnings).toContainEqual(expect.objectContaining({ code: 'metalComplexes', message: expect.stringMatching(/^Mg2\+ with phosphate/) }));
    const hepes = planRecipe({
      buffer: 'HEPES',
      targetPh: 7.4,
      concentrationMm: 20,
      volumeMl: 100,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      salts: [{ form: 'MgCl2·6H2O', concentrationMm: 2 }],
    });
    expect(codes(hepes.warnings)).not.toContain('metalComplexes');
  });

  it('warns above 60 °C', () => {
    const p = planRecipe({ buffer: 'phosphate', targetPh: 7, useTemperatureC: 70, concentrationMm: 20, volumeMl: 100, route: 'two-forms', acidForm: 'KH2PO4', baseForm: 'K2HPO4' });
    expect(codes(p.warnings)).toContain('aboveFittedRange');
  });
});

describe('recipe planner: bad input names the field and what is allowed', () => {
  const good: RecipeInput = { buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 500, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } };
  // [what, change, kind, code, field]: errors are compared by their codes and fields, never by text.
  const cases: [string, Partial<RecipeInput> | Record<string, unknown>, string, string, string | undefined][] = [
    ['an unknown buffer with a near miss', { buffer: 'HEPPES' }, 'invalid-input', 'unknownSubstance', 'buffer'],
    ['a strong electrolyte as buffer', { buffer: 'sodium chloride' }, 'invalid-input', 'outOfRange', 'buffer'],
    ['a strong electrolyte form (a hydrate) as buffer', { buffer: 'CaCl2·2H2O' }, 'invalid-input', 'outOfRange', 'buffer'],
    ['a form of another system', { form: 'tris base' }, 'invalid-input', 'formNotOfSystem', 'form'],
    ['a pH of 15', { targetPh: 15 }, 'invalid-input', 'outOfRange', 'targetPh'],
    ['a negative volume', { volumeMl: -5 }, 'invalid-input', 'outOfRange', 'volumeMl'],
    ['a concentration in a unit of another kind', { concentrationMm: '25 mL' }, 'invalid-input', 'wrongUnit', 'concentrationMm'],
    ['a concentration in "m" (mM or M?)', { concentrationMm: '25 m' }, 'invalid-input', 'ambiguousUnit', 'concentrationMm'],
    ['a part volume of 1.5', { partVolumeFraction: 1.5 }, 'invalid-input', 'outOfRange', 'partVolumeFraction'],
    ['a bench temperature of −20 °C', { benchTemperatureC: -20 }, 'invalid-input', 'outOfRange', 'benchTemperatureC'],
    ['an unknown route', { route: 'magic' }, 'invalid-input', 'unknownChoice', 'route'],
    ['a titrant that moves the wrong way', { titrant: { form: 'HCl', concentrationM: 1 } }, 'infeasible-target', 'unreachablePh', 'targetPh'],
    ['a misspelt titrant', { titrant: { form: 'NaOHH', concentrationM: 1 } }, 'invalid-input', 'unknownSubstance', 'titrant.form'],
    ['a titrant stock of 25 M', { titrant: { form: 'NaOH', concentrationM: 25 } }, 'invalid-input', 'outOfRange', 'titrant.concentrationM'],
    ['two-forms without forms', { route: 'two-forms' }, 'invalid-input', 'formsOfSystem', 'acidForm'],
    ['a stock fold of 0.5', { route: 'stock', stock: { fold: 0.5 } }, 'invalid-input', 'outOfRange', 'stock.fold'],
    ['a purity of 0 %', { purityPercent: { 'HEPES free acid': 0 } }, 'invalid-input', 'outOfRange', 'purityPercent.HEPES free acid'],
    ['a form purity of 120 %', { formPurityPercent: 120 }, 'invalid-input', 'outOfRange', 'formPurityPercent'],
    ['a misspelt salt', { salts: [{ form: 'NaCll', concentrationMm: 150 }] }, 'invalid-input', 'unknownSubstance', 'salts[0].form'],
    ['a salt list text with no amount', { salts: 'NaCl' }, 'invalid-input', 'notANumber', 'salts'],
    ['a salt target already passed', { saltTarget: { form: 'NaCl', idealOsmolarityMosm: 10 } }, 'infeasible-target', 'saltTargetUnreachable', 'saltTarget'],
    ['a salt target with both goals', { saltTarget: { form: 'NaCl', idealOsmolarityMosm: 300, ionicStrengthM: 0.1 } }, 'invalid-input', 'missingValue', 'saltTarget'],
    ['an osmolality target already passed', { saltTarget: { form: 'NaCl', osmolalityMosmKg: 10 } }, 'infeasible-target', 'saltTargetUnreachable', 'saltTarget'],
    [
      'an osmolality target in a unit of another kind',
      { saltTarget: { form: 'NaCl', osmolalityMosmKg: '290 mOsm/L' } },
      'invalid-input',
      'wrongUnit',
      'saltTarget.osmolalityMosmKg',
    ],
    ['a conductivity target already passed', { saltTarget: { form: 'NaCl', conductivityMsPerCm: 0.1 } }, 'infeasible-target', 'saltTargetUnreachable', 'saltTarget'],
    ['a conductivity target beyond the most salt tried', { saltTarget: { form: 'NaCl', conductivityMsPerCm: 900 } }, 'infeasible-target', 'saltTargetBeyondSalt', 'saltTarget'],
    [
      'an ionic-strength target a zwitterion cannot reach',
      { targetPh: 6.0, saltTarget: { form: 'glycine', ionicStrengthM: 0.15 } },
      'infeasible-target',
      'saltTargetBeyondSalt',
      'saltTarget',
    ],
    ['a conductivity target beside another goal', { saltTarget: { form: 'NaCl', conductivityMsPerCm: 15, ionicStrengthM: 0.1 } }, 'invalid-input', 'missingValue', 'saltTarget'],
    [
      'a conductivity target read at 80 °C',
      { saltTarget: { form: 'NaCl', conductivityMsPerCm: 15, conductivityTemperatureC: 80 } },
      'invalid-input',
      'outOfRange',
      'saltTarget.conductivityTemperatureC',
    ],
    [
      'a conductivity target in µS/cm beyond the most salt tried',
      { saltTarget: { form: 'NaCl', conductivityMsPerCm: '900000 µS/cm' } },
      'infeasible-target',
      'saltTargetBeyondSalt',
      'saltTarget',
    ],
  ];
  it.each(cases)('given %s', (_label, change, kind, code, field) => {
    let caught: unknown;
    try {
      planRecipe({ ...good, ...change } as RecipeInput);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ChemError);
    expect({ kind: (caught as ChemError).kind, code: (caught as ChemError).code, field: (caught as ChemError).field }).toEqual({ kind, code, field });
  });

  it('given numbers as text with units, plans exactly as with plain numbers (one input reader)', () => {
    const typed = planRecipe({
      ...good,
      concentrationMm: '0,025 M',
      volumeMl: '0.5 L',
      targetPh: 'pH 7,4',
      useTemperatureC: '25 °C',
      titrant: { form: 'NaOH', concentrationM: '1000 mM' },
      salts: 'NaCl 150 mM; KCl 2,7 mM',
    });
    const plain = planRecipe({
      ...good,
      salts: [
        { form: 'NaCl', concentrationMm: 150 },
        { form: 'KCl', concentrationMm: 2.7 },
      ],
    });
    expect(typed.titration?.volumeMl).toBeCloseTo(plain.titration!.volumeMl, 12);
    expect(typed.components.map((c) => c.grams)).toEqual(plain.components.map((c) => c.grams));
  });

  it('given two forms that cannot reach the target, says the pH span they cover', () => {
    expect(() => planRecipe({ buffer: 'phosphate', targetPh: 9.5, concentrationMm: 50, volumeMl: 100, route: 'two-forms', acidForm: 'NaH2PO4', baseForm: 'Na2HPO4' })).toThrow(
      /mixing these two forms: they span pH/,
    );
  });

  it('the speciation of a plan is consistent with speciate()', () => {
    const p = planRecipe(good);
    expect(speciate(p.composition).ionicStrengthM).toBeCloseTo(p.predictions.ionicStrengthM, 12);
  });
});

describe('purity of the form weighed', () => {
  const base: RecipeInput = {
    buffer: 'HEPES',
    targetPh: 7.4,
    concentrationMm: 25,
    volumeMl: 1000,
    titrant: { form: 'NaOH', concentrationM: 1 },
    salts: [{ form: 'NaCl', concentrationMm: 150 }],
  };
  const grams = (p: RecipePlan, role: string) => p.components.find((c) => c.role === role)!.grams!;

  it('scales the buffer form the route picks, not the salt, and leaves the chemistry alone', () => {
    const pure = planRecipe(base);
    const assayed = planRecipe({ ...base, formPurityPercent: 98 });
    expect(Math.abs(grams(assayed, 'buffer') - grams(pure, 'buffer') / 0.98)).toBeLessThan(1e-9);
    expect(grams(assayed, 'salt')).toBe(grams(pure, 'salt'));
    expect(assayed.titration!.volumeMl).toBe(pure.titration!.volumeMl);
    expect(assayed.steps[0]).toMatch(/98 % pure/);
  });

  it('lets a purity given by form name win over the form purity', () => {
    const named = planRecipe({ ...base, form: 'HEPES free acid', formPurityPercent: 98, purityPercent: { 'HEPES free acid': 99.5 } });
    expect(named.components.find((c) => c.role === 'buffer')!.purityPercent).toBe(99.5);
  });
});

describe('volumes as a pipette or cylinder is read', () => {
  it.each([
    [0.0108, '10.8 µL'],
    [0.25, '250 µL'],
    [0.0009, '0.900 µL'],
    [1, '1.00 mL'],
    [47.74, '47.7 mL'],
    [250, '250 mL'],
    [12500, '12.5 L'],
    [200000, '200 L'],
  ])('%p mL reads %p', (ml, text) => {
    expect(volumeText(ml)).toBe(text);
  });
});

describe('conductivity predictions', () => {
  it('gives κ of the finished buffer at the temperature of use and at 25 °C, the same as the core for the same composition', () => {
    const plan = planRecipe({
      buffer: 'HEPES',
      targetPh: 7.4,
      useTemperatureC: 4,
      concentrationMm: 25,
      volumeMl: 500,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      salts: [{ form: 'NaCl', concentrationMm: 150 }],
    });
    expect(plan.predictions.conductivityMsPerCm).toBeCloseTo(conductivityAt(plan.composition).conductivityMsPerCm, 12);
    expect(plan.predictions.conductivity25MsPerCm).toBeCloseTo(conductivityAt(plan.composition, 25).conductivityMsPerCm, 12);
    // A cold buffer reads lower than at 25 °C: ions move about 2 % per °C slower.
    expect(plan.predictions.conductivityMsPerCm).toBeLessThan(0.7 * plan.predictions.conductivity25MsPerCm);
    expect(formatRecipe(plan)).toMatch(/conductivity\s+\d+(\.\d+)? mS\/cm at 4 °C; \d+(\.\d+)? mS\/cm at 25 °C/);
  });

  it('gives the stock its own κ: above the working dilution, below fold × it (ions slow down as the stock crowds them)', () => {
    const plan = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.4,
      concentrationMm: 50,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 10 },
      form: 'NaH2PO4·H2O',
      titrant: { form: 'NaOH', concentrationM: 5 },
    });
    const working = plan.predictions.conductivityMsPerCm;
    expect(plan.stock!.stockConductivityMsPerCm).toBeGreaterThan(working);
    expect(plan.stock!.stockConductivityMsPerCm).toBeLessThan(10 * working);
    expect(plan.stock!.stockConductivity25MsPerCm).toBeCloseTo(plan.stock!.stockConductivityMsPerCm, 12);
  });
});

describe('salt target by conductivity', () => {
  it("adds NaCl until the finished buffer reads 15.0 mS/cm at 20 °C (used at 25 °C), and the plan's own composition reads it back", () => {
    const plan = planRecipe({
      buffer: 'tris',
      targetPh: 7.5,
      concentrationMm: 20,
      volumeMl: 1000,
      form: 'tris base',
      titrant: { form: 'HCl', concentrationM: 1 },
      saltTarget: { form: 'NaCl', conductivityMsPerCm: 15, conductivityTemperatureC: 20 },
    });
    expect(conductivityAt(plan.composition, 20).conductivityMsPerCm).toBeCloseTo(15, 6);
    const salt = plan.components.find((c) => c.role === 'salt');
    // About 150 mM NaCl makes 15 mS/cm at 20 °C (κ ≈ 16 mS/cm for 1 % NaCl, CRC Handbook): the amount is of that order.
    expect(salt!.concentrationMm).toBeGreaterThan(100);
    expect(salt!.concentrationMm).toBeLessThan(200);
    expect(Math.abs(plan.predictions.pHAtUse - 7.5)).toBeLessThan(ROUND_TRIP_PH);
  });

  it('reads the target at the temperature of use when no temperature is given', () => {
    const plan = planRecipe({
      buffer: 'HEPES',
      targetPh: 7.4,
      useTemperatureC: 4,
      concentrationMm: 25,
      volumeMl: 500,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      saltTarget: { form: 'KCl', conductivityMsPerCm: 10 },
    });
    expect(plan.predictions.conductivityMsPerCm).toBeCloseTo(10, 6);
  });
});

describe('conductivity of a concentrated stock', () => {
  it('warns that a stock beyond 1 M ionic strength is an extrapolation of the conductivity model', () => {
    const plan = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.4,
      concentrationMm: 50,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 10 },
      form: 'NaH2PO4·H2O',
      titrant: { form: 'NaOH', concentrationM: 5 },
      salts: [{ form: 'NaCl', concentrationMm: 150 }],
    });
    expect(plan.warnings).toContainEqual(expect.objectContaining({ code: 'conductivityIonicStrength', message: expect.stringMatching(/^The stock: Ionic strength/) }));
  });
});

describe('salt target: the search stops where the salt is fixed to 1e-12 of itself', () => {
  /** The search stops when its bracket is 1e-12 of the salt wide; the goal then moves by its slope times that, plus the solver's own rounding. */
  const GOAL_RELATIVE = 1e-9;
  it.each([
    [
      'ionic strength 0.15 M with KCl, MOPS at 4 °C',
      { saltTarget: { form: 'KCl', ionicStrengthM: 0.15 }, useTemperatureC: 4 },
      (p: RecipePlan) => p.predictions.ionicStrengthM,
      0.15,
    ],
    [
      'ideal osmolarity 600 mOsm/L with NaCl, MOPS at 37 °C',
      { saltTarget: { form: 'NaCl', idealOsmolarityMosm: 600 }, useTemperatureC: 37 },
      (p: RecipePlan) => p.predictions.idealOsmolarityMosm,
      600,
    ],
    ['osmolality 290 mOsm/kg with NaCl, MOPS at 25 °C', { saltTarget: { form: 'NaCl', osmolalityMosmKg: 290 } }, (p: RecipePlan) => p.predictions.osmolalityMosmKg, 290],
  ] as const)('%s', (_label, extra, reached, goal) => {
    const plan = planRecipe({ buffer: 'MOPS', targetPh: 7.2, concentrationMm: 20, volumeMl: 1000, form: 'MOPS free acid', titrant: { form: 'KOH', concentrationM: 1 }, ...extra });
    expect(Math.abs(reached(plan) - goal) / goal).toBeLessThan(GOAL_RELATIVE);
  });
});
