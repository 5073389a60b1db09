/**
 * A composition range — first column a substance or form name, second its amount in mM —
 * turned into the core's Composition through the substance library.
 *
 * A name is looked up as a form first (`Na2HPO4·7H2O`, `tris base`, `NaCl`), then as an
 * acid–base system (`phosphate`, `HEPES`: the system alone, with no counter-ions), then as
 * a strong ion (`Na+`, `chloride`). Blank rows are ignored.
 */
import { AcidBaseSystem, ActivityModel, ChemError, Composition, findStrongIon, systemAt, withConditions } from '../chem';
import { FormAmount, MAX_FORM_CONCENTRATION_M, SubstanceLibrary, chemistryOf } from '../chem/library';
import { isBlank, toField, toRange, toText } from './coerce';
import { invalid, withContext } from './errors';
import { Lru } from './memo';
import { MESSAGES } from '../chem';
import { SHEET_MESSAGES } from './messages';

/** The argument's name in messages. */
export const COMPOSITION_ARGUMENT = 'composition';

/** Most rows a composition range may have: far more than any buffer has ingredients, few enough to read in well under a millisecond. */
export const MAX_COMPOSITION_ROWS = 1000;

/**
 * Refuses a range argument with more rows than a composition may have (a whole column
 * passed by mistake), before anything in it is read; salts and user-substance ranges too.
 *
 * @param argument - the argument's name in the message
 * @param value - the argument as given (a range, or a single value)
 */
export function checkRowLimit(argument: string, value: unknown): void {
  if (Array.isArray(value) && value.length > MAX_COMPOSITION_ROWS) {
    throw invalid('tooManyRows', argument, SHEET_MESSAGES.tooManyRows(argument, value.length, MAX_COMPOSITION_ROWS), `up to ${MAX_COMPOSITION_ROWS} rows`);
  }
}

/** Largest amount accepted in a composition row, mM (the library's per-form limit). */
export const MAX_AMOUNT_MM = MAX_FORM_CONCENTRATION_M * 1000;

/** What a name in a composition stands for. */
type Ingredient =
  { readonly kind: 'form'; readonly name: string } | { readonly kind: 'system'; readonly system: Omit<AcidBaseSystem, 'totalM'> } | { readonly kind: 'ion'; readonly ion: string };

const ingredientCache = new WeakMap<SubstanceLibrary, Map<string, Ingredient>>();
const compositionCache = new WeakMap<SubstanceLibrary, Lru<Composition>>();

/** Resolves a name: form, then system, then strong ion; a miss offers the nearest names. */
export function resolveName(library: SubstanceLibrary, name: string): Ingredient {
  let cache = ingredientCache.get(library);
  if (!cache) ingredientCache.set(library, (cache = new Map()));
  const hit = cache.get(name);
  if (hit) return hit;
  let found: Ingredient;
  try {
    found = { kind: 'form', name: library.findForm(name).name };
  } catch (formError) {
    if (!(formError instanceof ChemError) || formError.code !== 'unknownSubstance') throw formError;
    try {
      found = { kind: 'system', system: chemistryOf(library.findSystem(name)) };
    } catch {
      try {
        found = { kind: 'ion', ion: findStrongIon('name', name).name };
      } catch {
        const suggestions = formError.allowed ? formError.allowed.split(', ').filter((s) => s !== '') : [];
        throw new ChemError('invalid-input', 'unknownSubstance', MESSAGES.unknownSubstance('name', name, suggestions), 'name', formError.allowed);
      }
    }
  }
  if (cache.size > 1000) cache.clear();
  cache.set(name, found);
  return found;
}

function buildComposition(library: SubstanceLibrary, range: readonly (readonly unknown[])[]): Composition {
  const forms: FormAmount[] = [];
  const systems = new Map<string, AcidBaseSystem>();
  const ions: Record<string, number> = {};
  range.forEach((row, index) => {
    const name = row[0];
    const amount = row.length > 1 ? row[1] : null;
    if (isBlank(name) && isBlank(amount)) return;
    try {
      const text = toText('name', name);
      const mM = toField('amountMm', amount, 'amount (mM)');
      const ingredient = resolveName(library, text);
      if (ingredient.kind === 'form') forms.push({ form: ingredient.name, concentrationM: mM / 1000 });
      else if (ingredient.kind === 'ion') ions[ingredient.ion] = (ions[ingredient.ion] ?? 0) + mM / 1000;
      else {
        const prev = systems.get(ingredient.system.name);
        systems.set(ingredient.system.name, systemAt(ingredient.system, (prev?.totalM ?? 0) + mM / 1000));
      }
    } catch (error) {
      withContext(error, COMPOSITION_ARGUMENT, index + 1);
    }
  });
  if (forms.length === 0 && systems.size === 0 && Object.keys(ions).length === 0) {
    throw invalid('emptyRange', COMPOSITION_ARGUMENT, SHEET_MESSAGES.emptyRange(COMPOSITION_ARGUMENT, 'rows of a name and an amount in mM'));
  }
  const fromForms = library.compositionFromForms(forms, { extraStrongIons: ions });
  const merged = [...fromForms.systems];
  for (const sys of systems.values()) {
    const i = merged.findIndex((s) => s.name === sys.name);
    if (i >= 0) merged[i] = systemAt(merged[i], merged[i].totalM + sys.totalM);
    else merged.push(sys);
  }
  return { systems: merged, strongIons: fromForms.strongIons };
}

