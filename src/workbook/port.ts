/**
 * The workbook port: everything the task pane may ask of a workbook. The pane holds no
 * Office.js and no grid code; it describes what to write (cells, formats, charts) and an
 * adapter does it — src/workbook/excelAdapter.ts for Excel, src/workbook/previewAdapter.ts
 * for the browser preview.
 *
 * Addresses are zero-based row/column pairs inside one sheet; adapters translate them.
 */

/** A literal value a cell may hold. */
export type CellValue = string | number | boolean | null;

/** How a cell looks; adapters map these to their own formats. */
export type CellStyle = 'title' | 'subtitle' | 'label' | 'header' | 'input' | 'result' | 'note' | 'warning' | 'caution' | 'provenance' | 'text';

/** One cell to write: a literal value or a formula (text starting with `=`). */
export interface CellWrite {
  readonly value?: CellValue;
  readonly formula?: string;
  /** Number format in spreadsheet notation, e.g. `0.00`, `0.0 "mL"`. */
  readonly numberFormat?: string;
  readonly style?: CellStyle;
}

/** A rectangle of cells written at (row, col). Rows may be shorter than the widest; missing cells stay empty. */
export interface CellBlock {
  readonly row: number;
  readonly col: number;
  readonly cells: readonly (readonly (CellWrite | null)[])[];
}

/** A rectangle by corners, zero-based, inclusive. */
export interface RangeRef {
  readonly row: number;
  readonly col: number;
  readonly rowCount: number;
  readonly colCount: number;
}

/** One plotted series: x and y values in equally long single-column ranges of one sheet. */
export interface ChartSeries {
  readonly name: string;
  readonly x: RangeRef;
  readonly y: RangeRef;
  /** Drawn as markers only (a target point), not a line. */
  readonly markersOnly?: boolean;
}

/** A native chart: an x–y scatter with lines, placed over the sheet. */
export interface ChartSpec {
  readonly title: string;
  readonly xTitle: string;
  readonly yTitle: string;
  readonly series: readonly ChartSeries[];
  /** Where the chart's top-left corner sits, and its size in cells. */
  readonly anchor: RangeRef;
  /**
   * A band on the x axis (e.g. the usable pH range) from cells: `x` holds low, low, high,
   * high and `y` 0, top, top, 0, so Excel draws it as an outlined series and the preview
   * shades from the smallest to the largest x.
   */
  readonly xBand?: { readonly x: RangeRef; readonly y: RangeRef; readonly label: string };
}

/** What the user has selected. */
export interface Selection {
  readonly sheet: string;
  readonly range: RangeRef;
}

/** Settings the pane keeps in the document (so they travel with the workbook). */
export interface PaneSettings {
  readonly activityModel: 'pitzer' | 'davies' | 'ideal' | 'bates-guggenheim';
  /** Temperature at which the pH is adjusted on the bench, °C. */
  readonly benchTemperatureC: number;
  /** Default titrant form and its stock concentration, mol/L. */
  readonly titrant: string;
  readonly titrantStockM: number;
  /** Fraction of the final volume at which the pH is adjusted. */
  readonly partVolumeFraction: number;
}

/** The workbook, as the pane sees it. Every method writes or reads one workbook. */
export interface WorkbookPort {
  /** Names of every sheet, in order. */
  sheetNames(): Promise<string[]>;
  /** A sheet name not yet used, from `base` (`base`, `base (2)`, … within the length limit). */
  uniqueSheetName(base: string): Promise<string>;
  /** Adds an empty sheet; fails if the name exists (never overwrites). */
  addSheet(name: string): Promise<void>;
  /** Writes one block of cells to a sheet made by addSheet. */
  writeTable(sheet: string, block: CellBlock): Promise<void>;
  /** Sets column widths in characters, from column 0. */
  setColumnWidths(sheet: string, widths: readonly number[]): Promise<void>;
  addChart(sheet: string, chart: ChartSpec): Promise<void>;
  /** Computed values of a range. */
  readValues(sheet: string, range: RangeRef): Promise<CellValue[][]>;
  /** The used area of a sheet (from A1), or null if the sheet is empty. */
  usedRange(sheet: string): Promise<RangeRef | null>;
  readSelection(): Promise<Selection>;
  activateSheet(sheet: string): Promise<void>;
  loadSettings(): Promise<Partial<PaneSettings>>;
  saveSettings(settings: PaneSettings): Promise<void>;
  /** Sets what prints and how (optional: a host without page setup prints its own way). */
  setPrintLayout?(sheet: string, layout: PrintLayout): Promise<void>;
}

/** How a sheet prints: the area, on one page when asked, and the orientation. */
export interface PrintLayout {
  readonly area: RangeRef;
  readonly onePage: boolean;
  readonly orientation: 'portrait' | 'landscape';
}

/** Excel's sheet-name limit (characters). */
export const MAX_SHEET_NAME_LENGTH = 31;
/** Characters Excel forbids in sheet names. */
const FORBIDDEN_SHEET_CHARS = /[\\/?*[\]:]/g;

/**
 * A sheet name not in `taken` (compared case-insensitively, as Excel does), made from
 * `base`: forbidden characters dropped, cut to 31 characters, then ` (2)`, ` (3)`, … added.
 *
 * @example uniqueName('HEPES pH 7.4', ['HEPES pH 7.4']) // 'HEPES pH 7.4 (2)'
 */
