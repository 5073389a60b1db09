/**
 * What a solution contains, as the core accepts it, and its validation into a compact
 * prepared form (constants at the temperature, flat arrays) that the solver iterates on.
 */
import { ActivityModel, parseActivityModel } from './activity';
import { ChemError, MESSAGES, requireInteger, requireNumber } from './errors';
import { ChemWarning, warning } from './warnings';
import { findStrongIon } from './strongIons';
import { VantHoffTerms, lnKaAt, vantHoffTerms } from './vantHoff';
import { PitzerLayout, PitzerLayoutShape, layoutWith, pitzerLayoutShape } from './pitzer/prepared';
import { debyeHuckelA, pKw, waterDensity } from './water';

/** One proton-dissociation step of an acid–base system, constants at 25 °C and I = 0. */
export interface AcidBaseStep {
  /** pKa at 25 °C, I = 0. */
  readonly pKa: number;
  /** Standard enthalpy of ionisation, kJ/mol (0 if unknown: the pKa then does not move with temperature). */
  readonly deltaHkJ?: number;
  /** Standard heat-capacity change of ionisation, J K⁻¹ mol⁻¹ (0 if unknown). */
  readonly deltaCpJ?: number;
  /** Temperatures (°C) the step's data cover, when known: outside them pKa(T) is an extrapolation (see temperatureWarnings). */
  readonly temperatureRangeC?: readonly [number, number];
}

/** The chemistry of one acid–base system, without an amount. */
export interface AcidBaseChemistry {
  readonly name: string;
  /** Charge of the most protonated form (e.g. 0 for phosphoric acid, +1 for tris-H⁺, +1 for glycine's cation). */
  readonly chargeOfMostProtonated: number;
  /** Steps in order of proton loss; pKa values ascend. */
  readonly steps: readonly AcidBaseStep[];
}

/** An acid–base system at a total concentration (all its protonation states together). */
export interface AcidBaseSystem extends AcidBaseChemistry {
  /** Total concentration of the system in mol/L of solution. */
  readonly totalM: number;
}

/**
 * A solution to solve. Treated as a value: what is derived from a system's steps array (its Ka at a temperature,
 * its Pitzer layout) is kept by the array's identity, so a steps array is never changed once a composition holds it.
 */
export interface Composition {
  readonly systems: readonly AcidBaseSystem[];
  /** Strong ions in mol/L, keyed by ion name (`Na+`, `Cl-`, …; see STRONG_IONS). */
  readonly strongIons?: Readonly<Record<string, number>>;
  /** Temperature in °C (default 25). */
  readonly temperatureC?: number;
  /** Activity model (default `pitzer`). */
  readonly activityModel?: ActivityModel;
}

/**
 * The same solution under other conditions. Built field by field: in V8 an object spread
 * that adds a field the source lacks takes a slow path costing about a microsecond, more
 * than a whole pH solve.
 */
export function withConditions(c: Composition, temperatureC: number | undefined, activityModel?: ActivityModel): Composition {
  return { systems: c.systems, strongIons: c.strongIons, temperatureC: temperatureC ?? c.temperatureC, activityModel: activityModel ?? c.activityModel };
}

/** A system's chemistry at a total concentration (built field by field, see withConditions). */
export function systemAt(chem: AcidBaseChemistry, totalM: number): AcidBaseSystem {
  return { name: chem.name, chargeOfMostProtonated: chem.chargeOfMostProtonated, steps: chem.steps, totalM };
}

/** Lowest temperature accepted, °C: liquid water at 1 atm. */
export const MIN_TEMPERATURE_C = 0;
/** Highest temperature accepted, °C: liquid water at 1 atm. */
export const MAX_TEMPERATURE_C = 100;
/** Above this temperature (°C) most pKa fits are extrapolated (Goldberg et al. 2002 fit most data within 0–60 °C); results carry a warning. */
export const FITTED_RANGE_MAX_C = 60;
/** Largest total concentration of one system or strong ion accepted, mol/L (beyond any buffer's solubility; a guard against unit slips). */
export const MAX_CONCENTRATION_M = 20;
/** Most steps one system may have. */
export const MAX_STEPS = 8;

