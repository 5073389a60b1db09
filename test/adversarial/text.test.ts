/**
 * Adversarial text: every parser reads in time linear in its input, and a hostile text
 * gets a clear error or the right answer. Each case is sized so that the old quadratic
 * code took seconds to minutes; the bound is far above the linear time.
 */
import { ChemError } from '../../src/chem';
import { closestNames, editDistance, elementCounts, nameKey } from '../../src/chem/library';
import { MAX_FORMULA_DEPTH } from '../../src/chem/library/formula';
import { SheetError } from '../../src/functions/errors';
import { toEngineFormula } from '../../src/functions/formulaEngine';
import { forms, ph, pka } from '../../src/functions/functions';
import { libraryFor } from '../../src/functions/userRange';

/** Linear work on these inputs takes a few ms here; a quadratic one took 0.1–50 s. 400 ms leaves room for a loaded 2-core machine. */
const LINEAR_BOUND_MS = 400;

function timed<T>(fn: () => T): { value?: T; error?: unknown; ms: number } {
  const start = performance.now();
  try {
    const value = fn();
    return { value, ms: performance.now() - start };
  } catch (error) {
    return { error, ms: performance.now() - start };
  }
}

function expectClearError(error: unknown, pattern: RegExp): void {
  expect(error instanceof SheetError || error instanceof ChemError).toBe(true);
  expect((error as Error).message).toMatch(pattern);
}

describe('formula conversion for the engine (saved custom-function names)', () => {
  it.each([
    ['a million letters', 'A'.repeat(1_000_000)],
    ['100 KB of letters before a saved name', `${'A'.repeat(100_000)}_xldudf_PROTON_PH(A1:B2)`],
    ['repeated saved names without a bracket', '_xldudf_'.repeat(50_000)],
    ['100 KB of quotes and bangs', "'!".repeat(50_000)],
    ['a saved name followed by 100 KB of blanks', `_xldudf_PROTON_PH${' '.repeat(100_000)}x`],
  ])('%s: linear, text unchanged where nothing is saved', (_label, formula) => {
    const { value, ms } = timed(() => toEngineFormula(formula));
    expect(ms).toBeLessThan(LINEAR_BOUND_MS);
    expect(value!.length).toBeGreaterThan(0);
  });

  it('still renames saved names, behind each kind of external reference', () => {
    expect(toEngineFormula('[1]!_xldudf_PROTON_PH_OF(A1:B2)+Other.xla!_xldudf_PROTON_GRAMS("NaCl",1,1)+\'Other add-in.xlam\'!_xldudf_PROTON_PKA("tris")')).toBe(
      'PROTON.PH.OF(A1:B2)+PROTON.GRAMS("NaCl",1,1)+PROTON.PKA("tris")',
    );
    expect(toEngineFormula('_xlfn.XLOOKUP(1,A:A,B:B)+_xldudf_NOT_OURS(1)')).toBe('XLOOKUP(1,A:A,B:B)+_xldudf_NOT_OURS(1)');
  });
});

