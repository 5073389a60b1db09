/**
 * How much titrant brings a composition to a target pH.
 *
 * Method: at the target the hydrogen-ion activity is known, so every species of the
 * composition has a known charge; the titrant's charge per mole at that pH is known too
 * (+1 for NaOH's Na⁺, −1 for HCl's Cl⁻, z₀ − n̄(a_H) plus counter-ions for a weak
 * titrant). The charge balance is then linear in the titrant amount:
 *   c_t = −f₀(a_H, I) / q_t(a_H, I),
 * iterated only on the ionic strength (which the titrant itself raises). No nested root
 * finding (docs/science.md, Methods: "Titrant for a known target pH").
 */
import { integerPower, ionicStrengthFactor, parseActivityModel } from './activity';
import { AcidBaseChemistry, Composition, MAX_CONCENTRATION_M, PreparedComposition, appendStepConstants, prepare, systemAt, validateChemistry } from './composition';
import { ChemError, MESSAGES, requireNumber } from './errors';
import { selfConsistentIonicStrength } from './ionicStrength';
import { findStrongIon } from './strongIons';
import { solvePrepared } from './speciation';
import { vantHoffTerms } from './vantHoff';
import { AmountIncrements, PitzerAmount, pitzerAmountAtPh } from './pitzer/amount';
import type { PitzerStart } from './pitzer/iteration';

/** A titrant: what one mole of it adds to the solution. */
export interface Titrant {
  /** Name for messages, e.g. `NaOH`. */
  readonly name: string;
  /** Strong ions added per mole of titrant, e.g. `{ "Na+": 1 }` for NaOH, `{ "Cl-": 1 }` for HCl; negative for ions a form swap takes away. */
  readonly strongIons?: Readonly<Record<string, number>>;
  /** A weak acid–base system added per mole of titrant (weak titrants such as acetic acid or tris base). */
  readonly system?: AcidBaseChemistry;
  /** Moles of that system per mole of titrant (default 1). */
  readonly systemPerMole?: number;
}

/** Sodium hydroxide: each mole adds one Na⁺ (its OH⁻ becomes water). */
export const SODIUM_HYDROXIDE: Titrant = { name: 'NaOH', strongIons: { 'Na+': 1 } };
/** Hydrochloric acid: each mole adds one Cl⁻ (its H⁺ joins the equilibrium). */
export const HYDROCHLORIC_ACID: Titrant = { name: 'HCl', strongIons: { 'Cl-': 1 } };

/** Lowest and highest target pH accepted. */
export const MIN_TARGET_PH = 0;
export const MAX_TARGET_PH = 14;

/** The titrant amount that brings a composition to a target pH. */
export interface TitrantAmount {
  /** Titrant in mol per litre of the final solution. */
  readonly concentrationM: number;
  /** Ionic strength of the titrated solution, mol/L. */
  readonly ionicStrengthM: number;
  /** Charge the titrant carries per mole at the target (sign says acid or base). */
  readonly chargePerMole: number;
  readonly iterations: number;
  /**
   * Pitzer only: the converged ln γ of the titrated solution and its species key. The finished buffer (the
   * composition with this amount of titrant) has the same species in the same slots, so its solve can start here.
   */
  readonly pitzer?: PitzerStart;
}

/** A titrant reduced to numbers at a temperature. */
interface PreparedTitrant {
  readonly strongCharge: number;
  readonly strongHalfZ2: number;
  readonly ka: readonly number[];
  readonly zd: readonly number[];
  readonly z0: number;
  readonly perMole: number;
}

