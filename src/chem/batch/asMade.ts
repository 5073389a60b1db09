/**
 * The as-made check: from what was actually weighed, poured and made up, what was made.
 *
 * Method: each form weighed gives moles = grams · purity / M (M of the form on the bottle,
 * hydrate water included); the titrant gives moles = mL · its standardised concentration.
 * In the volume made up to these are the batch's composition, solved exactly as the planner
 * solves a recipe (the same solver, activity model and temperatures): pH at the temperature
 * of use and at the bench, the meter reading at adjustment (part volume, bench temperature),
 * ionic strength, ideal osmolarity and conductivity. Fed the planned amounts it gives the
 * planner's target back (the round trip the tests hold to 0.001 pH). On the stock route the
 * made solution is the stock; the finished buffer is the stock diluted by its fold.
 * Each check compares with the plan against a tolerance the user sets (fields `tolerance.*`).
 */
import { scaleComposition } from '../capacity';
import { withConditions } from '../composition';
import { conductivityAt, conductivityOf } from '../conductivity';
import { MESSAGES } from '../errors';
import { readNumberField, requireNumberField } from '../input';
import { SubstanceLibrary, defaultLibrary } from '../library/lookup';
import { idealOsmolarity } from '../osmolarity';
import { DEFAULT_PKA_UNCERTAINTY } from '../planner/plan';
import { RecipePlan } from '../planner/types';
import { solvePh, speciate } from '../speciation';
import { withTitrant } from '../titration';
import { ChemWarning, uniqueWarnings, warning } from '../warnings';
import { AsMadeResult, BatchActuals, BatchTolerances, ComponentCheck, QuantityCheck } from './types';
import { madeVolumeMlOf, readWeighed, titrantOf, weighedComposition } from './weighed';

/** A bench temperature this far from the plan's moves nothing worth saying, °C (a lab thermometer's reading, common practice). */
export const BENCH_TEMPERATURE_SLACK_C = 0.5;
/** The meter reading moves by less than this with temperature: not worth a warning (a bench meter's resolution, common practice). */
export const METER_RESOLUTION_PH = 0.01;

/** The tolerances, read and defaulted from their declarations. */
export function readTolerances(t: BatchTolerances = {}): { ph: number; concentrationPercent: number; conductivityPercent: number; meterPh: number } {
  return {
    ph: requireNumberField('tolerance.ph', t.ph),
    concentrationPercent: requireNumberField('tolerance.concentrationPercent', t.concentrationPercent),
    conductivityPercent: requireNumberField('tolerance.conductivityPercent', t.conductivityPercent),
    meterPh: requireNumberField('tolerance.meterPh', t.meterPh),
  };
}

/** The plan's predicted osmolality, mOsm/kg (the activity model's osmotic coefficient), when it is a number. */
export function osmolalityOf(plan: RecipePlan): number | undefined {
  const value = plan.predictions.osmolalityMosmKg;
  return Number.isFinite(value) ? value : undefined;
}

const percentOff = (value: number, planned: number) => (planned === 0 ? (value === 0 ? 0 : Infinity) : ((value - planned) / planned) * 100);

/**
 * Checks a batch as made against its plan.
 *
 * @param plan - the planner's answer for the recipe
 * @param actuals - what was weighed, poured, made up and read
 * @param tolerances - acceptance limits (defaults: pH ± 0.05, amounts ± 2 %, conductivity ± 5 %, meter ± 0.03 pH)
 * @param library - the library the plan was made with (user substances included)
 * @returns concentrations, predictions, checks with pass/fail, and warnings that explain deviations
 * @throws ChemError invalid-input naming the field (`actual.weighed[0].grams`, `actual.titrantMl`, …)
 * @example asMade(plan, { weighed: [{ form: 'HEPES free acid', grams: 2.979 }], titrantMl: 5.6 }).pass //=> true or false
 */
