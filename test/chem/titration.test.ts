import { ChemError, Composition, HYDROCHLORIC_ACID, SODIUM_HYDROXIDE, Titrant, solvePh, titrantForPh, withTitrant } from '../../src/chem';
import { ACETATE, PHOSPHATE, TRIS, expectClose } from './fixtures';

/** Round trips solve the charge balance to ~1e-13 in ln a(H⁺); 1e-6 pH is the bar, with room to spare. */
const ROUND_TRIP_TOLERANCE = 1e-6;

describe('titrantForPh', () => {
  const acetate: Composition = { systems: [{ ...ACETATE, totalM: 0.1 }] };
  const trisBase: Composition = { systems: [{ ...TRIS, totalM: 0.05 }], temperatureC: 20 };

  it('acetic acid to its pKa with NaOH, ideal: about half the acid (Henderson–Hasselbalch, corrected by [H+])', () => {
    const r = titrantForPh({ ...acetate, activityModel: 'ideal' }, SODIUM_HYDROXIDE, 4.756);
    const h = Math.pow(10, -4.756);
    // Charge balance by hand: Na + h = [A−] = 0.05 → Na = 0.05 − h (OH− negligible).
    expectClose('NaOH for pKa', r.concentrationM, 0.05 - h, 1e-9);
  });

  it.each([
    ['NaOH into acetic acid', acetate, SODIUM_HYDROXIDE, 5.0],
    ['HCl into tris base at 20 °C', trisBase, HYDROCHLORIC_ACID, 7.5],
    ['NaOH into phosphoric acid, step 2', { systems: [{ ...PHOSPHATE, totalM: 0.02 }] }, SODIUM_HYDROXIDE, 7.2],
  ] as [string, Composition, Titrant, number][])('round trip: %s to pH %p, solved back within 1e-6', (_l, comp, titrant, pH) => {
    const amount = titrantForPh(comp, titrant, pH);
    expectClose('round trip', solvePh(withTitrant(comp, titrant, amount.concentrationM)), pH, ROUND_TRIP_TOLERANCE);
  });

  it('weak titrant: tris base brings acetic acid to pH 6, solved back within 1e-6', () => {
    const trisTitrant: Titrant = { name: 'tris base', system: TRIS };
    const amount = titrantForPh(acetate, trisTitrant, 6);
    expect(amount.chargePerMole).toBeGreaterThan(0);
    expect(amount.chargePerMole).toBeLessThan(1);
    expectClose('weak round trip', solvePh(withTitrant(acetate, trisTitrant, amount.concentrationM)), 6, ROUND_TRIP_TOLERANCE);
  });

  it('refuses a target the titrant moves away from, naming the starting pH', () => {
    let caught: ChemError | undefined;
    try {
      titrantForPh(acetate, SODIUM_HYDROXIDE, 2);
    } catch (e) {
      caught = e as ChemError;
    }
    expect(caught?.kind).toBe('infeasible-target');
    expect(caught?.message).toMatch(/NaOH raises the pH, and without it the solution is already at pH 2\.8/);
  });

  it('refuses a target a weak titrant cannot reach (tris base cannot take a solution to pH 11)', () => {
    expect(() => titrantForPh(acetate, { name: 'tris base', system: TRIS }, 11)).toThrow(/more than 20 M/);
  });

  it('refuses targets outside 0–14 and non-numbers', () => {
    expect(() => titrantForPh(acetate, SODIUM_HYDROXIDE, 15)).toThrow(/targetPh is 15; allowed: 0 to 14/);
    expect(() => titrantForPh(acetate, SODIUM_HYDROXIDE, NaN)).toThrow(/targetPh must be a finite number/);
  });

  it('withTitrant merges with an ion already present under another spelling', () => {
    const comp = withTitrant({ systems: [], strongIons: { na: 0.01 } }, SODIUM_HYDROXIDE, 0.02);
    expect(comp.strongIons).toEqual({ na: 0.03 });
  });
});
