/**
 * Command-line figures: start-up time of each light command (wall time of a fresh `node`
 * process, median of several runs, beside a bare `node -e 0` for the machine's floor), and
 * the batch rate of `recipe --batch` on a 10,000-row what-if table of our own (a HEPES
 * cold-room grid: pH 6.8–8.2 × 4–37 °C × 10–100 mM). Run after `npm run build:cli`.
 */
import { execFileSync, spawnSync } from 'child_process';
import { mkdtempSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';

const CLI = join(__dirname, '..', '..', 'lib', 'cli', 'main.js');
const RUNS = 7;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function wallMs(args: string[]): number {
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = process.hrtime.bigint();
    spawnSync(process.execPath, args, { stdio: ['ignore', 'ignore', 'ignore'] });
    times.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  return median(times);
}

const floor = wallMs(['-e', '0']);
console.log(`${'bare node -e 0 (the floor)'.padEnd(44)} ${floor.toFixed(0).padStart(6)} ms`);
for (const cmd of [
  ['--help'],
  ['--version'],
  ['substances'],
  ['recipe', '--help'],
  ['recipe', '--json', '{"buffer":"HEPES","targetPh":7.4,"concentrationMm":25,"volumeMl":500}'],
  ['solve', '--json', '{"forms":[{"form":"tris base","mM":50},{"form":"HCl","mM":25}]}'],
]) {
  const ms = wallMs([CLI, ...cmd]);
  console.log(`${`start: ${cmd.slice(0, 2).join(' ').slice(0, 36)}`.padEnd(44)} ${ms.toFixed(0).padStart(6)} ms   (${(ms - floor).toFixed(0)} ms above the floor)`);
}

const dir = mkdtempSync(join(tmpdir(), 'pl-bench-'));
const rows = ['buffer,targetPh,useTemperatureC,concentrationMm,volumeMl,benchTemperatureC,salts'];
for (let i = 0; i < 10000; i++) {
  const ph = (6.8 + (i % 15) * 0.1).toFixed(1);
  const t = [4, 10, 20, 25, 30, 37][Math.floor(i / 15) % 6];
  const mM = 10 + (Math.floor(i / 90) % 10) * 10;
  rows.push(`HEPES,${ph},${t},${mM},1000,22,NaCl 150 mM`);
}
const input = join(dir, 'grid.csv');
writeFileSync(input, rows.join('\n'));
const t0 = process.hrtime.bigint();
try {
  execFileSync(process.execPath, [CLI, 'recipe', '--batch', input, '-o', join(dir, 'grid.jsonl')], { stdio: ['ignore', 'pipe', 'inherit'] });
} catch {
  // Exit 1 means some rows hold errors; the rate counts them all.
}
const s = Number(process.hrtime.bigint() - t0) / 1e9;
console.log(`${'recipe --batch, 10,000 rows'.padEnd(44)} ${s.toFixed(2).padStart(6)} s    (${(10000 / s).toFixed(0)} rows/s)`);
