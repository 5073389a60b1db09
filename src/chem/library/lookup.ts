/**
 * Looking substances up by the name on the bottle, and turning amounts of forms into a
 * composition the solver accepts.
 *
 * Modelling: the solver's charge balance uses only each system's total and the strong
 * ions. The protonation state a form is added in enters only through its counter-ions
 * (Na2HPO4 adds phosphate + 2 Na+; tris HCl adds tris + Cl−; HCl adds Cl−; NaOH adds Na+;
 * borax adds 4 borate + 2 Na+). `protonsLost` is kept so callers know which form is the
 * acid and which the base.
 */
import { ActivityModel } from '../activity';
import { AcidBaseChemistry, AcidBaseSystem, Composition, systemAt } from '../composition';
import { ChemError, MESSAGES, requireNumber } from '../errors';
import { findStrongIon } from '../strongIons';
import { molarMassOf } from './formula';
import { closestNames, nameKey } from './names';
import { SUBSTANCES } from './substances';
import { CautionFlag, FormRecord, LibraryForm, SubstanceRecord } from './types';
import { UserSubstance, userRecordFromInput } from './userSubstances';

/** Largest concentration of one form accepted, mol/L (a guard against unit slips). */
export const MAX_FORM_CONCENTRATION_M = 20;

/** What one form at a concentration adds to a solution. */
export interface FormContribution {
  readonly form: string;
  /** Acid–base systems with their totals (mol/L) and protons lost (mol/L) relative to the most protonated form. */
  readonly systems: readonly { readonly chemistry: AcidBaseChemistry; readonly totalM: number; readonly protonsLostM: number }[];
  /** Strong ions added, mol/L, keyed by STRONG_IONS name. */
  readonly strongIons: Readonly<Record<string, number>>;
  /** Protons handed to water as a strong acid (negative: hydroxide), mol/L. Informational: the charge balance sees them through the counter-ions. */
  readonly protonsReleasedM: number;
}

/** One ingredient for compositionFromForms: a form by name or record, and its concentration in mol/L. */
export interface FormAmount {
  readonly form: string | LibraryForm;
  readonly concentrationM: number;
}

/** Options for compositionFromForms. */
export interface CompositionOptions {
  /** Temperature in °C (default 25). */
  readonly temperatureC?: number;
  /** Activity model (default `davies`). */
  readonly activityModel?: ActivityModel;
  /** More strong ions, mol/L, added on top of the forms' counter-ions. */
  readonly extraStrongIons?: Readonly<Record<string, number>>;
}

/** A summary row of the library, for listings and documents. */
export interface SubstanceListing {
  readonly name: string;
  readonly kind: 'acid-base' | 'strong';
  readonly aliases: readonly string[];
  readonly chargeOfMostProtonated: number;
  readonly pKa: readonly number[];
  readonly forms: readonly string[];
  readonly userDefined: boolean;
}

/** A formula without its water of hydration: `Na2HPO4·7H2O` → `Na2HPO4`. */
function saltOf(formula: string): string {
  return formula
    .split('·')
    .map((part) => part.trim())
    .filter((part) => !/^\d*(\.\d+)?H2O$/.test(part))
    .join('·');
}

/** A substance library: the built-in table plus any user substances. */
export interface SubstanceLibrary {
  /** The acid–base system by name or alias (a form's name finds its system too). */
  /** The acid–base system (or strong electrolyte) by name; `field` names the input in errors (default `substance`). */
  findSystem(name: string, field?: string): SubstanceRecord;
  /** A form by name or alias, with its computed molar mass. */
  /** A form on the shelf by name; `field` names the input in errors (default `form`). */
  findForm(name: string, field?: string): LibraryForm;
  /**
   * The other hydration states of a form, when a name leaves the state open: a name that
   * says neither "anhydrous" nor a water count and is not the form's formula (`sodium
   * phosphate dibasic`, `magnesium chloride`) while the same salt is listed anhydrous and as
   * hydrates. Empty when the name is explicit or the salt has one form.
   */
  hydrateAlternatives(name: string): readonly LibraryForm[];
  /** Every substance, in table order (library first, then the user's). */
  list(): readonly SubstanceListing[];
  /** Every substance record. */
  records(): readonly SubstanceRecord[];
  /** What a form at a concentration adds (see formAmount). */
  formAmount(form: string | LibraryForm, concentrationM: number): FormContribution;
  /** A composition from forms by name (see compositionFromForms). */
  compositionFromForms(items: readonly FormAmount[], options?: CompositionOptions): Composition;
}

/**
 * The chemistry part of a substance record, as the solver wants it (no sources or forms).
 *
 * @param record - a substance record
 * @returns name, charge of the most protonated form, and steps (pKa, ΔH° kJ/mol, ΔCp° J K⁻¹ mol⁻¹)
 */
