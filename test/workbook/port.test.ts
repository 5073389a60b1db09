import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { PreviewWorkbook } from '../../src/preview/workbook';
import { literal, parseRangeText, qualifiedAddress } from '../../src/workbook/port';
import { PreviewAdapter } from '../../src/workbook/previewAdapter';

/** Generous bound for two linear scans of a million characters (about 5 ms here); a quadratic scan takes minutes. */
const LINEAR_BOUND_MS = 500;

describe('text from user input is written as text, never as a formula', () => {
  it.each([
    '=HYPERLINK("http://example.invalid","x")',
    '+1+1',
    '-2+3',
    '@SUM(A1)',
    '\t=1',
    "'My substances'!A2:J20",
    '\n=1+1',
    '\r=1+1',
    '\tSUM(A1)',
    '＝1+1',
    '＋1',
    '－2',
    '＠SUM(A1)',
    ' =1+1',
    '   @SUM(A1)',
    '\u3000＝1',
    ' \t=1',
  ])('%p gets the text mark', (text) => {
    expect(literal(text)).toBe(`'${text}`);
  });

  it('leaves ordinary text, numbers, booleans and blanks alone', () => {
    expect(literal('HEPES')).toBe('HEPES');
    expect(literal(' HEPES')).toBe(' HEPES');
    expect(literal('pH 7.4 = target')).toBe('pH 7.4 = target');
    expect(literal('Na+')).toBe('Na+');
    expect(literal(-2)).toBe(-2);
    expect(literal(true)).toBe(true);
    expect(literal(null)).toBe(null);
  });

  it('looks at the start only, in time linear in the text (a million blanks then a letter)', () => {
    const text = `${' '.repeat(1_000_000)}x`;
    const start = performance.now();
    expect(literal(text)).toBe(text);
    expect(literal(`${' '.repeat(1_000_000)}=1`)).toBe(`' ${' '.repeat(999_999)}=1`);
    expect(performance.now() - start).toBeLessThan(LINEAR_BOUND_MS);
  });

  it('the preview adapter stores such a value as the text typed, not its result', async () => {
    const book = new PreviewWorkbook(createFormulaEngine({ Sheet1: [[null]] }));
    const port = new PreviewAdapter(
      book,
      () => ({ sheet: 'Sheet1', range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }),
      () => undefined,
    );
    await port.writeTable('Sheet1', { row: 0, col: 0, cells: [[{ value: '=1+1' }, { value: '@SUM(1)' }, { formula: '=1+1' }]] });
    expect(book.value('Sheet1', 0, 0)).toBe('=1+1');
    expect(book.formula('Sheet1', 0, 0)).toBeUndefined();
    expect(book.value('Sheet1', 0, 1)).toBe('@SUM(1)');
    expect(book.value('Sheet1', 0, 2)).toBe(2);
  });
});

describe('typed range references', () => {
  it.each([
    ["'My substances'!A2:J20", { sheet: 'My substances', range: { row: 1, col: 0, rowCount: 19, colCount: 10 } }],
    ['Sheet2!$A$2:$J$20', { sheet: 'Sheet2', range: { row: 1, col: 0, rowCount: 19, colCount: 10 } }],
    ['B3:D10', { range: { row: 2, col: 1, rowCount: 8, colCount: 3 } }],
    ["'Bob''s bench'!AA1", { sheet: "Bob's bench", range: { row: 0, col: 26, rowCount: 1, colCount: 1 } }],
    ['D10:B3', { range: { row: 2, col: 1, rowCount: 8, colCount: 3 } }],
  ])('%p reads as sheet and corners', (text, expected) => {
    expect(parseRangeText(text)).toEqual(expected);
  });

  it.each(['', 'My substances!A2:J20', 'A0:B2', '=A1:B2', 'A1:B2:C3', 'HEPES'])('%p is not a range', (text) => {
    expect(parseRangeText(text)).toBeNull();
  });

  it('writes a sheet-qualified address back, quoting the sheet and doubling its apostrophes', () => {
    expect(qualifiedAddress("Bob's bench", { row: 1, col: 0, rowCount: 19, colCount: 10 })).toBe("'Bob''s bench'!A2:J20");
  });
});
