/**
 * The preview workbook as an .xlsx file (exceljs in the browser, loaded on demand): every
 * formula with its computed result cached, values, number formats, bold headers; a table's
 * header rows frozen and repeated on printed pages, columns wide enough for their numbers,
 * long text wrapped where it cannot run over into the next cell, pages fitted to the
 * paper's width; the file names Proton Ledger as its application. exceljs writes no charts:
 * a note row under each sheet that had charts says so, and the charts' data stay in the cells.
 */
import type * as ExcelJSTypes from 'exceljs';
import { cellAddress } from '../workbook/port';
import { nameApplication } from '../workbook/xlsxApplication';
import { formatValue } from './format';
import type { PreviewWorkbook } from './workbook';

type ExcelJSModule = typeof ExcelJSTypes;

let loaded: Promise<ExcelJSModule> | null = null;

/** Where the build copies exceljs's prebuilt browser bundle (same origin, so the CSP allows it). */
const EXCELJS_URL = 'vendor/exceljs.min.js';

/** exceljs's browser bundle, fetched from our own origin the first time it is needed. */
export function loadExcelJs(): Promise<ExcelJSModule> {
  if (!loaded) {
    loaded = new Promise<ExcelJSModule>((resolve, reject) => {
      const global = window as unknown as { ExcelJS?: ExcelJSModule };
      if (global.ExcelJS) return resolve(global.ExcelJS);
      const script = document.createElement('script');
      script.src = EXCELJS_URL;
      script.onload = () => (global.ExcelJS ? resolve(global.ExcelJS) : reject(new Error('exceljs did not load')));
      script.onerror = () => reject(new Error(`could not load ${EXCELJS_URL}`));
      document.head.appendChild(script);
    });
    loaded.catch(() => (loaded = null));
  }
  return loaded;
}

/** A file name from the workbook's title: characters file systems refuse dropped, at most 80 characters, .xlsx added. */
export function xlsxFileName(title: string): string {
  const base = Array.from(title, (ch) => (ch.charCodeAt(0) < 32 || '\\/:*?"<>|'.includes(ch) ? ' ' : ch))
    .join('')
    .replace(/\s+/g, ' ')
    .replace(/^[ .]+|[ .]+$/g, '')
    .slice(0, 80)
    .trim();
  return `${base || 'workbook'}.xlsx`;
}

const BOLD_STYLES = new Set(['title', 'subtitle', 'header', 'caution']);

/** Widest a column is made for its numbers, and for text that cannot run over, characters. */
const MAX_AUTO_WIDTH = 40;
/** A row with at least this many header cells heads a table: it is frozen and printed on every page. */
const TABLE_MIN_HEADERS = 5;

/** The row (0-based) heading the sheet's table: the row with the most header cells (at least TABLE_MIN_HEADERS), among the first 100. */
export function tableHeaderRow(book: PreviewWorkbook, sheet: string): number | undefined {
  const { rows, cols } = book.dimensions(sheet);
  let best: number | undefined;
  let bestCount = TABLE_MIN_HEADERS - 1;
  for (let r = 0; r < Math.min(rows, 100); r++) {
    let count = 0;
    for (let c = 0; c < cols; c++) if (book.meta(sheet, r, c)?.style === 'header') count++;
    if (count > bestCount) [best, bestCount] = [r, count];
  }
  return best;
}

/** The note written under a sheet whose charts the file cannot hold. */
export function chartNote(titles: readonly string[]): string {
  return `Charts in the preview (${titles.join('; ')}) are not in this file: the .xlsx writer cannot write charts. Their data are in the cells above; select the columns and insert a chart in your spreadsheet program.`;
}

/** Builds the .xlsx bytes of the whole preview workbook. */
export async function workbookToXlsx(book: PreviewWorkbook, version: string): Promise<Uint8Array> {
  const ExcelJS = await loadExcelJs();
  const wb = new ExcelJS.Workbook();
  wb.creator = `Proton Ledger ${version} (preview)`;
  wb.title = book.title();
  wb.created = new Date();
  for (const name of book.sheetNames()) {
    const header = tableHeaderRow(book, name);
    const ws = wb.addWorksheet(name, {
      views: header !== undefined ? [{ state: 'frozen', xSplit: 0, ySplit: header + 1 }] : [],
      pageSetup: { orientation: 'landscape', fitToPage: true, fitToWidth: 1, fitToHeight: 0, ...(header !== undefined ? { printTitlesRow: `${header + 1}:${header + 1}` } : {}) },
    });
    const { rows, cols } = book.dimensions(name);
    const widths = Array.from({ length: cols }, (_, c) => book.columnWidth(name, c));
    const text = (r: number, c: number) => formatValue(book.value(name, r, c), book.meta(name, r, c)?.numberFormat);
    // Numbers, and text with a value to its right (it cannot run over), widen their column up to a limit.
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < cols; c++) {
        const v = book.value(name, r, c);
        if (v === null || book.meta(name, r, c)?.style === 'header') continue;
        const blocked = typeof v !== 'string' || (c + 1 < cols && book.value(name, r, c + 1) !== null && book.value(name, r, c + 1) !== '');
        if (blocked) widths[c] = Math.max(widths[c], Math.min(MAX_AUTO_WIDTH, text(r, c).length + 2));
      }
    }
    widths.forEach((w, c) => (ws.getColumn(c + 1).width = w));
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < cols; c++) {
        const formula = book.formula(name, r, c);
        const value = book.value(name, r, c);
        if (formula === undefined && value === null) continue;
        const cell = ws.getCell(r + 1, c + 1);
        const result = value !== null && typeof value === 'object' ? ({ error: value.error } as ExcelJSTypes.CellErrorValue) : value;
        if (formula !== undefined) {
          // A result that fills several cells is written as an array formula over them, so
          // Excel recomputes it in place; the other cells keep their cached values.
          const size = book.spillSize(name, r, c);
          const ref = size.rows * size.cols > 1 ? `${cellAddress(r, c)}:${cellAddress(r + size.rows - 1, c + size.cols - 1)}` : undefined;
          cell.value = { formula: formula.replace(/^=/, ''), result: result ?? undefined, ...(ref ? { shareType: 'array', ref } : {}) } as ExcelJSTypes.CellFormulaValue;
        } else {
          cell.value = result as ExcelJSTypes.CellValue;
        }
        const meta = book.meta(name, r, c);
        if (meta?.numberFormat) cell.numFmt = meta.numberFormat;
        if (meta?.style && BOLD_STYLES.has(meta.style)) cell.font = { bold: true, ...(meta.style === 'title' ? { size: 14 } : {}) };
        if (meta?.style === 'input') cell.fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFEEF5F3' } };
        if (meta?.style === 'warning') cell.font = { color: { argb: 'FF7A4A00' } };
        const shown = typeof value === 'string' ? value : '';
        const nextEmpty = c + 1 >= cols || book.value(name, r, c + 1) === null || book.value(name, r, c + 1) === '';
        if (meta?.style === 'header' || (shown.length > widths[c] && !nextEmpty)) cell.alignment = { wrapText: true, vertical: meta?.style === 'header' ? 'bottom' : 'top' };
      }
    }
    const charts = book.charts(name);
    if (charts.length > 0) {
      const note = ws.getCell(Math.max(rows, ...charts.map((ch) => ch.anchor.row + ch.anchor.rowCount)) + 2, 1);
      note.value = chartNote(charts.map((ch) => ch.title));
      note.font = { italic: true, color: { argb: 'FF52616B' } };
    }
  }
  return nameApplication((await wb.xlsx.writeBuffer()) as ArrayBuffer, book.sheetNames());
}
