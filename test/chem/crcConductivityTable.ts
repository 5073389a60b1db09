/**
 * Conductivity of salt solutions at 20 °C by mass percent, with the density that turns a
 * mass percent into mol/L: one fixture for the conductivity checks against the CRC
 * Handbook's tables.
 *
 * Sources, each read in one public copy (no second copy was found; a copy is not the book):
 * - κ: CRC Handbook of Chemistry and Physics, "Electrical conductivity of aqueous solutions"
 *   (from Wolf, Aqueous Solutions and Body Fluids, 1966; all values at 20 °C), read in the
 *   CSV copy `tests/test_crc/Electrical Conductivity of Aqueous Solutions at 20C as a
 *   Function of Concentration.csv` of the GitHub repository ugognw/pchemdb. Values carry
 *   two or three significant figures.
 * - ρ: CRC Handbook, 102nd ed. (2021), "Concentrative properties of aqueous solutions"
 *   (20 °C), read in the copy `src/CRC Solution Properties.txt` of the GitHub repository
 *   amosonabike/CRC-Solution-Properties-. Its molarity column agrees with w·ρ/M to the
 *   last digit it prints for every row used here.
 */

/** Temperature of both tables, °C. */
export const CRC_TABLE_TEMPERATURE_C = 20;

/** A salt as the speciation sees it: which cation, how many per formula unit, and its anion (a strong ion, or the phosphate system). */
export interface TableSalt {
  readonly formula: string;
  /** Molar mass used by the density table, g/mol. */
  readonly molarMassG: number;
  readonly cation: 'Na+' | 'K+';
  readonly cationsPerFormula: number;
  /** `Cl-`, or `phosphate` for an orthophosphate salt. */
  readonly anion: 'Cl-' | 'phosphate';
}

/** One row of the conductivity table, with the density at the same mass percent. */
export interface TableRow {
  readonly salt: TableSalt;
  readonly massPercent: number;
  /** Density of the solution at 20 °C, g/cm³ (concentrative-properties table). */
  readonly densityGPerCm3: number;
  /** Published κ at 20 °C, mS/cm. */
  readonly conductivityMsPerCm: number;
}

export const NACL: TableSalt = { formula: 'NaCl', molarMassG: 58.443, cation: 'Na+', cationsPerFormula: 1, anion: 'Cl-' };
export const KCL: TableSalt = { formula: 'KCl', molarMassG: 74.551, cation: 'K+', cationsPerFormula: 1, anion: 'Cl-' };
export const KH2PO4: TableSalt = { formula: 'KH2PO4', molarMassG: 136.085, cation: 'K+', cationsPerFormula: 1, anion: 'phosphate' };
export const K2HPO4: TableSalt = { formula: 'K2HPO4', molarMassG: 174.176, cation: 'K+', cationsPerFormula: 2, anion: 'phosphate' };
export const NAH2PO4: TableSalt = { formula: 'NaH2PO4', molarMassG: 119.977, cation: 'Na+', cationsPerFormula: 1, anion: 'phosphate' };
export const NA2HPO4: TableSalt = { formula: 'Na2HPO4', molarMassG: 141.959, cation: 'Na+', cationsPerFormula: 2, anion: 'phosphate' };

const row = (salt: TableSalt, massPercent: number, densityGPerCm3: number, conductivityMsPerCm: number): TableRow => ({ salt, massPercent, densityGPerCm3, conductivityMsPerCm });

/** Every row of the six salts up to 5 %, as read. */
export const CRC_CONDUCTIVITY_ROWS: readonly TableRow[] = [
  row(NACL, 0.5, 1.0018, 8.2),
  row(NACL, 1, 1.0053, 16.0),
  row(NACL, 2, 1.0125, 30.2),
  row(NACL, 5, 1.034, 70.1),
  row(KCL, 0.5, 1.0014, 8.2),
  row(KCL, 1, 1.0046, 15.7),
  row(KCL, 2, 1.011, 29.5),
  row(KCL, 5, 1.0304, 71.9),
  row(KH2PO4, 0.5, 1.0018, 3.0),
  row(KH2PO4, 1, 1.0053, 5.9),
  row(KH2PO4, 2, 1.0125, 11.0),
  row(KH2PO4, 5, 1.0342, 25.0),
  row(K2HPO4, 0.5, 1.0025, 5.2),
  row(K2HPO4, 1, 1.0068, 9.9),
  row(K2HPO4, 2, 1.0153, 18.3),
  row(K2HPO4, 5, 1.0412, 40.3),
  row(NAH2PO4, 0.5, 1.0019, 2.2),
  row(NAH2PO4, 1, 1.0056, 4.4),
  row(NAH2PO4, 2, 1.0131, 9.1),
  row(NAH2PO4, 5, 1.0358, 21.0),
  row(NA2HPO4, 0.5, 1.0032, 4.6),
  row(NA2HPO4, 1, 1.0082, 8.7),
  row(NA2HPO4, 2, 1.018, 15.6),
  row(NA2HPO4, 5, 1.0478, 31.4),
];

/** The row of a salt at a mass percent. */
export function tableRow(salt: TableSalt, massPercent: number): TableRow {
  const r = CRC_CONDUCTIVITY_ROWS.find((x) => x.salt === salt && x.massPercent === massPercent);
  if (!r) throw new Error(`No table row for ${salt.formula} at ${massPercent} %`);
  return r;
}

/** mol/L of the salt: c = w ρ / M. */
export function molarityOf(r: TableRow): number {
  return ((r.massPercent / 100) * r.densityGPerCm3 * 1000) / r.salt.molarMassG;
}
