/**
 * A user's own substances (e.g. from a workbook range), validated into library records so
 * they work everywhere a library substance does.
 */
import { AcidBaseChemistry, MAX_TEMPERATURE_C, MIN_TEMPERATURE_C, validateChemistry } from '../composition';
import { ChemError, MESSAGES, requireNumber } from '../errors';
import { findStrongIon } from '../strongIons';
import { molarMassOf } from './formula';
import { FormRecord, SourcedStep, SubstanceRecord } from './types';

/** Heaviest molar mass accepted for a user form, g/mol (a guard against unit slips). */
export const MAX_USER_MOLAR_MASS = 10000;
/** Longest name accepted. */
const MAX_NAME_LENGTH = 100;
/** Net charge per mole tolerated as rounding when checking a form's neutrality. */
const NEUTRALITY_TOLERANCE = 1e-9;

/** A form of a user substance. */
export interface UserForm {
  readonly name: string;
  readonly aliases?: readonly string[];
  /** Chemical formula; the molar mass is computed from it when given. */
  readonly formula?: string;
  /** Molar mass in g/mol; required when no formula is given. */
  readonly molarMass?: number;
  /** Moles of the substance per mole of form (default 1). */
  readonly moles?: number;
  /** Protons lost from the most protonated form, in total per mole of form. */
  readonly protonsLost: number;
  /** Strong counter-ions per mole of form, keyed by ion name (`Na+`, `Cl-`, …). */
  readonly counterIons?: Readonly<Record<string, number>>;
}

/** A user-defined acid–base substance. */
export interface UserSubstance {
  readonly name: string;
  readonly aliases?: readonly string[];
  /** Charge of the most protonated form (e.g. +1 for an amine buffer, 0 for a carboxylic acid). */
  readonly chargeOfMostProtonated: number;
  /** pKa values at 25 °C, I = 0, ascending. */
  readonly pKa: readonly number[];
  /** ΔH° per step, kJ/mol (optional; one per pKa). */
  readonly deltaHkJ?: readonly number[];
  /** ΔCp° per step, J K⁻¹ mol⁻¹ (optional; one per pKa). */
  readonly deltaCpJ?: readonly number[];
  /** Forms on the shelf. When absent, one form named after the substance is made: its neutral species, with `formula` or `molarMass` below. */
  readonly forms?: readonly UserForm[];
  /** Formula of the neutral species, used only when `forms` is absent. */
  readonly formula?: string;
  /** Molar mass of the neutral species in g/mol, used only when `forms` is absent and no formula is given. */
  readonly molarMass?: number;
}

function requireName(field: string, value: unknown): string {
  if (typeof value !== 'string' || value.trim() === '') {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a name'), field, 'a non-empty name');
  }
  if (value.length > MAX_NAME_LENGTH) {
    throw new ChemError(
      'invalid-input',
      'outOfRange',
      MESSAGES.outOfRange(field, value, `a name of at most ${MAX_NAME_LENGTH} characters`),
      field,
      `at most ${MAX_NAME_LENGTH} characters`,
    );
  }
  return value.trim();
}

function requireList(field: string, value: unknown, length?: number): readonly number[] {
  if (!Array.isArray(value)) {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a list of numbers'), field, 'a list of numbers');
  }
  if (length !== undefined && value.length !== length) {
    throw new ChemError('invalid-input', 'listLengthMismatch', MESSAGES.listLengthMismatch(field, length, value.length), field, `${length} values`);
  }
  return value as readonly number[];
}

function names(field: string, value: unknown): string[] {
  if (value === undefined) return [];
  if (!Array.isArray(value)) {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a list of names'), field, 'a list of names');
  }
  return value.map((v, i) => requireName(`${field}[${i}]`, v));
}

