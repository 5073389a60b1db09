/**
 * `proton-ledger calc`: evaluates a workbook whose cells use the PROTON worksheet
 * functions and ordinary spreadsheet formulas, and writes it back with values in place of
 * formulas, so a colleague without the add-in still gets the numbers.
 *
 *   proton-ledger calc book.xlsx -o filled.xlsx
 *   proton-ledger calc book.csv -o filled.csv      (also .xlsx → .csv and .csv → .xlsx)
 *   proton-ledger calc book.xlsx -o sheet2.csv --sheet "Sheet 2"
 *   proton-ledger calc book.xlsx -o filled.xlsx --force   (replace an existing filled.xlsx)
 *
 * Files: the output is never the input (compared by real path and by file identity, so
 * `./book.xlsx`, a symbolic or a hard link are caught), an existing output is replaced only
 * with --force, and every output is written to a temporary file in the same directory and
 * then renamed over the name, so an interrupted run leaves the old file or the new one,
 * never half of either.
 *
 * Reading: exceljs. Evaluating: HyperFormula with the PROTON functions (formulaEngine.ts).
 * Writing: values only; a spreadsheet error becomes the error value with its message in a
 * cell note. Text is always written as text: a value beginning with = + - @ never becomes
 * a formula (in CSV it is prefixed with an apostrophe, as spreadsheet programs expect).
 */
import { randomBytes } from 'crypto';
import { closeSync, fsyncSync, linkSync, lstatSync, openSync, readFileSync, realpathSync, renameSync, statSync, Stats, unlinkSync, writeSync } from 'fs';
import { basename, dirname, extname, join, resolve } from 'path';
import ExcelJS from 'exceljs';
import { AlwaysSparse, DetailedCellError, HyperFormula } from 'hyperformula';
import { createFormulaEngine } from '../functions/formulaEngine';
import { CellBudget, csvRows, FileRefused, worksheetRows } from '../workbook/fileCells';
import { cellAddress, literal } from '../workbook/port';
import { CALC_MESSAGES } from './calcMessages';
import { InputRefused, MAX_CELLS, MAX_COLUMNS, MAX_FILE_BYTES, MAX_ROWS, RangeBudget, checkWorkbookPackage } from './calcLimits';

const USAGE = 'Usage: proton-ledger calc <input.xlsx|input.csv> -o <output.xlsx|output.csv> [--sheet NAME] [--force]';

/** A refusal of calc, reported as a JSON error naming the argument at fault. */
export class CalcFailure extends Error {
  constructor(
    message: string,
    readonly field: 'input' | 'output' | 'sheet' | 'usage',
  ) {
    super(message);
  }
}

/** How calc may treat its output file. */
export interface CalcOptions {
  /** For CSV output from a workbook: which sheet (default the first). */
  readonly sheetName?: string;
  /** Replace an existing output file (never the input). */
  readonly force?: boolean;
}

function statOrUndefined(path: string, follow: boolean): Stats | undefined {
  try {
    return follow ? statSync(path) : lstatSync(path);
  } catch {
    return undefined;
  }
}

/**
 * Refuses an output that is the input — the same real path (`./book.xlsx`, a symbolic link)
 * or the same file (device and inode: a hard link) — a directory, and, without force, any
 * existing file or link.
 */
export function checkOutput(input: string, output: string, force: boolean): void {
  const inputStat = statOrUndefined(input, true);
  if (!inputStat) throw new CalcFailure(CALC_MESSAGES.cannotRead(input, 'no such file'), 'input');
  if (inputStat.isDirectory()) throw new CalcFailure(CALC_MESSAGES.cannotRead(input, 'it is a directory'), 'input');
  const outputStat = statOrUndefined(output, true);
  if (outputStat?.isDirectory()) throw new CalcFailure(CALC_MESSAGES.outputIsDirectory(output), 'output');
  const sameFile = outputStat !== undefined && outputStat.dev === inputStat.dev && outputStat.ino === inputStat.ino;
  if (sameFile || (outputStat && realpathSync(output) === realpathSync(input))) throw new CalcFailure(CALC_MESSAGES.outputIsInput(output, input), 'output');
  if (!force && statOrUndefined(output, false)) throw new CalcFailure(CALC_MESSAGES.outputExists(output), 'output');
}

