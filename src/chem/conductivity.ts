/**
 * Electrolytic conductivity κ of a solved composition, in mS/cm, at 0–60 °C: the figure a
 * QC conductivity meter reads (uncompensated, at the stated temperature).
 *
 * Method: κ = Σ c_i λ_i over every charged species of the speciation (c in mol/L, λ the
 * molar conductivity of the ion per mole of ion, S cm² mol⁻¹; Σ c λ then comes out in
 * mS/cm). Each ion's conductivity falls with the ionic strength I (mol/L) as
 *
 *   λ_i = λ°_i(T) − A_i(T) √I / (1 + B √I),   A_i = r_i B1(T) λ°_i(T) + z_i² B2(T)/2,
 *
 * the Debye–Hückel–Onsager limiting law written ion by ion: electrophoresis B2, split
 * between the two ions of a 1:1 salt and scaled by z² per mole of ion (as in Onsager's
 * equation for any binary salt), and relaxation B1·λ° times r_i, Onsager's factor
 * |z₁z₂| q/(1 + √q) for the salt of ion i with the solution's mean counter-ion, relative
 * to its 1:1 value (r = 1 in any mixture of 1:1 salts); and an ion-size denominator
 * 1 + B√I as in the extended form of Robinson & Stokes (Electrolyte Solutions, 2nd ed.
 * 1959, ch. 7) and in the per-ion equation of
 * McCleskey et al. (2012). B1 and B2 follow from the water's permittivity, viscosity and
 * temperature; B = 1.5 (L/mol)^½ is McCleskey's fitted value for K⁺ and Cl⁻.
 *
 * Temperature: λ°_i(T) = λ°_i(25 °C) × s_i(T). For the ions McCleskey et al. (2012) fitted
 * from 0 to 95 °C, s_i is the ratio of their λ°(t) polynomial to its 25 °C value; for every
 * other ion s = η(25 °C)/η(T) (Walden's rule, best for large ions such as the buffer ions).
 *
 * Special cases: neutral species and zwitterions of net charge 0 carry no current. An ion
 * with no published λ° gets a stated default per unit charge and is listed in `estimates`.
 *
 * Limits: no ion pairing (Na⁺·HPO₄²⁻, Mg²⁺·SO₄²⁻ and the like), no solution-viscosity
 * correction, so salts of multiply charged ions and concentrated stocks read high; see
 * docs/conductivity.md for the accuracy table.
 *
 * References:
 * - P. Vanýsek, "Ionic conductivity and diffusion at infinite dilution", CRC Handbook of
 *   Chemistry and Physics (cations read in a copy of the 87th ed. table; anions from memory).
 * - Lange's Handbook of Chemistry, 15th ed., Table 8.32 (read in a public copy):
 *   the anions, and a second copy of most cations.
 * - P. H. Barry, J. Neurosci. Methods 51 (1994) 107, ion mobility table relative to K⁺ (read
 *   in a public copy): buffer ions.
 * - R. B. McCleskey, D. K. Nordstrom, J. N. Ryan, J. W. Ball, Geochim. Cosmochim. Acta 77
 *   (2012) 369, Table 1 (read in two public copies that agree for every ion used
 *   here, except where an entry says one copy).
 * - R. A. Robinson, R. H. Stokes, Electrolyte Solutions, 2nd ed. (1959), eq. 7.36 for B1, B2.
 * - J. Kestin, M. Sokolov, W. A. Wakeham, J. Phys. Chem. Ref. Data 7 (1978) 941 (water viscosity).
 * - T. Hirokawa et al., limiting mobilities of buffer ions (isotachophoresis tables, read in
 *   public copies of that table: tris 2.95, HEPES 2.35, MOPS 2.69, acetate 4.24 × 10⁻⁸ m²/(V s)).
 */
import { Composition, withConditions } from './composition';
import { MESSAGES } from './errors';
import { ChemWarning, warning } from './warnings';
import { SpeciationResult, speciate } from './speciation';
import { KELVIN_OFFSET, waterPermittivity } from './water';

