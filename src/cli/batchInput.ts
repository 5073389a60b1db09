/**
 * The command line's batch input: `{"recipe": {…}, "actual": {…}, "reading": {…},
 * "counterTitrant": {…}, "tolerance": {…}}`, with the declared batch field names
 * (src/chem/input, scope `batch`: `actual.titrantMl` is `{"actual": {"titrantMl": …}}`) and
 * the forms weighed as `"actual": {"weighed": [{"form", "grams", "purityPercent", "lot"}]}`.
 * The recipe is read as by `proton-ledger recipe`.
 */
import { ChemError, MESSAGES } from '../chem';
import { BatchActuals, BatchTolerances, BenchState, WeighedActual } from '../chem/batch';
import { FIELDS } from '../chem/input';
import { RecipeInput } from '../chem/planner';
import { toRecipeInput } from './recipeInput';

const GROUPS = ['recipe', 'actual', 'reading', 'counterTitrant', 'tolerance'] as const;

/** Keys each group may hold: the batch fields' second part (`actual.titrantMl` → titrantMl), and the weighed list. */
const KEYS = new Map<string, Set<string>>(GROUPS.map((g) => [g, new Set<string>()]));
for (const f of FIELDS) {
  if (f.scope !== 'batch') continue;
  const [group, key] = f.name.split('.');
  if (f.name !== 'actual.grams' && f.name !== 'actual.purityPercent') KEYS.get(group)?.add(key);
}
KEYS.get('actual')!.add('weighed');

function isObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

function group(raw: Record<string, unknown>, name: string): Record<string, unknown> {
  const value = raw[name];
  if (value === undefined) return {};
  if (!isObject(value)) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(name, 'an object'), name, 'an object');
  for (const key of Object.keys(value)) {
    const allowed = KEYS.get(name)!;
    if (!allowed.has(key))
      throw new ChemError(
        'invalid-input',
        'unknownField',
        MESSAGES.unknownField(`${name}.${key}`, [], [...allowed].map((k) => `${name}.${k}`).join(', ')),
        `${name}.${key}`,
        [...allowed].join(', '),
      );
  }
  return value;
}

/** What a batch command was given. */
export interface BatchCommandInput {
  readonly recipe: RecipeInput;
  readonly userSubstances: Record<string, unknown>[] | undefined;
  readonly actuals: BatchActuals;
  readonly tolerances: BatchTolerances;
  readonly bench: BenchState;
}

/**
 * Splits a batch command's JSON.
 *
 * @throws ChemError naming an unknown key or a missing recipe
 */
export function toBatchInput(raw: unknown): BatchCommandInput {
  if (!isObject(raw) || !isObject(raw.recipe))
    throw new ChemError(
      'invalid-input',
      'missingValue',
      MESSAGES.missingValue('recipe', 'a JSON object {"recipe": {…}, "actual": {…}} (see proton-ledger help as-made)'),
      'recipe',
      'an object',
    );
  for (const key of Object.keys(raw)) {
    if (!(GROUPS as readonly string[]).includes(key))
      throw new ChemError('invalid-input', 'unknownField', MESSAGES.unknownField(key, [], GROUPS.join(', ')), key, GROUPS.join(', '));
  }
  const { recipe, userSubstances } = toRecipeInput(raw.recipe);
  const actual = group(raw, 'actual');
  const reading = group(raw, 'reading');
  const counter = group(raw, 'counterTitrant');
  const tolerance = group(raw, 'tolerance');
  const weighed = (actual.weighed ?? []) as WeighedActual[];
  const actuals = { ...actual, weighed } as BatchActuals;
  const bench: BenchState = {
    titrantMl: actual.titrantMl as number,
    readingPh: reading.ph as number,
    ...(actual.titrantConcentrationM === undefined ? {} : { titrantConcentrationM: actual.titrantConcentrationM as number }),
    ...(reading.temperatureC === undefined ? {} : { temperatureC: reading.temperatureC as number }),
    ...(reading.volumeMl === undefined ? {} : { volumeMl: reading.volumeMl as number }),
    ...(actual.weighed === undefined ? {} : { weighed }),
    ...(Object.keys(counter).length ? { counterTitrant: counter } : {}),
    ...(tolerance.meterPh === undefined ? {} : { meterTolerancePh: tolerance.meterPh as number }),
  };
  return { recipe, userSubstances, actuals, tolerances: tolerance as BatchTolerances, bench };
}
