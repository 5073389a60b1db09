/** Formula reading and molar masses (IUPAC CIAAW 2021 standard atomic weights). */
import { ChemError } from '../../../src/chem/errors';
import { elementCounts, molarMassOf } from '../../../src/chem/library/formula';

/** Molar masses below are hand sums of CIAAW 2021 values; 1e-9 g/mol covers float rounding only. */
const SUM_TOLERANCE = 1e-9;

describe('elementCounts', () => {
  it('reads a hydrate written with a middle dot: Na2HPO4·7H2O', () => {
    expect(elementCounts('Na2HPO4·7H2O')).toEqual({ Na: 2, H: 15, P: 1, O: 11 });
  });

  it('reads the same hydrate written with * and with •', () => {
    expect(elementCounts('Na2HPO4*7H2O')).toEqual(elementCounts('Na2HPO4·7H2O'));
    expect(elementCounts('Na2HPO4•7H2O')).toEqual(elementCounts('Na2HPO4·7H2O'));
  });

  it('reads brackets with a count: (NH4)2SO4', () => {
    expect(elementCounts('(NH4)2SO4')).toEqual({ N: 2, H: 8, S: 1, O: 4 });
  });

  it('reads an addition compound: C4H11NO3·HCl (tris hydrochloride)', () => {
    expect(elementCounts('C4H11NO3·HCl')).toEqual({ C: 4, H: 12, N: 1, O: 3, Cl: 1 });
  });

  it('reads decimal counts for hemi-salts: C8H17.5N2Na0.5O4S', () => {
    expect(elementCounts('C8H17.5N2Na0.5O4S')).toEqual({ C: 8, H: 17.5, N: 2, Na: 0.5, O: 4, S: 1 });
  });

  it('reads a leading multiplier on the first part: 2H2O', () => {
    expect(elementCounts('2H2O')).toEqual({ H: 4, O: 2 });
  });

  it.each([
    ['Xx2O', 'unknown element'],
    ['Na2(PO4', 'unclosed'],
    ['Na2HPO4·', 'expected an element'],
    ['NaCl!', 'unexpected'],
    ['', 'missing'],
  ])('refuses %p with a typed error (%s)', (formula, words) => {
    expect(() => elementCounts(formula)).toThrow(ChemError);
    expect(() => elementCounts(formula)).toThrow(new RegExp(words));
  });
});

describe('molarMassOf', () => {
  it('water: 2 × 1.008 + 15.999 = 18.015 g/mol (CIAAW 2021)', () => {
    expect(Math.abs(molarMassOf('H2O') - 18.015)).toBeLessThan(SUM_TOLERANCE);
  });

  it('borax Na2B4O7·10H2O: 381.363 g/mol (CIAAW 2021 hand sum)', () => {
    expect(Math.abs(molarMassOf('Na2B4O7·10H2O') - (2 * 22.99 + 4 * 10.81 + 7 * 15.999 + 10 * 18.015))).toBeLessThan(SUM_TOLERANCE);
  });
});
