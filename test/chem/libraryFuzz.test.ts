import fc from 'fast-check';
import { checkComposition, libraryComposition } from './libraryFuzz';

/** Reduced count for `npm test`; `npx tsx scripts/fuzz.ts` runs 100,000 (see README). */
const NUM_RUNS = 2000;

describe('fuzz: random compositions from the whole library, 0–100 °C, every activity model (2000 cases here)', () => {
  it('converge, stay finite, keep the residual ≤ 1e-10 and hold titrant round trips to 1e-6', () => {
    fc.assert(
      fc.property(
        libraryComposition,
        fc.double({ min: -1.5, max: 1.5, noNaN: true }).filter((x) => Math.abs(x) > 0.01),
        (comp, shift) => {
          checkComposition(comp, shift);
        },
      ),
      { numRuns: NUM_RUNS },
    );
  });
});