export function chemistryOf(record: SubstanceRecord): AcidBaseChemistry {
  let chemistry = CHEMISTRY.get(record);
  if (!chemistry) {
    chemistry = {
      name: record.name,
      chargeOfMostProtonated: record.chargeOfMostProtonated,
      steps: record.steps.map((s) => ({
        pKa: s.pKa,
        ...(s.deltaHkJ === undefined ? {} : { deltaHkJ: s.deltaHkJ }),
        ...(s.deltaCpJ === undefined ? {} : { deltaCpJ: s.deltaCpJ }),
        temperatureRangeC: s.temperatureRangeC,
      })),
    };
    CHEMISTRY.set(record, chemistry);
  }
  return chemistry;
}

/**
 * Each record's chemistry, made once: every composition built from the library then shares one steps array per
 * system, by which the solver finds the Pitzer layout it already built (src/chem/pitzer/prepared.ts).
 */
const CHEMISTRY = new WeakMap<SubstanceRecord, AcidBaseChemistry>();

/**
 * Net charge one mole of a form would add if every system stayed in the state it was
 * added in: Σ (moles·z₀ − protonsLost) + Σ counter-ion charges + protons released.
 * Zero for every real substance.
 *
 * @param form - the form record
 * @param chargeOf - charge of the most protonated form of a system, by system name
 * @returns net charge per mole of form (elementary charges)
 */
export function netChargeOfForm(form: FormRecord, chargeOf: (system: string) => number): number {
  let z = form.protonsReleased ?? 0;
  for (const p of form.adds) z += p.moles * chargeOf(p.system) - p.protonsLost;
  for (const [ion, n] of Object.entries(form.counterIons)) z += findStrongIon(`${form.name}.counterIons`, ion).charge * n;
  return z;
}

function unique<T>(xs: readonly T[]): T[] {
  return [...new Set(xs)];
}

class Library implements SubstanceLibrary {
  private readonly systems = new Map<string, SubstanceRecord>();
  private readonly forms = new Map<string, LibraryForm>();
  private readonly systemNames = new Map<string, string>();
  private readonly formNames = new Map<string, string>();
  private readonly all: SubstanceRecord[] = [];
  private readonly userNames = new Set<string>();

  constructor(records: readonly SubstanceRecord[], user: readonly SubstanceRecord[]) {
    for (const r of records) this.add(r, false);
    for (const r of user) this.add(r, true);
  }

  private claim(map: Map<string, unknown>, names: Map<string, string>, key: string, display: string, owner: unknown, isUser: boolean, field: string): boolean {
    const existing = map.get(key);
    if (existing !== undefined && existing !== owner) {
      if (isUser)
        throw new ChemError('invalid-input', 'duplicateSubstance', MESSAGES.duplicateSubstance(field, display, names.get(key) ?? key), field, 'a name not already in the library');
      throw new Error(`Substance library: "${display}" is listed twice`);
    }
    if (existing === undefined) names.set(key, display);
    return existing === undefined;
  }

  private add(record: SubstanceRecord, isUser: boolean): void {
    const field = isUser ? `userSubstances["${record.name}"]` : `library["${record.name}"]`;
    if (isUser) {
      // A user name may not shadow any library name, whether of a system or of a form.
      for (const name of [record.name, ...record.aliases, ...record.forms.flatMap((f) => [f.name, ...f.aliases])]) {
        const key = nameKey(name);
        const clash = this.systemNames.get(key) ?? this.formNames.get(key);
        if (clash !== undefined) {
          throw new ChemError(
            'invalid-input',
            'duplicateSubstance',
            MESSAGES.duplicateSubstance(`${field}.name`, name, clash),
            `${field}.name`,
            'a name not already in the library',
          );
        }
      }
      this.userNames.add(record.name);
    }
    if (record.kind === 'acid-base') {
      for (const name of unique([record.name, ...record.aliases])) {
        const key = nameKey(name);
        if (this.claim(this.systems, this.systemNames, key, name, record, isUser, `${field}.name`)) this.systems.set(key, record);
      }
    }
    const substanceCautions = record.cautions;
    for (const f of record.forms) {
      const libraryForm: LibraryForm = {
        ...f,
        substance: record.name,
        molarMass: f.formula === '' ? f.listedMolarMass : molarMassOf(f.formula, `${field}.forms["${f.name}"].formula`),
        allCautions: unique<CautionFlag>([...substanceCautions, ...(f.cautions ?? [])]),
        cautionText: [record.cautionNote, f.cautionNote].filter((s): s is string => Boolean(s)).join(' '),
      };
      for (const name of unique([f.name, ...f.aliases])) {
        const key = nameKey(name);
        if (this.claim(this.forms, this.formNames, key, name, libraryForm, isUser, `${field}.forms`)) this.forms.set(key, libraryForm);
      }
    }
    this.all.push(record);
  }

