/**
 * Opens an .xlsx or .csv file from the user's disk into the preview: cells read by the
 * same code as the command line's calc (src/workbook/fileCells.ts: formulas kept, Excel's
 * saved forms of PROTON functions made live, array results left to their formulas, the
 * same limits), number formats and column widths kept. A file refused says why.
 */
import type { RawCellContent } from 'hyperformula';
import { CellBudget, csvRows, FileRefused, worksheetRows } from '../workbook/fileCells';
import { loadExcelJs } from './xlsx';
import { PreviewWorkbook } from './workbook';

/** Largest file the preview opens, bytes (the command line's limit too). */
export const MAX_OPEN_BYTES = 20 * 1024 * 1024;
/** Most cells with content in an opened file, all sheets (the command line's limit too). */
export const MAX_OPEN_CELLS = 200_000;

/** Why a file was not opened, in plain words. */
export class OpenRefused extends Error {}

/**
 * Reads a file into a new preview workbook.
 *
 * @param file - what the user picked
 * @param createEngine - builds the engine from sheet name → rows
 */
export async function openWorkbookFile(file: File, createEngine: (sheets: Record<string, RawCellContent[][]>) => PreviewWorkbook['engine']): Promise<PreviewWorkbook> {
  const extension = /\.[^.]+$/.exec(file.name)?.[0].toLowerCase() ?? '';
  if (extension !== '.xlsx' && extension !== '.csv') throw new OpenRefused(`"${file.name}" is not an .xlsx or .csv file; the preview opens those two.`);
  if (file.size > MAX_OPEN_BYTES) throw new OpenRefused(`"${file.name}" has ${(file.size / 1048576).toFixed(1)} MB; the preview opens files up to ${MAX_OPEN_BYTES / 1048576} MB.`);
  const budget = new CellBudget(MAX_OPEN_CELLS);
  const sheets: Record<string, RawCellContent[][]> = {};
  const formats: { sheet: string; row: number; col: number; numberFormat: string }[] = [];
  const widths: Record<string, number[]> = {};
  try {
    if (extension === '.csv') {
      sheets[file.name.replace(/\.csv$/i, '').slice(0, 31) || 'Sheet1'] = csvRows(await file.text(), budget) as RawCellContent[][];
    } else {
      const ExcelJS = await loadExcelJs();
      const wb = new ExcelJS.Workbook();
      try {
        await wb.xlsx.load(await file.arrayBuffer());
      } catch (error) {
        throw new OpenRefused(`"${file.name}" could not be read as an .xlsx workbook (${(error as Error).message}).`);
      }
      wb.eachSheet((ws) => {
        sheets[ws.name] = worksheetRows(ws, budget) as RawCellContent[][];
        widths[ws.name] = [];
        ws.columns?.forEach((column, c) => {
          if (column.width) widths[ws.name][c] = column.width;
        });
        ws.eachRow({ includeEmpty: false }, (row, r) =>
          row.eachCell({ includeEmpty: false }, (cell, c) => {
            if (cell.numFmt && cell.numFmt !== 'General') formats.push({ sheet: ws.name, row: r - 1, col: c - 1, numberFormat: cell.numFmt });
          }),
        );
      });
    }
  } catch (error) {
    if (error instanceof FileRefused) throw new OpenRefused(`"${file.name}" was not opened: ${error.message}`);
    throw error;
  }
  if (Object.keys(sheets).length === 0) throw new OpenRefused(`"${file.name}" holds no worksheets.`);
  let book: PreviewWorkbook;
  try {
    book = new PreviewWorkbook(createEngine(sheets));
  } catch (error) {
    throw new OpenRefused(`"${file.name}" was not opened: ${(error as Error).message}`);
  }
  for (const f of formats) book.setMeta(f.sheet, f.row, f.col, { numberFormat: f.numberFormat });
  for (const [name, w] of Object.entries(widths))
    book.setColumnWidths(
      name,
      Array.from(w, (x) => x ?? 10),
    );
  book.setTitle(file.name.replace(/\.(xlsx|csv)$/i, ''));
  return book;
}
