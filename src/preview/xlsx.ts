/**
 * The preview workbook as an .xlsx file (exceljs in the browser, loaded on demand): every
 * formula with its computed result cached, values, number formats, bold headers and column
 * widths. exceljs writes no charts, so the file holds the charts' data but not the charts.
 */
import type * as ExcelJSTypes from 'exceljs';
import { cellAddress } from '../workbook/port';
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
  const base = title
    .replace(/[\\/:*?"<>|\u0000-\u001f]/g, ' ')
    .replace(/\s+/g, ' ')
    .replace(/^[ .]+|[ .]+$/g, '')
    .slice(0, 80)
    .trim();
  return `${base || 'workbook'}.xlsx`;
}

const BOLD_STYLES = new Set(['title', 'subtitle', 'header', 'caution']);

/** Builds the .xlsx bytes of the whole preview workbook. */
export async function workbookToXlsx(book: PreviewWorkbook, version: string): Promise<ArrayBuffer> {
  const ExcelJS = await loadExcelJs();
  const wb = new ExcelJS.Workbook();
  wb.creator = `Proton Ledger ${version} (preview)`;
  wb.created = new Date();
  for (const name of book.sheetNames()) {
    const ws = wb.addWorksheet(name);
    const { rows, cols } = book.dimensions(name);
    for (let c = 0; c < cols; c++) ws.getColumn(c + 1).width = book.columnWidth(name, c);
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
      }
    }
  }
  return wb.xlsx.writeBuffer() as Promise<ArrayBuffer>;
}
