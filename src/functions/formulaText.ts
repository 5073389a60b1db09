/**
 * A formula's text before it reaches the formula engine, for every host (the preview page
 * and the command line's calc): Excel's ways of writing that the engine does not read are
 * rewritten to ones it does, and a formula that cannot be read is described in plain
 * words — where and what — instead of the engine's parser message.
 *
 * Excel's forms rewritten (HyperFormula 3.5 reads neither):
 * - an upper-case exponent in a number, `6.022E+23` → `6.022e+23`;
 * - a quote inside text, written doubled, `"a""b"` → `("a"&CHAR(34)&"b")`;
 * - the names Excel saves custom functions under, `_xldudf_PROTON_PH_OF(` → `PROTON.PH.OF(` (toEngineFormula).
 */
import { closestNames, editDistance } from '../chem/library/names';
import { formulaLimitBreach } from '../workbook/formulaLimits';
import { toEngineFormula } from './formulaEngine';
import { FORMULA_MESSAGES } from './messages';

/** A piece of formula text: outside quotes, a "…" text, or a '…' sheet name. */
interface Piece {
  readonly kind: 'code' | 'text' | 'sheet';
  readonly text: string;
  /** Index of the piece's first character in the formula. */
  readonly at: number;
  /** For a text or sheet name: false when the closing quote is missing. */
  readonly closed: boolean;
}

/** Splits a formula into code, "text" and 'sheet name' pieces (doubled quotes stay inside their piece). */
function pieces(formula: string): Piece[] {
  const out: Piece[] = [];
  let start = 0;
  let i = 0;
  while (i < formula.length) {
    const q = formula[i];
    if (q !== '"' && q !== "'") {
      i++;
      continue;
    }
    if (i > start) out.push({ kind: 'code', text: formula.slice(start, i), at: start, closed: true });
    let j = i + 1;
    let closed = false;
    while (j < formula.length) {
      if (formula[j] === q) {
        if (formula[j + 1] === q) j += 2;
        else {
          closed = true;
          j++;
          break;
        }
      } else j++;
    }
    out.push({ kind: q === '"' ? 'text' : 'sheet', text: formula.slice(i, j), at: i, closed });
    start = i = j;
  }
  if (start < formula.length) out.push({ kind: 'code', text: formula.slice(start), at: start, closed: true });
  return out;
}

/** A number with an upper-case exponent, not part of a name or a cell reference. */
const UPPER_EXPONENT = /(^|[^A-Za-z0-9_.$])(\d+(?:\.\d*)?|\.\d+)E([+-]?\d)/g;

/**
 * Excel's ways of writing numbers and text that the engine does not read, rewritten to
 * ones it does; everything else is left as written.
 *
 * @param formula - formula text, with or without the leading "="
 * @example excelFormsForEngine('=6.022E+23*LEN("a""b")') //=> '=6.022e+23*LEN(("a"&CHAR(34)&"b"))'
 */
export function excelFormsForEngine(formula: string): string {
  return pieces(formula)
    .map((p) => {
      if (p.kind === 'code') return p.text.replace(UPPER_EXPONENT, (_m, before: string, mantissa: string, exponent: string) => `${before}${mantissa}e${exponent}`);
      if (p.kind === 'text' && p.closed && p.text.length > 2 && p.text.slice(1, -1).includes('""')) {
        const parts = p.text.slice(1, -1).split('""');
        return `(${parts.map((s) => `"${s}"`).join('&CHAR(34)&')})`;
      }
      return p.text;
    })
    .join('');
}

/**
 * A formula as written in Excel (typed, pasted, or read from a saved file) made ready for
 * the engine: saved function names restored, then Excel's number and text forms rewritten.
 * The one function every host calls.
 *
 * @param formula - formula text, with or without the leading "="
 */
export function engineFormula(formula: string): string {
  return excelFormsForEngine(toEngineFormula(formula));
}

/** What is wrong with a formula's text, in plain words, and where (a 1-based character of the formula as written). */
export interface FormulaProblem {
  readonly code:
    'unclosedText' | 'unclosedBracket' | 'strayBracket' | 'nothingAfter' | 'nothingBefore' | 'unknownFunction' | 'emptyFormula' | 'tooLong' | 'tooDeep' | 'tooManyOperators';
  readonly at?: number;
  readonly message: string;
}

const BINARY = new Set(['*', '/', '^', '&', '=', '<', '>', '+', '-']);
/** Operators that cannot start an operand (+ and - can: they are also signs). */
const NEEDS_LEFT = new Set(['*', '/', '^', '&', '=', '<', '>']);

