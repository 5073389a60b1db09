/**
 * Argument coercion, in one place: what a user types into a cell becomes what the core
 * wants. Numbers may come as text ("7.4", " 25 "); blank cells and omitted arguments take
 * defaults; a single cell or a literal stands for a 1×1 range; names are matched without
 * regard to case by the library; purity may be a fraction or a percentage.
 *
 * Hosts hand values over already unwrapped: numbers, strings, booleans, null for blank.
 */
import { ACTIVITY_MODELS, ActivityModel, MESSAGES } from '../chem';
import { invalid } from './errors';
import { SHEET_MESSAGES } from './messages';

/** A cell value as hosts pass it. */
export type CellInput = number | string | boolean | null | undefined;

/** True for an omitted argument, an empty cell or an empty string. */
export function isBlank(value: unknown): boolean {
  return value === undefined || value === null || (typeof value === 'string' && value.trim() === '');
}

/** A number from a number or numeric text; `undefined` when the text is not a number. */
function parseNumber(value: unknown): number | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? value : undefined;
  if (typeof value !== 'string') return undefined;
  const text = value.trim();
  // Number('') is 0 and Number('0x1F') is 31: accept plain decimal notation only.
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(text)) return undefined;
  return Number(text);
}

/**
 * Units a number typed as text may carry, by the unit in the argument's name (its
 * suffix: `concentrationMm`, `titrantConcentrationM`, `volumeMl`, `temperatureC`), with the
 * factor that converts each to the argument's own unit.
 */
const UNITS_BY_SUFFIX: readonly (readonly [RegExp, Readonly<Record<string, number>>])[] = [
  [/(Mm|\(mM\))$/, { mM: 1, M: 1000, 'µM': 0.001, uM: 0.001 }],
  [/(M|\(M\))$/, { M: 1, mM: 0.001 }],
  [/(Ml|\(mL\))$/, { mL: 1, L: 1000, 'µL': 0.001, uL: 0.001 }],
  [/(C|\(°C\))$/, { '°C': 1, C: 1, '° C': 1 }],
  [/Ph$/, { pH: 1 }],
];

function unitsFor(argument: string): Readonly<Record<string, number>> | undefined {
  return UNITS_BY_SUFFIX.find(([suffix]) => suffix.test(argument))?.[1];
}

/** The factor of a unit as typed (case matters only where it must: M versus mM). */
function unitFactor(units: Readonly<Record<string, number>> | undefined, typed: string): number | undefined {
  if (!units) return undefined;
  if (units[typed] !== undefined) return units[typed];
  const lower = typed.toLowerCase();
  const matches = Object.keys(units).filter((u) => u.toLowerCase() === lower);
  return matches.length === 1 ? units[matches[0]] : undefined;
}

/**
 * Reads what a user typed: a number, numeric text ("7.4"), a decimal comma ("7,4"), or a
 * number with the argument's unit ("50 mM", "0.5 L", "25 °C", "pH 7.4"). Throws a message
 * naming the argument when the text cannot be read or carries a unit the argument does
 * not take.
 */
function readNumber(argument: string, value: unknown): number {
  const plain = parseNumber(value);
  if (plain !== undefined) return plain;
  if (typeof value !== 'string') throw invalid(SHEET_MESSAGES.notANumber(argument, value));
  let text = value.trim().replace(/\s+/g, ' ');
  if (/^ph\s*/i.test(text) && /Ph$/.test(argument)) text = text.replace(/^ph\s*/i, '');
  const match = /^([+-]?[\d.,]+(?:e[+-]?\d+)?)\s*([^\d\s].*)?$/i.exec(text);
  if (!match) throw invalid(SHEET_MESSAGES.notANumber(argument, value));
  let digits = match[1];
  if (digits.includes(',')) {
    // One comma and no point is a decimal comma ("7,4"); three digits after it could be a
    // thousands separator ("1,000"), so that is refused rather than guessed.
    if (digits.includes('.') || (digits.match(/,/g) ?? []).length > 1 || /,\d{3}$/.test(digits)) {
      throw invalid(SHEET_MESSAGES.ambiguousNumber(argument, value));
    }
    digits = digits.replace(',', '.');
  }
  const n = parseNumber(digits);
  if (n === undefined) throw invalid(SHEET_MESSAGES.notANumber(argument, value));
  const unit = match[2]?.trim();
  if (!unit) return n;
  const units = unitsFor(argument);
  const factor = unitFactor(units, unit);
  if (factor === undefined) throw invalid(SHEET_MESSAGES.wrongUnit(argument, unit, units ? Object.keys(units) : []));
  return n * factor;
}

/** Limits for a numeric argument. */
export interface NumberRule {
  /** Used when the argument is blank; without it a blank is an error. */
  readonly default?: number;
  readonly min?: number;
  readonly max?: number;
  /** Words for the allowed range, with units (e.g. `0 to 100 °C`). */
  readonly allowed?: string;
  /** Require a whole number. */
  readonly integer?: boolean;
}

/**
 * A numeric argument.
 *
 * @param argument - the parameter's name as the user sees it
 * @param value - the cell value
 * @param rule - default and limits
 * @returns the number
 */