/** A composition validated and reduced to numbers at its temperature. Internal to the solver. */
export interface PreparedComposition {
  readonly temperatureC: number;
  readonly model: ActivityModel;
  /** Debye–Hückel A at the temperature. */
  readonly a: number;
  /** Thermodynamic Kw at the temperature. */
  readonly kw: number;
  /** Per system: total (mol/L), charge of the most protonated form, index of its first step, number of steps. */
  readonly totals: readonly number[];
  readonly z0: readonly number[];
  readonly firstStep: readonly number[];
  readonly stepCount: readonly number[];
  /** Per step: thermodynamic Ka at the temperature, and 2·z(HA) − 1 (the z² difference between acid and base). */
  readonly ka: readonly number[];
  readonly zSquaredDiff: readonly number[];
  /** Σ z·c of strong ions (mol/L) and ½ Σ z²·c of strong ions (mol/L). */
  readonly strongCharge: number;
  readonly strongIonicStrength: number;
  /** Largest ionic strength the composition could reach (every system in its most charged state), mol/L; scales rounding floors. */
  readonly ionicStrengthScale: number;
  readonly warnings: readonly ChemWarning[];
  /** The composition as given (the Pitzer paths rebuild it with titrant added). */
  readonly source: Composition;
  /** Density of pure water at the temperature, g/cm³. */
  readonly waterDensity: number;
  /** The Pitzer model over this composition's species (model `pitzer` only). */
  readonly pitzer?: PitzerLayout;
  /** Each strong ion's amount, mol/L, in the order of the keys. */
  readonly strongConcentrations: readonly number[];
  /** The constants this was prepared with (shared by every composition of the same chemistry). */
  readonly chemistry: ChemistryAt;
}

/** Formats a charge the way chemists write it: 0, 1+, 2−. */
export function chargeLabel(z: number): string {
  if (z === 0) return '0';
  return `${Math.abs(z)}${z > 0 ? '+' : '−'}`;
}

/** True when `v` is a number within [min, max] (NaN fails): the cheap test made before any message is built. */
function inRange(v: unknown, min: number, max: number): boolean {
  return typeof v === 'number' && v >= min && v <= max;
}

/**
 * Validates an acid–base system's chemistry. `prefix` and `index` name it in messages
 * (`systems[2]`); the name is only built when something is wrong, to keep the hot path cheap.
 */
export function validateChemistry(prefix: string, chem: AcidBaseChemistry, index?: number): void {
  const field = () => (index === undefined ? prefix : `${prefix}[${index}]`);
  const z = chem.chargeOfMostProtonated;
  if (!(Number.isInteger(z) && z >= -6 && z <= 6)) requireInteger(`${field()}.chargeOfMostProtonated`, z, -6, 6);
  const steps = chem.steps;
  if (!Array.isArray(steps) || steps.length === 0 || steps.length > MAX_STEPS) {
    const allowed = `1 to ${MAX_STEPS} steps`;
    throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange(`${field()}.steps`, Array.isArray(steps) ? steps.length : steps, allowed), `${field()}.steps`, allowed);
  }
  let prev = -Infinity;
  for (let k = 0; k < steps.length; k++) {
    const step = steps[k];
    const pka = step.pKa;
    if (!inRange(pka, -10, 25)) requireNumber(`${field()}.steps[${k}].pKa`, pka, -10, 25);
    if (step.deltaHkJ !== undefined && !inRange(step.deltaHkJ, -200, 200)) requireNumber(`${field()}.steps[${k}].deltaHkJ`, step.deltaHkJ, -200, 200);
    if (step.deltaCpJ !== undefined && !inRange(step.deltaCpJ, -2000, 2000)) requireNumber(`${field()}.steps[${k}].deltaCpJ`, step.deltaCpJ, -2000, 2000);
    if (pka <= prev) {
      throw new ChemError('invalid-input', 'stepsOutOfOrder', MESSAGES.stepsOutOfOrder(`${field()}.steps`, prev, pka), `${field()}.steps`, 'ascending pKa values');
    }
    prev = pka;
  }
}

/**
 * Appends a system's per-step constants at a temperature: the thermodynamic Ka of each
 * step, and 2·z(HA) − 1 (the z² difference between its acid and base). One place for what
 * the solver and the titrant preparation both need.
 */
export function appendStepConstants(chem: AcidBaseChemistry, terms: VantHoffTerms, ka: number[], zSquaredDiff: number[]): void {
  for (let k = 0; k < chem.steps.length; k++) {
    const step = chem.steps[k];
    ka.push(Math.exp(lnKaAt(step.pKa, step.deltaHkJ ?? 0, step.deltaCpJ ?? 0, terms)));
    zSquaredDiff.push(2 * (chem.chargeOfMostProtonated - k) - 1);
  }
}

