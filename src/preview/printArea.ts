/**
 * What a preview sheet prints: its print area (as the workbook port set it, or the used
 * range) and that area's computed cells as text with their styles. No DOM: the preview's
 * print view and the command line's printable page both read it.
 */
import { PrintCell } from '../workbook/printPage';
import type { PrintLayout, RangeRef } from '../workbook/port';
import { formatValue } from './format';
import type { PreviewWorkbook } from './workbook';

/** Significant digits of a printed number that has no number format of its own. */
const PRINT_DIGITS = 4;

const layouts = new WeakMap<PreviewWorkbook, Map<string, PrintLayout>>();

/** Keeps a sheet's print layout (the preview adapter's setPrintLayout). */
export function rememberPrintLayout(book: PreviewWorkbook, sheet: string, layout: PrintLayout): void {
  if (!layouts.has(book)) layouts.set(book, new Map());
  layouts.get(book)!.set(sheet, layout);
}

/** The print area of a sheet: as set, or the used range. */
export function printArea(book: PreviewWorkbook, sheet: string): RangeRef {
  const set = layouts.get(book)?.get(sheet);
  if (set) return set.area;
  const { rows, cols } = book.dimensions(sheet);
  return { row: 0, col: 0, rowCount: rows, colCount: cols };
}

/** The print area's cells as text with their styles; rows with nothing to show or fill are left out, so a page is not spent on them. */
export function printCells(book: PreviewWorkbook, sheet: string): PrintCell[][] {
  const area = printArea(book, sheet);
  const values = book.values(sheet, area);
  const rows = values.map((line, r) =>
    line.map((value, c) => {
      const meta = book.meta(sheet, area.row + r, area.col + c);
      // A number without a format (a spilled check table) prints with four significant digits.
      const shown = typeof value === 'number' && !meta?.numberFormat && Number.isFinite(value) ? Number(value.toPrecision(PRINT_DIGITS)) : value;
      return { text: formatValue(shown, meta?.numberFormat), ...(meta?.style ? { style: meta.style } : {}), numeric: typeof value === 'number' };
    }),
  );
  return rows.filter((row) => row.some((c) => c.text !== '' || c.style === 'input'));
}
