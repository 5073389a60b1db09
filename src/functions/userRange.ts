/**
 * The user's own substances, read from a worksheet range, one row per form:
 *
 * | column | content                                   | example        |
 * |--------|-------------------------------------------|----------------|
 * | A      | substance name                            | `MyAmine`      |
 * | B      | charge of the most protonated form        | `1`            |
 * | C      | pKa list at 25 °C, I = 0                  | `6.1; 7.2`     |
 * | D      | ΔH° list, kJ/mol (optional)               | `20; 15`       |
 * | E      | ΔCp° list, J K⁻¹ mol⁻¹ (optional)         | `0; 0`         |
 * | F      | form name (blank: the substance's name)   | `MyAmine HCl`  |
 * | G      | molar mass of the form, g/mol             | `181.6`        |
 * | H      | counter-ions per mole of form (optional)  | `Cl-`, `2 Na+` |
 * | I      | protons lost (optional; see below)        | `0`            |
 * | J      | formula of the form (optional)            | `C6H15NO3·HCl` |
 *
 * Blank rows are skipped; a first row whose charge cell holds text is a header. Rows with
 * the same name are forms of one substance: columns B–E are read from its first row and
 * may be left blank below. Protons lost defaults to the value that makes the form neutral
 * with its counter-ions (no counter-ions: the neutral species). G or J is needed.
 */
import { ChemError, MAX_STEPS, findStrongIon } from '../chem';
import { SubstanceLibrary, createLibrary, defaultLibrary } from '../chem/library';
import type { UserForm, UserSubstance } from '../chem/library';
import { isBlank, toNumber, toNumberList, toRange, toText } from './coerce';
import { checkRowLimit } from './composition';
import { invalid, withContext } from './errors';
import { Lru } from './memo';
import { SHEET_MESSAGES } from './messages';

/** The argument's name in messages. */
export const USER_SUBSTANCES_ARGUMENT = 'userSubstances';

/** Column headings, in order (documentation and the header check). */
export const USER_SUBSTANCE_COLUMNS = [
  'name',
  'charge of most protonated form',
  'pKa list',
  'ΔH list kJ/mol',
  'ΔCp list J/(K·mol)',
  'form name',
  'molar mass g/mol',
  'counter-ions',
  'protons lost',
  'formula',
] as const;

interface Parsed {
  readonly substances: UserSubstance[];
  /** Row (1-based, in the range) of each substance's first row and of each of its forms. */
  readonly rows: { readonly first: number; readonly forms: number[] }[];
}

function cell(row: readonly unknown[], column: number): unknown {
  return column < row.length ? row[column] : null;
}

/**
 * Longest counter-ion entry read ("2 Na+", "Mg2+ 0.5"): the pattern below may try each
 * split of a long run of letters and digits, so a hostile entry is refused by length first.
 */
const MAX_COUNTER_ION_LENGTH = 40;

/** Counter-ions as written: "Na+", "2 Na+", "Na+ 2", "K+; Cl-". */
function parseCounterIons(text: string): Record<string, number> {
  const ions: Record<string, number> = {};
  for (const part of text
    .split(/[;,]/)
    .map((p) => p.trim())
    .filter((p) => p !== '')) {
    if (part.length > MAX_COUNTER_ION_LENGTH) throw invalid('badCounterIons', 'counter-ions', SHEET_MESSAGES.badCounterIons(text.length > 60 ? `${text.slice(0, 60)}…` : text));
    const m = /^(\d+(?:\.\d+)?)?\s*([A-Za-z][A-Za-z0-9]*\s*[+\-−]*)\s*(\d+(?:\.\d+)?)?$/.exec(part);
    if (!m || (m[1] && m[3])) throw invalid('badCounterIons', 'counter-ions', SHEET_MESSAGES.badCounterIons(text));
    const ion = findStrongIon('counter-ions', m[2].trim()).name;
    ions[ion] = (ions[ion] ?? 0) + Number(m[1] ?? m[3] ?? 1);
  }
  return ions;
}

function sameList(a: readonly number[] | undefined, b: readonly number[]): boolean {
  return a !== undefined && a.length === b.length && a.every((x, i) => x === b[i]);
}