  private notFound(field: string, name: unknown, names: ReadonlyMap<string, string>): never {
    if (typeof name !== 'string' || name.trim() === '') {
      throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a substance name'), field, 'a substance name');
    }
    const suggestions = closestNames(nameKey(name), names, 3);
    throw new ChemError('invalid-input', 'unknownSubstance', MESSAGES.unknownSubstance(field, name, suggestions), field, suggestions.join(', '));
  }

  findSystem(name: string, field = 'substance'): SubstanceRecord {
    const key = typeof name === 'string' ? nameKey(name) : '';
    const direct = this.systems.get(key);
    if (direct) return direct;
    const viaForm = this.forms.get(key);
    if (viaForm && viaForm.adds.length === 1) {
      const sys = this.systems.get(nameKey(viaForm.adds[0].system));
      if (sys) return sys;
    }
    return this.notFound(field, name, this.systemNames);
  }

  findForm(name: string, field = 'form'): LibraryForm {
    const found = typeof name === 'string' ? this.forms.get(nameKey(name)) : undefined;
    if (found) return found;
    return this.notFound(field, name, this.formNames);
  }

  hydrateAlternatives(name: string): readonly LibraryForm[] {
    const key = typeof name === 'string' ? nameKey(name) : '';
    const form = this.forms.get(key);
    // The form's own name is explicit (the library names each hydrate), as is its formula
    // (Na2HPO4 is the anhydrous salt; the heptahydrate is Na2HPO4·7H2O) and any name that states the water.
    if (!form || key === nameKey(form.name) || key === nameKey(form.formula) || key.includes('·') || key.includes('anhydrous') || key.includes('hydrate')) return [];
    const salt = saltOf(form.formula);
    const record = this.all.find((r) => r.name === form.substance);
    const siblings = (record?.forms ?? []).filter((f) => f.name !== form.name && f.formula !== '' && saltOf(f.formula) === salt);
    return siblings.map((f) => this.forms.get(nameKey(f.name))!).filter(Boolean);
  }

  list(): readonly SubstanceListing[] {
    return this.all.map((r) => ({
      name: r.name,
      kind: r.kind,
      aliases: r.aliases,
      chargeOfMostProtonated: r.chargeOfMostProtonated,
      pKa: r.steps.map((s) => s.pKa),
      forms: r.forms.map((f) => f.name),
      userDefined: this.userNames.has(r.name),
    }));
  }

  records(): readonly SubstanceRecord[] {
    return this.all;
  }

  formAmount(form: string | LibraryForm, concentrationM: number): FormContribution {
    const f = typeof form === 'string' ? this.findForm(form) : form;
    const c = requireNumber(`${f.name}.concentrationM`, concentrationM, 0, MAX_FORM_CONCENTRATION_M, `0 to ${MAX_FORM_CONCENTRATION_M} mol/L`);
    const systems = f.adds.map((p) => ({
      chemistry: chemistryOf(this.findSystem(p.system)),
      totalM: p.moles * c,
      protonsLostM: p.protonsLost * c,
    }));
    const strongIons: Record<string, number> = {};
    for (const [ion, n] of Object.entries(f.counterIons)) strongIons[ion] = n * c;
    return { form: f.name, systems, strongIons, protonsReleasedM: (f.protonsReleased ?? 0) * c };
  }

  compositionFromForms(items: readonly FormAmount[], options: CompositionOptions = {}): Composition {
    if (!Array.isArray(items)) {
      throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('items', 'a list of forms with concentrations'), 'items', 'a list');
    }
    const totals = new Map<string, { chemistry: AcidBaseChemistry; totalM: number }>();
    const ions: Record<string, number> = {};
    const addIon = (name: string, c: number) => {
      const canonical = findStrongIon('extraStrongIons', name).name;
      ions[canonical] = (ions[canonical] ?? 0) + c;
    };
    items.forEach((item, i) => {
      if (item === null || typeof item !== 'object') {
        throw new ChemError(
          'invalid-input',
          'missingValue',
          MESSAGES.missingValue(`items[${i}]`, 'a form and a concentration in mol/L'),
          `items[${i}]`,
          'a form and a concentration',
        );
      }
      const contribution = this.formAmount(item.form, item.concentrationM);
      for (const s of contribution.systems) {
        const prev = totals.get(s.chemistry.name);
        totals.set(s.chemistry.name, { chemistry: s.chemistry, totalM: (prev?.totalM ?? 0) + s.totalM });
      }
      for (const [ion, c] of Object.entries(contribution.strongIons)) addIon(ion, c);
    });
    for (const [ion, c] of Object.entries(options.extraStrongIons ?? {})) {
      addIon(ion, requireNumber(`extraStrongIons.${ion}`, c, 0, MAX_FORM_CONCENTRATION_M, `0 to ${MAX_FORM_CONCENTRATION_M} mol/L`));
    }
    const systems: AcidBaseSystem[] = [...totals.values()].map((t) => systemAt(t.chemistry, t.totalM));
    // Written literally when both conditions are given (the planner's and the grid's calls): a spread that adds a field costs more than the rest of this call.
    if (options.temperatureC !== undefined && options.activityModel !== undefined) {
      return { systems, strongIons: ions, temperatureC: options.temperatureC, activityModel: options.activityModel };
    }
    return {
      systems,
      strongIons: ions,
      ...(options.temperatureC === undefined ? {} : { temperatureC: options.temperatureC }),
      ...(options.activityModel === undefined ? {} : { activityModel: options.activityModel }),
    };
  }
}

