import { ChemError, solvePh, withTitrant } from '../../../src/chem';
import { BatchActuals, asMade, benchCorrection, plannedAsWeighed } from '../../../src/chem/batch';
import { defaultLibrary } from '../../../src/chem/library';
import { titrantFromForm } from '../../../src/chem/library/titrant';
import { RecipeInput, RecipePlan, planRecipe } from '../../../src/chem/planner';

/** The bar for round trips: the planned amounts give the target back within 0.001 pH (a tenth of a bench meter's 0.01 resolution). */
const ROUND_TRIP_PH = 0.001;
/** A fitted cause must land this close to the value that was simulated (the solver's own consistency, far below what a bench can tell). */
const FIT_RELATIVE = 0.005;
/** A fitted temperature within this of the simulated one, °C (a lab thermometer's reading). */
const FIT_TEMPERATURE_C = 0.2;

const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);
const library = defaultLibrary();

function caught(f: () => unknown): ChemError {
  try {
    f();
  } catch (e) {
    if (e instanceof ChemError) return e;
    throw e;
  }
  throw new Error('expected a ChemError');
}

/** Our own recipes: a cold-room tris saline, a HEPES stock, acetate from the trihydrate, phosphate from two forms, HEPES to an osmolarity. */
const RECIPES: [string, RecipeInput][] = [
  [
    'cold-room tris saline, 1 M HCl, adjusted at 22 °C',
    {
      buffer: 'tris',
      targetPh: 7.5,
      useTemperatureC: 4,
      benchTemperatureC: 22,
      concentrationMm: 50,
      volumeMl: 500,
      form: 'tris base',
      titrant: { form: 'HCl', concentrationM: 1 },
      salts: [{ form: 'NaCl', concentrationMm: 150 }],
    },
  ],
  [
    'HEPES with 5 M NaOH, 98.5 % pure',
    { buffer: 'HEPES', targetPh: 7.2, concentrationMm: 25, volumeMl: 250, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 5 }, formPurityPercent: 98.5 },
  ],
  [
    'acetate from the trihydrate with 1 M HCl',
    { buffer: 'acetate', targetPh: 4.8, concentrationMm: 100, volumeMl: 250, form: 'sodium acetate trihydrate', titrant: { form: 'HCl', concentrationM: 1 } },
  ],
  [
    'tenfold MOPS stock, 200 mL of stock',
    {
      buffer: 'MOPS',
      targetPh: 7.0,
      concentrationMm: 20,
      volumeMl: 1000,
      route: 'stock',
      stock: { fold: 10, volumeMl: 200 },
      form: 'MOPS free acid',
      titrant: { form: 'NaOH', concentrationM: 5 },
    },
  ],
  ['phosphate from two forms', { buffer: 'phosphate', targetPh: 6.9, concentrationMm: 50, volumeMl: 1000, route: 'two-forms', acidForm: 'NaH2PO4·H2O', baseForm: 'Na2HPO4·7H2O' }],
  [
    'HEPES with NaCl to 290 mOsm/L',
    {
      buffer: 'HEPES',
      targetPh: 7.4,
      concentrationMm: 10,
      volumeMl: 1000,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      saltTarget: { form: 'NaCl', idealOsmolarityMosm: 290 },
    },
  ],
];

const asPlanned = (plan: RecipePlan): BatchActuals => ({ weighed: plannedAsWeighed(plan), ...(plan.titration ? { titrantMl: plan.titration.volumeMl } : {}) });