function prepareTitrant(titrant: Titrant, temperatureC: number): PreparedTitrant {
  let strongCharge = 0;
  let strongHalfZ2 = 0;
  for (const [name, perMole] of Object.entries(titrant.strongIons ?? {})) {
    const ion = findStrongIon('titrant.strongIons', name);
    requireNumber(`titrant.strongIons.${name}`, perMole, -10, 10);
    strongCharge += ion.charge * perMole;
    strongHalfZ2 += 0.5 * ion.charge * ion.charge * perMole;
  }
  const sys = titrant.system;
  if (!sys) return { strongCharge, strongHalfZ2, ka: [], zd: [], z0: 0, perMole: 0 };
  validateChemistry('titrant.system', sys);
  const perMole = titrant.systemPerMole === undefined ? 1 : requireNumber('titrant.systemPerMole', titrant.systemPerMole, 0, 10);
  const ka: number[] = [];
  const zd: number[] = [];
  appendStepConstants(sys, vantHoffTerms(temperatureC), ka, zd);
  return { strongCharge, strongHalfZ2, ka, zd, z0: sys.chargeOfMostProtonated, perMole };
}

// Results of `chargeAt` and `systemCharge`, kept in module scope so the iteration allocates nothing.
let atF = 0;
let atI2 = 0;
let sysQ = 0;
let sysQ2 = 0;

/**
 * Charge balance of the composition alone at a fixed a_H and ionic strength
 * (f₀, mol/L, into atF) and 2·I of its non-strong species (into atI2), at γ₁ = g1. The
 * solver's `evaluate` computes the same sums with derivatives besides; this lean form is
 * kept apart because sharing that one made capacity about 1.5× slower in `npm run bench`
 * (8–10 against 12–13 µs per call).
 */
function chargeAt(p: PreparedComposition, aH: number, g1: number): void {
  const hc = aH / g1;
  const ohc = p.kw / (aH * g1);
  let f = p.strongCharge + hc - ohc;
  let i2 = hc + ohc;
  for (let j = 0; j < p.totals.length; j++) {
    systemCharge(p.ka, p.zSquaredDiff, p.firstStep[j], p.stepCount[j], p.z0[j], aH, g1);
    f += p.totals[j] * sysQ;
    i2 += p.totals[j] * sysQ2;
  }
  atF = f;
  atI2 = i2;
}

/**
 * Mean charge and mean squared charge per molecule of one system at a_H and γ₁ (into sysQ
 * and sysQ2; summed species by species, as in the solver). The mixed constant of each step
 * is Ka·γ₁^(2z−1), by multiplication: γ₁^(2z₀−1) for the first step, one factor γ₁⁻² more per step.
 */
function systemCharge(ka: readonly number[], zd: readonly number[], first: number, steps: number, z: number, aH: number, g1: number): void {
  let t = 1;
  let sum = 1;
  let q = z;
  let q2 = z * z;
  let factor = steps > 0 ? integerPower(g1, zd[first]) / aH : 0;
  const inverseSquare = 1 / (g1 * g1);
  for (let k = 1; k <= steps; k++) {
    t *= ka[first + k - 1] * factor;
    factor *= inverseSquare;
    sum += t;
    q += (z - k) * t;
    q2 += (z - k) * (z - k) * t;
  }
  sysQ = q / sum;
  sysQ2 = q2 / sum;
}

/**
 * Titrant needed to bring a composition to a target pH, in mol/L of final solution.
 *
 * @param composition - the solution before titrant (mol/L of the final volume)
 * @param titrant - what one mole of titrant adds
 * @param targetPh - pH to reach (0–14) at the composition's temperature
 * @param start - Pitzer only: a neighbouring solution's converged γ (a solve's `pitzer`, or another amount's) to
 *   start the γ iteration from, used only as its first iterate (see solvePrepared); without it, Bates–Guggenheim.
 *   The answer does not depend on what was solved before unless a start is passed
 * @returns concentration of titrant in the final solution and the resulting ionic strength
 * @throws ChemError infeasible-target when this titrant moves the pH the wrong way or
 *   cannot reach the target; invalid-input for a bad composition, titrant or target
 * @example titrantForPh(acetate 0.1 M, SODIUM_HYDROXIDE, 4.76).concentrationM // ≈ 0.05
 */
