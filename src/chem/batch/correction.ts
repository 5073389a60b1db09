/**
 * The correction at the bench: from the plan, what has gone in so far and what the meter
 * reads now, how much titrant (or counter-titrant) to add next.
 *
 * Method: the weighed forms (as planned, or as actually weighed) in the volume now, at the
 * temperature now, are solved with the titrant added so far: that is the reading expected.
 * Its band is the meter's tolerance plus what the pKa uncertainty and the stock's tolerance
 * move it by. The end point is the titrant amount that brings the weighed forms, made up to
 * volume, to the target pH at the temperature of use; the meter's end-point reading is that
 * solution at this volume and temperature. The solution is what it is: the titrant amount
 * the reading implies (the solver, from the charge balance at the reading) replaces what was
 * added, so any offset — stock, weighing, temperature, meter — is carried in it; the next
 * amount is end point minus implied. Past the end point, the counter-titrant amount comes
 * from the charge balance at the end-point reading. When the reading is off the band, each
 * likely cause is tried alone (a stock strength, another hydrate, a temperature, a meter
 * offset) and those that explain the reading are listed with the value that fits.
 */
import { scaleComposition } from '../capacity';
import { Composition, withConditions } from '../composition';
import { ChemError, MESSAGES } from '../errors';
import { readNumberField, readTextField, requireNumberField } from '../input';
import { SubstanceLibrary, defaultLibrary } from '../library/lookup';
import { titrantFromForm } from '../library/titrant';
import { DEFAULT_PKA_UNCERTAINTY, FIRST_PORTION_SHARE } from '../planner/plan';
import { RecipePlan } from '../planner/types';
import { solvePh } from '../speciation';
import { Titrant, titrantForPh, withTitrant } from '../titration';
import { ChemWarning, warning } from '../warnings';
import { BENCH_TEMPERATURE_SLACK_C, METER_RESOLUTION_PH } from './asMade';
import { BenchCorrection, BenchState, LikelyCause } from './types';
import { WeighedItem, madeVolumeMlOf, plannedAsWeighed, otherForms, readWeighed, shiftBuffer, titrantOf, weighedComposition } from './weighed';

/** Off the plan, the first portion is this share of the next amount: the model was wrong once, so approach in halves (our rule). */
export const OFF_PLAN_PORTION_SHARE = 0.5;
/** A stock cause is listed only for an effective strength within this factor of the stated one (beyond it, a mix-up rather than a weak stock). */
export const STOCK_CAUSE_RANGE = 0.5;
/** Temperatures tried for a temperature cause, °C (the range a bench solution can be at). */
const TEMPERATURE_CAUSE_C = [0, 60] as const;

/** The counter-titrant: the one named, or HCl after a base and NaOH after an acid, at the titrant's strength. */
function counterOf(state: BenchState, plan: RecipePlan, stockM: number, library: SubstanceLibrary): { name: string; titrant: Titrant; stockM: number } {
  const named = readTextField('counterTitrant.form', state.counterTitrant?.form);
  const name = named ?? (plan.titration!.direction === 'raises' ? 'hydrochloric acid' : 'sodium hydroxide');
  const form = library.findForm(name, 'counterTitrant.form');
  const m = readNumberField('counterTitrant.concentrationM', state.counterTitrant?.concentrationM) ?? stockM;
  return { name: form.name, titrant: titrantFromForm(form, library, 'counterTitrant.form'), stockM: m };
}

/** Titrant (mol/L of `start`) that the reading implies; a typed error when no amount explains it. */
function impliedTitrantM(start: Composition, t: Titrant, readingPh: number, name: string, direction: string): number {
  try {
    return titrantForPh(start, t, readingPh).concentrationM;
  } catch (e) {
    if (!(e instanceof ChemError) || e.kind !== 'infeasible-target') throw e;
    const startPh = solvePh(start);
    throw new ChemError(
      'infeasible-target',
      'readingUnexplained',
      MESSAGES.readingUnexplained(readingPh, startPh, name, direction),
      'reading.ph',
      direction === 'raises' ? `a reading above pH ${startPh.toFixed(2)}` : `a reading below pH ${startPh.toFixed(2)}`,
    );
  }
}