let defaultInstance: SubstanceLibrary | undefined;

/**
 * The built-in library (created once).
 *
 * @returns the library of built-in substances
 */
export function defaultLibrary(): SubstanceLibrary {
  defaultInstance ??= new Library(SUBSTANCES, []);
  return defaultInstance;
}

/**
 * A library with the user's own substances added to the built-in ones. Each user record
 * is validated (ChemError naming the field on a problem); a name or alias already in the
 * library is refused.
 *
 * @param userSubstances - user records (name, charge of the most protonated form, pKa list, optional ΔH°/ΔCp° lists, forms)
 * @returns a library in which user substances work everywhere library ones do
 */
export function createLibrary(userSubstances: readonly UserSubstance[] = []): SubstanceLibrary {
  if (!Array.isArray(userSubstances)) {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('userSubstances', 'a list of substance records'), 'userSubstances', 'a list');
  }
  const records = userSubstances.map((u, i) => userRecordFromInput(u, `userSubstances[${i}]`));
  return new Library(SUBSTANCES, records);
}

/**
 * Finds an acid–base system in the built-in library by name, alias or form name.
 *
 * @param name - e.g. `HEPES`, `phosphate`, `Tris-HCl`
 * @returns the substance record
 * @example findSystem('tris').steps[0].pKa // 8.072
 */
export function findSystem(name: string): SubstanceRecord {
  return defaultLibrary().findSystem(name);
}

/**
 * Finds a form in the built-in library by name or alias (hydrate notations accepted).
 *
 * @param name - e.g. `Na2HPO4·7H2O`, `sodium phosphate dibasic heptahydrate`, `tris HCl`
 * @returns the form with its molar mass (g/mol)
 * @example findForm('tris hydrochloride').molarMass // ≈ 157.59
 */
export function findForm(name: string): LibraryForm {
  return defaultLibrary().findForm(name);
}

/**
 * Lists every substance of the built-in library.
 *
 * @returns one row per substance: name, kind, aliases, charge, pKa values, forms
 */
export function listSubstances(): readonly SubstanceListing[] {
  return defaultLibrary().list();
}

/**
 * What a form at a concentration adds to a solution (built-in library).
 *
 * @param form - form name or record
 * @param concentrationM - concentration of the form, mol/L of solution
 * @returns systems with totals and protons lost (mol/L), strong ions (mol/L), protons released (mol/L)
 * @example formAmount('borax', 0.01).systems[0].totalM // 0.04
 */
export function formAmount(form: string | LibraryForm, concentrationM: number): FormContribution {
  return defaultLibrary().formAmount(form, concentrationM);
}

/**
 * A composition from forms by name (built-in library): systems from several forms add
 * up; counter-ions become strong ions.
 *
 * @param items - forms (name or record) with concentrations in mol/L
 * @param options - temperature (°C), activity model, extra strong ions (mol/L)
 * @returns a composition for speciate()
 * @example compositionFromForms([{ form: 'KH2PO4', concentrationM: 0.025 }, { form: 'Na2HPO4', concentrationM: 0.025 }]).strongIons // { 'K+': 0.025, 'Na+': 0.05 }
 */
export function compositionFromForms(items: readonly FormAmount[], options: CompositionOptions = {}): Composition {
  return defaultLibrary().compositionFromForms(items, options);
}

/** Half-width of a step's useful buffering range, pH units (common practice: pKa ± 1). */
export const USEFUL_RANGE_HALF_WIDTH = 1;

/**
 * Useful buffering range of each step: pKa ± 1 at 25 °C (computed, not stored).
 *
 * @param record - a substance record
 * @returns one [low, high] pH pair per step
 * @example usefulPhRange(findSystem('HEPES')) // [[6.564, 8.564]]
 */
export function usefulPhRange(record: SubstanceRecord): readonly (readonly [number, number])[] {
  return record.steps.map((s) => [s.pKa - USEFUL_RANGE_HALF_WIDTH, s.pKa + USEFUL_RANGE_HALF_WIDTH] as const);
}
