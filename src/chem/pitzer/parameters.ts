/**
 * Pitzer interaction parameters at 25 °C for the ions buffers are made of, each with its
 * source beside it. Units: β⁽⁰⁾, β⁽¹⁾, β⁽²⁾ in kg/mol, C^φ in kg²/mol² (Pitzer's convention,
 * C = C^φ / (2√|z_M z_X|)); θ and ψ in kg/mol and kg²/mol².
 *
 * Where a table was read (not recalled), the copy read is named:
 * - PM73: K. S. Pitzer, G. Mayorga, J. Phys. Chem. 77 (1973) 2300, Tables I (1:1), II
 *   (organic 1:1), VI (1:2, 2:1; tabulated as (4/3)β⁽⁰⁾, (4/3)β⁽¹⁾, (2^{5/2}/3)C^φ and
 *   converted here), VIII (1:3; tabulated as (3/2)β, (3^{3/2}/2)C^φ). Read in the
 *   copy of the journal tables in the pytzer package (mvdh7/pytzer,
 *   pytzer/tables.py and parameters.py, PM73_TableI/VI/VIII and bC_*_PM73).
 * - P91: K. S. Pitzer (ed.), Activity Coefficients in Electrolyte Solutions, 2nd ed.
 *   (1991), ch. 3, Tables 12 and 13: first temperature derivatives at 25 °C. Read in the
 *   same pytzer copy (P91_Ch3_T12, P91_Ch3_T13_I).
 * - HMW84: C. E. Harvie, N. Møller, J. H. Weare, Geochim. Cosmochim. Acta 48 (1984) 723,
 *   Tables 1–3. Read in PHREEQC's pitzer.dat (TonyAppelo/phreeqc3, database/pitzer.dat),
 *   whose constant lines carry the 1984 values (that they are HMW84's is from memory of the
 *   paper; pitzer.dat does not say so line by line); values pitzer.dat has since refitted
 *   are marked (memory) with the refit noted.
 * - GT17: D. Gallego-Urrea, D. R. Turner, Mar. Chem. 195 (2017), Supp. Info. Table S6
 *   ("simultaneous optimisation"): trisH⁺ parameters. Read in pytzer (bC_trisH_Cl_GT17simopt).
 */

/** The ions the parameter tables know, by the names used here. */
export type PitzerIon =
  | 'H+'
  | 'Li+'
  | 'Na+'
  | 'K+'
  | 'Cs+'
  | 'NH4+'
  | 'trisH+'
  | 'Mg2+'
  | 'Ca2+'
  | 'OH-'
  | 'Cl-'
  | 'Br-'
  | 'I-'
  | 'NO3-'
  | 'ClO4-'
  | 'HSO4-'
  | 'SO4-2'
  | 'H2PO4-'
  | 'HPO4-2'
  | 'PO4-3'
  | 'HCO3-'
  | 'CO3-2'
  | 'acetate-';

/** Charge of every tabulated ion (facts of chemistry). */
export const PITZER_ION_CHARGE: Readonly<Record<PitzerIon, number>> = {
  'H+': 1,
  'Li+': 1,
  'Na+': 1,
  'K+': 1,
  'Cs+': 1,
  'NH4+': 1,
  'trisH+': 1,
  'Mg2+': 2,
  'Ca2+': 2,
  'OH-': -1,
  'Cl-': -1,
  'Br-': -1,
  'I-': -1,
  'NO3-': -1,
  'ClO4-': -1,
  'HSO4-': -1,
  'SO4-2': -2,
  'H2PO4-': -1,
  'HPO4-2': -2,
  'PO4-3': -3,
  'HCO3-': -1,
  'CO3-2': -2,
  'acetate-': -1,
};

/** First temperature derivatives at 25 °C, per kelvin. */
export interface PitzerTemperatureSlope {
  readonly beta0: number;
  readonly beta1: number;
  /** dC^φ/dT; omitted where the copy read leaves its convention unclear. */
  readonly cphi?: number;
}

/** Binary (cation–anion) parameters of one salt at 25 °C. */
export interface PitzerBinary {
  readonly cation: PitzerIon;
  readonly anion: PitzerIon;
  readonly beta0: number;
  readonly beta1: number;
  readonly beta2?: number;
  readonly cphi: number;
  /** α₁ (kg^½ mol^−½): 2 except for 2:2 salts (1.4, with α₂ = 12). */
  readonly alpha1?: number;
  /** Highest molality of the fit, mol/kg. */
  readonly maxMolal: number;
  readonly slope?: PitzerTemperatureSlope;
  readonly source: string;
}

