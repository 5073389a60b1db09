/**
 * Shapes of the substance library: acid–base systems with sourced constants, and the
 * forms people weigh out (salts, hydrates, free acids and bases, titrants).
 */
import { AcidBaseStep } from '../composition';
import { CopyId, SourceId } from './sources';

/** Hazards worth a word beside a recipe. The safety data sheet has the last word. */
export type CautionFlag = 'corrosive' | 'toxic' | 'arsenic' | 'controlled' | 'irritant' | 'oxidiser';

/** One proton-dissociation step with the source of its constants. */
export interface SourcedStep extends AcidBaseStep {
  /** Where pKa, ΔH° and ΔCp° come from (a key of SOURCES). */
  readonly source: SourceId;
  /** The entry in that source, e.g. `tris` or `phosphoric acid, H2PO4− ⇌ HPO4²−`. */
  readonly entry: string;
  /**
   * The copies these numbers were checked against (source, where in it, how read), or
   * `memory` when they were written from memory of the source and no copy was found.
   */
  readonly checkedAgainst: Provenance;
  /** Temperatures (°C) the step's data cover: outside them its pKa(T) is an extrapolation. */
  readonly temperatureRangeC: readonly [number, number];
  /** Standard uncertainty of the pKa where the source gives one. */
  readonly pKaUncertainty?: number;
  /** Anything a user should know about this step (strong step, unknown ΔH, …). */
  readonly note?: string;
}

/** One copy a value was checked against. */
export interface ValueCheck {
  /** The copy read (a key of COPIES). */
  readonly copy: CopyId;
  /** Where in it: table, page, entry, line or function. */
  readonly where: string;
  /** How it was read, and what it gives (in full where it differs from the stored value). */
  readonly reads: string;
}

/** What a value was checked against: a list of copies, or `memory` when none was found. */
export type Provenance = readonly ValueCheck[] | 'memory';

/** Solubility in water near room temperature, with its source. */
export interface Solubility {
  readonly gramsPerLitre: number;
  readonly temperatureC: number;
  readonly source: SourceId;
  readonly checkedAgainst: Provenance;
}

/** A share of an acid–base system that one mole of a form adds to a solution. */
export interface SystemPortion {
  /** Name of the acid–base system (a library or user substance). */
  readonly system: string;
  /** Moles of the system per mole of form. */
  readonly moles: number;
  /**
   * Protons lost from the most protonated form, in total over those moles (borax: 4 mol
   * borate with 2 protons lost; Na2HPO4: 1 mol phosphate with 2 protons lost).
   */
  readonly protonsLost: number;
}

/** Something on the shelf: a definite substance with a formula and a molar mass. */
export interface FormRecord {
  /** Name as people write it, e.g. `sodium phosphate dibasic heptahydrate`. */
  readonly name: string;
  /** Other names (formula, trade abbreviations, hydrate notations). Case-insensitive. */
  readonly aliases: readonly string[];
  /** Chemical formula, Hill-like or as written on the bottle (`Na2HPO4·7H2O`). */
  readonly formula: string;
  /** Molar mass as printed by suppliers, g/mol; the test checks it against the formula. */
  readonly listedMolarMass: number;
  /** Source of listedMolarMass (a key of SOURCES). */
  readonly listedMolarMassSource: SourceId;
  /** Acid–base systems one mole adds (empty for strong electrolytes). */
  readonly adds: readonly SystemPortion[];
  /** Strong ions one mole adds, mol per mol, keyed by STRONG_IONS name (`Na+`, `Cl-`). */
  readonly counterIons: Readonly<Record<string, number>>;
  /**
   * Protons one mole hands to water as a strong acid (HCl: 1; PIPES free acid: 1, its
   * sulfonic acid proton) or, negative, hydroxide it releases (NaOH: −1). These do not enter
   * the composition: the charge balance sees them through the counter-ions and the
   * system's charge.
   */
  readonly protonsReleased?: number;
  readonly cautions?: readonly CautionFlag[];
  /** Plain-words caution for this form, added to the substance's. */
  readonly cautionNote?: string;
  readonly solubility?: Solubility;
  readonly note?: string;
}

/** One substance: an acid–base system with its forms, or a strong electrolyte's forms. */
export interface SubstanceRecord {
  /** Canonical name, e.g. `HEPES`, `phosphate`, `sodium chloride`. */
  readonly name: string;
  readonly aliases: readonly string[];
  /** `acid-base` systems have steps; `strong` substances (NaCl, HCl, NaOH) only add strong ions. */
  readonly kind: 'acid-base' | 'strong';
  /** Charge of the most protonated form listed in `steps` (acid–base only; 0 for strong). */
  readonly chargeOfMostProtonated: number;
  /** Proton-dissociation steps, pKa ascending (empty for strong electrolytes). */
  readonly steps: readonly SourcedStep[];
  readonly cautions: readonly CautionFlag[];
  /** Plain-words caution line; always defer to the safety data sheet. */
  readonly cautionNote?: string;
  readonly note?: string;
  readonly forms: readonly FormRecord[];
}

/** A form as the library hands it out: the record, its substance and its computed molar mass. */
export interface LibraryForm extends FormRecord {
  /** Name of the substance record it belongs to. */
  readonly substance: string;
  /** Molar mass from the formula and IUPAC standard atomic weights, g/mol (the listed one for user forms without a formula). */
  readonly molarMass: number;
  /** Every caution flag of the form and its substance. */
  readonly allCautions: readonly CautionFlag[];
  /** Caution lines of the substance and the form, joined. */
  readonly cautionText: string;
}
