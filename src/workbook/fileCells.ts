/**
 * Cells of a workbook file for the formula engine, read the same way by every host that
 * opens files (the command line's calc, the preview page's Open): an .xlsx worksheet as
 * exceljs reads it, or a CSV file's text. Formulas keep working: Excel's saved forms are
 * turned back into ours (engineFormula), cells an array formula spills into are left to
 * the formula, and text stays text (an apostrophe in front, whatever it looks like).
 * Every formula is held to the formula limits (src/workbook/formulaLimits.ts) and every
 * text to Excel's cell length before the engine sees it.
 */
import type * as ExcelJS from 'exceljs';
import { engineFormula } from '../functions/formulaText';
import { formulaLimitBreach, MAX_FORMULA_CHARS } from './formulaLimits';
import { parseCsv } from './delimited';
import { cellAddress } from './port';

/** Characters in one cell: Excel's limit (Microsoft, "Excel specifications and limits"). */
export const MAX_CELL_CHARS = 32_767;
/** Day 0 of Excel's 1900 date system (serial 1 = 1900-01-01, with Excel's 1900 leap-year quirk folded in). */
const EXCEL_EPOCH_MS = Date.UTC(1899, 11, 30);
const MS_PER_DAY = 86400000;
/** exceljs's ValueType.Merge (lib/doc/enums.js), spelt as its number so that this module needs no value import of exceljs (the browser loads exceljs on demand). */
const MERGE_CELL_TYPE = 1;

/** A file refused while its cells are read, with the reason in plain words. */
export class FileRefused extends Error {}

/** The messages of a refused file. */
export const FILE_MESSAGES = {
  textTooLong: (where: string, length: number) => `${where}: a text of ${length.toLocaleString('en-US')} characters; a cell holds up to ${MAX_CELL_CHARS.toLocaleString('en-US')}.`,
  formulaTooLong: (where: string, length: number) =>
    `${where}: a formula of ${length.toLocaleString('en-US')} characters; a formula may have up to ${MAX_FORMULA_CHARS.toLocaleString('en-US')}.`,
  formulaTooDeep: (where: string, depth: number, limit: number) =>
    `${where}: a formula nested ${depth.toLocaleString('en-US')} levels deep; a formula may nest up to ${limit} levels.`,
  formulaTooManyOperators: (where: string, operators: number, limit: number) =>
    `${where}: a formula with ${operators.toLocaleString('en-US')} operators; up to ${limit} can be computed in one formula (split it over several cells).`,
  tooManyCells: (count: number, limit: number) =>
    `The file has more than ${limit.toLocaleString('en-US')} cells with content (at least ${count.toLocaleString('en-US')}); split it into smaller files.`,
} as const;

/** Refuses a formula past the formula limits, naming the cell. */
export function checkFileFormula(formula: string, where: string): void {
  const breach = formulaLimitBreach(formula);
  if (!breach) return;
  if (breach.limit === 'length') throw new FileRefused(FILE_MESSAGES.formulaTooLong(where, breach.value));
  if (breach.limit === 'depth') throw new FileRefused(FILE_MESSAGES.formulaTooDeep(where, breach.value, breach.allowed));
  throw new FileRefused(FILE_MESSAGES.formulaTooManyOperators(where, breach.value, breach.allowed));
}

/** Text for the engine: an apostrophe keeps it text even if it looks like a formula or number. */
function engineText(text: string, where: string): string {
  if (text.length > MAX_CELL_CHARS) throw new FileRefused(FILE_MESSAGES.textTooLong(where, text.length));
  return `'${text}`;
}

/**
 * One exceljs cell as the engine takes it.
 *
 * @param cell - the cell
 * @param where - the cell for messages ("Sheet1!B2")
 */
