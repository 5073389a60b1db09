/**
 * A salt added to a target: a bracketed search (regula falsi, Illinois form) on the salt concentration (ionic strength, ideal
 * osmolarity, osmolality and conductivity rise with every added mole of a salt that dissociates).
 */
import { ChemError, MESSAGES } from '../errors';
import { conductivityAt } from '../conductivity';
import { idealOsmolarity } from '../osmolarity';
import { speciate } from '../speciation';
import { MAX_SALT_TARGET_M, SALT_TARGET_STEPS, SALT_TARGET_WHAT } from './constants';
import { RouteResult, Settled } from './settle';
import { routeResult } from './routes';

/**
 * Solves the route, adding the salt-target salt by a bracketed search when one is asked for. Ionic
 * strength, ideal osmolarity and conductivity all rise with every added mole of a salt that
 * dissociates, so one search serves every goal. A goal the buffer already passes
 * without salt, or one that the largest salt amount tried cannot reach (a zwitterion such as
 * glycine adds no ionic strength), is infeasible, never a success.
 */
export function solveWithSaltTarget(s: Settled): RouteResult {
  const target = s.saltTarget;
  if (!target) return routeResult(s, 0);
  const measure = (saltM: number): number => {
    const c = routeResult(s, saltM).composition;
    if (target.kind === 'conductivity') return conductivityAt(c, target.readAtC).conductivityMsPerCm;
    const sp = speciate(c);
    if (target.kind === 'osmolality') return sp.osmolalityMosmKg;
    return target.kind === 'ionicStrength' ? sp.ionicStrengthM : idealOsmolarity(sp) * 1000;
  };
  const what = SALT_TARGET_WHAT[target.kind](target.readAtC);
  const shown = (x: number) => Number(x.toPrecision(4));
  const reached = measure(0);
  if (reached > target.goal) {
    throw new ChemError(
      'infeasible-target',
      'saltTargetUnreachable',
      MESSAGES.saltTargetUnreachable(what, target.goal, shown(reached)),
      'saltTarget',
      `a target above ${shown(reached)}`,
    );
  }
  const most = measure(MAX_SALT_TARGET_M);
  if (most < target.goal) {
    throw new ChemError(
      'infeasible-target',
      'saltTargetBeyondSalt',
      MESSAGES.saltTargetBeyondSalt(what, target.goal, shown(most), target.form.name, MAX_SALT_TARGET_M),
      'saltTarget',
      `a target up to ${shown(most)}`,
    );
  }
  // Regula falsi, Illinois form, inside the bracket: the goal is close to linear in the salt, so it takes a handful
  // of measures where bisection took forty. Safeguards: a point outside the bracket bisects, and every third step
  // bisects unless the bracket has halved since the last such check, so the bracket halves at least every three
  // steps and the search stops at the same width as before.
  let lo = 0;
  let hi = MAX_SALT_TARGET_M;
  let gLo = reached - target.goal;
  let gHi = most - target.goal;
  let kept = 0;
  let checkedWidth = hi - lo;
  for (let i = 0; i < SALT_TARGET_STEPS && hi - lo > 1e-12 * hi; i++) {
    let x = (lo * gHi - hi * gLo) / (gHi - gLo);
    if (i % 3 === 2) {
      if (hi - lo > 0.5 * checkedWidth) x = NaN;
      checkedWidth = hi - lo;
    }
    if (!(x > lo && x < hi)) x = 0.5 * (lo + hi);
    // A point next to an end moves at least a quarter of the stopping width inward: once one end sits on the goal,
    // the next measure lands the other end beside it and the search stops, instead of creeping up to it.
    const nudge = 0.25e-12 * hi;
    x = Math.min(Math.max(x, lo + nudge), hi - nudge);
    const g = measure(x) - target.goal;
    // The end kept twice running has its value halved (Illinois), so neither end stays put.
    if (g < 0) {
      lo = x;
      gLo = g;
      if (kept === -1) gHi *= 0.5;
      kept = -1;
    } else {
      hi = x;
      gHi = g;
      if (kept === 1) gLo *= 0.5;
      kept = 1;
    }
  }
  return routeResult(s, 0.5 * (lo + hi));
}
