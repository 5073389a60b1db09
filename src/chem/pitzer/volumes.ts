/**
 * Water content of a solution from apparent molar volumes, to turn mol/L (recipes) into
 * mol/kg (the scale of the constants and of the Pitzer equations).
 *
 * Method: one litre holds water of mass ρ_w·(1000 − V_s) g, where
 *   V_s = Σ c_i V°_i + S_V·I^{3/2}   (cm³ per litre, c in mol/L),
 * V°_i the partial molar volume of each species at infinite dilution and S_V I^{3/2} the
 * Debye–Hückel limiting-law excess volume (Redlich–Rosenfeld slope). Molality is then
 * m_i = c_i / (water kg per litre). Checked in test against the molality and molarity
 * columns of the CRC Handbook's table of concentrative properties of aqueous solutions.
 */
import type { PitzerIon } from './parameters';

/** Debye–Hückel limiting slope of the apparent molar volume at 25 °C, cm³ L^½ mol^−3/2, per unit ionic strength (1.868 for a 1:1 salt; F. J. Millero, Chem. Rev. 71 (1971) 147 (memory)). */
export const VOLUME_LIMITING_SLOPE = 1.868;

/**
 * Partial molar volumes at infinite dilution, 25 °C, cm³/mol, on the conventional scale
 * V°(H⁺) = 0. F. J. Millero, "The partial molal volumes of electrolytes in aqueous
 * solutions", in R. A. Horne (ed.), Water and Aqueous Solutions (1972), ch. 13 (memory);
 * tris from the same period's literature (memory). Only the water content depends on these,
 * and a 1 cm³/mol error moves a 1 M stock's molality by 0.1 %.
 */
export const ION_VOLUME_CM3: Readonly<Partial<Record<PitzerIon, number>>> = {
  'H+': 0,
  'Li+': -0.88,
  'Na+': -1.21,
  'K+': 9.03,
  'Cs+': 21.35,
  'NH4+': 17.86,
  'Mg2+': -21.17,
  'Ca2+': -17.85,
  'OH-': -4.04,
  'Cl-': 17.83,
  'Br-': 24.71,
  'I-': 36.22,
  'NO3-': 29.0,
  'ClO4-': 44.12,
  'HSO4-': 35.2,
  'SO4-2': 13.98,
  'H2PO4-': 29.1,
  'HPO4-2': 5.3,
  'PO4-3': -30.6,
  'HCO3-': 24.3,
  'CO3-2': -3.8,
  'acetate-': 40.5,
  'trisH+': 82.7,
};

/** Volumes of neutral forms of the library systems the tables name, cm³/mol (memory, same sources). */
export const NEUTRAL_VOLUME_CM3: Readonly<Record<string, number>> = {
  phosphate: 47.6,
  carbonate: 33.0,
  sulfate: 35.2,
  acetate: 51.9,
  tris: 82.7,
  ammonia: 24.8,
};

/** Volume taken for any other species (zwitterionic buffers and the like), cm³/mol: our round estimate, about that of a 150–250 g/mol organic solute. */
export const DEFAULT_SOLUTE_VOLUME_CM3 = 120;

/**
 * Kilograms of water in one litre of solution.
 *
 * @param waterDensity - density of pure water at the temperature, g/cm³
 * @param concentrations - every species, mol/L (at least as many entries as volumes)
 * @param volumes - their partial molar volumes, cm³/mol
 * @param ionicStrengthM - ionic strength, mol/L
 * @returns kg of water per litre (never below 0.05: beyond any solution the solver accepts)
 */
export function waterKgPerLitre(waterDensity: number, concentrations: readonly number[], volumes: readonly number[], ionicStrengthM: number): number {
  let v = VOLUME_LIMITING_SLOPE * ionicStrengthM * Math.sqrt(ionicStrengthM);
  // Over the species of the layout (volumes); a scratch array of concentrations may be longer.
  for (let i = 0; i < volumes.length; i++) v += concentrations[i] * volumes[i];
  return Math.max(0.05, (waterDensity * (1000 - v)) / 1000);
}
