/**
 * Speciation: the pH and every species' concentration and activity for a composition.
 *
 * Method: the charge balance
 *   f(x) = Σ_strong z·c + [H⁺] − [OH⁻] + Σ_systems C·(z₀ − n̄(a_H)) = 0,   x = ln a_H,
 * is strictly increasing in x at fixed ionic strength (its derivative is
 * [H⁺] + [OH⁻] + Σ C·var(n) > 0), so a Newton iteration safeguarded by a bracket in
 * pH [−2, 16] (bisection whenever Newton would leave it) always converges. Mixed constants
 * K′ = Ka·γ(HA)/γ(A) follow from the activity model; the ionic strength is iterated to
 * self-consistency around the pH solve (each pH solve warm-starts from the last).
 * pH = −log10 a(H⁺) (Buck et al., IUPAC 2002).
 *
 * Special cases: the ideal model needs a single pH solve; an all-strong composition still
 * equilibrates water.
 *
 * References: docs/science.md (methods and conventions); R. G. Bates, Determination of pH (1973), ch. 3–4.
 */
import { ionicStrengthFactor, ACTIVITY_MODEL_LIMIT_M, ACTIVITY_MODEL_NAMES } from './activity';
import { Composition, PreparedComposition, prepare } from './composition';
import { ChemError, MESSAGES } from './errors';
import { ChemWarning, warning } from './warnings';
import { selfConsistentIonicStrength } from './ionicStrength';
import { STRONG_IONS, findStrongIon } from './strongIons';
import { pKw } from './water';

/** Lowest pH the bracket covers: a(H⁺) = 10^−16. Beyond any aqueous buffer; a target outside is refused. */
export const PH_BRACKET_HIGH = 16;
/** Highest a(H⁺) the bracket covers: pH −2. */
export const PH_BRACKET_LOW = -2;
/** Newton/bisection steps allowed in one pH solve (bisection alone needs ~45 for the bracket at 1e-12). */
const MAX_PH_ITERATIONS = 200;
/** A Newton step in ln a(H⁺) this small (relative) is taken and the solve ends: the error left is ~(step)², below 1e-13. */
const NEWTON_ACCEPT = 1e-7;
const LN_AH_MIN = -PH_BRACKET_HIGH * Math.LN10;
const LN_AH_MAX = -PH_BRACKET_LOW * Math.LN10;

// Results of `evaluate`, kept in module scope so the hot loop allocates nothing.
let evF = 0;
let evD = 0;
let evI2 = 0;
/** d(2I)/d ln a_H, so that 2I can be carried to a point reached by a final Newton step without evaluating there. */
let evDI2 = 0;

/**
 * Charge balance f, its derivative df/d ln a_H, and 2·I of all non-strong species, at a_H.
 * `kp` are the mixed constants at the current ionic strength; `g1` is γ of a 1-charge ion.
 */
function evaluate(p: PreparedComposition, kp: number[], aH: number, g1: number): void {
  const hc = aH / g1;
  const ohc = p.kw / (aH * g1);
  let f = p.strongCharge + hc - ohc;
  let d = hc + ohc;
  let i2 = hc + ohc;
  let di2 = hc - ohc;
  const inv = 1 / aH;
  const totals = p.totals;
  const n = totals.length;
  for (let j = 0; j < n; j++) {
    const c = totals[j];
    if (c === 0) continue;
    const first = p.firstStep[j];
    const steps = p.stepCount[j];
    const z = p.z0[j];
    // Charges are summed species by species (not as z − n̄) so that a system sitting in
    // its neutral form contributes no rounding from cancelling large terms.
    let t = 1;
    let sum = 1;
    let s1 = 0;
    let s2 = 0;
    let q = z;
    let q2 = z * z;
    let kq2 = 0;
    for (let k = 1; k <= steps; k++) {
      t *= kp[first + k - 1] * inv;
      const zk = z - k;
      sum += t;
      s1 += k * t;
      s2 += k * k * t;
      q += zk * t;
      q2 += zk * zk * t;
      kq2 += k * zk * zk * t;
    }
    const w = c / sum;
    const nb = s1 / sum;
    const meanQ2 = q2 / sum;
    f += w * q;
    d += w * s2 - c * nb * nb;
    i2 += c * meanQ2;
    // Weights go as a_H^−k, so d⟨g⟩/d ln a_H = −(⟨k·g⟩ − ⟨k⟩⟨g⟩).
    di2 -= w * kq2 - c * nb * meanQ2;
  }
  evF = f;
  evD = d;
  evI2 = i2;
  evDI2 = di2;
}

/** Sets the mixed constants for an ionic strength; returns γ₁. */
function conditionalConstants(p: PreparedComposition, ionicStrengthM: number, kp: number[]): number {
  const lnG = -p.a * ionicStrengthFactor(p.model, ionicStrengthM) * Math.LN10;
  const ka = p.ka;
  const zd = p.zSquaredDiff;
  for (let s = 0; s < ka.length; s++) kp[s] = ka[s] * Math.exp(lnG * zd[s]);
  return Math.exp(lnG);
}

