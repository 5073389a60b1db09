/**
 * The demo composition: our own scenario. The QC bench of a small protein lab keeps a
 * 25 mM HEPES / 150 mM NaCl wash buffer titrated with NaOH, used in the 4 °C cold room.
 * Constants for HEPES: Goldberg et al. 2002, J. Phys. Chem. Ref. Data 31, Table 4
 * (pKa 7.564, ΔH° 20.4 kJ/mol, ΔCp° 47 J K⁻¹ mol⁻¹; written from memory, checked against
 * the substance library once it lands).
 */
import type { CompositionInput } from './compositionInput';

export const DEMO_COMPOSITION: CompositionInput = {
  temperatureC: 4,
  activityModel: 'davies',
  systems: [{ name: 'HEPES', chargeOfMostProtonated: 0, pKa: [7.564], deltaHkJ: [20.4], deltaCpJ: [47], totalMm: 25 }],
  strongIonsMm: { 'Na+': 162, 'Cl-': 150 },
};
