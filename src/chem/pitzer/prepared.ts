/**
 * The Pitzer model laid out over a composition's species, in a fixed order the solver
 * iterates on: H⁺, OH⁻, the strong ions (in the order given), then every protonation state
 * of every acid–base system (most protonated first).
 */
import type { AcidBaseChemistry } from '../composition';
import { findStrongIon } from '../strongIons';
import { PitzerSpecies, PitzerSystem, pitzerSystem } from './model';
import { DEFAULT_SOLUTE_VOLUME_CM3, ION_VOLUME_CM3, NEUTRAL_VOLUME_CM3 } from './volumes';
import { pitzerIonOfStrongIon, pitzerIonsOfSystem } from './species';

/** Index of H⁺ and OH⁻ in the species list. */
export const H_INDEX = 0;
export const OH_INDEX = 1;
/** Index of the first strong ion. */
export const STRONG_START = 2;

export interface PitzerLayout {
  readonly system: PitzerSystem;
  /** Partial molar volume of each species, cm³/mol. */
  readonly volumes: readonly number[];
  /** Index of the most protonated state of each acid–base system. */
  readonly systemStart: readonly number[];
  readonly speciesCount: number;
  /** Concentration of each strong ion, mol/L, in species order from STRONG_START. */
  readonly strongConcentrations: readonly number[];
  /** Index of chloride: the strong ion if present, else a probe species at zero concentration (for the pH convention). */
  readonly chlorideIndex: number;
  /** True for charged species with no tabulated ion. */
  readonly unparameterised: readonly boolean[];
  /**
   * The species in order (strong ions, then each system's name, charge and steps), without the temperature: two
   * layouts with the same key hold the same species in the same slots, so one's ln γ can start the other's iteration.
   */
  readonly speciesKey: string;
}

function volumeOf(species: PitzerSpecies, systemName?: string): number {
  if (species.ion) return ION_VOLUME_CM3[species.ion] ?? DEFAULT_SOLUTE_VOLUME_CM3;
  if (species.charge === 0 && systemName) return NEUTRAL_VOLUME_CM3[systemName.trim().toLowerCase()] ?? DEFAULT_SOLUTE_VOLUME_CM3;
  return DEFAULT_SOLUTE_VOLUME_CM3;
}

/**
 * Lays out the species of a composition for the Pitzer equations.
 *
 * @param strongIonNames - the strong-ion keys as given (validated already)
 * @param strongConcentrations - their concentrations, mol/L
 * @param systems - the acid–base systems
 * @param temperatureC - °C
 * @param debyeHuckelA - log10 Debye–Hückel slope at the temperature
 */
export function pitzerLayout(
  strongIonNames: readonly string[],
  strongConcentrations: readonly number[],
  systems: readonly AcidBaseChemistry[],
  temperatureC: number,
  debyeHuckelA: number,
): PitzerLayout {
  return layoutWith(pitzerLayoutShape(strongIonNames, systems, temperatureC, debyeHuckelA), strongConcentrations);
}

/** A layout's shape with the strong ions' amounts: a fresh object, the shape shared. */
export function layoutWith(shape: PitzerLayoutShape, strongConcentrations: readonly number[]): PitzerLayout {
  return {
    system: shape.system,
    volumes: shape.volumes,
    systemStart: shape.systemStart,
    speciesCount: shape.speciesCount,
    strongConcentrations,
    chlorideIndex: shape.chlorideIndex,
    unparameterised: shape.unparameterised,
    speciesKey: shape.speciesKey,
  };
}

/** Everything of a layout but the strong-ion amounts, found in (or added to) the caches below. */
export function pitzerLayoutShape(strongIonNames: readonly string[], systems: readonly AcidBaseChemistry[], temperatureC: number, debyeHuckelA: number): PitzerLayoutShape {
  // Layouts are found by the first system's steps array (library systems share it between compositions),
  // then compared field by field: no key string to build and hash on every solve.
  const anchor: object = systems.length > 0 ? systems[0].steps : NO_SYSTEMS;
  let entries = LAYOUT_CACHE.get(anchor);
  let shape: LayoutShape | undefined;
  if (entries) {
    for (let e = 0; e < entries.length && !shape; e++) {
      if (sameLayout(entries[e], strongIonNames, systems, temperatureC)) shape = entries[e].shape;
    }
  }
  if (!shape) {
    // Hosts that rebuild a system's steps on every call (a fresh array each time) miss the anchor: the same
    // species at the same temperature are then found by a key string, and only new ones are built.
    let key = `${temperatureC}|`;
    for (let i = 0; i < strongIonNames.length; i++) key += strongIonNames[i] + ',';
    for (let j = 0; j < systems.length; j++) key += '|' + systems[j].name + ':' + systems[j].chargeOfMostProtonated + ':' + systems[j].steps.length;
    shape = LAYOUT_BY_KEY.get(key);
    const built = !shape;
    if (!shape) {
      if (LAYOUT_BY_KEY.size >= LAYOUT_KEYS) LAYOUT_BY_KEY.clear();
      shape = layoutShape(strongIonNames, systems, temperatureC, debyeHuckelA);
      LAYOUT_BY_KEY.set(key, shape);
    }
    // An anchor seen for the first time whose layout was already known is most likely a fresh array of a host
    // that rebuilds them: not worth an entry. New layouts and recurring anchors get one.
    if (built || entries) {
      if (!entries) {
        entries = [];
        LAYOUT_CACHE.set(anchor, entries);
      }
      if (entries.length >= LAYOUT_ENTRIES_PER_ANCHOR) entries.length = 0;
      entries.push({ temperatureC, names: [...strongIonNames], systems: systems.map((sys) => ({ steps: sys.steps, name: sys.name, z0: sys.chargeOfMostProtonated })), shape });
    }
  }
  return shape;
}

