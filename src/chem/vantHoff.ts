/**
 * Temperature dependence of an acid dissociation constant.
 */
import { GAS_CONSTANT, KELVIN_OFFSET, REFERENCE_TEMPERATURE_K } from './water';

/**
 * pKa at a temperature from its value at 25 °C, ΔH° and ΔCp°.
 *
 * Method: integrated van 't Hoff equation with constant ΔCp°, θ = 298.15 K:
 * ln K(T) = ln K(θ) − (ΔH°/R)(1/T − 1/θ) + (ΔCp°/R)(θ/T − 1 + ln(T/θ)).
 * Reference: R. N. Goldberg, N. Kishore, R. M. Lennen, J. Phys. Chem. Ref. Data 31 (2002)
 * 231, eq. 5 (the form their tables are meant to be used with).
 *
 * Special cases: ΔH° = ΔCp° = 0 returns pKa25 unchanged at every temperature.
 *
 * @param pKa25 - pKa at 25 °C and I = 0
 * @param deltaHkJ - standard enthalpy of ionisation in kJ/mol
 * @param deltaCpJ - standard heat-capacity change of ionisation in J K⁻¹ mol⁻¹
 * @param temperatureC - temperature in °C
 * @returns pKa at the temperature, I = 0
 * @example pKaAt(8.072, 47.45, -59, 37) // ≈ 7.77 (tris)
 */
export function pKaAt(pKa25: number, deltaHkJ: number, deltaCpJ: number, temperatureC: number): number {
  return -lnKaAt(pKa25, deltaHkJ, deltaCpJ, vantHoffTerms(temperatureC)) / Math.LN10;
}

/** The temperature parts of the van 't Hoff equation, shared by every step at one temperature. */
export interface VantHoffTerms {
  /** (1/T − 1/θ)/R, mol/J. */
  readonly enthalpyTerm: number;
  /** (θ/T − 1 + ln(T/θ))/R, mol K/J. */
  readonly heatCapacityTerm: number;
}

/** Computes the temperature parts once, so that each step costs a multiply-add (see pKaAt). */
export function vantHoffTerms(temperatureC: number): VantHoffTerms {
  const t = temperatureC + KELVIN_OFFSET;
  const theta = REFERENCE_TEMPERATURE_K;
  return {
    enthalpyTerm: (1 / t - 1 / theta) / GAS_CONSTANT,
    heatCapacityTerm: (theta / t - 1 + Math.log(t / theta)) / GAS_CONSTANT,
  };
}

/** ln Ka at the temperature of `terms` (see pKaAt for the method). */
export function lnKaAt(pKa25: number, deltaHkJ: number, deltaCpJ: number, terms: VantHoffTerms): number {
  return -pKa25 * Math.LN10 - deltaHkJ * 1000 * terms.enthalpyTerm + deltaCpJ * terms.heatCapacityTerm;
}