/**
 * The constants of a composition's chemistry at its temperature: everything `prepare`
 * computes that does not depend on the amounts (the systems validated, Ka of every step
 * by van 't Hoff, Kw, the Debye–Hückel A, the density of water, the strong ions' charges,
 * and for the Pitzer model the layout of its species). The same for every composition of
 * the same systems and strong ions at the same temperature and activity model, so a plan,
 * a capacity, a dilution series or a worksheet column computes it once (see chemistryOf).
 */
export interface ChemistryAt {
  readonly temperatureC: number;
  readonly model: ActivityModel;
  readonly a: number;
  readonly kw: number;
  readonly waterDensity: number;
  readonly z0: readonly number[];
  readonly firstStep: readonly number[];
  readonly stepCount: readonly number[];
  readonly ka: readonly number[];
  readonly zSquaredDiff: readonly number[];
  /** Per system: the largest z² any of its forms has (for the rounding scale of the ionic strength). */
  readonly zMaxSquared: readonly number[];
  /** The strong-ion keys as given, and each one's charge. */
  readonly strongIonNames: readonly string[];
  readonly strongCharges: readonly number[];
  readonly warnings: readonly ChemWarning[];
  /** The Pitzer layout without amounts (model `pitzer` only). */
  readonly layout?: PitzerLayoutShape;
  /** pKw at the temperature. */
  readonly pKw: number;
  /** Filled on first use by a report (see reportConstants): what only the report needs. */
  reportConstants?: ReportConstants;
  /** Filled on first use by a report of a one-number model: the Pitzer layout its osmotic coefficient is evaluated on. */
  osmoticLayout?: PitzerLayoutShape;
  /** What the constants were computed for, compared by identity (steps) and value (the rest) when found again. */
  readonly systems: readonly AcidBaseChemistry[];
}

/** What only a report needs of a chemistry: each step's pKa at the temperature (I = 0), and every species' name in the layout's order (H⁺, OH⁻, strong ions, each system's forms). */
export interface ReportConstants {
  readonly pKa: readonly number[];
  readonly speciesNames: readonly string[];
}

/** A chemistry's report constants, built on the first report of it (a solve alone never needs them). */
export function reportConstants(c: ChemistryAt): ReportConstants {
  if (c.reportConstants) return c.reportConstants;
  const speciesNames = ['H+', 'OH-'];
  for (const name of c.strongIonNames) speciesNames.push(findStrongIon('strongIons', name).name);
  for (const sys of c.systems) {
    for (let k = 0; k <= sys.steps.length; k++) speciesNames.push(`${sys.name} ${chargeLabel(sys.chargeOfMostProtonated - k)}`);
  }
  c.reportConstants = { pKa: c.ka.map((k) => -Math.log10(k)), speciesNames };
  return c.reportConstants;
}

/** Chemistries kept, most recent first found: a plan uses about ten (temperatures, titrant added), a worksheet a handful. */
const CHEMISTRY_RING = 32;
const chemistryRing: (ChemistryAt | undefined)[] = new Array<ChemistryAt | undefined>(CHEMISTRY_RING).fill(undefined);
let chemistryNext = 0;
/** The temperature of each ring entry (NaN where empty: it equals nothing). */
const ringTemperatures = new Float64Array(CHEMISTRY_RING).fill(NaN);

function sameChemistry(c: ChemistryAt, systems: readonly AcidBaseChemistry[], names: readonly string[], temperatureC: number, model: ActivityModel): boolean {
  if (c.temperatureC !== temperatureC || c.model !== model || c.systems.length !== systems.length || c.strongIonNames.length !== names.length) return false;
  for (let j = 0; j < systems.length; j++) {
    const a = c.systems[j];
    const b = systems[j];
    if (a.steps !== b.steps || a.chargeOfMostProtonated !== b.chargeOfMostProtonated || a.name !== b.name) return false;
  }
  for (let i = 0; i < names.length; i++) if (c.strongIonNames[i] !== names[i]) return false;
  return true;
}

/**
 * The chemistry of a composition at its temperature and activity model: found among the
 * last CHEMISTRY_RING computed (systems compared by their steps array, charge and name;
 * compositions and their steps are never changed once built, so the array stands for its
 * pKa, ΔH° and ΔCp°), or computed, validated and kept. Pure: the answer depends only on the
 * arguments. Throws ChemError (invalid-input) for a bad system or strong-ion name.
 *
 * @param systems - the acid–base systems (their amounts are not read)
 * @param strongIonNames - the strong-ion keys, in the order given
 * @param temperatureC - °C, validated already
 * @param model - the activity model
 */