describe('as-made check: the planned amounts give the plan back (within 0.001 pH)', () => {
  it.each(RECIPES)('%s', (_label, input) => {
    const plan = planRecipe(input);
    const r = asMade(plan, asPlanned(plan));
    expect(Math.abs(r.predictions.pHAtUse - plan.targetPh)).toBeLessThanOrEqual(ROUND_TRIP_PH);
    expect(Math.abs(r.predictions.meterPh - plan.meter.pH)).toBeLessThanOrEqual(ROUND_TRIP_PH);
    expect(Math.abs(r.predictions.pHAtBench - plan.predictions.pHAtBench)).toBeLessThanOrEqual(ROUND_TRIP_PH);
    expect(r.predictions.conductivity25MsPerCm).toBeCloseTo(plan.predictions.conductivity25MsPerCm, 6);
    expect(r.predictions.ionicStrengthM).toBeCloseTo(plan.predictions.ionicStrengthM, 8);
    expect(r.pass).toBe(true);
    for (const c of r.components) expect(Math.abs(c.deviationPercent)).toBeLessThan(1e-9);
    expect(codes(r.warnings)).not.toEqual(expect.arrayContaining(['otherFormWeighed', 'stockOffNominal', 'benchTemperatureOffPlan', 'readingOffAsMade']));
  });

  it('a recorded meter reading and final pH as planned pass; a final pH off by more than the tolerance fails that check alone', () => {
    const plan = planRecipe(RECIPES[1][1]);
    const ok = asMade(plan, { ...asPlanned(plan), meterPh: plan.meter.pH, finalPh: plan.targetPh + 0.02 });
    expect(ok.pass).toBe(true);
    expect(ok.checks.map((c) => c.key)).toEqual(['pHAtUse', 'measuredPhAtUse', 'meterReading', 'conductivity25']);
    const off = asMade(plan, { ...asPlanned(plan), finalPh: plan.targetPh + 0.08 }, { ph: 0.05 });
    expect(off.pass).toBe(false);
    expect(off.checks.filter((c) => !c.pass).map((c) => c.key)).toEqual(['measuredPhAtUse']);
    expect(asMade(plan, { ...asPlanned(plan), finalPh: plan.targetPh + 0.08 }, { ph: 0.1 }).pass).toBe(true);
  });

  it("carries a planned osmolality (when the plan's activity model predicts one) at the plan's osmotic coefficient, scaled by the particles made", () => {
    const plan = planRecipe(RECIPES[0][1]);
    // Made as planned, the batch has the plan's osmolality.
    expect(asMade(plan, asPlanned(plan)).predictions.osmolalityMosmPerKg).toBeCloseTo(plan.predictions.osmolalityMosmKg, 9);
    const withOsmolality = { ...plan, predictions: { ...plan.predictions, osmolalityMosmKg: 371 } } as RecipePlan;
    expect(asMade(withOsmolality, asPlanned(plan)).predictions.osmolalityMosmPerKg).toBeCloseTo(371, 9);
    const salty = asMade(withOsmolality, {
      ...asPlanned(plan),
      weighed: plannedAsWeighed(plan).map((w) => (w.form === 'sodium chloride' ? { ...w, grams: (w.grams as number) * 1.1 } : w)),
    });
    expect(salty.predictions.osmolalityMosmPerKg! / 371).toBeCloseTo(salty.predictions.idealOsmolarityMosm / plan.predictions.idealOsmolarityMosm, 9);
  });

  it('refuses a planned form with no mass (code notWeighed) and a bad mass (field named)', () => {
    const plan = planRecipe(RECIPES[0][1]);
    const e = caught(() => asMade(plan, { weighed: plannedAsWeighed(plan).slice(0, 1), titrantMl: 20 }));
    expect([e.code, e.field]).toEqual(['notWeighed', 'actual.grams']);
    const bad = caught(() => asMade(plan, { weighed: [{ form: 'tris base', grams: '3 kg/L' }], titrantMl: 20 }));
    expect(bad.field).toBe('actual.weighed[0].grams');
    expect(
      asMade(plan, {
        weighed: [
          { form: 'tris base', grams: '3028 mg' },
          { form: 'NaCl', grams: 4.383 },
        ],
        titrantMl: 20,
      }).components[0].actualMm,
    ).toBeCloseTo((3.028 / 121.135) * 2000, 1);
  });
});

