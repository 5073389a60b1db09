/**
 * The self-consistent ionic strength: I = G(I), where G(I) is ½Σcz² of the species found
 * with activity coefficients taken at I.
 *
 * Method: secant steps on h(I) = G(I) − I, which converge in 2–4 evaluations where plain
 * substitution crawls (strong activity effects); a damped substitution step whenever the
 * residual fails to shrink, which tames the oscillation Davies' curve can cause far above
 * its range. Every loop is bounded.
 */
import { ChemError, MESSAGES } from './errors';

/** Relative convergence: far below anything that moves a pH (1e-11 in I is ~1e-12 in pH), above the ~1e-12 rounding a pH solve leaves in G(I). */
export const IONIC_STRENGTH_TOLERANCE = 1e-11;
/** Absolute floor, relative to the largest ionic strength the solution could have: G sums terms that can cancel, leaving rounding of this order. */
export const ROUNDING_FLOOR = 1e-14;
/** Updates allowed before giving up. */
export const MAX_IONIC_STRENGTH_ITERATIONS = 100;

/**
 * Solves I = G(I).
 *
 * @param initialM - starting ionic strength, mol/L
 * @param g - G(I), mol/L
 * @param scaleM - the largest ionic strength the solution could have, mol/L (scales the floor)
 * @param what - what is being solved, for the no-convergence message
 * @returns the converged G(I) (the ionic strength of the species last found), mol/L
 */
export function selfConsistentIonicStrength(initialM: number, g: (ionicStrengthM: number) => number, scaleM: number, what: string): number {
  let i = initialM;
  let previousI = NaN;
  let previousH = NaN;
  for (let it = 1; it <= MAX_IONIC_STRENGTH_ITERATIONS; it++) {
    const h = g(i) - i;
    if (Math.abs(h) <= IONIC_STRENGTH_TOLERANCE * i + ROUNDING_FLOOR * scaleM) return i + h;
    let next = i + h;
    if (it > 1) {
      if (Math.abs(h) >= Math.abs(previousH)) {
        next = i + 0.5 * h;
      } else if (h !== previousH) {
        const secant = i - (h * (i - previousI)) / (h - previousH);
        if (secant > 0 && Number.isFinite(secant)) next = secant;
      }
    }
    previousI = i;
    previousH = h;
    i = next;
  }
  throw new ChemError('no-convergence', 'noConvergence', MESSAGES.noConvergence(what, MAX_IONIC_STRENGTH_ITERATIONS));
}
