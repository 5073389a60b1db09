/**
 * Argument coercion, in one place: what a user types into a cell becomes what the core
 * wants. Numbers may come as text ("7.4", " 25 "); blank cells and omitted arguments take
 * defaults; a single cell or a literal stands for a 1×1 range; names are matched without
 * regard to case by the library; purity may be a fraction or a percentage.
 *
 * Hosts hand values over already unwrapped: numbers, strings, booleans, null for blank.
 */
import { ActivityModel, MESSAGES } from '../chem';
// From the modules themselves rather than the input index: each call through a re-exported name costs a getter in the CommonJS build (the command line).
import { Dimension, readQuantity, readQuantityList } from '../chem/input/quantity';
import { readChoiceField, readPurityField, requireNumberField } from '../chem/input/fields';
import { invalid } from './errors';
import { SHEET_MESSAGES } from './messages';

/** A cell value as hosts pass it. */
export type CellInput = number | string | boolean | null | undefined;

/** True for an omitted argument, an empty cell or an empty string. */
export function isBlank(value: unknown): boolean {
  return value === undefined || value === null || (typeof value === 'string' && value.trim() === '');
}

/**
 * The dimension and unit of an argument, by the unit in its name (its suffix:
 * `concentrationMm`, `titrantConcentrationM`, `volumeMl`, `temperatureC`, `targetPh`); a
 * plain number for any other name.
 */
const UNIT_BY_SUFFIX: readonly (readonly [RegExp, Dimension, string])[] = [
  [/(Mm|\(mM\))$/, 'concentration', 'mM'],
  [/(M|\(M\))$/, 'concentration', 'M'],
  [/(Ml|\(mL\))$/, 'volume', 'mL'],
  [/(C|\(°C\))$/, 'temperature', '°C'],
  [/Ph$/, 'pH', 'pH'],
  [/Percent$/, 'percent', '%'],
];

/** Reads what a user typed for an argument, with the one input reader (src/chem/input). */
function readNumber(argument: string, value: unknown): number {
  const found = UNIT_BY_SUFFIX.find(([suffix]) => suffix.test(argument));
  return found ? readQuantity(argument, value, found[1], found[2]) : readQuantity(argument, value, 'fraction');
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
  const min = rule.min ?? -Infinity;
  const max = rule.max ?? Infinity;
  const allowed = rule.allowed ?? `${min} to ${max}`;
  if (isBlank(value)) {
    if (rule.default !== undefined) return rule.default;
    throw invalid('blank', argument, SHEET_MESSAGES.blank(argument, rule.allowed ? `a number, ${rule.allowed}` : 'a number'), allowed);
  }
  const n = readNumber(argument, value);
  if (n < min || n > max) throw invalid('outOfRange', argument, MESSAGES.outOfRange(argument, n, allowed), allowed);
  if (rule.integer && !Number.isInteger(n)) throw invalid('notInteger', argument, MESSAGES.notInteger(argument, n), allowed);
  return n;
}

/**
 * A declared input field (src/chem/input): its unit, range and default come from the one
 * declaration every host uses. Blank takes the default; a field with none is an error.
 *
 * @param name - the declared field (`concentrationMm`, `titrant.concentrationM`, …)
 * @param value - the cell value
 * @param argument - the argument's name as the user sees it (default: the field's)
 */
export function toField(name: string, value: unknown, argument: string = name): number {
  return requireNumberField(name, value, argument);
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
    throw invalid('blank', argument, SHEET_MESSAGES.blank(argument, 'a name'), 'a name');
  }
  if (typeof value === 'number') return String(value);
  if (typeof value !== 'string') throw invalid('notText', argument, SHEET_MESSAGES.notText(argument, value), 'a name');
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

/** Temperature argument: blank means 25 °C (the declared default); 0–100 °C. */
export function toTemperature(argument: string, value: unknown, required = false): number {
  if (required && isBlank(value)) throw invalid('blank', argument, SHEET_MESSAGES.blank(argument, 'a number, 0 to 100 °C'), '0 to 100 °C');
  return requireNumberField('temperatureC', value, argument);
}

/** Activity model: blank means the default; case, spaces and underscores do not matter ("Bates Guggenheim"). */
export function toActivityModel(argument: string, value: unknown): ActivityModel {
  return readChoiceField('activityModel', value, argument) as ActivityModel;
}

/**
 * Purity of a weighed form as a fraction. Blank is 1 (pure). A number above 0 up to 1 is a
 * fraction (0.995); above 1 up to 100 a percentage (99.5); text may end in "%" ("99.5%").
 * A cell formatted as a percentage already holds the fraction.
 */
export function toPurity(value: unknown, argument = 'purity'): number {
  return (readPurityField('purity', value, argument) ?? 100) / 100;
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
  throw invalid('unknownChoice', argument, SHEET_MESSAGES.unknownChoice(argument, value, Object.keys(choices)), Object.keys(choices).join(', '));
}

/**
 * A list of numbers from one cell: a number, or text such as "6.1; 7.2" (";" or line breaks
 * between items, so "7,4" is one number with a decimal comma, as everywhere).
 *
 * @returns the numbers; empty for a blank
 */
export function toNumberList(argument: string, value: unknown, maxItems?: number): number[] {
  if (isBlank(value)) return [];
  return readQuantityList(argument, value, 'fraction', '', maxItems);
}
