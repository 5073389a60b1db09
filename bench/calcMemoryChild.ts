/**
 * One calc run for bench/calcMemory.bench.ts, in a process of its own so that its peak
 * resident memory is its own: prints { code, ms, maxRssMb, message } as JSON.
 */
import { main } from '../src/cli/main';

const start = performance.now();
let out = '';
void main(['calc', ...process.argv.slice(2)], (t) => (out += t)).then((code) => {
  let message = '';
  try {
    const parsed = JSON.parse(out);
    message = parsed.error?.message ?? `${parsed.formulas} formulas, ${parsed.errors.length} errors`;
  } catch {
    message = out.slice(0, 200);
  }
  process.stdout.write(JSON.stringify({ code, ms: performance.now() - start, maxRssMb: process.resourceUsage().maxRSS / 1024, message }) + '\n');
});
