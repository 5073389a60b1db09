/**
 * A fixed batch of 1,000 two-system saline compositions, solved one after another, so the
 * per-solution figure compares from run to run (single fixed cases flatter the JIT's guesses;
 * a batch mixes buffers, strengths and temperatures as a worksheet column does).
 *
 * The batch is drawn from our own generator with the seed below, stored here: every run
 * solves the same 1,000 solutions (the checksum printed first shows it).
 *
 * Run: npm run bench (after the solver bench)
 */
import { Composition, solvePh, speciate } from '../src/chem';

/** Our seed for the batch; change it and the figures no longer compare with earlier runs. */
export const SALINE_BATCH_SEED = 20_261_202;
const SIZE = 1000;
const ROUNDS = 15;

/** mulberry32: a small deterministic 32-bit generator (public domain; common practice for reproducible draws). */
function generator(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Constants as in bench/solver.bench.ts (Goldberg et al. 2002, from memory). */
const SYSTEMS = [
  { name: 'acetate', chargeOfMostProtonated: 0, steps: [{ pKa: 4.756, deltaHkJ: -0.41, deltaCpJ: -142 }] },
  {
    name: 'phosphate',
    chargeOfMostProtonated: 0,
    steps: [
      { pKa: 2.148, deltaHkJ: -8.0, deltaCpJ: -141 },
      { pKa: 7.198, deltaHkJ: 3.6, deltaCpJ: -230 },
      { pKa: 12.35, deltaHkJ: 16.0, deltaCpJ: -242 },
    ],
  },
  { name: 'tris', chargeOfMostProtonated: 1, steps: [{ pKa: 8.072, deltaHkJ: 47.45, deltaCpJ: -59 }] },
  {
    name: 'citrate',
    chargeOfMostProtonated: 0,
    steps: [
      { pKa: 3.128, deltaHkJ: 4.07, deltaCpJ: -131 },
      { pKa: 4.761, deltaHkJ: 2.23, deltaCpJ: -178 },
      { pKa: 6.396, deltaHkJ: -3.38, deltaCpJ: -254 },
    ],
  },
];

/** The batch: two different systems of 1–100 mM, 50–300 mM NaCl, 0–10 mM KCl, NaOH up to 1.5 mol per mole of buffer, 4–37 °C. */
export function salineBatch(activityModel: 'pitzer' | 'davies', seed = SALINE_BATCH_SEED): Composition[] {
  const next = generator(seed);
  const out: Composition[] = [];
  for (let i = 0; i < SIZE; i++) {
    const a = Math.floor(next() * SYSTEMS.length);
    const b = (a + 1 + Math.floor(next() * (SYSTEMS.length - 1))) % SYSTEMS.length;
    const nacl = 0.05 + 0.25 * next();
    const kcl = 0.01 * next();
    const totalA = 0.001 + 0.099 * next();
    const totalB = 0.001 + 0.099 * next();
    // Strong base up to 1.5 mol per mole of buffer (the acid forms part neutralised, as a titrated buffer is).
    const naoh = 1.5 * (totalA + totalB) * next();
    out.push({
      systems: [
        { ...SYSTEMS[a], totalM: totalA },
        { ...SYSTEMS[b], totalM: totalB },
      ],
      strongIons: { 'Na+': nacl + naoh, 'K+': kcl, 'Cl-': nacl + kcl },
      temperatureC: 4 + 33 * next(),
      activityModel,
    });
  }
  return out;
}

/** Median over rounds of the time per solution, µs, with the range. */
function perSolution(label: string, batch: readonly Composition[], fn: (c: Composition) => unknown): void {
  for (const c of batch) fn(c); // warm up the JIT
  const times: number[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    const t0 = process.hrtime.bigint();
    for (const c of batch) fn(c);
    times.push(Number(process.hrtime.bigint() - t0) / 1000 / batch.length);
  }
  times.sort((x, y) => x - y);
  const median = times[Math.floor(times.length / 2)];
  console.log(
    `${label.padEnd(60)} median ${median.toFixed(2).padStart(8)} µs   range ${times[0].toFixed(2)}–${times[times.length - 1].toFixed(2)} µs   (${ROUNDS} rounds × ${batch.length})`,
  );
}

const davies = salineBatch('davies');
const pitzer = salineBatch('pitzer');
let checksum = 0;
for (const c of pitzer) checksum += solvePh(c);
console.log(
  `Proton Ledger saline batch bench — node ${process.version}, ${new Date().toISOString()}; seed ${SALINE_BATCH_SEED}, mean pH (Pitzer) ${(checksum / pitzer.length).toFixed(6)}`,
);
perSolution('batch: pH, 2 systems in saline, Davies', davies, solvePh);
perSolution('batch: pH, 2 systems in saline, Pitzer', pitzer, solvePh);
perSolution('batch: full speciation, 2 systems in saline, Davies', davies, speciate);
perSolution('batch: full speciation, 2 systems in saline, Pitzer', pitzer, speciate);