/** Solves f(x) = 0 at fixed constants from a warm start; returns x = ln a_H and counts iterations. */
function solveChargeBalance(p: PreparedComposition, kp: number[], g1: number, x0: number, counter: { n: number }): number {
  let lo = LN_AH_MIN;
  let hi = LN_AH_MAX;
  let loChecked = false;
  let hiChecked = false;
  let x = x0;
  for (let it = 0; it < MAX_PH_ITERATIONS; it++) {
    counter.n++;
    evaluate(p, kp, Math.exp(x), g1);
    const f = evF;
    if (f === 0) return x;
    if (f < 0) {
      lo = x;
      loChecked = true;
    } else {
      hi = x;
      hiChecked = true;
    }
    const newtonStep = f / evD;
    let next = x - newtonStep;
    // Newton converges quadratically here: once a step is below 1e-7, the next would be ~1e-14,
    // so the step is taken and accepted without paying for another evaluation.
    const converged = Math.abs(newtonStep) <= NEWTON_ACCEPT * Math.max(1, Math.abs(x));
    if (!converged && !(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (converged || next === x) {
      // A root pinned against an edge never seen from the other side is no root at all.
      if ((!loChecked && next <= LN_AH_MIN + 1e-6) || (!hiChecked && next >= LN_AH_MAX - 1e-6)) break;
      evI2 += evDI2 * (next - x);
      return next;
    }
    x = next;
  }
  if (!loChecked || !hiChecked) {
    const detail = loChecked ? 'the composition is more acidic than pH −2 (too much strong acid for this solver)' : 'the composition is more basic than pH 16 (too much strong base for this solver)';
    throw new ChemError('infeasible-target', 'unreachablePh', `No pH between ${PH_BRACKET_LOW} and ${PH_BRACKET_HIGH} balances the charges: ${detail}.`, 'composition');
  }
  throw new ChemError('no-convergence', 'noConvergence', MESSAGES.noConvergence('The pH solve', MAX_PH_ITERATIONS));
}

/** The solved equilibrium state of a prepared composition (the lean result the hot paths use). */
export interface EquilibriumState {
  readonly pH: number;
  /** Ionic strength, mol/L. */
  readonly ionicStrengthM: number;
  /** Activity coefficient of a singly charged ion at that ionic strength. */
  readonly gamma1: number;
  /** Mixed constants K′ per step at that ionic strength (a_H·[A]/[HA]). */
  readonly mixedKa: readonly number[];
  /** Charge-balance evaluations made, and ionic-strength updates made. */
  readonly evaluations: number;
  readonly ionicStrengthIterations: number;
}

/**
 * Solves a prepared composition: pH and ionic strength, self-consistent.
 * Throws ChemError (no-convergence, infeasible-target).
 */
export function solvePrepared(p: PreparedComposition, guessPh = 7): EquilibriumState {
  const kp: number[] = new Array<number>(p.ka.length).fill(0);
  const counter = { n: 0 };
  let x = -guessPh * Math.LN10;
  let g1 = 1;
  let outer = 0;
  const speciesIonicStrength = (ionicStrengthM: number) => {
    outer++;
    g1 = conditionalConstants(p, ionicStrengthM, kp);
    x = solveChargeBalance(p, kp, g1, x, counter);
    return p.strongIonicStrength + 0.5 * evI2;
  };
  let ionicStrength: number;
  if (p.model === 'ideal') {
    ionicStrength = speciesIonicStrength(0);
  } else {
    let start = p.strongIonicStrength;
    for (let j = 0; j < p.totals.length; j++) start += 0.5 * p.totals[j] * p.z0[j] * p.z0[j];
    ionicStrength = selfConsistentIonicStrength(start, speciesIonicStrength, p.ionicStrengthScale, 'The ionic-strength iteration');
  }
  return { pH: -x / Math.LN10, ionicStrengthM: ionicStrength, gamma1: g1, mixedKa: kp, evaluations: counter.n, ionicStrengthIterations: outer };
}

/** One species in a speciation result. */
export interface SpeciesAmount {
  /** Display name, e.g. `H+`, `Na+`, `phosphate 2−`. */
  readonly name: string;
  /** The acid–base system it belongs to, if any. */
  readonly system?: string;
  /** Protons lost from the most protonated form (acid–base species only). */
  readonly protonsLost?: number;
  readonly charge: number;
  readonly concentrationM: number;
  readonly activity: number;
}

/** Per acid–base system: how it is distributed at the solved pH. */
export interface SystemSpeciation {
  readonly name: string;
  readonly totalM: number;
  /** Mean charge per molecule of the system. */
  readonly meanCharge: number;
  /** Fraction of the system in each protonation state, most protonated first. */
  readonly fractions: readonly number[];
  /** Apparent pKa′ of each step at the temperature and ionic strength (pKa′ = −log K′). */
  readonly apparentPKa: readonly number[];
}

/** The full answer for a composition. */
export interface SpeciationResult {
  readonly pH: number;
  readonly temperatureC: number;
  readonly activityModel: string;
  readonly ionicStrengthM: number;
  readonly pKw: number;
  readonly debyeHuckelA: number;
  readonly species: readonly SpeciesAmount[];
  readonly systems: readonly SystemSpeciation[];
  readonly diagnostics: {
    readonly evaluations: number;
    readonly ionicStrengthIterations: number;
    /** Charge-balance residual, mol/L of charge. */
    readonly chargeResidualM: number;
    /** Residual relative to the total ionic charge Σ|z|c. */
    readonly relativeResidual: number;
  };
  readonly warnings: readonly ChemWarning[];
}

/** Formats a charge the way chemists write it: 0, 1+, 2−. */
export function chargeLabel(z: number): string {
  if (z === 0) return '0';
  return `${Math.abs(z)}${z > 0 ? '+' : '−'}`;
}

/**
 * Solves a composition and reports every species.
 *
 * @param composition - systems (mol/L), strong ions (mol/L), temperature (°C), activity model
 * @returns pH, ionic strength, species, per-system fractions, diagnostics and warnings
 * @example speciate({ systems: [{ name: 'acetate', chargeOfMostProtonated: 0, steps: [{ pKa: 4.756 }], totalM: 0.1 }], strongIons: { 'Na+': 0.05 } }).pH // ≈ 4.64
 */
export function speciate(composition: Composition): SpeciationResult {
  const p = prepare(composition);
  const state = solvePrepared(p);
  return report(p, state, composition);
}

/** Builds the full report from a solved state. */
export function report(p: PreparedComposition, state: EquilibriumState, composition: Composition): SpeciationResult {
  const aH = Math.pow(10, -state.pH);
  const g1 = state.gamma1;
  const gammaOf = (z: number) => Math.pow(g1, z * z);
  const species: SpeciesAmount[] = [];
  const hc = aH / g1;
  const ohc = p.kw / (aH * g1);
  species.push({ name: 'H+', charge: 1, concentrationM: hc, activity: aH });
  species.push({ name: 'OH-', charge: -1, concentrationM: ohc, activity: ohc * g1 });
  let residual = p.strongCharge + hc - ohc;
  let totalCharge = hc + ohc;
  for (const name of Object.keys(composition.strongIons ?? {})) {
    const ion = findStrongIon('strongIons', name);
    const c = composition.strongIons![name];
    species.push({ name: ion.name, charge: ion.charge, concentrationM: c, activity: c * gammaOf(ion.charge) });
    totalCharge += Math.abs(ion.charge) * c;
  }
  const systems: SystemSpeciation[] = [];
  composition.systems.forEach((sys, j) => {
    const first = p.firstStep[j];
    const n = p.stepCount[j];
    const weights = [1];
    for (let k = 1; k <= n; k++) weights.push((weights[k - 1] * state.mixedKa[first + k - 1]) / aH);
    const sum = weights.reduce((a, b) => a + b, 0);
    const fractions = weights.map((w) => w / sum);
    let meanCharge = 0;
    fractions.forEach((fr, k) => {
      const z = sys.chargeOfMostProtonated - k;
      const c = fr * sys.totalM;
      meanCharge += fr * z;
      totalCharge += Math.abs(z) * c;
      species.push({ name: `${sys.name} ${chargeLabel(z)}`, system: sys.name, protonsLost: k, charge: z, concentrationM: c, activity: c * gammaOf(z) });
    });
    residual += sys.totalM * meanCharge;
    systems.push({
      name: sys.name,
      totalM: sys.totalM,
      meanCharge,
      fractions,
      apparentPKa: state.mixedKa.slice(first, first + n).map((k) => -Math.log10(k)),
    });
  });
  const warnings = [...p.warnings];
  if (p.model !== 'ideal' && state.ionicStrengthM > ACTIVITY_MODEL_LIMIT_M) {
    warnings.push(warning('beyondActivityModel', MESSAGES.beyondActivityModel(state.ionicStrengthM, ACTIVITY_MODEL_LIMIT_M, ACTIVITY_MODEL_NAMES[p.model]), 'activityModel'));
  }
  return {
    pH: state.pH,
    temperatureC: p.temperatureC,
    activityModel: p.model,
    ionicStrengthM: state.ionicStrengthM,
    pKw: pKw(p.temperatureC),
    debyeHuckelA: p.a,
    species,
    systems,
    diagnostics: {
      evaluations: state.evaluations,
      ionicStrengthIterations: state.ionicStrengthIterations,
      chargeResidualM: residual,
      relativeResidual: totalCharge > 0 ? Math.abs(residual) / totalCharge : 0,
    },
    warnings,
  };
}

/** pH of a composition (the lean call: no species report). */
export function solvePh(composition: Composition): number {
  return solvePrepared(prepare(composition)).pH;
}

export { STRONG_IONS };
