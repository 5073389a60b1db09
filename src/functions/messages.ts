/**
 * Messages the worksheet-function layer adds to the core's catalogue (src/chem MESSAGES):
 * things only a spreadsheet can get wrong (a range of the wrong shape, a blank where a
 * value is needed, a row of the user-substance table). Every host-level message lives here.
 */
export const SHEET_MESSAGES = {
  blank: (argument: string, what: string) => `${argument} is blank; give ${what}.`,
  notText: (argument: string, value: unknown) => `${argument} must be text; got ${describe(value)}.`,
  tooFewColumns: (argument: string, columns: number, needed: string) => `${argument} has ${columns} column(s); it needs ${needed}.`,
  emptyRange: (argument: string, what: string) => `${argument} holds no rows with values; give ${what}.`,
  rowContext: (argument: string, row: number, detail: string) => `${argument}, row ${row}: ${detail}`,
  unknownChoice: (argument: string, value: unknown, allowed: readonly string[]) =>
    `${argument}: ${describe(value)} is not one of the choices; allowed: ${allowed.map((a) => `"${a}"`).join(', ')}.`,
  noSuchStep: (argument: string, substance: string, step: unknown, steps: number) =>
    `${argument} is ${describe(step)}, but ${substance} has ${steps} step(s); allowed: whole numbers 1 to ${steps}.`,
  tooManySpecies: (count: number, rows: number) => `The composition has ${count} species, more than the ${rows} rows this table shows; split the composition.`,
  userSubstanceConflict: (name: string, column: string) =>
    `"${name}" is given twice with different ${column}; give the substance's columns once (later rows of the same substance may leave them blank).`,
  badCounterIons: (text: string) => `cannot read the counter-ions "${text}"; write them as "Na+", "2 Na+" or "K+; Cl-".`,
  tooManyRows: (argument: string, rows: number, limit: number) => `${argument} has ${rows} rows; allowed: up to ${limit} rows with values.`,
  recipeTooLong: (rows: number, limit: number) => `The recipe needs ${rows} rows, more than the ${limit} this table shows; print it with the command line instead.`,
  resultLargerThanSpill: (rows: number, columns: number, spillRows: number, spillColumns: number) =>
    `The result has ${rows} × ${columns} cells, more than the ${spillRows} × ${spillColumns} this formula engine sized for it; please report it.`,
  waitingForReading: () => 'Enter the titrant added so far and what the meter reads now; the next amount appears here.',
  unexpected: (detail: string) => `Unexpected failure (please report it): ${detail}`,
} as const;

function describe(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (value === undefined || value === null) return 'a blank';
  if (Array.isArray(value)) return 'a range';
  return typeof value;
}

/** Messages about a formula's text: what a host says when a formula cannot be read, in plain words. */
export const FORMULA_MESSAGES = {
  unclosedText: (at: number) => `The text that opens with the quote at character ${at} is never closed: add a closing ".`,
  unclosedBracket: (at: number, open: number) => `${open === 1 ? 'A bracket is' : `${open} brackets are`} opened but not closed (the last one opened at character ${at}): add ")".`,
  strayBracket: (at: number) => `The ")" at character ${at} closes a bracket that was never opened.`,
  nothingAfter: (operator: string, at: number) => `The "${operator}" at character ${at} has nothing after it: give a value, a cell or a function there.`,
  nothingBefore: (operator: string, at: number) => `The "${operator}" at character ${at} has nothing before it: give a value, a cell or a function there.`,
  unknownFunction: (name: string, at: number, suggestions: readonly string[]) =>
    `There is no function ${name} (character ${at})${suggestions.length > 0 ? `; did you mean ${suggestions.join(' or ')}?` : '; see the function reference for the names.'}`,
  emptyFormula: () => 'The formula is empty: write something after "=".',
  unreadable: () => 'This formula cannot be read: check its brackets, quotes, the operators between values and the commas between arguments.',
  tooLong: (length: number, limit: number) => `The formula has ${length.toLocaleString('en-US')} characters; a formula may have up to ${limit.toLocaleString('en-US')}.`,
  tooDeep: (depth: number, limit: number) => `The formula nests brackets ${depth} levels deep; a formula may nest up to ${limit} levels.`,
  tooManyOperators: (operators: number, limit: number) =>
    `The formula has ${operators.toLocaleString('en-US')} operators; up to ${limit} can be computed in one formula (split it over several cells).`,
} as const;