/** The limit a formula passes (length, nesting, operators: src/workbook/formulaLimits.ts), in plain words; undefined within them. */
export function formulaBeyondLimits(formula: string): FormulaProblem | undefined {
  const breach = formulaLimitBreach(formula);
  if (breach?.limit === 'length') return { code: 'tooLong', message: FORMULA_MESSAGES.tooLong(breach.value, breach.allowed) };
  if (breach?.limit === 'depth') return { code: 'tooDeep', message: FORMULA_MESSAGES.tooDeep(breach.value, breach.allowed) };
  if (breach?.limit === 'operators') return { code: 'tooManyOperators', message: FORMULA_MESSAGES.tooManyOperators(breach.value, breach.allowed) };
  return undefined;
}

/** Up to three known names nearest a mistyped one; a short name only when it is a near miss, not because the query contains it. */
function nearestFunctions(name: string, names: ReadonlyMap<string, string>): string[] {
  const limit = Math.max(2, Math.floor(name.length / 3));
  return closestNames(name, names, 6)
    .filter((n) => n.length >= 3 || editDistance(name, n) <= limit)
    .slice(0, 3);
}

/**
 * The first thing that keeps a formula from being read, or undefined when none is found:
 * the limits (length, nesting, operators), an unclosed text, brackets that do not pair, an
 * operator with nothing on one side, a function name the engine does not know (with the
 * nearest names it does).
 *
 * @param formula - the formula as written, with its leading "="
 * @param knownFunctions - every function name the engine knows, upper case
 */
export function formulaProblem(formula: string, knownFunctions: ReadonlySet<string>): FormulaProblem | undefined {
  const beyond = formulaBeyondLimits(formula);
  if (beyond) return beyond;
  const offset = formula.startsWith('=') ? 1 : 0;
  const body = formula.slice(offset);
  if (body.trim() === '') return { code: 'emptyFormula', message: FORMULA_MESSAGES.emptyFormula() };
  const parts = pieces(body);
  for (const p of parts) if (!p.closed && p.kind === 'text') return { code: 'unclosedText', at: p.at + offset + 1, message: FORMULA_MESSAGES.unclosedText(p.at + offset + 1) };
  // Code characters with their positions, texts and sheet names standing in as one value each.
  const tokens: { ch: string; at: number }[] = [];
  for (const p of parts) {
    if (p.kind === 'code') for (let k = 0; k < p.text.length; k++) tokens.push({ ch: p.text[k], at: p.at + k + offset + 1 });
    else tokens.push({ ch: 'v', at: p.at + offset + 1 });
  }
  const opened: number[] = [];
  for (const t of tokens) {
    if (t.ch === '(') opened.push(t.at);
    else if (t.ch === ')' && opened.pop() === undefined) return { code: 'strayBracket', at: t.at, message: FORMULA_MESSAGES.strayBracket(t.at) };
  }
  if (opened.length > 0) {
    const at = opened[opened.length - 1];
    return { code: 'unclosedBracket', at, message: FORMULA_MESSAGES.unclosedBracket(at, opened.length) };
  }
  const significant = tokens.filter((t) => !/\s/.test(t.ch));
  for (let k = 0; k < significant.length; k++) {
    const { ch, at } = significant[k];
    if (!BINARY.has(ch)) continue;
    const next = significant[k + 1]?.ch;
    const prev = significant[k - 1]?.ch;
    // Two-character comparisons (<=, >=, <>) are one operator.
    if ((ch === '<' && (next === '=' || next === '>')) || (ch === '>' && next === '=')) continue;
    if (next === undefined || next === ')' || next === ',' || (next !== undefined && NEEDS_LEFT.has(next) && !(ch === '<' || ch === '>')))
      return { code: 'nothingAfter', at, message: FORMULA_MESSAGES.nothingAfter(ch, at) };
    const joinsComparison = (ch === '=' || ch === '>') && (prev === '<' || prev === '>');
    if (NEEDS_LEFT.has(ch) && !joinsComparison && (prev === undefined || prev === '(' || prev === ',' || BINARY.has(prev)))
      return { code: 'nothingBefore', at, message: FORMULA_MESSAGES.nothingBefore(ch, at) };
  }
  const names = new Map([...knownFunctions].map((n) => [n, n]));
  for (const p of parts) {
    if (p.kind !== 'code') continue;
    for (const m of p.text.matchAll(/(^|[^A-Za-z0-9_.!$])([A-Za-z_][A-Za-z0-9_.]*)\s*\(/g)) {
      const name = m[2].toUpperCase();
      // A name as Excel saves it (`_xldudf_PROTON_PH_OF`, `_xlfn.CONCAT`) counts under the name it stands for.
      if (knownFunctions.has(name) || knownFunctions.has(toEngineFormula(`${m[2]}(`).slice(0, -1).toUpperCase())) continue;
      const at = p.at + m.index! + m[1].length + offset + 1;
      return { code: 'unknownFunction', at, message: FORMULA_MESSAGES.unknownFunction(m[2], at, nearestFunctions(name, names)) };
    }
  }
  return undefined;
}
