/**
 * Writes a plain table (header row first) as an .xlsx workbook: frozen header, column widths
 * from the content, wrapped long text. Loaded only when a batch asks for .xlsx output, so
 * the workbook library never slows the other commands' start.
 */
import { writeFileSync } from 'fs';
import ExcelJS from 'exceljs';
import { nameApplication } from '../workbook/xlsxApplication';

/** Widest column, in characters: long warnings wrap instead. */
const MAX_COLUMN_WIDTH = 60;

/**
 * @param path - where to write the workbook
 * @param sheetName - the sheet's name
 * @param rows - the table, header first
 */
export async function writeTableXlsx(path: string, sheetName: string, rows: readonly (readonly (string | number)[])[]): Promise<void> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Proton Ledger';
  wb.lastModifiedBy = 'Proton Ledger';
  const ws = wb.addWorksheet(sheetName, { views: [{ state: 'frozen', ySplit: 1 }] });
  for (const row of rows) ws.addRow([...row]);
  ws.getRow(1).font = { bold: true };
  const columns = rows[0]?.length ?? 0;
  for (let c = 1; c <= columns; c++) {
    const longest = Math.max(...rows.map((r) => String(r[c - 1] ?? '').length));
    const column = ws.getColumn(c);
    column.width = Math.min(MAX_COLUMN_WIDTH, Math.max(8, longest + 2));
    if (longest > MAX_COLUMN_WIDTH) column.alignment = { wrapText: true, vertical: 'top' };
  }
  // exceljs names another program as the application; the file says Proton Ledger wrote it.
  writeFileSync(path, nameApplication(await wb.xlsx.writeBuffer(), [sheetName]));
}