describe('bench correction: a reading as expected', () => {
  const plan = planRecipe(RECIPES[0][1]);
  const tp = plan.titration!;

  it('after the planned first portion, the reading the plan expects asks for the rest of the planned volume', () => {
    const expected = benchCorrection(plan, { titrantMl: tp.firstPortionMl, readingPh: 7.5 }).expectedPh;
    const c = benchCorrection(plan, { titrantMl: tp.firstPortionMl, readingPh: expected });
    expect(c.offPlan).toBe(false);
    expect(c.action).toBe('add');
    expect(c.nextMl).toBeCloseTo(tp.volumeMl - tp.firstPortionMl, 6);
    expect(c.firstPortionMl).toBeLessThan(c.nextMl);
    expect(Math.abs(c.endPointPh - plan.meter.pH)).toBeLessThanOrEqual(ROUND_TRIP_PH);
    expect(c.causes).toEqual([]);
  });

  it('at the end point it says to stop (code benchOnTarget)', () => {
    const c = benchCorrection(plan, { titrantMl: tp.volumeMl, readingPh: plan.meter.pH + 0.01 });
    expect(c.action).toBe('on-target');
    expect(c.nextMl).toBe(0);
    expect(codes(c.warnings)).toContain('benchOnTarget');
  });

  it('past the end point it names the counter-titrant, whose amount brings the reading back to the end point (within 0.001 pH)', () => {
    const c = benchCorrection(plan, { titrantMl: tp.volumeMl + 2, readingPh: plan.meter.pH - 0.3, counterTitrant: { form: 'NaOH', concentrationM: 0.5 } });
    expect(c.action).toBe('counter');
    expect(c.add).toBe('sodium hydroxide');
    expect(codes(c.warnings)).toContain('overshoot');
    // Rebuild: the solution the reading implies, plus the counter-titrant, read at the bench.
    const start = library.compositionFromForms(
      plannedAsWeighed(plan).map((w) => ({ form: w.form, concentrationM: ((w.grams as number) * ((w.purityPercent as number) / 100)) / library.findForm(w.form).molarMass / 0.4 })),
      { temperatureC: 22 },
    );
    const hcl = titrantFromForm(library.findForm('HCl'), library);
    const naoh = titrantFromForm(library.findForm('NaOH'), library);
    const after = withTitrant(withTitrant(start, hcl, ((c.effectiveTitrantMl / 1000) * 1) / 0.4), naoh, ((c.nextMl / 1000) * 0.5) / 0.4);
    expect(Math.abs(solvePh(after) - c.endPointPh)).toBeLessThanOrEqual(ROUND_TRIP_PH);
  });

  it('typed errors with reasons: no titrant in the plan, a reading no titrant explains, a correction that will not fit', () => {
    const twoForms = planRecipe(RECIPES[4][1]);
    expect(caught(() => benchCorrection(twoForms, { titrantMl: 0, readingPh: 7 })).code).toBe('nothingToTitrate');
    // HCl only lowers the pH: tris base alone reads about 10.4 at 22 °C, so 11.5 cannot come from any amount of it.
    const e = caught(() => benchCorrection(plan, { titrantMl: 5, readingPh: 11.5 }));
    expect([e.kind, e.code, e.field]).toEqual(['infeasible-target', 'readingUnexplained', 'reading.ph']);
    const big = caught(() => benchCorrection(plan, { titrantMl: 0, titrantConcentrationM: 0.01, readingPh: 10 }));
    expect([big.kind, big.code]).toEqual(['infeasible-target', 'correctionTooLarge']);
  });
});

/** The reading a meter would show for a solution of these forms (g in mL) with titrant moles, at a temperature. */
function simulatedReading(plan: RecipePlan, grams: { form: string; grams: number; purity?: number }[], titrantMol: number, volumeMl: number, temperatureC: number): number {
  const c = library.compositionFromForms(
    grams.map((g) => ({ form: g.form, concentrationM: (g.grams * (g.purity ?? 100)) / 100 / library.findForm(g.form).molarMass / (volumeMl / 1000) })),
    { temperatureC, activityModel: plan.activityModel },
  );
  return solvePh(withTitrant(c, titrantFromForm(library.findForm(plan.titration!.titrant), library), titrantMol / (volumeMl / 1000)));
}

