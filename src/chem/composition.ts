/**
 * What a solution contains, as the core accepts it, and its validation into a compact
 * prepared form (constants at the temperature, flat arrays) that the solver iterates on.
 */
import { ActivityModel, parseActivityModel } from './activity';
import { ChemError, MESSAGES, requireInteger, requireNumber } from './errors';
import { ChemWarning, warning } from './warnings';
import { findStrongIon } from './strongIons';
import { VantHoffTerms, lnKaAt, vantHoffTerms } from './vantHoff';
import { PitzerLayout, pitzerLayout } from './pitzer/prepared';
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
  readonly warnings: ChemWarning[];
  /** The composition as given (the Pitzer paths rebuild it with titrant added). */
  readonly source: Composition;
  /** Density of pure water at the temperature, g/cm³. */
  readonly waterDensity: number;
  /** The Pitzer model over this composition's species (model `pitzer` only). */
  readonly pitzer?: PitzerLayout;
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

/** What depends on the temperature alone: the same for every composition prepared at it. */
interface TemperatureConstants {
  readonly temperatureC: number;
  readonly terms: VantHoffTerms;
  /** Debye–Hückel A, thermodynamic Kw, density of water (g/cm³). */
  readonly a: number;
  readonly kw: number;
  readonly waterDensity: number;
}

/** Temperatures remembered: a plan prepares a dozen compositions at three or four temperatures (use, bench, ± half a degree, 25 °C). */
const TEMPERATURE_SLOTS = 8;
const temperatureSlots: TemperatureConstants[] = [];
let nextTemperatureSlot = 0;

/** The temperature's constants, computed once for the last few temperatures asked (a power and a logarithm cost more than the rest of a preparation). */
function constantsAt(temperatureC: number): TemperatureConstants {
  for (let i = 0; i < temperatureSlots.length; i++) if (temperatureSlots[i].temperatureC === temperatureC) return temperatureSlots[i];
  const made: TemperatureConstants = {
    temperatureC,
    terms: vantHoffTerms(temperatureC),
    a: debyeHuckelA(temperatureC),
    kw: Math.pow(10, -pKw(temperatureC)),
    waterDensity: waterDensity(temperatureC),
  };
  temperatureSlots[nextTemperatureSlot] = made;
  nextTemperatureSlot = (nextTemperatureSlot + 1) % TEMPERATURE_SLOTS;
  return made;
}

/**
 * What the solver's arrays hold that depends only on which systems a composition has, in which order: each
 * system's charge, first step and step count, each step's z² difference, and the Ka of every step at the
 * temperature last asked. Shared by every composition of the same systems (never changed once made).
 */
interface SystemsShape {
  readonly steps: readonly (readonly AcidBaseStep[])[];
  readonly z0: readonly number[];
  readonly firstStep: readonly number[];
  readonly stepCount: readonly number[];
  readonly zSquaredDiff: readonly number[];
  /** Largest |charge| of each system's states. */
  readonly zMax: readonly number[];
  kaTemperatureC: number;
  ka: readonly number[] | undefined;
}

/** Shapes by the first system's steps array (library systems share theirs, see chemistryOf), weakly held. */
const SHAPES = new WeakMap<object, SystemsShape[]>();
/** Anchor for compositions of strong ions only. */
const NO_SYSTEMS: object = {};
/** Shapes kept per anchor before the list is emptied (companion systems a workbook puts beside one buffer). */
const SHAPES_PER_ANCHOR = 64;