export function titrantForPh(composition: Composition, titrant: Titrant, targetPh: number, start?: PitzerStart): TitrantAmount {
  requireNumber('targetPh', targetPh, MIN_TARGET_PH, MAX_TARGET_PH, `${MIN_TARGET_PH} to ${MAX_TARGET_PH}`);
  if (composition === null || typeof composition !== 'object' || parseActivityModel('activityModel', composition.activityModel) !== 'pitzer') {
    const p = prepare(composition);
    return titrantForPhPrepared(p, prepareTitrant(titrant, p.temperatureC), titrant.name, targetPh);
  }
  const setup = pitzerTitrantSetup(composition, titrant);
  const p = setup.p;
  // No starting estimate is needed: at fixed γ the first step already lands on the amount.
  const found = pitzerAmountAtPh(p, setup.inc, targetPh, 0, start);
  if (!Number.isFinite(found.amount) || found.amount < 0 || found.amount > MAX_CONCENTRATION_M) throw unreachable(p, titrant.name, targetPh, found.chargePerMole, found.amount);
  const pitzer = lastState(found);
  return { concentrationM: found.amount, ionicStrengthM: found.ionicStrengthM, chargePerMole: found.chargePerMole, iterations: found.iterations, pitzer };
}

/** An amount's converged γ as a start for a neighbouring solve, when it has them. */
function lastState(found: PitzerAmount): PitzerStart | undefined {
  return found.lnGamma ? { lnGamma: found.lnGamma, speciesKey: found.speciesKey } : undefined;
}

/** A composition prepared for the Pitzer amount solve with one titrant, and how the titrant's amount enters it. */
interface PitzerTitrantSetup {
  readonly strongIons: Titrant['strongIons'];
  readonly system: Titrant['system'];
  readonly systemPerMole: Titrant['systemPerMole'];
  readonly p: PreparedComposition;
  readonly inc: AmountIncrements;
}

/**
 * The last setups made, by composition object, most recent first found: a worksheet column asks the same
 * composition for several target pH (compositions are never changed once built, so the object stands for its
 * content). A ring scanned by identity rather than a WeakMap: a planner run makes fresh compositions that are
 * never asked again, and a WeakMap entry for each cost more than the lookup saved.
 */
const SETUP_RING = 128;
const ringKeys: (Composition | undefined)[] = new Array<Composition | undefined>(SETUP_RING).fill(undefined);
const ringSetups: (PitzerTitrantSetup | undefined)[] = new Array<PitzerTitrantSetup | undefined>(SETUP_RING).fill(undefined);
let ringNext = 0;
/** The slot of the setup last found or made. */
let ringLastFound = SETUP_RING - 1;

/**
 * The composition prepared once with the titrant's species present at zero amount, the amount entering
 * linearly (src/chem/pitzer/amount.ts); kept for the next target pH asked of the same composition and titrant.
 */
function pitzerTitrantSetup(composition: Composition, titrant: Titrant): PitzerTitrantSetup {
  // A grid that walks its columns in turn asks for the setups in the order they were made: the slot after the last
  // one found is tried first (one comparison instead of about a hundred), then the ring from the newest.
  const after = (ringLastFound + 1) % SETUP_RING;
  if (ringKeys[after] === composition && sameTitrant(ringSetups[after]!, titrant)) {
    ringLastFound = after;
    return ringSetups[after]!;
  }
  for (let k = 1; k <= SETUP_RING; k++) {
    const i = (ringNext - k + SETUP_RING) % SETUP_RING;
    if (ringKeys[i] !== composition) continue;
    const e = ringSetups[i]!;
    if (sameTitrant(e, titrant)) {
      ringLastFound = i;
      return e;
    }
  }
  const zero = withTitrant(composition, titrant, 0);
  const p = prepare(zero);
  prepareTitrant(titrant, p.temperatureC); // validates the titrant as the one-number path does
  const keys = Object.keys(zero.strongIons ?? {});
  const canonical = keys.map((key) => findStrongIon('strongIons', key).name);
  const strongUp = new Array<number>(keys.length).fill(0);
  for (const [name, perMole] of Object.entries(titrant.strongIons ?? {})) strongUp[canonical.indexOf(findStrongIon('titrant.strongIons', name).name)] += perMole;
  const totalsUp = new Array<number>(zero.systems.length).fill(0);
  if (titrant.system) totalsUp[totalsUp.length - 1] = titrant.systemPerMole ?? 1;
  const inc: AmountIncrements = { strongUp, strongDown: strongUp.map((v) => -v), totalsUp, totalsDown: totalsUp.map((v) => -v) };
  const setup: PitzerTitrantSetup = { strongIons: titrant.strongIons, system: titrant.system, systemPerMole: titrant.systemPerMole, p, inc };
  ringKeys[ringNext] = composition;
  ringSetups[ringNext] = setup;
  ringLastFound = ringNext;
  ringNext = (ringNext + 1) % SETUP_RING;
  return setup;
}

