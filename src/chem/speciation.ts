/**
 * Speciation: the pH and every species' concentration and activity for a composition.
 *
 * Method: the charge balance
 *   f(x) = Σ_strong z·c + [H⁺] − [OH⁻] + Σ_systems C·(z₀ − n̄(a_H)) = 0,   x = ln a_H,
 * is strictly increasing in x at fixed ionic strength (its derivative is
 * [H⁺] + [OH⁻] + Σ C·var(n) > 0), so a Newton iteration safeguarded by a bracket in
 * pH [−2, 16] (bisection whenever Newton would leave it) always converges. Mixed constants
 * K′ = Ka·γ(HA)/γ(A) follow from the activity model. With the one-number models the
 * ionic strength is iterated to self-consistency around the pH solve (each pH solve
 * warm-starts from the last); with the Pitzer model (the default) every species' γ is
 * re-evaluated from the species found, on the molal scale and the MacInnes convention,
 * until the γ that move the pH settle (see solvePitzer and docs/activity.md).
 * pH = −log10 a(H⁺) (Buck et al., IUPAC 2002).
 *
 * Special cases: the ideal model needs a single pH solve; an all-strong composition still
 * equilibrates water.
 *
 * References: docs/science.md (methods and conventions); R. G. Bates, Determination of pH (1973), ch. 3–4.
 */
import { integerPower, ionicStrengthFactor, ionicStrengthFactorSlope, ACTIVITY_MODEL_LIMIT_M, ACTIVITY_MODEL_NAMES, PITZER_LIMIT_MOLAL } from './activity';
import { Composition, PreparedComposition, prepare, reportConstants } from './composition';
export { chargeLabel } from './composition';
import { ChemError, MESSAGES } from './errors';
import { ChemWarning, warning } from './warnings';
import { ROUNDING_FLOOR, selfConsistentIonicStrength } from './ionicStrength';
import { PitzerEvaluation, pitzerEvaluate } from './pitzer/model';
import { H_INDEX, OH_INDEX, PitzerLayout, STRONG_START, layoutWith, pitzerLayoutShape } from './pitzer/prepared';
import { PitzerStart, gammaChange, mixedConstants, nextGammas, warmGammas } from './pitzer/iteration';
export type { PitzerStart } from './pitzer/iteration';
import { waterKgPerLitre } from './pitzer/volumes';
import { STRONG_IONS } from './strongIons';

/**
 * n zeros in a packed array of doubles. `new Array(n).fill(0)` leaves a holey array, whose every read in the
 * evaluation loops checks for a hole; pushing a double first keeps the array packed.
 */
function packedZeros(n: number): number[] {
  const a: number[] = [];
  for (let i = 0; i < n; i++) a.push(0.5);
  for (let i = 0; i < n; i++) a[i] = 0;
  return a;
}

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
 * `kp` are the mixed constants at the current activity coefficients; [H⁺] = a_H/gH and
 * [OH⁻] = Kw/(a_H·gOH), so gH and gOH are the molar-scale γ of H⁺ and OH⁻ (γ₁ for the
 * one-number models; γ/(kg water per L) for Pitzer, whose γ are molal).
 */