describe('"did you mean" on long names', () => {
  it.each([
    ['300 letters', 'x'.repeat(300)],
    ['32,767 letters (a full cell)', 'tris'.repeat(8192).slice(0, 32767)],
    ['32,767 non-ASCII letters', 'трис'.repeat(8192).slice(0, 32767)],
  ])('%s: answers at once, with no suggestion search', (_label, name) => {
    const { error, ms } = timed(() => ph([[name, 50]]));
    expect(ms).toBeLessThan(LINEAR_BOUND_MS);
    expectClearError(error, /is not in the substance library/);
  });

  it('a name of 16,000 blanks, an x and 16,000 blanks more is keyed in linear time, and blanks never change a key', () => {
    const { value, ms } = timed(() => nameKey(`Na2HPO4${' '.repeat(16_000)}x${' '.repeat(16_000)}7H2O`));
    expect(ms).toBeLessThan(LINEAR_BOUND_MS);
    expect(value).toBe(nameKey('Na2HPO4·7H2O'));
    expect(nameKey('tris\t\tbase')).toBe(nameKey('tris base'));
  });

  it('a bounded edit distance agrees with the full one up to the bound', () => {
    expect(editDistance('hepes', 'hpees')).toBe(1);
    expect(editDistance('hepes', 'hpees', 0)).toBe(1);
    expect(editDistance('tris base', 'tris baes', 2)).toBe(1);
    expect(editDistance('abcdefgh', 'zzzzzzzz', 2)).toBe(3);
    expect(editDistance('a'.repeat(30_000), 'b', 2)).toBe(3);
  });

  it('near misses are still found (the bound keeps the answers)', () => {
    const names = new Map(['HEPES', 'HEPPS', 'MOPS', 'tris base'].map((n) => [nameKey(n), n]));
    expect(closestNames(nameKey('HEPPES'), names)).toEqual(['HEPES', 'HEPPS']);
    expect(closestNames(nameKey('tris baes'), names)).toEqual(['tris base']);
  });
});

describe('user-substance columns', () => {
  const row = (counterIons: unknown, formula: unknown = '', pKa: unknown = '7') => [
    ['MyAmine', 0, pKa, '', '', 'MyAmine salt', formula === '' ? 100 : '', counterIons, '', formula],
  ];

  it.each([
    ['20,000 blanks inside', `Na${' '.repeat(20_000)}x`],
    ['20,000 digits after a name', `Na${'1'.repeat(20_000)}x`],
    ['20,000 blanks after a count', `2${' '.repeat(20_000)}x`],
    ['20,000 signs', `Na${'+'.repeat(20_000)}x`],
  ])('counter-ions with %s: a clear error at once', (_label, text) => {
    const { error, ms } = timed(() => libraryFor(row(text)));
    expect(ms).toBeLessThan(LINEAR_BOUND_MS);
    expectClearError(error, /counter-ions/);
  });

  it('counter-ions as people write them still read', () => {
    expect(forms(row('2 Na+', '', '7; 9')).flat()).toContain('MyAmine salt');
    expect(forms(row('Na+ 1')).flat()).toContain('MyAmine salt');
  });

  it.each([
    ['20,000 opening brackets', '('.repeat(20_000)],
    [`${MAX_FORMULA_DEPTH + 1} nested groups`, `${'('.repeat(MAX_FORMULA_DEPTH + 1)}H${')'.repeat(MAX_FORMULA_DEPTH + 1)}`],
    ['100,000 carbons then a stray character', `${'C'.repeat(100_000)}?`],
  ])('a formula of %s: a clear error, never a stack overflow', (_label, formula) => {
    const { error, ms } = timed(() => libraryFor(row('', formula)));
    expect(ms).toBeLessThan(LINEAR_BOUND_MS);
    expectClearError(error, /formula/);
  });

  it(`a formula nested ${MAX_FORMULA_DEPTH} deep still reads`, () => {
    expect(elementCounts(`${'('.repeat(MAX_FORMULA_DEPTH)}H${')2'.repeat(MAX_FORMULA_DEPTH)}`)).toEqual({ H: 2 ** MAX_FORMULA_DEPTH });
  });

  it('a formula of 100,000 elements is read in linear time', () => {
    const { value, ms } = timed(() => elementCounts('CH2'.repeat(100_000)));
    expect(ms).toBeLessThan(LINEAR_BOUND_MS);
    expect(value).toEqual({ C: 100_000, H: 200_000 });
  });

  it('a pKa list of 20,000 entries is refused with the allowed number of steps', () => {
    const { error, ms } = timed(() => pka('MyAmine', 1, 25, 0, undefined, row('', '', '7;'.repeat(20_000))));
    expect(ms).toBeLessThan(LINEAR_BOUND_MS);
    expectClearError(error, /up to 8/);
    expect(error).toMatchObject({ code: 'listTooLong', allowed: 'up to 8 items' });
  });
});