function parseRows(range: readonly (readonly unknown[])[]): Parsed {
  const substances: UserSubstance[] = [];
  const rows: { first: number; forms: number[] }[] = [];
  const byName = new Map<string, number>();
  let seenRow = false;
  range.forEach((row, index) => {
    const rowNumber = index + 1;
    if (isBlank(cell(row, 0))) return;
    if (!seenRow) {
      seenRow = true;
      const charge = cell(row, 1);
      if (typeof charge === 'string' && !isBlank(charge) && Number.isNaN(Number(charge))) return; // header
    }
    try {
      const name = toText('name', cell(row, 0));
      const key = name.toLowerCase();
      const chargeCell = cell(row, 1);
      const pKaCell = cell(row, 2);
      const known = byName.get(key);
      const pKa = toNumberList('pKa list', pKaCell, MAX_STEPS);
      const dH = toNumberList('ΔH list', cell(row, 3), MAX_STEPS);
      const dCp = toNumberList('ΔCp list', cell(row, 4), MAX_STEPS);
      let substance: UserSubstance;
      if (known === undefined || !isBlank(chargeCell) || pKa.length > 0) {
        const charge = toNumber('charge of most protonated form', chargeCell, { min: -6, max: 6, integer: true, allowed: 'whole numbers -6 to 6' });
        if (pKa.length === 0) throw invalid('blank', 'pKa list', SHEET_MESSAGES.blank('pKa list', 'the pKa values, e.g. "6.1; 7.2"'));
        substance = { name, chargeOfMostProtonated: charge, pKa, ...(dH.length ? { deltaHkJ: dH } : {}), ...(dCp.length ? { deltaCpJ: dCp } : {}), forms: [] };
        if (known !== undefined) {
          const first = substances[known];
          if (first.chargeOfMostProtonated !== charge || !sameList(first.pKa, pKa))
            throw invalid('userSubstanceConflict', 'userSubstances', SHEET_MESSAGES.userSubstanceConflict(name, 'charge or pKa values'));
          if ((dH.length && !sameList(first.deltaHkJ, dH)) || (dCp.length && !sameList(first.deltaCpJ, dCp)))
            throw invalid('userSubstanceConflict', 'userSubstances', SHEET_MESSAGES.userSubstanceConflict(name, 'ΔH or ΔCp values'));
          substance = first;
        }
      } else {
        substance = substances[known];
      }
      const counterIonsText = cell(row, 7);
      const counterIons = isBlank(counterIonsText) ? {} : parseCounterIons(toText('counter-ions', counterIonsText));
      let netIonCharge = 0;
      for (const [ion, n] of Object.entries(counterIons)) netIonCharge += findStrongIon('counter-ions', ion).charge * n;
      const protonsLost = toNumber('protons lost', cell(row, 8), { default: substance.chargeOfMostProtonated + netIonCharge });
      const molarMassCell = cell(row, 6);
      const formulaCell = cell(row, 9);
      const form: UserForm = {
        name: toText('form name', cell(row, 5), name),
        protonsLost,
        counterIons,
        ...(isBlank(molarMassCell) ? {} : { molarMass: toNumber('molar mass g/mol', molarMassCell) }),
        ...(isBlank(formulaCell) ? {} : { formula: toText('formula', formulaCell) }),
      };
      if (known === undefined) {
        byName.set(key, substances.length);
        substances.push({ ...substance, forms: [form] });
        rows.push({ first: rowNumber, forms: [rowNumber] });
      } else {
        substances[known] = { ...substances[known], forms: [...(substances[known].forms ?? []), form] };
        rows[known].forms.push(rowNumber);
      }
    } catch (error) {
      withContext(error, USER_SUBSTANCES_ARGUMENT, rowNumber);
    }
  });
  return { substances, rows };
}

/** Libraries built from user ranges, by the range's content (few distinct tables per workbook). */
const libraries = new Lru<SubstanceLibrary>(16);

/**
 * The substance library for a call: the built-in one, plus the user's range when given.
 *
 * @param value - the userSubstances argument (blank, or a range as described above)
 * @returns a library; throws with the range row at fault on a bad definition
 */
export function libraryFor(value: unknown): SubstanceLibrary {
  // Most calls pass no range at all: answered before any range is built.
  if (isBlank(value)) return defaultLibrary();
  checkRowLimit(USER_SUBSTANCES_ARGUMENT, value);
  const range = toRange(value);
  if (range.every((row) => row.every(isBlank))) return defaultLibrary();
  const key = JSON.stringify(range);
  const cached = libraries.get(key);
  if (cached) return cached;
  const parsed = parseRows(range);
  if (parsed.substances.length === 0) return defaultLibrary();
  let library: SubstanceLibrary;
  try {
    library = createLibrary(parsed.substances);
  } catch (error) {
    // The core names the record by index (validation) or by name (a clash with the library).
    const field = error instanceof ChemError ? (error.field ?? '') : '';
    const byIndex = /^userSubstances\[(\d+)\](?:\.forms\[(\d+)\])?/.exec(field);
    const byName = /^userSubstances\["(.*?)"\]/.exec(field);
    const index = byIndex ? Number(byIndex[1]) : byName ? parsed.substances.findIndex((u) => u.name === byName[1]) : -1;
    if (index >= 0 && index < parsed.rows.length) {
      const where = parsed.rows[index];
      const row = byIndex?.[2] === undefined ? where.first : where.forms[Number(byIndex[2])];
      withContext(error, USER_SUBSTANCES_ARGUMENT, row);
    }
    throw error;
  }
  libraries.set(key, library);
  return library;
}

/**
 * Rows the user range could add to a list (at most one per row): a list's size is then
 * known from the range's shape alone, as HyperFormula needs at parse time.
 */
export function userRowCount(value: unknown): number {
  if (Array.isArray(value)) return value.length;
  return isBlank(value) ? 0 : 1;
}
