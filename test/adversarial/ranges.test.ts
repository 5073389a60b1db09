/**
 * Adversarial ranges: every range argument is capped like a composition (1,000 rows), and
 * a whole column passed by mistake is refused at once, before anything in it is read.
 */
import { MAX_COMPOSITION_ROWS } from '../../src/functions/composition';
import { SheetError } from '../../src/functions/errors';
import { forms, ph, recipe, recipeRow, titrantMl } from '../../src/functions/functions';

/** Refusing by row count reads nothing; 200 ms is far above that and far below the seconds the old code took. */
const REFUSAL_BOUND_MS = 200;

const column = (rows: number, row: unknown[]) => Array.from({ length: rows }, () => row);
const salts = column(100_000, ['NaCl', 1]);
const users = Array.from({ length: 100_000 }, (_, i) => [`Amine${i}`, 1, '8', '', '', '', 100]);

function refusal(fn: () => unknown): SheetError {
  const start = performance.now();
  let caught: unknown;
  try {
    const value = fn();
    // RECIPE and RECIPE.ROW may return their error as a cell value.
    caught = value instanceof SheetError ? value : undefined;
  } catch (e) {
    caught = e;
  }
  expect(performance.now() - start).toBeLessThan(REFUSAL_BOUND_MS);
  expect(caught).toBeInstanceOf(SheetError);
  return caught as SheetError;
}

describe('range arguments are capped at 1,000 rows', () => {
  it.each([
    ['RECIPE.ROW salts', () => recipeRow('HEPES', 7.4, 25, 500, undefined, salts)],
    ['RECIPE salts', () => recipe('HEPES', 7.4, 25, 500, undefined, salts)],
    ['TITRANT.ML salts', () => titrantMl('tris base', 50, 1000, 7.4, 'HCl', 1, 25, undefined, salts)],
  ])('%s: 100,000 rows refused, naming the argument and the limit', (_label, call) => {
    expect(refusal(call).message).toBe(`salts has 100000 rows; allowed: up to ${MAX_COMPOSITION_ROWS} rows with values.`);
  });

  it.each([
    ['FORMS', () => forms(users)],
    ['PH', () => ph([['tris base', 50]], 25, undefined, users)],
  ])('%s userSubstances: 100,000 rows refused', (_label, call) => {
    expect(refusal(call).message).toMatch(/^userSubstances has 100000 rows; allowed: up to 1000/);
  });

  it('1,000 rows are still read (the cap is not below it)', () => {
    const nearlyFull = [...column(999, [null, null]), ['NaCl', 150]];
    expect(titrantMl('tris base', 50, 1000, 7.4, 'HCl', 1, 25, undefined, column(999, ['NaCl', 0.15]))).toBeGreaterThan(0);
    expect(typeof recipeRow('HEPES', 7.4, 25, 500, undefined, nearlyFull)[0][0]).toBe('number');
  });
});
