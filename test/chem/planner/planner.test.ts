import { ChemError, Composition, scaleComposition, solvePh, speciate } from '../../../src/chem';
import { createLibrary, defaultLibrary, findForm } from '../../../src/chem/library';
import { RecipeInput, RecipePlan, formatRecipe, planRecipe } from '../../../src/chem/planner';
import { volumeText } from '../../../src/chem/planner/protocol';

/** The brief's bar for round trips: the recipe's own numbers solve back to the target within 0.001 pH. */
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
  ['cold-room HEPES saline, NaOH, adjusted at 22 °C', { buffer: 'HEPES', targetPh: 7.4, useTemperatureC: 4, benchTemperatureC: 22, concentrationMm: 25, volumeMl: 500, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 }, salts: [{ form: 'NaCl', concentrationMm: 150 }] }],
  ['gel tris with 6 M HCl at 25 °C', { buffer: 'tris', targetPh: 8.3, concentrationMm: 50, volumeMl: 1000, form: 'tris base', titrant: { form: 'HCl', concentrationM: 6 } }],
  ['acetate from sodium acetate trihydrate with 1 M HCl, 90 % part volume', { buffer: 'acetate', targetPh: 4.8, concentrationMm: 100, volumeMl: 250, form: 'sodium acetate trihydrate', titrant: { form: 'HCl', concentrationM: 1 }, partVolumeFraction: 0.9 }],
  ['MES with 5 M NaOH at 37 °C, 98 % pure', { buffer: 'MES', targetPh: 6.1, useTemperatureC: 37, benchTemperatureC: 20, concentrationMm: 20, volumeMl: 2000, form: 'MES free acid', titrant: { form: 'NaOH', concentrationM: 5 }, purityPercent: { 'MES free acid': 98 } }],
  ['tris base titrated with glacial-acid dilution (weak titrant: 1 M acetic acid)', { buffer: 'tris', targetPh: 7.8, concentrationMm: 40, volumeMl: 500, form: 'tris base', titrant: { form: 'acetic acid', concentrationM: 1 } }],
  ['phosphate two forms, monohydrate and heptahydrate', { buffer: 'phosphate', targetPh: 7.0, concentrationMm: 100, volumeMl: 1000, route: 'two-forms', acidForm: 'NaH2PO4·H2O', baseForm: 'Na2HPO4·7H2O' }],
  ['tris two forms (base and hydrochloride), at 4 °C', { buffer: 'tris', targetPh: 7.5, useTemperatureC: 4, concentrationMm: 20, volumeMl: 500, route: 'two-forms', acidForm: 'tris HCl', baseForm: 'tris base' }],
  ['HEPES with NaCl to an ideal osmolarity of 290 mOsm/L', { buffer: 'HEPES', targetPh: 7.2, concentrationMm: 10, volumeMl: 1000, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 }, saltTarget: { form: 'NaCl', idealOsmolarityMosm: 290 } }],
];

