/**
 * Messages of the calc command: files it will not read or write, and the limits of what it
 * evaluates (see calcLimits.ts). Every calc message lives here.
 */
export const CALC_MESSAGES = {
  outputIsInput: (output: string, input: string) => `The output ${output} is the input file ${input} (the same file under another name); write to another file.`,
  outputExists: (output: string) => `${output} already exists; give another output file, or add --force to replace it.`,
  outputIsDirectory: (output: string) => `${output} is a directory; give an output file name ending in .xlsx or .csv.`,
  cannotWrite: (output: string, reason: string) => `Could not write ${output}: ${reason}. Nothing was replaced.`,
  cannotRead: (input: string, reason: string) => `Could not read ${input}: ${reason}.`,
  fileTooLarge: (input: string, bytes: number, limit: number) => `${input} is ${mb(bytes)}; calc reads files up to ${mb(limit)}.`,
  notAWorkbook: (input: string, reason: string) => `${input} is not a readable .xlsx workbook (${reason}).`,
  unpackedTooLarge: (input: string, part: string, limit: number) => `${input}: the part ${part} unpacks to more than ${mb(limit)}; calc unpacks up to ${mb(limit)} per workbook.`,
  tooManyCells: (sheet: string, cells: number, limit: number) =>
    `Sheet "${sheet}" brings the workbook to more than ${count(limit)} cells with content (at least ${count(cells)}); calc evaluates up to ${count(limit)} cells per workbook.`,
  cellOutsideSheet: (sheet: string, address: string) => `Sheet "${sheet}" has a cell at ${address}, beyond the last cell of a worksheet (XFD1048576).`,
  areaTooLarge: (sheet: string, what: string, range: string, cells: number, limit: number) =>
    `Sheet "${sheet}": the ${what} over ${range} covers ${count(cells)} cells; calc reads data-validation rules and array formulas covering up to ${count(limit)} cells in all.`,
  mergedTooLarge: (sheet: string, range: string, cells: number, limit: number) =>
    `Sheet "${sheet}": the merged range ${range} covers ${count(cells)} cells; calc reads merged ranges covering up to ${count(limit)} cells in all.`,
  textTooLong: (where: string, length: number, limit: number) => `${where}: a text of ${count(length)} characters; a cell holds up to ${count(limit)} characters.`,
  formulaTooLong: (where: string, length: number, limit: number) => `${where}: a formula of ${count(length)} characters; a formula may have up to ${count(limit)} characters.`,
  formulaTooDeep: (where: string, depth: number, limit: number) => `${where}: a formula nested ${count(depth)} levels deep; a formula may nest up to ${limit} levels.`,
  formulaTooManyOperators: (where: string, operators: number, limit: number) =>
    `${where}: a formula with ${count(operators)} operators; calc evaluates formulas with up to ${count(limit)} (split it over several cells).`,
  rangesTooLarge: (where: string, range: string, cells: number, limit: number) =>
    `${where}: the range ${range} (${count(cells)} cells) brings the cells read through ranges past ${count(limit)}, what calc evaluates; refer to whole columns as A:A, which costs nothing.`,
  sheetOutsidePackage: (input: string, sheet: string, target: string) =>
    `${input}: the sheet "${sheet}" points to ${target}, outside the workbook's package; the workbook is damaged or not made by a spreadsheet program.`,
  sheetMissing: (input: string, sheet: string, target: string) => `${input}: the sheet "${sheet}" points to ${target}, which the package does not hold; the workbook is damaged.`,
  sheetUnreadable: (input: string, sheet: string, part: string) =>
    `${input}: the sheet "${sheet}" is stored as ${part}; calc reads worksheets stored as xl/worksheets/sheet<number>.xml (save the workbook again from a spreadsheet program).`,
  sheetNotRead: (input: string, sheets: readonly string[]) => `${input}: the sheet(s) ${sheets.map((s) => `"${s}"`).join(', ')} could not be read; nothing was written.`,
  noSheets: (input: string) => `${input} holds no worksheets.`,
  csvTooLarge: (sheet: string, rows: number, columns: number, limit: number) =>
    `Sheet "${sheet}" spans ${count(rows)} rows by ${count(columns)} columns; calc writes CSV of up to ${count(limit)} cells (write .xlsx instead).`,
} as const;

function mb(bytes: number): string {
  return `${(bytes / 1048576).toFixed(bytes < 1048576 ? 2 : 0)} MB`;
}

function count(n: number): string {
  return n.toLocaleString('en-US');
}
