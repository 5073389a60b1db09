/**
 * The substance library: one typed table of acid–base systems and strong electrolytes,
 * each with the forms found on the shelf. Every constant names its source on its record,
 * the copies it was checked against (`checkedAgainst`, or `memory` when no copy was
 * found) and the temperatures its data cover. docs/constants.md explains the audit.
 *
 * Conventions: pKa at 25 °C and I = 0; ΔH° in kJ/mol; ΔCp° in J K⁻¹ mol⁻¹; steps in
 * order of proton loss from the most protonated form listed. A form's `adds` says which
 * system one mole adds and how many protons it has lost relative to that system's most
 * protonated form; with its counter-ions (and any strong-acid proton it releases) the
 * whole is neutral. Molar masses: listed = supplier label; computed from the formula.
 */
import { SourceId } from './sources';
import { CautionFlag, FormRecord, Provenance, SourcedStep, SubstanceRecord, SystemPortion, ValueCheck } from './types';

/** Most data Goldberg et al. 2002 reviewed span about 0–60 °C (memory of the review's literature tables); used where a step's own range was not read. */
const GOLDBERG_RANGE_C: readonly [number, number] = [0, 60];
/** Roy et al. measured the Good buffers they studied from 5 to 55 °C (278.15–328.15 K), the range in their titles and abstracts. */
const ROY_RANGE_C: readonly [number, number] = [5, 55];
/** Bates & Hetzer 1961 measured tris from 0 to 50 °C (the range in their title, as the pytzer reference list gives it). */
const TRIS_RANGE_C: readonly [number, number] = [0, 50];
/** Clegg, Rard & Pitzer 1994 fit HSO4− from 273.15 to 328.15 K (the range in their title, as the pytzer reference list gives it). */
const CRP94_RANGE_C: readonly [number, number] = [0, 55];
/** No ΔH° known: the pKa is held at its 25 °C value, fit for 25 ± 2 °C only. */
const NO_ENTHALPY_RANGE_C: readonly [number, number] = [23, 27];

/** A step's constants and where they come from, by name (so that ΔH° and ΔCp° cannot be swapped unnoticed). */
interface StepData {
  readonly source: SourceId;
  readonly entry: string;
  /** The copies the numbers were checked against, or `memory`. */
  readonly checkedAgainst: Provenance;
  /** Temperatures the step's data cover, °C. */
  readonly temperatureRangeC: readonly [number, number];
  /** pKa at 25 °C, I = 0. */
  readonly pKa: number;
  /** ΔH° of ionisation, kJ/mol. */
  readonly deltaHkJ?: number;
  /** ΔCp° of ionisation, J K⁻¹ mol⁻¹. */
  readonly deltaCpJ?: number;
  readonly note?: string;
}

function step(d: StepData): SourcedStep {
  return {
    pKa: d.pKa,
    ...(d.deltaHkJ === undefined ? {} : { deltaHkJ: d.deltaHkJ }),
    ...(d.deltaCpJ === undefined ? {} : { deltaCpJ: d.deltaCpJ }),
    source: d.source,
    entry: d.entry,
    checkedAgainst: d.checkedAgainst,
    temperatureRangeC: d.temperatureRangeC,
    ...(d.note === undefined ? {} : { note: d.note }),
  };
}

type GoldbergData = Omit<StepData, 'source' | 'checkedAgainst' | 'temperatureRangeC'> & { readonly temperatureRangeC?: readonly [number, number] };

/** Goldberg et al. 2002, checked against the copies named in `also` (at least one). */
const gv = (d: GoldbergData & { deltaHkJ: number; deltaCpJ: number; also: readonly [ValueCheck, ...ValueCheck[]] }) => {
  const { also, ...rest } = d;
  return step({ ...rest, source: 'goldberg2002', checkedAgainst: also, temperatureRangeC: d.temperatureRangeC ?? GOLDBERG_RANGE_C });
};
/** Goldberg et al. 2002, written from memory (no copy found). */
const gm = (d: GoldbergData) =>
  step({
    ...d,
    source: 'goldberg2002',
    checkedAgainst: 'memory',
    temperatureRangeC: d.temperatureRangeC ?? GOLDBERG_RANGE_C,
    note: d.note ?? '(memory) not checked against a copy of the source',
  });
/** A step without ΔH°, written from memory: its pKa holds at 25 ± 2 °C only. */
const roomOnly = (d: Omit<StepData, 'checkedAgainst' | 'temperatureRangeC' | 'deltaHkJ' | 'deltaCpJ'>) =>
  step({ ...d, checkedAgainst: 'memory', temperatureRangeC: NO_ENTHALPY_RANGE_C });

/** NIST46 holds the EDTA enthalpies at 25 °C only, with no ΔCp°: a constant ΔH° is trusted over about 0–50 °C (memory of common practice for van 't Hoff extrapolation). */
const EDTA_RANGE_C: readonly [number, number] = [0, 50];

/** An EDTA step from NIST46, read in minteq.v4 and compared with Hummel et al. 2005 as ThermoChimie carries it. */
const edta = (d: { entry: string; pKa: number; deltaHkJ: number; minteq: string; hummel: string }) =>
  step({
    source: 'nist46',
    entry: d.entry,
    pKa: d.pKa,
    deltaHkJ: d.deltaHkJ,
    temperatureRangeC: EDTA_RANGE_C,
    checkedAgainst: [
      { copy: 'minteqV4', where: 'the H+ + Edta-4 lines (NIST46.2), cumulative constants differenced', reads: d.minteq },
      { copy: 'hummel2005ThermoChimie', where: 'the H+ + Edta-4 lines (05HUM/AND), cumulative constants differenced', reads: d.hummel },
    ],
    note: 'Copies disagree: Hummel et al. 2005 extrapolate to I = 0 with the SIT and count NaEdta3− and KEdta3− as species, which raises the upper two pK by 0.3–0.5; NIST46 is kept because this tool does not model those sodium and potassium complexes, and its values describe EDTA in the sodium and potassium media buffers are made in. No ΔCp° in either copy.',
  });

/** Davies correction from I = 0.1 M to I = 0 at 25 °C for a step whose acid has lost `lost` protons from the neutral H4L: A·F(0.1)·(z_A² − z_HA²), A·F(0.1) = 0.5108 × 0.2103. */
const DAVIES_AT_0_1 = 0.5108 * 0.2103;

/** An EGTA step from memory of Martell & Smith (I = 0.1 M, 20 °C), brought to I = 0 with the Davies equation; no ΔH° known. */
const egta = (d: { entry: string; pKaAt01: number; lost: number }) =>
  roomOnly({
    source: 'martellSmith',
    entry: d.entry,
    pKa: Math.round((d.pKaAt01 + DAVIES_AT_0_1 * ((d.lost + 1) ** 2 - d.lost ** 2)) * 100) / 100,
    note: `(memory) pK ${d.pKaAt01} at I = 0.1 M and 20 °C as remembered from the table, not checked against a copy; brought to I = 0 by the Davies equation (${DAVIES_AT_0_1.toFixed(4)} × (z_A² − z_HA²)).`,
  });

/** A form on the shelf, by name: molar mass and what one mole adds are named fields. */
interface FormData extends Partial<Pick<FormRecord, 'protonsReleased' | 'cautions' | 'cautionNote' | 'note' | 'solubility'>> {
  readonly name: string;
  readonly aliases: readonly string[];
  readonly formula: string;
  /** Molar mass as printed on suppliers' labels, g/mol. */
  readonly listedMolarMass: number;
  readonly adds: readonly SystemPortion[];
  readonly counterIons?: Readonly<Record<string, number>>;
}

function form(d: FormData): FormRecord {
  const { counterIons, ...rest } = d;
  return { ...rest, listedMolarMassSource: 'supplierLabel', counterIons: counterIons ?? {} };
}

/** An acid–base system, by name. */
interface SystemData {
  readonly name: string;
  readonly aliases: readonly string[];
  readonly chargeOfMostProtonated: number;
  readonly steps: readonly SourcedStep[];
  readonly forms: readonly FormRecord[];
  readonly cautions?: readonly CautionFlag[];
  readonly cautionNote?: string;
  readonly note?: string;
}

function system(d: SystemData): SubstanceRecord {
  return {
    name: d.name,
    aliases: d.aliases,
    kind: 'acid-base',
    chargeOfMostProtonated: d.chargeOfMostProtonated,
    steps: d.steps,
    cautions: d.cautions ?? [],
    ...(d.cautionNote === undefined ? {} : { cautionNote: d.cautionNote }),
    ...(d.note === undefined ? {} : { note: d.note }),
    forms: d.forms,
  };
}

function strong(name: string, aliases: readonly string[], forms: readonly FormRecord[], cautions: readonly CautionFlag[] = [], cautionNote?: string): SubstanceRecord {
  return { name, aliases, kind: 'strong', chargeOfMostProtonated: 0, steps: [], cautions, ...(cautionNote === undefined ? {} : { cautionNote }), forms };
}

const GOOD_NOTE = 'Zwitterionic Good buffer; only the buffering step is listed (the sulfonate/carboxylate step lies below pH 2 and is not needed for recipes).';
const GOOD_CAUTION = 'May irritate eyes and skin as a powder; see the safety data sheet.';
const DISULFONATE_NOTE =
  "Piperazine disulfonate: the buffering step is HL− ⇌ L2−, so the most protonated form listed carries −1; the free acid's extra sulfonic-acid proton is treated as a strong acid (released to water). The free acid dissolves poorly until base is added.";

