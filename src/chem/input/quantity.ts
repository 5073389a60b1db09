/**
 * The one reader of what people type: numbers, decimal commas, units and lists. Every host
 * (worksheet functions, the pane, the command line) calls it, so "7,4", "50 mM", "0.5 L" and
 * "4 °C" mean the same everywhere.
 *
 * Grammar (docs/input.md):
 * - a number: optional sign, digits with one decimal mark (point, or a lone comma as in
 *   "7,4"), optional exponent (`e`/`E`); "1,000" is refused (decimal comma or thousands
 *   separator cannot be told apart), and so is any text longer than MAX_NUMBER_TEXT;
 * - optionally followed (or, for pH, preceded) by a unit of the quantity's dimension;
 *   units that differ only by case where the meaning differs (m / M) are refused rather
 *   than guessed;
 * - a list: items separated by ";" or line breaks only, so a decimal comma never splits.
 *
 * Method: a hand-written scanner, one pass over the text (no backtracking regular
 * expressions), so the time is linear in the length of the text.
 */
import { ChemError, MESSAGES } from '../errors';

/** What a number measures; each dimension has its own units. */
export type Dimension = 'pH' | 'temperature' | 'concentration' | 'volume' | 'fraction' | 'percent' | 'osmolarity' | 'osmolality' | 'conductivity' | 'count' | 'mass';

/** Longest text read as one number with its unit: no real entry needs more, and it bounds the work. */
export const MAX_NUMBER_TEXT = 64;
/** Most items in one typed list (a pH series of a recipe table is far shorter). */
export const MAX_LIST_ITEMS = 2000;
/** Longest text read as a list. */
export const MAX_LIST_TEXT = 100_000;

/**
 * Units by dimension: the factor that converts a value in that unit to the dimension's base
 * unit (mol/L, mL, °C, fraction, mOsm/L). Exact spellings; see `unitFactor` for case.
 */
const UNITS: Readonly<Record<Dimension, Readonly<Record<string, number>>>> = {
  pH: { pH: 1 },
  temperature: { '°C': 1, '° C': 1, C: 1, degC: 1, '℃': 1 },
  concentration: {
    M: 1,
    'mol/L': 1,
    'mol/l': 1,
    mM: 1e-3,
    'mmol/L': 1e-3,
    'mmol/l': 1e-3,
    µM: 1e-6,
    μM: 1e-6,
    uM: 1e-6,
    'µmol/L': 1e-6,
    'μmol/L': 1e-6,
    'umol/L': 1e-6,
  },
  volume: { L: 1000, l: 1000, mL: 1, ml: 1, µL: 1e-3, μL: 1e-3, uL: 1e-3, ul: 1e-3 },
  fraction: {},
  percent: { '%': 1 },
  osmolarity: { 'mOsm/L': 1, 'Osm/L': 1000 },
  osmolality: { 'mOsm/kg': 1, 'Osm/kg': 1000 },
  conductivity: { 'mS/cm': 1, 'µS/cm': 1e-3, 'μS/cm': 1e-3, 'uS/cm': 1e-3, 'S/m': 10, 'mS/m': 0.01 },
  count: { '×': 1, x: 1 },
  mass: { g: 1, mg: 1e-3, kg: 1000 },
};

/** The base unit of each dimension, as shown to users. */
export const BASE_UNIT: Readonly<Record<Dimension, string>> = {
  pH: 'pH',
  temperature: '°C',
  concentration: 'M',
  volume: 'mL',
  fraction: '',
  percent: '%',
  osmolarity: 'mOsm/L',
  osmolality: 'mOsm/kg',
  conductivity: 'mS/cm',
  count: '×',
  mass: 'g',
};

/** The units a dimension accepts (every spelling). */
export function unitsOf(dimension: Dimension): readonly string[] {
  return Object.keys(UNITS[dimension]);
}

/** The spellings shown in messages and help, main ones only. */
const SHOWN_UNITS: Readonly<Record<Dimension, readonly string[]>> = {
  pH: ['pH'],
  temperature: ['°C'],
  concentration: ['M', 'mM', 'µM'],
  volume: ['L', 'mL', 'µL'],
  fraction: [],
  percent: ['%'],
  osmolarity: ['mOsm/L', 'Osm/L'],
  osmolality: ['mOsm/kg', 'Osm/kg'],
  conductivity: ['mS/cm', 'µS/cm', 'S/m'],
  count: ['×'],
  mass: ['g', 'mg', 'kg'],
};