export function uniqueName(base: string, taken: readonly string[]): string {
  const clean =
    base
      .replace(FORBIDDEN_SHEET_CHARS, ' ')
      .replace(/\s+/g, ' ')
      .replace(/^'+|'+$/g, '')
      .trim() || 'Sheet';
  const used = new Set(taken.map((n) => n.toLowerCase()));
  const first = clean.slice(0, MAX_SHEET_NAME_LENGTH).trim();
  if (!used.has(first.toLowerCase())) return first;
  for (let n = 2; ; n++) {
    const suffix = ` (${n})`;
    const name = clean.slice(0, MAX_SHEET_NAME_LENGTH - suffix.length).trim() + suffix;
    if (!used.has(name.toLowerCase())) return name;
  }
}

/** Column letters of a zero-based column index (0 → A, 26 → AA). */
export function columnLetters(col: number): string {
  let s = '';
  let n = col + 1;
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** A1 address of a zero-based cell, e.g. (0, 0) → `A1`; `absolute` adds `$` signs. */
export function cellAddress(row: number, col: number, absolute = false): string {
  return absolute ? `$${columnLetters(col)}$${row + 1}` : `${columnLetters(col)}${row + 1}`;
}

/** A1 address of a range, e.g. `B3:D10`. */
export function rangeAddress(range: RangeRef): string {
  const end = cellAddress(range.row + range.rowCount - 1, range.col + range.colCount - 1);
  const start = cellAddress(range.row, range.col);
  return start === end ? start : `${start}:${end}`;
}

/** Zero-based column of column letters (`A` → 0, `AA` → 26). */
function columnIndex(letters: string): number {
  let n = 0;
  for (const ch of letters) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n - 1;
}

/** A range as a user types it: `'My substances'!A2:J20`, `Sheet2!$A$2:$J$20` or `A2:J20`. */
export interface TypedRange {
  /** The sheet named, unquoted; undefined when the text names none. */
  readonly sheet?: string;
  readonly range: RangeRef;
}

/**
 * Reads a typed range reference; null when the text is not one. A quoted sheet name may
 * hold spaces and doubled apostrophes, as Excel writes them.
 *
 * @example parseRangeText("'My substances'!A2:J20") // { sheet: 'My substances', range: { row: 1, col: 0, rowCount: 19, colCount: 10 } }
 */
export function parseRangeText(text: string): TypedRange | null {
  const m = /^(?:'((?:[^']|'')+)'!|([A-Za-z_][\w.]*)!)?\$?([A-Z]{1,3})\$?(\d+)(?::\$?([A-Z]{1,3})\$?(\d+))?$/.exec(text.trim());
  if (!m) return null;
  const sheet = m[1] !== undefined ? m[1].replace(/''/g, "'") : m[2];
  const c1 = columnIndex(m[3]);
  const r1 = Number(m[4]) - 1;
  const c2 = m[5] !== undefined ? columnIndex(m[5]) : c1;
  const r2 = m[6] !== undefined ? Number(m[6]) - 1 : r1;
  if (r1 < 0 || r2 < 0) return null;
  const range = { row: Math.min(r1, r2), col: Math.min(c1, c2), rowCount: Math.abs(r2 - r1) + 1, colCount: Math.abs(c2 - c1) + 1 };
  return sheet === undefined ? { range } : { sheet, range };
}

/** A sheet-qualified reference for formulas: `'My substances'!A2:J20` (the sheet always quoted). */
export function qualifiedAddress(sheet: string, range: RangeRef): string {
  return `'${sheet.replace(/'/g, "''")}'!${rangeAddress(range)}`;
}

/**
 * Characters a spreadsheet or a CSV reader may take as the start of a formula: = + - @, and
 * their fullwidth forms (＝ ＋ － ＠), which some programs fold to the plain ones.
 */
const FORMULA_START = '=+\\-@\uFF1D\uFF0B\uFF0D\uFF20';
/**
 * Text that must get the text mark: starting with a formula character, a tab, a carriage
 * return or a line feed (a CSV reader may drop them and see what follows), an apostrophe,
 * or blanks followed by a formula character (some readers trim before they look).
 * Anchored and without nested repetition, so it runs in time linear in the text.
 */
const NEEDS_TEXT_MARK = new RegExp(`^(?:[${FORMULA_START}\\t\\r\\n']|[ \\u00A0\\u3000]+[${FORMULA_START}\\t\\r\\n])`);

/**
 * What to put in a cell for a literal value: text that a spreadsheet would read as a
 * formula (see NEEDS_TEXT_MARK) gets a leading apostrophe, the spreadsheet's own mark for
 * "this is text", so a name typed into the pane can never run as a formula. Text that
 * itself starts with an apostrophe (a quoted sheet name) gets one more, or the spreadsheet
 * would swallow its own. Numbers and booleans pass unchanged; formulas are written separately.
 */
export function literal(value: CellValue): CellValue {
  return typeof value === 'string' && NEEDS_TEXT_MARK.test(value) ? `'${value}` : value;
}

/** A sheet name as a formula reference needs it: quoted when it holds anything but letters, digits and underscores. */
export function quoteSheet(name: string): string {
  return /^[A-Za-z_][A-Za-z0-9_]*$/.test(name) ? name : `'${name.replace(/'/g, "''")}'`;
}
