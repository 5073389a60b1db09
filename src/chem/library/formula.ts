/**
 * Chemical formulas as written on bottles, and molar masses computed from them.
 *
 * Method: a small recursive-descent reader. A formula is one or more parts joined by a
 * hydrate dot (`·`, `•` or `*`; a full stop is read as a decimal point); each part may start with a
 * multiplier (`10H2O`, `0.5Na`); within a part, elements are a capital letter plus
 * optional lower-case letter with an optional count (integer or decimal), and groups in
 * parentheses or brackets carry a count after them (`(NH4)2SO4`).
 *
 * References: IUPAC Commission on Isotopic Abundances and Atomic Weights (CIAAW),
 * standard atomic weights 2021, conventional/abridged values (ciaaw.org).
 */
import { ChemError, MESSAGES } from '../errors';

/**
 * Standard atomic weights, g/mol, of the elements the library needs. IUPAC CIAAW standard
 * atomic weights 2021, conventional values for elements with an interval (H, B, C, N, O,
 * Mg, S, Cl) and abridged values otherwise (Na, P, K, Ca, As).
 */
export const ATOMIC_WEIGHTS: Readonly<Record<string, number>> = {
  H: 1.008,
  B: 10.81,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  Na: 22.99,
  Mg: 24.305,
  P: 30.974,
  S: 32.06,
  Cl: 35.45,
  K: 39.098,
  Ca: 40.078,
  As: 74.922,
};

/** Source line for ATOMIC_WEIGHTS, for documents and records. */
export const ATOMIC_WEIGHTS_SOURCE = 'IUPAC standard atomic weights, conventional/abridged values, CIAAW 2021';

/** Element counts of a formula (may be fractional for hemi-salts). */
export type ElementCounts = Readonly<Record<string, number>>;

/** Deepest nesting of brackets read in a formula: real salts need two or three; the bound keeps a hostile formula from exhausting the stack. */
export const MAX_FORMULA_DEPTH = 16;

/** A count after an element or a group (sticky: read at the reader's position, never copying the rest of the text). */
const COUNT = /\d+(?:\.\d+)?/y;

/** Reads a formula left to right, once: time linear in its length. */
class Reader {
  pos = 0;
  constructor(
    readonly text: string,
    readonly field: string,
  ) {}

  fail(detail: string): never {
    throw new ChemError('invalid-input', 'badFormula', MESSAGES.badFormula(this.field, this.text, detail), this.field, 'a formula such as Na2HPO4·7H2O or (NH4)2SO4');
  }

  peek(): string {
    return this.text[this.pos] ?? '';
  }

  number(): number | undefined {
    COUNT.lastIndex = this.pos;
    const m = COUNT.exec(this.text);
    if (!m) return undefined;
    this.pos += m[0].length;
    return Number(m[0]);
  }

  /** A sequence of elements and groups up to a hydrate dot, a closing bracket or the end. */
  sequence(counts: Map<string, number>, factor: number, depth = 0): void {
    let any = false;
    for (;;) {
      const c = this.peek();
      if (c === '(' || c === '[') {
        if (depth >= MAX_FORMULA_DEPTH) this.fail(`brackets nested more than ${MAX_FORMULA_DEPTH} deep at position ${this.pos + 1}`);
        this.pos++;
        const inner = new Map<string, number>();
        this.sequence(inner, 1, depth + 1);
        const close = this.peek();
        if (close !== (c === '(' ? ')' : ']')) this.fail(`unclosed "${c}" at position ${this.pos + 1}`);
        this.pos++;
        const n = this.number() ?? 1;
        for (const [el, k] of inner) counts.set(el, (counts.get(el) ?? 0) + k * n * factor);
        any = true;
      } else if (/[A-Z]/.test(c)) {
        let symbol = c;
        this.pos++;
        if (/[a-z]/.test(this.peek())) {
          symbol += this.peek();
          this.pos++;
        }
        if (ATOMIC_WEIGHTS[symbol] === undefined) this.fail(`unknown element "${symbol}"`);
        const n = this.number() ?? 1;
        counts.set(symbol, (counts.get(symbol) ?? 0) + n * factor);
        any = true;
      } else {
        break;
      }
    }
    if (!any) this.fail(`expected an element at position ${this.pos + 1}`);
  }
}

/**
 * Counts the atoms of each element in a formula.
 *
 * @param formula - e.g. `Na2HPO4·7H2O`, `C4H11NO3·HCl`, `(NH4)2SO4`, `C8H17.5N2Na0.5O4S`
 * @param field - name of the input, for error messages
 * @returns element symbol → number of atoms
 * @example elementCounts('Na2HPO4·7H2O') // { Na: 2, H: 15, P: 1, O: 11 }
 */
export function elementCounts(formula: string, field = 'formula'): ElementCounts {
  if (typeof formula !== 'string' || formula.trim() === '') {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(field, 'a chemical formula'), field, 'a formula');
  }
  const text = formula.replace(/\s+/g, '').replace(/[•∙⋅*]/g, '·');
  const reader = new Reader(text, field);
  const counts = new Map<string, number>();
  for (;;) {
    const multiplier = reader.number() ?? 1;
    reader.sequence(counts, multiplier);
    if (reader.peek() === '·') {
      reader.pos++;
      continue;
    }
    if (reader.pos < text.length) reader.fail(`unexpected "${reader.peek()}" at position ${reader.pos + 1}`);
    break;
  }
  return Object.fromEntries(counts);
}

/**
 * Molar mass of a formula from IUPAC standard atomic weights.
 *
 * @param formula - chemical formula (see elementCounts)
 * @param field - name of the input, for error messages
 * @returns molar mass in g/mol
 * @example molarMassOf('C4H11NO3·HCl') // ≈ 157.59
 */
export function molarMassOf(formula: string, field = 'formula'): number {
  const counts = elementCounts(formula, field);
  let mass = 0;
  for (const [el, n] of Object.entries(counts)) mass += ATOMIC_WEIGHTS[el] * n;
  return mass;
}
