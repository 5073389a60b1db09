/**
 * The lab's stock shelf, targets and volumes read from worksheet ranges for MIX.VOLUMES and
 * MIX.PH (docs/stocks.md). Every number is passed on as the user wrote it and read by the
 * core's one input reader; this module only finds the cells.
 *
 * Stock shelf, one row per stock:
 *
 * | column | content                                       | example                         |
 * |--------|-----------------------------------------------|---------------------------------|
 * | A      | the stock's name                              | `Tris-HCl 1 M pH 8.0`           |
 * | B      | form dissolved, or a neutral additive         | `tris base`, `glycerol`         |
 * | C      | concentration (M when a bare number), or %    | `1 M`, `500 mM`, `50 %`         |
 * | D      | titrant it was brought to pH with (optional)  | `HCl`                           |
 * | E      | the pH it was brought to (optional)           | `8.0`                           |
 * | F      | temperature that pH was set at (optional)     | `25`                            |
 *
 * Targets: A component (a stock's name or what it holds), B final amount (mM when a bare
 * number, or "10 %" for an additive). Volumes: A stock's name, B mL.
 * Blank rows are skipped; a first row whose column C (targets, volumes: B) holds text with
 * no digit is a header.
 */
import type { MixTarget, StockInput, StockVolume } from '../chem/mixing';
import { ChemError } from '../chem';
import { readNumberField } from '../chem/input';
import { isBlank, toRange, toText } from './coerce';
import { invalid, withContext } from './errors';
import { SHEET_MESSAGES } from './messages';

/** Argument names, as the functions declare them. */
export const STOCKS_ARGUMENT = 'stocks';
export const TARGETS_ARGUMENT = 'targets';
export const VOLUMES_ARGUMENT = 'volumes';
/** Most rows a stock shelf or a target list may hold. */
export const MAX_STOCK_ROWS = 200;

/** Column headings of the shelf, in order (documentation). */
export const STOCK_COLUMNS = ['name', 'form or additive', 'concentration', 'titrant', 'pH', 'pH at °C'] as const;

function cell(row: readonly unknown[], column: number): unknown {
  return column < row.length ? row[column] : null;
}

function isHeader(value: unknown): boolean {
  return typeof value === 'string' && value.trim() !== '' && !/\d/.test(value);
}

/** The rows with values, each with its 1-based row number in the range; a header row skipped. */
function rowsOf(argument: string, value: unknown, columns: number, headerColumn: number, what: string): { row: readonly unknown[]; at: number }[] {
  const range = toRange(value);
  const rows: { row: readonly unknown[]; at: number }[] = [];
  range.forEach((row, i) => {
    if (row.every(isBlank)) return;
    if (rows.length === 0 && isHeader(cell(row, headerColumn)) && !isBlank(cell(row, 0))) return;
    rows.push({ row, at: i + 1 });
  });
  if (rows.length === 0) throw invalid('emptyRange', argument, SHEET_MESSAGES.emptyRange(argument, what));
  if (rows.length > MAX_STOCK_ROWS) throw invalid('tooManyRows', argument, SHEET_MESSAGES.tooManyRows(argument, rows.length, MAX_STOCK_ROWS));
  const widest = Math.max(...range.map((r) => r.length));
  if (widest < columns) throw invalid('tooFewColumns', argument, SHEET_MESSAGES.tooFewColumns(argument, widest, what));
  return rows;
}

function optional(value: unknown): unknown {
  return isBlank(value) ? undefined : value;
}

/** The stock shelf from a range (columns A–F above), with the range row of each stock. */
export function shelfFrom(value: unknown): { readonly stocks: StockInput[]; readonly rows: number[] } {
  const found = rowsOf(STOCKS_ARGUMENT, value, 3, 2, 'at least three columns: name, form, concentration');
  const stocks = found.map(({ row, at }) => {
    try {
      return {
        name: toText('name', cell(row, 0)),
        form: toText('form', cell(row, 1)),
        concentration: cell(row, 2) as number | string,
        ...(isBlank(cell(row, 3)) ? {} : { titrant: toText('titrant', cell(row, 3)) }),
        ...(isBlank(cell(row, 4)) ? {} : { ph: optional(cell(row, 4)) as number | string }),
        ...(isBlank(cell(row, 5)) ? {} : { phTemperatureC: optional(cell(row, 5)) as number | string }),
      };
    } catch (error) {
      return withContext(error, STOCKS_ARGUMENT, at);
    }
  });
  return { stocks, rows: found.map((f) => f.at) };
}

/** The stock shelf from a range (columns A–F above). */
export function stocksFrom(value: unknown): StockInput[] {
  return shelfFrom(value).stocks;
}

/**
 * Runs a core call on a shelf read from a range; an error the core raises about the shelf
 * (`stocks[i]…`) comes back with the range row of that stock in front.
 */
export function onShelf<T>(rows: readonly number[], call: () => T): T {
  try {
    return call();
  } catch (error) {
    const field = error instanceof ChemError ? (error.field ?? '') : '';
    const m = /^stocks\[(\d+)\]/.exec(field);
    if (m && Number(m[1]) < rows.length) withContext(error, STOCKS_ARGUMENT, rows[Number(m[1])]);
    throw error;
  }
}

/** Targets from a range: component and final amount (mM, or % for an additive). */
export function targetsFrom(value: unknown): MixTarget[] {
  return rowsOf(TARGETS_ARGUMENT, value, 2, 1, 'two columns: component and final mM (or %)').map(({ row, at }) => {
    try {
      const amount = cell(row, 1);
      const component = toText('component', cell(row, 0));
      return typeof amount === 'string' && amount.trim().endsWith('%') ? { component, percent: amount } : { component, concentrationMm: amount as number | string };
    } catch (error) {
      return withContext(error, TARGETS_ARGUMENT, at);
    }
  });
}

/** Stock volumes from a range: stock name and mL. */
export function volumesFrom(value: unknown): StockVolume[] {
  return rowsOf(VOLUMES_ARGUMENT, value, 2, 1, 'two columns: stock name and mL').map(({ row, at }) => {
    try {
      const millilitres = readNumberField('volumeMl', cell(row, 1), 'mL') as number;
      return { stock: toText('stock', cell(row, 0)), millilitres };
    } catch (error) {
      return withContext(error, VOLUMES_ARGUMENT, at);
    }
  });
}