describe('recipe planner: round trips (within 0.001 pH)', () => {
  it.each(RECIPES)('%s: the finished buffer gives the target at the temperature of use', (_label, input) => {
    const plan = planRecipe(input);
    expect(Math.abs(solvePh(plan.composition) - input.targetPh)).toBeLessThan(ROUND_TRIP_PH);
    expect(Math.abs(plan.predictions.pHAtUse - input.targetPh)).toBeLessThan(ROUND_TRIP_PH);
  });

  it.each(RECIPES)('%s: the printed grams and mL solve back to the target and to the meter reading', (_label, input) => {
    const plan = planRecipe(input);
    const made = fromAmounts(plan, plan.volumeMl);
    expect(Math.abs(solvePh(made) - input.targetPh)).toBeLessThan(ROUND_TRIP_PH);
    const atBench = { ...scaleComposition(made, 1 / plan.meter.partVolumeFraction), temperatureC: plan.meter.benchTemperatureC };
    expect(Math.abs(solvePh(atBench) - plan.meter.pH)).toBeLessThan(ROUND_TRIP_PH);
  });

  it('stock route: the printed stock amounts, diluted by the fold, give the target; the stock meter reading solves back', () => {
    const plan = planRecipe({ buffer: 'phosphate', targetPh: 7.4, concentrationMm: 50, volumeMl: 1000, route: 'stock', stock: { fold: 10, volumeMl: 500 }, form: 'NaH2PO4·H2O', titrant: { form: 'NaOH', concentrationM: 5 } });
    const stock = fromAmounts(plan, plan.stock!.stockVolumeMl);
    expect(Math.abs(solvePh(scaleComposition(stock, 0.1)) - 7.4)).toBeLessThan(ROUND_TRIP_PH);
    const atBench = { ...scaleComposition(stock, 1 / plan.meter.partVolumeFraction), temperatureC: plan.meter.benchTemperatureC };
    expect(Math.abs(solvePh(atBench) - plan.meter.pH)).toBeLessThan(ROUND_TRIP_PH);
    expect(plan.stock!.stockPerBatchMl).toBeCloseTo(100, 10);
    expect(plan.stock!.waterPerBatchMl).toBeCloseTo(900, 10);
  });

  it('stock route with the default Pitzer model: a 10× saline phosphate stock is adjusted to a meter reading several tenths below the 1× target (common practice: 10× stocks read 0.2–0.6 lower)', () => {
    const input: RecipeInput = { buffer: 'phosphate', targetPh: 7.4, concentrationMm: 11.8, volumeMl: 1000, route: 'stock', stock: { fold: 10, volumeMl: 500 }, form: 'NaH2PO4·H2O', titrant: { form: 'NaOH', concentrationM: 5 }, salts: [{ form: 'NaCl', concentrationMm: 137 }, { form: 'KCl', concentrationMm: 2.7 }], partVolumeFraction: 1 };
    const stock = planRecipe(input);
    const shift = stock.meter.pH - 7.4;
    expect(shift).toBeLessThan(-0.2);
    expect(shift).toBeGreaterThan(-0.6);
    expect(stock.warnings.join(' ')).not.toMatch(/Ionic strength/);
    // Davies put the stock above the target, the wrong way.
    expect(planRecipe({ ...input, activityModel: 'davies' }).meter.pH).toBeGreaterThan(7.4);
  });

  it('stock route: a concentrated HEPES stock warns that HEPES has no Pitzer parameters, for the meter reading', () => {
    const plan = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 200, volumeMl: 1000, route: 'stock', stock: { fold: 10, volumeMl: 500 }, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 10 } });
    expect(plan.warnings.join(' ')).toMatch(/^Stock \(10×\) at the meter: Ions without published Pitzer parameters \(HEPES\)/);
    expect(planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 20, volumeMl: 1000, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } }).warnings.join(' ')).not.toMatch(/Pitzer/);
  });

  it('salt target: the finished buffer has the asked ideal osmolarity within 0.01 mOsm/L', () => {
    const plan = planRecipe(RECIPES[7][1]);
    expect(Math.abs(plan.predictions.idealOsmolarityMosm - 290)).toBeLessThan(0.01);
    expect(plan.components.some((c) => c.name === 'sodium chloride' && c.grams! > 7)).toBe(true);
  });

  it('salt target by osmolality: HEPES saline to 290 mOsm/kg on the osmometer, within 0.01 mOsm/kg, needing more NaCl than the same ideal osmolarity', () => {
    const input = { buffer: 'HEPES', targetPh: 7.2, concentrationMm: 10, volumeMl: 1000, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 }, saltTarget: { form: 'NaCl', osmolalityMosmKg: 290 } };
    const plan = planRecipe(input);
    expect(Math.abs(plan.predictions.osmolalityMosmKg - 290)).toBeLessThan(0.01);
    const grams = (p: typeof plan) => p.components.find((c) => c.name === 'sodium chloride')!.grams!;
    expect(grams(plan)).toBeGreaterThan(grams(planRecipe(RECIPES[7][1])));
    expect(formatRecipe(plan)).toMatch(/osmolality +290 mOsm\/kg/);
  });

  it('salt target by ionic strength: 0.15 M reached within 1e-6 M', () => {
    const plan = planRecipe({ buffer: 'MOPS', targetPh: 7.2, concentrationMm: 20, volumeMl: 1000, form: 'MOPS free acid', titrant: { form: 'KOH', concentrationM: 1 }, saltTarget: { form: 'KCl', ionicStrengthM: 0.15 } });
    expect(Math.abs(plan.predictions.ionicStrengthM - 0.15)).toBeLessThan(1e-6);
  });
});

