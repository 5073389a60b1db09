/**
 * The command line's JSON composition: what a user writes (mM, °C, pKa lists) and its
 * translation into the core's Composition (mol/L). Every number is read by the one input
 * reader (src/chem/input), so "20 mM", "4 °C" and "6,1; 7,2" work as in a cell; every
 * error names the field as the user wrote it (`systems[0].totalMm`, `forms[1].form`).
 * Chemistry checks are the core's, whose messages name the field too.
 */
import { ACTIVITY_MODELS, AcidBaseSystem, ActivityModel, ChemError, Composition, MESSAGES } from '../chem';
import { readChoiceField, readQuantity, readQuantityList, requireNumberField } from '../chem/input';
import { SubstanceLibrary, UserSubstance, createLibrary, defaultLibrary } from '../chem/library';
import { closestNames, nameKey } from '../chem/library/names';

/** A composition as the command line reads it (numbers may be text with units). */
export interface CompositionInput {
  readonly temperatureC?: number | string;
  readonly activityModel?: ActivityModel | string;
  readonly systems?: readonly {
    readonly name: string;
    readonly chargeOfMostProtonated: number;
    readonly pKa: readonly (number | string)[] | string;
    readonly deltaHkJ?: readonly (number | string)[] | string;
    readonly deltaCpJ?: readonly (number | string)[] | string;
    readonly totalMm: number | string;
  }[];
  readonly forms?: readonly (
    { readonly form: string; readonly mM: number | string } | { readonly form: string; readonly grams: number | string; readonly volumeMl: number | string }
  )[];
  readonly strongIonsMm?: Readonly<Record<string, number | string>>;
  readonly userSubstances?: readonly Record<string, unknown>[];
}

const KEYS = {
  top: ['temperatureC', 'activityModel', 'systems', 'forms', 'strongIonsMm', 'userSubstances'],
  system: ['name', 'chargeOfMostProtonated', 'pKa', 'deltaHkJ', 'deltaCpJ', 'totalMm'],
  form: ['form', 'mM', 'grams', 'volumeMl'],
} as const;

function isObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/** Refuses keys outside `allowed`, suggesting the nearest. */
export function checkKeys(value: Record<string, unknown>, allowed: readonly string[], prefix: string): void {
  for (const key of Object.keys(value)) {
    if (allowed.includes(key)) continue;
    const path = `${prefix}${key}`;
    const suggestions = key.length > 60 ? [] : closestNames(nameKey(key), new Map(allowed.map((a) => [nameKey(a), `${prefix}${a}`])));
    throw new ChemError('invalid-input', 'unknownField', MESSAGES.unknownField(path, suggestions, allowed.join(', ')), path, allowed.join(', '));
  }
}

function needObject(value: unknown, field: string, what: string): Record<string, unknown> {
  if (!isObject(value)) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, what), field, what);
  return value;
}

function needList(value: unknown, field: string): unknown[] {
  if (value === undefined) return [];
  if (!Array.isArray(value)) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a list ([…])'), field, 'a list');
  return value;
}

function needText(value: unknown, field: string): string {
  if (typeof value !== 'string' || value.trim() === '') throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a name'), field, 'a name');
  return value;
}

/** A list of plain numbers: a JSON list, or text such as "6.1; 7.2". */
function numberList(value: unknown, field: string): number[] {
  if (typeof value === 'string') return readQuantityList(field, value, 'fraction');
  return needList(value, field).map((x, k) => readQuantity(`${field}[${k}]`, x, 'fraction'));
}

/** Checks the user substances' outer shape (the library checks each one). */
export function readUserSubstances(value: unknown): Record<string, unknown>[] | undefined {
  if (value === undefined) return undefined;
  return needList(value, 'userSubstances').map((u, i) => needObject(u, `userSubstances[${i}]`, 'a substance object'));
}

/** The library for an input: built-in plus the input's own substances. */
export function libraryFor(userSubstances: readonly Record<string, unknown>[] | undefined): SubstanceLibrary {
  // The built-in library is made once; a batch's rows usually share their own substances, so the last few libraries are kept by their JSON (a library costs about 0.8 ms to build, twenty plans).
  if (userSubstances === undefined || userSubstances.length === 0) return defaultLibrary();
  const key = JSON.stringify(userSubstances);
  const kept = userLibraries.get(key);
  if (kept) return kept;
  const made = createLibrary(userSubstances as unknown as UserSubstance[]);
  if (userLibraries.size >= USER_LIBRARIES_KEPT) userLibraries.delete(userLibraries.keys().next().value as string);
  userLibraries.set(key, made);
  return made;
}

