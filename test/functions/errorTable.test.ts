/**
 * README's error table says which spreadsheet error each kind of failure gives; this reads
 * the table and checks each row against what the function layer does (errors.ts), with one
 * real failure of each kind where one can be provoked through a worksheet function.
 */
import { readFileSync } from 'fs';
import { join } from 'path';
import { ChemError, ChemErrorKind } from '../../src/chem';
import { SheetError, toSheetError } from '../../src/functions/errors';
import { grams, ph, titrantMl } from '../../src/functions/functions';

const README = readFileSync(join(__dirname, '../../README.md'), 'utf8');

/** The "in a cell" column of the README's error table, by the row's kind. */
function cellColumn(): Map<string, string> {
  const lines = README.slice(README.indexOf('## Errors')).split('\n');
  const header = lines.findIndex((l) => l.startsWith('| kind |'));
  const table = new Map<string, string>();
  for (const row of lines.slice(header + 2)) {
    if (!row.startsWith('|')) break;
    const cells = row.split('|').map((c) => c.trim());
    table.set(cells[1], cells[3]);
  }
  return table;
}

function thrown(call: () => unknown): SheetError {
  try {
    call();
  } catch (e) {
    return toSheetError(e);
  }
  throw new Error('expected a throw');
}

const CODE = { value: '#VALUE!', na: '#N/A' } as const;

/** A failure of each kind, as a worksheet function gives it (or, where none can be provoked, as the core throws it). */
const EXAMPLES: Record<string, () => SheetError> = {
  'invalid input': () => thrown(() => ph([['tris base', 50]], 'warm')),
  'unknown name': () => thrown(() => grams('unobtainium', 1, 1)),
  'infeasible target': () => thrown(() => titrantMl('tris base', 50, 1000, 11.5, 'HCl', 1)),
  'no convergence': () => toSheetError(new ChemError('no-convergence' satisfies ChemErrorKind, 'noConvergence', 'the pH iteration ran out of steps')),
  'unexpected failure': () => toSheetError(new TypeError('x is undefined')),
};

describe("README's error table matches the code", () => {
  const table = cellColumn();

  test('the table has a row for every kind of failure, and no other', () => {
    expect([...table.keys()].sort()).toEqual(Object.keys(EXAMPLES).sort());
  });

  test.each(Object.entries(EXAMPLES))('%s: the cell error the README names, with a message', (kind, example) => {
    const error = example();
    expect(error.message.length).toBeGreaterThan(10);
    expect(table.get(kind)).toMatch(new RegExp(`^\`${CODE[error.kind].replace(/[!/]/g, '\\$&')}\``));
  });

  test('every core error kind is in the table (a new kind fails here until documented)', () => {
    const kinds: Record<ChemErrorKind, string> = { 'invalid-input': 'invalid input', 'infeasible-target': 'infeasible target', 'no-convergence': 'no convergence' };
    for (const row of Object.values(kinds)) expect(table.has(row)).toBe(true);
  });
});
