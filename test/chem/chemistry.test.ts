/**
 * The chemistry of a composition at its temperature, computed once and found again
 * (chemistryOf / prepareWith): the same numbers as a fresh computation, a new entry for
 * anything that changes the constants, and the same faults reported as before.
 */
import { ChemError, Composition, solvePh } from '../../src/chem';
import { chemistryOf, prepare, prepareWith, systemAt } from '../../src/chem/composition';
import { pKaAt } from '../../src/chem/vantHoff';
import { PHOSPHATE, TRIS } from './fixtures';

const saline = (totalM: number, temperatureC: number): Composition => ({
  systems: [systemAt(PHOSPHATE, totalM), systemAt(TRIS, 0.02)],
  strongIons: { 'Na+': 0.15, 'Cl-': 0.14 },
  temperatureC,
  activityModel: 'davies',
});

describe('chemistry computed once per systems, strong ions, temperature and model', () => {
  it('is found again for another amount of the same chemistry, and the prepared constants are those of van ’t Hoff at the temperature', () => {
    const a = prepare(saline(0.01, 4));
    const b = prepare(saline(0.05, 4));
    expect(b.ka).toBe(a.ka);
    expect(b.totals).toEqual([0.05, 0.02]);
    /** Ka from ln Ka and pKa from −log10: the two forms round differently by a few units in the last place. */
    const SAME_CONSTANT = 1e-13;
    expect(Math.abs(-Math.log10(a.ka[1]) - pKaAt(7.198, 3.6, -230, 4))).toBeLessThan(SAME_CONSTANT);
  });

  it('is computed anew for another temperature, activity model, strong-ion set or system', () => {
    const base = chemistryOf(saline(0.01, 4).systems, ['Na+', 'Cl-'], 4, 'davies');
    expect(chemistryOf(saline(0.01, 4).systems, ['Na+', 'Cl-'], 4.5, 'davies')).not.toBe(base);
    expect(chemistryOf(saline(0.01, 4).systems, ['Na+', 'Cl-'], 4, 'pitzer')).not.toBe(base);
    expect(chemistryOf(saline(0.01, 4).systems, ['Na+', 'Cl-', 'K+'], 4, 'davies')).not.toBe(base);
    expect(chemistryOf([systemAt(PHOSPHATE, 0.01)], ['Na+', 'Cl-'], 4, 'davies')).not.toBe(base);
    expect(chemistryOf(saline(0.02, 4).systems, ['Na+', 'Cl-'], 4, 'davies')).toBe(base);
  });

  it('prepareWith gives the pH that prepare gives', () => {
    const c = saline(0.03, 25);
    const chemistry = chemistryOf(c.systems, Object.keys(c.strongIons!), 25, 'davies');
    expect(prepareWith(chemistry, c)).toEqual(prepare(c));
    expect(solvePh(c)).toBe(solvePh({ ...c }));
  });

  it('still validates every amount when the chemistry is known, naming the field', () => {
    prepare(saline(0.01, 25));
    const bad = { ...saline(0.01, 25), strongIons: { 'Na+': -1, 'Cl-': 0.1 } };
    expect(() => prepare(bad)).toThrow(ChemError);
    try {
      prepare(bad);
    } catch (e) {
      expect((e as ChemError).field).toBe('strongIons.Na+');
    }
    const badTotal = { ...saline(0.01, 25), systems: [systemAt(PHOSPHATE, 30), systemAt(TRIS, 0.02)] };
    expect(() => prepare(badTotal)).toThrow(/systems\[0\]\.totalM/);
  });
});