/** An example of a typed number of each dimension, for messages. */
const EXAMPLE: Readonly<Record<Dimension, string>> = {
  pH: '"7.4" or "7,4"',
  temperature: '"25" or "4 °C"',
  concentration: '"50 mM" or "0,5 M"',
  volume: '"500 mL" or "0.5 L"',
  fraction: '"0.8" or "0,8"',
  percent: '"99.5" or "99.5%"',
  osmolarity: '"300 mOsm/L"',
  osmolality: '"290 mOsm/kg"',
  conductivity: '"15 mS/cm"',
  count: '"10"',
  mass: '"12.5 g" or "350 mg"',
};

/** The units shown for a dimension in messages and help. */
export function shownUnits(dimension: Dimension): readonly string[] {
  return SHOWN_UNITS[dimension];
}

/**
 * The factor of a unit as typed. Exact spellings first; otherwise a case-insensitive match
 * is taken only when it is unique and no other unit of the dimension reads the same letters
 * in another case with another meaning ("m" could be mM or M: refused).
 */
function unitFactor(dimension: Dimension, typed: string): number | 'ambiguous' | undefined {
  const units = UNITS[dimension];
  if (units[typed] !== undefined) return units[typed];
  const lower = typed.toLowerCase();
  const matches = Object.keys(units).filter((u) => u.toLowerCase() === lower);
  if (matches.length === 0) return undefined;
  // In concentrations case carries the meaning (m as in mM, M as in mol/L): "5 m" or "5 mm"
  // is the classic slip, so any other case than the one written in the table is refused.
  if (dimension === 'concentration') return 'ambiguous';
  const factors = new Set(matches.map((u) => units[u]));
  return factors.size === 1 ? units[matches[0]] : 'ambiguous';
}

function isDigit(c: number): boolean {
  return c >= 48 && c <= 57;
}

/**
 * Scans a number at the start of `text`: returns its value and where it ends, or undefined.
 * Accepts a lone decimal comma ("7,4"); refuses a comma followed by exactly three digits and
 * no more ("1,000") as ambiguous.
 */
function scanNumber(field: string, original: unknown, text: string): { value: number; end: number } | undefined {
  let i = 0;
  const n = text.length;
  let out = '';
  if (i < n && (text[i] === '+' || text[i] === '-')) out += text[i++];
  let digitsBefore = 0;
  while (i < n && isDigit(text.charCodeAt(i))) {
    out += text[i++];
    digitsBefore++;
  }
  let digitsAfter = 0;
  if (i < n && (text[i] === '.' || text[i] === ',')) {
    const comma = text[i] === ',';
    i++;
    let frac = '';
    while (i < n && isDigit(text.charCodeAt(i))) {
      frac += text[i++];
      digitsAfter++;
    }
    if (comma) {
      if (digitsBefore === 0 || digitsAfter === 0) return undefined;
      // "1,000" could be one thousand ("0,025" could not); a second mark ("1,000.5", "1,2,3")
      // is never a decimal comma.
      const zeroWhole = /^[+-]?0+$/.test(out);
      if ((digitsAfter === 3 && !zeroWhole) || (i < n && (text[i] === ',' || text[i] === '.'))) {
        throw new ChemError('invalid-input', 'ambiguousNumber', MESSAGES.ambiguousNumber(field, original), field, 'a number with one decimal mark, e.g. 7.4 or 7,4');
      }
    } else if (i < n && (text[i] === ',' || text[i] === '.')) {
      return undefined;
    }
    out += '.' + frac;
  }
  if (digitsBefore === 0 && digitsAfter === 0) return undefined;
  if (i < n && (text[i] === 'e' || text[i] === 'E')) {
    let j = i + 1;
    let exp = 'e';
    if (j < n && (text[j] === '+' || text[j] === '-')) exp += text[j++];
    const start = j;
    while (j < n && isDigit(text.charCodeAt(j))) exp += text[j++];
    // An "e" not followed by digits is not an exponent (it may start a unit); leave it.
    if (j > start) {
      out += exp;
      i = j;
    }
  }
  const value = Number(out);
  return Number.isFinite(value) ? { value, end: i } : undefined;
}

/**
 * Reads one number, optionally with a unit of the dimension, and returns it in `unit`
 * (a unit of the same dimension; its base unit when omitted).
 *
 * @param field - the field's name as the user wrote it, for messages
 * @param value - a number, or text such as "7,4", "50 mM", "0.5 L", "4 °C", "pH 7.4"
 * @param dimension - what the number measures
 * @param unit - the unit wanted (e.g. `mM`); default the dimension's base unit
 * @returns the number in `unit`
 * @throws ChemError invalid-input with code notANumber, ambiguousNumber, wrongUnit or ambiguousUnit
 * @example readQuantity('concentrationMm', '0,5 M', 'concentration', 'mM') //=> 500
 */