describe('recipe planner: routes agree', () => {
  it('route 1 (tris base + HCl) and route 2 (tris base + tris HCl) give the same final composition', () => {
    const common = { buffer: 'tris', targetPh: 7.6, useTemperatureC: 20, concentrationMm: 50, volumeMl: 1000 } as const;
    const one = planRecipe({ ...common, form: 'tris base', titrant: { form: 'HCl', concentrationM: 1 } }).composition;
    const two = planRecipe({ ...common, route: 'two-forms', acidForm: 'tris HCl', baseForm: 'tris base' }).composition;
    const tris = (c: Composition) => c.systems.filter((s) => s.name === 'tris').reduce((a, s) => a + s.totalM, 0);
    const chloride = (c: Composition) => Object.entries(c.strongIons ?? {}).filter(([k]) => k === 'Cl-').reduce((a, [, v]) => a + v, 0);
    expect(Math.abs(tris(one) - tris(two))).toBeLessThan(1e-12);
    expect(Math.abs(chloride(one) - chloride(two)) / chloride(one)).toBeLessThan(1e-9);
  });

  it('ideal model, equal acid and base forms: the mole-ratio Henderson–Hasselbalch answer (pH = pKa gives a 1:1 split within 0.1 %)', () => {
    // At 100 mM and pH near 7, [H+] and [OH−] are ~1e-7 M: re-equilibration is negligible, as HH assumes.
    const plan = planRecipe({ buffer: 'phosphate', targetPh: 7.198, concentrationMm: 100, volumeMl: 1000, route: 'two-forms', acidForm: 'NaH2PO4', baseForm: 'Na2HPO4', activityModel: 'ideal' });
    const acid = plan.components.find((c) => c.role === 'acid form')!.concentrationMm!;
    const base = plan.components.find((c) => c.role === 'base form')!.concentrationMm!;
    expect(Math.abs(base / acid - 1)).toBeLessThan(1e-3);
  });

  it('ideal model at pH = pKa + 0.5: base/acid = 10^0.5 within 0.1 % (Henderson–Hasselbalch)', () => {
    const plan = planRecipe({ buffer: 'phosphate', targetPh: 7.698, concentrationMm: 100, volumeMl: 1000, route: 'two-forms', acidForm: 'NaH2PO4', baseForm: 'Na2HPO4', activityModel: 'ideal' });
    const acid = plan.components.find((c) => c.role === 'acid form')!.concentrationMm!;
    const base = plan.components.find((c) => c.role === 'base form')!.concentrationMm!;
    expect(Math.abs(base / acid / Math.pow(10, 0.5) - 1)).toBeLessThan(1e-3);
  });
});

describe('recipe planner: common practice', () => {
  it('a tris buffer adjusted warm reads higher when cold (adjusted at 25 °C for use at 4 °C: the bench reading is lower than the target)', () => {
    const plan = planRecipe({ buffer: 'tris', targetPh: 8.0, useTemperatureC: 4, benchTemperatureC: 25, concentrationMm: 50, volumeMl: 1000, form: 'tris base', titrant: { form: 'HCl', concentrationM: 1 } });
    expect(plan.meter.pH).toBeLessThan(8.0 - 0.4);
    expect(plan.predictions.pHAtBench).toBeLessThan(plan.predictions.pHAtUse - 0.4);
    expect(plan.predictions.pHPerDegreeC).toBeLessThan(-0.02);
  });

  it('a tenfold phosphate stock made to the working pH lands above it after dilution', () => {
    // 200 mM stock for 20 mM working buffer: the stock's ionic strength (≈ 0.45 M) stays within Davies' range.
    const stockAtWorkingPh = planRecipe({ buffer: 'phosphate', targetPh: 7.2, concentrationMm: 200, volumeMl: 1000, form: 'NaH2PO4·H2O', titrant: { form: 'NaOH', concentrationM: 10 } });
    expect(solvePh(scaleComposition(stockAtWorkingPh.composition, 0.1))).toBeGreaterThan(7.2 + 0.05);
    const viaStockRoute = planRecipe({ buffer: 'phosphate', targetPh: 7.2, concentrationMm: 20, volumeMl: 1000, route: 'stock', stock: { fold: 10 }, form: 'NaH2PO4·H2O', titrant: { form: 'NaOH', concentrationM: 10 } });
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
    const caco = planRecipe({ buffer: 'cacodylate', targetPh: 6.5, concentrationMm: 100, volumeMl: 100, form: 'sodium cacodylate trihydrate', titrant: { form: 'HCl', concentrationM: 1 } });
    expect(caco.cautions.join(' ')).toMatch(/arsenic/);
  });

  it('formatRecipe prints amounts, steps, predictions and cautions', () => {
    const text = formatRecipe(plan);
    for (const heading of ['Amounts', 'Steps', 'Predicted', 'Cautions']) expect(text).toContain(heading);
    expect(text).toMatch(/ideal osmolarity\s+\d+ mOsm\/L/);
  });

  it('user substances work like library ones', () => {
    const library = createLibrary([{ name: 'lab amine X', chargeOfMostProtonated: 1, pKa: [8.4], deltaHkJ: [45], forms: [{ name: 'lab amine X base', molarMass: 150.2, protonsLost: 1 }] }]);
    const p = planRecipe({ buffer: 'lab amine X', targetPh: 8.2, concentrationMm: 20, volumeMl: 100, form: 'lab amine X base', titrant: { form: 'HCl', concentrationM: 1 } }, library);
    expect(Math.abs(solvePh(p.composition) - 8.2)).toBeLessThan(ROUND_TRIP_PH);
  });
});

