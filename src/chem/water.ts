/**
 * Properties of water that the solver needs at a temperature: the ion product, the
 * density, the relative permittivity and the Debye–Hückel limiting-law slope A.
 */

/** 0 °C in kelvin (exact, by definition of the Celsius scale). */
export const KELVIN_OFFSET = 273.15;

/** Reference temperature of the tabulated constants, 25 °C in kelvin. Goldberg et al. 2002, J. Phys. Chem. Ref. Data 31, 231 (θ = 298.15 K). */
export const REFERENCE_TEMPERATURE_K = 298.15;

/** Gas constant in J K⁻¹ mol⁻¹ (CODATA, exact since the 2019 SI redefinition). */
export const GAS_CONSTANT = 8.314462618;

/**
 * pKw = −log10 Kw of water at a temperature, molal scale, I = 0.
 *
 * Method: pKw = 4470.99/T − 6.0875 + 0.01706 T (T in K).
 * Reference: H. S. Harned, B. B. Owen, The Physical Chemistry of Electrolytic Solutions,
 * 3rd ed. (1958), fit to their conductance/cell data for 0–60 °C.
 *
 * @param temperatureC - temperature in °C
 * @returns pKw (dimensionless)
 * @example pKw(25) // ≈ 13.995
 */
export function pKw(temperatureC: number): number {
  const t = temperatureC + KELVIN_OFFSET;
  return 4470.99 / t - 6.0875 + 0.01706 * t;
}

/**
 * Density of air-free water at 101.325 kPa, in g/cm³.
 *
 * Method: ρ = a5 [1 − (t + a1)² (t + a2) / (a3 (t + a4))], t in °C, valid 0–40 °C and
 * within 0.1 % to 100 °C. Reference: M. Tanaka et al., Metrologia 38 (2001) 301, eq. 1
 * (coefficients written from memory; checked in test against ρ(4 °C) ≈ 0.99997 and
 * ρ(25 °C) ≈ 0.99705 g/cm³, common practice).
 *
 * @param temperatureC - temperature in °C
 * @returns density in g/cm³
 */
export function waterDensity(temperatureC: number): number {
  const t = temperatureC;
  const a1 = -3.983035;
  const a2 = 301.797;
  const a3 = 522528.9;
  const a4 = 69.34881;
  const a5 = 999.97495;
  return (a5 * (1 - ((t + a1) * (t + a1) * (t + a2)) / (a3 * (t + a4)))) / 1000;
}

/**
 * Relative permittivity (dielectric constant) of water.
 *
 * Method: ε_r = 87.740 − 0.40008 t + 9.398×10⁻⁴ t² − 1.410×10⁻⁶ t³ (t in °C, 0–100 °C).
 * Reference: C. G. Malmberg, A. A. Maryott, J. Res. Natl. Bur. Stand. 56 (1956) 1, eq. 3.
 *
 * @param temperatureC - temperature in °C
 * @returns ε_r (dimensionless)
 */
export function waterPermittivity(temperatureC: number): number {
  const t = temperatureC;
  return 87.74 - 0.40008 * t + 9.398e-4 * t * t - 1.41e-6 * t * t * t;
}

/**
 * Debye–Hückel limiting-law slope A for log10 γ, in kg^½ mol^−½.
 *
 * Method: A = 1.82483×10⁶ √ρ / (ε_r T)^{3/2}, ρ in g/cm³, T in K (the constant collects
 * e, N_A, k_B and ε₀ and converts ln to log10; standard form, e.g. Bates 1973, Determination
 * of pH, ch. 3). Check: A(0 °C) ≈ 0.492, A(25 °C) ≈ 0.509–0.511.
 *
 * @param temperatureC - temperature in °C
 * @returns A in kg^½ mol^−½
 */
export function debyeHuckelA(temperatureC: number): number {
  const t = temperatureC + KELVIN_OFFSET;
  const epsT = waterPermittivity(temperatureC) * t;
  return (1.82483e6 * Math.sqrt(waterDensity(temperatureC))) / (epsT * Math.sqrt(epsT));
}
