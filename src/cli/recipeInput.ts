/**
 * The command line's recipe input: the planner's RecipeInput as JSON. Its keys are the
 * declared field names (src/chem/input), with dotted names as nested objects; an unknown key
 * gets "did you mean". Values are read by the planner through the same declarations as in a
 * cell or the pane, so "20 mM", "0,5 L" and "4 °C" work here too.
 */
import { ChemError, MESSAGES } from '../chem';
import { FIELDS } from '../chem/input';
import { closestNames, nameKey } from '../chem/library/names';
import { RecipeInput } from '../chem/planner';
import { readUserSubstances } from './compositionInput';

/** Keys besides the declared fields: user substances, and purity by form name. */
const EXTRA_KEYS = ['userSubstances', 'purityPercent'];

/** Every key path the recipe JSON may hold (`buffer`, `titrant`, `titrant.form`, …). */
const PATHS = new Set<string>([...EXTRA_KEYS]);
for (const f of FIELDS) {
  if (f.scope !== 'recipe') continue;
  const parts = f.name.split('.');
  for (let i = 1; i <= parts.length; i++) PATHS.add(parts.slice(0, i).join('.'));
}
const SUGGESTIONS = new Map([...PATHS].map((p) => [nameKey(p), p]));

function isObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

function unknownKey(path: string): ChemError {
  const suggestions = path.length > 60 ? [] : closestNames(nameKey(path), SUGGESTIONS);
  const allowed = [...PATHS].join(', ');
  return new ChemError('invalid-input', 'unknownField', MESSAGES.unknownField(path, suggestions, allowed), path, allowed);
}

/** Checks the keys of the input (nested objects included) against the declared fields. */
function checkKeys(value: Record<string, unknown>, prefix: string): void {
  for (const [key, inner] of Object.entries(value)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (!PATHS.has(path)) throw unknownKey(path);
    if (path === 'purityPercent' || path === 'userSubstances') continue;
    const nested = [...PATHS].some((p) => p.startsWith(`${path}.`));
    if (nested && isObject(inner)) checkKeys(inner, path);
    else if (nested && !(path === 'titrant' && typeof inner === 'string')) {
      throw new ChemError(
        'invalid-input',
        'missingValue',
        MESSAGES.missingValue(path, `an object with ${[...PATHS].filter((p) => p.startsWith(`${path}.`)).join(', ')}`),
        path,
        'an object',
      );
    }
  }
}

/**
 * Splits the command's JSON into the planner's input and the user substances, after checking
 * every key. `"titrant": "NaOH"` is short for `{"form": "NaOH"}` (1 M).
 *
 * @throws ChemError naming the key as written
 */
export function toRecipeInput(raw: unknown): { recipe: RecipeInput; userSubstances: Record<string, unknown>[] | undefined } {
  if (!isObject(raw))
    throw new ChemError(
      'invalid-input',
      'missingValue',
      MESSAGES.missingValue('recipe', 'a JSON object such as {"buffer": "HEPES", "targetPh": 7.4, "concentrationMm": 25, "volumeMl": 500}'),
      'recipe',
      'an object',
    );
  checkKeys(raw, '');
  const { userSubstances, ...rest } = raw;
  const users = readUserSubstances(userSubstances);
  const recipe = (typeof rest.titrant === 'string' ? { ...rest, titrant: { form: rest.titrant } } : rest) as unknown as RecipeInput;
  return { recipe, userSubstances: users };
}