describe('recipe planner: warnings', () => {
  it('warns when the target is more than 1 unit from every pKa', () => {
    const p = planRecipe({ buffer: 'HEPES', targetPh: 9.2, concentrationMm: 20, volumeMl: 100, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } });
    expect(p.warnings.join(' ')).toMatch(/buffer weakly/);
  });

  it('warns when the ionic strength is beyond the activity model (Davies past 0.5 M; Pitzer holds there)', () => {
    const input = { buffer: 'HEPES', targetPh: 7.4, concentrationMm: 20, volumeMl: 100, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 }, salts: [{ form: 'NaCl', concentrationMm: 1000 }] };
    expect(planRecipe({ ...input, activityModel: 'davies' }).warnings.join(' ')).toMatch(/above 0.5 M/);
    expect(planRecipe(input).warnings.join(' ')).not.toMatch(/Ionic strength/);
  });

  it('warns when the titrant is more than half the volume and may not fit', () => {
    const p = planRecipe({ buffer: 'tris', targetPh: 7.5, concentrationMm: 200, volumeMl: 100, form: 'tris base', titrant: { form: 'HCl', concentrationM: 0.2 } });
    expect(p.warnings.join(' ')).toMatch(/more than half the final volume/);
    expect(p.warnings.join(' ')).toMatch(/may not fit/);
  });

  it('warns when the whole titrant is too small to add in portions, and gives the volumes in µL', () => {
    const p = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 10, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 10 } });
    expect(p.titration!.volumeMl).toBeLessThan(0.1);
    const warning = p.warnings.find((w) => w.startsWith('The whole titrant'));
    expect(warning).toMatch(/^The whole titrant is only 1\d\.\d µL: .* dilute the stock 10× \(1\.00 M\) to add about 1\d\d µL\.$/);
    expect(p.steps.join(' ')).toMatch(/expect 1\d\.\d–1\d\.\d µL in all, about 1\d\.\d µL/);
    // With the 1 M stock it advises, the warning is gone.
    const diluted = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 10, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } });
    expect(diluted.warnings.some((w) => w.startsWith('The whole titrant'))).toBe(false);
  });

  it('warns when a weighing is below about 10 mg, and not at 25 mM in 1 L', () => {
    const tiny = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 1, volumeMl: 10, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 0.01 } });
    expect(tiny.warnings).toContainEqual(expect.stringMatching(/^2\.38 mg of HEPES free acid is too little to weigh well on an analytical balance/));
    const usual = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 1000, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } });
    expect(usual.warnings.some((w) => w.includes('too little to weigh'))).toBe(false);
  });

  it('speaks of litres and a tank for a 200 L batch', () => {
    const p = planRecipe({ buffer: 'tris', targetPh: 8.0, concentrationMm: 50, volumeMl: 200000, form: 'tris base', titrant: { form: 'HCl', concentrationM: 6 } });
    expect(p.steps.join(' ')).toMatch(/about 160 L \(80 % of the 200 L\)/);
    expect(p.steps.join(' ')).toMatch(/Transfer to a graduated vessel or tank, rinse in, and bring to 200 L/);
  });

  it('warns when a solid is above its solubility in the part volume', () => {
    const p = planRecipe({ buffer: 'tris', targetPh: 8.0, concentrationMm: 50, volumeMl: 1000, route: 'stock', stock: { fold: 100 }, form: 'tris base', titrant: { form: 'HCl', concentrationM: 12 } });
    expect(p.warnings.join(' ')).toMatch(/above its solubility/);
  });

  it('warns that metal–buffer complexes are not modelled when MgCl2 joins a phosphate recipe, not a HEPES one', () => {
    const phosphate = planRecipe({ buffer: 'phosphate', targetPh: 7.2, concentrationMm: 50, volumeMl: 500, route: 'two-forms', acidForm: 'NaH2PO4·H2O', baseForm: 'Na2HPO4·7H2O', salts: [{ form: 'MgCl2·6H2O', concentrationMm: 2 }] });
    expect(phosphate.warnings.join(' ')).toMatch(/Mg2\+ with phosphate: metal–buffer complexes are not modelled/);
    const hepes = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 20, volumeMl: 100, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 }, salts: [{ form: 'MgCl2·6H2O', concentrationMm: 2 }] });
    expect(hepes.warnings.join(' ')).not.toMatch(/complexes/);
  });

  it('warns above 60 °C', () => {
    const p = planRecipe({ buffer: 'phosphate', targetPh: 7, useTemperatureC: 70, concentrationMm: 20, volumeMl: 100, route: 'two-forms', acidForm: 'KH2PO4', baseForm: 'K2HPO4' });
    expect(p.warnings.join(' ')).toMatch(/above 60 °C/);
  });
});

