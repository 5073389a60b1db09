/**
 * Excel's naming rules for custom functions (Microsoft, "Custom functions naming and
 * localization"; the rule list is src/functions/namingRules.ts), checked on examples from
 * that page and on every function of the catalog.
 */
import { CATALOG } from '../../src/functions/catalog';
import { isCellReference, isExcel4MacroName, namingProblems } from '../../src/functions/namingRules';

describe('Excel naming rules (Microsoft, custom functions naming)', () => {
  test('a name shorter than three characters is refused: the old PH', () => {
    expect(namingProblems('PH', 'PH')).toEqual(expect.arrayContaining([expect.stringMatching(/fewer than 3 characters/)]));
  });

  test('an id with other characters than A–Z, 0–9, _ and . or not starting with a letter is refused', () => {
    expect(namingProblems('TITRANT-ML', 'TITRANT.ML')).not.toEqual([]);
    expect(namingProblems('1PKA', 'PKA')).not.toEqual([]);
    expect(namingProblems('pka', 'PKA')).not.toEqual([]);
  });

  test('cell references A1…XFD1048576 and R1C1…R1048576C16384 are recognised, and only those', () => {
    for (const ref of ['A1', 'XFD1048576', 'PKA1', 'abc12', 'R1C1', 'RC', 'R1048576C16384']) expect({ ref, cell: isCellReference(ref) }).toEqual({ ref, cell: true });
    for (const text of ['XFE1', 'A0', 'A1048577', 'ABCD1', 'R1048577C1', 'R1C16385', 'PKA', 'PH.OF']) expect({ text, cell: isCellReference(text) }).toEqual({ text, cell: false });
    expect(namingProblems('PKA1', 'PKA')).toEqual(['id PKA1 reads as a cell reference']);
  });

  test('Excel 4.0 macro functions (the examples RUN and ECHO, and GET.CELL) are refused, periods and case ignored', () => {
    for (const name of ['RUN', 'ECHO', 'GET.CELL', 'getcell', 'FORMULA.ARRAY']) expect({ name, macro: isExcel4MacroName(name) }).toEqual({ name, macro: true });
    expect(isExcel4MacroName('RECIPE')).toBe(false);
  });

  test.each(CATALOG.map((f) => [f.id, f] as const))('%s follows every rule', (_id, fn) => {
    expect(namingProblems(fn.id, fn.name)).toEqual([]);
  });
});