export function asMade(plan: RecipePlan, actuals: BatchActuals, tolerances: BatchTolerances = {}, library: SubstanceLibrary = defaultLibrary()): AsMadeResult {
  const tol = readTolerances(tolerances);
  const a = actuals ?? ({ weighed: [] } as BatchActuals);
  const plannedMadeMl = madeVolumeMlOf(plan);
  const madeVolumeMl = readNumberField('actual.finalVolumeMl', a.finalVolumeMl) ?? plannedMadeMl;
  const benchT = readNumberField('actual.benchTemperatureC', a.benchTemperatureC) ?? plan.meter.benchTemperatureC;
  const useT = plan.predictions.useTemperatureC;
  const fold = plan.stock?.fold ?? 1;
  const { items, warnings } = readWeighed(plan, a.weighed, library);
  const w: ChemWarning[] = [...warnings];

  let made = weighedComposition(plan, items, madeVolumeMl, useT, library);
  let titrant: AsMadeResult['titrant'];
  const t = titrantOf(plan, library);
  if (t && plan.titration) {
    const ml = requireNumberField('actual.titrantMl', a.titrantMl);
    const stockM = readNumberField('actual.titrantConcentrationM', a.titrantConcentrationM) ?? plan.titration.stockM;
    if (Math.abs(stockM - plan.titration.stockM) > (plan.titration.tolerancePercent / 100) * plan.titration.stockM) {
      w.push(warning('stockOffNominal', MESSAGES.stockOffNominal(plan.titration.stockM, stockM, plan.titration.tolerancePercent), 'actual.titrantConcentrationM'));
    }
    const actualM = (ml * stockM) / madeVolumeMl;
    made = withTitrant(made, t.titrant, actualM);
    const plannedMm = plan.components.find((c) => c.role === 'titrant')?.concentrationMm ?? 0;
    titrant = { name: t.form.name, millilitres: ml, stockM, plannedMm, actualMm: actualM * 1000, deviationPercent: percentOff(actualM * 1000, plannedMm) };
  }

  const finished = fold === 1 ? made : scaleComposition(made, 1 / fold);
  const result = speciate(finished);
  const kappa = conductivityOf(result);
  const kappa25 = useT === 25 ? kappa : conductivityAt(finished, 25);
  const part = plan.meter.partVolumeFraction;
  const meterPh = solvePh(withConditions(scaleComposition(made, 1 / part), benchT));
  // Osmolality needs an osmotic coefficient from an activity model that gives one; when the plan
  // predicts it, the batch's follows at the plan's coefficient, scaled by the particles made.
  const plannedOsmolality = osmolalityOf(plan);
  const idealMosm = idealOsmolarity(result) * 1000;
  const predictions = {
    ...(plannedOsmolality === undefined ? {} : { osmolalityMosmPerKg: (plannedOsmolality * idealMosm) / plan.predictions.idealOsmolarityMosm }),
    pHAtUse: result.pH,
    pHAtBench: solvePh(withConditions(finished, benchT)),
    meterPh,
    ionicStrengthM: result.ionicStrengthM,
    idealOsmolarityMosm: idealMosm,
    conductivityMsPerCm: kappa.conductivityMsPerCm,
    conductivity25MsPerCm: kappa25.conductivityMsPerCm,
  };

  if (Math.abs(benchT - plan.meter.benchTemperatureC) > BENCH_TEMPERATURE_SLACK_C) {
    // Where the meter should have read at this bench temperature for the planned solution.
    const planned = scaleComposition(plan.composition, fold / part);
    const endPoint = solvePh(withConditions(planned, benchT));
    if (Math.abs(endPoint - plan.meter.pH) >= METER_RESOLUTION_PH) {
      w.push(warning('benchTemperatureOffPlan', MESSAGES.benchTemperatureOffPlan(benchT, plan.meter.benchTemperatureC, endPoint, plan.meter.pH), 'actual.benchTemperatureC'));
    }
  }

  const components: ComponentCheck[] = items.map((x) => {
    const actualMm = (x.moles / (madeVolumeMl / 1000)) * 1000;
    const plannedMm = x.planned?.concentrationMm ?? 0;
    const deviationPercent = percentOff(actualMm, plannedMm);
    return {
      role: x.planned?.role ?? 'not planned',
      name: x.form.name,
      plannedName: x.planned?.name ?? '',
      plannedMm,
      actualMm,
      deviationPercent,
      tolerancePercent: tol.concentrationPercent,
      pass: Math.abs(deviationPercent) <= tol.concentrationPercent,
    };
  });

  const checks: QuantityCheck[] = [];
  const phCheck = (key: string, label: string, value: number): QuantityCheck => ({
    key,
    label,
    unit: 'pH',
    planned: plan.targetPh,
    value,
    deviation: value - plan.targetPh,
    tolerance: tol.ph,
    pass: Math.abs(value - plan.targetPh) <= tol.ph,
  });
  checks.push(phCheck('pHAtUse', `pH at ${useT} °C, as made`, predictions.pHAtUse));
  const finalPh = readNumberField('actual.finalPh', a.finalPh);
  if (finalPh !== undefined) checks.push(phCheck('measuredPhAtUse', `pH at ${useT} °C, measured`, finalPh));
  const meterRead = readNumberField('actual.meterPh', a.meterPh);
  if (meterRead !== undefined) {
    // The band of a reading: the meter's own tolerance and the pKa's uncertainty (which moves a buffer's pH about one for one).
    const band = tol.meterPh + (plan.titration?.pKaUncertainty ?? DEFAULT_PKA_UNCERTAINTY);
    const ok = Math.abs(meterRead - meterPh) <= band;
    checks.push({
      key: 'meterReading',
      label: `meter at ${benchT} °C, recorded against as made`,
      unit: 'pH',
      planned: meterPh,
      value: meterRead,
      deviation: meterRead - meterPh,
      tolerance: band,
      pass: ok,
    });
    if (!ok) w.push(warning('readingOffAsMade', MESSAGES.readingOffAsMade(meterRead, meterPh, band), 'actual.meterPh'));
  }
  const kappaCheck = (key: string, label: string, value: number): QuantityCheck => {
    const planned = plan.predictions.conductivity25MsPerCm;
    const deviation = percentOff(value, planned);
    return { key, label, unit: 'mS/cm', planned, value, deviation, tolerance: tol.conductivityPercent, pass: Math.abs(deviation) <= tol.conductivityPercent };
  };
  checks.push(kappaCheck('conductivity25', 'conductivity at 25 °C, as made', predictions.conductivity25MsPerCm));
  const kappaRead = readNumberField('actual.conductivity25MsPerCm', a.conductivity25MsPerCm);
  if (kappaRead !== undefined) checks.push(kappaCheck('measuredConductivity25', 'conductivity at 25 °C, measured', kappaRead));

  w.push(...result.warnings, ...kappa.warnings);
  return {
    pass: components.every((c) => c.pass) && checks.every((c) => c.pass),
    components,
    ...(titrant ? { titrant } : {}),
    predictions,
    checks,
    warnings: uniqueWarnings(w),
    benchTemperatureC: benchT,
    madeVolumeMl,
    composition: finished,
  };
}