/** Lowest temperature the conductivity model covers, °C. */
export const CONDUCTIVITY_MIN_C = 0;
/** Highest temperature the conductivity model covers, °C (McCleskey et al. 2012 fitted to 95 °C; the checks here go to 50 °C). */
export const CONDUCTIVITY_MAX_C = 60;
/** Ion-size coefficient B of √I/(1 + B√I), (L/mol)^½: McCleskey et al. 2012, Table 1, value for K⁺ and Cl⁻ (two copies agree). */
export const ION_SIZE_B = 1.5;
/**
 * λ° per unit charge given to an ion with no published value, S cm² mol⁻¹ at 25 °C: the
 * middle of the buffer ions tabulated here (HEPES⁻ 22.7, MOPS⁻ 26.0, tris-H⁺ 28.5), a stated
 * default rather than a measurement.
 */
export const DEFAULT_LAMBDA_PER_CHARGE = 25;
/** Ionic strength (mol/L) above which the concentration correction is an extrapolation: McCleskey et al. 2012 fitted to about 1 mol/kg. */
export const CONDUCTIVITY_I_LIMIT_M = 1;

/** F·(1 m²/(V s)) in S cm² mol⁻¹: converts an ionic mobility to a molar conductivity per unit charge (F = 96485.33 C/mol, CODATA). */
const MOBILITY_TO_LAMBDA = 96485.33 * 1e4;

