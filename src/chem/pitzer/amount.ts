/**
 * The amount of titrant (or of strong base or acid) that brings a composition to a known pH,
 * with the Pitzer model.
 *
 * Method: at the target the hydrogen-ion activity is fixed, so with the activity
 * coefficients held the charge balance is linear in the amount c, and c = c − f(c)/q with
 * q the charge the amount carries per mole at that pH. The activity coefficients are then
 * re-evaluated for the species found with the new amount, and the two steps alternate until
 * no ln γ that moves the charge balance changes by more than the solver's tolerance — the
 * same "no nested root finding" as the one-number models, with the ionic-strength iteration
 * replaced by the activity-coefficient iteration of the Pitzer solve.
 */
import { ChemError, MESSAGES } from '../errors';
import type { PreparedComposition } from '../composition';
import { MAX_PITZER_ITERATIONS, PITZER_TOLERANCE, applyPhConvention } from '../speciation';
import { ionicStrengthFactor } from '../activity';
import { PitzerEvaluation, pitzerEvaluate } from './model';
import { H_INDEX, OH_INDEX, STRONG_START } from './prepared';
import { waterKgPerLitre } from './volumes';
import { PitzerStart, gammaChange, mixedConstants, nextGammas, warmGammas } from './iteration';

/** How the amount c enters the composition: per mole of c ≥ 0 (up) and per mole of −c for c < 0 (down). */
export interface AmountIncrements {
  /** Per strong-ion slot of the layout, mol/L per mol/L of amount. */
  readonly strongUp: readonly number[];
  readonly strongDown: readonly number[];
  /** Per acid–base system, total mol/L per mol/L of amount. */
  readonly totalsUp: readonly number[];
  readonly totalsDown: readonly number[];
}

const scratch = {
  conc: [] as number[],
  lnGamma: [] as number[],
  next: [] as number[],
  m: [] as number[],
  previousL: [] as number[],
  previousG: [] as number[],
  totals: [] as number[],
  meanCharge: [] as number[],
  kp: [] as number[],
};
/** Lengthens a scratch array with zeros to at least n entries. */
function grow(a: number[], n: number): void {
  while (a.length < n) a.push(0);
}
const scratchResult: PitzerEvaluation = { ionicStrength: 0, osmoticCoefficient: 1, lnGammaKcl: 0 };

/** The amount found. */
export interface PitzerAmount {
  readonly amount: number;
  /** Charge the amount carries per mole at the pH (the last q). */
  readonly chargePerMole: number;
  /** Ionic strength with that amount, mol/L. */
  readonly ionicStrengthM: number;
  readonly iterations: number;
  /** The converged ln γ in the layout's order and the layout's species key (a PitzerStart for a neighbouring solve); absent when the amount is NaN. */
  readonly lnGamma?: readonly number[];
  readonly speciesKey: string;
}

/**
 * Amount at a fixed pH.
 *
 * @param p - the composition prepared with the amount's species present (at zero amount), model pitzer
 * @param inc - how the amount enters it
 * @param pH - the target pH
 * @param estimate - a starting amount (the one-number answer)
 * @param start - a neighbouring solution's converged ln γ (the same species key) to start the γ iteration from; used
 *   only when it fits (see warmGammas), and only as the first iterate: the stopping rule is the same
 * @returns the amount, its charge per mole, the ionic strength; amount NaN when q is 0
 */
