/**
 * Adversarial worksheet-function arguments: every text argument given a full cell of text
 * (32,767 characters), non-ASCII, control characters or formula-like text; every range
 * argument a whole column. Each call must end at once in a clear error (a SheetError or
 * ChemError with a message naming the argument), never an exception of another kind.
 */
import { ChemError } from '../../src/chem';
import { SheetError } from '../../src/functions/errors';
import {
  capacityOf,
  forms,
  grams,
  ionicStrengthMm,
  osmolarityIdeal,
  ph,
  phAtTemperature,
  phDiluted,
  pka,
  recipe,
  recipeRow,
  species,
  substances,
  titrantMl,
  warnings,
} from '../../src/functions/functions';

/** Each of these calls is refused after reading a little of its input; 300 ms leaves room for a loaded machine (the old name search took 7 s). */
const CALL_BOUND_MS = 300;

const FULL_CELL = 'x'.repeat(32_767);
const HOSTILE_TEXTS: [string, string][] = [
  ['a full cell of letters', FULL_CELL],
  ['a full cell of non-ASCII letters', 'ж'.repeat(32_767)],
  ['a full cell of blanks then a letter', `${' '.repeat(32_766)}x`],
  ['control characters', '\u0000\u0001\u0007\u001b[31m'],
  ['a formula', "=cmd|' /C calc'!A0"],
  ['a lone surrogate', '\ud800'],
  ['right-to-left marks', '\u202eesab sirt'],
];

function outcome(call: () => unknown): { value?: unknown; error?: unknown; ms: number } {
  const start = performance.now();
  try {
    const value = call();
    return { value, ms: performance.now() - start };
  } catch (error) {
    return { error, ms: performance.now() - start };
  }
}

/** A clear refusal: a typed error with a message, thrown or (RECIPE, RECIPE.ROW) returned as the result. */
function expectRefused(call: () => unknown): void {
  const { value, error, ms } = outcome(call);
  const refusal = error ?? (value instanceof SheetError ? value : undefined);
  expect(refusal instanceof SheetError || refusal instanceof ChemError).toBe(true);
  expect((refusal as Error).message.length).toBeGreaterThan(10);
  expect(ms).toBeLessThan(CALL_BOUND_MS);
}

const composition = [['tris base', 50]];

describe.each(HOSTILE_TEXTS)('text arguments given %s', (_label, text) => {
  it.each([
    ['PH (a name in the composition)', () => ph([[text, 50]])],
    ['PH (an amount)', () => ph([['tris base', text]])],
    ['PH (temperature)', () => ph(composition, text)],
    ['PH (activity model)', () => ph(composition, 25, text)],
    ['TITRANT.ML (form)', () => titrantMl(text, 50, 1000, 7.4, 'HCl', 1)],
    ['TITRANT.ML (titrant)', () => titrantMl('tris base', 50, 1000, 7.4, text, 1)],
    ['CAPACITY (measure)', () => capacityOf(composition, text)],
    ['PH.DILUTED (factor)', () => phDiluted(composition, text)],
    ['PH.AT.TEMPERATURE (temperature)', () => phAtTemperature(composition, text)],
    ['PKA (substance)', () => pka(text)],
    ['PKA (step)', () => pka('phosphate', text)],
    ['GRAMS (form)', () => grams(text, 50, 100)],
    ['GRAMS (purity)', () => grams('NaCl', 50, 100, text)],
    ['IONIC.STRENGTH.MM', () => ionicStrengthMm([[text, 1]])],
    ['OSMOLARITY.IDEAL', () => osmolarityIdeal([[text, 1]])],
    ['WARNINGS', () => warnings([[text, 1]])],
    ['SPECIES', () => species([[text, 1]])],
    ['RECIPE.ROW (buffer)', () => recipeRow(text, 7.4, 25, 500)],
    ['RECIPE.ROW (form option)', () => recipeRow('HEPES', 7.4, 25, 500, undefined, undefined, [['form', text]])],
    ['RECIPE.ROW (option name)', () => recipeRow('HEPES', 7.4, 25, 500, undefined, undefined, [[text, 'x']])],
    ['RECIPE (titrant option)', () => recipe('HEPES', 7.4, 25, 500, undefined, undefined, [['titrant', text]])],
    ['user substance name in FORMS (a form with no molar mass)', () => forms([[text, 0, '7']])],
  ])('%s: a clear error at once', (_label2, call) => {
    expectRefused(call);
  });
});

describe('whole columns and rows passed as ranges', () => {
  const column = Array.from({ length: 1_048_576 }, () => [null, null]);
  const wideRow = [Array.from({ length: 16_384 }, () => 'NaCl')];

  it.each([
    ['PH composition', () => ph(column)],
    ['SPECIES composition', () => species(column)],
    ['TITRANT.ML salts', () => titrantMl('tris base', 50, 1000, 7.4, 'HCl', 1, 25, undefined, column)],
    ['RECIPE.ROW salts', () => recipeRow('HEPES', 7.4, 25, 500, undefined, column)],
    ['SUBSTANCES user substances', () => substances(column)],
    ['PKA user substances', () => pka('tris', 1, 25, 0, undefined, column)],
  ])('%s: an empty whole column (1,048,576 rows) is refused at once', (_label, call) => {
    expectRefused(call);
  });

  it('a composition one row and 16,384 columns wide: read as one name and amount, at once', () => {
    const { value, error, ms } = outcome(() => ph(wideRow));
    expect(ms).toBeLessThan(CALL_BOUND_MS);
    expect(error ?? value).toBeDefined();
    if (error) expect(error instanceof SheetError || error instanceof ChemError).toBe(true);
  });
});
