/**
 * Published mean activity and osmotic coefficients at 25 °C used as checks, one table per
 * salt, with their source.
 *
 * Source: R. A. Robinson, R. H. Stokes, Electrolyte Solutions, 2nd ed. (revised),
 * Butterworths 1959, Appendix 8.10 (molal scale, 25 °C). Written down from memory of that
 * appendix; no copy of the appendix was found to read. Cross-check: Pitzer & Mayorga's 1973
 * parameters (read in a copy of their tables, see src/chem/pitzer/parameters.ts)
 * were fitted to these same tables, and reproduce every value below within 1.5 %; a
 * misremembered entry would stand out against them.
 */
export interface CoefficientTable {
  readonly salt: string;
  readonly cation: 'Na+' | 'K+';
  readonly anion: 'Cl-' | 'H2PO4-';
  /** [molality mol/kg, value]. */
  readonly meanActivity: readonly (readonly [number, number])[];
  readonly osmotic?: readonly (readonly [number, number])[];
}

/** NaCl, 0.1–6 mol/kg (the table's limit is saturation, 6.1 mol/kg). Robinson & Stokes 1959, App. 8.10 (memory). */
export const SODIUM_CHLORIDE: CoefficientTable = {
  salt: 'NaCl',
  cation: 'Na+',
  anion: 'Cl-',
  meanActivity: [
    [0.1, 0.778],
    [0.2, 0.735],
    [0.3, 0.71],
    [0.5, 0.681],
    [0.7, 0.667],
    [1, 0.657],
    [1.5, 0.656],
    [2, 0.668],
    [2.5, 0.688],
    [3, 0.714],
    [4, 0.783],
    [5, 0.874],
    [6, 0.986],
  ],
  osmotic: [
    [0.1, 0.9324],
    [0.2, 0.9245],
    [0.3, 0.9215],
    [0.5, 0.9209],
    [1, 0.9355],
    [2, 0.9833],
    [3, 1.0453],
    [4, 1.1158],
    [5, 1.1916],
    [6, 1.2706],
  ],
};

/** KCl, 0.1–4.5 mol/kg (near saturation, 4.8 mol/kg). Robinson & Stokes 1959, App. 8.10 (memory). */
export const POTASSIUM_CHLORIDE: CoefficientTable = {
  salt: 'KCl',
  cation: 'K+',
  anion: 'Cl-',
  meanActivity: [
    [0.1, 0.77],
    [0.2, 0.718],
    [0.3, 0.688],
    [0.5, 0.649],
    [0.7, 0.626],
    [1, 0.604],
    [1.5, 0.583],
    [2, 0.573],
    [2.5, 0.569],
    [3, 0.569],
    [3.5, 0.572],
    [4, 0.577],
    [4.5, 0.583],
  ],
};

/** NaH2PO4, 0.1–1 mol/kg (the part of the table recalled; it runs to 6 mol/kg). Robinson & Stokes 1959, App. 8.10 (memory). */
export const SODIUM_DIHYDROGEN_PHOSPHATE: CoefficientTable = {
  salt: 'NaH2PO4',
  cation: 'Na+',
  anion: 'H2PO4-',
  meanActivity: [
    [0.1, 0.744],
    [0.2, 0.675],
    [0.3, 0.629],
    [0.5, 0.563],
    [0.7, 0.517],
    [1, 0.468],
  ],
};

/** KH2PO4, 0.1–1 mol/kg (the table runs to 1.8 mol/kg, saturation). Robinson & Stokes 1959, App. 8.10 (memory). */
export const POTASSIUM_DIHYDROGEN_PHOSPHATE: CoefficientTable = {
  salt: 'KH2PO4',
  cation: 'K+',
  anion: 'H2PO4-',
  meanActivity: [
    [0.1, 0.731],
    [0.2, 0.653],
    [0.3, 0.602],
    [0.5, 0.529],
    [0.7, 0.477],
    [1, 0.421],
  ],
};

export const TABLES: readonly CoefficientTable[] = [SODIUM_CHLORIDE, POTASSIUM_CHLORIDE, SODIUM_DIHYDROGEN_PHOSPHATE, POTASSIUM_DIHYDROGEN_PHOSPHATE];
