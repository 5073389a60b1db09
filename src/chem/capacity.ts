/**
 * Buffer capacity, and how the pH answers to a load of acid or base, dilution and
 * temperature.
 */
import { Composition, PreparedComposition, prepare, systemAt, withConditions } from './composition';
import { requireNumber } from './errors';
import { SpeciationResult, speciate, solvePrepared } from './speciation';
import { PitzerStart } from './pitzer/iteration';
import { strongBaseForPh } from './titration';

/** pH step for the central difference β = dC_b/dpH. Small enough that curvature error is < 1e-6 relative for any buffer, large enough to stay clear of rounding. */
const CAPACITY_STEP_PH = 1e-3;

/** Buffer capacity at a composition's own pH. */
export interface Capacity {
  /** The composition's pH. */
  readonly pH: number;
  /** β = dC_b/dpH, mol/L per pH unit (strong base as Na⁺ or strong acid as Cl⁻). */
  readonly betaMPerPh: number;
  /** mM of strong base that raises the pH by 0.1. */
  readonly baseMmPerTenthPh: number;
  /** mM of strong acid that lowers the pH by 0.1. */
  readonly acidMmPerTenthPh: number;
}

/**
 * Buffer capacity of a composition at its own pH, with the composition's activity model.
 *
 * Method: β by central difference of the strong base needed for pH ± 0.001; the 0.1-pH
 * figures are exact differences (not β × 0.1), since capacity changes over 0.1 pH.
 * Practitioners read "mM of strong acid or base per 0.1 pH" more easily than β.
 *
 * @param composition - the solution
 * @returns pH, β in mol/L per pH, and mM of base and of acid per 0.1 pH
 */
export function capacity(composition: Composition): Capacity {
  const p = prepare(composition);
  return capacityOfPrepared(p, solvePrepared(p).pH);
}

/**
 * Buffer capacity of a prepared composition whose pH is already known (saves a solve
 * where the caller has one; see capacity for the method).
 *
 * @param p - the prepared composition
 * @param pH - its solved pH
 */
export function capacityOfPrepared(p: PreparedComposition, pH: number): Capacity {
  // With the Pitzer model each amount's γ iteration starts from the last amount's γ (0.002–0.2 pH away): one round fewer on average.
  let near: PitzerStart | undefined;
  const at = (x: number) => {
    const found = strongBaseForPh(p, x, near);
    near = found.pitzer ?? near;
    return found.amount;
  };
  // At its own solved pH the composition needs no strong base or acid: the amount there is the
  // solve's residual (about 1e-13 mol/L), so it is taken as zero rather than solved for (one of five amount solves).
  const here = 0;
  const beta = (at(pH + CAPACITY_STEP_PH) - at(pH - CAPACITY_STEP_PH)) / (2 * CAPACITY_STEP_PH);
  return {
    pH,
    betaMPerPh: beta,
    baseMmPerTenthPh: (at(pH + 0.1) - here) * 1000,
    acidMmPerTenthPh: (here - at(pH - 0.1)) * 1000,
  };
}

/**
 * Ideal (γ = 1) buffer capacity by the closed form of Van Slyke, at a given pH.
 *
 * Method: β = ln10 (h + Kw/h + Σ C·var(n)), var(n) the variance of the number of protons
 * lost per molecule (for one step: C·Ka·h/(Ka + h)²). D. D. Van Slyke, J. Biol. Chem. 52
 * (1922) 525. Strong ions do not enter.
 *
 * @param composition - systems and temperature (the activity model is ignored)
 * @param pH - pH at which to evaluate
 * @returns β in mol/L per pH
 */
export function idealCapacityAt(composition: Composition, pH: number): number {
  const p = prepare(withConditions(composition, composition.temperatureC, 'ideal'));
  const h = Math.pow(10, -pH);
  let beta = h + p.kw / h;
  for (let j = 0; j < p.totals.length; j++) {
    const first = p.firstStep[j];
    let t = 1;
    let sum = 1;
    let s1 = 0;
    let s2 = 0;
    for (let k = 1; k <= p.stepCount[j]; k++) {
      t *= p.ka[first + k - 1] / h;
      sum += t;
      s1 += k * t;
      s2 += k * k * t;
    }
    const nb = s1 / sum;
    beta += p.totals[j] * (s2 / sum - nb * nb);
  }
  return Math.LN10 * beta;
}

/** A load of strong acid or base, mol/L of solution. */
export interface AcidBaseLoad {
  /** Strong base added, mol/L (as `baseCation`, default Na⁺). */
  readonly baseM?: number;
  /** Strong acid added, mol/L (as `acidAnion`, default Cl⁻). */
  readonly acidM?: number;
  readonly baseCation?: string;
  readonly acidAnion?: string;
}

/**
 * The solution after a load of strong acid and/or base (no volume change).
 *
 * @param composition - the solution
 * @param load - strong base and acid in mol/L
 * @returns the speciation after the load
 */
export function afterLoad(composition: Composition, load: AcidBaseLoad): SpeciationResult {
  const baseM = requireNumber('load.baseM', load.baseM ?? 0, 0, 20);
  const acidM = requireNumber('load.acidM', load.acidM ?? 0, 0, 20);
  const ions: Record<string, number> = { ...(composition.strongIons ?? {}) };
  const cation = load.baseCation ?? 'Na+';
  const anion = load.acidAnion ?? 'Cl-';
  ions[cation] = (ions[cation] ?? 0) + baseM;
  ions[anion] = (ions[anion] ?? 0) + acidM;
  return speciate({ systems: composition.systems, strongIons: ions, temperatureC: composition.temperatureC, activityModel: composition.activityModel });
}

/** Largest dilution factor accepted. */
export const MAX_DILUTION_FACTOR = 1e6;

/**
 * The solution diluted with pure water by a factor (10 = one part plus nine of water).
 *
 * @param composition - the solution
 * @param factor - final volume over initial volume, ≥ 1
 * @returns the speciation after dilution
 */
export function afterDilution(composition: Composition, factor: number): SpeciationResult {
  requireNumber('factor', factor, 1, MAX_DILUTION_FACTOR, `1 to ${MAX_DILUTION_FACTOR}`);
  return speciate(scaleComposition(composition, 1 / factor));
}

/** Every concentration of a composition multiplied by `scale`. */
export function scaleComposition(composition: Composition, scale: number): Composition {
  const strongIons: Record<string, number> = {};
  const given = composition.strongIons;
  // A key loop rather than Object.entries: no [name, value] pair allocated per ion (the planner scales several compositions a plan).
  if (given) for (const name of Object.keys(given)) strongIons[name] = given[name] * scale;
  return {
    systems: composition.systems.map((s) => systemAt(s, s.totalM * scale)),
    strongIons,
    temperatureC: composition.temperatureC,
    activityModel: composition.activityModel,
  };
}

/**
 * The same composition at another temperature (concentrations unchanged; the small
 * change of volume with temperature is neglected).
 *
 * @param composition - the solution
 * @param temperatureC - new temperature, °C
 */
export function atTemperature(composition: Composition, temperatureC: number): SpeciationResult {
  return speciate(withConditions(composition, temperatureC));
}