export function pitzerAmountAtPh(p: PreparedComposition, inc: AmountIncrements, pH: number, estimate: number, start?: PitzerStart): PitzerAmount {
  const layout = p.pitzer!;
  const n = layout.speciesCount;
  const charges = layout.system.charges;
  const strong0 = layout.strongConcentrations;
  const totals0 = p.totals;
  const nSystems = totals0.length;
  const aH = Math.pow(10, -pH);
  // Scratch shared by every call (synchronous, nothing returned from it), grown as needed.
  grow(scratch.conc, n);
  grow(scratch.lnGamma, n);
  grow(scratch.next, n);
  grow(scratch.m, n);
  grow(scratch.previousL, n);
  grow(scratch.previousG, n);
  grow(scratch.totals, nSystems);
  grow(scratch.meanCharge, nSystems);
  grow(scratch.kp, p.ka.length);
  const { conc, lnGamma, next, m, totals, meanCharge, kp } = scratch;
  // The chloride probe (a zero-concentration species, see prepared.ts) is never written below: clear every slot.
  for (let i = 0; i < n; i++) conc[i] = 0;
  // Start from a neighbouring solution's γ when given and fitting; else from Bates–Guggenheim at the ionic strength
  // the composition has with the estimate.
  if (!warmGammas(layout, n, start, lnGamma)) {
    let i0 = p.strongIonicStrength + 0.5 * Math.abs(estimate);
    for (let j = 0; j < nSystems; j++) i0 += 0.5 * totals0[j] * p.z0[j] * p.z0[j];
    const lnG0 = -p.a * ionicStrengthFactor('bates-guggenheim', i0) * Math.LN10;
    for (let i = 0; i < n; i++) lnGamma[i] = lnG0 * charges[i] * charges[i];
  }
  const speciesKey = layout.speciesKey;
  const result = scratchResult;
  let w = p.waterDensity;
  let c = estimate;
  let q = 0;
  let ionicStrengthM = 0;
  let previousDelta = Infinity;
  let contraction = 1;
  let finalPass = false;
  const previousL = scratch.previousL;
  const previousG = scratch.previousG;

  /** Fills conc (strong ions and systems, at the current kp) for amount x; returns the molar ionic strength. */
  const fill = (x: number, gH: number, gOH: number): number => {
    const up = x >= 0 ? x : 0;
    const down = x < 0 ? -x : 0;
    let halfZ2 = 0;
    for (let i = 0; i < strong0.length; i++) {
      const v = strong0[i] + up * inc.strongUp[i] + down * inc.strongDown[i];
      conc[STRONG_START + i] = v;
      const z = charges[STRONG_START + i];
      halfZ2 += 0.5 * z * z * Math.max(0, v);
    }
    conc[H_INDEX] = aH / gH;
    conc[OH_INDEX] = p.kw / (aH * gOH);
    halfZ2 += 0.5 * (conc[H_INDEX] + conc[OH_INDEX]);
    for (let j = 0; j < nSystems; j++) {
      const total = totals0[j] + up * inc.totalsUp[j] + down * inc.totalsDown[j];
      totals[j] = total;
      const first = p.firstStep[j];
      const steps = p.stepCount[j];
      const base = layout.systemStart[j];
      const z0 = p.z0[j];
      let t = 1;
      let sum = 1;
      conc[base] = 1;
      for (let k = 1; k <= steps; k++) {
        t *= kp[first + k - 1] / aH;
        conc[base + k] = t;
        sum += t;
      }
      let charge = 0;
      for (let k = 0; k <= steps; k++) {
        const fraction = conc[base + k] / sum;
        charge += fraction * (z0 - k);
        const v = fraction * total;
        conc[base + k] = v;
        halfZ2 += 0.5 * (z0 - k) * (z0 - k) * Math.max(0, v);
      }
      meanCharge[j] = charge;
    }
    return halfZ2;
  };

  for (let it = 1; it <= MAX_PITZER_ITERATIONS; it++) {
    const gH = Math.exp(lnGamma[H_INDEX]) / w;
    const gOH = Math.exp(lnGamma[OH_INDEX]) / w;
    mixedConstants(p, layout, lnGamma, kp);
    // Charge balance at the current amount and its slope in the amount: linear at fixed γ, so one Newton step solves it.
    fill(c, gH, gOH);
    let f = conc[H_INDEX] - conc[OH_INDEX];
    for (let i = 0; i < strong0.length; i++) f += charges[STRONG_START + i] * conc[STRONG_START + i];
    for (let j = 0; j < nSystems; j++) f += totals[j] * meanCharge[j];
    const positive = c >= 0;
    q = 0;
    for (let i = 0; i < strong0.length; i++) q += charges[STRONG_START + i] * (positive ? inc.strongUp[i] : -inc.strongDown[i]);
    for (let j = 0; j < nSystems; j++) q += meanCharge[j] * (positive ? inc.totalsUp[j] : -inc.totalsDown[j]);
    if (q === 0) return { amount: NaN, chargePerMole: 0, ionicStrengthM: NaN, iterations: it, speciesKey };
    c -= f / q;
    if (!Number.isFinite(c)) return { amount: NaN, chargePerMole: q, ionicStrengthM: NaN, iterations: it, speciesKey };
    ionicStrengthM = fill(c, gH, gOH);
    if (finalPass) return { amount: c, chargePerMole: q, ionicStrengthM, iterations: it, lnGamma: lnGamma.slice(0, n), speciesKey };
    w = waterKgPerLitre(p.waterDensity, conc, layout.volumes, ionicStrengthM);
    for (let i = 0; i < n; i++) m[i] = Math.max(0, conc[i]) / w;
    pitzerEvaluate(layout.system, m, next, result);
    applyPhConvention(layout, result.lnGammaKcl, next);
    const delta = gammaChange(p, layout, totals, conc, lnGamma, next);
    // As in the pH solve (speciation.ts): the contraction read off the first plain step decides when the new γ are
    // close enough for a last linear step; Anderson (depth one) steps remove the ionic-strength mode the amount drives.
    if (it === 2) contraction = delta / previousDelta;
    if (delta <= PITZER_TOLERANCE || (it > 1 && contraction < 0.5 && contraction * delta <= PITZER_TOLERANCE)) {
      for (let i = 0; i < n; i++) lnGamma[i] = next[i];
      finalPass = true;
      continue;
    }
    nextGammas(n, lnGamma, next, previousL, previousG, delta, previousDelta, it);
    previousDelta = delta;
  }
  throw new ChemError('no-convergence', 'noConvergence', MESSAGES.noConvergence('The titrant amount', MAX_PITZER_ITERATIONS));
}
