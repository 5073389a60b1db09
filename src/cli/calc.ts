/**
 * `proton-ledger calc`: evaluates a workbook whose cells use the PROTON worksheet
 * functions and ordinary spreadsheet formulas, and writes it back with values in place of
 * formulas, so a colleague without the add-in still gets the numbers.
 *
 *   proton-ledger calc book.xlsx -o filled.xlsx
 *   proton-ledger calc book.csv -o filled.csv      (also .xlsx → .csv and .csv → .xlsx)
 *   proton-ledger calc book.xlsx -o sheet2.csv --sheet "Sheet 2"
 *
 * Reading: exceljs. Evaluating: HyperFormula with the PROTON functions (formulaEngine.ts).
 * Writing: values only; a spreadsheet error becomes the error value with its message in a
 * cell note. Text is always written as text: a value beginning with = + - @ never becomes
 * a formula (in CSV it is prefixed with an apostrophe, as spreadsheet programs expect).
 */
import { readFileSync, writeFileSync } from 'fs';
import { extname } from 'path';
import ExcelJS from 'exceljs';
import { DetailedCellError, HyperFormula } from 'hyperformula';
import { createFormulaEngine } from '../functions/formulaEngine';
import { csvRows, worksheetRows } from '../workbook/fileCells';
import { literal } from '../workbook/port';

const USAGE = 'Usage: proton-ledger calc <input.xlsx|input.csv> -o <output.xlsx|output.csv> [--sheet NAME]';

/** Error values a .xlsx cell can hold; others from the engine are written as #VALUE! with a note. */
const XLSX_ERRORS = new Set(['#N/A', '#REF!', '#NAME?', '#DIV/0!', '#NULL!', '#VALUE!', '#NUM!']);

/** A formula error found while calculating. */
export interface CalcError {
  readonly cell: string;
  readonly value: string;
  readonly message: string;
}

/** What calc did. */
export interface CalcSummary {
  readonly output: string;
  readonly sheets: readonly string[];
  readonly formulas: number;
  readonly errors: readonly CalcError[];
}

type Grid = unknown[][];

function columnLetters(col: number): string {
  let s = '';
  for (let n = col + 1; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

/** Splits CSV text (RFC 4180: quotes, doubled quotes, CRLF) into rows of strings. */
export { parseCsv } from '../workbook/delimited';

/** A value as one CSV field; text that a spreadsheet would read as a formula gets an apostrophe. */
function csvField(value: unknown): string {
  let text: string;
  if (value === null || value === undefined) text = '';
  else if (value instanceof DetailedCellError) text = value.value;
  else if (typeof value === 'boolean') text = value ? 'TRUE' : 'FALSE';
  else if (typeof value === 'number') text = String(value);
  else text = literal(String(value)) as string;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function recordErrors(hf: HyperFormula, sheetId: number, sheetName: string, errors: CalcError[]): number {
  let formulas = 0;
  const values = hf.getSheetValues(sheetId);
  values.forEach((row, r) =>
    row.forEach((value, c) => {
      const address = { sheet: sheetId, row: r, col: c };
      if (hf.doesCellHaveFormula(address)) formulas++;
      if (value instanceof DetailedCellError) errors.push({ cell: `${sheetName}!${columnLetters(c)}${r + 1}`, value: value.value, message: value.message });
    }),
  );
  return formulas;
}

/** Writes computed values over formulas (and into spill ranges) of an exceljs sheet. */
function fillSheet(hf: HyperFormula, sheetId: number, sheet: ExcelJS.Worksheet, everyCell: boolean): void {
  const values = hf.getSheetValues(sheetId);
  values.forEach((row, r) =>
    row.forEach((value, c) => {
      const address = { sheet: sheetId, row: r, col: c };
      if (!everyCell && !hf.doesCellHaveFormula(address) && !hf.isCellPartOfArray(address)) return;
      if (value === null && everyCell) return;
      const cell = sheet.getCell(r + 1, c + 1);
      if (value instanceof DetailedCellError) {
        cell.value = { error: (XLSX_ERRORS.has(value.value) ? value.value : '#VALUE!') as ExcelJS.CellErrorValue['error'] };
        cell.note = value.message ? `${value.value} ${value.message}` : value.value;
      } else {
        // A string is stored as text by exceljs, never as a formula, whatever its first character.
        cell.value = value === null ? null : (value as number | string | boolean);
      }
    }),
  );
}

/**
 * Evaluates a workbook file and writes the result.
 *
 * @param input - .xlsx or .csv path
 * @param output - .xlsx or .csv path
 * @param sheetName - for CSV output from a workbook: which sheet (default the first)
 */
export async function calcFile(input: string, output: string, sheetName?: string): Promise<CalcSummary> {
  const inExt = extname(input).toLowerCase();
  const outExt = extname(output).toLowerCase();
  if (!['.xlsx', '.csv'].includes(inExt) || !['.xlsx', '.csv'].includes(outExt)) throw new Error(`calc reads and writes .xlsx or .csv files.\n${USAGE}`);
  let workbook: ExcelJS.Workbook;
  if (inExt === '.xlsx') {
    workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(input);
  } else {
    workbook = new ExcelJS.Workbook();
    workbook.addWorksheet('Sheet1');
  }
  const sheets: Record<string, Grid> = {};
  if (inExt === '.xlsx') workbook.eachSheet((ws) => (sheets[ws.name] = worksheetRows(ws)));
  else sheets.Sheet1 = csvRows(readFileSync(input, 'utf8'));
  const hf = createFormulaEngine(sheets, { maxRows: 1048576, maxColumns: 16384 });
  try {
    const errors: CalcError[] = [];
    let formulas = 0;
    const names = Object.keys(sheets);
    for (const name of names) formulas += recordErrors(hf, hf.getSheetId(name)!, name, errors);
    if (outExt === '.xlsx') {
      // A workbook keeps its cells and styles, formulas replaced; CSV input has no cells yet, so every value is written.
      for (const name of names) fillSheet(hf, hf.getSheetId(name)!, workbook.getWorksheet(name)!, inExt === '.csv');
      await workbook.xlsx.writeFile(output);
    } else {
      const name = sheetName ?? names[0];
      const id = hf.getSheetId(name);
      if (id === undefined) throw new Error(`No sheet named "${name}"; the workbook has ${names.map((n) => `"${n}"`).join(', ')}.`);
      writeFileSync(output, hf.getSheetValues(id).map((row) => row.map(csvField).join(',')).join('\r\n') + '\r\n');
    }
    return { output, sheets: names, formulas, errors };
  } finally {
    hf.destroy();
  }
}

/**
 * The calc command: arguments after `calc`. Prints a JSON summary (or a JSON error).
 *
 * @returns exit code: 0 when the file was written (formula errors are results, listed), 2 otherwise
 */
export async function runCalc(args: string[], write: (text: string) => void): Promise<number> {
  const o = args.findIndex((a) => a === '-o' || a === '--output');
  const s = args.indexOf('--sheet');
  const output = o >= 0 ? args[o + 1] : undefined;
  const input = args.find((a, i) => !a.startsWith('-') && !(o >= 0 && i === o + 1) && !(s >= 0 && i === s + 1));
  try {
    if (!input || !output) throw new Error(USAGE);
    write(JSON.stringify(await calcFile(input, output, s >= 0 ? args[s + 1] : undefined)) + '\n');
    return 0;
  } catch (e) {
    write(JSON.stringify({ error: { kind: 'invalid-input', message: e instanceof Error ? e.message : String(e) } }) + '\n');
    return 2;
  }
}