export function cellInput(cell: ExcelJS.Cell, where: string): unknown {
  // A merged range holds its value in its first cell; the others are empty (exceljs reports the first cell's value for each).
  if (cell.type === MERGE_CELL_TYPE) return null;
  const v = cell.value;
  if (v === null || v === undefined) return null;
  if (typeof v === 'number' || typeof v === 'boolean') return v;
  if (typeof v === 'string') return engineText(v, where);
  if (v instanceof Date) return (v.getTime() - EXCEL_EPOCH_MS) / MS_PER_DAY;
  if (typeof v === 'object') {
    if ('formula' in v || 'sharedFormula' in v) {
      const formula = cell.formula;
      if (!formula) return null;
      checkFileFormula(formula, where);
      return `=${engineFormula(formula.replace(/^=/, ''))}`;
    }
    if ('richText' in v) return engineText(v.richText.map((r) => r.text).join(''), where);
    if ('error' in v) return v.error;
    if ('text' in v) return engineText(String(v.text), where);
  }
  return null;
}

/** Cells of an array formula's range other than its first: Excel stores cached values there; the engine spills into them. */
export function arrayCovered(sheet: ExcelJS.Worksheet): Set<string> {
  const covered = new Set<string>();
  sheet.eachRow({ includeEmpty: false }, (row) => {
    row.eachCell({ includeEmpty: false }, (cell) => {
      const v = cell.value as { shareType?: string; ref?: string } | null;
      if (v && typeof v === 'object' && v.shareType === 'array' && v.ref) {
        const [a, b] = v.ref.split(':');
        if (!b) return;
        const start = sheet.getCell(a);
        const end = sheet.getCell(b);
        for (let r = Number(start.row); r <= Number(end.row); r++) {
          for (let c = Number(start.col); c <= Number(end.col); c++) if (r !== Number(start.row) || c !== Number(start.col)) covered.add(`${r},${c}`);
        }
      }
    });
  });
  return covered;
}

/** Counts cells with content across a whole file, refusing past the limit. */
export class CellBudget {
  private used = 0;
  constructor(readonly limit: number) {}
  take(): void {
    if (++this.used > this.limit) throw new FileRefused(FILE_MESSAGES.tooManyCells(this.used, this.limit));
  }
}

/**
 * A worksheet's cells as rows for the engine (rows without content are empty arrays).
 *
 * @param sheet - the exceljs worksheet
 * @param budget - counts cells over the whole file, if the host limits them
 */
export function worksheetRows(sheet: ExcelJS.Worksheet, budget?: CellBudget): unknown[][] {
  const grid: unknown[][] = [];
  const covered = arrayCovered(sheet);
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    row.eachCell({ includeEmpty: false }, (cell, colNumber) => {
      if (covered.has(`${rowNumber},${colNumber}`)) return;
      const value = cellInput(cell, `${sheet.name}!${cellAddress(rowNumber - 1, colNumber - 1)}`);
      if (value === null) return;
      budget?.take();
      (grid[rowNumber - 1] ??= [])[colNumber - 1] = value;
    });
  });
  for (let r = 0; r < grid.length; r++) grid[r] ??= [];
  return grid;
}

/** A plain number as CSV writes it; no two parts can match the same digits, so it reads in one pass (30,000 digits then a letter took 1.7 s with "\\d+\\.?\\d*"). */
const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/**
 * A CSV field for the engine: "=…" is a formula, "'…" literal text, a plain number a number, anything else text.
 *
 * @param where - the cell for messages ("B3 of the CSV file")
 */
export function csvInput(field: string, where: string): unknown {
  if (field === '') return null;
  if (field.startsWith('=')) {
    checkFileFormula(field, where);
    return `=${engineFormula(field.slice(1))}`;
  }
  if (field.startsWith("'")) return engineText(field.slice(1), where);
  if (PLAIN_NUMBER.test(field.trim())) return Number(field);
  return engineText(field, where);
}

/**
 * A CSV file's text (a byte-order mark dropped) as rows for the engine.
 *
 * @param budget - counts fields with content, if the host limits them
 * @param onFormula - sees each formula with its cell after the formula limits passed (the command line counts the ranges formulas read)
 */
export function csvRows(text: string, budget?: CellBudget, onFormula?: (formula: string, where: string) => void): unknown[][] {
  return parseCsv(text.replace(/^\uFEFF/, '')).map((row, r) =>
    row.map((field, c) => {
      if (field === '') return null;
      budget?.take();
      const where = `${cellAddress(r, c)} of the CSV file`;
      const value = csvInput(field, where);
      if (onFormula && field.startsWith('=')) onFormula(field, where);
      return value;
    }),
  );
}
