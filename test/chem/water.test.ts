import { debyeHuckelA, pKw, waterDensity, waterPermittivity } from '../../src/chem';
import { expectClose } from './fixtures';

/** The Harned & Owen fit reproduces its own tabulated values to about ±0.005. */
const PKW_TOLERANCE = 0.005;

describe('pKw(T), Harned & Owen 1958 (check values as listed in docs/science.md)', () => {
  it.each([
    [0, 14.94],
    [25, 13.995],
    [37, 13.62],
    [50, 13.26],
  ])('at %p °C is %p within 0.005', (t, expected) => {
    expectClose(`pKw(${t})`, pKw(t), expected, PKW_TOLERANCE);
  });

  it('falls as temperature rises (water ionises more when warm)', () => {
    for (let t = 0; t < 100; t += 5) expect(pKw(t + 5)).toBeLessThan(pKw(t));
  });
});

describe('water density, Tanaka et al. 2001 (check values: common practice)', () => {
  it('is 0.99997 g/cm³ at 4 °C and 0.99705 at 25 °C within 2e-5', () => {
    expectClose('rho(4)', waterDensity(4), 0.99997, 2e-5);
    expectClose('rho(25)', waterDensity(25), 0.99705, 2e-5);
  });
  it('has its maximum near 4 °C', () => {
    expect(waterDensity(4)).toBeGreaterThan(waterDensity(0));
    expect(waterDensity(4)).toBeGreaterThan(waterDensity(8));
  });
});

describe('permittivity, Malmberg & Maryott 1956', () => {
  it('is 87.74 at 0 °C (the fit constant) and about 78.3 at 25 °C', () => {
    expectClose('eps(0)', waterPermittivity(0), 87.74, 1e-9);
    expectClose('eps(25)', waterPermittivity(25), 78.3, 0.05);
  });
});

describe('Debye–Hückel A(T) (check values as listed in docs/science.md)', () => {
  it('A(0 °C) ≈ 0.492 within 0.002 (tables differ in the third decimal with the permittivity data used)', () => {
    expectClose('A(0)', debyeHuckelA(0), 0.492, 0.002);
  });
  it('A(25 °C) lies in the tabulated range 0.509–0.511', () => {
    const a = debyeHuckelA(25);
    expect(a).toBeGreaterThanOrEqual(0.509);
    expect(a).toBeLessThanOrEqual(0.511);
  });
  it('rises with temperature', () => {
    expect(debyeHuckelA(50)).toBeGreaterThan(debyeHuckelA(25));
  });
});
