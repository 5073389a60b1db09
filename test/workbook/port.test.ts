import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { PreviewWorkbook } from '../../src/preview/workbook';
import { literal } from '../../src/workbook/port';
import { PreviewAdapter } from '../../src/workbook/previewAdapter';

describe('text from user input is written as text, never as a formula', () => {
  it.each(['=HYPERLINK("http://example.invalid","x")', '+1+1', '-2+3', '@SUM(A1)', '\t=1', "'My substances'!A2:J20"])('%p gets the text mark', (text) => {
    expect(literal(text)).toBe(`'${text}`);
  });

  it('leaves ordinary text, numbers, booleans and blanks alone', () => {
    expect(literal('HEPES')).toBe('HEPES');
    expect(literal(-2)).toBe(-2);
    expect(literal(true)).toBe(true);
    expect(literal(null)).toBe(null);
  });

  it('the preview adapter stores such a value as the text typed, not its result', async () => {
    const book = new PreviewWorkbook(createFormulaEngine({ Sheet1: [[null]] }));
    const port = new PreviewAdapter(book, () => ({ sheet: 'Sheet1', range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }), () => undefined);
    await port.writeTable('Sheet1', { row: 0, col: 0, cells: [[{ value: '=1+1' }, { value: '@SUM(1)' }, { formula: '=1+1' }]] });
    expect(book.value('Sheet1', 0, 0)).toBe('=1+1');
    expect(book.formula('Sheet1', 0, 0)).toBeUndefined();
    expect(book.value('Sheet1', 0, 1)).toBe('@SUM(1)');
    expect(book.value('Sheet1', 0, 2)).toBe(2);
  });
});