export function chemistryOf(systems: readonly AcidBaseChemistry[], strongIonNames: readonly string[], temperatureC: number, model: ActivityModel): ChemistryAt {
  const found = knownChemistry(systems, strongIonNames, temperatureC, model);
  if (found) return found;
  for (let j = 0; j < systems.length; j++) validateChemistry('systems', systems[j], j);
  return keep(computeChemistry(systems, strongIonNames, temperatureC, model));
}

/** Puts a chemistry in the ring, in place of the oldest. */
function keep(c: ChemistryAt): ChemistryAt {
  chemistryRing[chemistryNext] = c;
  ringTemperatures[chemistryNext] = c.temperatureC;
  chemistryNext = (chemistryNext + 1) % CHEMISTRY_RING;
  return c;
}

/** The chemistry among those kept, or undefined. */
function knownChemistry(systems: readonly AcidBaseChemistry[], strongIonNames: readonly string[], temperatureC: number, model: ActivityModel): ChemistryAt | undefined {
  // Temperatures first, from a typed array: a column of solutions at as many temperatures then costs a tight scan.
  for (let k = 1; k <= CHEMISTRY_RING; k++) {
    const i = (chemistryNext - k + CHEMISTRY_RING) % CHEMISTRY_RING;
    if (ringTemperatures[i] !== temperatureC) continue;
    const c = chemistryRing[i]!;
    if (sameChemistry(c, systems, strongIonNames, temperatureC, model)) return c;
  }
  return undefined;
}

/** Computes a chemistry whose systems are validated already (strong-ion names are checked here). */
function computeChemistry(systems: readonly AcidBaseChemistry[], strongIonNames: readonly string[], temperatureC: number, model: ActivityModel): ChemistryAt {
  const n = systems.length;
  const z0: number[] = [];
  const firstStep: number[] = [];
  const stepCount: number[] = [];
  const ka: number[] = [];
  const zSquaredDiff: number[] = [];
  const zMaxSquared: number[] = [];
  const terms = vantHoffTerms(temperatureC);
  let s = 0;
  for (let j = 0; j < n; j++) {
    const sys = systems[j];
    z0.push(sys.chargeOfMostProtonated);
    firstStep.push(s);
    stepCount.push(sys.steps.length);
    const zMax = Math.max(Math.abs(sys.chargeOfMostProtonated), Math.abs(sys.chargeOfMostProtonated - sys.steps.length));
    zMaxSquared.push(zMax * zMax);
    appendStepConstants(sys, terms, ka, zSquaredDiff);
    s += sys.steps.length;
  }
  const strongCharges: number[] = [];
  for (let i = 0; i < strongIonNames.length; i++) strongCharges.push(findStrongIon('strongIons', strongIonNames[i]).charge);
  const kwExponent = pKw(temperatureC);
  const a = debyeHuckelA(temperatureC);
  const warnings: ChemWarning[] = [];
  if (temperatureC > FITTED_RANGE_MAX_C) {
    warnings.push(warning('aboveFittedRange', MESSAGES.aboveFittedRange(temperatureC, FITTED_RANGE_MAX_C), 'temperatureC'));
  }
  return {
    temperatureC,
    model,
    a,
    kw: Math.pow(10, -kwExponent),
    pKw: kwExponent,
    waterDensity: waterDensity(temperatureC),
    z0,
    firstStep,
    stepCount,
    ka,
    zSquaredDiff,
    zMaxSquared,
    strongIonNames: strongIonNames.slice(),
    strongCharges,
    warnings,
    layout: model === 'pitzer' ? pitzerLayoutShape(strongIonNames, systems, temperatureC, a) : undefined,
    // Held as given (their steps, names and charges are what is compared; compositions are never changed once built).
    systems,
  };
}

/**
 * Validates a composition and computes its constants at the temperature (the chemistry
 * part found again by chemistryOf when it was computed lately).
 * Throws ChemError (invalid-input) naming the field, value and what is allowed.
 */