function systemsShape(systems: readonly AcidBaseChemistry[]): SystemsShape {
  const n = systems.length;
  const anchor: object = n > 0 ? systems[0].steps : NO_SYSTEMS;
  let list = SHAPES.get(anchor);
  if (list) {
    for (let e = 0; e < list.length; e++) {
      const shape = list[e];
      if (shape.steps.length !== n) continue;
      let same = true;
      for (let j = 0; same && j < n; j++) same = shape.steps[j] === systems[j].steps && shape.z0[j] === systems[j].chargeOfMostProtonated;
      if (same) return shape;
    }
  } else SHAPES.set(anchor, (list = []));
  const z0: number[] = [];
  const firstStep: number[] = [];
  const stepCount: number[] = [];
  const zSquaredDiff: number[] = [];
  const zMax: number[] = [];
  let s = 0;
  for (let j = 0; j < n; j++) {
    const sys = systems[j];
    const z = sys.chargeOfMostProtonated;
    z0.push(z);
    firstStep.push(s);
    stepCount.push(sys.steps.length);
    zMax.push(Math.max(Math.abs(z), Math.abs(z - sys.steps.length)));
    for (let k = 0; k < sys.steps.length; k++) zSquaredDiff.push(2 * (z - k) - 1);
    s += sys.steps.length;
  }
  const shape: SystemsShape = { steps: systems.map((sys) => sys.steps), z0, firstStep, stepCount, zSquaredDiff, zMax, kaTemperatureC: NaN, ka: undefined };
  if (list.length >= SHAPES_PER_ANCHOR) list.length = 0;
  list.push(shape);
  return shape;
}

/** The Ka of every step at a temperature, kept on the shape for the next composition of the same systems there. */
function kaOf(shape: SystemsShape, systems: readonly AcidBaseChemistry[], temperatureC: number, terms: VantHoffTerms): readonly number[] {
  const ka: number[] = [];
  const unused: number[] = [];
  for (let j = 0; j < systems.length; j++) appendStepConstants(systems[j], terms, ka, unused);
  shape.ka = ka;
  shape.kaTemperatureC = temperatureC;
  return ka;
}

/**
 * Validates a composition and computes its constants at the temperature.
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

  const n = systems.length;
  for (let j = 0; j < n; j++) {
    validateChemistry('systems', systems[j], j);
    const total = systems[j].totalM;
    if (!inRange(total, 0, MAX_CONCENTRATION_M)) requireNumber(`systems[${j}].totalM`, total, 0, MAX_CONCENTRATION_M, `0 to ${MAX_CONCENTRATION_M} mol/L`);
  }

  const atT = constantsAt(temperatureC);
  const shape = systemsShape(systems);
  const ka = shape.ka === undefined || shape.kaTemperatureC !== temperatureC ? kaOf(shape, systems, temperatureC, atT.terms) : shape.ka;
  // Plain arrays: for the handful of entries a buffer has they allocate several times faster than typed arrays.
  const totals: number[] = [];
  let ionicStrengthScale = 1e-7;
  for (let j = 0; j < n; j++) {
    const total = systems[j].totalM;
    totals.push(total);
    const zMax = shape.zMax[j];
    ionicStrengthScale += 0.5 * total * zMax * zMax;
  }

  let strongCharge = 0;
  let strongIonicStrength = 0;
  for (const name of ionNames) {
    const ion = findStrongIon('strongIons', name);
    const c = ions[name];
    if (!inRange(c, 0, MAX_CONCENTRATION_M)) requireNumber(`strongIons.${name}`, c, 0, MAX_CONCENTRATION_M, `0 to ${MAX_CONCENTRATION_M} mol/L`);
    strongCharge += ion.charge * c;
    strongIonicStrength += 0.5 * ion.charge * ion.charge * c;
  }

  const a = atT.a;
  const warnings: ChemWarning[] = [];
  if (temperatureC > FITTED_RANGE_MAX_C) {
    warnings.push(warning('aboveFittedRange', MESSAGES.aboveFittedRange(temperatureC, FITTED_RANGE_MAX_C), 'temperatureC'));
  }
  return {
    temperatureC,
    model,
    a,
    kw: atT.kw,
    totals,
    z0: shape.z0,
    firstStep: shape.firstStep,
    stepCount: shape.stepCount,
    ka,
    zSquaredDiff: shape.zSquaredDiff,
    strongCharge,
    strongIonicStrength,
    ionicStrengthScale: ionicStrengthScale + strongIonicStrength,
    warnings,
    source: composition,
    waterDensity: atT.waterDensity,
    pitzer:
      model === 'pitzer'
        ? pitzerLayout(
            ionNames,
            ionNames.map((name) => ions[name]),
            systems,
            temperatureC,
            a,
          )
        : undefined,
  };
}
