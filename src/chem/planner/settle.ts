/** The planner's input, validated and defaulted: every field read through its one declaration (src/chem/input). */
import { ActivityModel } from '../activity';
import { readChoiceField, readNumberField, readPurityField, readSaltsField, readTextField, requireNumberField } from '../input';
import { Composition } from '../composition';
import { ChemError, MESSAGES } from '../errors';
import { LibraryForm, SubstanceRecord } from '../library/types';
import { SubstanceLibrary } from '../library/lookup';
import { nameKey } from '../library/names';
import { CONDUCTIVITY_MAX_C, CONDUCTIVITY_MIN_C } from '../conductivity';
import { Titrant } from '../titration';
import type { PitzerStart } from '../speciation';
import { RecipeComponent, RecipeInput, RecipeRoute } from './types';
import { SaltGoal } from './constants';

/** The numbers a route fixes: the finished buffer and how it was put together. */
export interface RouteResult {
  readonly composition: Composition;
  /** Forms weighed with their concentrations in the solution made, mol/L. */
  readonly weighed: readonly { readonly role: RecipeComponent['role']; readonly form: LibraryForm; readonly concentrationM: number; readonly toTarget?: true }[];
  readonly titrant?: {
    readonly form: LibraryForm;
    readonly titrant: Titrant;
    readonly concentrationM: number;
    readonly stock: { concentrationM: number; tolerancePercent: number };
    /** The solution before any titrant. */
    readonly before: Composition;
  };
  /** pH of the weighed forms and salts before any titrant (titrate route). */
  readonly unadjustedPh?: number;
  /** Pitzer only: the finished composition's γ at the target, from the amount solve (a start for its own solve and its neighbours'). */
  readonly pitzer?: PitzerStart;
}

/** Validated, defaulted input. */
export interface Settled {
  readonly input: RecipeInput;
  readonly library: SubstanceLibrary;
  readonly system: SubstanceRecord;
  readonly route: RecipeRoute;
  readonly targetPh: number;
  readonly useT: number;
  readonly benchT: number;
  readonly concentrationM: number;
  readonly volumeL: number;
  readonly partFraction: number;
  readonly model: ActivityModel;
  readonly salts: readonly { form: LibraryForm; concentrationM: number }[];
  /** The titrant stock given; without a form, NaOH or HCl (whichever is needed) at that concentration. */
  readonly titrant?: { readonly form?: string; readonly concentrationM: number; readonly tolerancePercent: number };
  readonly stock?: { readonly fold: number; readonly volumeMl?: number };
  /** The salt added to a target: its form, what it reaches (mol/L of ionic strength, mOsm/L, or mS/cm read at readAtC °C). */
  readonly saltTarget?: { readonly form: LibraryForm; readonly kind: SaltGoal; readonly goal: number; readonly readAtC: number };
  readonly pKaUncertainty?: number;
  /** A titrant of the buffer system itself: state the total it makes, or hold the stated total. */
  readonly titrantInBuffer: 'state' | 'hold';
  readonly formPurityPercent?: number;
  readonly purityPercent: readonly { readonly key: string; readonly percent: number }[];
}

/**
 * The acid–base system a recipe buffers with, by the name given. Throws ChemError: the
 * library's unknownSubstance (with the nearest names), or outOfRange (code `outOfRange`)
 * when the name is a strong electrolyte such as NaCl or HCl.
 *
 * @param library - the substance library (the user's substances included)
 * @param name - the buffer as typed
 */
export function bufferSystemOf(library: SubstanceLibrary, name: unknown): SubstanceRecord {
  let system: SubstanceRecord;
  try {
    system = library.findSystem(name as string, 'buffer');
  } catch (e) {
    // A strong electrolyte named as the buffer (NaCl, HCl, or a form of one such as CaCl2·2H2O,
    // which adds no acid–base system) gets a message that says so.
    const key = typeof name === 'string' ? nameKey(name) : '';
    const strong = library.records().some((r) => r.kind === 'strong' && [r.name, ...r.aliases].some((n) => nameKey(n) === key)) || addsNoSystem(library, name);
    if (!strong) throw e;
    throw new ChemError(
      'invalid-input',
      'outOfRange',
      MESSAGES.outOfRange('buffer', name, 'an acid–base buffer system (this is a strong electrolyte: add it as a salt)'),
      'buffer',
      'an acid–base buffer system',
    );
  }
  if (system.kind !== 'acid-base') {
    throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange('buffer', name, 'an acid–base buffer system'), 'buffer', 'an acid–base buffer system');
  }
  return system;
}