function evaluate(p: PreparedComposition, kp: number[], aH: number, gH: number, gOH: number): void {
  const hc = aH / gH;
  const ohc = p.kw / (aH * gOH);
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

// Further results of `evaluateCombined`: how f and 2I move with ln γ₁ at fixed a_H.
let evFG = 0;
let evIG = 0;

/**
 * `evaluate` for the one-number models (γ(H⁺) = γ(OH⁻) = γ₁), with two derivatives more for
 * the combined pH/ionic-strength step: ∂f/∂ln γ₁ and ∂(2I)/∂ln γ₁ at fixed a_H. A species of
 * charge z has concentration ∝ γ₁^(−z²) relative to its system's total, so over a system
 * ∂⟨g⟩/∂ln γ₁ = −(⟨z²g⟩ − ⟨z²⟩⟨g⟩); H⁺ and OH⁻ go as 1/γ₁.
 */
function evaluateCombined(p: PreparedComposition, kp: number[], aH: number, g1: number): void {
  const hc = aH / g1;
  const ohc = p.kw / (aH * g1);
  let f = p.strongCharge + hc - ohc;
  let d = hc + ohc;
  let i2 = hc + ohc;
  let di2 = hc - ohc;
  let fg = ohc - hc;
  let ig = -hc - ohc;
  const inv = 1 / aH;
  const totals = p.totals;
  const n = totals.length;
  for (let j = 0; j < n; j++) {
    const c = totals[j];
    if (c === 0) continue;
    const first = p.firstStep[j];
    const steps = p.stepCount[j];
    const z = p.z0[j];
    // Summed species by species, as in `evaluate`.
    let t = 1;
    let sum = 1;
    let s1 = 0;
    let s2 = 0;
    let q = z;
    let q2 = z * z;
    let q3 = z * z * z;
    let q4 = q2 * q2;
    let kq2 = 0;
    for (let k = 1; k <= steps; k++) {
      t *= kp[first + k - 1] * inv;
      const zk = z - k;
      const zk2 = zk * zk;
      sum += t;
      s1 += k * t;
      s2 += k * k * t;
      q += zk * t;
      q2 += zk2 * t;
      q3 += zk2 * zk * t;
      q4 += zk2 * zk2 * t;
      kq2 += k * zk2 * t;
    }
    const w = c / sum;
    const nb = s1 / sum;
    const meanQ = q / sum;
    const meanQ2 = q2 / sum;
    f += w * q;
    d += w * s2 - c * nb * nb;
    i2 += c * meanQ2;
    di2 -= w * kq2 - c * nb * meanQ2;
    fg -= w * q3 - c * meanQ2 * meanQ;
    ig -= w * q4 - c * meanQ2 * meanQ2;
  }
  evF = f;
  evD = d;
  evI2 = i2;
  evDI2 = di2;
  evFG = fg;
  evIG = ig;
}

/** Sets the mixed constants for an ionic strength; returns γ₁. */
function conditionalConstants(p: PreparedComposition, ionicStrengthM: number, kp: number[]): number {
  const g1 = Math.exp(-p.a * ionicStrengthFactor(p.model, ionicStrengthM) * Math.LN10);
  mixedConstantsAt(p, g1, kp);
  return g1;
}

/**
 * Mixed constants K′ = Ka·γ₁^(2z−1) at γ₁, by multiplication: the first step of a system
 * takes γ₁^(2z₀−1), and each further step one factor γ₁⁻² more (its acid is one charge lower).
 */
function mixedConstantsAt(p: PreparedComposition, g1: number, kp: number[]): void {
  const ka = p.ka;
  const inverseSquare = 1 / (g1 * g1);
  for (let j = 0; j < p.firstStep.length; j++) {
    const first = p.firstStep[j];
    const steps = p.stepCount[j];
    let factor = integerPower(g1, p.zSquaredDiff[first]);
    for (let s = first; s < first + steps; s++) {
      kp[s] = ka[s] * factor;
      factor *= inverseSquare;
    }
  }
}

/** Solves f(x) = 0 at fixed constants from a warm start; returns x = ln a_H and counts iterations. */
function solveChargeBalance(p: PreparedComposition, kp: number[], gH: number, gOH: number, x0: number, counter: { n: number }): number {
  let lo = LN_AH_MIN;
  let hi = LN_AH_MAX;
  let loChecked = false;
  let hiChecked = false;
  let x = x0;
  for (let it = 0; it < MAX_PH_ITERATIONS; it++) {
    counter.n++;
    evaluate(p, kp, Math.exp(x), gH, gOH);
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
    const detail = loChecked
      ? 'the composition is more acidic than pH −2 (too much strong acid for this solver)'
      : 'the composition is more basic than pH 16 (too much strong base for this solver)';
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
  /** Charge-balance evaluations made, and ionic-strength (or, for Pitzer, activity-coefficient) updates made. */
  readonly evaluations: number;
  readonly ionicStrengthIterations: number;
  /** Pitzer only: ln γ (molal) of every species in the layout's order, kg of water per litre, molal ionic strength and osmotic coefficient. */
  readonly pitzer?: PitzerState;
}

/** What the Pitzer solve leaves besides the pH; it can start the solve of a neighbouring solution (a PitzerStart). */
export interface PitzerState {
  readonly lnGamma: readonly number[];
  /** The layout's species key (see PitzerLayout). */
  readonly speciesKey: string;
  readonly concentrations: readonly number[];
  readonly waterKgPerL: number;
  readonly ionicStrengthMolal: number;
  readonly osmoticCoefficient: number;
}

/** Largest change of a pH-relevant ln γ (H⁺, OH⁻, buffer species weighted by their share) at which the Pitzer iteration stops: moves a pH by under 1e-10. */
export const PITZER_TOLERANCE = 1e-10;
/** Activity-coefficient updates allowed before giving up (it converges in 4–12). */
export const MAX_PITZER_ITERATIONS = 200;

/**
 * Puts the Pitzer activity coefficients on a pH convention. Single-ion γ are not
 * measurable, so a pH needs a convention; we use MacInnes's: γ(Cl⁻) equals the mean
 * activity coefficient of KCl at the same ionic strength (D. A. MacInnes, J. Am. Chem. Soc.
 * 41 (1919) 1086), the choice of Pitzer-based speciation codes for pH (L. N. Plummer et al.,
 * PHRQPITZ, USGS Water-Resources Investigations Report 88-4153 (1988) (memory)). Unlike the
 * Bates–Guggenheim form that assigns the primary standards, it is defined at any ionic
 * strength; at I ≤ 0.1 the two differ by under 0.005 in pH. Every ln γ_i moves by −z_i·k,
 * with k the gap between that value and the Pitzer γ(Cl⁻) of the same solution (a
 * zero-concentration probe when no chloride is present); mean activity coefficients of
 * neutral combinations do not move.
 */
export function applyPhConvention(layout: PitzerLayout, lnGammaKcl: number, lnGamma: number[]): void {
  const k = lnGammaKcl - lnGamma[layout.chlorideIndex];
  const charges = layout.system.charges;
  for (let i = 0; i < charges.length; i++) lnGamma[i] -= charges[i] * k;
}

/**
 * Concentrations of every acid–base species at a_H with mixed constants kp, written into
 * `conc` at the layout's positions; returns ½Σz²c of them (mol/L).
 */
function systemConcentrations(p: PreparedComposition, layout: PitzerLayout, kp: readonly number[], aH: number, conc: number[]): number {
  let halfZ2 = 0;
  for (let j = 0; j < p.totals.length; j++) {
    const first = p.firstStep[j];
    const steps = p.stepCount[j];
    const start = layout.systemStart[j];
    let t = 1;
    let sum = 1;
    conc[start] = 1;
    for (let k = 1; k <= steps; k++) {
      t *= kp[first + k - 1] / aH;
      conc[start + k] = t;
      sum += t;
    }
    const w = p.totals[j] / sum;
    const z0 = p.z0[j];
    for (let k = 0; k <= steps; k++) {
      const c = conc[start + k] * w;
      conc[start + k] = c;
      halfZ2 += 0.5 * (z0 - k) * (z0 - k) * c;
    }
  }
  return halfZ2;
}

let scratchMolality: number[] = [];
const pitzerCounter = { n: 0 };
const pitzerResult: PitzerEvaluation = { ionicStrength: 0, osmoticCoefficient: 1, lnGammaKcl: 0 };
let scratchNext: number[] = [];
let scratchPreviousL: number[] = [];
let scratchPreviousG: number[] = [];

/**
 * The Pitzer solve: the pH at fixed activity coefficients (the same safeguarded Newton as
 * the other models), then every ion's γ from the species found, repeated until no ln γ moves
 * by more than PITZER_TOLERANCE. Each γ depends weakly on how the buffer is split between
 * its forms, so plain substitution converges; a step is halved whenever the change grows.
 */
function solvePitzer(p: PreparedComposition, layout: PitzerLayout, kp: number[], guessPh: number, warm: PitzerStart | undefined): EquilibriumState {
  const n = layout.speciesCount;
  // Filled by push: a packed array of doubles from the start (new Array(n).fill(0) costs more than this whole loop).
  const conc: number[] = [];
  const lnGamma: number[] = [];
  for (let i = 0; i < n; i++) {
    conc.push(0);
    lnGamma.push(0);
  }
  // Scratch shared by every solve (the solver is synchronous); conc and lnGamma are returned, so they are the solve's own.
  if (scratchMolality.length < n) {
    scratchMolality = new Array<number>(n).fill(0);
    scratchNext = new Array<number>(n).fill(0);
    scratchPreviousL = new Array<number>(n).fill(0);
    scratchPreviousG = new Array<number>(n).fill(0);
  }
  const m = scratchMolality;
  const next = scratchNext;
  const strong = layout.strongConcentrations;
  for (let i = 0; i < strong.length; i++) conc[STRONG_START + i] = strong[i];
  const charges = layout.system.charges;
  // Start from a neighbouring solution's γ when given and fitting; else from Bates–Guggenheim at the ionic strength
  // of the composition as given: the first pH solve then starts close.
  if (!warmGammas(layout, n, warm, lnGamma)) {
    let start = p.strongIonicStrength;
    for (let j = 0; j < p.totals.length; j++) start += 0.5 * p.totals[j] * p.z0[j] * p.z0[j];
    const lnG0 = -p.a * ionicStrengthFactor('bates-guggenheim', start) * Math.LN10;
    for (let i = 0; i < n; i++) lnGamma[i] = lnG0 * charges[i] * charges[i];
  }
  let w = waterKgPerLitre(p.waterDensity, conc, layout.volumes, p.strongIonicStrength);
  const counter = pitzerCounter;
  counter.n = 0;
  const result = pitzerResult;
  let x = -guessPh * Math.LN10;
  let previousDelta = Infinity;
  let contraction = 1;
  let ionicStrengthM = 0;
  let finalPass = false;
  // The first step (plain) writes both before any step reads them: scratch shared by every solve.
  const previousL = scratchPreviousL;
  const previousG = scratchPreviousG;
  for (let it = 1; it <= MAX_PITZER_ITERATIONS; it++) {
    const gH = Math.exp(lnGamma[H_INDEX]) / w;
    const gOH = Math.exp(lnGamma[OH_INDEX]) / w;
    mixedConstants(p, layout, lnGamma, kp);
    x = solveChargeBalance(p, kp, gH, gOH, x, counter);
    const aH = Math.exp(x);
    conc[H_INDEX] = aH / gH;
    conc[OH_INDEX] = p.kw / (aH * gOH);
    ionicStrengthM = p.strongIonicStrength + 0.5 * (conc[H_INDEX] + conc[OH_INDEX]) + systemConcentrations(p, layout, kp, aH, conc);
    if (finalPass) {
      return {
        pH: -x / Math.LN10,
        ionicStrengthM,
        gamma1: Math.exp(lnGamma[H_INDEX]),
        mixedKa: kp,
        evaluations: counter.n,
        ionicStrengthIterations: it - 1,
        pitzer: {
          lnGamma,
          speciesKey: layout.speciesKey,
          concentrations: conc,
          waterKgPerL: w,
          ionicStrengthMolal: result.ionicStrength,
          osmoticCoefficient: result.osmoticCoefficient,
        },
      };
    }
    w = waterKgPerLitre(p.waterDensity, conc, layout.volumes, ionicStrengthM);
    for (let i = 0; i < n; i++) m[i] = conc[i] / w;
    pitzerEvaluate(layout.system, m, next, result);
    applyPhConvention(layout, result.lnGammaKcl, next);
    const delta = gammaChange(p, layout, p.totals, conc, lnGamma, next);
    // The map contracts by r = δ₂/δ₁, read off the first plain step (about 1e-5 for a buffer in saline, 1e-3 where
    // the buffers' charge moves the ionic strength): the new γ are then within r·δ of the fixed point, and one
    // last pH solve with them (a single Newton step from here) finishes.
    if (it === 2) contraction = delta / previousDelta;
    if (delta <= PITZER_TOLERANCE || (it > 1 && contraction < 0.5 && contraction * delta <= PITZER_TOLERANCE)) {
      for (let i = 0; i < n; i++) lnGamma[i] = next[i];
      finalPass = true;
      continue;
    }
    nextGammas(n, lnGamma, next, previousL, previousG, delta, previousDelta, it);
    previousDelta = delta;
  }
  throw new ChemError('no-convergence', 'noConvergence', MESSAGES.noConvergence('The activity-coefficient iteration', MAX_PITZER_ITERATIONS));
}

/**
 * Solves a prepared composition: pH and ionic strength, self-consistent.
 * Throws ChemError (no-convergence, infeasible-target).
 *
 * @param guessPh - where the first Newton step starts (a pH known nearby, or 7)
 * @param start - Pitzer only: a neighbouring solution's state (its `pitzer`) to start the γ iteration from; used
 *   only when its species key matches and every ln γ is finite, and only as the first iterate (same stopping rule)
 */
export function solvePrepared(p: PreparedComposition, guessPh = 7, start?: PitzerStart): EquilibriumState {
  const kp = packedZeros(p.ka.length);
  if (p.pitzer) return solvePitzer(p, p.pitzer, kp, guessPh, start);
  if (p.model === 'ideal') return solveNested(p, kp, guessPh);
  return solveCombined(p, kp, guessPh) ?? solveNested(p, kp, guessPh);
}

/** A Newton step in ln a(H⁺) at most this long (about 0.2 pH) hands over from the bracketed solve at the starting ionic strength to the combined step. */
const COMBINED_SWITCH = 0.5;
/** A combined step whose change of the ionic strength is this small (relative) ends the solve: what is left after it is ~(step)², below 1e-13. */
const COMBINED_ACCEPT = 1e-7;
/** Combined steps allowed before the nested iteration takes over (it converges in 2–4). */
const MAX_COMBINED_STEPS = 30;
const combinedCounter = { n: 0 };

/**
 * The pH and the ionic strength of a one-number model solved together.
 *
 * Method: first the safeguarded Newton solve in x = ln a_H at the starting ionic strength
 * (bracketed, as in solveChargeBalance), until its Newton step is under COMBINED_SWITCH;
 * from there Newton steps on both unknowns at once,
 *   r₁ = f(x, I) = 0,   r₂ = ½Σz²c(x, I) + I_strong − I = 0,
 * with the exact Jacobian (∂/∂I through ln γ₁ = −A·ln10·F(I) and the γ₁ powers in the mixed
 * constants). Each step must shrink (in ln a_H relative to max(1, |x|), in I relative to I),
 * keep I positive and x inside the pH bracket, and the determinant must have the sign a
 * monotone charge balance gives it (∂f/∂x > 0, ∂r₂/∂I ≈ −1); when any of these fails, or
 * after MAX_COMBINED_STEPS, it returns undefined and the nested iteration (solveNested,
 * which converges for every composition) solves from scratch. Ends when the step is below
 * NEWTON_ACCEPT in x and COMBINED_ACCEPT in I, and takes that step: Newton converges
 * quadratically, so what is left is ~(step)².
 */
function solveCombined(p: PreparedComposition, kp: number[], guessPh: number): EquilibriumState | undefined {
  const counter = combinedCounter;
  counter.n = 0;
  let ionicStrength = p.strongIonicStrength;
  for (let j = 0; j < p.totals.length; j++) ionicStrength += 0.5 * p.totals[j] * p.z0[j] * p.z0[j];
  let g1 = conditionalConstants(p, ionicStrength, kp);
  let updates = 1;
  let x = -guessPh * Math.LN10;
  let lo = LN_AH_MIN;
  let hi = LN_AH_MAX;
  let combined = false;
  let restarted = false;
  let combinedSteps = 0;
  let previousSize = Infinity;
  const floor = ROUNDING_FLOOR * p.ionicStrengthScale;
  const slopeScale = -p.a * Math.LN10;
  for (let it = 0; it < MAX_PH_ITERATIONS; it++) {
    counter.n++;
    evaluateCombined(p, kp, Math.exp(x), g1);
    const f = evF;
    if (!combined) {
      // At fixed I the charge balance is increasing in x: the bracket holds while I stays.
      if (f < 0) lo = x;
      else if (f > 0) hi = x;
      const next = x - f / evD;
      const inside = next > lo && next < hi;
      if (!(inside && Math.abs(next - x) <= COMBINED_SWITCH)) {
        x = inside ? next : 0.5 * (lo + hi);
        continue;
      }
      // A starting I far from the species' own (none of the charged forms given, say) is replaced by theirs once,
      // and the bracket opened again: Newton in I is poor near I = 0, where γ₁ moves as √I.
      const speciesI = p.strongIonicStrength + 0.5 * evI2;
      if (!restarted && !(ionicStrength > 0.5 * speciesI && ionicStrength < 2 * speciesI)) {
        restarted = true;
        ionicStrength = speciesI;
        g1 = conditionalConstants(p, ionicStrength, kp);
        updates++;
        lo = LN_AH_MIN;
        hi = LN_AH_MAX;
        x = next;
        continue;
      }
      combined = true;
    }
    if (++combinedSteps > MAX_COMBINED_STEPS) return undefined;
    const lnGammaSlope = slopeScale * ionicStrengthFactorSlope(p.model, ionicStrength);
    const j12 = evFG * lnGammaSlope;
    const j21 = 0.5 * evDI2;
    const j22 = 0.5 * evIG * lnGammaSlope - 1;
    const r2 = p.strongIonicStrength + 0.5 * evI2 - ionicStrength;
    const det = evD * j22 - j12 * j21;
    const dx = (r2 * j12 - f * j22) / det;
    const dI = (f * j21 - r2 * evD) / det;
    const nextX = x + dx;
    const nextI = ionicStrength + dI;
    const size = Math.max(Math.abs(dx) / Math.max(1, Math.abs(x)), Math.abs(dI) / ionicStrength);
    if (!(det < 0 && nextI > 0 && nextX > LN_AH_MIN + 1e-6 && nextX < LN_AH_MAX - 1e-6 && size < previousSize)) return undefined;
    previousSize = size;
    const done = Math.abs(dx) <= NEWTON_ACCEPT * Math.max(1, Math.abs(x)) && Math.abs(dI) <= COMBINED_ACCEPT * ionicStrength + floor;
    x = nextX;
    ionicStrength = nextI;
    // The constants follow I to the last point too, so the species reported there balance their charges.
    g1 = conditionalConstants(p, ionicStrength, kp);
    updates++;
    if (done) return { pH: -x / Math.LN10, ionicStrengthM: ionicStrength, gamma1: g1, mixedKa: kp, evaluations: counter.n, ionicStrengthIterations: updates };
  }
  return undefined;
}

/**
 * The nested iteration: the ionic strength iterated to self-consistency (secant steps, see
 * ionicStrength.ts) around a pH solve at fixed constants (each warm-started from the last).
 * Converges for every composition; the combined step above hands over to it when a safeguard trips.
 */
export function solvePreparedNested(p: PreparedComposition, guessPh = 7): EquilibriumState {
  const kp = packedZeros(p.ka.length);
  return p.pitzer ? solvePitzer(p, p.pitzer, kp, guessPh, undefined) : solveNested(p, kp, guessPh);
}

function solveNested(p: PreparedComposition, kp: number[], guessPh: number): EquilibriumState {
  const counter = { n: 0 };
  let x = -guessPh * Math.LN10;
  let g1 = 1;
  let outer = 0;
  const speciesIonicStrength = (ionicStrengthM: number) => {
    outer++;
    g1 = conditionalConstants(p, ionicStrengthM, kp);
    x = solveChargeBalance(p, kp, g1, g1, x, counter);
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
  /** mol per kg of water. */
  readonly molality: number;
  /** Activity: molal (m·γ) with the Pitzer model, molar (c·γ) with the one-number models. */
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

/** How much of a solution the Pitzer parameters cover. */
export interface PitzerCoverage {
  /** Fraction (0–1) of the molal ionic strength carried by ions without published parameters. */
  readonly unparameterisedShare: number;
  /** Acid–base systems whose ions carry more than 1 % of the ionic strength without parameters. */
  readonly unparameterisedSystems: readonly string[];
}

/** The full answer for a composition. */
export interface SpeciationResult {
  readonly pH: number;
  readonly temperatureC: number;
  readonly activityModel: string;
  readonly ionicStrengthM: number;
  /** Ionic strength on the molal scale, mol/kg. */
  readonly ionicStrengthMolal: number;
  /** kg of water per litre of solution (from apparent molar volumes; see pitzer/volumes.ts). */
  readonly waterKgPerL: number;
  /** Osmotic coefficient φ from the Pitzer equations at the species found (whatever model set the pH). */
  readonly osmoticCoefficient: number;
  /** Osmolality φ·Σm, mOsm/kg: what a freezing-point osmometer reads. */
  readonly osmolalityMosmKg: number;
  /** Ideal osmolarity Σc over every particle, no osmotic coefficient, mOsm/L (see osmolarity.ts). */
  readonly idealOsmolarityMosmL: number;
  /** Share of the molal ionic strength carried by ions the Pitzer tables do not hold (they take the generic fallback), and the systems they belong to. */
  readonly pitzerCoverage: PitzerCoverage;
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

/** Share of the ionic strength above which ions without Pitzer parameters earn a warning. */
export const UNPARAMETERISED_SHARE_LIMIT = 0.25;
/** Molal ionic strength above which that share matters (below it every ion is close to its Debye–Hückel limit). */
export const UNPARAMETERISED_IONIC_STRENGTH_MOLAL = 0.5;
/** Temperature distance from 25 °C (K) beyond which parameters without a published slope earn a warning in concentrated solution. */
export const PITZER_TEMPERATURE_WINDOW_K = 10;

/** Scratch for the one-number report's osmotic coefficient (the solver is synchronous). */
const reportEvaluation: PitzerEvaluation = { ionicStrength: 0, osmoticCoefficient: 1, lnGammaKcl: 0 };
let reportMolality: number[] = [];
let reportLnGamma: number[] = [];

/**
 * Builds the full report from a solved state. Species names come from the chemistry (built
 * once per chemistry); γ of the one-number models are integer powers of γ₁ and apparent pKa′
 * follow from the pKa at the temperature and the γ, so no logarithm or power is taken per species.
 */
export function report(p: PreparedComposition, state: EquilibriumState, composition: Composition): SpeciationResult {
  const chemistry = p.chemistry;
  const aH = Math.pow(10, -state.pH);
  const g1 = state.gamma1;
  let layout = p.pitzer;
  if (!layout) {
    chemistry.osmoticLayout ??= pitzerLayoutShape(chemistry.strongIonNames, chemistry.systems, p.temperatureC, p.a);
    layout = layoutWith(chemistry.osmoticLayout, p.strongConcentrations);
  }
  const n = layout.speciesCount;
  const charges = layout.system.charges;
  const pitzer = state.pitzer;
  let conc: readonly number[];
  let waterKgPerL: number;
  let ionicStrengthMolal: number;
  let osmoticCoefficient: number;
  if (pitzer) {
    conc = pitzer.concentrations;
    waterKgPerL = pitzer.waterKgPerL;
    ionicStrengthMolal = pitzer.ionicStrengthMolal;
    osmoticCoefficient = pitzer.osmoticCoefficient;
  } else {
    // The pH model is a one-number model; the osmotic coefficient still comes from the Pitzer equations at the species found.
    const c: number[] = [];
    for (let i = 0; i < n; i++) c.push(0);
    c[H_INDEX] = aH / g1;
    c[OH_INDEX] = p.kw / (aH * g1);
    const strong = p.strongConcentrations;
    for (let i = 0; i < strong.length; i++) c[STRONG_START + i] = strong[i];
    systemConcentrations(p, layout, state.mixedKa, aH, c);
    conc = c;
    waterKgPerL = waterKgPerLitre(p.waterDensity, c, layout.volumes, state.ionicStrengthM);
    if (reportMolality.length < n) {
      reportMolality = new Array<number>(n).fill(0);
      reportLnGamma = new Array<number>(n).fill(0);
    }
    const m = reportMolality;
    for (let i = 0; i < n; i++) m[i] = c[i] / waterKgPerL;
    pitzerEvaluate(layout.system, m, reportLnGamma, reportEvaluation);
    ionicStrengthMolal = reportEvaluation.ionicStrength;
    osmoticCoefficient = reportEvaluation.osmoticCoefficient;
  }
  const constants = reportConstants(chemistry);
  const names = constants.speciesNames;
  const species: SpeciesAmount[] = [];
  // Species objects are written out literally, one shape with a system and one without: an object spread here cost
  // a fifth of a whole speciation.
  const strongEnd = STRONG_START + p.strongConcentrations.length;
  for (let i = 0; i < strongEnd; i++) {
    const molality = conc[i] / waterKgPerL;
    const z = charges[i];
    const activity = pitzer ? molality * Math.exp(pitzer.lnGamma[i]) : conc[i] * integerPower(g1, z * z);
    species.push({ name: names[i], charge: z, concentrationM: conc[i], molality, activity });
  }
  let residual = p.strongCharge + conc[H_INDEX] - conc[OH_INDEX];
  let totalCharge = conc[H_INDEX] + conc[OH_INDEX];
  for (let i = STRONG_START; i < strongEnd; i++) totalCharge += Math.abs(charges[i]) * conc[i];
  let sumMolal = 0;
  let idealOsmolarityM = 0;
  for (let i = 0; i < n; i++) {
    sumMolal += conc[i] / waterKgPerL;
    idealOsmolarityM += conc[i];
  }
  const systems: SystemSpeciation[] = [];
  const kp = state.mixedKa;
  const log10G1 = Math.log10(g1);
  for (let j = 0; j < composition.systems.length; j++) {
    const sys = composition.systems[j];
    const first = p.firstStep[j];
    const steps = p.stepCount[j];
    const start = layout.systemStart[j];
    const z0 = sys.chargeOfMostProtonated;
    const fractions: number[] = [1];
    let sum = 1;
    for (let k = 1; k <= steps; k++) {
      const w = (fractions[k - 1] * kp[first + k - 1]) / aH;
      fractions.push(w);
      sum += w;
    }
    let meanCharge = 0;
    for (let k = 0; k <= steps; k++) {
      const fr = fractions[k] / sum;
      fractions[k] = fr;
      const z = z0 - k;
      meanCharge += fr * z;
      totalCharge += Math.abs(z) * fr * sys.totalM;
      const i = start + k;
      const molality = conc[i] / waterKgPerL;
      const activity = pitzer ? molality * Math.exp(pitzer.lnGamma[i]) : conc[i] * integerPower(g1, z * z);
      species.push({ name: names[i], system: sys.name, protonsLost: k, charge: z, concentrationM: conc[i], molality, activity });
    }
    residual += sys.totalM * meanCharge;
    // pKa′ = pKa − log10(γ(HA)/γ(A)): with γ₁^(z²) the ratio is γ₁^(2z−1); with Pitzer, from the two ln γ.
    const apparentPKa: number[] = [];
    for (let k = 0; k < steps; k++) {
      const s = first + k;
      apparentPKa.push(pitzer ? constants.pKa[s] - (pitzer.lnGamma[start + k] - pitzer.lnGamma[start + k + 1]) / Math.LN10 : constants.pKa[s] - p.zSquaredDiff[s] * log10G1);
    }
    systems.push({ name: sys.name, totalM: sys.totalM, meanCharge, fractions, apparentPKa });
  }
  const warnings = p.warnings.slice();
  const coverage = pitzerCoverage(layout, conc, waterKgPerL, ionicStrengthMolal, composition);
  if (p.model === 'pitzer') {
    const more = pitzerWarnings(p, layout, coverage, ionicStrengthMolal);
    for (let i = 0; i < more.length; i++) warnings.push(more[i]);
  } else if (p.model !== 'ideal' && state.ionicStrengthM > ACTIVITY_MODEL_LIMIT_M) {
    warnings.push(warning('beyondActivityModel', MESSAGES.beyondActivityModel(state.ionicStrengthM, ACTIVITY_MODEL_LIMIT_M, ACTIVITY_MODEL_NAMES[p.model]), 'activityModel'));
  }
  return {
    pH: state.pH,
    temperatureC: p.temperatureC,
    activityModel: p.model,
    ionicStrengthM: state.ionicStrengthM,
    ionicStrengthMolal,
    waterKgPerL,
    osmoticCoefficient,
    osmolalityMosmKg: osmoticCoefficient * sumMolal * 1000,
    idealOsmolarityMosmL: idealOsmolarityM * 1000,
    pitzerCoverage: coverage,
    pKw: chemistry.pKw,
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

/**
 * The Pitzer model's own warnings: past its validated ionic strength; ions without
 * parameters carrying much of a concentrated solution's ionic strength; parameters without
 * a temperature slope used far from 25 °C in a concentrated solution.
 */
function pitzerWarnings(p: PreparedComposition, layout: PitzerLayout, coverage: PitzerCoverage, ionicStrengthMolal: number): ChemWarning[] {
  const warnings: ChemWarning[] = [];
  if (ionicStrengthMolal > PITZER_LIMIT_MOLAL) {
    warnings.push(warning('beyondPitzerRange', MESSAGES.beyondPitzerRange(ionicStrengthMolal, PITZER_LIMIT_MOLAL), 'activityModel'));
  }
  if (ionicStrengthMolal > UNPARAMETERISED_IONIC_STRENGTH_MOLAL) {
    if (coverage.unparameterisedShare > UNPARAMETERISED_SHARE_LIMIT) {
      warnings.push(
        warning('pitzerFallback', MESSAGES.pitzerFallback(coverage.unparameterisedSystems.join(', '), coverage.unparameterisedShare * 100, ionicStrengthMolal), 'activityModel'),
      );
    }
    if (layout.system.temperatureExtrapolated && Math.abs(p.temperatureC - 25) > PITZER_TEMPERATURE_WINDOW_K) {
      warnings.push(warning('pitzerTemperature', MESSAGES.pitzerTemperature(p.temperatureC), 'temperatureC'));
    }
  }
  return warnings;
}

/** How much of the molal ionic strength ions without Pitzer parameters carry, and whose they are. */
function pitzerCoverage(layout: PitzerLayout, conc: readonly number[], waterKgPerL: number, ionicStrengthMolal: number, composition: Composition): PitzerCoverage {
  let share = 0;
  const names = new Set<string>();
  const charges = layout.system.charges;
  layout.unparameterised.forEach((u, i) => {
    if (!u || conc[i] <= 0 || ionicStrengthMolal <= 0) return;
    const part = (0.5 * charges[i] * charges[i] * conc[i]) / waterKgPerL / ionicStrengthMolal;
    share += part;
    if (part > 0.01) names.add(speciesSystemName(composition, layout, i));
  });
  return { unparameterisedShare: share, unparameterisedSystems: [...names] };
}

/** The system a species of the layout belongs to, for messages. */
function speciesSystemName(composition: Composition, layout: PitzerLayout, index: number): string {
  let name = 'an ion';
  layout.systemStart.forEach((start, j) => {
    if (index >= start) name = composition.systems[j].name;
  });
  return name;
}

/** pH of a composition (the lean call: no species report). */
export function solvePh(composition: Composition): number {
  return solvePrepared(prepare(composition)).pH;
}

export { STRONG_IONS };