export function toNumber(argument: string, value: unknown, rule: NumberRule = {}): number {
  if (isBlank(value)) {
    if (rule.default !== undefined) return rule.default;
    throw invalid(SHEET_MESSAGES.blank(argument, rule.allowed ? `a number, ${rule.allowed}` : 'a number'));
  }
  const n = readNumber(argument, value);
  const min = rule.min ?? -Infinity;
  const max = rule.max ?? Infinity;
  const allowed = rule.allowed ?? `${min} to ${max}`;
  if (n < min || n > max) throw invalid(MESSAGES.outOfRange(argument, n, allowed));
  if (rule.integer && !Number.isInteger(n)) throw invalid(MESSAGES.notInteger(argument, n));
  return n;
}

/**
 * A text argument (numbers are accepted as their text: a substance could be named "3").
 *
 * @param argument - the parameter's name
 * @param value - the cell value
 * @param fallback - used when blank; without it a blank is an error
 * @returns the trimmed text
 */
export function toText(argument: string, value: unknown, fallback?: string): string {
  if (isBlank(value)) {
    if (fallback !== undefined) return fallback;
    throw invalid(SHEET_MESSAGES.blank(argument, 'a name'));
  }
  if (typeof value === 'number') return String(value);
  if (typeof value !== 'string') throw invalid(SHEET_MESSAGES.notText(argument, value));
  return value.trim();
}

/**
 * A 2-D range from whatever the host passed: a range stays, a single value becomes 1×1,
 * a blank becomes an empty range.
 */
export function toRange(value: unknown): readonly (readonly unknown[])[] {
  if (isBlank(value)) return [];
  if (!Array.isArray(value)) return [[value]];
  return value.map((row) => (Array.isArray(row) ? row : [row]));
}

/** True when a range holds nothing but blanks. */
export function isBlankRange(value: unknown): boolean {
  return toRange(value).every((row) => row.every(isBlank));
}

/** Temperature argument: blank means 25 °C; 0–100 °C (liquid water at 1 atm, as the core accepts). */
export function toTemperature(argument: string, value: unknown, required = false): number {
  return toNumber(argument, value, required ? TEMPERATURE_REQUIRED : TEMPERATURE_OPTIONAL);
}

// Fixed rule objects: building one per call (with a spread) cost microseconds on the hot path.
const TEMPERATURE_REQUIRED: NumberRule = { min: 0, max: 100, allowed: '0 to 100 °C' };
const TEMPERATURE_OPTIONAL: NumberRule = { default: 25, min: 0, max: 100, allowed: '0 to 100 °C' };

/**
 * Activity model: blank means Davies; case, spaces and underscores do not matter
 * ("Bates Guggenheim" is "bates-guggenheim").
 */
export function toActivityModel(argument: string, value: unknown): ActivityModel {
  if (isBlank(value)) return ACTIVITY_MODELS[0];
  const text = toText(argument, value, ACTIVITY_MODELS[0]).toLowerCase().replace(/[\s_–]+/g, '-');
  const found = ACTIVITY_MODELS.find((m) => m === text);
  if (!found) throw invalid(MESSAGES.unknownModel(argument, String(value), ACTIVITY_MODELS.join(', ')));
  return found;
}

/**
 * Purity of a weighed form as a fraction. Blank is 1 (pure). A number above 0 up to 1 is a
 * fraction (0.995); above 1 up to 100 a percentage (99.5); text may end in "%" ("99.5%").
 * A cell formatted as a percentage already holds the fraction.
 */
export function toPurity(value: unknown): number {
  if (isBlank(value)) return 1;
  let n: number | undefined;
  if (typeof value === 'string' && value.trim().endsWith('%')) {
    const p = parseNumber(value.trim().slice(0, -1));
    n = p === undefined ? undefined : p / 100;
    if (n !== undefined && !(n > 0 && n <= 1)) n = undefined;
  } else {
    const raw = parseNumber(value);
    if (raw !== undefined && raw > 0 && raw <= 1) n = raw;
    else if (raw !== undefined && raw > 1 && raw <= 100) n = raw / 100;
  }
  if (n === undefined) throw invalid(SHEET_MESSAGES.badPurity(value));
  return n;
}

/**
 * One of a few words (case and spacing ignored).
 *
 * @param argument - the parameter's name
 * @param value - the cell value
 * @param choices - canonical word → accepted spellings (normalised: lower case, no spaces)
 * @param fallback - canonical word used when blank
 */
export function toChoice<T extends string>(argument: string, value: unknown, choices: Readonly<Record<T, readonly string[]>>, fallback: T): T {
  if (isBlank(value)) return fallback;
  const key = toText(argument, value).toLowerCase().replace(/\s+/g, '');
  for (const [word, spellings] of Object.entries(choices) as [T, readonly string[]][]) {
    if (word === key || spellings.includes(key)) return word;
  }
  throw invalid(SHEET_MESSAGES.unknownChoice(argument, value, Object.keys(choices)));
}

/**
 * A list of numbers from one cell: a number, or text such as "6.1; 7.2" (also
 * separated by spaces, or by commas when no semicolon is used).
 *
 * @returns the numbers; empty for a blank
 */
export function toNumberList(argument: string, value: unknown): number[] {
  if (isBlank(value)) return [];
  if (typeof value === 'number') return [value];
  const text = toText(argument, value);
  const parts = text.split(text.includes(';') ? /\s*;\s*/ : /[\s,]+/).filter((p) => p !== '');
  const numbers = parts.map(parseNumber);
  if (numbers.some((n) => n === undefined)) throw invalid(SHEET_MESSAGES.badList(argument, text));
  return numbers as number[];
}