const PM73_I = 'PM73 Table I (read in pytzer PM73_TableI)';
const PM73_II = 'PM73 Table II (read in pytzer bC_*_acetate_PM73)';
const PM73_VI = 'PM73 Table VI, converted from (4/3)β and (2^{5/2}/3)C^φ (read in pytzer PM73_TableVI)';
const PM73_VIII = 'PM73 Table VIII, converted from (3/2)β and (3^{3/2}/2)C^φ (read in pytzer PM73_TableVIII)';
const HMW84 = 'HMW84 (read in PHREEQC pitzer.dat)';
const P91_12 = 'P91 Table 12 (read in pytzer P91_Ch3_T12)';
const P91_13 = 'P91 Table 13 part I (read in pytzer P91_Ch3_T13_I); dC^φ/dT left out (the copy labels it C0)';

/** (4/3)β → β for PM73 Table VI. */
const vi = (b43: number) => (b43 * 3) / 4;
/** (2^{5/2}/3)C^φ → C^φ for PM73 Table VI. */
const viC = (c: number) => (c * 3) / Math.pow(2, 2.5);
/** (3/2)β → β for PM73 Table VIII. */
const viii = (b32: number) => (b32 * 2) / 3;
/** (3^{3/2}/2)C^φ → C^φ for PM73 Table VIII. */
const viiiC = (c: number) => (c * 2) / Math.pow(3, 1.5);

