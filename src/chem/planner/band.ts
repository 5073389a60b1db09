/** The titrant's band from the pKa uncertainty and the stock tolerance, and the rule that a titrant must fit the part volume. */
import { MAX_TITRANT_M } from '../input';
import { AcidBaseChemistry, AcidBaseStep, AcidBaseSystem, Composition, systemAt } from '../composition';
import { ChemError, MESSAGES } from '../errors';
import { solvePh } from '../speciation';
import { findStrongIon } from '../strongIons';
import { Titrant, titrantForPh } from '../titration';
import { TitrationPlan } from './types';
import { DEFAULT_PKA_UNCERTAINTY, FIRST_PORTION_SHARE, COMFORTABLE_TITRANT_SHARE } from './constants';
import { RouteResult, Settled } from './settle';

/** The titrant volume and its band from the pKa uncertainty and the stock tolerance. */
export function titrationPlan(s: Settled, made: RouteResult, volumeL: number, stockPh: number | undefined): TitrationPlan {
  const t = made.titrant!;
  const volumeMl = ((t.concentrationM * volumeL) / t.stock.concentrationM) * 1000;
  const u = s.pKaUncertainty !== undefined ? s.pKaUncertainty : Math.max(...s.system.steps.map((step) => step.pKaUncertainty ?? DEFAULT_PKA_UNCERTAINTY));
  // The amount needed with every pKa of the buffer moved by ±u, to the pH the made solution has.
  const before = t.before;
  const madePh = s.route === 'stock' ? (stockPh ?? solvePh(made.composition)) : s.targetPh;
  const amounts = [-u, u].map((shift) => {
    const shifted = shiftSystem(before, s.system.name, shift);
    try {
      // The same species as the made solution: its amount's γ (the route's, not a stock's) start this one's iteration.
      return titrantForPh(shifted, t.titrant, madePh, made.pitzer).concentrationM;
    } catch {
      return 0;
    }
  });
  const tol = t.stock.tolerancePercent / 100;
  const toMl = (c: number, stockM: number) => ((c * volumeL) / stockM) * 1000;
  const lowMl = Math.min(volumeMl, toMl(Math.min(...amounts), t.stock.concentrationM * (1 + tol)));
  const highMl = Math.max(volumeMl, toMl(Math.max(...amounts), t.stock.concentrationM * (1 - tol)));
  return {
    titrant: t.form.name,
    stockM: t.stock.concentrationM,
    // The titrate route's unadjusted pH is the pH of `before`, already solved.
    direction: t.titrant.system
      ? madePh > (s.route === 'titrate' && made.unadjustedPh !== undefined ? made.unadjustedPh : solvePh(before))
        ? 'raises'
        : 'lowers'
      : chargeOf(t.titrant) > 0
        ? 'raises'
        : 'lowers',
    volumeMl,
    lowMl,
    highMl,
    firstPortionMl: FIRST_PORTION_SHARE * lowMl,
    pKaUncertainty: u,
    tolerancePercent: t.stock.tolerancePercent,
  };
}

/** The next strength up in a 1–2–5 series, mol/L (the stocks a lab keeps or makes easily). */
export function roundedStock(m: number): number {
  const decade = Math.pow(10, Math.floor(Math.log10(m)));
  for (const step of [1, 2, 5, 10]) if (step * decade >= m * (1 - 1e-12)) return step * decade;
  return 10 * decade;
}

/**
 * Refuses a titrant that does not fit: at adjustment everything sits in the part volume, so
 * the titrant cannot take more than the part volume leaves. One rule for every host (the
 * planner, RECIPE, RECIPE.ROW, TITRANT.ML). The message names a stock strong enough that the
 * titrant takes about a tenth of the final volume, or says none is strong enough.
 *
 * @param titrantMl - titrant volume needed, mL
 * @param finalVolumeMl - volume being made, mL
 * @param partVolumeFraction - share of the final volume in which the pH is adjusted
 * @param stockM - the titrant stock, mol/L
 * @throws ChemError infeasible-target `titrantTooLarge`, field `titrant.concentrationM`
 */
export function checkTitrantFits(titrantMl: number, finalVolumeMl: number, partVolumeFraction: number, stockM: number): void {
  const roomMl = finalVolumeMl * partVolumeFraction;
  if (!(titrantMl > roomMl)) return;
  const needed = (stockM * titrantMl) / (COMFORTABLE_TITRANT_SHARE * finalVolumeMl);
  const suggestion =
    needed <= MAX_TITRANT_M ? `a ${roundedStock(needed)} M stock` : `no stock is strong enough (it would take above ${MAX_TITRANT_M} M); weigh a form nearer the target pH instead`;
  throw new ChemError('infeasible-target', 'titrantTooLarge', MESSAGES.titrantTooLarge(titrantMl, roomMl, stockM, suggestion), 'titrant.concentrationM', suggestion);
}

/** Net charge a strong titrant adds per mole (positive: a base). */
export function chargeOf(t: Titrant): number {
  let q = 0;
  for (const [ion, n] of Object.entries(t.strongIons ?? {})) q += findStrongIon('titrant', ion).charge * n;
  return q;
}

/** The composition with every pKa of one system moved by `shift`. */
export function shiftSystem(c: Composition, name: string, shift: number): Composition {
  return {
    systems: c.systems.map((sys): AcidBaseSystem => (sys.name === name ? systemAt(shiftedChemistry(sys, shift), sys.totalM) : sys)),
    strongIons: c.strongIons,
    temperatureC: c.temperatureC,
    activityModel: c.activityModel,
  };
}

/**
 * A system's chemistry with every pKa moved by `shift`, made once per steps array and shift: library systems share
 * their steps array (chemistryOf), so the shifted one is shared too, and the solver finds its Pitzer layout by it.
 */
function shiftedChemistry(sys: AcidBaseChemistry, shift: number): AcidBaseChemistry {
  let byShift = SHIFTED.get(sys.steps);
  if (!byShift) SHIFTED.set(sys.steps, (byShift = new Map()));
  let shifted = byShift.get(shift);
  if (!shifted || shifted.name !== sys.name || shifted.chargeOfMostProtonated !== sys.chargeOfMostProtonated) {
    if (byShift.size >= SHIFTS_KEPT) byShift.clear();
    shifted = {
      name: sys.name,
      chargeOfMostProtonated: sys.chargeOfMostProtonated,
      steps: sys.steps.map((st) => ({ pKa: st.pKa + shift, deltaHkJ: st.deltaHkJ, deltaCpJ: st.deltaCpJ })),
    };
    byShift.set(shift, shifted);
  }
  return shifted;
}

/** Shifted chemistries, by the original steps array (weakly held) and the shift. */
const SHIFTED = new WeakMap<readonly AcidBaseStep[], Map<number, AcidBaseChemistry>>();
/** Shifts kept per steps array (a plan uses two; a user's own pKa uncertainties add a few). */
const SHIFTS_KEPT = 64;
