/**
 * Shared timing loop for the benchmarks: calls are timed in batches (one clock read per
 * call would cost as much as a fast call); each batch's per-call time is one sample, and
 * the median and 95th percentile of the samples are printed.
 */
export function measure(label: string, fn: () => unknown, calls: number, batch: number): void {
  for (let i = 0; i < Math.min(2000, calls); i++) fn(); // warm up the JIT
  const samples: number[] = [];
  for (let b = 0; b < calls / batch; b++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) fn();
    samples.push(Number(process.hrtime.bigint() - t0) / 1000 / batch);
  }
  samples.sort((a, b) => a - b);
  const median = samples[Math.floor(samples.length / 2)];
  const p95 = samples[Math.floor(samples.length * 0.95)];
  console.log(`${label.padEnd(60)} median ${median.toFixed(2).padStart(8)} µs   p95 ${p95.toFixed(2).padStart(8)} µs   (${calls} calls)`);
}