/**
 * Writes a file through a temporary file in the same directory, flushed to disk, then moved
 * onto the name in one step (a rename; without force a hard link, which fails rather than
 * replace a file that appeared meanwhile). On any failure the temporary file is removed and
 * whatever was at the name is left as it was.
 */
export function writeFileAtomically(output: string, data: string | Uint8Array, force: boolean): void {
  const temp = join(dirname(resolve(output)), `.${basename(output)}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);
  let created = false;
  try {
    const fd = openSync(temp, 'wx', 0o666);
    created = true;
    try {
      const bytes = typeof data === 'string' ? Buffer.from(data, 'utf8') : data;
      for (let offset = 0; offset < bytes.length;) offset += writeSync(fd, bytes, offset, bytes.length - offset);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
    if (force) renameSync(temp, output);
    else {
      try {
        linkSync(temp, output);
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code === 'EEXIST') throw new CalcFailure(CALC_MESSAGES.outputExists(output), 'output');
        // A file system without hard links: the check before writing has to do.
        if (statOrUndefined(output, false)) throw new CalcFailure(CALC_MESSAGES.outputExists(output), 'output');
        renameSync(temp, output);
      }
    }
  } catch (e) {
    if (e instanceof CalcFailure) throw e;
    throw new CalcFailure(CALC_MESSAGES.cannotWrite(output, (e as NodeJS.ErrnoException).code ?? (e as Error).message), 'output');
  } finally {
    if (created) {
      try {
        unlinkSync(temp);
      } catch {
        // Already renamed onto the output.
      }
    }
  }
}

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
  /** Cells holding #N/A by design (NA() in chart data: no message), listed apart from the errors. */
  readonly notAvailable: readonly string[];
}

type Grid = unknown[][];

/** A sheet's cells for the engine, and where its non-empty cells are (so nothing else is ever visited). */
interface SheetInput {
  /** Emptied once the engine holds the cells, so the two copies are never kept together longer than needed. */
  grid: Grid;
  readonly cells: readonly (readonly [number, number])[];
}

/** Where a grid's cells are: the engine is asked about these and no others. */
function gridCells(grid: Grid): [number, number][] {
  const cells: [number, number][] = [];
  // forEach skips the holes of a sparse row, so a value in the last column costs one visit, not sixteen thousand.
  grid.forEach((row, r) => row.forEach((value, c) => value !== null && value !== undefined && cells.push([r, c])));
  return cells;
}

/** A sheet's cells, read as every host reads a worksheet (src/workbook/fileCells.ts). */
function sheetInput(sheet: ExcelJS.Worksheet): SheetInput {
  const grid = worksheetRows(sheet);
  return { grid, cells: gridCells(grid) };
}

/** A CSV file's cells, read as every host reads a CSV file, within calc's cell budget and with the ranges its formulas read counted. */
function csvSheetInput(text: string): SheetInput {
  const ranges = new RangeBudget();
  const grid = csvRows(text, new CellBudget(MAX_CELLS), (formula, where) => ranges.count(formula, where));
  return { grid, cells: gridCells(grid) };
}

/**
 * Every cell calc must read back: each non-empty input cell and each cell an array result
 * spills into (found by walking from its formula along the spill), never the whole grid
 * (a value in XFD1048576 would make that seventeen billion cells).
 */
function engineCells(hf: HyperFormula, sheet: number, input: SheetInput): [number, number][] {
  const out: [number, number][] = [];
  const spilled = (row: number, col: number) => hf.isCellPartOfArray({ sheet, row, col }) && !hf.doesCellHaveFormula({ sheet, row, col });
  for (const [row, col] of input.cells) {
    out.push([row, col]);
    const address = { sheet, row, col };
    if (!hf.doesCellHaveFormula(address) || !hf.isCellPartOfArray(address)) continue;
    let width = 1;
    while (col + width < MAX_COLUMNS && spilled(row, col + width)) width++;
    let height = 1;
    while (row + height < MAX_ROWS && spilled(row + height, col)) height++;
    for (let r = row; r < row + height; r++) for (let c = col; c < col + width; c++) if (r !== row || c !== col) out.push([r, c]);
  }
  return out;
}

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

function recordErrors(hf: HyperFormula, sheetId: number, sheetName: string, cells: readonly (readonly [number, number])[], errors: CalcError[], notAvailable: string[]): number {
  let formulas = 0;
  const found: { row: number; col: number; error: DetailedCellError }[] = [];
  for (const [row, col] of cells) {
    const address = { sheet: sheetId, row, col };
    if (hf.doesCellHaveFormula(address)) formulas++;
    const value = hf.getCellValue(address);
    if (value instanceof DetailedCellError) found.push({ row, col, error: value });
  }
  // Row by row, as a reader scans the sheet.
  found.sort((a, b) => a.row - b.row || a.col - b.col);
  for (const { row, col, error } of found) {
    const cell = `${sheetName}!${cellAddress(row, col)}`;
    // NA() (and IF(…, NA())) gives #N/A with no message: a gap by design, as chart data uses it; every PROTON #N/A says why.
    if (error.value === '#N/A' && !error.message) notAvailable.push(cell);
    else errors.push({ cell, value: error.value, message: error.message });
  }
  return formulas;
}

/** Writes computed values over formulas (and into spill ranges) of an exceljs sheet. */
function fillSheet(hf: HyperFormula, sheetId: number, sheet: ExcelJS.Worksheet, cells: readonly (readonly [number, number])[], everyCell: boolean): void {
  for (const [r, c] of cells) {
    const address = { sheet: sheetId, row: r, col: c };
    if (!everyCell && !hf.doesCellHaveFormula(address) && !hf.isCellPartOfArray(address)) continue;
    const value = hf.getCellValue(address);
    if (value === null && everyCell) continue;
    const cell = sheet.getCell(r + 1, c + 1);
    if (value instanceof DetailedCellError) {
      cell.value = { error: (XLSX_ERRORS.has(value.value) ? value.value : '#VALUE!') as ExcelJS.CellErrorValue['error'] };
      cell.note = value.message ? `${value.value} ${value.message}` : value.value;
    } else {
      // A string is stored as text by exceljs, never as a formula, whatever its first character.
      cell.value = value === null ? null : (value as number | string | boolean);
    }
  }
}

/**
 * Reads the input within calc's limits: the file's size first, a workbook's package before
 * the reader sees it (calcLimits.ts), a CSV file's fields as they are split.
 */
async function readInput(input: string, isWorkbook: boolean): Promise<{ workbook: ExcelJS.Workbook; sheets: Record<string, SheetInput> }> {
  try {
    const size = statSync(input).size;
    if (size > MAX_FILE_BYTES) throw new InputRefused(CALC_MESSAGES.fileTooLarge(input, size, MAX_FILE_BYTES));
    const workbook = new ExcelJS.Workbook();
    const sheets: Record<string, SheetInput> = {};
    if (isWorkbook) {
      const buf = readFileSync(input);
      const listed = checkWorkbookPackage(buf, input);
      try {
        await workbook.xlsx.load(buf as unknown as ArrayBuffer);
      } catch (e) {
        throw new InputRefused(CALC_MESSAGES.notAWorkbook(input, (e as Error).message));
      }
      if (workbook.worksheets.length === 0) throw new InputRefused(CALC_MESSAGES.noSheets(input));
      const read = new Set(workbook.worksheets.map((ws) => ws.name));
      const lost = listed.filter((name) => !read.has(name));
      if (lost.length > 0) throw new InputRefused(CALC_MESSAGES.sheetNotRead(input, lost));
      workbook.eachSheet((ws) => (sheets[ws.name] = sheetInput(ws)));
    } else {
      workbook.addWorksheet('Sheet1');
      sheets.Sheet1 = csvSheetInput(readFileSync(input, 'utf8'));
    }
    return { workbook, sheets };
  } catch (e) {
    if (e instanceof InputRefused || e instanceof FileRefused) throw new CalcFailure(e.message, 'input');
    if (e instanceof CalcFailure) throw e;
    throw new CalcFailure(CALC_MESSAGES.cannotRead(input, (e as NodeJS.ErrnoException).code ?? (e as Error).message), 'input');
  }
}

/**
 * Evaluates a workbook file and writes the result.
 *
 * @param input - .xlsx or .csv path
 * @param output - .xlsx or .csv path, never the input; an existing file only with `force`
 * @param options - the sheet for CSV output, and whether to replace an existing output
 */
export async function calcFile(input: string, output: string, options: CalcOptions = {}): Promise<CalcSummary> {
  const { sheetName, force = false } = options;
  const inExt = extname(input).toLowerCase();
  const outExt = extname(output).toLowerCase();
  if (!['.xlsx', '.csv'].includes(inExt) || !['.xlsx', '.csv'].includes(outExt))
    throw new CalcFailure(`calc reads and writes .xlsx or .csv files.\n${USAGE}`, ['.xlsx', '.csv'].includes(inExt) ? 'output' : 'input');
  checkOutput(input, output, force);
  const { workbook, sheets } = await readInput(input, inExt === '.xlsx');
  const grids: Record<string, Grid> = {};
  for (const [name, sheet] of Object.entries(sheets)) grids[name] = sheet.grid;
  // Sparse address maps: the engine's dense maps take memory for the whole span of a sheet, so a value in XFD1048576 asked it for gigabytes.
  const hf = createFormulaEngine(grids, { maxRows: MAX_ROWS, maxColumns: MAX_COLUMNS, chooseAddressMappingPolicy: new AlwaysSparse() });
  for (const sheet of Object.values(sheets)) sheet.grid = [];
  for (const name of Object.keys(grids)) delete grids[name];
  try {
    const errors: CalcError[] = [];
    const notAvailable: string[] = [];
    let formulas = 0;
    const names = Object.keys(sheets);
    const cells = new Map(names.map((name) => [name, engineCells(hf, hf.getSheetId(name)!, sheets[name])]));
    for (const name of names) formulas += recordErrors(hf, hf.getSheetId(name)!, name, cells.get(name)!, errors, notAvailable);
    if (outExt === '.xlsx') {
      // A workbook keeps its cells and styles, formulas replaced; CSV input has no cells yet, so every value is written.
      for (const name of names) fillSheet(hf, hf.getSheetId(name)!, workbook.getWorksheet(name)!, cells.get(name)!, inExt === '.csv');
      writeFileAtomically(output, new Uint8Array(await workbook.xlsx.writeBuffer()), force);
    } else {
      const name = sheetName ?? names[0];
      const id = hf.getSheetId(name);
      if (id === undefined) throw new CalcFailure(`No sheet named "${name}"; the workbook has ${names.map((n) => `"${n}"`).join(', ')}.`, 'sheet');
      const { width, height } = hf.getSheetDimensions(id);
      if (width * height > MAX_CELLS) throw new CalcFailure(CALC_MESSAGES.csvTooLarge(name, height, width, MAX_CELLS), 'output');
      writeFileAtomically(
        output,
        hf
          .getSheetValues(id)
          .map((row) => row.map(csvField).join(','))
          .join('\r\n') + '\r\n',
        force,
      );
    }
    return { output, sheets: names, formulas, errors, notAvailable };
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
    if (!input || !output) throw new CalcFailure(USAGE, 'usage');
    write(JSON.stringify(await calcFile(input, output, { sheetName: s >= 0 ? args[s + 1] : undefined, force: args.includes('--force') })) + '\n');
    return 0;
  } catch (e) {
    const field = e instanceof CalcFailure ? e.field : undefined;
    write(JSON.stringify({ error: { kind: 'invalid-input', message: e instanceof Error ? e.message : String(e), field } }) + '\n');
    return 2;
  }
}