/**
 * The composition a range describes, at a temperature and with an activity model.
 *
 * @param library - substance library (built-in plus the user's)
 * @param value - the composition argument: a two-column range (name, mM)
 * @param temperatureC - °C
 * @param activityModel - activity model
 */
export function compositionFrom(library: SubstanceLibrary, value: unknown, temperatureC: number, activityModel: ActivityModel): Composition {
  checkRowLimit(COMPOSITION_ARGUMENT, value);
  const range = toRange(value);
  if (range.length > 0 && range.every((row) => row.length < 2) && !range.every((row) => row.every(isBlank))) {
    throw invalid('tooFewColumns', COMPOSITION_ARGUMENT, SHEET_MESSAGES.tooFewColumns(COMPOSITION_ARGUMENT, 1, 'two: a name and an amount in mM'));
  }
  let cache = compositionCache.get(library);
  if (!cache) compositionCache.set(library, (cache = new Lru<Composition>(256)));
  const key = JSON.stringify(range);
  let base = cache.get(key);
  if (!base) {
    base = buildComposition(library, range);
    cache.set(key, base);
  }
  return withConditions(base, temperatureC, activityModel);
}

/**
 * Single-form compositions at their conditions, per library: a grid asks the same one for every target pH of a column.
 * Kept in Maps keyed by the values themselves (form, activity model, amount, temperature), so a cell builds no key text;
 * emptied when it holds FORM_ALONE_ENTRIES.
 */
type FormAloneTree = Map<string, Map<ActivityModel, Map<number, Map<number, Composition>>>>;
const formAloneCache = new WeakMap<SubstanceLibrary, { tree: FormAloneTree; size: number }>();
/** Single-form compositions kept per library before the cache is emptied (a 100 × 100 what-if grid uses 100). */
const FORM_ALONE_ENTRIES = 1024;
/** The previous call's form, model and amount, and the map of temperatures they lead to. */
const lastFormAlone: {
  cache: { tree: FormAloneTree; size: number } | undefined;
  form: string;
  model: string;
  amount: number;
  byTemperature: Map<number, Composition> | undefined;
} = { cache: undefined, form: '', model: '', amount: NaN, byTemperature: undefined };

/**
 * A form alone at a concentration, temperature and activity model; the same object for the same four values
 * (so what the chemistry keeps per composition, such as a titrant's prepared setup, is found again).
 *
 * @param library - substance library (built-in plus the user's)
 * @param form - the form's name as typed
 * @param concentrationM - mol/L
 * @param temperatureC - °C
 * @param activityModel - activity model
 */
export function formAlone(library: SubstanceLibrary, form: string, concentrationM: number, temperatureC: number, activityModel: ActivityModel): Composition {
  let cache = formAloneCache.get(library);
  if (!cache) formAloneCache.set(library, (cache = { tree: new Map(), size: 0 }));
  let byTemperature: Map<number, Composition>;
  // A grid's neighbouring cells ask the same form, model and amount: the previous call's map of temperatures serves.
  if (lastFormAlone.cache === cache && lastFormAlone.form === form && lastFormAlone.model === activityModel && lastFormAlone.amount === concentrationM) {
    byTemperature = lastFormAlone.byTemperature!;
  } else {
    let byModel = cache.tree.get(form);
    if (!byModel) cache.tree.set(form, (byModel = new Map()));
    let byAmount = byModel.get(activityModel);
    if (!byAmount) byModel.set(activityModel, (byAmount = new Map()));
    let found = byAmount.get(concentrationM);
    if (!found) byAmount.set(concentrationM, (found = new Map()));
    byTemperature = found;
    lastFormAlone.cache = cache;
    lastFormAlone.form = form;
    lastFormAlone.model = activityModel;
    lastFormAlone.amount = concentrationM;
    lastFormAlone.byTemperature = byTemperature;
  }
  let c = byTemperature.get(temperatureC);
  if (!c) {
    c = library.compositionFromForms([{ form, concentrationM }], { temperatureC, activityModel });
    if (cache.size >= FORM_ALONE_ENTRIES) {
      cache.tree.clear();
      cache.size = 0;
      lastFormAlone.cache = undefined;
      return c;
    }
    byTemperature.set(temperatureC, c);
    cache.size++;
  }
  return c;
}
