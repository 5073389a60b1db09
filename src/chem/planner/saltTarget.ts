/**
 * A salt added to a target: bisection on the salt concentration (ionic strength, ideal
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
 * Solves the route, adding the salt-target salt by bisection when one is asked for. Ionic
 * strength, ideal osmolarity and conductivity all rise with every added mole of a salt that
 * dissociates, so one bisection serves all three goals. A goal the buffer already passes
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
  let lo = 0;
  let hi = MAX_SALT_TARGET_M;
  for (let i = 0; i < SALT_TARGET_STEPS && hi - lo > 1e-12 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (measure(mid) < target.goal) lo = mid;
    else hi = mid;
  }
  return routeResult(s, 0.5 * (lo + hi));
}