describe('recipe planner: bad input names the field and what is allowed', () => {
  const good: RecipeInput = { buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 500, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } };
  const cases: [string, Partial<RecipeInput> | Record<string, unknown>, RegExp, string][] = [
    ['an unknown buffer with a near miss', { buffer: 'HEPPES' }, /did you mean/i, 'invalid-input'],
    ['a strong electrolyte as buffer', { buffer: 'sodium chloride' }, /strong electrolyte: add it as a salt/, 'invalid-input'],
    ['a strong electrolyte form (a hydrate) as buffer', { buffer: 'CaCl2·2H2O' }, /strong electrolyte: add it as a salt/, 'invalid-input'],
    ['a form of another system', { form: 'tris base' }, /does not contain HEPES/, 'invalid-input'],
    ['a pH of 15', { targetPh: 15 }, /targetPh is 15; allowed: 0 to 14/, 'invalid-input'],
    ['a negative volume', { volumeMl: -5 }, /volumeMl is -5/, 'invalid-input'],
    ['a concentration as text', { concentrationMm: '25' }, /concentrationMm must be a finite number/, 'invalid-input'],
    ['a part volume of 1.5', { partVolumeFraction: 1.5 }, /partVolumeFraction is 1.5; allowed: 0.1 to 1/, 'invalid-input'],
    ['a bench temperature of −20 °C', { benchTemperatureC: -20 }, /benchTemperatureC is -20/, 'invalid-input'],
    ['an unknown route', { route: 'magic' }, /route is "magic"; allowed: titrate, two-forms, stock/, 'invalid-input'],
    ['a titrant that moves the wrong way', { titrant: { form: 'HCl', concentrationM: 1 } }, /hydrochloric acid lowers the pH/, 'infeasible-target'],
    ['two-forms without forms', { route: 'two-forms' }, /name the forms of HEPES/, 'invalid-input'],
    ['a stock fold of 0.5', { route: 'stock', stock: { fold: 0.5 } }, /stock\.fold is 0.5/, 'invalid-input'],
    ['a purity of 0 %', { purityPercent: { 'HEPES free acid': 0 } }, /purityPercent\.HEPES free acid is 0/, 'invalid-input'],
    ['a form purity of 120 %', { formPurityPercent: 120 }, /formPurityPercent is 120; allowed: 1 to 100 %/, 'invalid-input'],
    ['a salt target already passed', { saltTarget: { form: 'NaCl', idealOsmolarityMosm: 10 } }, /already gives/, 'infeasible-target'],
    ['a salt target with both goals', { saltTarget: { form: 'NaCl', idealOsmolarityMosm: 300, ionicStrengthM: 0.1 } }, /one of ionicStrengthM, idealOsmolarityMosm or osmolalityMosmKg/, 'invalid-input'],
  ];
  it.each(cases)('given %s', (_label, change, message, kind) => {
    let caught: unknown;
    try {
      planRecipe({ ...good, ...change } as RecipeInput);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ChemError);
    expect((caught as ChemError).message).toMatch(message);
    expect((caught as ChemError).kind).toBe(kind);
  });

  it('given two forms that cannot reach the target, says the pH span they cover', () => {
    expect(() => planRecipe({ buffer: 'phosphate', targetPh: 9.5, concentrationMm: 50, volumeMl: 100, route: 'two-forms', acidForm: 'NaH2PO4', baseForm: 'Na2HPO4' })).toThrow(/mixing these two forms: they span pH/);
  });

  it('the speciation of a plan is consistent with speciate()', () => {
    const p = planRecipe(good);
    expect(speciate(p.composition).ionicStrengthM).toBeCloseTo(p.predictions.ionicStrengthM, 12);
  });
});

describe('purity of the form weighed', () => {
  const base: RecipeInput = { buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 1000, titrant: { form: 'NaOH', concentrationM: 1 }, salts: [{ form: 'NaCl', concentrationMm: 150 }] };
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
