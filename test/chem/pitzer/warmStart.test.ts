import fc from 'fast-check';
import { WARM_AMOUNT_BOUND, WARM_PH_BOUND, checkWarmStart, warmCase } from './warmStart';

describe('Pitzer warm starts: the same fixed point as the default start (2000 random library compositions; scripts/warmStart.ts runs 20,000)', () => {
  it(`pH within ${WARM_PH_BOUND} and titrant amounts within ${WARM_AMOUNT_BOUND} of max(amount, I, buffer) of the cold start; a start that does not fit is ignored`, () => {
    let compared = 0;
    for (const w of fc.sample(warmCase, { numRuns: 2000, seed: 7 })) if (checkWarmStart(w).phDiff !== undefined) compared++;
    expect(compared).toBeGreaterThan(1900);
  });
});