function formFromInput(input: UserForm, field: string, substance: string, chem: AcidBaseChemistry): FormRecord {
  if (input === null || typeof input !== 'object') {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a form record'), field, 'a form record');
  }
  const name = requireName(`${field}.name`, input.name);
  const moles = input.moles === undefined ? 1 : requireNumber(`${field}.moles`, input.moles, 1e-6, 100);
  const protonsLost = requireNumber(`${field}.protonsLost`, input.protonsLost, 0, moles * chem.steps.length, `0 to ${moles * chem.steps.length} (steps × moles)`);
  const counterIons: Record<string, number> = {};
  let netCharge = moles * chem.chargeOfMostProtonated - protonsLost;
  for (const [ion, n] of Object.entries(input.counterIons ?? {})) {
    const strongIon = findStrongIon(`${field}.counterIons`, ion);
    const count = requireNumber(`${field}.counterIons.${ion}`, n, 0, 100);
    counterIons[strongIon.name] = (counterIons[strongIon.name] ?? 0) + count;
    netCharge += strongIon.charge * count;
  }
  if (Math.abs(netCharge) > NEUTRALITY_TOLERANCE) {
    throw new ChemError('invalid-input', 'formNotNeutral', MESSAGES.formNotNeutral(field, name, netCharge), `${field}.counterIons`, 'counter-ions that balance the charge');
  }
  let formula = '';
  let listed: number;
  if (input.formula !== undefined) {
    formula = input.formula;
    const computed = molarMassOf(formula, `${field}.formula`);
    // A formula is checked like a typed molar mass: C1000000000H2 is a slip, not a buffer form.
    if (!(computed <= MAX_USER_MOLAR_MASS)) {
      throw new ChemError(
        'invalid-input',
        'outOfRange',
        MESSAGES.outOfRange(`${field}.formula`, formula, `a formula of 1 to ${MAX_USER_MOLAR_MASS} g/mol (this one gives ${computed.toPrecision(4)} g/mol)`),
        `${field}.formula`,
        `1 to ${MAX_USER_MOLAR_MASS} g/mol`,
      );
    }
    listed = input.molarMass === undefined ? computed : requireNumber(`${field}.molarMass`, input.molarMass, 1, MAX_USER_MOLAR_MASS, `1 to ${MAX_USER_MOLAR_MASS} g/mol`);
  } else if (input.molarMass !== undefined) {
    listed = requireNumber(`${field}.molarMass`, input.molarMass, 1, MAX_USER_MOLAR_MASS, `1 to ${MAX_USER_MOLAR_MASS} g/mol`);
  } else {
    throw new ChemError(
      'invalid-input',
      'missingValue',
      MESSAGES.missingValue(`${field}.molarMass`, 'a formula or a molar mass in g/mol'),
      `${field}.molarMass`,
      'a formula or a molar mass',
    );
  }
  return {
    name,
    aliases: names(`${field}.aliases`, input.aliases),
    formula,
    listedMolarMass: listed,
    listedMolarMassSource: 'userDefined',
    adds: [{ system: substance, moles, protonsLost }],
    counterIons,
  };
}

/**
 * Validates a user substance and turns it into a library record. Throws ChemError
 * (invalid-input) naming the field at fault.
 *
 * @param input - the user's record
 * @param field - where it came from, for messages (e.g. `userSubstances[2]`)
 * @returns a substance record marked as user-defined
 */
export function userRecordFromInput(input: UserSubstance, field: string): SubstanceRecord {
  if (input === null || typeof input !== 'object') {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a substance record'), field, 'a substance record');
  }
  const name = requireName(`${field}.name`, input.name);
  const pKa = requireList(`${field}.pKa`, input.pKa);
  const dH = input.deltaHkJ === undefined ? undefined : requireList(`${field}.deltaHkJ`, input.deltaHkJ, pKa.length);
  const dCp = input.deltaCpJ === undefined ? undefined : requireList(`${field}.deltaCpJ`, input.deltaCpJ, pKa.length);
  const steps: SourcedStep[] = pKa.map((p, k) => ({
    pKa: p,
    ...(dH === undefined ? {} : { deltaHkJ: dH[k] }),
    ...(dCp === undefined ? {} : { deltaCpJ: dCp[k] }),
    source: 'userDefined',
    entry: name,
    // The user is the source: no copy to list, and the range is the whole liquid range (the user's data may cover less).
    checkedAgainst: [],
    temperatureRangeC: [MIN_TEMPERATURE_C, MAX_TEMPERATURE_C] as const,
  }));
  const chem: AcidBaseChemistry = { name, chargeOfMostProtonated: input.chargeOfMostProtonated, steps };
  validateChemistry(field, chem);

  let forms: FormRecord[];
  if (input.forms === undefined) {
    const z0 = input.chargeOfMostProtonated;
    if (z0 < 0 || z0 > steps.length) {
      throw new ChemError(
        'invalid-input',
        'missingValue',
        MESSAGES.missingValue(`${field}.forms`, 'the forms on the shelf with their counter-ions (this substance has no neutral species)'),
        `${field}.forms`,
        'a list of forms',
      );
    }
    forms = [formFromInput({ name, formula: input.formula, molarMass: input.molarMass, protonsLost: z0 }, `${field}`, name, chem)];
  } else {
    if (!Array.isArray(input.forms)) {
      throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${field}.forms`, 'a list of forms'), `${field}.forms`, 'a list of forms');
    }
    forms = input.forms.map((f, i) => formFromInput(f, `${field}.forms[${i}]`, name, chem));
  }
  return {
    name,
    aliases: names(`${field}.aliases`, input.aliases),
    kind: 'acid-base',
    chargeOfMostProtonated: input.chargeOfMostProtonated,
    steps,
    cautions: [],
    note: 'User-defined substance.',
    forms,
  };
}