/** A temperature in [0, 60] °C at which the composition reads `readingPh`, by bisection; undefined when none does. */
function temperatureFitting(c: Composition, readingPh: number): number | undefined {
  let [lo, hi]: number[] = [...TEMPERATURE_CAUSE_C];
  const g = (t: number) => solvePh(withConditions(c, t)) - readingPh;
  let glo = g(lo);
  if (glo * g(hi) > 0) return undefined;
  for (let i = 0; i < 40; i++) {
    const mid = 0.5 * (lo + hi);
    const gm = g(mid);
    if (gm * glo > 0) [lo, glo] = [mid, gm];
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * What to add next at the bench.
 *
 * @param plan - the planner's answer (it must titrate)
 * @param state - titrant added so far, the reading now, its temperature and the volume now
 * @param library - the library the plan was made with
 * @returns the next amount, a safe first portion, the end-point reading, and, off the plan, the likely causes
 * @throws ChemError infeasible-target: `nothingToTitrate` (no titrant in the plan), `readingUnexplained` (no amount of titrant gives the reading), `correctionTooLarge` (it will not fit in the volume left); invalid-input naming the field
 * @example benchCorrection(plan, { titrantMl: 4, readingPh: 7.1 }).nextMl //=> mL of titrant still to add
 */
export function benchCorrection(plan: RecipePlan, state: BenchState, library: SubstanceLibrary = defaultLibrary()): BenchCorrection {
  const t = titrantOf(plan, library);
  if (!t || !plan.titration) throw new ChemError('infeasible-target', 'nothingToTitrate', MESSAGES.nothingToTitrate(plan.route), 'route', 'a recipe that titrates');
  const tp = plan.titration;
  const s = state ?? ({} as BenchState);
  const addedMl = requireNumberField('actual.titrantMl', s.titrantMl);
  const stockM = readNumberField('actual.titrantConcentrationM', s.titrantConcentrationM) ?? tp.stockM;
  const readingPh = requireNumberField('reading.ph', s.readingPh);
  const temperatureC = readNumberField('reading.temperatureC', s.temperatureC) ?? plan.meter.benchTemperatureC;
  const volumeMl = readNumberField('reading.volumeMl', s.volumeMl) ?? plan.meter.partVolumeMl;
  const meterTol = requireNumberField('tolerance.meterPh', s.meterTolerancePh);
  const { items, warnings: weighWarnings } = readWeighed(plan, s.weighed ?? plannedAsWeighed(plan), library);
  const warnings: ChemWarning[] = [...weighWarnings];
  const madeMl = madeVolumeMlOf(plan);
  const useT = plan.predictions.useTemperatureC;
  const volumeL = volumeMl / 1000;

  // The end point: titrant that brings the weighed forms, made up to volume, to the target at the temperature of use.
  const fold = plan.stock?.fold ?? 1;
  const madeAtUse = weighedComposition(plan, items, madeMl, useT, library);
  const endPointPhAtUse = fold === 1 ? plan.targetPh : solvePh(scaleComposition(plan.composition, fold));
  const endMol = titrantForPh(madeAtUse, t.titrant, endPointPhAtUse).concentrationM * (madeMl / 1000);

  const startNow = weighedComposition(plan, items, volumeMl, temperatureC, library);
  const now = (mol: number, c: Composition = startNow) => withTitrant(c, t.titrant, mol / volumeL);
  const addedMol = (addedMl / 1000) * stockM;
  const expectedPh = solvePh(now(addedMol));
  const endPointPh = solvePh(now(endMol));
  if (Math.abs(temperatureC - plan.meter.benchTemperatureC) > BENCH_TEMPERATURE_SLACK_C) {
    const endPointAtPlannedT = solvePh(withConditions(now(endMol), plan.meter.benchTemperatureC));
    if (Math.abs(endPointPh - endPointAtPlannedT) >= METER_RESOLUTION_PH) {
      warnings.push(
        warning('benchTemperatureOffPlan', MESSAGES.benchTemperatureOffPlan(temperatureC, plan.meter.benchTemperatureC, endPointPh, endPointAtPlannedT), 'reading.temperatureC'),
      );
    }
  }

  // The band: the meter, the pKa uncertainty and the stock tolerance, each as the pH it moves the expected reading by.
  const u = tp.pKaUncertainty ?? DEFAULT_PKA_UNCERTAINTY;
  const pKaEffect = Math.abs(solvePh(withTitrant(shiftBuffer(startNow, plan.buffer, u), t.titrant, addedMol / volumeL)) - expectedPh);
  const stockEffect = Math.abs(solvePh(now(addedMol * (1 + tp.tolerancePercent / 100))) - expectedPh);
  const bandPh = meterTol + pKaEffect + stockEffect;
  const offPlan = Math.abs(readingPh - expectedPh) > bandPh;

  const impliedMol = impliedTitrantM(startNow, t.titrant, readingPh, t.form.name, tp.direction) * volumeL;
  const causes: LikelyCause[] = [];
  if (offPlan) {
    warnings.push(warning('readingOffPlan', MESSAGES.readingOffPlan(readingPh, expectedPh, bandPh), 'reading.ph'));
    const fitTol = meterTol + pKaEffect;
    if (addedMol > 0) {
      const factor = impliedMol / addedMol;
      if (Math.abs(factor - 1) > tp.tolerancePercent / 100 && Math.abs(factor - 1) <= STOCK_CAUSE_RANGE) {
        const fits = stockM * factor;
        causes.push({
          cause: 'stock concentration',
          fits,
          warning: warning('causeStockConcentration', MESSAGES.causeStockConcentration(fits, stockM), 'actual.titrantConcentrationM'),
        });
      }
    }
    for (const item of items) {
      if (!item.planned || item.planned.role === 'salt') continue;
      // Another hydrate, or another form of the buffer, weighed by the planned grams.
      for (const { form: other, hydrate } of otherForms(item.form, library)) {
        const swapped: WeighedItem[] = items.map((x) => (x === item ? { ...x, form: other, moles: (x.moles * x.form.molarMass) / other.molarMass } : x));
        const ph = solvePh(now(addedMol, weighedComposition(plan, swapped, volumeMl, temperatureC, library)));
        if (Math.abs(ph - readingPh) > fitTol) continue;
        causes.push(
          hydrate
            ? { cause: 'hydrate', fits: other.name, warning: warning('causeHydrate', MESSAGES.causeHydrate(item.form.name, other.name), 'actual.weighed') }
            : { cause: 'salt form', fits: other.name, warning: warning('causeSaltForm', MESSAGES.causeSaltForm(item.form.name, other.name), 'actual.weighed') },
        );
      }
    }
    const fittedC = temperatureFitting(now(addedMol), readingPh);
    if (fittedC !== undefined && Math.abs(fittedC - temperatureC) > BENCH_TEMPERATURE_SLACK_C) {
      causes.push({ cause: 'temperature', fits: fittedC, warning: warning('causeTemperature', MESSAGES.causeTemperature(fittedC, temperatureC), 'reading.temperatureC') });
    }
    const offset = readingPh - expectedPh;
    causes.push({ cause: 'calibration', fits: offset, warning: warning('causeCalibration', MESSAGES.causeCalibration(offset, readingPh), 'reading.ph') });
    warnings.push(...causes.map((c) => c.warning));
  }

  const share = offPlan ? OFF_PLAN_PORTION_SHARE : FIRST_PORTION_SHARE;
  const base = { endPointPh, expectedPh, readingPh, bandPh, offPlan, effectiveTitrantMl: (impliedMol / stockM) * 1000, causes };
  const roomMl = madeMl - volumeMl;
  if (Math.abs(readingPh - endPointPh) <= meterTol) {
    warnings.push(warning('benchOnTarget', MESSAGES.benchOnTarget(readingPh, meterTol), 'reading.ph'));
    return { action: 'on-target', add: t.form.name, stockM, nextMl: 0, firstPortionMl: 0, ...base, warnings };
  }
  if (endMol > impliedMol) {
    const nextMl = ((endMol - impliedMol) / stockM) * 1000;
    if (nextMl > roomMl)
      throw new ChemError(
        'infeasible-target',
        'correctionTooLarge',
        MESSAGES.correctionTooLarge(nextMl, roomMl, `${stockM} M ${t.form.name}`),
        'actual.titrantConcentrationM',
        `a stock strong enough for ${roomMl.toPrecision(3)} mL`,
      );
    return { action: 'add', add: t.form.name, stockM, nextMl, firstPortionMl: share * nextMl, ...base, warnings };
  }
  const counter = counterOf(s, plan, stockM, library);
  warnings.push(warning('overshoot', MESSAGES.overshoot(t.form.name, counter.name), 'reading.ph'));
  const counterMol = impliedTitrantM(now(impliedMol), counter.titrant, endPointPh, counter.name, tp.direction === 'raises' ? 'lowers' : 'raises') * volumeL;
  const nextMl = (counterMol / counter.stockM) * 1000;
  if (nextMl > roomMl)
    throw new ChemError(
      'infeasible-target',
      'correctionTooLarge',
      MESSAGES.correctionTooLarge(nextMl, roomMl, `${counter.stockM} M ${counter.name}`),
      'counterTitrant.concentrationM',
      `a stock strong enough for ${roomMl.toPrecision(3)} mL`,
    );
  return { action: 'counter', add: counter.name, stockM: counter.stockM, nextMl, firstPortionMl: share * nextMl, ...base, warnings };
}
