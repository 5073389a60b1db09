/**
 * Warm starts of the Pitzer iteration against cold starts, on random compositions drawn from the whole
 * substance library (Pitzer model): shared by the test in `npm test` (a reduced count) and
 * `scripts/warmStart.ts` (20,000 and more). A warm start is only the first iterate, so the pH and the titrant
 * amount must be the same fixed point as from the default start, within the iteration's own tolerance.
 */
import fc from 'fast-check';
import { Composition, HYDROCHLORIC_ACID, SODIUM_HYDROXIDE, prepare, titrantForPh, withConditions } from '../../../src/chem';
import { scaleComposition } from '../../../src/chem/capacity';
import { defaultLibrary } from '../../../src/chem/library';
import { EquilibriumState, solvePrepared } from '../../../src/chem/speciation';
import { ChemError } from '../../../src/chem/errors';

const library = defaultLibrary();
const formNames = library.records().flatMap((r) => r.forms.map((f) => f.name));

/** A Pitzer composition of 1–4 library forms at 0.01–500 mM each, 0–100 °C, and a neighbour: the same at another temperature (±10 °C) and dilution (½–2×). */
export const warmCase = fc.record({
  items: fc.array(fc.record({ form: fc.constantFrom(...formNames), mM: fc.double({ min: 0.01, max: 500, noNaN: true }) }), { minLength: 1, maxLength: 4 }),
  temperatureC: fc.double({ min: 0, max: 100, noNaN: true }),
  dT: fc.double({ min: -10, max: 10, noNaN: true }),
  scale: fc.double({ min: 0.5, max: 2, noNaN: true }),
  shift: fc.double({ min: -1, max: 1, noNaN: true }),
});
export type WarmCase = typeof warmCase extends fc.Arbitrary<infer T> ? T : never;

/**
 * The pH from a warm start must match the cold start's to this. The iteration stops within about 1e-10 in ln γ of
 * its fixed point from either start; against solves with the tolerance at 1e-14, cold starts were up to 4.9e-10 off
 * and warm starts up to 8.4e-10 over 20,000 compositions (scripts/warmStart.ts, docs/performance.md).
 */
export const WARM_PH_BOUND = 1e-9;
/**
 * The titrant amount from a warm start against the cold start's, relative to the largest of the amount, the
 * titrated solution's ionic strength and its total buffer: the stopping rule bounds ln γ, which moves every
 * species' share of the charge balance, so an amount small beside the solution's buffers and ions is known to that
 * fraction of them, not of itself (relative to the amount alone, warm and cold differ by up to about 1.5e-8 for
 * amounts of 0.1 mM beside 10–500 mM of buffer). On that scale cold starts were up to 2.1e-10 and warm starts up to
 * 1.2e-10 from solves with the tolerance at 1e-14; warm against cold, up to 2.1e-10.
 */
export const WARM_AMOUNT_BOUND = 5e-10;

/** What one case gave: the largest differences and the γ rounds with each start (undefined where the cold solve refused). */
export interface WarmOutcome {
  phDiff?: number;
  amountDiff?: number;
  /** The same difference relative to the amount alone. */
  amountDiffOfAmount?: number;
  coldRounds?: number;
  warmRounds?: number;
  coldAmountRounds?: number;
  warmAmountRounds?: number;
}

function attempt<T>(f: () => T): T | undefined {
  try {
    return f();
  } catch (e) {
    if (e instanceof ChemError) return undefined;
    throw e;
  }
}

/** A fresh copy of a composition: the titrant amount keeps the last γ per composition object, so a copy starts cold. */
function fresh(c: Composition): Composition {
  return { ...c };
}

/**
 * Checks one case: the pH warm-started from the neighbour's γ (and from its pH) against the cold pH; a start with
 * another species layout or a non-finite value is ignored (the cold answer to the bit); the titrant amount to
 * shift the pH, warm-started from the amount 0.05 pH short of it, against the cold amount. Throws on a violation.
 */
export function checkWarmStart(w: WarmCase): WarmOutcome {
  const comp = library.compositionFromForms(
    w.items.map((i) => ({ form: i.form, concentrationM: i.mM / 1000 })),
    { temperatureC: w.temperatureC, activityModel: 'pitzer' },
  );
  const describe = () => JSON.stringify(w);
  const out: WarmOutcome = {};
  const cold = attempt(() => solvePrepared(prepare(comp)));
  if (!cold) return out;
  const neighbourComp = scaleComposition(withConditions(comp, Math.min(100, Math.max(0, w.temperatureC + w.dT))), w.scale);
  const neighbour: EquilibriumState | undefined = attempt(() => solvePrepared(prepare(neighbourComp)));
  if (neighbour?.pitzer) {
    const warm = attempt(() => solvePrepared(prepare(comp), neighbour.pH, neighbour.pitzer));
    if (!warm) throw new Error(`warm start refused where the cold start solved: ${describe()}`);
    out.phDiff = Math.abs(warm.pH - cold.pH);
    out.coldRounds = cold.ionicStrengthIterations;
    out.warmRounds = warm.ionicStrengthIterations;
    if (!(out.phDiff <= WARM_PH_BOUND)) throw new Error(`warm pH ${warm.pH} vs cold ${cold.pH} for ${describe()}`);
  }
  // A start that does not fit is not used: the answer is the cold one to the last bit.
  const other = { lnGamma: cold.pitzer!.lnGamma, speciesKey: cold.pitzer!.speciesKey + '|other' };
  const bad = { lnGamma: cold.pitzer!.lnGamma.map((g, i) => (i === 0 ? NaN : g)), speciesKey: cold.pitzer!.speciesKey };
  for (const start of [other, bad]) {
    if (solvePrepared(prepare(comp), 7, start).pH !== cold.pH) throw new Error(`a start that does not fit changed the pH for ${describe()}`);
  }
  const target = cold.pH + (w.shift >= 0 ? 0.05 : -0.05) + w.shift;
  if (target < 1 || target > 12) return out;
  const titrant = w.shift >= 0 ? SODIUM_HYDROXIDE : HYDROCHLORIC_ACID;
  const coldAmount = attempt(() => titrantForPh(fresh(comp), titrant, target));
  const near = attempt(() => titrantForPh(fresh(comp), titrant, target - (w.shift >= 0 ? 0.05 : -0.05)));
  if (!coldAmount || !near?.pitzer) return out;
  const warmAmount = attempt(() => titrantForPh(fresh(comp), titrant, target, near.pitzer));
  if (!warmAmount) throw new Error(`warm amount refused where the cold one was found: ${describe()}`);
  const buffers = comp.systems.reduce((sum, sys) => sum + sys.totalM, 0);
  const scale = Math.max(Math.abs(coldAmount.concentrationM), coldAmount.ionicStrengthM, buffers);
  out.amountDiff = Math.abs(warmAmount.concentrationM - coldAmount.concentrationM) / scale;
  out.amountDiffOfAmount = Math.abs(warmAmount.concentrationM - coldAmount.concentrationM) / Math.abs(coldAmount.concentrationM);
  out.coldAmountRounds = coldAmount.iterations;
  out.warmAmountRounds = warmAmount.iterations;
  if (!(out.amountDiff <= WARM_AMOUNT_BOUND))
    throw new Error(`warm amount ${warmAmount.concentrationM} vs cold ${coldAmount.concentrationM} (relative ${out.amountDiff}) for ${describe()}`);
  return out;
}