/** Every binary parameter set, one line per salt, source beside it. */
export const PITZER_BINARY: readonly PitzerBinary[] = [
  // ── 1:1, PM73 Table I (max molality as stated in P91 Table 12 where it is given there) ──
  /** HCl. PM73 Table I; HMW84 copy in pitzer.dat agrees (0.1775, 0.2945, 0.0008). dC^φ/dT: −6.213e-5 in the pytzer copy of P91, +6.213e-5 in pitzer.dat; the pytzer sign is used. */
  {
    cation: 'H+',
    anion: 'Cl-',
    beta0: 0.1775,
    beta1: 0.2945,
    cphi: 0.0008,
    maxMolal: 4.5,
    slope: { beta0: -3.081e-4, beta1: 1.419e-4, cphi: -6.213e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** HBr. PM73 Table I; pitzer.dat agrees. */
  {
    cation: 'H+',
    anion: 'Br-',
    beta0: 0.196,
    beta1: 0.3564,
    cphi: 0.00827,
    maxMolal: 6,
    slope: { beta0: -2.049e-4, beta1: 4.467e-4, cphi: -5.685e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** HI. PM73 Table I. */
  { cation: 'H+', anion: 'I-', beta0: 0.2362, beta1: 0.392, cphi: 0.0011, maxMolal: 6, source: PM73_I },
  /** HClO4. PM73 Table I. */
  { cation: 'H+', anion: 'ClO4-', beta0: 0.1747, beta1: 0.2931, cphi: 0.00819, maxMolal: 6, source: PM73_I },
  /** HNO3. PM73 Table I. */
  { cation: 'H+', anion: 'NO3-', beta0: 0.1119, beta1: 0.3206, cphi: 0.001, maxMolal: 3, source: PM73_I },
  /** LiCl. PM73 Table I; pitzer.dat agrees, slope too. */
  {
    cation: 'Li+',
    anion: 'Cl-',
    beta0: 0.1494,
    beta1: 0.3074,
    cphi: 0.00359,
    maxMolal: 6,
    slope: { beta0: -1.685e-4, beta1: 5.366e-4, cphi: -4.52e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** LiBr. PM73 Table I; pitzer.dat agrees. */
  { cation: 'Li+', anion: 'Br-', beta0: 0.1748, beta1: 0.2547, cphi: 0.0053, maxMolal: 6, source: PM73_I },
  /** LiI. PM73 Table I. */
  { cation: 'Li+', anion: 'I-', beta0: 0.2104, beta1: 0.373, cphi: 0, maxMolal: 3, source: PM73_I },
  /** LiOH. PM73 Table I; pitzer.dat agrees. */
  { cation: 'Li+', anion: 'OH-', beta0: 0.015, beta1: 0.14, cphi: 0, maxMolal: 4, source: PM73_I },
  /** LiClO4. PM73 Table I. */
  { cation: 'Li+', anion: 'ClO4-', beta0: 0.1973, beta1: 0.3996, cphi: 0.0008, maxMolal: 3.5, source: PM73_I },
  /** LiNO3. PM73 Table I. */
  { cation: 'Li+', anion: 'NO3-', beta0: 0.142, beta1: 0.278, cphi: -0.00551, maxMolal: 6, source: PM73_I },
  /** NaCl. PM73 Table I (the HMW84 value too); pitzer.dat carries a later temperature fit (β⁽⁰⁾ 0.0753 at 25 °C). */
  {
    cation: 'Na+',
    anion: 'Cl-',
    beta0: 0.0765,
    beta1: 0.2664,
    cphi: 0.00127,
    maxMolal: 6,
    slope: { beta0: 7.159e-4, beta1: 7.005e-4, cphi: -10.54e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** NaBr. PM73 Table I; pitzer.dat agrees, slope too. */
  {
    cation: 'Na+',
    anion: 'Br-',
    beta0: 0.0973,
    beta1: 0.2791,
    cphi: 0.00116,
    maxMolal: 9,
    slope: { beta0: 7.692e-4, beta1: 10.79e-4, cphi: -9.3e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** NaI. PM73 Table I. */
  {
    cation: 'Na+',
    anion: 'I-',
    beta0: 0.1195,
    beta1: 0.3439,
    cphi: 0.0018,
    maxMolal: 6,
    slope: { beta0: 8.355e-4, beta1: 8.28e-4, cphi: -8.35e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** NaOH. PM73 Table I; pitzer.dat agrees, slope too. */
  {
    cation: 'Na+',
    anion: 'OH-',
    beta0: 0.0864,
    beta1: 0.253,
    cphi: 0.0044,
    maxMolal: 4.2,
    slope: { beta0: 7.0e-4, beta1: 1.34e-4, cphi: -18.94e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** NaClO4. PM73 Table I. */
  {
    cation: 'Na+',
    anion: 'ClO4-',
    beta0: 0.0554,
    beta1: 0.2755,
    cphi: -0.00118,
    maxMolal: 6,
    slope: { beta0: 12.96e-4, beta1: 22.97e-4, cphi: -16.23e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** NaNO3. PM73 Table I. */
  {
    cation: 'Na+',
    anion: 'NO3-',
    beta0: 0.0068,
    beta1: 0.1783,
    cphi: -0.00072,
    maxMolal: 6,
    slope: { beta0: 12.66e-4, beta1: 20.6e-4, cphi: -23.16e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** NaH2PO4. PM73 Table I. */
  { cation: 'Na+', anion: 'H2PO4-', beta0: -0.0533, beta1: 0.0396, cphi: 0.00795, maxMolal: 6, source: PM73_I },
  /** Sodium acetate. PM73 Table II. */
  { cation: 'Na+', anion: 'acetate-', beta0: 0.1426, beta1: 0.3237, cphi: -0.00629, maxMolal: 3.5, source: PM73_II },
  /** NaHCO3. HMW84 Table 1 (memory); pitzer.dat now carries a refit (−0.018, −0.0101, β⁽²⁾ 6.84). */
  { cation: 'Na+', anion: 'HCO3-', beta0: 0.0277, beta1: 0.0411, cphi: 0, maxMolal: 1, source: 'HMW84 Table 1 (memory)' },
  /** NaHSO4. HMW84, as in pitzer.dat. */
  { cation: 'Na+', anion: 'HSO4-', beta0: 0.0454, beta1: 0.398, cphi: 0, maxMolal: 6, source: HMW84 },
  /** KCl. PM73 Table I; pitzer.dat carries a temperature fit (0.04808 at 25 °C). */
  {
    cation: 'K+',
    anion: 'Cl-',
    beta0: 0.04835,
    beta1: 0.2122,
    cphi: -0.00084,
    maxMolal: 4.8,
    slope: { beta0: 5.794e-4, beta1: 10.71e-4, cphi: -5.095e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** KBr. PM73 Table I; pitzer.dat agrees, slope too. */
  {
    cation: 'K+',
    anion: 'Br-',
    beta0: 0.0569,
    beta1: 0.2212,
    cphi: -0.0018,
    maxMolal: 5.5,
    slope: { beta0: 7.39e-4, beta1: 17.4e-4, cphi: -7.004e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** KI. PM73 Table I. */
  {
    cation: 'K+',
    anion: 'I-',
    beta0: 0.0746,
    beta1: 0.2517,
    cphi: -0.00414,
    maxMolal: 4.5,
    slope: { beta0: 9.914e-4, beta1: 11.86e-4, cphi: -9.44e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** KOH. PM73 Table I; pitzer.dat agrees. */
  { cation: 'K+', anion: 'OH-', beta0: 0.1298, beta1: 0.32, cphi: 0.0041, maxMolal: 5.5, source: PM73_I },
  /** KNO3. PM73 Table I. */
  {
    cation: 'K+',
    anion: 'NO3-',
    beta0: -0.0816,
    beta1: 0.0494,
    cphi: 0.0066,
    maxMolal: 3.8,
    slope: { beta0: 2.06e-4, beta1: 64.5e-4, cphi: 39.7e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** KH2PO4. PM73 Table I. */
  {
    cation: 'K+',
    anion: 'H2PO4-',
    beta0: -0.0678,
    beta1: -0.1042,
    cphi: 0,
    maxMolal: 1.8,
    slope: { beta0: 6.045e-4, beta1: 28.6e-4, cphi: -10.11e-5 },
    source: `${PM73_I}; slope ${P91_12}`,
  },
  /** Potassium acetate. PM73 Table II. */
  { cation: 'K+', anion: 'acetate-', beta0: 0.1587, beta1: 0.3251, cphi: -0.0066, maxMolal: 3.5, source: PM73_II },
  /** KHCO3. pitzer.dat (0.0296, 0.25, −0.008). */
  { cation: 'K+', anion: 'HCO3-', beta0: 0.0296, beta1: 0.25, cphi: -0.008, maxMolal: 1, source: 'PHREEQC pitzer.dat' },
  /** KHSO4. HMW84, as in pitzer.dat. */
  { cation: 'K+', anion: 'HSO4-', beta0: -0.0003, beta1: 0.1735, cphi: 0, maxMolal: 6, source: HMW84 },
  /** CsCl. PM73 Table I. */
  { cation: 'Cs+', anion: 'Cl-', beta0: 0.03, beta1: 0.0558, cphi: 0.00038, maxMolal: 5, source: PM73_I },
  /** CsBr. PM73 Table I. */
  { cation: 'Cs+', anion: 'Br-', beta0: 0.0279, beta1: 0.0139, cphi: 0.00004, maxMolal: 5, source: PM73_I },
  /** CsI. PM73 Table I. */
  { cation: 'Cs+', anion: 'I-', beta0: 0.0244, beta1: 0.0262, cphi: -0.00365, maxMolal: 3, source: PM73_I },
  /** CsOH. PM73 Table I. */
  { cation: 'Cs+', anion: 'OH-', beta0: 0.15, beta1: 0.3, cphi: 0, maxMolal: 1, source: PM73_I },
  /** CsNO3. PM73 Table I. */
  { cation: 'Cs+', anion: 'NO3-', beta0: -0.0758, beta1: -0.0669, cphi: 0, maxMolal: 1.4, source: PM73_I },
  /** NH4Cl. PM73 Table I. */
  { cation: 'NH4+', anion: 'Cl-', beta0: 0.0522, beta1: 0.1918, cphi: -0.00301, maxMolal: 6, source: PM73_I },
  /** NH4Br. PM73 Table I. */
  { cation: 'NH4+', anion: 'Br-', beta0: 0.0624, beta1: 0.1947, cphi: -0.00436, maxMolal: 2.5, source: PM73_I },
  /** NH4ClO4. PM73 Table I. */
  { cation: 'NH4+', anion: 'ClO4-', beta0: -0.0103, beta1: -0.0194, cphi: 0, maxMolal: 2, source: PM73_I },
  /** NH4NO3. PM73 Table I. */
  { cation: 'NH4+', anion: 'NO3-', beta0: -0.0154, beta1: 0.112, cphi: -0.00003, maxMolal: 6, source: PM73_I },
  /** Tris hydrochloride (trisH⁺Cl⁻). GT17 Table S6. */
  { cation: 'trisH+', anion: 'Cl-', beta0: 0.04181, beta1: 0.16024, cphi: -0.00132, maxMolal: 3, source: 'GT17 Table S6 (read in pytzer bC_trisH_Cl_GT17simopt)' },
  /** Tris sulfate ((trisH⁺)₂SO₄²⁻). GT17 Table S6. */
  { cation: 'trisH+', anion: 'SO4-2', beta0: 0.09746, beta1: 0.52936, cphi: -0.004957, maxMolal: 1, source: 'GT17 Table S6 (read in pytzer bC_trisH_SO4_GT17simopt)' },
  /** H2SO4 as H⁺–SO4²⁻. HMW84, as in pitzer.dat. */
  { cation: 'H+', anion: 'SO4-2', beta0: 0.0298, beta1: 0, cphi: 0.0438, maxMolal: 6, source: HMW84 },
  /** H⁺–HSO4⁻. HMW84, as in pitzer.dat. */
  { cation: 'H+', anion: 'HSO4-', beta0: 0.2065, beta1: 0.5556, cphi: 0, maxMolal: 6, source: HMW84 },

  // ── 1:2 and 2:1, PM73 Table VI (HMW84 where it replaces it for speciated carbonate) ──
  /** MgCl2. PM73 Table VI (0.4698, 2.242, 0.00979). */
  {
    cation: 'Mg2+',
    anion: 'Cl-',
    beta0: vi(0.4698),
    beta1: vi(2.242),
    cphi: viC(0.00979),
    maxMolal: 4.5,
    slope: { beta0: -0.194e-3, beta1: 2.78e-3 },
    source: `${PM73_VI}; slope ${P91_13}`,
  },
  /** MgBr2. PM73 Table VI (0.5769, 2.337, 0.00589). */
  { cation: 'Mg2+', anion: 'Br-', beta0: vi(0.5769), beta1: vi(2.337), cphi: viC(0.00589), maxMolal: 5, source: PM73_VI },
  /** Mg(NO3)2. PM73 Table VI (0.4895, 2.113, −0.03889). */
  { cation: 'Mg2+', anion: 'NO3-', beta0: vi(0.4895), beta1: vi(2.113), cphi: viC(-0.03889), maxMolal: 2, source: PM73_VI },
  /** Mg(ClO4)2. PM73 Table VI (0.6615, 2.678, 0.01806). */
  { cation: 'Mg2+', anion: 'ClO4-', beta0: vi(0.6615), beta1: vi(2.678), cphi: viC(0.01806), maxMolal: 2, source: PM73_VI },
  /** Mg(HSO4)2. HMW84, as in pitzer.dat. */
  { cation: 'Mg2+', anion: 'HSO4-', beta0: 0.4746, beta1: 1.729, cphi: 0, maxMolal: 6, source: HMW84 },
  /** CaCl2. PM73 Table VI (0.4212, 2.152, −0.00064); pitzer.dat (ref. 3) gives the same β. */
  {
    cation: 'Ca2+',
    anion: 'Cl-',
    beta0: vi(0.4212),
    beta1: vi(2.152),
    cphi: viC(-0.00064),
    maxMolal: 2.5,
    slope: { beta0: -0.561e-3, beta1: 2.66e-3 },
    source: `${PM73_VI}; slope ${P91_13}`,
  },
  /** CaBr2. PM73 Table VI (0.5088, 2.151, −0.00485). */
  { cation: 'Ca2+', anion: 'Br-', beta0: vi(0.5088), beta1: vi(2.151), cphi: viC(-0.00485), maxMolal: 2, source: PM73_VI },
  /** Ca(NO3)2. PM73 Table VI (0.2811, 1.879, −0.03798). */
  { cation: 'Ca2+', anion: 'NO3-', beta0: vi(0.2811), beta1: vi(1.879), cphi: viC(-0.03798), maxMolal: 2, source: PM73_VI },
  /** Ca(ClO4)2. PM73 Table VI (0.6015, 2.342, −0.00943). */
  { cation: 'Ca2+', anion: 'ClO4-', beta0: vi(0.6015), beta1: vi(2.342), cphi: viC(-0.00943), maxMolal: 2, source: PM73_VI },
  /** Ca(HSO4)2. HMW84, as in pitzer.dat. */
  { cation: 'Ca2+', anion: 'HSO4-', beta0: 0.2145, beta1: 2.53, cphi: 0, maxMolal: 6, source: HMW84 },
  /** Li2SO4. PM73 Table VI (0.1817, 1.694, −0.00753); pitzer.dat agrees (0.136275, 1.2705). */
  { cation: 'Li+', anion: 'SO4-2', beta0: vi(0.1817), beta1: vi(1.694), cphi: viC(-0.00753), maxMolal: 3, source: PM73_VI },
  /** Na2SO4. PM73 Table VI (0.0261, 1.484, 0.00938). */
  {
    cation: 'Na+',
    anion: 'SO4-2',
    beta0: vi(0.0261),
    beta1: vi(1.484),
    cphi: viC(0.00938),
    maxMolal: 4,
    slope: { beta0: 2.367e-3, beta1: 5.63e-3 },
    source: `${PM73_VI}; slope ${P91_13}`,
  },
  /** K2SO4. PM73 Table VI (0.0666, 1.039, 0). */
  { cation: 'K+', anion: 'SO4-2', beta0: vi(0.0666), beta1: vi(1.039), cphi: 0, maxMolal: 0.7, slope: { beta0: 1.44e-3, beta1: 6.7e-3 }, source: `${PM73_VI}; slope ${P91_13}` },
  /** Cs2SO4. PM73 Table VI (0.1184, 1.481, −0.01131). */
  { cation: 'Cs+', anion: 'SO4-2', beta0: vi(0.1184), beta1: vi(1.481), cphi: viC(-0.01131), maxMolal: 1.8, source: PM73_VI },
  /** (NH4)2SO4. PM73 Table VI (0.0545, 0.878, −0.00219). */
  { cation: 'NH4+', anion: 'SO4-2', beta0: vi(0.0545), beta1: vi(0.878), cphi: viC(-0.00219), maxMolal: 5.5, source: PM73_VI },
  /** Na2HPO4. PM73 Table VI (−0.0777, 1.954, 0.0554). */
  { cation: 'Na+', anion: 'HPO4-2', beta0: vi(-0.0777), beta1: vi(1.954), cphi: viC(0.0554), maxMolal: 1, source: PM73_VI },
  /** K2HPO4. PM73 Table VI (0.033, 1.699, 0.0309). */
  { cation: 'K+', anion: 'HPO4-2', beta0: vi(0.033), beta1: vi(1.699), cphi: viC(0.0309), maxMolal: 1, source: PM73_VI },
  /** Na2CO3. HMW84, as in pitzer.dat (0.0399, 1.389, 0.0044): fitted with carbonate speciated, unlike PM73 Table VI. */
  { cation: 'Na+', anion: 'CO3-2', beta0: 0.0399, beta1: 1.389, cphi: 0.0044, maxMolal: 1.5, source: HMW84 },
  /** K2CO3. HMW84, as in pitzer.dat (0.1488, 1.43, −0.0015). */
  { cation: 'K+', anion: 'CO3-2', beta0: 0.1488, beta1: 1.43, cphi: -0.0015, maxMolal: 1.5, source: HMW84 },

  // ── 1:3, PM73 Table VIII ──
  /** Na3PO4. PM73 Table VIII (0.2672, 5.777, −0.1339). */
  { cation: 'Na+', anion: 'PO4-3', beta0: viii(0.2672), beta1: viii(5.777), cphi: viiiC(-0.1339), maxMolal: 0.7, source: PM73_VIII },
  /** K3PO4. PM73 Table VIII (0.5594, 5.958, −0.2255). */
  { cation: 'K+', anion: 'PO4-3', beta0: viii(0.5594), beta1: viii(5.958), cphi: viiiC(-0.2255), maxMolal: 0.7, source: PM73_VIII },

  // ── 2:2 (α₁ = 1.4, α₂ = 12) ──
  /** MgSO4. HMW84 Table 1 (memory: 0.221, 3.343, −37.23, 0.025); pitzer.dat carries a temperature refit (0.2135, 3.367, −32.45 at 25 °C). */
  { cation: 'Mg2+', anion: 'SO4-2', beta0: 0.221, beta1: 3.343, beta2: -37.23, cphi: 0.025, alpha1: 1.4, maxMolal: 3, source: 'HMW84 Table 1 (memory)' },
  /** CaSO4. HMW84 Table 1 (memory: 0.2, 3.1973, −54.24, 0); only to gypsum saturation. */
  { cation: 'Ca2+', anion: 'SO4-2', beta0: 0.2, beta1: 3.1973, beta2: -54.24, cphi: 0, alpha1: 1.4, maxMolal: 0.02, source: 'HMW84 Table 1 (memory)' },
];

/** A like-charged pair's θ. */
export interface PitzerTheta {
  readonly a: PitzerIon;
  readonly b: PitzerIon;
  readonly theta: number;
  readonly source: string;
}

/** A triplet's ψ (two like-charged ions and one of the other sign). */
export interface PitzerPsi {
  readonly a: PitzerIon;
  readonly b: PitzerIon;
  readonly other: PitzerIon;
  readonly psi: number;
  readonly source: string;
}

/** Mixing θ (HMW84; used with the unsymmetrical-mixing term Eθ). */
export const PITZER_THETA: readonly PitzerTheta[] = [
  /** Na–K. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'K+', theta: -0.012, source: HMW84 },
  /** Na–H. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'H+', theta: 0.036, source: HMW84 },
  /** K–H. HMW84, pitzer.dat agrees. */
  { a: 'K+', b: 'H+', theta: 0.005, source: HMW84 },
  /** Na–Mg. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'Mg2+', theta: 0.07, source: HMW84 },
  /** Na–Ca. HMW84 (memory); pitzer.dat refit 0.0922. */
  { a: 'Na+', b: 'Ca2+', theta: 0.07, source: 'HMW84 (memory)' },
  /** Mg–Ca. HMW84, pitzer.dat agrees. */
  { a: 'Mg2+', b: 'Ca2+', theta: 0.007, source: HMW84 },
  /** H–Mg. HMW84, pitzer.dat agrees. */
  { a: 'H+', b: 'Mg2+', theta: 0.1, source: HMW84 },
  /** H–Ca. HMW84, pitzer.dat agrees. */
  { a: 'H+', b: 'Ca2+', theta: 0.092, source: HMW84 },
  /** Cl–SO4. HMW84 (memory); pitzer.dat refit 0.03. */
  { a: 'Cl-', b: 'SO4-2', theta: 0.02, source: 'HMW84 (memory)' },
  /** Cl–OH. HMW84, pitzer.dat agrees. */
  { a: 'Cl-', b: 'OH-', theta: -0.05, source: HMW84 },
  /** Cl–CO3. HMW84, pitzer.dat agrees. */
  { a: 'Cl-', b: 'CO3-2', theta: -0.02, source: HMW84 },
  /** Cl–HCO3. HMW84 (memory); pitzer.dat refit 0.0512. */
  { a: 'Cl-', b: 'HCO3-', theta: 0.03, source: 'HMW84 (memory)' },
  /** Cl–HSO4. HMW84, pitzer.dat agrees. */
  { a: 'Cl-', b: 'HSO4-', theta: -0.006, source: HMW84 },
  /** OH–SO4. HMW84, pitzer.dat agrees. */
  { a: 'OH-', b: 'SO4-2', theta: -0.013, source: HMW84 },
  /** OH–CO3. HMW84, pitzer.dat agrees. */
  { a: 'OH-', b: 'CO3-2', theta: 0.1, source: HMW84 },
  /** HCO3–CO3. HMW84, pitzer.dat agrees. */
  { a: 'HCO3-', b: 'CO3-2', theta: -0.04, source: HMW84 },
  /** SO4–CO3. HMW84, pitzer.dat agrees. */
  { a: 'SO4-2', b: 'CO3-2', theta: 0.02, source: HMW84 },
  /** SO4–HCO3. HMW84, pitzer.dat agrees. */
  { a: 'SO4-2', b: 'HCO3-', theta: 0.01, source: HMW84 },
];

/** Mixing ψ (HMW84). */
export const PITZER_PSI: readonly PitzerPsi[] = [
  /** Na–K–Cl. HMW84 (memory −0.0018); pitzer.dat refit −0.0015. */
  { a: 'Na+', b: 'K+', other: 'Cl-', psi: -0.0018, source: 'HMW84 (memory)' },
  /** Na–K–SO4. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'K+', other: 'SO4-2', psi: -0.01, source: HMW84 },
  /** Na–K–CO3. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'K+', other: 'CO3-2', psi: 0.003, source: HMW84 },
  /** Na–K–HCO3. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'K+', other: 'HCO3-', psi: -0.003, source: HMW84 },
  /** Na–H–Cl. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'H+', other: 'Cl-', psi: -0.004, source: HMW84 },
  /** K–H–Cl. HMW84, pitzer.dat agrees. */
  { a: 'K+', b: 'H+', other: 'Cl-', psi: -0.011, source: HMW84 },
  /** Na–Mg–Cl. HMW84, pitzer.dat agrees at 25 °C. */
  { a: 'Na+', b: 'Mg2+', other: 'Cl-', psi: -0.012, source: HMW84 },
  /** Na–Mg–SO4. HMW84, pitzer.dat agrees. */
  { a: 'Na+', b: 'Mg2+', other: 'SO4-2', psi: -0.015, source: HMW84 },
  /** K–Mg–SO4. HMW84, pitzer.dat agrees. */
  { a: 'K+', b: 'Mg2+', other: 'SO4-2', psi: -0.048, source: HMW84 },
  /** Mg–Ca–Cl. HMW84, pitzer.dat agrees. */
  { a: 'Mg2+', b: 'Ca2+', other: 'Cl-', psi: -0.012, source: HMW84 },
  /** H–Mg–Cl. HMW84, pitzer.dat agrees. */
  { a: 'H+', b: 'Mg2+', other: 'Cl-', psi: -0.011, source: HMW84 },
  /** H–Ca–Cl. HMW84, pitzer.dat agrees. */
  { a: 'H+', b: 'Ca2+', other: 'Cl-', psi: -0.015, source: HMW84 },
  /** Cl–OH–Na. HMW84, pitzer.dat agrees. */
  { a: 'Cl-', b: 'OH-', other: 'Na+', psi: -0.006, source: HMW84 },
  /** Cl–OH–K. HMW84, pitzer.dat agrees. */
  { a: 'Cl-', b: 'OH-', other: 'K+', psi: -0.006, source: HMW84 },
  /** Cl–CO3–Na. HMW84, pitzer.dat agrees. */
  { a: 'Cl-', b: 'CO3-2', other: 'Na+', psi: 0.0085, source: HMW84 },
  /** Cl–CO3–K. HMW84, pitzer.dat agrees. */
  { a: 'Cl-', b: 'CO3-2', other: 'K+', psi: 0.004, source: HMW84 },
  /** OH–SO4–Na. HMW84, pitzer.dat agrees. */
  { a: 'OH-', b: 'SO4-2', other: 'Na+', psi: -0.009, source: HMW84 },
  /** OH–SO4–K. HMW84, pitzer.dat agrees. */
  { a: 'OH-', b: 'SO4-2', other: 'K+', psi: -0.05, source: HMW84 },
  /** OH–CO3–Na. HMW84, pitzer.dat agrees. */
  { a: 'OH-', b: 'CO3-2', other: 'Na+', psi: -0.017, source: HMW84 },
  /** OH–CO3–K. HMW84, pitzer.dat agrees. */
  { a: 'OH-', b: 'CO3-2', other: 'K+', psi: -0.01, source: HMW84 },
  /** HCO3–CO3–Na. HMW84, pitzer.dat agrees. */
  { a: 'HCO3-', b: 'CO3-2', other: 'Na+', psi: 0.002, source: HMW84 },
  /** HCO3–CO3–K. HMW84, pitzer.dat agrees. */
  { a: 'HCO3-', b: 'CO3-2', other: 'K+', psi: 0.012, source: HMW84 },
  /** SO4–CO3–Na. HMW84, pitzer.dat agrees. */
  { a: 'SO4-2', b: 'CO3-2', other: 'Na+', psi: -0.005, source: HMW84 },
  /** SO4–CO3–K. HMW84, pitzer.dat agrees. */
  { a: 'SO4-2', b: 'CO3-2', other: 'K+', psi: -0.009, source: HMW84 },
];

/**
 * Fallback for a cation–anion pair with no published parameters (zwitterionic buffer
 * anions, citrate, user substances): β⁽⁰⁾ = 0, C^φ = 0 and a β⁽¹⁾ by charge type. Our own
 * rule, not a literature constant: β⁽¹⁾ depends mostly on the charge type. For a singly
 * charged partner, β⁽¹⁾ = 0.25·|z_M z_X|^{5/2}: 0.25 (1:1), 1.41 (1:2), 3.9 (1:3), 8 (1:4),
 * near the middle of PM73 Tables I, VI, VIII and IX for each type. When both ions are
 * multiply charged (2:2, 2:3 …), 3.3, the 2:2 sulfates' value (HMW84 MgSO4 3.343), since
 * the rule would run away there; β⁽⁰⁾, the salt-specific short-range term, has either sign
 * and is left at 0.
 */
export function fallbackBeta1(cationCharge: number, anionCharge: number): number {
  const zc = Math.abs(cationCharge);
  const za = Math.abs(anionCharge);
  if (zc >= 2 && za >= 2) return FALLBACK_BETA1_MULTIPLY_CHARGED;
  return 0.25 * Math.pow(zc * za, 2.5);
}

/** β⁽¹⁾ of the fallback when both ions are multiply charged: MgSO4's, HMW84 Table 1 (memory, 3.343), rounded. */
const FALLBACK_BETA1_MULTIPLY_CHARGED = 3.3;

/** Temperatures over which the tabulated slopes hold (P91 Tables 12–13 give first derivatives at 25 °C; Pitzer states them fit for about 0–50 °C), °C. */
export const PITZER_SLOPE_RANGE_C = { min: 0, max: 50 } as const;
