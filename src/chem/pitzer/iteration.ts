/**
 * The pieces shared by the two Pitzer fixed-point iterations (the pH solve in speciation.ts
 * and the titrant amount in amount.ts): the mixed constants at the current γ, how far the γ
 * that move the pH changed, and the next γ (halved when the change grew, Anderson mixing of
 * depth one after the first step, the plain step otherwise).
 */
import type { PreparedComposition } from '../composition';
import type { PitzerLayout } from './prepared';
import { H_INDEX, OH_INDEX } from './prepared';

/** Writes each step's mixed constant K′ = Ka·γ(HA)/γ(A) at the current ln γ into `kp`. */
export function mixedConstants(p: PreparedComposition, layout: PitzerLayout, lnGamma: readonly number[], kp: number[]): void {
  for (let j = 0; j < p.totals.length; j++) {
    const first = p.firstStep[j];
    const base = layout.systemStart[j];
    for (let k = 0; k < p.stepCount[j]; k++) kp[first + k] = p.ka[first + k] * Math.exp(lnGamma[base + k] - lnGamma[base + k + 1]);
  }
}

/**
 * How far the γ that move the pH changed: γ(H⁺), γ(OH⁻), and each buffer species' γ weighted
 * by its share of its system (a trace form's γ hardly enters the charge balance); strong
 * ions' γ do not enter it at all.
 *
 * @param totals - each system's total, mol/L, in the composition's order (those at zero are skipped)
 */
export function gammaChange(
  p: PreparedComposition,
  layout: PitzerLayout,
  totals: readonly number[],
  conc: readonly number[],
  lnGamma: readonly number[],
  next: readonly number[],
): number {
  let delta = Math.max(Math.abs(next[H_INDEX] - lnGamma[H_INDEX]), Math.abs(next[OH_INDEX] - lnGamma[OH_INDEX]));
  for (let j = 0; j < p.totals.length; j++) {
    const total = totals[j];
    if (total <= 0) continue;
    const base = layout.systemStart[j];
    for (let k = 0; k <= p.stepCount[j]; k++) {
      const d = (Math.abs(next[base + k] - lnGamma[base + k]) * conc[base + k]) / total;
      if (d > delta) delta = d;
    }
  }
  return delta;
}

/**
 * Moves `lnGamma` toward the new values `next`: half way when the change grew; after the
 * first step, Anderson mixing of depth one (the residual is nearly one mode, the ionic
 * strength, so a secant step along it removes most of what is left:
 * L ← G_k − θ(G_k − G_{k−1}), θ = F_k·ΔF/|ΔF|²); on the first step, to `next`.
 * `previousL` and `previousG` hold the last step's input and output for the secant; `n` is
 * the number of species (scratch arrays may be longer).
 */
export function nextGammas(
  n: number,
  lnGamma: number[],
  next: readonly number[],
  previousL: number[],
  previousG: number[],
  delta: number,
  previousDelta: number,
  iteration: number,
): void {
  if (delta >= previousDelta) {
    for (let i = 0; i < n; i++) lnGamma[i] += 0.5 * (next[i] - lnGamma[i]);
  } else if (iteration > 1) {
    let num = 0;
    let den = 0;
    for (let i = 0; i < n; i++) {
      const f = next[i] - lnGamma[i];
      const df = f - (previousG[i] - previousL[i]);
      num += f * df;
      den += df * df;
    }
    const theta = den > 0 ? num / den : 0;
    for (let i = 0; i < n; i++) {
      const g = next[i];
      previousL[i] = lnGamma[i];
      lnGamma[i] = g - theta * (g - previousG[i]);
      previousG[i] = g;
    }
  } else {
    for (let i = 0; i < n; i++) {
      previousL[i] = lnGamma[i];
      previousG[i] = next[i];
      lnGamma[i] = next[i];
    }
  }
}

/** Largest |ln γ| a start may hold (γ from 2e-9 to 5e8): far outside any solution the model covers, so a larger value is not a solution's. */
export const MAX_START_LN_GAMMA = 20;

/**
 * A starting point for a Pitzer iteration: the converged ln γ of a neighbouring solution (the same species at
 * another temperature, dilution, amount or pH), with its layout's species key. It is only the first iterate: the
 * stopping rule, the tolerance and the residual checks are the same as from the default start, so the answer is
 * the same fixed point within them (docs/performance.md, "Warm starts for the Pitzer iteration").
 */
export interface PitzerStart {
  readonly lnGamma: readonly number[];
  readonly speciesKey: string;
}

/**
 * Writes a start's ln γ into `lnGamma` when it fits the layout (the same species key, at least n values, every one
 * finite and within MAX_START_LN_GAMMA) and returns true; otherwise leaves `lnGamma` as it is and returns false.
 */
export function warmGammas(layout: PitzerLayout, n: number, start: PitzerStart | undefined, lnGamma: number[]): boolean {
  if (start === undefined || start.speciesKey !== layout.speciesKey) return false;
  const g = start.lnGamma;
  if (g.length < n) return false;
  for (let i = 0; i < n; i++) if (!(Math.abs(g[i]) <= MAX_START_LN_GAMMA)) return false;
  for (let i = 0; i < n; i++) lnGamma[i] = g[i];
  return true;
}
