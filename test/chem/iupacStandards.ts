/**
 * The IUPAC 2002 primary pH standards: the one fixture every test that checks against them
 * reads. Nothing here is computed; each number is as read, with where it was read.
 *
 * Source: R. P. Buck et al., "Measurement of pH. Definition, standards, and procedures
 * (IUPAC Recommendations 2002)", Pure Appl. Chem. 74 (2002) 2169–2200: the table of pH(PS)
 * of the primary standards from 0 to 50 °C, and the table of their dilution values ΔpH½
 * and buffer values β at 25 °C (the same figures as R. G. Bates, Determination of pH,
 * 2nd ed., Wiley 1973, for these five solutions).
 *
 * How each number was read (the journal itself was not opened):
 * - pH(PS), 0–50 °C: written from memory of the IUPAC table (memory). Checked against
 *   - a copy of the potassium hydrogen phthalate column, three decimals, citing the IUPAC
 *     recommendations (chemeurope.com encyclopedia page "Potassium hydrogen phthalate",
 *     a mirror of Wikipedia): every value the same, but that copy labels the 37 and 40 °C
 *     rows "40" and "45";
 *   - JIS Z 8802 (as tabulated by HORIBA, "Reference solution" page), two decimals, all five
 *     standards: the same to ±0.01 except phthalate at 0 and 5 °C (JIS 4.01, here 4.000 and
 *     3.998; JIS follows the later NBS assignment of Hetzer et al., J. Res. NBS 81A (1977) 21,
 *     whose equation gives 4.010 at 0 °C) and carbonate (JIS gives a separate set);
 *   - the "NIST buffer table" of a process pH analyser manual (Foxboro MI 611-211, 2005,
 *     Table 8), two decimals, 0–10 °C rows: phthalate 4.00, phosphate 6.98/6.95/6.92,
 *     borax 9.46/9.40/9.33 — the same to ±0.005.
 * - β: Lange's Handbook of Chemistry, 15th ed., Table 8.15 note ("buffer values for the NBS
 *   reference pH buffer solutions"), read in two copies (studfile.net and yumpu.com page
 *   views of p. 8.106): 0.016, 0.029, 0.016, 0.020, 0.029 — the same as remembered.
 * - ΔpH½: written from memory of the IUPAC table (memory); no copy found.
 *
 * Units: compositions in mol/kg (the standards' definition); tests pass them as mol/L and
 * say so (see docs/constants.md for the size of that approximation). β in mol kg⁻¹ per pH.
 */

/** Temperatures (°C) at which the IUPAC table lists pH(PS). */
export const STANDARD_TEMPERATURES_C = [0, 5, 10, 15, 20, 25, 30, 35, 37, 40, 50] as const;

/** One primary standard: what it is made of, its pH(PS) at each tabulated temperature, ΔpH½ and β at 25 °C. */
export interface PrimaryStandard {
  /** Short key. */
  readonly id: 'phthalate' | 'phosphate1to1' | 'phosphate1to3.5' | 'borax' | 'carbonate';
  /** Name as the IUPAC table gives it. */
  readonly name: string;
  /** Library forms and their molalities, mol/kg. */
  readonly forms: readonly (readonly [string, number])[];
  /** pH(PS) at STANDARD_TEMPERATURES_C, in that order (memory; see the file header for the copies). */
  readonly pHS: readonly number[];
  /** Dilution value ΔpH½ at 25 °C: pH after dilution with an equal amount of water, minus pH(PS) (memory). */
  readonly dilutionValue: number;
  /** Buffer value β at 25 °C, mol kg⁻¹ per pH (Lange's Table 8.15, two copies). */
  readonly bufferValue: number;
}

/** The five IUPAC 2002 primary standards used as checks. */
export const PRIMARY_STANDARDS: readonly PrimaryStandard[] = [
  {
    id: 'phthalate',
    name: 'potassium hydrogen phthalate 0.05 mol/kg',
    forms: [['potassium hydrogen phthalate', 0.05]],
    pHS: [4.0, 3.998, 3.997, 3.998, 4.0, 4.005, 4.011, 4.018, 4.022, 4.027, 4.05],
    dilutionValue: 0.052,
    bufferValue: 0.016,
  },
  {
    id: 'phosphate1to1',
    name: 'KH2PO4 + Na2HPO4 0.025 + 0.025 mol/kg',
    forms: [
      ['KH2PO4', 0.025],
      ['Na2HPO4', 0.025],
    ],
    pHS: [6.984, 6.951, 6.923, 6.9, 6.881, 6.865, 6.853, 6.844, 6.841, 6.838, 6.833],
    dilutionValue: 0.08,
    bufferValue: 0.029,
  },
  {
    id: 'phosphate1to3.5',
    name: 'KH2PO4 + Na2HPO4 0.008695 + 0.03043 mol/kg',
    forms: [
      ['KH2PO4', 0.008695],
      ['Na2HPO4', 0.03043],
    ],
    pHS: [7.534, 7.5, 7.472, 7.448, 7.429, 7.413, 7.4, 7.389, 7.386, 7.38, 7.367],
    dilutionValue: 0.07,
    bufferValue: 0.016,
  },
  {
    id: 'borax',
    name: 'disodium tetraborate (borax) 0.01 mol/kg',
    forms: [['borax', 0.01]],
    pHS: [9.464, 9.395, 9.332, 9.276, 9.225, 9.18, 9.139, 9.102, 9.088, 9.068, 9.011],
    dilutionValue: 0.01,
    bufferValue: 0.02,
  },
  {
    id: 'carbonate',
    name: 'NaHCO3 + Na2CO3 0.025 + 0.025 mol/kg',
    forms: [
      ['NaHCO3', 0.025],
      ['Na2CO3', 0.025],
    ],
    pHS: [10.317, 10.245, 10.179, 10.118, 10.062, 10.012, 9.966, 9.925, 9.91, 9.889, 9.828],
    dilutionValue: 0.079,
    bufferValue: 0.029,
  },
];

/** The standard by key (throws on a typo, so a test cannot silently check nothing). */
export function primaryStandard(id: PrimaryStandard['id']): PrimaryStandard {
  const found = PRIMARY_STANDARDS.find((s) => s.id === id);
  if (!found) throw new Error(`no primary standard ${id}`);
  return found;
}

/** pH(PS) of a standard at 25 °C. */
export function pHSAt25(id: PrimaryStandard['id']): number {
  return primaryStandard(id).pHS[STANDARD_TEMPERATURES_C.indexOf(25)];
}
