/**
 * Batch mode for what-if tables: many recipe (or solve) inputs at once, one output row per
 * input, each failure in its own row, never aborting the batch.
 *
 * Input: CSV with a header row of field names (the recipe JSON's names; dotted names for
 * nested ones, e.g. `titrant.form`), or JSON lines (one object per line). Output: CSV, JSON
 * lines, or .xlsx (written through exceljs, loaded only for that).
 */
import { stringify } from 'csv-stringify/sync';
import { ChemError } from '../chem';
import { setFieldPath } from '../chem/input';
import { planRecipe, RecipePlan } from '../chem/planner';
import { RECIPE_ROW_HEADER, recipeRowValues } from '../functions/recipeRow';
import { toRecipeInput } from './recipeInput';
import { libraryFor } from './compositionInput';
import { solveComposition } from './solve';
import { parseCsv } from '../workbook/delimited';

/** Most rows one batch may hold (a what-if grid of 100 × 100 fits). */
export const MAX_BATCH_ROWS = 100_000;

/** One input of a batch: its fields as given, and its row number in the file (1-based, header excluded). */
export interface BatchInput {
  readonly row: number;
  readonly fields: Record<string, unknown>;
}

/** The columns every output row starts with, then the command's own. */
export const SOLVE_COLUMNS = ['pH', 'ionic strength (mM)', 'conductivity (mS/cm)', 'warnings'] as const;

/**
 * Reads batch inputs from text: JSON lines when the first non-blank character is "{",
 * otherwise CSV with a header row. Blank CSV cells are left out (the field's default holds).
 *
 * @throws ChemError when the text is neither, or holds more than MAX_BATCH_ROWS rows
 */
export function readBatch(text: string): BatchInput[] {
  const trimmed = text.trimStart();
  const tooMany = (n: number) =>
    new ChemError('invalid-input', 'outOfRange', `The batch has ${n} rows; allowed: up to ${MAX_BATCH_ROWS}.`, 'batch', `up to ${MAX_BATCH_ROWS} rows`);
  if (trimmed.startsWith('{')) {
    const lines = text.split(/\r?\n/);
    const out: BatchInput[] = [];
    lines.forEach((line, i) => {
      if (line.trim() === '') return;
      let fields: unknown;
      try {
        fields = JSON.parse(line);
      } catch (e) {
        fields = { __error: `line ${i + 1} is not valid JSON: ${(e as Error).message}` };
      }
      out.push({ row: i + 1, fields: (fields ?? {}) as Record<string, unknown> });
    });
    if (out.length > MAX_BATCH_ROWS) throw tooMany(out.length);
    return out;
  }
  // The one CSV reader of every host (src/workbook/delimited.ts); fields trimmed, rows with nothing in them skipped.
  const records = parseCsv(text.replace(/^\uFEFF/, ''))
    .map((row) => row.map((field) => field.trim()))
    .filter((row) => row.some((field) => field !== ''));
  if (records.length === 0) return [];
  const [header, ...rows] = records;
  if (rows.length > MAX_BATCH_ROWS) throw tooMany(rows.length);
  return rows.map((cells, i) => {
    const fields: Record<string, unknown> = {};
    header.forEach((name, k) => {
      const value = cells[k];
      if (name !== '' && value !== undefined && value !== '') setFieldPath(fields, name, value);
    });
    return { row: i + 1, fields };
  });
}

/** An output row: the input's row number, the figures (or blanks), and the error if any. */
export interface BatchRow {
  readonly row: number;
  readonly values: readonly (number | string)[];
  readonly error?: { readonly kind: string; readonly code: string; readonly field?: string; readonly message: string };
}

function errorOf(e: unknown): NonNullable<BatchRow['error']> {
  if (e instanceof ChemError) return { kind: e.kind, code: e.code, ...(e.field ? { field: e.field } : {}), message: e.message };
  return { kind: 'invalid-input', code: 'unexpected', message: (e as Error).message };
}

/** Plans every input; a failure stays in its row. */
export function recipeBatch(inputs: readonly BatchInput[]): BatchRow[] {
  return inputs.map(({ row, fields }) => {
    try {
      if (typeof fields.__error === 'string') throw new ChemError('invalid-input', 'notJson', fields.__error, 'batch', 'one JSON object per line');
      const { recipe, userSubstances } = toRecipeInput(fields);
      const plan: RecipePlan = planRecipe(recipe, libraryFor(userSubstances));
      return { row, values: recipeRowValues(plan) };
    } catch (e) {
      return { row, values: [], error: errorOf(e) };
    }
  });
}

/** Solves every composition; a failure stays in its row. */
export function solveBatch(inputs: readonly BatchInput[]): BatchRow[] {
  return inputs.map(({ row, fields }) => {
    try {
      if (typeof fields.__error === 'string') throw new ChemError('invalid-input', 'notJson', fields.__error, 'batch', 'one JSON object per line');
      const result = solveComposition(fields);
      return { row, values: [result.pH, result.ionicStrengthM * 1000, result.conductivity.msPerCm, result.warnings.map((w) => w.message).join(' ')] };
    } catch (e) {
      return { row, values: [], error: errorOf(e) };
    }
  });
}

/** The header of a batch's output for a command. */
export function batchHeader(command: 'recipe' | 'solve'): string[] {
  return ['row', ...(command === 'recipe' ? RECIPE_ROW_HEADER : SOLVE_COLUMNS), 'error code', 'error field', 'error'];
}

/** The output rows as table rows (header first). */
export function batchTable(command: 'recipe' | 'solve', rows: readonly BatchRow[]): (string | number)[][] {
  const width = batchHeader(command).length - 4;
  return [
    batchHeader(command),
    ...rows.map((r) => [r.row, ...(r.error ? new Array<string>(width).fill('') : r.values), r.error?.code ?? '', r.error?.field ?? '', r.error?.message ?? '']),
  ];
}

/** The output as CSV text (text that could read as a formula is left as plain CSV: this is data, not a workbook). */
export function batchCsv(command: 'recipe' | 'solve', rows: readonly BatchRow[]): string {
  return stringify(batchTable(command, rows));
}

/** The output as JSON lines: one object per input, with its figures by column name or its error. */
export function batchJsonLines(command: 'recipe' | 'solve', rows: readonly BatchRow[]): string {
  const names = command === 'recipe' ? RECIPE_ROW_HEADER : SOLVE_COLUMNS;
  return rows
    .map((r) => JSON.stringify(r.error ? { row: r.row, error: r.error } : { row: r.row, ...Object.fromEntries(names.map((n, k) => [n, r.values[k]])) }))
    .join('\n')
    .concat(rows.length ? '\n' : '');
}
