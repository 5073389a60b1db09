/**
 * Formula text before the engine: Excel's forms the engine rejects are rewritten (and then
 * computed as Excel computes them), and a formula that cannot be read is described with a
 * code and a position. Excel's behaviour quoted here is common practice of the program.
 */
import { HyperFormula } from 'hyperformula';
import { createFormulaEngine, registerFormulaFunctions } from '../../src/functions/formulaEngine';
import { engineFormula, excelFormsForEngine, formulaProblem } from '../../src/functions/formulaText';
import { MAX_FORMULA_CHARS, MAX_FORMULA_DEPTH, MAX_FORMULA_OPERATORS } from '../../src/workbook/formulaLimits';

registerFormulaFunctions();
const KNOWN = new Set(HyperFormula.getRegisteredFunctionNames('enGB').map((n) => n.toUpperCase()));

function compute(formula: string): unknown {
  const hf = createFormulaEngine({ S: [[engineFormula(formula)]] });
  try {
    return hf.getCellValue({ sheet: 0, row: 0, col: 0 });
  } finally {
    hf.destroy();
  }
}

describe('Excel forms rewritten for the engine', () => {
  test('an upper-case exponent is read as a number (Excel writes 6.022E+23)', () => {
    expect(excelFormsForEngine('=6.022E+23')).toBe('=6.022e+23');
    expect(excelFormsForEngine('=1E5+2.5E-3*A1')).toBe('=1e5+2.5e-3*A1');
    expect(compute('=6.022E+23')).toBe(6.022e23);
    expect(compute('=2E3/4')).toBe(500);
  });

  test('cell references, names and texts that look like exponents are left alone', () => {
    expect(excelFormsForEngine('=E5+AE1+SUM(B1E)')).toBe('=E5+AE1+SUM(B1E)');
    expect(excelFormsForEngine('="1E5"')).toBe('="1E5"');
    expect(excelFormsForEngine("='Run 1E5'!A1")).toBe("='Run 1E5'!A1");
  });

  test('a doubled quote inside text is one quote, as in Excel', () => {
    expect(excelFormsForEngine('=LEN("a""b")')).toBe('=LEN(("a"&CHAR(34)&"b"))');
    expect(compute('=LEN("a""b")')).toBe(3);
    expect(compute('="say ""hi"""')).toBe('say "hi"');
    expect(compute('=""""')).toBe('"');
    expect(compute('=""&"x"')).toBe('x');
  });

  test("Excel's saved names of PROTON functions are restored too (one function for every host)", () => {
    expect(engineFormula('=_xldudf_PROTON_PKA("tris", 1, 2.5E+1)')).toBe('=PROTON.PKA("tris", 1, 2.5e+1)');
    // Tris pKa at 25 °C, I = 0: 8.072 (Goldberg et al. 2002, the library's value); within 0.01 as the library rounds.
    expect(compute('=_xldudf_PROTON_PKA("tris", 1, 2.5E+1)')).toBeCloseTo(8.072, 2);
  });
});

describe('formulaProblem: what and where, in plain words', () => {
  const problem = (f: string) => formulaProblem(f, KNOWN);

  test('a formula the engine reads has no problem', () => {
    for (const f of ['=1+2', '=SUM(A1:B2)*-1', '=A1<>B1', '=A1>=2', '=PROTON.PKA("tris", 1, 25)', '="a)"&"(b"', "='My sheet'!A1", '=_xlfn.IFERROR(1/0, 2)', '=-(-2)'])
      expect([f, problem(f)]).toEqual([f, undefined]);
  });

  test('an unclosed text, a missing or a stray bracket, named by their character', () => {
    expect(problem('=LEN("abc)')).toMatchObject({ code: 'unclosedText', at: 6 });
    expect(problem('=SUM(1,2')).toMatchObject({ code: 'unclosedBracket', at: 5 });
    expect(problem('=1+2)')).toMatchObject({ code: 'strayBracket', at: 5 });
    expect(problem('=SUM(1,2')!.message).toMatch(/not closed.*character 5.*add "\)"/);
  });

  test('an operator with nothing on one side', () => {
    expect(problem('=1+*2')).toMatchObject({ code: 'nothingAfter', at: 3 });
    expect(problem('=5*')).toMatchObject({ code: 'nothingAfter', at: 3 });
    expect(problem('=SUM(*2)')).toMatchObject({ code: 'nothingBefore', at: 6 });
    expect(problem('=')).toMatchObject({ code: 'emptyFormula' });
  });

  test('a mistyped function name gets the nearest names the engine knows', () => {
    const p = problem('=PROTON.PKAA("tris", 1, 25)');
    expect(p).toMatchObject({ code: 'unknownFunction', at: 2 });
    expect(p!.message).toMatch(/There is no function PROTON\.PKAA .*did you mean PROTON\.PKA/);
    expect(problem('=2*SUMM(A1:A3)')!.message).toMatch(/did you mean .*\bSUM\b/);
  });

  test('the limits: length, nesting and operators', () => {
    expect(problem('=' + '1'.repeat(MAX_FORMULA_CHARS))).toMatchObject({ code: 'tooLong' });
    expect(problem('=' + '('.repeat(MAX_FORMULA_DEPTH + 1) + '1' + ')'.repeat(MAX_FORMULA_DEPTH + 1))).toMatchObject({ code: 'tooDeep' });
    expect(problem('=' + '('.repeat(MAX_FORMULA_DEPTH) + '1' + ')'.repeat(MAX_FORMULA_DEPTH))).toBeUndefined();
    expect(problem('=1' + '+1'.repeat(MAX_FORMULA_OPERATORS + 1))).toMatchObject({ code: 'tooManyOperators' });
  });
});