export function readQuantity(field: string, value: unknown, dimension: Dimension, unit: string = BASE_UNIT[dimension]): number {
  const wanted = unit === BASE_UNIT[dimension] || unit === '' ? 1 : UNITS[dimension][unit];
  if (wanted === undefined) throw new Error(`Unit ${unit} is not a unit of ${dimension}`);
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new ChemError('invalid-input', 'notFinite', MESSAGES.notFinite(field, value), field, `a number in ${unit || 'plain numbers'}`);
    return value;
  }
  if (typeof value !== 'string')
    throw new ChemError('invalid-input', 'notANumber', MESSAGES.notANumber(field, value, EXAMPLE[dimension]), field, `a number in ${unit || 'plain numbers'}`);
  if (value.length > MAX_NUMBER_TEXT)
    throw new ChemError('invalid-input', 'notANumber', MESSAGES.notANumber(field, `${value.slice(0, 20)}…`, EXAMPLE[dimension]), field, `a number in ${unit || 'plain numbers'}`);
  let text = value.trim();
  if (dimension === 'pH' && /^ph(?![a-z])/i.test(text)) text = text.slice(2).trimStart();
  const scanned = scanNumber(field, value, text);
  if (!scanned) throw new ChemError('invalid-input', 'notANumber', MESSAGES.notANumber(field, value, EXAMPLE[dimension]), field, `a number in ${unit || 'plain numbers'}`);
  const rest = text.slice(scanned.end).trim().replace(/\s+/g, ' ');
  if (rest === '') return scanned.value;
  // "7.0 7.2" is two numbers, not a number and a unit.
  if (/^[\d.,+-]/.test(rest))
    throw new ChemError('invalid-input', 'notANumber', MESSAGES.notANumber(field, value, EXAMPLE[dimension]), field, `one number in ${unit || 'plain numbers'}`);
  const factor = unitFactor(dimension, rest);
  const allowed = shownUnits(dimension);
  if (factor === 'ambiguous') {
    throw new ChemError('invalid-input', 'ambiguousUnit', MESSAGES.ambiguousUnit(field, rest, allowed), field, allowed.join(', '));
  }
  if (factor === undefined) {
    throw new ChemError('invalid-input', 'wrongUnit', MESSAGES.wrongUnit(field, rest, allowed), field, allowed.length ? allowed.join(', ') : 'a plain number');
  }
  return (scanned.value * factor) / wanted;
}

/**
 * Splits typed text into list items: ";" or line breaks only (so "7,4" stays one number).
 *
 * @param field - the field, for messages
 * @param text - what was typed
 * @returns the non-empty items, trimmed
 */
export function splitList(field: string, text: string, maxItems: number = MAX_LIST_ITEMS): string[] {
  if (text.length > MAX_LIST_TEXT) throw new ChemError('invalid-input', 'listTooLong', MESSAGES.listTooLong(field, maxItems), field, `up to ${maxItems} items`);
  const items: string[] = [];
  let start = 0;
  for (let i = 0; i <= text.length; i++) {
    const c = i < text.length ? text[i] : ';';
    if (c === ';' || c === '\n' || c === '\r') {
      const item = text.slice(start, i).trim();
      if (item !== '') items.push(item);
      if (items.length > maxItems) throw new ChemError('invalid-input', 'listTooLong', MESSAGES.listTooLong(field, maxItems), field, `up to ${maxItems} items`);
      start = i + 1;
    }
  }
  return items;
}

/**
 * Reads a list of quantities: a number, or text such as "6.8; 7.0; 7,2" (";" or line
 * breaks between items), each item read by `readQuantity`.
 *
 * @example readQuantityList('targetPh', '7,4; 7.6', 'pH') //=> [7.4, 7.6]
 */
export function readQuantityList(field: string, value: unknown, dimension: Dimension, unit: string = BASE_UNIT[dimension], maxItems: number = MAX_LIST_ITEMS): number[] {
  if (value === undefined || value === null) return [];
  if (typeof value === 'number') return [readQuantity(field, value, dimension, unit)];
  if (typeof value !== 'string') throw new ChemError('invalid-input', 'notANumber', MESSAGES.notANumber(field, value, EXAMPLE[dimension]), field, `numbers separated by ";"`);
  return splitList(field, value, maxItems).map((item) => readQuantity(field, item, dimension, unit));
}