/** Every substance the library knows. */
export const SUBSTANCES: readonly SubstanceRecord[] = [
  // ── Zwitterionic Good buffers, in order of pKa ───────────────────────────────────────
  system({
    name: 'MES',
    aliases: ['2-(N-morpholino)ethanesulfonic acid', '2-morpholinoethanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'MES',
        pKa: 6.27,
        deltaHkJ: 14.8,
        deltaCpJ: 5,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer table, MES', reads: 'ΔH° 14800 J/mol, ΔCp° 5: same as stored' },
          { copy: 'royAbstracts', where: 'J. Solution Chem. 26 (1997) 1209 (MES, TES, 5–55 °C)', reads: 'pK2 6.269 at 25 °C: agrees' },
        ],
        temperatureRangeC: ROY_RANGE_C,
      }),
    ],
    forms: [
      form({
        name: 'MES free acid',
        aliases: ['MES', 'MES acid', 'MES anhydrous'],
        formula: 'C6H13NO4S',
        listedMolarMass: 195.24,
        adds: [{ system: 'MES', moles: 1, protonsLost: 0 }],
      }),
      form({
        name: 'MES monohydrate',
        aliases: ['MES hydrate', 'MES·H2O'],
        formula: 'C6H13NO4S·H2O',
        listedMolarMass: 213.25,
        adds: [{ system: 'MES', moles: 1, protonsLost: 0 }],
      }),
      form({
        name: 'MES sodium salt',
        aliases: ['MES sodium', 'sodium MES', 'MES Na'],
        formula: 'C6H12NNaO4S',
        listedMolarMass: 217.22,
        adds: [{ system: 'MES', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
    ],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'Bis-Tris',
    aliases: ['bis(2-hydroxyethyl)amino-tris(hydroxymethyl)methane', 'bistris', 'bis tris methane'],
    chargeOfMostProtonated: 1,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'bis-tris',
        pKa: 6.484,
        deltaHkJ: 28.4,
        deltaCpJ: 27,
        checkedAgainst: [
          { copy: 'goldbergItcTable', where: 'Buffer table, Bis-Tris', reads: 'ΔH° 28400 J/mol, ΔCp° +27: same as stored' },
          { copy: 'royAbstracts', where: 'J. Biophys. Chem. 5 (2014) 118, pKa = 921.66/T + 14.0007 − 1.86197 ln T', reads: 'pKa 6.4828, ΔH° 28.273 kJ/mol, ΔCp° +36 at 298.15 K' },
        ],
        temperatureRangeC: ROY_RANGE_C,
        note: "Copies disagree on ΔCp°: +27 (the ITC table, and the review as remembered) against +36 (Roy et al. 2014, measured after the review). +27, the review's selected value, kept.",
      }),
    ],
    forms: [
      form({
        name: 'Bis-Tris base',
        aliases: ['Bis-Tris', 'bistris base'],
        formula: 'C8H19NO5',
        listedMolarMass: 209.24,
        adds: [{ system: 'Bis-Tris', moles: 1, protonsLost: 1 }],
      }),
      form({
        name: 'Bis-Tris hydrochloride',
        aliases: ['Bis-Tris HCl', 'bistris hydrochloride'],
        formula: 'C8H19NO5·HCl',
        listedMolarMass: 245.7,
        adds: [{ system: 'Bis-Tris', moles: 1, protonsLost: 0 }],
        counterIons: { 'Cl-': 1 },
      }),
    ],
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'ADA',
    aliases: ['N-(2-acetamido)iminodiacetic acid', 'acetamidoiminodiacetic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'ADA, H2L± ⇌ HL− (reaction 2)',
        checkedAgainst: [{ copy: 'goldbergScanAda', where: 'p. 242, ADA literature table', reads: 'four literature pK values whose mean is 2.48' }],
        temperatureRangeC: NO_ENTHALPY_RANGE_C,
        pKa: 2.48,
        note: "Mean of the four literature values on the review's ADA page (scanned copy, p. 242), which the review's comment says it adopted; the printed selected value itself not seen. ΔH° not recorded.",
      }),
      step({
        source: 'goldberg2002',
        entry: 'ADA, HL− ⇌ L2− (reaction 3)',
        checkedAgainst: [
          { copy: 'goldbergScanAda', where: 'p. 242, Roy et al. 1981 line', reads: 'pK 6.844, ΔH° 12.23 kJ/mol, ΔCp° 144 with its sign lost in the scan' },
          { copy: 'goldbergItcTable', where: 'Buffer table, ADA', reads: 'ΔH° 12230 J/mol, ΔCp° −144: same as stored, sign included' },
        ],
        temperatureRangeC: GOLDBERG_RANGE_C,
        pKa: 6.844,
        deltaHkJ: 12.23,
        deltaCpJ: -144,
        note: '(memory) Matches the Roy et al. 1981 values quoted on the scanned p. 242 (pK 6.844, ΔH° 12.23 kJ/mol, ΔCp° 144 with its sign lost in the scan); the selected line itself not seen.',
      }),
    ],
    forms: [
      form({ name: 'ADA free acid', aliases: ['ADA'], formula: 'C6H10N2O5', listedMolarMass: 190.15, adds: [{ system: 'ADA', moles: 1, protonsLost: 0 }] }),
      form({
        name: 'ADA monosodium salt',
        aliases: ['ADA sodium salt', 'ADA sodium'],
        formula: 'C6H9N2NaO5',
        listedMolarMass: 212.14,
        adds: [{ system: 'ADA', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
    ],
    cautionNote: GOOD_CAUTION,
    note: 'Binds divalent metal ions (Ca2+, Mg2+, Cu2+); complexes are not modelled.',
  }),
  system({
    name: 'PIPES',
    aliases: ["piperazine-N,N'-bis(2-ethanesulfonic acid)", '1,4-piperazinediethanesulfonic acid'],
    chargeOfMostProtonated: -1,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'PIPES',
        pKa: 7.141,
        deltaHkJ: 11.2,
        deltaCpJ: 22,
        checkedAgainst: [{ copy: 'goldbergItcTable', where: 'Buffer table, PIPES', reads: 'ΔH° 11200 J/mol, ΔCp° +22: same as stored' }],
        temperatureRangeC: GOLDBERG_RANGE_C,
        note: 'ΔCp° +22 as the ITC table gives it (and the review as remembered).',
      }),
    ],
    forms: [
      form({
        name: 'PIPES free acid',
        aliases: ['PIPES', 'PIPES acid'],
        formula: 'C8H18N2O6S2',
        listedMolarMass: 302.37,
        adds: [{ system: 'PIPES', moles: 1, protonsLost: 0 }],
        counterIons: {},
        protonsReleased: 1,
      }),
      form({
        name: 'PIPES monosodium salt',
        aliases: ['PIPES sodium salt', 'PIPES sodium'],
        formula: 'C8H17N2NaO6S2',
        listedMolarMass: 324.35,
        adds: [{ system: 'PIPES', moles: 1, protonsLost: 0 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'PIPES disodium salt',
        aliases: ['PIPES disodium'],
        formula: 'C8H16N2Na2O6S2',
        listedMolarMass: 346.33,
        adds: [{ system: 'PIPES', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 2 },
      }),
    ],
    note: DISULFONATE_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'ACES',
    aliases: ['N-(2-acetamido)-2-aminoethanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'ACES',
        pKa: 6.847,
        deltaHkJ: 30.43,
        deltaCpJ: -49,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer table, ACES', reads: 'ΔH° 30430 J/mol, ΔCp° −49: same as stored' },
          {
            copy: 'royAbstracts',
            where: 'J. Chem. Eng. Data 42 (1997) 41, pK2 = 2548.60/T − 20.03159 + 3.2172 ln T',
            reads: 'pK 6.847, ΔH° 30.43 kJ/mol, ΔCp° −62 at 298.15 K: agrees (ΔCp° within 15)',
          },
        ],
        temperatureRangeC: ROY_RANGE_C,
      }),
    ],
    forms: [form({ name: 'ACES free acid', aliases: ['ACES'], formula: 'C4H10N2O4S', listedMolarMass: 182.2, adds: [{ system: 'ACES', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'MOPSO',
    aliases: ['3-morpholino-2-hydroxypropanesulfonic acid', '3-(N-morpholino)-2-hydroxypropanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'roy1997',
        entry: 'MOPSO, pK2',
        pKa: 6.877,
        deltaHkJ: 25.88,
        deltaCpJ: 59,
        checkedAgainst: [
          { copy: 'royAbstracts', where: 'J. Chem. Thermodyn. 29 (1997) 1323, pK2 = 432.25/T + 22.99923 − 3.08415 ln T', reads: 'pK 6.877, ΔH° 25.88 kJ/mol, ΔCp° 59 at 298.15 K' },
        ],
        temperatureRangeC: ROY_RANGE_C,
        note: 'All three constants read off the fitted equation of Roy et al. 1997 at 298.15 K (the review as remembered gives pK 6.90, ΔH° 25.0, ΔCp° 38, which lie 0.015–0.030 above the equation over 5–37 °C; these three follow it within 0.0005 from 5 to 55 °C).',
      }),
    ],
    forms: [
      form({ name: 'MOPSO free acid', aliases: ['MOPSO'], formula: 'C7H15NO5S', listedMolarMass: 225.26, adds: [{ system: 'MOPSO', moles: 1, protonsLost: 0 }] }),
      form({
        name: 'MOPSO sodium salt',
        aliases: ['MOPSO sodium'],
        formula: 'C7H14NNaO5S',
        listedMolarMass: 247.24,
        adds: [{ system: 'MOPSO', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
    ],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'BES',
    aliases: ['N,N-bis(2-hydroxyethyl)-2-aminoethanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'BES',
        pKa: 7.187,
        deltaHkJ: 24.25,
        deltaCpJ: -2,
        also: [{ copy: 'goldbergItcTable', where: 'Buffer table, BES', reads: 'ΔH° 24250 J/mol, ΔCp° −2: same as stored' }],
      }),
    ],
    forms: [form({ name: 'BES free acid', aliases: ['BES'], formula: 'C6H15NO5S', listedMolarMass: 213.25, adds: [{ system: 'BES', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'MOPS',
    aliases: ['3-(N-morpholino)propanesulfonic acid', '3-morpholinopropanesulfonic acid', '4-morpholinepropanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'MOPS',
        pKa: 7.184,
        deltaHkJ: 21.1,
        deltaCpJ: 25,
        checkedAgainst: [{ copy: 'goldbergItcTable', where: 'Buffer table, MOPS', reads: 'ΔH° 22200 J/mol, ΔCp° +25' }],
        temperatureRangeC: GOLDBERG_RANGE_C,
        note: 'ΔH° 21.1 is the review as remembered (memory); the ITC table gives 22.2. 21.1 kept: over 4–37 °C the difference moves pK by under 0.02. ΔCp° +25 as the ITC table gives it.',
      }),
    ],
    forms: [
      form({ name: 'MOPS free acid', aliases: ['MOPS', 'MOPS acid'], formula: 'C7H15NO4S', listedMolarMass: 209.26, adds: [{ system: 'MOPS', moles: 1, protonsLost: 0 }] }),
      form({
        name: 'MOPS sodium salt',
        aliases: ['MOPS sodium', 'sodium MOPS'],
        formula: 'C7H14NNaO4S',
        listedMolarMass: 231.25,
        adds: [{ system: 'MOPS', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
    ],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'TES',
    aliases: ['N-[tris(hydroxymethyl)methyl]-2-aminoethanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'TES',
        pKa: 7.55,
        deltaHkJ: 32.13,
        deltaCpJ: 0,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer table, TES', reads: 'ΔH° 32130 J/mol, ΔCp° 0: same as stored' },
          { copy: 'royAbstracts', where: 'J. Solution Chem. 26 (1997) 1209 (MES, TES, 5–55 °C)', reads: 'pK2 7.550 at 25 °C: same as stored' },
        ],
        temperatureRangeC: ROY_RANGE_C,
      }),
    ],
    forms: [
      form({ name: 'TES free acid', aliases: ['TES'], formula: 'C6H15NO6S', listedMolarMass: 229.25, adds: [{ system: 'TES', moles: 1, protonsLost: 0 }] }),
      form({
        name: 'TES sodium salt',
        aliases: ['TES sodium'],
        formula: 'C6H14NNaO6S',
        listedMolarMass: 251.23,
        adds: [{ system: 'TES', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
    ],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'HEPES',
    aliases: ['4-(2-hydroxyethyl)piperazine-1-ethanesulfonic acid', "N-(2-hydroxyethyl)piperazine-N'-(2-ethanesulfonic acid)"],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'HEPES',
        pKa: 7.564,
        deltaHkJ: 20.4,
        deltaCpJ: 47,
        also: [{ copy: 'goldbergItcTable', where: 'Buffer enum, HEPES', reads: 'ΔH° 20400 J/mol, ΔCp° 47: same as stored' }],
      }),
    ],
    forms: [
      form({ name: 'HEPES free acid', aliases: ['HEPES', 'HEPES acid'], formula: 'C8H18N2O4S', listedMolarMass: 238.3, adds: [{ system: 'HEPES', moles: 1, protonsLost: 0 }] }),
      form({
        name: 'HEPES sodium salt',
        aliases: ['HEPES sodium', 'sodium HEPES', 'HEPES Na'],
        formula: 'C8H17N2NaO4S',
        listedMolarMass: 260.29,
        adds: [{ system: 'HEPES', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'HEPES hemisodium salt',
        aliases: ['HEPES hemisodium'],
        formula: 'C8H17.5N2Na0.5O4S',
        listedMolarMass: 249.29,
        adds: [{ system: 'HEPES', moles: 1, protonsLost: 0.5 }],
        counterIons: { 'Na+': 0.5 },
      }),
    ],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'DIPSO',
    aliases: ['3-[N,N-bis(2-hydroxyethyl)amino]-2-hydroxypropanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [gm({ entry: 'DIPSO', pKa: 7.576, deltaHkJ: 30.18 })],
    forms: [form({ name: 'DIPSO free acid', aliases: ['DIPSO'], formula: 'C7H17NO6S', listedMolarMass: 243.28, adds: [{ system: 'DIPSO', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'TAPSO',
    aliases: ['3-[N-tris(hydroxymethyl)methylamino]-2-hydroxypropanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'TAPSO',
        pKa: 7.635,
        deltaHkJ: 39.09,
        deltaCpJ: -16,
        also: [
          { copy: 'goldbergReviewNote', where: 'TAPSO, Table 7.62', reads: 'pK 7.635, ΔH° 39.09 kJ/mol, ΔCp° −16: same as stored' },
          { copy: 'goldbergItcTable', where: 'Buffer table, TAPSO', reads: 'pK 7.635, ΔH° 39090 J/mol, ΔCp° −16: same as stored' },
          {
            copy: 'royAbstracts',
            where: 'J. Chem. Eng. Data 42 (1997) 446, pK2 = 2254.0057/T − 4.9783 + 0.88672 ln T',
            reads: "pK 7.634, ΔH° 38.09 kJ/mol, ΔCp° −17 at 298.15 K: pK and ΔCp° agree; ΔH° 1.0 kJ/mol below the review's 39.09, which three copies give and is kept",
          },
        ],
        temperatureRangeC: ROY_RANGE_C,
      }),
    ],
    forms: [form({ name: 'TAPSO free acid', aliases: ['TAPSO'], formula: 'C7H17NO7S', listedMolarMass: 259.28, adds: [{ system: 'TAPSO', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'POPSO',
    aliases: ["piperazine-N,N'-bis(2-hydroxypropanesulfonic acid)"],
    chargeOfMostProtonated: -1,
    steps: [
      step({
        source: 'roy2014',
        entry: 'POPSO, HL− ⇌ L2−',
        pKa: 7.803,
        deltaHkJ: 19.88,
        deltaCpJ: 134,
        temperatureRangeC: ROY_RANGE_C,
        checkedAgainst: [
          {
            copy: 'royAbstracts',
            where: 'J. Biophys. Chem. 5 (2014) 143, pK2 = −1041.77/T + 51.0459 − 6.97646 ln T',
            reads: 'pK 7.8027 at 298.15 K (the abstract prints 7.8029), 7.686 at 310.15 K; ΔH° 19.88 kJ/mol and ΔCp° 134 read off the equation',
          },
        ],
        note: 'Replaces pK 7.78 and ΔH° 25.3 (no ΔCp°), both from memory, with Roy et al. 2014.',
      }),
    ],
    forms: [
      form({
        name: 'POPSO free acid',
        aliases: ['POPSO'],
        formula: 'C10H22N2O8S2',
        listedMolarMass: 362.42,
        adds: [{ system: 'POPSO', moles: 1, protonsLost: 0 }],
        counterIons: {},
        protonsReleased: 1,
      }),
    ],
    note: DISULFONATE_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'HEPPSO',
    aliases: ["N-(2-hydroxyethyl)piperazine-N'-(2-hydroxypropanesulfonic acid)"],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'HEPPSO',
        pKa: 8.042,
        deltaHkJ: 23.7,
        deltaCpJ: 47,
        temperatureRangeC: ROY_RANGE_C,
        also: [
          {
            copy: 'royAbstracts',
            where: 'Roy et al., HEPPSO 5–55 °C (Springer, doi 10.1023/A:1022600604950)',
            reads: 'pK2 8.042 at 25 °C and 7.876 at 37 °C; the stored constants give 8.042 and 7.881: agrees',
          },
        ],
      }),
    ],
    forms: [form({ name: 'HEPPSO free acid', aliases: ['HEPPSO'], formula: 'C9H20N2O5S', listedMolarMass: 268.33, adds: [{ system: 'HEPPSO', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'EPPS',
    aliases: ['HEPPS', '4-(2-hydroxyethyl)piperazine-1-propanesulfonic acid', "N-(2-hydroxyethyl)piperazine-N'-(3-propanesulfonic acid)"],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'HEPPS (EPPS)',
        pKa: 7.957,
        deltaHkJ: 21.5,
        deltaCpJ: 47,
        temperatureRangeC: ROY_RANGE_C,
        checkedAgainst: [
          {
            copy: 'royAbstracts',
            where: 'J. Chem. Thermodyn. 29 (1997) 1323, pK2 = 359.23/T + 21.0324 − 2.50647 ln T',
            reads: 'pK 7.956, ΔH° 21.18 kJ/mol, ΔCp° 48 at 298.15 K: agrees',
          },
        ],
        note: 'Values from memory of the review, confirmed by Roy et al. 1997.',
      }),
    ],
    forms: [
      form({ name: 'EPPS free acid', aliases: ['EPPS', 'HEPPS free acid'], formula: 'C9H20N2O4S', listedMolarMass: 252.33, adds: [{ system: 'EPPS', moles: 1, protonsLost: 0 }] }),
    ],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'tricine',
    aliases: ['N-[tris(hydroxymethyl)methyl]glycine'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'tricine',
        pKa: 8.135,
        deltaHkJ: 31.37,
        deltaCpJ: -53,
        also: [{ copy: 'goldbergItcTable', where: 'Buffer table, Tricine', reads: 'ΔH° 31370 J/mol, ΔCp° −53: same as stored' }],
      }),
    ],
    forms: [form({ name: 'tricine free acid', aliases: ['tricine'], formula: 'C6H13NO5', listedMolarMass: 179.17, adds: [{ system: 'tricine', moles: 1, protonsLost: 0 }] })],
    note: 'Zwitterionic glycine derivative; only the amine step is listed (the carboxyl step lies near pH 2).',
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'bicine',
    aliases: ['N,N-bis(2-hydroxyethyl)glycine'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'bicine',
        pKa: 8.334,
        deltaHkJ: 26.34,
        deltaCpJ: 0,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer table, Bicine', reads: 'ΔH° 26340 J/mol, ΔCp° 0: same as stored' },
          {
            copy: 'royAbstracts',
            where: 'J. Solution Chem. 35 (2006) 605 (BICINE, 5–55 °C)',
            reads: 'pK2 8.333 at 25 °C and 8.156 at 37 °C; the stored constants give 8.334 and 8.156: agrees',
          },
        ],
        temperatureRangeC: ROY_RANGE_C,
      }),
    ],
    forms: [form({ name: 'bicine free acid', aliases: ['bicine'], formula: 'C6H13NO4', listedMolarMass: 163.17, adds: [{ system: 'bicine', moles: 1, protonsLost: 0 }] })],
    note: 'Zwitterionic glycine derivative; only the amine step is listed (the carboxyl step lies near pH 2).',
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'TAPS',
    aliases: ['N-[tris(hydroxymethyl)methyl]-3-aminopropanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'TAPS',
        pKa: 8.44,
        deltaHkJ: 40.4,
        deltaCpJ: 15,
        also: [{ copy: 'goldbergItcTable', where: 'Buffer table, TAPS', reads: 'ΔH° 40400 J/mol, ΔCp° 15: same as stored' }],
      }),
    ],
    forms: [
      form({ name: 'TAPS free acid', aliases: ['TAPS'], formula: 'C7H17NO6S', listedMolarMass: 243.28, adds: [{ system: 'TAPS', moles: 1, protonsLost: 0 }] }),
      form({
        name: 'TAPS sodium salt',
        aliases: ['TAPS sodium'],
        formula: 'C7H16NNaO6S',
        listedMolarMass: 265.26,
        adds: [{ system: 'TAPS', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
    ],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'AMPSO',
    aliases: ['3-[(1,1-dimethyl-2-hydroxyethyl)amino]-2-hydroxypropanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [gm({ entry: 'AMPSO', pKa: 9.138, deltaHkJ: 43.19 })],
    forms: [form({ name: 'AMPSO free acid', aliases: ['AMPSO'], formula: 'C7H17NO5S', listedMolarMass: 227.28, adds: [{ system: 'AMPSO', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'CHES',
    aliases: ['2-(N-cyclohexylamino)ethanesulfonic acid', '2-(cyclohexylamino)ethanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'CHES',
        pKa: 9.394,
        deltaHkJ: 39.55,
        deltaCpJ: 9,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer table, CHES', reads: 'ΔH° 39550 J/mol, ΔCp° 9: same as stored' },
          {
            copy: 'royAbstracts',
            where: 'J. Chem. Eng. Data 42 (1997) 41, pK2 = 1917.66/T + 5.7940 − 0.4971 ln T',
            reads: 'pK 9.394, ΔH° 39.55 kJ/mol, ΔCp° 10 at 298.15 K: agrees',
          },
        ],
        temperatureRangeC: ROY_RANGE_C,
      }),
    ],
    forms: [form({ name: 'CHES free acid', aliases: ['CHES'], formula: 'C8H17NO3S', listedMolarMass: 207.29, adds: [{ system: 'CHES', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'CAPSO',
    aliases: ['3-(cyclohexylamino)-2-hydroxy-1-propanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'CAPSO',
        pKa: 9.825,
        deltaHkJ: 46.67,
        deltaCpJ: 21,
        temperatureRangeC: ROY_RANGE_C,
        checkedAgainst: [
          { copy: 'royAbstracts', where: 'J. Chem. Thermodyn. 29 (1997) 749, pK2 = 2106.21/T + 9.08772 − 1.11049 ln T', reads: 'pK 9.825, ΔH° 46.66 kJ/mol, ΔCp° 21 at 298.15 K' },
        ],
        note: 'pK and ΔH° from memory of the review, confirmed by Roy et al. 1997; ΔCp° 21 taken from their fit (before: none).',
      }),
    ],
    forms: [form({ name: 'CAPSO free acid', aliases: ['CAPSO'], formula: 'C9H19NO4S', listedMolarMass: 237.32, adds: [{ system: 'CAPSO', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'CAPS',
    aliases: ['3-(cyclohexylamino)-1-propanesulfonic acid', 'N-cyclohexyl-3-aminopropanesulfonic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'CAPS',
        pKa: 10.499,
        deltaHkJ: 48.1,
        deltaCpJ: 57,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer table, CAPS', reads: 'ΔH° 48100 J/mol, ΔCp° 57: same as stored' },
          {
            copy: 'royAbstracts',
            where: 'J. Chem. Thermodyn. 29 (1997) 749, pK2 = 1046.64/T + 35.10191 − 4.9342 ln T',
            reads: "pK 10.499, ΔH° 48.20 kJ/mol at 298.15 K: agree; ΔCp° 94 against the review's 57, which two copies give and is kept",
          },
        ],
        temperatureRangeC: ROY_RANGE_C,
      }),
    ],
    forms: [form({ name: 'CAPS free acid', aliases: ['CAPS'], formula: 'C9H19NO3S', listedMolarMass: 221.32, adds: [{ system: 'CAPS', moles: 1, protonsLost: 0 }] })],
    note: GOOD_NOTE,
    cautionNote: GOOD_CAUTION,
  }),

  // ── Amines ──────────────────────────────────────────────────────────────────────────
  system({
    name: 'tris',
    aliases: ['tris(hydroxymethyl)aminomethane', 'trometamol', 'tromethamine', '2-amino-2-(hydroxymethyl)propane-1,3-diol'],
    chargeOfMostProtonated: 1,
    steps: [
      gv({
        entry: 'tris',
        pKa: 8.072,
        deltaHkJ: 47.45,
        deltaCpJ: -59,
        temperatureRangeC: TRIS_RANGE_C,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer enum, Tris', reads: 'ΔH° 47450 J/mol, ΔCp° −59: same as stored' },
          { copy: 'pytzerDissociation', where: 'trisH_BH61 (Bates & Hetzer 1961 eq. 3)', reads: 'pK 8.0719, ΔH° 47.60 kJ/mol, ΔCp° −64 at 298.15 K: agrees within 0.001 in pK' },
        ],
      }),
    ],
    forms: [
      form({
        name: 'tris base',
        aliases: ['tris', 'tris free base', 'tromethamine base'],
        formula: 'C4H11NO3',
        listedMolarMass: 121.14,
        adds: [{ system: 'tris', moles: 1, protonsLost: 1 }],
        counterIons: {},
        solubility: { gramsPerLitre: 550, temperatureC: 25, source: 'supplierLabel', checkedAgainst: 'memory' },
      }),
      form({
        name: 'tris hydrochloride',
        aliases: ['tris HCl', 'tris-HCl', 'tromethamine hydrochloride'],
        formula: 'C4H11NO3·HCl',
        listedMolarMass: 157.6,
        adds: [{ system: 'tris', moles: 1, protonsLost: 0 }],
        counterIons: { 'Cl-': 1 },
      }),
    ],
    cautionNote: 'Irritating to eyes as a powder. Its pH moves about −0.03 per °C: adjust at the working temperature.',
    cautions: ['irritant'],
  }),
  system({
    name: 'bis-tris propane',
    aliases: ['BTP', '1,3-bis[tris(hydroxymethyl)methylamino]propane', 'bis tris propane'],
    chargeOfMostProtonated: 2,
    steps: [gm({ entry: 'bis-tris propane, H2L2+ ⇌ HL+', pKa: 6.65, deltaHkJ: 28.4 }), gm({ entry: 'bis-tris propane, HL+ ⇌ L', pKa: 9.1, deltaHkJ: 29.7 })],
    forms: [
      form({
        name: 'bis-tris propane base',
        aliases: ['bis-tris propane', 'BTP base'],
        formula: 'C11H26N2O6',
        listedMolarMass: 282.33,
        adds: [{ system: 'bis-tris propane', moles: 1, protonsLost: 2 }],
      }),
    ],
    cautionNote: GOOD_CAUTION,
  }),
  system({
    name: 'triethanolamine',
    aliases: ['TEA', 'tris(2-hydroxyethyl)amine', "2,2',2''-nitrilotriethanol", 'TEOA'],
    chargeOfMostProtonated: 1,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'triethanolamine',
        pKa: 7.762,
        deltaHkJ: 33.6,
        deltaCpJ: 50,
        temperatureRangeC: [0, 50],
        checkedAgainst: [
          {
            copy: 'batesAllen1960',
            where: 'abstract',
            reads: 'ΔH° 33 450 J/mol and ΔCp° 52 at 25 °C, measured from 0 to 50 °C: agrees (0.15 kJ/mol, 2 J K⁻¹ mol⁻¹); the abstract as indexed omits the pK formula',
          },
        ],
        note: 'pK 7.762 from memory of the review (not in the copy); ΔH° and ΔCp° confirmed by Bates & Allen 1960.',
      }),
    ],
    forms: [
      form({
        name: 'triethanolamine base',
        aliases: ['triethanolamine', 'TEA base'],
        formula: 'C6H15NO3',
        listedMolarMass: 149.19,
        adds: [{ system: 'triethanolamine', moles: 1, protonsLost: 1 }],
      }),
      form({
        name: 'triethanolamine hydrochloride',
        aliases: ['TEA HCl', 'triethanolamine HCl'],
        formula: 'C6H15NO3·HCl',
        listedMolarMass: 185.65,
        adds: [{ system: 'triethanolamine', moles: 1, protonsLost: 0 }],
        counterIons: { 'Cl-': 1 },
      }),
    ],
    cautions: ['irritant'],
    cautionNote: 'Viscous liquid; irritating to eyes and skin.',
  }),
  system({
    name: 'imidazole',
    aliases: ['1,3-diazole', 'glyoxaline'],
    chargeOfMostProtonated: 1,
    steps: [
      gv({
        entry: 'imidazole',
        pKa: 6.993,
        deltaHkJ: 36.64,
        deltaCpJ: -9,
        also: [{ copy: 'goldbergReviewNote', where: 'imidazole, Table 7.41', reads: 'pK 6.993, ΔH° 36.64 kJ/mol, ΔCp° −9: same as stored' }],
      }),
    ],
    forms: [form({ name: 'imidazole base', aliases: ['imidazole'], formula: 'C3H4N2', listedMolarMass: 68.08, adds: [{ system: 'imidazole', moles: 1, protonsLost: 1 }] })],
    cautions: ['corrosive', 'toxic'],
    cautionNote: 'Causes burns and may harm fertility or the unborn child (reproductive toxicant); wear gloves and eye protection.',
  }),
  system({
    name: '2-amino-2-methyl-1-propanol',
    aliases: ['AMP', 'aminomethylpropanol', '2-amino-2-methylpropan-1-ol'],
    chargeOfMostProtonated: 1,
    steps: [gm({ entry: '2-amino-2-methyl-1-propanol', pKa: 9.694, deltaHkJ: 54.05 })],
    forms: [
      form({
        name: '2-amino-2-methyl-1-propanol base',
        aliases: ['AMP base', '2-amino-2-methyl-1-propanol'],
        formula: 'C4H11NO',
        listedMolarMass: 89.14,
        adds: [{ system: '2-amino-2-methyl-1-propanol', moles: 1, protonsLost: 1 }],
      }),
    ],
    cautions: ['irritant'],
    cautionNote: 'Liquid or low-melting solid; irritating to eyes and skin.',
  }),
  system({
    name: '2-amino-2-methyl-1,3-propanediol',
    aliases: ['AMPD', 'ammediol'],
    chargeOfMostProtonated: 1,
    steps: [gm({ entry: '2-amino-2-methyl-1,3-propanediol', pKa: 8.801, deltaHkJ: 49.85 })],
    forms: [
      form({
        name: 'AMPD base',
        aliases: ['AMPD', '2-amino-2-methyl-1,3-propanediol'],
        formula: 'C4H11NO2',
        listedMolarMass: 105.14,
        adds: [{ system: '2-amino-2-methyl-1,3-propanediol', moles: 1, protonsLost: 1 }],
      }),
    ],
    cautions: ['irritant'],
    cautionNote: 'Irritating to eyes and skin.',
  }),
  system({
    name: 'ethanolamine',
    aliases: ['monoethanolamine', 'MEA', '2-aminoethanol', 'colamine'],
    chargeOfMostProtonated: 1,
    steps: [gm({ entry: 'ethanolamine', pKa: 9.498, deltaHkJ: 50.52 })],
    forms: [
      form({
        name: 'ethanolamine base',
        aliases: ['ethanolamine', 'monoethanolamine'],
        formula: 'C2H7NO',
        listedMolarMass: 61.08,
        adds: [{ system: 'ethanolamine', moles: 1, protonsLost: 1 }],
      }),
    ],
    cautions: ['corrosive'],
    cautionNote: 'Corrosive liquid: causes skin burns and eye damage.',
  }),
  system({
    name: 'diethanolamine',
    aliases: ['DEA', 'DEOA', "2,2'-iminodiethanol"],
    chargeOfMostProtonated: 1,
    steps: [gm({ entry: 'diethanolamine', pKa: 8.883, deltaHkJ: 42.08 })],
    forms: [
      form({
        name: 'diethanolamine base',
        aliases: ['diethanolamine'],
        formula: 'C4H11NO2',
        listedMolarMass: 105.14,
        adds: [{ system: 'diethanolamine', moles: 1, protonsLost: 1 }],
      }),
    ],
    cautions: ['irritant', 'toxic'],
    cautionNote: 'Irritating to eyes and skin; harmful with repeated exposure.',
  }),
  system({
    name: 'piperazine',
    aliases: ['diethylenediamine', '1,4-diazacyclohexane'],
    chargeOfMostProtonated: 2,
    steps: [gm({ entry: 'piperazine, H2L2+ ⇌ HL+', pKa: 5.333, deltaHkJ: 31.11 }), gm({ entry: 'piperazine, HL+ ⇌ L', pKa: 9.731, deltaHkJ: 42.89 })],
    forms: [
      form({ name: 'piperazine anhydrous', aliases: ['piperazine'], formula: 'C4H10N2', listedMolarMass: 86.14, adds: [{ system: 'piperazine', moles: 1, protonsLost: 2 }] }),
      form({
        name: 'piperazine hexahydrate',
        aliases: ['piperazine·6H2O'],
        formula: 'C4H10N2·6H2O',
        listedMolarMass: 194.23,
        adds: [{ system: 'piperazine', moles: 1, protonsLost: 2 }],
      }),
    ],
    cautions: ['corrosive'],
    cautionNote: 'Causes burns and may cause skin or breathing sensitisation.',
  }),
  system({
    name: 'ammonia',
    aliases: ['ammonium', 'NH3', 'NH4+'],
    chargeOfMostProtonated: 1,
    steps: [
      gv({
        entry: 'ammonia (ammonium ion)',
        pKa: 9.245,
        deltaHkJ: 51.95,
        deltaCpJ: 8,
        temperatureRangeC: [0, 50],
        also: [{ copy: 'pytzerDissociation', where: 'NH4_MP98 (Bates & Pinching 1949)', reads: 'pK 9.2447, ΔH° 52.38 kJ/mol, ΔCp° 1 at 298.15 K: agrees' }],
      }),
    ],
    forms: [
      form({
        name: 'ammonium chloride',
        aliases: ['NH4Cl', 'sal ammoniac'],
        formula: 'NH4Cl',
        listedMolarMass: 53.49,
        adds: [{ system: 'ammonia', moles: 1, protonsLost: 0 }],
        counterIons: { 'Cl-': 1 },
        cautions: ['irritant'],
        cautionNote: 'Harmful if swallowed; irritating to eyes.',
      }),
      form({
        name: 'ammonium sulfate',
        aliases: ['(NH4)2SO4', 'ammonium sulphate'],
        formula: '(NH4)2SO4',
        listedMolarMass: 132.14,
        adds: [
          { system: 'ammonia', moles: 2, protonsLost: 0 },
          { system: 'sulfate', moles: 1, protonsLost: 2 },
        ],
      }),
      form({
        name: 'ammonium acetate',
        aliases: ['NH4OAc', 'CH3COONH4'],
        formula: 'C2H7NO2',
        listedMolarMass: 77.08,
        adds: [
          { system: 'ammonia', moles: 1, protonsLost: 0 },
          { system: 'acetate', moles: 1, protonsLost: 1 },
        ],
      }),
      form({
        name: 'ammonium formate',
        aliases: ['HCOONH4'],
        formula: 'CH5NO2',
        listedMolarMass: 63.06,
        adds: [
          { system: 'ammonia', moles: 1, protonsLost: 0 },
          { system: 'formate', moles: 1, protonsLost: 1 },
        ],
      }),
      form({
        name: 'ammonia (dissolved)',
        aliases: ['ammonia solution', 'ammonium hydroxide', 'aqueous ammonia', 'NH4OH'],
        formula: 'NH3',
        listedMolarMass: 17.03,
        adds: [{ system: 'ammonia', moles: 1, protonsLost: 1 }],
        counterIons: {},
        cautions: ['corrosive'],
        cautionNote: "Concentrated solutions are corrosive and give off pungent ammonia gas; work in a fume hood. The amount is that of NH3: read the bottle's assay.",
      }),
    ],
  }),

  // ── Amino acids and peptides ────────────────────────────────────────────────────────
  system({
    name: 'glycine',
    aliases: ['Gly', 'aminoacetic acid', 'aminoethanoic acid'],
    chargeOfMostProtonated: 1,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'glycine, H2L+ ⇌ HL±',
        pKa: 2.351,
        deltaHkJ: 4.0,
        deltaCpJ: -139,
        temperatureRangeC: GOLDBERG_RANGE_C,
        checkedAgainst: [
          { copy: 'minteqV4', where: 'H+ + Glycine- and 2H+ + Glycine- (NIST46.2)', reads: 'pK 12.128 − 9.778 = 2.350, ΔH° 48.45 − 44.35 = 4.10 kJ/mol: agrees; no ΔCp°' },
        ],
        note: 'ΔCp° −139 from memory of the review (the copy gives none).',
      }),
      gv({
        entry: 'glycine, HL± ⇌ L−',
        pKa: 9.78,
        deltaHkJ: 44.2,
        deltaCpJ: -57,
        also: [{ copy: 'minteqV4', where: 'H+ + Glycine- = H(Glycine) (NIST46.2)', reads: 'log K 9.778, ΔH 44.35 kJ/mol: agrees' }],
      }),
    ],
    forms: [
      form({
        name: 'glycine',
        aliases: ['glycine free base', 'glycine zwitterion'],
        formula: 'C2H5NO2',
        listedMolarMass: 75.07,
        adds: [{ system: 'glycine', moles: 1, protonsLost: 1 }],
      }),
    ],
  }),
  system({
    name: 'glycylglycine',
    aliases: ['Gly-Gly', 'glygly', 'diglycine'],
    chargeOfMostProtonated: 1,
    steps: [
      gm({ entry: 'glycylglycine, H2L+ ⇌ HL±', pKa: 3.14, deltaHkJ: 0.11, deltaCpJ: -120 }),
      gm({ entry: 'glycylglycine, HL± ⇌ L−', pKa: 8.265, deltaHkJ: 43.4, deltaCpJ: -16 }),
    ],
    forms: [
      form({
        name: 'glycylglycine free base',
        aliases: ['glycylglycine', 'Gly-Gly'],
        formula: 'C4H8N2O3',
        listedMolarMass: 132.12,
        adds: [{ system: 'glycylglycine', moles: 1, protonsLost: 1 }],
      }),
    ],
  }),
  system({
    name: 'histidine',
    aliases: ['L-histidine', 'His'],
    chargeOfMostProtonated: 2,
    steps: [
      roomOnly({ source: 'crcDissociation', entry: 'L-histidine, carboxyl', pKa: 1.8, note: '(memory) ΔH° not recorded: pKa held at its 25 °C value.' }),
      step({
        source: 'crcDissociation',
        entry: 'L-histidine, imidazolium',
        pKa: 6.04,
        deltaHkJ: 29.5,
        checkedAgainst: [{ copy: 'goldbergItcTable', where: 'Buffer table, L-Histidine', reads: 'ΔH° 29500 J/mol and ΔCp° +176 (its source not stated); pK 6.07' }],
        temperatureRangeC: [0, 50],
        note: 'ΔH° 29.5 kJ/mol from the ITC table, which agrees with calorimetric compilations as remembered (about 29.3). Its ΔCp° +176 is not taken: one copy, source not stated. pK 6.04 (memory) kept. The range is where such calorimetric ΔH° are usually measured (memory).',
      }),
      step({
        source: 'crcDissociation',
        entry: 'L-histidine, ammonium',
        pKa: 9.33,
        deltaHkJ: 43.5,
        checkedAgainst: 'memory',
        temperatureRangeC: [0, 50],
        note: '(memory) ΔH° about 43.5 kJ/mol (10.4 kcal/mol) from calorimetric compilations of proton-ionization heats, as remembered; ΔCp° not recorded; the range is where such data are usually measured. Not checked against a copy.',
      }),
    ],
    forms: [
      form({
        name: 'L-histidine',
        aliases: ['histidine', 'histidine free base'],
        formula: 'C6H9N3O2',
        listedMolarMass: 155.15,
        adds: [{ system: 'histidine', moles: 1, protonsLost: 2 }],
      }),
      form({
        name: 'L-histidine monohydrochloride monohydrate',
        aliases: ['histidine HCl', 'histidine hydrochloride', 'histidine HCl H2O', 'L-histidine hydrochloride monohydrate'],
        formula: 'C6H9N3O2·HCl·H2O',
        listedMolarMass: 209.63,
        adds: [{ system: 'histidine', moles: 1, protonsLost: 1 }],
        counterIons: { 'Cl-': 1 },
      }),
    ],
  }),

  // ── Inorganic acids ─────────────────────────────────────────────────────────────────
  system({
    name: 'phosphate',
    aliases: ['phosphoric acid', 'orthophosphate', 'H3PO4', 'Pi'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'phosphoric acid, H3PO4 ⇌ H2PO4−',
        pKa: 2.148,
        deltaHkJ: -8.0,
        deltaCpJ: -141,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer enum, Phosphate (comment)', reads: 'ΔH° −8000 J/mol, ΔCp° −141: same as stored' },
          { copy: 'pytzerDissociation', where: 'H3PO4_MP98 (Bates 1951)', reads: 'pK 2.149, ΔH° −7.69 kJ/mol, ΔCp° −153 at 298.15 K' },
        ],
      }),
      gv({
        entry: 'phosphoric acid, H2PO4− ⇌ HPO42−',
        pKa: 7.198,
        deltaHkJ: 3.6,
        deltaCpJ: -230,
        also: [
          { copy: 'pytzerDissociation', where: 'H2PO4_MP98 (Bates & Acree 1943)', reads: 'pK 7.1998, ΔH° 4.06 kJ/mol, ΔCp° −232 at 298.15 K' },
          {
            copy: 'goldbergItcTable',
            where: 'Buffer enum, Phosphate',
            reads: 'ΔH° 5120 J/mol, ΔCp° −187: disagrees; not kept (the other two copies agree with the stored values)',
          },
        ],
      }),
      gv({
        entry: 'phosphoric acid, HPO42− ⇌ PO43−',
        pKa: 12.35,
        deltaHkJ: 16.0,
        deltaCpJ: -242,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer enum, Phosphate (comment)', reads: 'ΔH° 16000 J/mol, ΔCp° −242: same as stored' },
          {
            copy: 'pytzerDissociation',
            where: 'HPO4_MP98 (Schwarzenbach & Meier 1964, two-term fit)',
            reads: "pK 12.345, ΔH° 25.5 kJ/mol, ΔCp° 0: disagrees on ΔH°; the review's value kept (a two-term fit cannot carry ΔCp°)",
          },
        ],
      }),
    ],
    forms: [
      form({
        name: 'phosphoric acid',
        aliases: ['orthophosphoric acid', 'H3PO4'],
        formula: 'H3PO4',
        listedMolarMass: 98.0,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['corrosive'],
        cautionNote: 'Concentrated acid causes burns. The amount is that of H3PO4: read the assay (85 % is typical).',
      }),
      form({
        name: 'sodium phosphate monobasic anhydrous',
        aliases: ['sodium dihydrogen phosphate', 'monosodium phosphate', 'NaH2PO4', 'NaH2PO4 anhydrous', 'sodium phosphate monobasic', 'sodium dihydrogen phosphate anhydrous'],
        formula: 'NaH2PO4',
        listedMolarMass: 119.98,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'sodium phosphate monobasic monohydrate',
        aliases: ['NaH2PO4·H2O', 'sodium dihydrogen phosphate monohydrate', 'monosodium phosphate monohydrate'],
        formula: 'NaH2PO4·H2O',
        listedMolarMass: 137.99,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'sodium phosphate monobasic dihydrate',
        aliases: ['NaH2PO4·2H2O', 'sodium dihydrogen phosphate dihydrate', 'monosodium phosphate dihydrate'],
        formula: 'NaH2PO4·2H2O',
        listedMolarMass: 156.01,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'sodium phosphate dibasic anhydrous',
        aliases: ['disodium hydrogen phosphate', 'disodium phosphate', 'Na2HPO4', 'Na2HPO4 anhydrous', 'sodium phosphate dibasic', 'disodium hydrogen phosphate anhydrous'],
        formula: 'Na2HPO4',
        listedMolarMass: 141.96,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
        solubility: { gramsPerLitre: 77, temperatureC: 20, source: 'crcSolubility', checkedAgainst: 'memory' },
      }),
      form({
        name: 'sodium phosphate dibasic dihydrate',
        aliases: ['Na2HPO4·2H2O', 'disodium hydrogen phosphate dihydrate', 'disodium phosphate dihydrate'],
        formula: 'Na2HPO4·2H2O',
        listedMolarMass: 177.99,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
      form({
        name: 'sodium phosphate dibasic heptahydrate',
        aliases: ['Na2HPO4·7H2O', 'disodium hydrogen phosphate heptahydrate', 'disodium phosphate heptahydrate'],
        formula: 'Na2HPO4·7H2O',
        listedMolarMass: 268.07,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
      form({
        name: 'sodium phosphate dibasic dodecahydrate',
        aliases: ['Na2HPO4·12H2O', 'disodium hydrogen phosphate dodecahydrate', 'disodium phosphate dodecahydrate'],
        formula: 'Na2HPO4·12H2O',
        listedMolarMass: 358.14,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
      form({
        name: 'sodium phosphate tribasic dodecahydrate',
        aliases: ['Na3PO4·12H2O', 'trisodium phosphate dodecahydrate', 'TSP'],
        formula: 'Na3PO4·12H2O',
        listedMolarMass: 380.12,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 3 }],
        counterIons: { 'Na+': 3 },
        cautions: ['irritant'],
        cautionNote: 'Strongly alkaline in solution; irritating to eyes and skin.',
      }),
      form({
        name: 'potassium phosphate monobasic',
        aliases: ['potassium dihydrogen phosphate', 'monopotassium phosphate', 'KH2PO4', 'KDP'],
        formula: 'KH2PO4',
        listedMolarMass: 136.09,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 1 }],
        counterIons: { 'K+': 1 },
      }),
      form({
        name: 'potassium phosphate dibasic anhydrous',
        aliases: ['dipotassium hydrogen phosphate', 'dipotassium phosphate', 'K2HPO4', 'potassium phosphate dibasic'],
        formula: 'K2HPO4',
        listedMolarMass: 174.18,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 2 }],
        counterIons: { 'K+': 2 },
      }),
      form({
        name: 'potassium phosphate dibasic trihydrate',
        aliases: ['K2HPO4·3H2O', 'dipotassium hydrogen phosphate trihydrate'],
        formula: 'K2HPO4·3H2O',
        listedMolarMass: 228.22,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 2 }],
        counterIons: { 'K+': 2 },
      }),
      form({
        name: 'potassium phosphate tribasic',
        aliases: ['tripotassium phosphate', 'K3PO4'],
        formula: 'K3PO4',
        listedMolarMass: 212.27,
        adds: [{ system: 'phosphate', moles: 1, protonsLost: 3 }],
        counterIons: { 'K+': 3 },
        cautions: ['irritant'],
        cautionNote: 'Strongly alkaline in solution; irritating to eyes and skin.',
      }),
    ],
  }),
  system({
    name: 'carbonate',
    aliases: ['carbonic acid', 'bicarbonate', 'hydrogen carbonate', 'CO2', 'H2CO3'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'carbonic acid, H2CO3* (CO2 + H2O) ⇌ HCO3−',
        pKa: 6.351,
        deltaHkJ: 9.15,
        deltaCpJ: -371,
        temperatureRangeC: [0, 50],
        checkedAgainst: [
          { copy: 'pytzerDissociation', where: 'H2CO3_MP98 (Millero 1979)', reads: 'pK 6.3515, ΔH° 9.31 kJ/mol, ΔCp° −375 at 298.15 K' },
          { copy: 'pytzerDissociation', where: 'H2CO3_PB82 (Plummer & Busenberg 1982)', reads: 'pK 6.3519, ΔH° 9.11 kJ/mol, ΔCp° −367 at 298.15 K' },
        ],
        note: 'Both fits agree with the stored values within 0.001 in pK, 0.2 kJ/mol and 5 J/(K·mol).',
      }),
      gv({
        entry: 'carbonic acid, HCO3− ⇌ CO32−',
        pKa: 10.329,
        deltaHkJ: 14.7,
        deltaCpJ: -249,
        temperatureRangeC: [0, 50],
        also: [
          { copy: 'pytzerDissociation', where: 'HCO3_MP98 (Millero 1979)', reads: 'pK 10.3297, ΔH° 15.06 kJ/mol, ΔCp° −280 at 298.15 K' },
          { copy: 'pytzerDissociation', where: 'HCO3_PB82 (Plummer & Busenberg 1982)', reads: 'pK 10.3289, ΔH° 14.90 kJ/mol, ΔCp° −291 at 298.15 K' },
        ],
        note: "pK and ΔH° agree with both fits; their ΔCp° (−280, −291) is more negative than the review's −249, which is kept: over 0–50 °C the difference moves pK by under 0.005.",
      }),
    ],
    forms: [
      form({
        name: 'sodium bicarbonate',
        aliases: ['sodium hydrogen carbonate', 'NaHCO3', 'baking soda'],
        formula: 'NaHCO3',
        listedMolarMass: 84.01,
        adds: [{ system: 'carbonate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'sodium carbonate anhydrous',
        aliases: ['sodium carbonate', 'Na2CO3', 'Na2CO3 anhydrous', 'soda ash'],
        formula: 'Na2CO3',
        listedMolarMass: 105.99,
        adds: [{ system: 'carbonate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation; alkaline in solution.',
      }),
      form({
        name: 'sodium carbonate decahydrate',
        aliases: ['Na2CO3·10H2O', 'washing soda'],
        formula: 'Na2CO3·10H2O',
        listedMolarMass: 286.14,
        adds: [{ system: 'carbonate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation; alkaline in solution.',
      }),
      form({
        name: 'potassium bicarbonate',
        aliases: ['potassium hydrogen carbonate', 'KHCO3'],
        formula: 'KHCO3',
        listedMolarMass: 100.12,
        adds: [{ system: 'carbonate', moles: 1, protonsLost: 1 }],
        counterIons: { 'K+': 1 },
      }),
      form({
        name: 'potassium carbonate',
        aliases: ['K2CO3', 'potash'],
        formula: 'K2CO3',
        listedMolarMass: 138.21,
        adds: [{ system: 'carbonate', moles: 1, protonsLost: 2 }],
        counterIons: { 'K+': 2 },
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation; alkaline in solution.',
      }),
    ],
    note: 'Open solutions exchange CO2 with air; the model treats the system as closed (no gas exchange).',
  }),
  system({
    name: 'borate',
    aliases: ['boric acid', 'B(OH)3', 'tetraborate'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'boric acid, B(OH)3 + H2O ⇌ B(OH)4− + H+',
        pKa: 9.237,
        deltaHkJ: 13.8,
        deltaCpJ: -240,
        also: [
          {
            copy: 'pytzerDissociation',
            where: 'BOH3_M79 (Millero 1979)',
            reads: "pK 9.2364, ΔH° 13.98 kJ/mol, ΔCp° −203 at 298.15 K: agrees on pK and ΔH°; ΔCp° less negative, the review's −240 kept",
          },
        ],
      }),
    ],
    forms: [
      form({
        name: 'boric acid',
        aliases: ['H3BO3', 'orthoboric acid', 'B(OH)3'],
        formula: 'H3BO3',
        listedMolarMass: 61.83,
        adds: [{ system: 'borate', moles: 1, protonsLost: 0 }],
      }),
      form({
        name: 'sodium tetraborate decahydrate',
        aliases: ['borax', 'Na2B4O7·10H2O', 'disodium tetraborate decahydrate', 'sodium borate decahydrate'],
        formula: 'Na2B4O7·10H2O',
        listedMolarMass: 381.37,
        adds: [{ system: 'borate', moles: 4, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
        note: 'Dissolves to 2 B(OH)3 + 2 B(OH)4− + 2 Na+: four moles of borate with two protons lost in total. Polyborate ions at high concentration are not modelled.',
      }),
      form({
        name: 'sodium tetraborate anhydrous',
        aliases: ['Na2B4O7', 'sodium tetraborate', 'disodium tetraborate'],
        formula: 'Na2B4O7',
        listedMolarMass: 201.22,
        adds: [{ system: 'borate', moles: 4, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
    ],
    cautions: ['toxic'],
    cautionNote: 'Boric acid and borates may damage fertility or the unborn child (EU reproductive toxicant, category 1B); avoid dust.',
  }),
  system({
    name: 'sulfate',
    aliases: ['sulphate', 'sulfuric acid', 'bisulfate', 'hydrogen sulfate', 'HSO4-'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'commonlyStated',
        entry: 'sulfuric acid, H2SO4 ⇌ HSO4−',
        checkedAgainst: 'memory',
        temperatureRangeC: [0, 100],
        pKa: -3,
        note: 'Strong first step: commonly stated pKa about −3 (order of magnitude only); any value below 0 gives the same result in buffers.',
      }),
      step({
        source: 'cleggRardPitzer1994',
        entry: 'hydrogen sulfate ion, HSO4− ⇌ SO42− (eq. 21)',
        pKa: 1.979,
        deltaHkJ: -22.76,
        deltaCpJ: -275,
        temperatureRangeC: CRP94_RANGE_C,
        checkedAgainst: [
          { copy: 'pytzerDissociation', where: 'HSO4_CRP94 (eq. 21)', reads: 'pK 1.9788, ΔH° −22.76 kJ/mol, ΔCp° −275 at 298.15 K, read off the equation by differentiation' },
        ],
        note: 'Replaces pK 1.99 and ΔH° −22.4 written from memory of Harned & Owen (no ΔCp°).',
      }),
    ],
    forms: [
      form({
        name: 'sulfuric acid',
        aliases: ['H2SO4', 'sulphuric acid', 'oil of vitriol'],
        formula: 'H2SO4',
        listedMolarMass: 98.08,
        adds: [{ system: 'sulfate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['corrosive'],
        cautionNote: 'Causes severe burns; concentrated acid reacts violently with water: always add acid to water, slowly, never water to acid.',
      }),
      form({
        name: 'sodium sulfate anhydrous',
        aliases: ['Na2SO4', 'sodium sulphate'],
        formula: 'Na2SO4',
        listedMolarMass: 142.04,
        adds: [{ system: 'sulfate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
      form({
        name: 'potassium sulfate',
        aliases: ['K2SO4', 'potassium sulphate'],
        formula: 'K2SO4',
        listedMolarMass: 174.26,
        adds: [{ system: 'sulfate', moles: 1, protonsLost: 2 }],
        counterIons: { 'K+': 2 },
      }),
      form({
        name: 'magnesium sulfate heptahydrate',
        aliases: ['MgSO4·7H2O', 'Epsom salt', 'magnesium sulphate heptahydrate'],
        formula: 'MgSO4·7H2O',
        listedMolarMass: 246.47,
        adds: [{ system: 'sulfate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Mg2+': 1 },
      }),
    ],
    note: 'The HSO4− step matters only below about pH 3. The H2SO4 step is strong: its pKa only has to lie below 0, at any temperature.',
  }),

  // ── Carboxylic acids ────────────────────────────────────────────────────────────────
  system({
    name: 'formate',
    aliases: ['formic acid', 'methanoic acid', 'HCOOH'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'formic acid',
        pKa: 3.744,
        deltaHkJ: -0.1,
        deltaCpJ: -165,
        temperatureRangeC: GOLDBERG_RANGE_C,
        checkedAgainst: [
          { copy: 'minteqV4', where: 'H+ + Formate- = H(Formate) (NIST46.2)', reads: 'log K 3.745, ΔH° of ionization −0.17 kJ/mol: agrees within 0.001 and 0.1 kJ/mol; no ΔCp°' },
        ],
        note: 'ΔH° −0.1 and ΔCp° −165 from memory of the review; the copy gives −0.17 (the difference moves pK by under 0.001 over 0–50 °C).',
      }),
    ],
    forms: [
      form({
        name: 'formic acid',
        aliases: ['HCOOH', 'methanoic acid'],
        formula: 'CH2O2',
        listedMolarMass: 46.03,
        adds: [{ system: 'formate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['corrosive'],
        cautionNote: 'Concentrated acid causes severe burns and its vapour is toxic; flammable. Read the assay on the bottle.',
      }),
      form({
        name: 'sodium formate',
        aliases: ['HCOONa', 'sodium methanoate'],
        formula: 'CHNaO2',
        listedMolarMass: 68.01,
        adds: [{ system: 'formate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
    ],
  }),
  system({
    name: 'lactate',
    aliases: ['lactic acid', '2-hydroxypropanoic acid'],
    chargeOfMostProtonated: 0,
    steps: [roomOnly({ source: 'crcDissociation', entry: 'lactic acid', pKa: 3.86, note: '(memory) ΔH° not recorded: pKa held at its 25 °C value.' })],
    forms: [
      form({
        name: 'lactic acid',
        aliases: ['DL-lactic acid', 'L-lactic acid'],
        formula: 'C3H6O3',
        listedMolarMass: 90.08,
        adds: [{ system: 'lactate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['corrosive'],
        cautionNote: 'Concentrated solutions cause eye damage and skin irritation. Commercial lactic acid contains lactide; read the assay.',
      }),
      form({
        name: 'sodium lactate',
        aliases: ['sodium L-lactate', 'sodium DL-lactate'],
        formula: 'C3H5NaO3',
        listedMolarMass: 112.06,
        adds: [{ system: 'lactate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
        note: 'Often sold as a 50–60 % syrup: read the assay.',
      }),
    ],
  }),
  system({
    name: 'acetate',
    aliases: ['acetic acid', 'ethanoic acid', 'OAc', 'AcOH'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'acetic acid',
        pKa: 4.756,
        deltaHkJ: -0.41,
        deltaCpJ: -142,
        also: [
          { copy: 'goldbergItcTable', where: 'Buffer table, Acetate', reads: 'ΔH° −410 J/mol, ΔCp° −142: same as stored' },
          { copy: 'minteqV4', where: 'H+ + Acetate- = H(Acetate) (NIST46.4)', reads: 'log K 4.757, ΔH° of ionization −0.41 kJ/mol: agrees' },
        ],
      }),
    ],
    forms: [
      form({
        name: 'acetic acid glacial',
        aliases: ['glacial acetic acid', 'acetic acid', 'AcOH', 'CH3COOH', 'ethanoic acid'],
        formula: 'C2H4O2',
        listedMolarMass: 60.05,
        adds: [{ system: 'acetate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['corrosive'],
        cautionNote: 'Glacial acetic acid causes severe burns and is flammable; pungent vapour.',
      }),
      form({
        name: 'sodium acetate anhydrous',
        aliases: ['sodium acetate', 'NaOAc', 'CH3COONa', 'anhydrous sodium acetate'],
        formula: 'C2H3NaO2',
        listedMolarMass: 82.03,
        adds: [{ system: 'acetate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'sodium acetate trihydrate',
        aliases: ['NaOAc·3H2O', 'CH3COONa·3H2O'],
        formula: 'C2H3NaO2·3H2O',
        listedMolarMass: 136.08,
        adds: [{ system: 'acetate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'potassium acetate',
        aliases: ['KOAc', 'CH3COOK'],
        formula: 'C2H3KO2',
        listedMolarMass: 98.14,
        adds: [{ system: 'acetate', moles: 1, protonsLost: 1 }],
        counterIons: { 'K+': 1 },
      }),
    ],
  }),
  system({
    name: 'succinate',
    aliases: ['succinic acid', 'butanedioic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gm({ entry: 'succinic acid, H2L ⇌ HL−', pKa: 4.207, deltaHkJ: 3.0, deltaCpJ: -121 }),
      gm({ entry: 'succinic acid, HL− ⇌ L2−', pKa: 5.636, deltaHkJ: -0.5, deltaCpJ: -217 }),
    ],
    forms: [
      form({
        name: 'succinic acid',
        aliases: ['butanedioic acid'],
        formula: 'C4H6O4',
        listedMolarMass: 118.09,
        adds: [{ system: 'succinate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye damage as a powder.',
      }),
      form({
        name: 'sodium succinate dibasic hexahydrate',
        aliases: ['disodium succinate hexahydrate', 'sodium succinate hexahydrate'],
        formula: 'C4H4Na2O4·6H2O',
        listedMolarMass: 270.14,
        adds: [{ system: 'succinate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
    ],
  }),
  system({
    name: 'maleate',
    aliases: ['maleic acid', 'cis-butenedioic acid'],
    chargeOfMostProtonated: 0,
    steps: [gm({ entry: 'maleic acid, H2L ⇌ HL−', pKa: 1.92, deltaHkJ: 1.1 }), gm({ entry: 'maleic acid, HL− ⇌ L2−', pKa: 6.27, deltaHkJ: -3.6 })],
    forms: [form({ name: 'maleic acid', aliases: ['cis-butenedioic acid'], formula: 'C4H4O4', listedMolarMass: 116.07, adds: [{ system: 'maleate', moles: 1, protonsLost: 0 }] })],
    cautions: ['irritant', 'toxic'],
    cautionNote: 'Harmful if swallowed; irritates eyes and skin and may cause skin sensitisation.',
  }),
  system({
    name: 'malate',
    aliases: ['malic acid', 'hydroxybutanedioic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      roomOnly({
        source: 'crcDissociation',
        entry: 'malic acid, H2L ⇌ HL−',
        pKa: 3.46,
        note: '(memory) Thermodynamic (I = 0) value as remembered, replacing 3.40 (a value nearer I = 0.1). ΔH° not recorded: pKa held at its 25 °C value.',
      }),
      roomOnly({
        source: 'crcDissociation',
        entry: 'malic acid, HL− ⇌ L2−',
        pKa: 5.1,
        note: '(memory) Thermodynamic (I = 0) value as remembered, replacing 5.20. ΔH° not recorded: pKa held at its 25 °C value.',
      }),
    ],
    forms: [
      form({
        name: 'DL-malic acid',
        aliases: ['malic acid', 'L-malic acid'],
        formula: 'C4H6O5',
        listedMolarMass: 134.09,
        adds: [{ system: 'malate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation.',
      }),
    ],
  }),
  system({
    name: 'citrate',
    aliases: ['citric acid', '2-hydroxypropane-1,2,3-tricarboxylic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      gv({
        entry: 'citric acid, H3L ⇌ H2L−',
        pKa: 3.128,
        deltaHkJ: 4.07,
        deltaCpJ: -131,
        also: [{ copy: 'goldbergItcTable', where: 'Buffer table, Citrate (comment, pKa1)', reads: 'ΔH° 4070 J/mol, ΔCp° −131: same as stored' }],
      }),
      gv({
        entry: 'citric acid, H2L− ⇌ HL2−',
        pKa: 4.761,
        deltaHkJ: 2.23,
        deltaCpJ: -178,
        also: [{ copy: 'goldbergItcTable', where: 'Buffer table, Citrate (comment, pKa2)', reads: 'ΔH° 2230 J/mol, ΔCp° −178: same as stored' }],
      }),
      gv({
        entry: 'citric acid, HL2− ⇌ L3−',
        pKa: 6.396,
        deltaHkJ: -3.38,
        deltaCpJ: -254,
        also: [{ copy: 'goldbergItcTable', where: 'Buffer table, Citrate', reads: 'ΔH° −3380 J/mol, ΔCp° −254: same as stored' }],
      }),
    ],
    forms: [
      form({
        name: 'citric acid anhydrous',
        aliases: ['citric acid', 'anhydrous citric acid', 'C6H8O7'],
        formula: 'C6H8O7',
        listedMolarMass: 192.12,
        adds: [{ system: 'citrate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation.',
      }),
      form({
        name: 'citric acid monohydrate',
        aliases: ['C6H8O7·H2O'],
        formula: 'C6H8O7·H2O',
        listedMolarMass: 210.14,
        adds: [{ system: 'citrate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation.',
      }),
      form({
        name: 'sodium citrate monobasic',
        aliases: ['monosodium citrate', 'sodium dihydrogen citrate'],
        formula: 'C6H7NaO7',
        listedMolarMass: 214.11,
        adds: [{ system: 'citrate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({
        name: 'trisodium citrate dihydrate',
        aliases: ['sodium citrate', 'sodium citrate tribasic dihydrate', 'sodium citrate dihydrate', 'Na3C6H5O7·2H2O'],
        formula: 'Na3C6H5O7·2H2O',
        listedMolarMass: 294.1,
        adds: [{ system: 'citrate', moles: 1, protonsLost: 3 }],
        counterIons: { 'Na+': 3 },
      }),
      form({
        name: 'trisodium citrate anhydrous',
        aliases: ['sodium citrate anhydrous', 'sodium citrate tribasic anhydrous'],
        formula: 'Na3C6H5O7',
        listedMolarMass: 258.07,
        adds: [{ system: 'citrate', moles: 1, protonsLost: 3 }],
        counterIons: { 'Na+': 3 },
      }),
      form({
        name: 'tripotassium citrate monohydrate',
        aliases: ['potassium citrate', 'potassium citrate monohydrate', 'K3C6H5O7·H2O'],
        formula: 'K3C6H5O7·H2O',
        listedMolarMass: 324.41,
        adds: [{ system: 'citrate', moles: 1, protonsLost: 3 }],
        counterIons: { 'K+': 3 },
      }),
    ],
    note: 'Binds Ca2+ and Mg2+ strongly; complexes are not modelled.',
  }),
  // ── Chelators: EDTA and EGTA ────────────────────────────────────────────────────────
  system({
    name: 'EDTA',
    aliases: ['ethylenediaminetetraacetic acid', 'edetic acid', 'edetate', 'H4EDTA'],
    chargeOfMostProtonated: 0,
    steps: [
      edta({
        entry: 'EDTA, H4L ⇌ H3L− (4H+ + Edta-4 = H4(Edta) less 3H+ + Edta-4 = H3(Edta)-)',
        pKa: 2.16,
        deltaHkJ: -1.26,
        hummel: 'pK 23.42 − 21.19 = 2.23, ΔH° of ionization −(−26.0 + 27.9) = −1.9 kJ/mol',
        minteq: 'pK 22.5 − 20.34 = 2.16, ΔH° of ionization −(−34.309 + 35.564) = −1.26 kJ/mol: same as stored',
      }),
      edta({
        entry: 'EDTA, H3L− ⇌ H2L2− (3H+ + Edta-4 = H3(Edta)- less 2H+ + Edta-4 = H2(Edta)-2)',
        pKa: 3.119,
        deltaHkJ: -5.44,
        hummel: 'pK 21.19 − 18.04 = 3.15, ΔH° −(−27.9 + 35.0) = −7.1 kJ/mol',
        minteq: 'pK 20.34 − 17.221 = 3.119, ΔH° −(−35.564 + 41.003) = −5.44 kJ/mol: same as stored',
      }),
      edta({
        entry: 'EDTA, H2L2− ⇌ HL3− (2H+ + Edta-4 = H2(Edta)-2 less H+ + Edta-4 = H(Edta)-3)',
        pKa: 6.273,
        deltaHkJ: 17.57,
        hummel: 'pK 18.04 − 11.24 = 6.80, ΔH° −(−35.0 + 19.8) = 15.2 kJ/mol',
        minteq: 'pK 17.221 − 10.948 = 6.273, ΔH° −(−41.003 + 23.430) = 17.57 kJ/mol: same as stored',
      }),
      edta({
        entry: 'EDTA, HL3− ⇌ L4− (H+ + Edta-4 = H(Edta)-3)',
        pKa: 10.948,
        deltaHkJ: 23.43,
        hummel: 'pK 11.24, ΔH° 19.8 kJ/mol',
        minteq: 'log K 10.948, ΔH° of ionization 23.43 kJ/mol: same as stored',
      }),
    ],
    forms: [
      form({
        name: 'EDTA free acid',
        aliases: ['EDTA', 'EDTA acid', 'ethylenediaminetetraacetic acid', 'C10H16N2O8'],
        formula: 'C10H16N2O8',
        listedMolarMass: 292.24,
        adds: [{ system: 'EDTA', moles: 1, protonsLost: 0 }],
        note: 'Dissolves very poorly until base brings the pH up (near pH 8).',
      }),
      form({
        name: 'EDTA disodium salt dihydrate',
        aliases: ['Na2EDTA·2H2O', 'disodium EDTA', 'disodium EDTA dihydrate', 'EDTA disodium salt', 'Na2H2EDTA·2H2O', 'disodium edetate dihydrate', 'edetate disodium'],
        formula: 'C10H14N2Na2O8·2H2O',
        listedMolarMass: 372.24,
        adds: [{ system: 'EDTA', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
        note: 'The usual form for a 0.5 M stock at pH 8.0; it dissolves only as NaOH brings the pH towards 8.',
      }),
      form({
        name: 'EDTA disodium salt anhydrous',
        aliases: ['Na2EDTA', 'disodium EDTA anhydrous'],
        formula: 'C10H14N2Na2O8',
        listedMolarMass: 336.21,
        adds: [{ system: 'EDTA', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
      form({
        name: 'EDTA tetrasodium salt',
        aliases: ['Na4EDTA', 'tetrasodium EDTA', 'tetrasodium edetate', 'EDTA tetrasodium salt anhydrous'],
        formula: 'C10H12N2Na4O8',
        listedMolarMass: 380.17,
        adds: [{ system: 'EDTA', moles: 1, protonsLost: 4 }],
        counterIons: { 'Na+': 4 },
        note: 'Its solutions are strongly alkaline (pH about 11).',
      }),
      form({
        name: 'EDTA tetrasodium salt tetrahydrate',
        aliases: ['Na4EDTA·4H2O', 'tetrasodium EDTA tetrahydrate', 'EDTA tetrasodium salt hydrate', 'tetrasodium EDTA hydrate'],
        formula: 'C10H12N2Na4O8·4H2O',
        listedMolarMass: 452.23,
        adds: [{ system: 'EDTA', moles: 1, protonsLost: 4 }],
        counterIons: { 'Na+': 4 },
        note: 'Sold as "hydrate" with a water content that varies by lot: read the label or certificate for the molar mass.',
      }),
    ],
    cautions: ['irritant'],
    cautionNote: 'Harmful if the dust is inhaled; repeated inhalation may harm the airways. Weigh without raising dust.',
    note: 'Chelator: binds Mg2+, Ca2+ and most divalent metal ions about 1:1 and strongly; those complexes are not modelled. Na+ and K+ bind weakly (log K about 2.7 and 1.7 at I = 0, NIST46 as carried in minteq.v4), not modelled either: in sodium-rich stocks the real pH lies somewhat below the predicted one. The H5L+ and H6L2+ steps (below pH 2) are left out.',
  }),
  system({
    name: 'EGTA',
    aliases: ['ethylene glycol-bis(2-aminoethylether)-N,N,N′,N′-tetraacetic acid', 'egtazic acid', 'H4EGTA'],
    chargeOfMostProtonated: 0,
    steps: [
      egta({ entry: 'EGTA, H4L ⇌ H3L−', pKaAt01: 2.0, lost: 0 }),
      egta({ entry: 'EGTA, H3L− ⇌ H2L2−', pKaAt01: 2.65, lost: 1 }),
      egta({ entry: 'EGTA, H2L2− ⇌ HL3−', pKaAt01: 8.85, lost: 2 }),
      egta({ entry: 'EGTA, HL3− ⇌ L4−', pKaAt01: 9.47, lost: 3 }),
    ],
    forms: [
      form({
        name: 'EGTA free acid',
        aliases: ['EGTA', 'EGTA acid', 'C14H24N2O10'],
        formula: 'C14H24N2O10',
        listedMolarMass: 380.35,
        adds: [{ system: 'EGTA', moles: 1, protonsLost: 0 }],
        note: 'Dissolves only as NaOH (or KOH) brings the pH towards 8.',
      }),
      form({
        name: 'EGTA tetrasodium salt',
        aliases: ['Na4EGTA', 'tetrasodium EGTA'],
        formula: 'C14H20N2Na4O10',
        listedMolarMass: 468.28,
        adds: [{ system: 'EGTA', moles: 1, protonsLost: 4 }],
        counterIons: { 'Na+': 4 },
      }),
    ],
    cautionNote: 'May irritate eyes and skin as a powder; see the safety data sheet.',
    note: 'Chelator selective for Ca2+ over Mg2+; its metal complexes are not modelled. Its pKa values are from memory of a table at I = 0.1 M and 20 °C, brought to I = 0 with the Davies equation, with no ΔH°: treat EGTA pH predictions as estimates.',
  }),
  system({
    name: 'phthalate',
    aliases: ['phthalic acid', 'benzene-1,2-dicarboxylic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'goldberg2002',
        entry: 'phthalic acid, H2L ⇌ HL−',
        pKa: 2.95,
        deltaHkJ: -2.7,
        deltaCpJ: -88,
        temperatureRangeC: GOLDBERG_RANGE_C,
        checkedAgainst: [
          {
            copy: 'minteqV4',
            where: '2H+ + Phthalate-2 = H2(Phthalate) less H+ + Phthalate-2 (NIST46.2)',
            reads: 'pK 8.358 − 5.408 = 2.950; ΔH° of ionization −(4.853 − 2.176) = −2.68 kJ/mol: agrees with −2.7; no ΔCp°',
          },
        ],
        note: 'ΔH° −2.7 kJ/mol: the earlier +2.7 had the sign wrong (with it, 0.05 mol/kg potassium hydrogen phthalate read 0.061 above its IUPAC pH(S) at 0 °C; with −2.7, within 0.02 from 0 to 50 °C). ΔCp° −88 from memory of the review, not in the copy.',
      }),
      step({
        source: 'goldberg2002',
        entry: 'phthalic acid, HL− ⇌ L2−',
        pKa: 5.408,
        deltaHkJ: -2.17,
        deltaCpJ: -295,
        temperatureRangeC: GOLDBERG_RANGE_C,
        checkedAgainst: [{ copy: 'minteqV4', where: 'H+ + Phthalate-2 = H(Phthalate)- (NIST46.2)', reads: 'log K 5.408, ΔH° of ionization −2.18 kJ/mol: agrees; no ΔCp°' }],
        note: 'ΔCp° −295 from memory of the review, not in the copy.',
      }),
    ],
    forms: [
      form({
        name: 'potassium hydrogen phthalate',
        aliases: ['KHP', 'potassium biphthalate', 'potassium acid phthalate', 'KHC8H4O4'],
        formula: 'C8H5KO4',
        listedMolarMass: 204.22,
        adds: [{ system: 'phthalate', moles: 1, protonsLost: 1 }],
        counterIons: { 'K+': 1 },
      }),
      form({
        name: 'phthalic acid',
        aliases: ['benzene-1,2-dicarboxylic acid'],
        formula: 'C8H6O4',
        listedMolarMass: 166.13,
        adds: [{ system: 'phthalate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['irritant'],
        cautionNote: 'Irritating to eyes and airways.',
      }),
    ],
  }),
  system({
    name: 'oxalate',
    aliases: ['oxalic acid', 'ethanedioic acid'],
    chargeOfMostProtonated: 0,
    steps: [gm({ entry: 'oxalic acid, H2L ⇌ HL−', pKa: 1.27, deltaHkJ: -3.9 }), gm({ entry: 'oxalic acid, HL− ⇌ L2−', pKa: 4.266, deltaHkJ: 7.0, deltaCpJ: -231 })],
    forms: [
      form({
        name: 'oxalic acid dihydrate',
        aliases: ['oxalic acid', 'C2H2O4·2H2O'],
        formula: 'C2H2O4·2H2O',
        listedMolarMass: 126.07,
        adds: [{ system: 'oxalate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['corrosive'],
        cautionNote: 'Causes serious eye damage.',
      }),
      form({
        name: 'sodium oxalate',
        aliases: ['Na2C2O4', 'disodium oxalate'],
        formula: 'Na2C2O4',
        listedMolarMass: 134.0,
        adds: [{ system: 'oxalate', moles: 1, protonsLost: 2 }],
        counterIons: { 'Na+': 2 },
      }),
    ],
    cautions: ['toxic'],
    cautionNote: 'Oxalates are harmful if swallowed or in contact with skin (they bind calcium in the body).',
  }),
  system({
    name: 'tartrate',
    aliases: ['tartaric acid', 'L-tartaric acid', '2,3-dihydroxybutanedioic acid'],
    chargeOfMostProtonated: 0,
    steps: [
      step({
        source: 'bates1973',
        entry: 'L-tartaric acid, H2L ⇌ HL−',
        pKa: 3.036,
        deltaHkJ: 2.93,
        temperatureRangeC: [0, 50],
        checkedAgainst: [
          {
            copy: 'minteqV4',
            where: '2H+ + Tartarate-2 = H2(Tartarate) less H+ + Tartarate-2 (NIST46.2)',
            reads: 'pK 7.402 − 4.366 = 3.036: same as stored; ΔH° of ionization −(−3.682 + 0.753) = +2.93 kJ/mol',
          },
        ],
        note: 'ΔH° 2.93 kJ/mol from the copy (before: none, pKa held at 25 °C); no ΔCp°. Range 0–50 °C: the span of the emf data behind the tartrate standard, as remembered.',
      }),
      step({
        source: 'bates1973',
        entry: 'L-tartaric acid, HL− ⇌ L2−',
        pKa: 4.366,
        deltaHkJ: 0.75,
        temperatureRangeC: [0, 50],
        checkedAgainst: [{ copy: 'minteqV4', where: 'H+ + Tartarate-2 = H(Tartarate)- (NIST46.2)', reads: 'log K 4.366: same as stored; ΔH° of ionization +0.75 kJ/mol' }],
        note: 'ΔH° 0.75 kJ/mol from the copy (before: none); no ΔCp°. Range as for step 1.',
      }),
    ],
    forms: [
      form({
        name: 'L-tartaric acid',
        aliases: ['tartaric acid'],
        formula: 'C4H6O6',
        listedMolarMass: 150.09,
        adds: [{ system: 'tartrate', moles: 1, protonsLost: 0 }],
        counterIons: {},
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye damage as a powder.',
      }),
      form({
        name: 'potassium sodium tartrate tetrahydrate',
        aliases: ['Rochelle salt', 'Seignette salt', 'KNaC4H4O6·4H2O'],
        formula: 'KNaC4H4O6·4H2O',
        listedMolarMass: 282.22,
        adds: [{ system: 'tartrate', moles: 1, protonsLost: 2 }],
        counterIons: { 'K+': 1, 'Na+': 1 },
      }),
    ],
  }),
  system({
    name: 'cacodylate',
    aliases: ['cacodylic acid', 'dimethylarsinic acid', 'dimethylarsinate'],
    chargeOfMostProtonated: 0,
    steps: [gm({ entry: 'cacodylic acid', pKa: 6.28, deltaHkJ: -3.0, deltaCpJ: -86 })],
    forms: [
      form({
        name: 'sodium cacodylate trihydrate',
        aliases: ['sodium cacodylate', 'sodium dimethylarsinate trihydrate'],
        formula: 'C2H6AsNaO2·3H2O',
        listedMolarMass: 214.03,
        adds: [{ system: 'cacodylate', moles: 1, protonsLost: 1 }],
        counterIons: { 'Na+': 1 },
      }),
      form({ name: 'cacodylic acid', aliases: ['dimethylarsinic acid'], formula: 'C2H7AsO2', listedMolarMass: 138.0, adds: [{ system: 'cacodylate', moles: 1, protonsLost: 0 }] }),
    ],
    cautions: ['arsenic', 'toxic'],
    cautionNote: 'Contains arsenic: toxic if swallowed or inhaled, and a carcinogen. Weigh in a fume hood with gloves; collect all waste as arsenic waste.',
  }),

  // ── Strong electrolytes and titrants ────────────────────────────────────────────────
  strong(
    'sodium chloride',
    ['NaCl', 'salt'],
    [
      form({
        name: 'sodium chloride',
        aliases: ['NaCl', 'halite'],
        formula: 'NaCl',
        listedMolarMass: 58.44,
        adds: [],
        counterIons: { 'Na+': 1, 'Cl-': 1 },
        solubility: { gramsPerLitre: 317, temperatureC: 25, source: 'crcSolubility', checkedAgainst: 'memory' },
      }),
    ],
  ),
  strong(
    'potassium chloride',
    ['KCl'],
    [form({ name: 'potassium chloride', aliases: ['KCl', 'sylvite'], formula: 'KCl', listedMolarMass: 74.55, adds: [], counterIons: { 'K+': 1, 'Cl-': 1 } })],
  ),
  strong(
    'magnesium chloride',
    ['MgCl2'],
    [
      form({
        name: 'magnesium chloride anhydrous',
        aliases: ['MgCl2', 'magnesium chloride'],
        formula: 'MgCl2',
        listedMolarMass: 95.21,
        adds: [],
        counterIons: { 'Mg2+': 1, 'Cl-': 2 },
        note: 'Anhydrous MgCl2 takes up water from air and dissolves exothermically; the hexahydrate is the usual form.',
      }),
      form({ name: 'magnesium chloride hexahydrate', aliases: ['MgCl2·6H2O'], formula: 'MgCl2·6H2O', listedMolarMass: 203.3, adds: [], counterIons: { 'Mg2+': 1, 'Cl-': 2 } }),
    ],
  ),
  strong(
    'calcium chloride',
    ['CaCl2'],
    [
      form({
        name: 'calcium chloride anhydrous',
        aliases: ['CaCl2', 'calcium chloride'],
        formula: 'CaCl2',
        listedMolarMass: 110.98,
        adds: [],
        counterIons: { 'Ca2+': 1, 'Cl-': 2 },
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation; dissolves exothermically.',
      }),
      form({
        name: 'calcium chloride dihydrate',
        aliases: ['CaCl2·2H2O'],
        formula: 'CaCl2·2H2O',
        listedMolarMass: 147.01,
        adds: [],
        counterIons: { 'Ca2+': 1, 'Cl-': 2 },
        cautions: ['irritant'],
        cautionNote: 'Causes serious eye irritation.',
      }),
    ],
  ),
  strong(
    'hydrochloric acid',
    ['HCl', 'muriatic acid', 'hydrogen chloride'],
    [
      form({
        name: 'hydrochloric acid',
        aliases: ['HCl', 'hydrogen chloride', 'muriatic acid'],
        formula: 'HCl',
        listedMolarMass: 36.46,
        adds: [],
        counterIons: { 'Cl-': 1 },
        protonsReleased: 1,
        note: 'Strong acid: adds Cl− to the charge balance; its proton goes to water. The amount is that of HCl (concentrated acid is about 37 %, 12 mol/L).',
      }),
    ],
    ['corrosive'],
    'Corrosive: causes burns; concentrated acid gives off choking fumes. Dilute by adding acid to water in a fume hood.',
  ),
  strong(
    'sodium hydroxide',
    ['NaOH', 'caustic soda', 'lye'],
    [
      form({
        name: 'sodium hydroxide',
        aliases: ['NaOH', 'caustic soda', 'lye'],
        formula: 'NaOH',
        listedMolarMass: 40.0,
        adds: [],
        counterIons: { 'Na+': 1 },
        protonsReleased: -1,
        note: 'Strong base: adds Na+ to the charge balance.',
      }),
    ],
    ['corrosive'],
    'Corrosive: causes severe burns and eye damage. Solid NaOH dissolves with strong heating: add it slowly to cold water while stirring. Takes up CO2 from air.',
  ),
  strong(
    'potassium hydroxide',
    ['KOH', 'caustic potash'],
    [
      form({
        name: 'potassium hydroxide',
        aliases: ['KOH', 'caustic potash'],
        formula: 'KOH',
        listedMolarMass: 56.11,
        adds: [],
        counterIons: { 'K+': 1 },
        protonsReleased: -1,
        note: 'Strong base: adds K+ to the charge balance. Pellets are typically about 85 % KOH: read the assay.',
      }),
    ],
    ['corrosive'],
    'Corrosive: causes severe burns and eye damage. Solid KOH dissolves with strong heating: add it slowly to cold water while stirring.',
  ),
];