function sameTitrant(e: PitzerTitrantSetup, titrant: Titrant): boolean {
  return e.strongIons === titrant.strongIons && e.system === titrant.system && e.systemPerMole === titrant.systemPerMole;
}

function titrantForPhPrepared(p: PreparedComposition, t: PreparedTitrant, name: string, targetPh: number): TitrantAmount {
  const aH = Math.pow(10, -targetPh);
  let c = 0;
  let q = 0;
  let iterations = 0;
  // A negative amount mid-iteration may still turn positive as I settles; the sign is judged at the end.
  const speciesIonicStrength = (ionicStrengthM: number) => {
    iterations++;
    const g1 = Math.exp(-p.a * ionicStrengthFactor(p.model, ionicStrengthM) * Math.LN10);
    chargeAt(p, aH, g1);
    const f0 = atF;
    const i20 = atI2;
    q = t.strongCharge;
    let i2t = 2 * t.strongHalfZ2;
    if (t.perMole > 0) {
      systemCharge(t.ka, t.zd, 0, t.ka.length, t.z0, aH, g1);
      q += t.perMole * sysQ;
      i2t += t.perMole * sysQ2;
    }
    c = q === 0 ? Infinity : -f0 / q;
    if (!Number.isFinite(c) || Math.abs(c) > MAX_CONCENTRATION_M) throw unreachable(p, name, targetPh, q, c);
    return Math.max(0, p.strongIonicStrength + 0.5 * (i20 + Math.abs(c) * i2t));
  };
  const ionicStrength =
    p.model === 'ideal' ? speciesIonicStrength(0) : selfConsistentIonicStrength(p.strongIonicStrength, speciesIonicStrength, p.ionicStrengthScale + 1, 'The titrant amount');
  if (c < 0) throw unreachable(p, name, targetPh, q, c);
  return { concentrationM: c, ionicStrengthM: ionicStrength, chargePerMole: q, iterations };
}

/**
 * Signed strong-base equivalent that brings a prepared composition to a pH, mol/L:
 * positive is strong base added as Na⁺, negative is strong acid added as Cl⁻. Both are
 * monovalent, so the ionic strength sees |c|. Used for capacity, where the pH moves both ways.
 */
export function netStrongBaseForPh(p: PreparedComposition, pH: number): number {
  return p.pitzer ? strongBaseForPh(p, pH, undefined).amount : netStrongBaseOneNumber(p, pH);
}

/** A signed strong-base amount (see netStrongBaseForPh) and, with the Pitzer model, its converged γ to start a neighbouring amount from. */
export interface StrongBaseAmount {
  readonly amount: number;
  readonly pitzer?: PitzerStart;
}

/**
 * netStrongBaseForPh with the Pitzer γ iteration started from a neighbouring amount's γ (`start`, used only as the
 * first iterate, see solvePrepared), returning this amount's γ for the next: capacity asks four amounts of one
 * composition 0.002–0.2 pH apart. The one-number models ignore `start`.
 */
export function strongBaseForPh(p: PreparedComposition, pH: number, start: PitzerStart | undefined): StrongBaseAmount {
  if (p.pitzer) {
    const setup = strongBaseSetup(p);
    const found = pitzerAmountAtPh(setup.prepared, setup.increments, pH, 0, start);
    return { amount: found.amount, pitzer: lastState(found) };
  }
  return { amount: netStrongBaseOneNumber(p, pH) };
}

