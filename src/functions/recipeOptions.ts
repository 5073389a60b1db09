/**
 * The options range of RECIPE and RECIPE.ROW: two columns, an option's name (the command
 * line's field name, e.g. `titrant.concentrationM`, or its label, e.g. `Titrant stock (M)`)
 * and its value. Each value is read by the one declaration of its field (src/chem/input),
 * so a cell, the pane and the command line accept and refuse the same things; an error
 * names the option as the user wrote it.
 */
import { RecipeInput } from '../chem/planner';
import { ChemError, MESSAGES } from '../chem';
import { readChoiceField, readNumberField, readPurityField, readSaltsField, readTextField, recipeFieldOf, setFieldPath } from '../chem/input';
import { isBlank, toRange, toText } from './coerce';
import { invalid } from './errors';
import { SHEET_MESSAGES } from './messages';

/** The argument's name, as the function declares it. */
export const OPTIONS_ARGUMENT = 'options';
/** Most rows an options range may hold (every recipe field fits many times over). */
export const MAX_OPTION_ROWS = 100;

/** Fields that are positional arguments of RECIPE and RECIPE.ROW: an options row may not give them again. */
const POSITIONAL = new Set(['buffer', 'targetPh', 'concentrationMm', 'volumeMl']);

/** A recipe input built up field by field from dotted names (`titrant.form`). */
type Loose = Record<string, unknown>;

/**
 * Reads an options range into part of a planner input.
 *
 * @param range - the range as the host passed it (blank: no options)
 * @returns the options, each value already in its field's unit, and the names as written
 * @throws ChemError or SheetError naming the option as written
 */
export function recipeOptions(range: unknown): { readonly input: Partial<RecipeInput>; readonly written: ReadonlyMap<string, string> } {
  const rows = toRange(range).filter((row) => !row.every(isBlank));
  const written = new Map<string, string>();
  const input: Loose = {};
  if (rows.length > MAX_OPTION_ROWS)
    throw invalid('tooManyRows', OPTIONS_ARGUMENT, SHEET_MESSAGES.tooManyRows(OPTIONS_ARGUMENT, rows.length, MAX_OPTION_ROWS), `up to ${MAX_OPTION_ROWS} rows`);
  for (const row of rows) {
    if (row.length < 2)
      throw invalid('tooFewColumns', OPTIONS_ARGUMENT, SHEET_MESSAGES.tooFewColumns(OPTIONS_ARGUMENT, row.length, 'two: an option name and its value'), 'two columns');
    const name = toText(OPTIONS_ARGUMENT, row[0]);
    const f = recipeFieldOf(name);
    if (POSITIONAL.has(f.name) || written.has(f.name)) throw new ChemError('invalid-input', 'givenTwice', MESSAGES.givenTwice(name), name, 'each option once');
    written.set(f.name, name);
    const value = row[1];
    if (isBlank(value)) continue;
    let read: unknown;
    switch (f.kind) {
      case 'number':
        read = readNumberField(f.name, value, name);
        break;
      case 'text':
        read = readTextField(f.name, value, name);
        break;
      case 'choice':
        read = readChoiceField(f.name, value, name);
        break;
      case 'purity':
        read = readPurityField(f.name, value, name);
        break;
      case 'salts':
        read = readSaltsField(value, name);
        break;
    }
    if (read !== undefined) setFieldPath(input, f.name, read);
  }
  return { input: input as Partial<RecipeInput>, written };
}
