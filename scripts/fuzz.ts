/**
 * The full fuzz run: 100,000 random compositions from the whole library (or FUZZ_RUNS),
 * each solved, checked for finite output and residual ≤ 1e-10, and round-tripped through
 * a titrant amount. Prints the count, the slowest case and the time; exits 1 on a failure.
 *
 * Run: npx tsx scripts/fuzz.ts   (FUZZ_RUNS=1000000 FUZZ_SEED=42 to change)
 */
import fc from 'fast-check';
import { checkComposition, libraryComposition } from '../test/chem/libraryFuzz';

const runs = Number(process.env.FUZZ_RUNS ?? 100_000);
const seed = process.env.FUZZ_SEED === undefined ? Date.now() : Number(process.env.FUZZ_SEED);
let slowestMs = 0;
const t0 = Date.now();
const result = fc.check(
  fc.property(
    libraryComposition,
    fc.double({ min: -1.5, max: 1.5, noNaN: true }).filter((x) => Math.abs(x) > 0.01),
    (comp, shift) => {
      const start = performance.now();
      checkComposition(comp, shift);
      slowestMs = Math.max(slowestMs, performance.now() - start);
    },
  ),
  { numRuns: runs, seed },
);
const seconds = (Date.now() - t0) / 1000;
if (result.failed) {
  console.error(fc.defaultReportMessage(result));
  process.exit(1);
}
console.log(`fuzz: ${result.numRuns} compositions passed (seed ${seed}) in ${seconds.toFixed(1)} s; slowest case ${slowestMs.toFixed(2)} ms`);
