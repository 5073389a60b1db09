/**
 * Messages the worksheet-function layer adds to the core's catalogue (src/chem MESSAGES):
 * things only a spreadsheet can get wrong (a range of the wrong shape, a blank where a
 * value is needed, a row of the user-substance table). Every host-level message lives here.
 */
export const SHEET_MESSAGES = {
  blank: (argument: string, what: string) =>
    `${argument} is blank; give ${what}.`,
  notText: (argument: string, value: unknown) =>
    `${argument} must be text; got ${describe(value)}.`,
  tooFewColumns: (argument: string, columns: number, needed: string) =>
    `${argument} has ${columns} column(s); it needs ${needed}.`,
  emptyRange: (argument: string, what: string) =>
    `${argument} holds no rows with values; give ${what}.`,
  rowContext: (argument: string, row: number, detail: string) =>
    `${argument}, row ${row}: ${detail}`,
  unknownChoice: (argument: string, value: unknown, allowed: readonly string[]) =>
    `${argument}: ${describe(value)} is not one of the choices; allowed: ${allowed.map((a) => `"${a}"`).join(', ')}.`,
  noSuchStep: (argument: string, substance: string, step: unknown, steps: number) =>
    `${argument} is ${describe(step)}, but ${substance} has ${steps} step(s); allowed: whole numbers 1 to ${steps}.`,
  tooManySpecies: (count: number, rows: number) =>
    `The composition has ${count} species, more than the ${rows} rows this table shows; split the composition.`,
  userSubstanceConflict: (name: string, column: string) =>
    `"${name}" is given twice with different ${column}; give the substance's columns once (later rows of the same substance may leave them blank).`,
  badCounterIons: (text: string) =>
    `cannot read the counter-ions "${text}"; write them as "Na+", "2 Na+" or "K+; Cl-".`,
  tooManyRows: (argument: string, rows: number, limit: number) =>
    `${argument} has ${rows} rows; allowed: up to ${limit} rows with values.`,
  recipeTooLong: (rows: number, limit: number) =>
    `The recipe needs ${rows} rows, more than the ${limit} this table shows; print it with the command line instead.`,
  resultLargerThanSpill: (rows: number, columns: number, spillRows: number, spillColumns: number) =>
    `The result has ${rows} × ${columns} cells, more than the ${spillRows} × ${spillColumns} this formula engine sized for it; please report it.`,
  unexpected: (detail: string) =>
    `Unexpected failure (please report it): ${detail}`,
} as const;

function describe(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (value === undefined || value === null) return 'a blank';
  if (Array.isArray(value)) return 'a range';
  return typeof value;
}
