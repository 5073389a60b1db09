/**
 * Random compositions drawn from the whole substance library, shared by the fuzz test in
 * `npm test` (a reduced count) and `scripts/fuzz.ts` (the full 100,000).
 */
import fc from 'fast-check';
import { Composition, SODIUM_HYDROXIDE, HYDROCHLORIC_ACID, pKw, solvePh, speciate, titrantForPh, withTitrant } from '../../src/chem';
import { defaultLibrary } from '../../src/chem/library';
import { MAX_TARGET_PH, MIN_TARGET_PH } from '../../src/chem/titration';

const library = defaultLibrary();
const formNames = library.records().flatMap((r) => r.forms.map((f) => f.name));

/** A composition of 1–4 library forms at 0.01–500 mM each, 0–100 °C, any activity model. */
export const libraryComposition: fc.Arbitrary<Composition> = fc
  .record({
    items: fc.array(fc.record({ form: fc.constantFrom(...formNames), mM: fc.double({ min: 0.01, max: 500, noNaN: true }) }), { minLength: 1, maxLength: 4 }),
    temperatureC: fc.double({ min: 0, max: 100, noNaN: true }),
    activityModel: fc.constantFrom('davies' as const, 'ideal' as const, 'bates-guggenheim' as const),
  })
  .map(({ items, temperatureC, activityModel }) =>
    library.compositionFromForms(
      items.map((i) => ({ form: i.form, concentrationM: i.mM / 1000 })),
      { temperatureC, activityModel },
    ),
  );

/** Bound on the charge-balance residual, relative to the total ionic charge: far below any effect on a printed pH (docs/science.md, Methods). */
export const RESIDUAL_BOUND = 1e-10;
/** Round trips to a titrant amount hold to 1e-6 pH (the solver converges far tighter). */
export const ROUND_TRIP_BOUND = 1e-6;
/**
 * Round-trip targets stay this far inside the targets allowed (pH 0–14) and inside pKw(T):
 * beyond, the titrant needed is molar (a(H⁺) or a(OH⁻) above about 0.3) and the solver
 * rightly refuses some. At 25 °C this is the 0.5–13.5 window; at 100 °C, where pKw is
 * about 12.3, the base side ends near 11.8.
 */
export const ROUND_TRIP_MARGIN = 0.5;

/**
 * Checks one composition: it solves, every output is finite, the residual is within bound,
 * and a titrant round trip (NaOH up or HCl down by `shift`) holds where the target is reachable.
 * Throws on a violation, with the composition in the message.
 */
export function checkComposition(comp: Composition, shift: number): void {
  const r = speciate(comp);
  const describe = () => JSON.stringify(comp);
  if (!Number.isFinite(r.pH) || !Number.isFinite(r.ionicStrengthM) || r.species.some((s) => !Number.isFinite(s.concentrationM) || !Number.isFinite(s.activity))) {
    throw new Error(`non-finite output for ${describe()}`);
  }
  if (!(r.diagnostics.relativeResidual <= RESIDUAL_BOUND)) throw new Error(`residual ${r.diagnostics.relativeResidual} for ${describe()}`);
  const target = r.pH + shift;
  if (target < MIN_TARGET_PH + ROUND_TRIP_MARGIN || target > Math.min(MAX_TARGET_PH, pKw(r.temperatureC)) - ROUND_TRIP_MARGIN) return;
  const titrant = shift > 0 ? SODIUM_HYDROXIDE : HYDROCHLORIC_ACID;
  const amount = titrantForPh(comp, titrant, target).concentrationM;
  if (amount > 5) return;
  const back = solvePh(withTitrant(comp, titrant, amount));
  if (!(Math.abs(back - target) <= ROUND_TRIP_BOUND)) throw new Error(`round trip ${back} vs ${target} for ${describe()}`);
}
