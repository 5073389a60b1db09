import { Composition, afterDilution, afterLoad, atTemperature, capacity, idealCapacityAt, idealOsmolarity, solvePh } from '../../src/chem';
import { ACETATE, CITRATE, PHOSPHATE, TRIS, expectClose } from './fixtures';

describe('buffer capacity', () => {
  const acetate: Composition = { systems: [{ ...ACETATE, totalM: 0.1 }], strongIons: { 'Na+': 0.05 } };

  it("ideal model: β from the solver equals Van Slyke's closed form (Van Slyke 1922) within 1e-6 relative", () => {
    const comp: Composition = { ...acetate, activityModel: 'ideal' };
    const c = capacity(comp);
    const vanSlyke = idealCapacityAt(comp, c.pH);
    expect(Math.abs(c.betaMPerPh - vanSlyke) / vanSlyke).toBeLessThan(1e-6);
  });

  it('ideal: at pKa a 0.1 M monoprotic buffer has β ≈ ln10·C/4 = 0.0576 M/pH (Van Slyke, by hand)', () => {
    expectClose('beta', idealCapacityAt({ systems: [{ ...ACETATE, totalM: 0.1 }] }, 4.756), (Math.LN10 * 0.1) / 4, 2e-4);
  });

  it("polyprotic: citrate's ideal capacity is the variance form, positive and larger than any single step's share", () => {
    const comp: Composition = { systems: [{ ...CITRATE, totalM: 0.05 }] };
    expect(idealCapacityAt(comp, 4.8)).toBeGreaterThan((Math.LN10 * 0.05) / 4);
  });

  it('mM per 0.1 pH: adding that much base or acid moves the pH by 0.1 (checked by solving)', () => {
    const c = capacity(acetate);
    const up = afterLoad(acetate, { baseM: c.baseMmPerTenthPh / 1000 }).pH;
    const down = afterLoad(acetate, { acidM: c.acidMmPerTenthPh / 1000 }).pH;
    expectClose('up', up, c.pH + 0.1, 1e-6);
    expectClose('down', down, c.pH - 0.1, 1e-6);
    expect(c.baseMmPerTenthPh).toBeGreaterThan(4);
    expect(c.acidMmPerTenthPh).toBeGreaterThan(4);
  });
});

describe('dilution and temperature', () => {
  const tris: Composition = { systems: [{ ...TRIS, totalM: 0.05 }], strongIons: { 'Cl-': 0.025 } };
  const phosphate: Composition = { systems: [{ ...PHOSPHATE, totalM: 0.1 }], strongIons: { 'Na+': 0.15 } };

  it('tenfold dilution moves tris (charges +1/0) by under 0.05 and less than phosphate (−1/−2) (common practice)', () => {
    const trisShift = Math.abs(afterDilution(tris, 10).pH - solvePh(tris));
    const phosShift = Math.abs(afterDilution(phosphate, 10).pH - solvePh(phosphate));
    expect(trisShift).toBeLessThan(0.05);
    expect(trisShift).toBeLessThan(phosShift);
  });

  it('a 100 mM phosphate stock at pH ≈ pKa2 rises by a few tenths on tenfold dilution (common practice; Davies: ≈ +0.2)', () => {
    const shift = afterDilution(phosphate, 10).pH - solvePh(phosphate);
    expect(shift).toBeGreaterThan(0.1);
    expect(shift).toBeLessThan(0.4);
  });

  it('tris made at 25 °C reads higher in the cold room at 4 °C, by about 0.5 (−0.028/°C, common practice)', () => {
    expectClose('tris 4 °C shift', atTemperature(tris, 4).pH - solvePh(tris), 0.56, 0.1);
  });

  it('refuses a dilution factor below 1', () => {
    expect(() => afterDilution({ systems: [{ ...TRIS, totalM: 0.05 }] }, 0.5)).toThrow(/factor is 0.5; allowed: 1 to/);
  });
});

describe('ideal osmolarity', () => {
  it('150 mM NaCl is 300 mOsm/L ideal (every particle counts once)', () => {
    const r = afterLoad({ systems: [], strongIons: { 'Na+': 0.15, 'Cl-': 0.15 } }, {});
    expectClose('NaCl osm', idealOsmolarity(r), 0.3, 1e-6);
  });
  it('counts neutral buffer species as well as ions', () => {
    const r = afterLoad({ systems: [{ ...TRIS, totalM: 0.05 }], strongIons: { 'Cl-': 0.025 } }, {});
    expectClose('tris osm', idealOsmolarity(r), 0.075, 1e-5);
  });
});