/** Libraries with user substances kept, oldest dropped first. */
const USER_LIBRARIES_KEPT = 8;
const userLibraries = new Map<string, SubstanceLibrary>();

/**
 * Turns command-line JSON into a core Composition (mM → mol/L; forms by name through the
 * library), checking every key and reading every number with the one input reader.
 *
 * @throws ChemError naming the field as written
 */
export function toComposition(raw: unknown): Composition {
  const input = needObject(raw, 'composition', 'a JSON object such as {"forms": [{"form": "tris base", "mM": 50}]}');
  checkKeys(input, KEYS.top, '');
  const systems: AcidBaseSystem[] = needList(input.systems, 'systems').map((entry, j) => {
    const at = `systems[${j}]`;
    const s = needObject(entry, at, 'an acid–base system object');
    checkKeys(s, KEYS.system, `${at}.`);
    const pKa = numberList(s.pKa, `${at}.pKa`);
    const lists = {
      deltaHkJ: s.deltaHkJ === undefined ? [] : numberList(s.deltaHkJ, `${at}.deltaHkJ`),
      deltaCpJ: s.deltaCpJ === undefined ? [] : numberList(s.deltaCpJ, `${at}.deltaCpJ`),
    };
    for (const key of ['deltaHkJ', 'deltaCpJ'] as const) {
      if (lists[key].length > 0 && lists[key].length !== pKa.length) {
        throw new ChemError(
          'invalid-input',
          'listLengthMismatch',
          MESSAGES.listLengthMismatch(`${at}.${key}`, pKa.length, lists[key].length),
          `${at}.${key}`,
          `${pKa.length} values`,
        );
      }
    }
    return {
      name: needText(s.name, `${at}.name`),
      chargeOfMostProtonated: readQuantity(`${at}.chargeOfMostProtonated`, s.chargeOfMostProtonated, 'fraction'),
      steps: pKa.map((p, k) => ({ pKa: p, deltaHkJ: lists.deltaHkJ[k] ?? 0, deltaCpJ: lists.deltaCpJ[k] ?? 0 })),
      totalM: requireNumberField('amountMm', s.totalMm, `${at}.totalMm`) / 1000,
    };
  });
  const strongIons: Record<string, number> = {};
  if (input.strongIonsMm !== undefined) {
    for (const [name, mM] of Object.entries(needObject(input.strongIonsMm, 'strongIonsMm', 'an object of ion → mM'))) {
      strongIons[name] = requireNumberField('amountMm', mM, `strongIonsMm.${name}`) / 1000;
    }
  }
  const forms = needList(input.forms, 'forms');
  if (forms.length > 0) {
    const library = libraryFor(readUserSubstances(input.userSubstances));
    const items = forms.map((entry, i) => {
      const at = `forms[${i}]`;
      const f = needObject(entry, at, 'an object with form and mM, or form, grams and volumeMl');
      checkKeys(f, KEYS.form, `${at}.`);
      const form = library.findForm(needText(f.form, `${at}.form`), `${at}.form`);
      if (f.mM !== undefined) return { form, concentrationM: requireNumberField('amountMm', f.mM, `${at}.mM`) / 1000 };
      if (f.grams === undefined)
        throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${at}.mM`, 'mM, or grams and volumeMl'), `${at}.mM`, 'mM, or grams and volumeMl');
      const grams = readQuantity(`${at}.grams`, f.grams, 'fraction');
      if (!(grams >= 0)) throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange(`${at}.grams`, grams, 'grams of 0 or more'), `${at}.grams`, '0 or more');
      const volumeMl = requireNumberField('volumeMl', f.volumeMl, `${at}.volumeMl`);
      return { form, concentrationM: grams / form.molarMass / (volumeMl / 1000) };
    });
    const fromForms = library.compositionFromForms(items);
    for (const [name, c] of Object.entries(fromForms.strongIons ?? {})) strongIons[name] = (strongIons[name] ?? 0) + c;
    systems.push(...fromForms.systems);
  } else {
    readUserSubstances(input.userSubstances);
  }
  return {
    systems,
    strongIons,
    temperatureC: requireNumberField('temperatureC', input.temperatureC),
    activityModel: readChoiceField('activityModel', input.activityModel) as ActivityModel,
  };
}

/** The activity models, re-exported for the command's help text. */
export { ACTIVITY_MODELS };