/** True when the name is a form on the shelf that adds no acid–base system (a salt such as CaCl2·2H2O). */
export function addsNoSystem(library: SubstanceLibrary, name: unknown): boolean {
  try {
    return library.findForm(name as string).adds.length === 0;
  } catch {
    return false;
  }
}

/** Validates the input and fills defaults: every field read by its one declaration (src/chem/input). */
export function settle(input: RecipeInput, library: SubstanceLibrary): Settled {
  if (input === null || typeof input !== 'object') {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('recipe', 'a recipe input object'), 'recipe', 'an object');
  }
  const system = bufferSystemOf(library, readTextField('buffer', input.buffer));
  const route = readChoiceField('route', input.route) as RecipeRoute;
  const useT = requireNumberField('useTemperatureC', input.useTemperatureC);
  const salts = readSaltsField(input.salts).map((salt, i) => ({
    form: library.findForm(salt.form, typeof input.salts === 'string' ? 'salts' : `salts[${i}].form`),
    concentrationM: salt.concentrationMm / 1000,
  }));
  const titrant = input.titrant === undefined ? undefined : settleTitrant(input.titrant);
  const stock = route === 'stock' ? { fold: requireNumberField('stock.fold', input.stock?.fold), volumeMl: readNumberField('stock.volumeMl', input.stock?.volumeMl) } : undefined;
  return {
    input,
    library,
    system,
    route,
    targetPh: requireNumberField('targetPh', input.targetPh),
    useT,
    benchT: readNumberField('benchTemperatureC', input.benchTemperatureC) ?? useT,
    concentrationM: requireNumberField('concentrationMm', input.concentrationMm) / 1000,
    volumeL: requireNumberField('volumeMl', input.volumeMl) / 1000,
    partFraction: requireNumberField('partVolumeFraction', input.partVolumeFraction),
    model: readChoiceField('activityModel', input.activityModel) as ActivityModel,
    salts,
    titrant,
    stock,
    saltTarget: settleSaltTarget(input.saltTarget, library, useT),
    pKaUncertainty: readNumberField('pKaUncertainty', input.pKaUncertainty),
    titrantInBuffer: readChoiceField('titrantInBuffer', input.titrantInBuffer) as Settled['titrantInBuffer'],
    formPurityPercent: readPurityField('formPurityPercent', input.formPurityPercent),
    purityPercent: Object.entries(input.purityPercent ?? {}).map(([name, value]) => ({
      key: nameKey(name),
      percent: readPurityField('formPurityPercent', value, `purityPercent.${name}`) ?? 100,
    })),
  };
}

export function settleTitrant(t: NonNullable<RecipeInput['titrant']>): NonNullable<Settled['titrant']> {
  const form = readTextField('titrant.form', t?.form);
  return {
    form,
    concentrationM: requireNumberField('titrant.concentrationM', t?.concentrationM),
    tolerancePercent: requireNumberField('titrant.tolerancePercent', t?.tolerancePercent),
  };
}

export function settleSaltTarget(t: RecipeInput['saltTarget'], library: SubstanceLibrary, useT: number): Settled['saltTarget'] {
  if (t === undefined) return undefined;
  const name = readTextField('saltTarget.form', t?.form);
  if (name === undefined) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('saltTarget.form', 'a salt form'), 'saltTarget.form', 'a name');
  const form = library.findForm(name, 'saltTarget.form');
  const goals = [
    { kind: 'ionicStrength' as const, goal: readNumberField('saltTarget.ionicStrengthM', t.ionicStrengthM) },
    { kind: 'osmolarity' as const, goal: readNumberField('saltTarget.idealOsmolarityMosm', t.idealOsmolarityMosm) },
    { kind: 'osmolality' as const, goal: readNumberField('saltTarget.osmolalityMosmKg', t.osmolalityMosmKg) },
    { kind: 'conductivity' as const, goal: readNumberField('saltTarget.conductivityMsPerCm', t.conductivityMsPerCm) },
  ].filter((g): g is { kind: SaltGoal; goal: number } => g.goal !== undefined);
  if (goals.length !== 1) {
    const allowed = 'one of ionicStrengthM, idealOsmolarityMosm, osmolalityMosmKg, conductivityMsPerCm';
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('saltTarget', `one goal only: ${allowed}`), 'saltTarget', allowed);
  }
  const readAtC = readNumberField('saltTarget.conductivityTemperatureC', t.conductivityTemperatureC) ?? Math.min(Math.max(useT, CONDUCTIVITY_MIN_C), CONDUCTIVITY_MAX_C);
  return { form, ...goals[0], readAtC };
}