interface LayoutEntry {
  readonly temperatureC: number;
  readonly names: readonly string[];
  readonly systems: readonly { readonly steps: object; readonly name: string; readonly z0: number }[];
  readonly shape: LayoutShape;
}

function sameLayout(entry: LayoutEntry, names: readonly string[], systems: readonly AcidBaseChemistry[], temperatureC: number): boolean {
  if (entry.temperatureC !== temperatureC || entry.names.length !== names.length || entry.systems.length !== systems.length) return false;
  for (let i = 0; i < names.length; i++) if (entry.names[i] !== names[i]) return false;
  for (let j = 0; j < systems.length; j++) {
    const a = entry.systems[j];
    const b = systems[j];
    if (a.steps !== b.steps || a.name !== b.name || a.z0 !== b.chargeOfMostProtonated) return false;
  }
  return true;
}

/** Anchor for compositions of strong ions only. */
const NO_SYSTEMS = {};

/** Everything of a layout but the strong-ion amounts: the same for every solve of the same species at the same temperature. */
export type PitzerLayoutShape = Omit<PitzerLayout, 'strongConcentrations'>;
type LayoutShape = PitzerLayoutShape;

/** Layouts already built (a solve of the same kind of buffer reuses its layout; the table lookups cost more than the solve), by the first system's steps array; weakly held, so a user's discarded substances take theirs with them. */
const LAYOUT_CACHE = new WeakMap<object, LayoutEntry[]>();
/** Layouts kept per anchor (temperatures × salt sets × companion systems) before that list is emptied: far more than one workbook uses. */
const LAYOUT_ENTRIES_PER_ANCHOR = 1024;
/** The same layouts by key string (temperature, strong ions, systems' names, charges and step counts). */
const LAYOUT_BY_KEY = new Map<string, LayoutShape>();
/** Key strings kept before that map is emptied. */
const LAYOUT_KEYS = 4096;

function layoutShape(strongIonNames: readonly string[], systems: readonly AcidBaseChemistry[], temperatureC: number, debyeHuckelA: number): LayoutShape {
  let speciesKey = '';
  for (const name of strongIonNames) speciesKey += findStrongIon('strongIons', name).name + ',';
  for (const sys of systems) speciesKey += '|' + sys.name + ':' + sys.chargeOfMostProtonated + ':' + sys.steps.length;
  const species: PitzerSpecies[] = [
    { charge: 1, ion: 'H+' },
    { charge: -1, ion: 'OH-' },
  ];
  const volumes: number[] = [volumeOf(species[0]), volumeOf(species[1])];
  for (const name of strongIonNames) {
    const ion = findStrongIon('strongIons', name);
    const s: PitzerSpecies = { charge: ion.charge, ion: pitzerIonOfStrongIon(ion.name) };
    species.push(s);
    volumes.push(volumeOf(s));
  }
  const systemStart: number[] = [];
  for (const sys of systems) {
    systemStart.push(species.length);
    const ions = pitzerIonsOfSystem(sys);
    for (let k = 0; k <= sys.steps.length; k++) {
      const s: PitzerSpecies = { charge: sys.chargeOfMostProtonated - k, ion: ions[k] };
      species.push(s);
      volumes.push(volumeOf(s, sys.name));
    }
  }
  let chlorideIndex = species.findIndex((s) => s.ion === 'Cl-');
  if (chlorideIndex < 0) {
    chlorideIndex = species.length;
    species.push({ charge: -1, ion: 'Cl-' });
    volumes.push(0);
  }
  const system = pitzerSystem(species, temperatureC, debyeHuckelA);
  return { system, volumes, systemStart, speciesCount: species.length, chlorideIndex, unparameterised: system.unparameterised, speciesKey };
}
