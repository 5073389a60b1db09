/**
 * Solver benchmark: median and p95 µs per call over ≥ 100,000 calls for fixed cases, so
 * figures compare from run to run. Calls are timed in batches of 100 (one clock read per
 * call would cost as much as the call); the per-call figure of each batch is a sample.
 *
 * Run: npm run bench (compiled with tsc and run with node, as shipped code runs)
 */
import { Composition, HYDROCHLORIC_ACID, capacity, speciate, solvePh, titrantForPh } from '../src/chem';
import { measure } from './measure';

const CALLS = 100_000;
const BATCH = 100;
const run = (label: string, fn: () => unknown) => measure(label, fn, CALLS, BATCH);

/** Constants as in test/chem/fixtures.ts (Goldberg et al. 2002, from memory). */
const acetate = { name: 'acetate', chargeOfMostProtonated: 0, steps: [{ pKa: 4.756, deltaHkJ: -0.41, deltaCpJ: -142 }] };
const phosphate = {
  name: 'phosphate',
  chargeOfMostProtonated: 0,
  steps: [
    { pKa: 2.148, deltaHkJ: -8.0, deltaCpJ: -141 },
    { pKa: 7.198, deltaHkJ: 3.6, deltaCpJ: -230 },
    { pKa: 12.35, deltaHkJ: 16.0, deltaCpJ: -242 },
  ],
};
const tris = { name: 'tris', chargeOfMostProtonated: 1, steps: [{ pKa: 8.072, deltaHkJ: 47.45, deltaCpJ: -59 }] };
const citrate = {
  name: 'citrate',
  chargeOfMostProtonated: 0,
  steps: [
    { pKa: 3.128, deltaHkJ: 4.07, deltaCpJ: -131 },
    { pKa: 4.761, deltaHkJ: 2.23, deltaCpJ: -178 },
    { pKa: 6.396, deltaHkJ: -3.38, deltaCpJ: -254 },
  ],
};

const oneSystem: Composition = { systems: [{ ...acetate, totalM: 0.05 }], strongIons: { 'Na+': 0.175, 'Cl-': 0.15 }, temperatureC: 20 };
const twoSystems: Composition = {
  systems: [
    { ...phosphate, totalM: 0.02 },
    { ...tris, totalM: 0.025 },
  ],
  strongIons: { 'Na+': 0.18, 'Cl-': 0.15, 'K+': 0.005 },
  temperatureC: 4,
};
const threeSystems: Composition = {
  systems: [
    { ...citrate, totalM: 0.01 },
    { ...phosphate, totalM: 0.02 },
    { ...tris, totalM: 0.02 },
  ],
  strongIons: { 'Na+': 0.2, 'Cl-': 0.15, 'Mg2+': 0.002 },
  temperatureC: 37,
};

/** 1× phosphate-buffered saline (our own recipe: 137 mM NaCl, 2.7 mM KCl, 10 mM Na2HPO4, 1.8 mM KH2PO4), and its 10× stock. */
const salinePhosphate = (fold: number, activityModel: 'pitzer' | 'davies'): Composition => ({
  systems: [{ ...phosphate, totalM: 0.0118 * fold }],
  strongIons: { 'Na+': 0.157 * fold, 'K+': 0.0045 * fold, 'Cl-': 0.1397 * fold },
  temperatureC: 25,
  activityModel,
});

// Every composition is built once, outside the timed call: an object spread that adds a field costs about 0.5 µs in
// V8, which the lines below would otherwise charge to the solver. Nothing is kept between calls by composition
// object for the pH solve or the report, so timing the same object repeatedly measures a full solve each time.
const saline1Davies = salinePhosphate(1, 'davies');
const saline1Pitzer = salinePhosphate(1, 'pitzer');
const saline10Davies = salinePhosphate(10, 'davies');
const saline10Pitzer = salinePhosphate(10, 'pitzer');
const twoSystemsDavies: Composition = { ...twoSystems, activityModel: 'davies' };
const threeSystemsDavies: Composition = { ...threeSystems, activityModel: 'davies' };

console.log(`Proton Ledger solver bench — node ${process.version}, ${new Date().toISOString()}`);
run('pH only, saline phosphate 1×, Davies', () => solvePh(saline1Davies));
run('pH only, saline phosphate 1×, Pitzer', () => solvePh(saline1Pitzer));
run('pH only, saline phosphate 10× stock, Davies', () => solvePh(saline10Davies));
run('pH only, saline phosphate 10× stock, Pitzer', () => solvePh(saline10Pitzer));
run('pH only, 2 systems + salts (4 °C), Davies', () => solvePh(twoSystemsDavies));
run('pH only, 3 systems + salts (37 °C), Davies', () => solvePh(threeSystemsDavies));
run('pH only, 1 system + salts (acetate, NaCl, 20 °C)', () => solvePh(oneSystem));
run('pH only, 2 systems + salts (phosphate, tris, 4 °C)', () => solvePh(twoSystems));
run('pH only, 3 systems + salts (citrate, phosphate, tris)', () => solvePh(threeSystems));
run('full speciation report, 2 systems + salts', () => speciate(twoSystems));
run('full speciation report, 2 systems + salts, Davies', () => speciate(twoSystemsDavies));
run('titrant amount (HCl to pH 7.4), 2 systems + salts', () => titrantForPh(twoSystems, HYDROCHLORIC_ACID, 7.4));
run('titrant amount (HCl to pH 7.4), 2 systems + salts, Davies', () => titrantForPh(twoSystemsDavies, HYDROCHLORIC_ACID, 7.4));
run('capacity (β and mM per 0.1 pH), 2 systems + salts', () => capacity(twoSystems));
