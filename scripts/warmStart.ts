/**
 * Warm starts of the Pitzer iteration against cold starts over random library compositions (default 20,000; the
 * test in `npm test` runs 2,000 of the same cases): the largest pH and titrant-amount differences and the mean γ
 * rounds with each start. Exits 1 on a violation of the bounds in test/chem/pitzer/warmStart.ts.
 *
 * Run: npx tsx scripts/warmStart.ts   (WARM_RUNS=100000 WARM_SEED=7 to change)
 */
import fc from 'fast-check';
import { WarmOutcome, checkWarmStart, warmCase } from '../test/chem/pitzer/warmStart';

const runs = Number(process.env.WARM_RUNS ?? 20_000);
const seed = Number(process.env.WARM_SEED ?? 7);
let maxPh = 0;
let maxAmount = 0;
let maxAmountOwn = 0;
let phCases = 0;
let amountCases = 0;
let coldRounds = 0;
let warmRounds = 0;
let coldAmountRounds = 0;
let warmAmountRounds = 0;
const failures: string[] = [];
for (const w of fc.sample(warmCase, { numRuns: runs, seed })) {
  let o: WarmOutcome;
  try {
    o = checkWarmStart(w);
  } catch (e) {
    failures.push((e as Error).message);
    continue;
  }
  if (o.phDiff !== undefined) {
    phCases++;
    maxPh = Math.max(maxPh, o.phDiff);
    coldRounds += o.coldRounds!;
    warmRounds += o.warmRounds!;
  }
  if (o.amountDiff !== undefined) {
    amountCases++;
    maxAmount = Math.max(maxAmount, o.amountDiff);
    maxAmountOwn = Math.max(maxAmountOwn, o.amountDiffOfAmount!);
    coldAmountRounds += o.coldAmountRounds!;
    warmAmountRounds += o.warmAmountRounds!;
  }
}
console.log(
  `${runs} cases (seed ${seed}): pH compared in ${phCases}, largest difference ${maxPh.toExponential(2)}; γ rounds cold ${(coldRounds / phCases).toFixed(2)}, warm ${(warmRounds / phCases).toFixed(2)}`,
);
console.log(
  `titrant amounts compared in ${amountCases}: largest difference ${maxAmount.toExponential(2)} of max(amount, I, buffer), ${maxAmountOwn.toExponential(2)} of the amount; rounds cold ${(coldAmountRounds / amountCases).toFixed(2)}, warm ${(warmAmountRounds / amountCases).toFixed(2)}`,
);
if (failures.length > 0) {
  console.error(`${failures.length} failures:\n${failures.slice(0, 10).join('\n')}`);
  process.exit(1);
}