function netStrongBaseOneNumber(p: PreparedComposition, pH: number): number {
  const aH = Math.pow(10, -pH);
  let c = 0;
  const speciesIonicStrength = (ionicStrengthM: number) => {
    chargeAt(p, aH, Math.exp(-p.a * ionicStrengthFactor(p.model, ionicStrengthM) * Math.LN10));
    c = -atF;
    return p.strongIonicStrength + 0.5 * (atI2 + Math.abs(c));
  };
  if (p.model === 'ideal') speciesIonicStrength(0);
  else selfConsistentIonicStrength(p.strongIonicStrength, speciesIonicStrength, p.ionicStrengthScale + 1, 'The strong-base equivalent');
  return c;
}

/** The composition with Na⁺ and Cl⁻ slots for a signed strong-base amount (Na⁺ up, Cl⁻ down), kept per prepared composition: capacity asks five times. */
const STRONG_BASE_SETUPS = new WeakMap<PreparedComposition, StrongBaseSetup>();

/** The prepared composition with its Na⁺ and Cl⁻ slots, and how the amount enters it. */
interface StrongBaseSetup {
  readonly prepared: PreparedComposition;
  readonly increments: AmountIncrements;
}

function strongBaseSetup(p: PreparedComposition): StrongBaseSetup {
  let setup = STRONG_BASE_SETUPS.get(p);
  if (!setup) {
    const zero = withTitrant(withTitrant(p.source, SODIUM_HYDROXIDE, 0), HYDROCHLORIC_ACID, 0);
    const keys = Object.keys(zero.strongIons ?? {});
    const canonical = keys.map((key) => findStrongIon('strongIons', key).name);
    const nSystems = zero.systems.length;
    setup = {
      prepared: prepare(zero),
      increments: {
        strongUp: canonical.map((_, i) => (i === canonical.indexOf('Na+') ? 1 : 0)),
        strongDown: canonical.map((_, i) => (i === canonical.indexOf('Cl-') ? 1 : 0)),
        totalsUp: new Array<number>(nSystems).fill(0),
        totalsDown: new Array<number>(nSystems).fill(0),
      },
    };
    STRONG_BASE_SETUPS.set(p, setup);
  }
  return setup;
}

function unreachable(p: PreparedComposition, name: string, targetPh: number, q: number, c: number): ChemError {
  let detail: string;
  if (q === 0 || !Number.isFinite(c) || Math.abs(c) > MAX_CONCENTRATION_M) {
    detail = `${name} carries too little charge at this pH to get there (it would take more than ${MAX_CONCENTRATION_M} M)`;
  } else {
    const startPh = solvePrepared(p).pH;
    const direction = q > 0 ? 'raises' : 'lowers';
    detail = `${name} ${direction} the pH, and without it the solution is already at pH ${startPh.toFixed(2)}`;
  }
  return new ChemError(
    'infeasible-target',
    'unreachablePh',
    MESSAGES.unreachablePh(targetPh, detail),
    'targetPh',
    q > 0 ? 'a pH above the starting pH' : 'a pH below the starting pH',
  );
}

/**
 * The composition with a titrant added at a concentration (mol/L of final solution).
 * A weak titrant's system is added as a system of its own.
 */
export function withTitrant(composition: Composition, titrant: Titrant, concentrationM: number): Composition {
  const strongIons: Record<string, number> = { ...(composition.strongIons ?? {}) };
  for (const [name, perMole] of Object.entries(titrant.strongIons ?? {})) {
    const key = findStrongIon('titrant.strongIons', name).name;
    const existing = Object.keys(strongIons).find((k) => findStrongIon('strongIons', k).name === key);
    strongIons[existing ?? key] = (strongIons[existing ?? key] ?? 0) + perMole * concentrationM;
  }
  const systems = titrant.system ? [...composition.systems, systemAt(titrant.system, (titrant.systemPerMole ?? 1) * concentrationM)] : composition.systems;
  return { systems, strongIons, temperatureC: composition.temperatureC, activityModel: composition.activityModel };
}