describe('our own bench mishaps, each detected and explained', () => {
  it('wrong bottle: tris hydrochloride weighed by the tris base plan — the reading points to the salt form, not to a hydrate', () => {
    const plan = planRecipe(RECIPES[0][1]);
    const planned = plan.components.filter((c) => c.grams !== undefined);
    const weighed = planned.map((c) => ({ form: c.name === 'tris base' ? 'tris hydrochloride' : c.name, grams: c.grams! }));
    const first = plan.titration!.firstPortionMl;
    const reading = simulatedReading(plan, weighed, (first / 1000) * 1, plan.meter.partVolumeMl, plan.meter.benchTemperatureC);
    const c = benchCorrection(plan, { titrantMl: first, readingPh: reading });
    expect(c.offPlan).toBe(true);
    expect(codes(c.warnings)).toEqual(expect.arrayContaining(['readingOffPlan', 'causeSaltForm', 'causeCalibration']));
    expect(c.causes.find((x) => x.cause === 'salt form')!.fits).toBe('tris hydrochloride');
    expect(codes(c.warnings)).not.toContain('causeHydrate');
  });

  it('wrong hydrate: anhydrous sodium acetate weighed by the trihydrate plan — the as-made check fails the amount and names the form; the reading points to the hydrate', () => {
    const plan = planRecipe(RECIPES[2][1]);
    const planned = plan.components[0];
    const weighed = [{ form: 'sodium acetate anhydrous', grams: planned.grams! }];
    const r = asMade(plan, { weighed, titrantMl: plan.titration!.volumeMl });
    expect(r.pass).toBe(false);
    expect(codes(r.warnings)).toContain('otherFormWeighed');
    expect(r.components[0].deviationPercent).toBeCloseTo((136.08 / 82.03 - 1) * 100, 0);
    expect(r.checks.find((c) => c.key === 'pHAtUse')!.pass).toBe(false);

    // At the bench the user believes the trihydrate went in; the meter says otherwise.
    const first = plan.titration!.firstPortionMl;
    const reading = simulatedReading(plan, weighed, (first / 1000) * 1, plan.meter.partVolumeMl, plan.meter.benchTemperatureC);
    const c = benchCorrection(plan, { titrantMl: first, readingPh: reading });
    expect(c.offPlan).toBe(true);
    expect(codes(c.warnings)).toEqual(expect.arrayContaining(['readingOffPlan', 'causeHydrate', 'causeCalibration']));
    expect(c.causes.find((x) => x.cause === 'hydrate')!.fits).toBe('sodium acetate anhydrous');
    expect(c.firstPortionMl).toBeCloseTo(0.5 * c.nextMl, 9);
  });

  it('weak titrant stock: the 1 M HCl is really 0.9 M — the reading fits 0.9 M; standardised at 0.9 M, the planned volume fails as made', () => {
    const plan = planRecipe(RECIPES[0][1]);
    const tp = plan.titration!;
    const reading = simulatedReading(
      plan,
      plannedAsWeighed(plan).map((w) => ({ form: w.form, grams: w.grams as number })),
      (tp.firstPortionMl / 1000) * 0.9,
      plan.meter.partVolumeMl,
      22,
    );
    const c = benchCorrection(plan, { titrantMl: tp.firstPortionMl, readingPh: reading });
    expect(c.offPlan).toBe(true);
    expect(codes(c.warnings)).toContain('causeStockConcentration');
    expect(Math.abs((c.causes.find((x) => x.cause === 'stock concentration')!.fits as number) - 0.9)).toBeLessThanOrEqual(0.9 * FIT_RELATIVE);
    // The next amount from the reading, poured from the true stock, lands on the end point.
    const rest = simulatedReading(
      plan,
      plannedAsWeighed(plan).map((w) => ({ form: w.form, grams: w.grams as number })),
      (tp.firstPortionMl * 0.9) / 1000 + (c.nextMl / 1000) * 1,
      plan.meter.partVolumeMl,
      22,
    );
    expect(Math.abs(rest - c.endPointPh)).toBeLessThanOrEqual(ROUND_TRIP_PH);

    const r = asMade(plan, { ...asPlanned(plan), titrantConcentrationM: 0.9 });
    expect(r.pass).toBe(false);
    expect(codes(r.warnings)).toContain('stockOffNominal');
  });

  it('too-warm bench: tris adjusted at 30 °C, not 22 °C — the reading fits 30 °C; adjusted to the planned reading there, the batch fails at use and the warning says why', () => {
    const plan = planRecipe(RECIPES[0][1]);
    const tp = plan.titration!;
    const grams = plannedAsWeighed(plan).map((w) => ({ form: w.form, grams: w.grams as number }));
    const reading = simulatedReading(plan, grams, (tp.firstPortionMl / 1000) * 1, plan.meter.partVolumeMl, 30);
    const c = benchCorrection(plan, { titrantMl: tp.firstPortionMl, readingPh: reading });
    expect(c.offPlan).toBe(true);
    expect(Math.abs((c.causes.find((x) => x.cause === 'temperature')!.fits as number) - 30)).toBeLessThanOrEqual(FIT_TEMPERATURE_C);
    // Told the temperature, the correction moves the end-point reading and says so.
    const told = benchCorrection(plan, { titrantMl: tp.firstPortionMl, readingPh: reading, temperatureC: 30 });
    expect(told.offPlan).toBe(false);
    expect(codes(told.warnings)).toContain('benchTemperatureOffPlan');
    expect(told.endPointPh).toBeLessThan(plan.meter.pH - 0.1);

    // Adjusted to the planned reading at 30 °C: how much HCl that takes, from the charge balance at 30 °C.
    let lo = 0;
    let hi = 2 * tp.volumeMl;
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (simulatedReading(plan, grams, mid / 1000, plan.meter.partVolumeMl, 30) > plan.meter.pH) lo = mid;
      else hi = mid;
    }
    const r = asMade(plan, { weighed: plannedAsWeighed(plan), titrantMl: lo, benchTemperatureC: 30, meterPh: plan.meter.pH });
    expect(r.pass).toBe(false);
    // Warmer tris reads lower, so the planned reading came with less HCl: the batch is too basic at use.
    expect(r.predictions.pHAtUse).toBeGreaterThan(plan.targetPh + 0.1);
    expect(codes(r.warnings)).toContain('benchTemperatureOffPlan');
    expect(r.checks.find((x) => x.key === 'meterReading')!.pass).toBe(true);
  });
});
