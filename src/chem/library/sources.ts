/**
 * The published sources the substance library cites, keyed so that each record names its
 * source in one short field.
 */

/** Every source a library value may cite. */
export const SOURCES = {
  goldberg2002:
    'R. N. Goldberg, N. Kishore, R. M. Lennen, "Thermodynamic quantities for the ionization reactions of buffers", J. Phys. Chem. Ref. Data 31 (2002) 231–370, selected values at 298.15 K, I = 0 (most underlying data span about 0–60 °C)',
  harnedOwen1958:
    'H. S. Harned, B. B. Owen, The Physical Chemistry of Electrolytic Solutions, 3rd ed., Reinhold (1958)',
  bates1973: 'R. G. Bates, Determination of pH, 2nd ed., Wiley (1973)',
  crcDissociation:
    'CRC Handbook of Chemistry and Physics, "Dissociation constants of organic acids and bases" (edition not checked)',
  crcSolubility:
    'CRC Handbook of Chemistry and Physics, "Aqueous solubility of inorganic compounds at various temperatures" (edition not checked), converted to grams per litre of saturated solution',
  commonlyStated: 'Value commonly stated in textbooks (no primary source checked)',
  supplierLabel: 'Molar mass as printed on common suppliers\' labels and catalogues (written from memory; checked against the formula with CIAAW 2021 atomic weights)',
  userDefined: 'Defined by the user',
} as const;

/** Key of a source in SOURCES. */
export type SourceId = keyof typeof SOURCES;

/**
 * Where the values marked `verified: true` were checked: public copies of the
 * Goldberg et al. 2002 selected values found with the project's code search (a TypeScript
 * buffer module listing pK, ΔH°, ΔCp° for 29 ionization steps; a source-review note
 * quoting TAPSO and imidazole from the printed tables; a C# ITC-analysis table quoting the
 * phosphate steps; a reference manager quoting phosphate, acetate, citrate, tris and
 * carbonate pK values; and a scanned page of the review for ADA).
 */
export const VERIFICATION_NOTE =
  'Checked against public copies of the Goldberg et al. 2002 tables found by code search (not against the printed journal itself).';
