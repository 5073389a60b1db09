/**
 * Acid–base systems used by the core's tests, with constants from Goldberg, Kishore &
 * Lennen, J. Phys. Chem. Ref. Data 31 (2002) 231, table of selected values (25 °C,
 * I = 0). Written from memory of that table, except where a line says it was checked; the
 * substance library (src/chem/library) records which values were checked against a copy.
 */
import type { AcidBaseChemistry } from '../../src/chem';

/** Phthalic acid: pKa 2.950, 5.408; ΔH° −2.70, −2.17 kJ/mol. Goldberg et al. 2002 (memory; step 1's sign as corrected in the library); ΔCp° left out (the checks using it are at 25 °C). */
export const PHTHALATE: AcidBaseChemistry = {
  name: 'phthalate',
  chargeOfMostProtonated: 0,
  steps: [
    { pKa: 2.95, deltaHkJ: -2.7 },
    { pKa: 5.408, deltaHkJ: -2.17 },
  ],
};

/** Phosphoric acid: pKa 2.148, 7.198, 12.35; ΔH° −8.0, 3.6, 16.0 kJ/mol; ΔCp° −141, −230, −242. Goldberg et al. 2002, as checked against a copy in the substance library. */
export const PHOSPHATE: AcidBaseChemistry = {
  name: 'phosphate',
  chargeOfMostProtonated: 0,
  steps: [
    { pKa: 2.148, deltaHkJ: -8.0, deltaCpJ: -141 },
    { pKa: 7.198, deltaHkJ: 3.6, deltaCpJ: -230 },
    { pKa: 12.35, deltaHkJ: 16.0, deltaCpJ: -242 },
  ],
};

/** Boric acid: pKa 9.237, ΔH° 13.8 kJ/mol, ΔCp° −240. Goldberg et al. 2002 (memory). */
export const BORATE: AcidBaseChemistry = {
  name: 'borate',
  chargeOfMostProtonated: 0,
  steps: [{ pKa: 9.237, deltaHkJ: 13.8, deltaCpJ: -240 }],
};

/** Carbonic acid (H2CO3*): pKa 6.351, 10.329; ΔH° 9.15, 14.70 kJ/mol; ΔCp° −371, −249. Goldberg et al. 2002 (memory). */
export const CARBONATE: AcidBaseChemistry = {
  name: 'carbonate',
  chargeOfMostProtonated: 0,
  steps: [
    { pKa: 6.351, deltaHkJ: 9.15, deltaCpJ: -371 },
    { pKa: 10.329, deltaHkJ: 14.7, deltaCpJ: -249 },
  ],
};

/** Tris (tris-H⁺ ⇌ tris + H⁺): pKa 8.072, ΔH° 47.45 kJ/mol, ΔCp° −59. Goldberg et al. 2002 (memory). */
export const TRIS: AcidBaseChemistry = {
  name: 'tris',
  chargeOfMostProtonated: 1,
  steps: [{ pKa: 8.072, deltaHkJ: 47.45, deltaCpJ: -59 }],
};

/** Acetic acid: pKa 4.756, ΔH° −0.41 kJ/mol, ΔCp° −142. Goldberg et al. 2002 (memory). */
export const ACETATE: AcidBaseChemistry = {
  name: 'acetate',
  chargeOfMostProtonated: 0,
  steps: [{ pKa: 4.756, deltaHkJ: -0.41, deltaCpJ: -142 }],
};

/** Citric acid: pKa 3.128, 4.761, 6.396; ΔH° 4.07, 2.23, −3.38 kJ/mol; ΔCp° −131, −178, −254. Goldberg et al. 2002 (memory). */
export const CITRATE: AcidBaseChemistry = {
  name: 'citrate',
  chargeOfMostProtonated: 0,
  steps: [
    { pKa: 3.128, deltaHkJ: 4.07, deltaCpJ: -131 },
    { pKa: 4.761, deltaHkJ: 2.23, deltaCpJ: -178 },
    { pKa: 6.396, deltaHkJ: -3.38, deltaCpJ: -254 },
  ],
};

/**
 * pK of tris-H⁺ from 0 to 50 °C as Bates & Hetzer fitted their emf measurements:
 * pK = 2981.4/T − 3.5888 + 0.005571·T (T in K). R. G. Bates, H. B. Hetzer, J. Phys. Chem.
 * 65 (1961) 667, eq. 3, as copied in pytzer (github.com/mvdh7/pytzer,
 * pytzer/dissociation.py, trisH_BH61); the fit reproduces their measured values to about
 * 0.001. It gives 8.848 at 0 °C against the 8.850 quoted from their table in Goldberg et
 * al. 2002 (tris literature table), a second copy at that point.
 */
export function trisPKaBatesHetzer(temperatureC: number): number {
  const t = temperatureC + 273.15;
  return 2981.4 / t - 3.5888 + 0.005571 * t;
}

/** Formats a failed numeric check the house way: input, result, expected, difference, tolerance. */
export function mismatch(input: string, result: number, expected: number, tolerance: number): string {
  return `${input}: got ${result}, expected ${expected}, difference ${(result - expected).toExponential(3)}, tolerance ${tolerance}`;
}

/** Asserts |result − expected| ≤ tolerance with a readable failure. */
export function expectClose(input: string, result: number, expected: number, tolerance: number): void {
  if (!(Math.abs(result - expected) <= tolerance)) throw new Error(mismatch(input, result, expected, tolerance));
}
