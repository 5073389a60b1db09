import { grams, ph, titrantMl } from '../../src/functions/functions';
import { MAX_COMPOSITION_ROWS } from '../../src/functions/composition';
import { errorOf } from './errorOf';

/** Arithmetic on typed numbers is exact to rounding; 1e-9 relative allows the unit factors. */
const SAME = 1e-9;

describe('numbers as people type them', () => {
  const base = grams('NaCl', 150, 1000);

  it.each([
    ['150 mM and 1 L', '150 mM', '1 L'],
    ['150mM and 1000 ml (volume units case-free: no other unit reads the same)', '150mM', '1000 ml'],
    ['0,15 M (decimal comma) and 1000 mL', '0,15 M', '1000 mL'],
    ['150000 µM and 1000 mL', '150000 µM', '1000 mL'],
  ])('%s give the same grams as plain numbers', (_label, concentration, volume) => {
    expect(Math.abs(grams('NaCl', concentration, volume) / base - 1)).toBeLessThan(SAME);
  });

  it('reads "pH 7,4" and "25 °C" and "1 M" for a titrant', () => {
    const typed = titrantMl('tris base', 50, 1000, 'pH 7,4', 'HCl', '1 M', '25 °C');
    const plain = titrantMl('tris base', 50, 1000, 7.4, 'HCl', 1, 25);
    expect(Math.abs(typed / plain - 1)).toBeLessThan(SAME);
  });

  it('reads units in composition amounts', () => {
    expect(
      ph([
        ['tris base', '50 mM'],
        ['HCl', '0.025 M'],
      ]),
    ).toBeCloseTo(
      ph([
        ['tris base', 50],
        ['HCl', 25],
      ]),
      12,
    );
  });

  it.each([
    ['a unit that does not fit', () => grams('NaCl', '150 kg', 1000), 'wrongUnit', 'concentrationMm'],
    ['"m" for a concentration (mM or M? refused, never guessed)', () => grams('NaCl', '5 m', 100), 'ambiguousUnit', 'concentrationMm'],
    ['"mm" for a concentration', () => grams('NaCl', '150mm', 1000), 'ambiguousUnit', 'concentrationMm'],
    ['a thousands separator', () => grams('NaCl', '1,000', 1000), 'ambiguousNumber', 'concentrationMm'],
    ['two commas', () => grams('NaCl', '1,5,0', 1000), 'ambiguousNumber', 'concentrationMm'],
    ['words', () => grams('NaCl', 'lots', 1000), 'notANumber', 'concentrationMm'],
    ['NaN as text', () => grams('NaCl', 'NaN', 1000), 'notANumber', 'concentrationMm'],
    ['Infinity', () => grams('NaCl', Infinity, 1000), 'notFinite', 'concentrationMm'],
    ['a volume of 0 mL', () => grams('NaCl', 150, 0), 'outOfRange', 'volumeMl'],
  ])('refuses %s, naming the argument', (_label, call, code, field) => {
    expect(errorOf(call)).toMatchObject({ kind: 'value', code, field });
  });

  it(`refuses a composition range of 100,000 rows (more than ${MAX_COMPOSITION_ROWS}) with a message, quickly`, () => {
    const huge = Array.from({ length: 100000 }, () => ['NaCl', 1]);
    expect(() => ph(huge)).toThrow(/composition has 100000 rows; allowed: up to 1000/);
  });
});