/** A temperature polynomial λ°(t) = a t² + b t + c, t in °C (per mole of ion, S cm² mol⁻¹). */
interface Polynomial {
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

/** One ion's limiting conductivity. */
interface IonEntry {
  /** Molar conductivity at infinite dilution, 25 °C, per mole of ion (not per equivalent), S cm² mol⁻¹. */
  readonly lambda25: number;
  /** Temperature shape λ°(t) from McCleskey et al. 2012 Table 1, if fitted there. */
  readonly shape?: Polynomial;
  /** Where the value was read. */
  readonly source: string;
}

const CRC = 'Vanýsek, CRC Handbook, Ionic conductivity and diffusion at infinite dilution';
const LANGE = "Lange's Handbook of Chemistry, 15th ed., Table 8.32 (limiting equivalent conductances, 25 °C)";
const HIROKAWA = 'Hirokawa et al. isotachophoresis tables, limiting mobility';
const BARRY = 'Barry, JPCalc ion mobility table (J. Neurosci. Methods 51 (1994) 107), relative to K⁺';
const poly = (a: number, b: number, c: number): Polynomial => ({ a, b, c });

/**
 * Limiting conductivities of the strong ions and of water's ions, keyed by the species
 * name the speciation gives. Per mole of ion: a divalent ion's λ is twice the tabulated
 * "½ M²⁺" value.
 */
const STRONG_ION_LAMBDA: Readonly<Record<string, IonEntry>> = {
  /** H⁺ 349.65. CRC (read in a copy); shape: McCleskey 2012 Table 1 (one copy). */
  'H+': { lambda25: 349.65, shape: poly(0.01414, 5.355, 224.2), source: `${CRC} (read); temperature: McCleskey et al. 2012 Table 1 (one copy)` },
  /** OH⁻ 198. Lange 8.32 (read) and CRC (memory) agree; PHREEQC's D = 5.27e-9 m²/s gives 197.9. Shape: McCleskey 2012 (one copy). */
  'OH-': {
    lambda25: 198,
    shape: poly(0.003396, 2.925, 121.3),
    source: `${LANGE} (read; CRC agrees, PHREEQC database D gives 197.9); temperature: McCleskey et al. 2012 Table 1 (one copy)`,
  },
  /** Na⁺ 50.08. CRC (memory); Lange 8.32 gives 50.11 (read); PHREEQC's D = 1.33e-9 gives 49.9. Shape: McCleskey 2012 (two copies). */
  'Na+': {
    lambda25: 50.08,
    shape: poly(0.003763, 0.877, 26.23),
    source: `${CRC} (memory; Lange 50.11, PHREEQC database D gives 49.9); temperature: McCleskey et al. 2012 Table 1`,
  },
  /** K⁺ 73.48. CRC (read in a copy). Shape: McCleskey 2012 (two copies). */
  'K+': { lambda25: 73.48, shape: poly(0.003046, 1.261, 40.7), source: `${CRC} (read); temperature: McCleskey et al. 2012 Table 1` },
  /** Li⁺ 38.66. CRC (read). Shape: McCleskey 2012 (one copy). */
  'Li+': { lambda25: 38.66, shape: poly(0.002628, 0.7079, 19.2), source: `${CRC} (read); temperature: McCleskey et al. 2012 Table 1 (one copy)` },
  /** Cs⁺ 77.2. CRC (read). Shape: McCleskey 2012 (one copy). */
  'Cs+': { lambda25: 77.2, shape: poly(0.003453, 1.249, 43.94), source: `${CRC} (read); temperature: McCleskey et al. 2012 Table 1 (one copy)` },
  /** Mg²⁺ 2 × 53.0. CRC (read). Shape: McCleskey 2012 (two copies). */
  'Mg2+': { lambda25: 106.0, shape: poly(0.01068, 1.695, 57.16), source: `${CRC} (read, ½Mg²⁺ 53.0); temperature: McCleskey et al. 2012 Table 1` },
  /** Ca²⁺ 2 × 59.47. CRC (read). Shape: McCleskey 2012 (two copies). */
  'Ca2+': { lambda25: 118.94, shape: poly(0.009645, 1.984, 62.28), source: `${CRC} (read, ½Ca²⁺ 59.47); temperature: McCleskey et al. 2012 Table 1` },
  /** Cl⁻ 76.31. Lange 8.32 (read) and CRC (memory) agree; PHREEQC's D = 2.03e-9 gives 76.2; Hirokawa's mobility 7.91e-8 gives 76.3. Shape: McCleskey 2012 (two copies). */
  'Cl-': {
    lambda25: 76.31,
    shape: poly(0.003817, 1.337, 40.99),
    source: `${LANGE} (read; CRC agrees, PHREEQC D gives 76.2, Hirokawa mobility 76.3); temperature: McCleskey et al. 2012 Table 1`,
  },
  /** Br⁻ 78.1. Lange 8.32 (read) and CRC (memory) agree. Shape: McCleskey 2012 (one copy). */
  'Br-': { lambda25: 78.1, shape: poly(0.000709, 1.477, 40.91), source: `${LANGE} (read; CRC agrees); temperature: McCleskey et al. 2012 Table 1 (one copy)` },
  /** I⁻ 76.9. Lange 8.32 (read); CRC gives 76.8 (memory). */
  'I-': { lambda25: 76.9, source: `${LANGE} (read; CRC 76.8)` },
  /** NO₃⁻ 71.42. Lange 8.32 (read) and CRC (memory) agree; PHREEQC's D = 1.9e-9 gives 71.4. Shape: McCleskey 2012 (two copies). */
  'NO3-': { lambda25: 71.42, shape: poly(0.001925, 1.214, 39.9), source: `${LANGE} (read; CRC agrees, PHREEQC D gives 71.4); temperature: McCleskey et al. 2012 Table 1` },
  /** ClO₄⁻ 67.3. Lange 8.32 (read) and CRC (memory) agree. */
  'ClO4-': { lambda25: 67.3, source: `${LANGE} (read; CRC agrees)` },
};

/**
 * Limiting conductivities of acid–base species, keyed `system|charge` (system names as in
 * the substance library). Per mole of ion.
 */
const SYSTEM_ION_LAMBDA: Readonly<Record<string, IonEntry>> = {
  /** H₂PO₄⁻ 33. Lange 8.32 (read); CRC gives 36 (memory, and one public copy), PHREEQC's D = 0.846e-9 gives 31.8: the handbooks disagree, the diffusion value sides with Lange. */
  'phosphate|-1': { lambda25: 33, source: `${LANGE} (read, 33; CRC gives 36, PHREEQC D gives 31.8)` },
  /** HPO₄²⁻ 2 × 57. CRC (memory); PHREEQC's D = 0.69e-9 gives 2 × 51.8. Lange's copy lists 33, which no other source supports. */
  'phosphate|-2': { lambda25: 114, source: `${CRC} (memory, ½HPO₄²⁻ 57; PHREEQC D gives 2 × 51.8; Lange's 33 not used)` },
  /** PO₄³⁻ 3 × 69. Lange 8.32 (read) and CRC (memory) agree; PHREEQC's D = 0.612e-9 gives 3 × 68.9. */
  'phosphate|-3': { lambda25: 207, source: `${LANGE} (read, ⅓PO₄³⁻ 69; CRC and PHREEQC agree)` },
  /** HCO₃⁻ 44.5. Lange 8.32 (read) and CRC (memory) agree; PHREEQC's D = 1.18e-9 gives 44.3. */
  'carbonate|-1': { lambda25: 44.5, source: `${LANGE} (read; CRC agrees, PHREEQC D gives 44.3)` },
  /** CO₃²⁻ 2 × 69.3. Lange 8.32 (read) and CRC (memory) agree; PHREEQC's D = 0.955e-9 gives 2 × 71.7. */
  'carbonate|-2': { lambda25: 138.6, source: `${LANGE} (read, ½CO₃²⁻ 69.3; CRC agrees, PHREEQC D gives 2 × 71.7)` },
  /** HSO₄⁻ 50. Lange 8.32 (read); CRC gives 52 (memory); PHREEQC's D = 1.33e-9 gives 49.9. */
  'sulfate|-1': { lambda25: 50, source: `${LANGE} (read; CRC 52, PHREEQC D gives 49.9)` },
  /** SO₄²⁻ 2 × 80.0. Lange 8.32 (read) and CRC agree; PHREEQC's D = 1.07e-9 gives 2 × 80.4. Shape: McCleskey 2012 (two copies). */
  'sulfate|-2': { lambda25: 160, shape: poly(0.01037, 2.838, 82.37), source: `${LANGE} (read, ½SO₄²⁻ 80.0; PHREEQC D gives 2 × 80.4); temperature: McCleskey et al. 2012 Table 1` },
  /** NH₄⁺ 73.5. CRC (read); Hirokawa mobility 7.62e-8 gives 73.5. Shape: McCleskey 2012 (two copies). */
  'ammonia|1': { lambda25: 73.5, shape: poly(0.003341, 1.285, 39.04), source: `${CRC} (read; Hirokawa mobility gives 73.5); temperature: McCleskey et al. 2012 Table 1` },
  /** Acetate 40.9. CRC (memory); Lange 8.32 gives 41 (read); Hirokawa mobility 4.24e-8 gives 40.9. */
  'acetate|-1': { lambda25: 40.9, source: `${CRC} (memory; Lange 41, Hirokawa mobility 4.24e-8 m²/(V s) gives 40.9)` },
  /** Formate 54.6. Lange 8.32 (read) and CRC (memory) agree. */
  'formate|-1': { lambda25: 54.6, source: `${LANGE} (read; CRC agrees)` },
  /** Lactate 38.8. Lange 8.32 (read). */
  'lactate|-1': { lambda25: 38.8, source: `${LANGE} (read)` },
  /** Dihydrogen citrate 30. Lange 8.32 (read). */
  'citrate|-1': { lambda25: 30, source: `${LANGE} (read)` },
  /** Citrate³⁻ 3 × 70.2. Lange 8.32 (read) and CRC (memory) agree. */
  'citrate|-3': { lambda25: 210.6, source: `${LANGE} (read, ⅓citrate³⁻ 70.2; CRC agrees)` },
  /** Hydrogen oxalate 40.2. Lange 8.32 (read). */
  'oxalate|-1': { lambda25: 40.2, source: `${LANGE} (read)` },
  /** Oxalate²⁻ 2 × 74.11. Lange 8.32 (read) and CRC (memory) agree. */
  'oxalate|-2': { lambda25: 148.22, source: `${LANGE} (read, ½C₂O₄²⁻ 74.11; CRC agrees)` },
  /** Succinate²⁻ 2 × 58.8. Lange 8.32 (read) and CRC (memory) agree. */
  'succinate|-2': { lambda25: 117.6, source: `${LANGE} (read, ½succinate²⁻ 58.8; CRC agrees)` },
  /** Malate²⁻ 2 × 58.8. Lange 8.32 (read). */
  'malate|-2': { lambda25: 117.6, source: `${LANGE} (read, ½malate²⁻ 58.8)` },
  /** Tartrate²⁻ 2 × 59.6. Lange 8.32 (read). */
  'tartrate|-2': { lambda25: 119.2, source: `${LANGE} (read, ½tartrate²⁻ 59.6)` },
  /** o-Phthalate²⁻ 2 × 52.3. Lange 8.32 (read). */
  'phthalate|-2': { lambda25: 104.6, source: `${LANGE} (read, ½o-phthalate²⁻ 52.3)` },
  /** Tris-H⁺ 28.5: Hirokawa mobility 2.95e-8 m²/(V s) (two public copies); Barry's table gives 0.40 × K⁺ = 29.4. */
  'tris|1': { lambda25: 2.95e-8 * MOBILITY_TO_LAMBDA, source: `${HIROKAWA}, 2.95e-8 m²/(V s) (two copies); ${BARRY} 0.40 × K⁺ = 29.4` },
  /** HEPES⁻ 22.7: Hirokawa mobility 2.35e-8 m²/(V s) (two public copies); Barry's table gives 0.30 × K⁺ = 22.1. */
  'HEPES|-1': { lambda25: 2.35e-8 * MOBILITY_TO_LAMBDA, source: `${HIROKAWA}, 2.35e-8 m²/(V s) (two copies); ${BARRY} 0.30 × K⁺ = 22.1` },
  /** MOPS⁻ 26.0: Hirokawa mobility 2.69e-8 m²/(V s) (two public copies); Barry's table gives 0.35 × K⁺ = 25.7. */
  'MOPS|-1': { lambda25: 2.69e-8 * MOBILITY_TO_LAMBDA, source: `${HIROKAWA}, 2.69e-8 m²/(V s) (two copies); ${BARRY} 0.35 × K⁺ = 25.7` },
  /** MES⁻ 27.2: Barry's table, 0.37 × K⁺ (one copy). */
  'MES|-1': { lambda25: 0.37 * 73.5, source: `${BARRY} 0.37 × K⁺ (73.5) (one copy)` },
};

/** An ion whose λ° was estimated, not read from a table. */
export interface ConductivityEstimate {
  /** Species name as the speciation gives it (e.g. `citrate 2−`). */
  readonly species: string;
  readonly charge: number;
  /** λ° used at 25 °C, per mole of ion, S cm² mol⁻¹. */
  readonly lambda25: number;
  /** Share of κ this ion carries (0–1): how much the estimate can matter. */
  readonly shareOfConductivity: number;
}

/** One ion's part of κ. */
export interface IonConductivity {
  readonly species: string;
  readonly charge: number;
  readonly concentrationM: number;
  /** λ at the temperature and ionic strength, per mole of ion, S cm² mol⁻¹. */
  readonly lambda: number;
  /** c·λ, mS/cm. */
  readonly contributionMsPerCm: number;
  readonly estimated: boolean;
}

/** κ of a solved composition. */
export interface ConductivityResult {
  /** Conductivity at the composition's temperature, mS/cm. */
  readonly conductivityMsPerCm: number;
  readonly temperatureC: number;
  readonly ionicStrengthM: number;
  readonly ions: readonly IonConductivity[];
  /** Ions whose λ° is the stated default (none published here). */
  readonly estimates: readonly ConductivityEstimate[];
  readonly warnings: readonly ChemWarning[];
}

/**
 * Dynamic viscosity of liquid water at 0.1 MPa, mPa·s.
 *
 * Method: log10(η/η20) = (20 − t)/(t + 96) · [1.2378 − 1.303×10⁻³ (20 − t) + 3.06×10⁻⁶ (20 − t)²
 * + 2.55×10⁻⁸ (20 − t)³], η20 = 1.002 mPa·s. Reference: J. Kestin, M. Sokolov, W. A. Wakeham,
 * J. Phys. Chem. Ref. Data 7 (1978) 941 (memory; checked in test against 1.7914, 0.8900 and
 * 0.4665 mPa·s at 0, 25 and 60 °C, the IAPWS 2008 values, common practice).
 *
 * @param temperatureC - temperature, °C
 * @returns viscosity, mPa·s
 * @example waterViscosity(25) // ≈ 0.8900
 */
export function waterViscosity(temperatureC: number): number {
  const d = 20 - temperatureC;
  const log = (d / (temperatureC + 96)) * (1.2378 - 1.303e-3 * d + 3.06e-6 * d * d + 2.55e-8 * d * d * d);
  return 1.002 * Math.pow(10, log);
}

/**
 * Onsager's relaxation and electrophoretic coefficients for a 1:1 electrolyte in water.
 *
 * Method: B1 = 8.204×10⁵ / (ε T)^{3/2} (L/mol)^½; B2 = 82.48 / (η (ε T)^{1/2}) S cm² mol⁻¹ (L/mol)^½,
 * η in poise. Reference: Robinson & Stokes 1959, eq. 7.36 (memory); at 25 °C this gives
 * B1 ≈ 0.230 and B2 ≈ 60.6, the usual 0.229 and 60.2 with ε = 78.5.
 *
 * @param temperatureC - temperature, °C
 */
export function onsagerCoefficients(temperatureC: number): { b1: number; b2: number } {
  const epsT = waterPermittivity(temperatureC) * (temperatureC + KELVIN_OFFSET);
  const etaPoise = waterViscosity(temperatureC) / 100;
  return { b1: 8.204e5 / Math.pow(epsT, 1.5), b2: 82.48 / (etaPoise * Math.sqrt(epsT)) };
}

/** Onsager's relaxation factor |z₁z₂| q/(1 + √q) of a 1:1 salt (q = ½): the factor B1 already carries. */
const RELAXATION_1_1 = 0.5 / (1 + Math.SQRT1_2);

/** The counter-ions an ion moves against, as one mean ion: charge and λ° per equivalent, averaged over the opposite ions weighted by their equivalents. */
export interface MeanCounterIon {
  readonly charge: number;
  readonly lambdaPerEquivalent: number;
}

/**
 * Relaxation factor of an ion relative to a 1:1 salt.
 *
 * Method: Onsager's limiting law for a binary salt of charges z₁, z₂ carries the relaxation
 * term |z₁z₂| q/(1 + √q) · B′λ°, with q = |z₁z₂|/(|z₁| + |z₂|) · (λ₁ + λ₂)/(|z₂|λ₁ + |z₁|λ₂)
 * and λ per equivalent (Robinson & Stokes 1959, eq. 7.36 (memory)); B1 is that term for
 * z = 1 (q = ½). In a mixture the ion is paired with the mean counter-ion of the solution:
 * exact for a single salt (Na₂HPO₄: r = 1.85 for both ions, where z² scaling gave 4 for
 * HPO₄²⁻ and 1 for Na⁺) and 1 in any mixture of 1:1 salts.
 *
 * @param charge - |z| of the ion
 * @param lambdaPerEquivalent - its λ° per equivalent, S cm² mol⁻¹
 * @param counter - the mean counter-ion (none: no relaxation partner, factor 1)
 * @returns r, 1 for a 1:1 salt
 */
export function relaxationFactor(charge: number, lambdaPerEquivalent: number, counter: MeanCounterIon | undefined): number {
  if (!counter) return 1;
  const z1 = charge;
  const z2 = counter.charge;
  const l1 = lambdaPerEquivalent;
  const l2 = counter.lambdaPerEquivalent;
  const q = ((z1 * z2) / (z1 + z2)) * ((l1 + l2) / (z2 * l1 + z1 * l2));
  return (z1 * z2 * q) / (1 + Math.sqrt(q)) / RELAXATION_1_1;
}

function entryOf(name: string, system: string | undefined, charge: number): IonEntry | undefined {
  if (system === undefined) return STRONG_ION_LAMBDA[name];
  return SYSTEM_ION_LAMBDA[`${system}|${charge}`];
}

/** λ°(T)/λ°(25 °C) for an ion. */
function temperatureRatio(entry: IonEntry | undefined, temperatureC: number, walden: number): number {
  const s = entry?.shape;
  if (!s) return walden;
  const at = (t: number) => s.a * t * t + s.b * t + s.c;
  return at(temperatureC) / at(25);
}

/**
 * Conductivity of a solved composition at its own temperature.
 *
 * @param result - a speciation result (species, ionic strength, temperature)
 * @returns κ in mS/cm, each ion's part, the ions whose λ° was estimated, and warnings
 * @example conductivityOf(speciate({ systems: [], strongIons: { 'K+': 0.01, 'Cl-': 0.01 } })).conductivityMsPerCm // ≈ 1.412
 */
export function conductivityOf(result: SpeciationResult): ConductivityResult {
  const t = result.temperatureC;
  const { b1, b2 } = onsagerCoefficients(t);
  const walden = waterViscosity(25) / waterViscosity(t);
  const sqrtI = Math.sqrt(Math.max(0, result.ionicStrengthM));
  const x = sqrtI / (1 + ION_SIZE_B * sqrtI);
  // λ° of every charged species first: each ion's relaxation term needs its counter-ions'.
  const charged = result.species
    .filter((s) => s.charge !== 0 && s.concentrationM !== 0)
    .map((s) => {
      const entry = entryOf(s.name, s.system, s.charge);
      const z = Math.abs(s.charge);
      const lambda25 = entry?.lambda25 ?? DEFAULT_LAMBDA_PER_CHARGE * z;
      return { s, z, estimated: entry === undefined, lambda0: lambda25 * temperatureRatio(entry, t, walden) };
    });
  const meanIon = (sign: number): MeanCounterIon | undefined => {
    let equivalents = 0;
    let charge = 0;
    let lambda = 0;
    for (const c of charged) {
      if (Math.sign(c.s.charge) !== sign) continue;
      const eq = c.s.concentrationM * c.z;
      equivalents += eq;
      charge += eq * c.z;
      lambda += eq * (c.lambda0 / c.z);
    }
    return equivalents > 0 ? { charge: charge / equivalents, lambdaPerEquivalent: lambda / equivalents } : undefined;
  };
  const meanCation = meanIon(1);
  const meanAnion = meanIon(-1);
  const ions: IonConductivity[] = [];
  let total = 0;
  for (const { s, z, estimated, lambda0 } of charged) {
    const r = relaxationFactor(z, lambda0 / z, s.charge > 0 ? meanAnion : meanCation);
    const slope = r * b1 * lambda0 + (z * z * b2) / 2;
    // The ion-size denominator keeps λ positive at any I; the floor guards an extrapolation far beyond 1 M.
    const lambda = Math.max(0, lambda0 - slope * x);
    const contribution = s.concentrationM * lambda;
    total += contribution;
    ions.push({ species: s.name, charge: s.charge, concentrationM: s.concentrationM, lambda, contributionMsPerCm: contribution, estimated });
  }
  const estimates: ConductivityEstimate[] = ions
    .filter((i) => i.estimated)
    .map((i) => ({
      species: i.species,
      charge: i.charge,
      lambda25: DEFAULT_LAMBDA_PER_CHARGE * Math.abs(i.charge),
      shareOfConductivity: total > 0 ? i.contributionMsPerCm / total : 0,
    }));
  const warnings: ChemWarning[] = [];
  const material = estimates.filter((e) => e.shareOfConductivity >= 0.01);
  if (material.length > 0) {
    const names = material.map((e) => `${e.species} (${(100 * e.shareOfConductivity).toFixed(0)} %)`).join(', ');
    warnings.push(warning('conductivityEstimated', MESSAGES.conductivityEstimated(names, DEFAULT_LAMBDA_PER_CHARGE)));
  }
  if (t < CONDUCTIVITY_MIN_C || t > CONDUCTIVITY_MAX_C) {
    warnings.push(warning('conductivityTemperature', MESSAGES.conductivityTemperature(t, CONDUCTIVITY_MIN_C, CONDUCTIVITY_MAX_C), 'temperatureC'));
  }
  if (result.ionicStrengthM > CONDUCTIVITY_I_LIMIT_M) {
    warnings.push(warning('conductivityIonicStrength', MESSAGES.conductivityIonicStrength(result.ionicStrengthM, CONDUCTIVITY_I_LIMIT_M)));
  }
  return { conductivityMsPerCm: total, temperatureC: t, ionicStrengthM: result.ionicStrengthM, ions, estimates, warnings };
}

/**
 * Conductivity of a composition at a temperature (the composition's own when none is given).
 *
 * @param composition - the solution (mol/L)
 * @param temperatureC - temperature of the reading, °C
 * @returns κ in mS/cm with its parts; see `conductivityOf`
 */
export function conductivityAt(composition: Composition, temperatureC?: number): ConductivityResult {
  return conductivityOf(speciate(temperatureC === undefined ? composition : withConditions(composition, temperatureC)));
}