export function prepare(composition: Composition): PreparedComposition {
  if (composition === null || typeof composition !== 'object') {
    throw new ChemError('invalid-input', 'emptyComposition', MESSAGES.emptyComposition(), 'composition');
  }
  const t = composition.temperatureC;
  const temperatureC =
    t === undefined
      ? 25
      : inRange(t, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C)
        ? (t as number)
        : requireNumber('temperatureC', t, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C, `${MIN_TEMPERATURE_C} to ${MAX_TEMPERATURE_C} °C`);
  const model = parseActivityModel('activityModel', composition.activityModel);
  const systems = composition.systems ?? [];
  if (!Array.isArray(systems)) {
    throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange('systems', systems, 'a list of acid–base systems'), 'systems', 'a list');
  }
  const ions = composition.strongIons ?? {};
  const ionNames = Object.keys(ions);
  if (systems.length === 0 && ionNames.length === 0) {
    throw new ChemError('invalid-input', 'emptyComposition', MESSAGES.emptyComposition(), 'systems');
  }
  const known = knownChemistry(systems, ionNames, temperatureC, model);
  if (known) return prepareWith(known, composition);
  // New chemistry: everything is checked in the order of the composition (each system's chemistry and amount, then
  // each strong ion's name and amount), so the first fault reported does not depend on what was computed before.
  for (let j = 0; j < systems.length; j++) {
    validateChemistry('systems', systems[j], j);
    const total = systems[j].totalM;
    if (!inRange(total, 0, MAX_CONCENTRATION_M)) requireNumber(`systems[${j}].totalM`, total, 0, MAX_CONCENTRATION_M, `0 to ${MAX_CONCENTRATION_M} mol/L`);
  }
  for (const name of ionNames) {
    findStrongIon('strongIons', name);
    const c = ions[name];
    if (!inRange(c, 0, MAX_CONCENTRATION_M)) requireNumber(`strongIons.${name}`, c, 0, MAX_CONCENTRATION_M, `0 to ${MAX_CONCENTRATION_M} mol/L`);
  }
  return prepareWith(keep(computeChemistry(systems, ionNames, temperatureC, model)), composition);
}

/**
 * A composition prepared with its chemistry given (from chemistryOf for the same systems,
 * strong-ion keys, temperature and model): only the amounts are read and validated.
 * Throws ChemError (invalid-input) for an amount out of range.
 */
export function prepareWith(chemistry: ChemistryAt, composition: Composition): PreparedComposition {
  const systems = composition.systems ?? [];
  const n = systems.length;
  // Plain arrays filled by push: for the handful of entries a buffer has they allocate several times faster than typed arrays.
  const totals: number[] = [];
  let ionicStrengthScale = 1e-7;
  for (let j = 0; j < n; j++) {
    const total = systems[j].totalM;
    if (!inRange(total, 0, MAX_CONCENTRATION_M)) requireNumber(`systems[${j}].totalM`, total, 0, MAX_CONCENTRATION_M, `0 to ${MAX_CONCENTRATION_M} mol/L`);
    totals.push(total);
    ionicStrengthScale += 0.5 * total * chemistry.zMaxSquared[j];
  }
  const ions = composition.strongIons ?? {};
  const names = chemistry.strongIonNames;
  const strongConcentrations: number[] = [];
  let strongCharge = 0;
  let strongIonicStrength = 0;
  for (let i = 0; i < names.length; i++) {
    const c = ions[names[i]];
    if (!inRange(c, 0, MAX_CONCENTRATION_M)) requireNumber(`strongIons.${names[i]}`, c, 0, MAX_CONCENTRATION_M, `0 to ${MAX_CONCENTRATION_M} mol/L`);
    const z = chemistry.strongCharges[i];
    strongConcentrations.push(c);
    strongCharge += z * c;
    strongIonicStrength += 0.5 * z * z * c;
  }
  return {
    temperatureC: chemistry.temperatureC,
    model: chemistry.model,
    a: chemistry.a,
    kw: chemistry.kw,
    totals,
    z0: chemistry.z0,
    firstStep: chemistry.firstStep,
    stepCount: chemistry.stepCount,
    ka: chemistry.ka,
    zSquaredDiff: chemistry.zSquaredDiff,
    strongCharge,
    strongIonicStrength,
    ionicStrengthScale: ionicStrengthScale + strongIonicStrength,
    warnings: chemistry.warnings,
    source: composition,
    waterDensity: chemistry.waterDensity,
    pitzer: chemistry.layout ? layoutWith(chemistry.layout, strongConcentrations) : undefined,
    strongConcentrations,
    chemistry,
  };
}
