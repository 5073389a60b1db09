/**
 * What calc will read, checked before a workbook is handed to the reader (exceljs reads
 * every part of the package whole and expands merged ranges and validation ranges cell by
 * cell, so a 6 KB file can ask it for seventeen billion cells). The package is read here
 * first: its directory, then each part unpacked with a bound on its size, then the
 * worksheets scanned once, in time linear in their size, for the cells they use, the ranges
 * they name, and the length of every text and formula.
 *
 * Limits are Excel's own where Excel has one (Microsoft, "Excel specifications and limits":
 * 1,048,576 rows by 16,384 columns, 32,767 characters in a cell, 8,192 characters in a
 * formula, 64 levels of nesting), and otherwise set so that any file calc accepts is read
 * and evaluated within about 1 GB of memory (bench/calcMemory.bench.ts measures it).
 */
import { inflateRawSync } from 'zlib';
import { CALC_MESSAGES } from './calcMessages';
import { MAX_FORMULA_CHARS, MAX_FORMULA_DEPTH, MAX_FORMULA_OPERATORS, formulaShape } from '../workbook/formulaLimits';
// One set of formula limits for every host that reads files (calc and the preview's Open).
export { MAX_FORMULA_CHARS, MAX_FORMULA_DEPTH, MAX_FORMULA_OPERATORS };

/** Largest input file, bytes. Excel sets none (memory bounds it); a prep workbook is well under 1 MB. */
export const MAX_FILE_BYTES = 20 * 1024 * 1024;
/** Largest total of the workbook's parts once unpacked, bytes (the reader holds every part as text). */
export const MAX_UNPACKED_BYTES = 100 * 1024 * 1024;
/**
 * Most cells with content in a workbook (all sheets), or fields in a CSV file: the reader
 * and the formula engine hold each, and the writer more again (400,000 cells took 780 MB; with
 * every other limit reached at once, 250,000 took 950 MB: too close to the 1 GB aimed at).
 */
export const MAX_CELLS = 200_000;
/**
 * Most cells covered by data-validation rules and array formulas, all sheets together: the
 * reader keeps one record per covered cell (a whole column, 1,048,576 cells, takes it about
 * 9 s and 400 MB here, so one whole column is the limit).
 */
export const MAX_RANGE_CELLS = 1_048_576;
/** Most cells covered by merged ranges, all sheets together: the reader makes a whole cell for each (a merged column took 41 s and 2.6 GB). Three full rows (16,384 columns each) fit. */
export const MAX_MERGED_CELLS = 50_000;
/** Characters in one cell: Excel's limit. */
export const MAX_CELL_CHARS = 32_767;
/**
 * Cells read through cell and row ranges in formulas (A1:B100, 3:7), each distinct range
 * counted once, a shared formula's range once per cell that shares it. The formula engine
 * builds every such range cell by cell: one range of C1:C1048576 took 5 s and 780 MB, a
 * hundred ranges of 100,000 cells 13 s, a thousand 200 s. Whole columns written as A:A cost
 * nothing and are not counted.
 */
export const MAX_REFERENCED_CELLS = 100_000;
/** Rows and columns of a worksheet: Excel's grid. */
export const MAX_ROWS = 1_048_576;
export const MAX_COLUMNS = 16_384;
/** Most parts in a package; a workbook has tens. */
const MAX_PARTS = 10_000;

/** A refusal of the input file, with the message calc prints. */
export class InputRefused extends Error {}

interface ZipEntry {
  readonly name: string;
  readonly method: number;
  readonly compressedSize: number;
  readonly uncompressedSize: number;
  readonly localHeaderOffset: number;
}

const EOCD = 0x06054b50;
const ZIP64_LOCATOR = 0x07064b50;
const ZIP64_EOCD = 0x06064b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;
const FULL32 = 0xffffffff;

function readUInt64(buf: Buffer, at: number): number {
  return Number(buf.readBigUInt64LE(at));
}

/** The package's directory (PKWARE APPNOTE 6.3: end record, ZIP64 end record, central directory). */
function readDirectory(buf: Buffer, input: string): ZipEntry[] {
  const bad = (reason: string) => new InputRefused(CALC_MESSAGES.notAWorkbook(input, reason));
  let eocd = -1;
  for (let i = buf.length - 22; i >= Math.max(0, buf.length - 22 - 65535); i--) {
    if (buf.readUInt32LE(i) === EOCD) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) throw bad('no zip directory');
  let count = buf.readUInt16LE(eocd + 10);
  let offset = buf.readUInt32LE(eocd + 16);
  if ((count === 0xffff || offset === FULL32) && eocd >= 20 && buf.readUInt32LE(eocd - 20) === ZIP64_LOCATOR) {
    const record = readUInt64(buf, eocd - 20 + 8);
    if (record + 56 > buf.length || buf.readUInt32LE(record) !== ZIP64_EOCD) throw bad('a damaged ZIP64 directory');
    count = readUInt64(buf, record + 32);
    offset = readUInt64(buf, record + 48);
  }
  if (count > MAX_PARTS) throw bad(`${count} parts`);
  const entries: ZipEntry[] = [];
  let at = offset;
  for (let n = 0; n < count; n++) {
    if (at + 46 > buf.length || buf.readUInt32LE(at) !== CENTRAL) throw bad('a damaged zip directory');
    const nameLength = buf.readUInt16LE(at + 28);
    const extraLength = buf.readUInt16LE(at + 30);
    const commentLength = buf.readUInt16LE(at + 32);
    let compressedSize = buf.readUInt32LE(at + 20);
    let uncompressedSize = buf.readUInt32LE(at + 24);
    let localHeaderOffset = buf.readUInt32LE(at + 42);
    const name = buf.toString('utf8', at + 46, Math.min(buf.length, at + 46 + nameLength));
    // ZIP64 extra field (id 1): the 8-byte values of whichever sizes are full, in this order.
    for (let e = at + 46 + nameLength; e + 4 <= Math.min(buf.length, at + 46 + nameLength + extraLength);) {
      const id = buf.readUInt16LE(e);
      const size = buf.readUInt16LE(e + 2);
      if (id === 1) {
        let p = e + 4;
        const next = () => {
          const v = p + 8 <= buf.length ? readUInt64(buf, p) : Infinity;
          p += 8;
          return v;
        };
        if (uncompressedSize === FULL32) uncompressedSize = next();
        if (compressedSize === FULL32) compressedSize = next();
        if (localHeaderOffset === FULL32) localHeaderOffset = next();
      }
      e += 4 + size;
    }
    entries.push({ name, method: buf.readUInt16LE(at + 10), compressedSize, uncompressedSize, localHeaderOffset });
    at += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}

/** One part unpacked, refused as soon as it would pass `budget` bytes, whatever its directory entry claims. */
function unpack(buf: Buffer, entry: ZipEntry, budget: number, input: string): Buffer {
  const at = entry.localHeaderOffset;
  if (at + 30 > buf.length || buf.readUInt32LE(at) !== LOCAL) throw new InputRefused(CALC_MESSAGES.notAWorkbook(input, `a damaged part ${entry.name}`));
  const start = at + 30 + buf.readUInt16LE(at + 26) + buf.readUInt16LE(at + 28);
  const data = buf.subarray(start, Math.min(buf.length, start + entry.compressedSize));
  const tooLarge = () => new InputRefused(CALC_MESSAGES.unpackedTooLarge(input, entry.name, MAX_UNPACKED_BYTES));
  if (entry.uncompressedSize > budget) throw tooLarge();
  if (entry.method === 0) {
    if (data.length > budget) throw tooLarge();
    return data;
  }
  if (entry.method !== 8) throw new InputRefused(CALC_MESSAGES.notAWorkbook(input, `part ${entry.name} is packed with method ${entry.method}`));
  try {
    return inflateRawSync(data, { maxOutputLength: Math.max(1, budget) });
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ERR_BUFFER_TOO_LARGE') throw tooLarge();
    throw new InputRefused(CALC_MESSAGES.notAWorkbook(input, `part ${entry.name} does not unpack`));
  }
}

/** Column number of letters A…XFD (1-based); 0 when not letters. */
function columnNumber(letters: string): number {
  let n = 0;
  for (let i = 0; i < letters.length; i++) n = n * 26 + (letters.charCodeAt(i) - 64);
  return n;
}

const CELL_REF = /^\$?([A-Z]{0,3})\$?(\d{0,7})$/;

/** Cells an A1-style reference or range covers ("C1:XFD1048576", "A:A", "3:3"); 0 when it does not read. */
export function rangeCells(ref: string): number {
  const [a, b = a] = ref.split(':');
  const p = CELL_REF.exec(a.toUpperCase());
  const q = CELL_REF.exec(b.toUpperCase());
  if (!p || !q || (!p[1] && !p[2]) || (!q[1] && !q[2])) return 0;
  const c1 = p[1] ? columnNumber(p[1]) : 1;
  const c2 = q[1] ? columnNumber(q[1]) : MAX_COLUMNS;
  const r1 = p[2] ? Number(p[2]) : 1;
  const r2 = q[2] ? Number(q[2]) : MAX_ROWS;
  return (Math.abs(r2 - r1) + 1) * (Math.abs(c2 - c1) + 1);
}

/** Characters of XML text (entities count as one), read only when the bytes could pass the limit. */
function textLength(xml: Buffer, start: number, end: number, limit: number): number {
  if (end - start <= limit) return end - start; // never more characters than bytes
  return xml.toString('utf8', start, end).replace(/&(?:#x?[0-9A-Fa-f]+|[A-Za-z]+);/g, '&').length;
}

function decodeXml(text: string): string {
  return text.replace(/&(?:#(x?)([0-9A-Fa-f]+)|(amp|lt|gt|quot|apos));/g, (_m, hex: string, code: string, named: string) =>
    named ? ({ amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" } as Record<string, string>)[named] : String.fromCodePoint(Math.min(0x10ffff, parseInt(code, hex ? 16 : 10))),
  );
}

/** Refuses a formula too deep or with too many operators for the engine (its length is checked before it is read). */
function checkShape(formula: string, where: string): void {
  const { depth, operators } = formulaShape(formula);
  if (depth > MAX_FORMULA_DEPTH) throw new InputRefused(CALC_MESSAGES.formulaTooDeep(where, depth, MAX_FORMULA_DEPTH));
  if (operators > MAX_FORMULA_OPERATORS) throw new InputRefused(CALC_MESSAGES.formulaTooManyOperators(where, operators, MAX_FORMULA_OPERATORS));
}

/**
 * Refuses a formula longer or deeper than Excel allows, or with more operators than the engine evaluates.
 *
 * @param formula - the formula, with or without its leading "="
 * @param where - the cell, for the message ("Sheet1!B2", "B3 of the CSV file")
 */
export function checkFormula(formula: string, where: string): void {
  if (formula.length > MAX_FORMULA_CHARS) throw new InputRefused(CALC_MESSAGES.formulaTooLong(where, formula.length, MAX_FORMULA_CHARS));
  checkShape(formula.replace(/^=/, ''), where);
}

/** Distinct ranges read by formulas and the cells they cover, over a whole workbook or CSV file. */
export class RangeBudget {
  private readonly seen = new Set<string>();
  private cells = 0;

  /**
   * Counts the cell and row ranges a formula reads (outside its quoted texts).
   *
   * @param formula - the formula text
   * @param where - the cell, for the message
   * @param copies - cells sharing this formula (its ranges shift with each), 1 for a plain formula
   */
  count(formula: string, where: string, copies = 1): void {
    const code = formula.includes('"') ? formula.replace(/"[^"]*"/g, '""') : formula;
    for (const m of code.matchAll(RANGE_REFERENCE)) {
      const key = `${where.split('!')[0]}|${m[0].replace(/\$/g, '').toUpperCase()}`;
      if (this.seen.has(key)) continue;
      this.seen.add(key);
      const cells = m[1] !== undefined ? rangeCells(`${m[1]}${m[2]}:${m[3]}${m[4]}`) : (Math.abs(Number(m[6]) - Number(m[5])) + 1) * MAX_COLUMNS;
      const fixed = /^\$[A-Za-z]+\$\d+:\$[A-Za-z]+\$\d+$|^\$\d+:\$\d+$/.test(m[0]);
      this.cells += cells * (fixed ? 1 : copies);
      if (this.cells > MAX_REFERENCED_CELLS) throw new InputRefused(CALC_MESSAGES.rangesTooLarge(where, m[0], cells, MAX_REFERENCED_CELLS));
    }
  }
}

/** A cell range (groups 1–4) or a row range (groups 5–6); bounded repetitions, so one pass. */
const RANGE_REFERENCE = /(?<![A-Za-z0-9_.$:])(?:\$?([A-Za-z]{1,3})\$?(\d{1,7}):\$?([A-Za-z]{1,3})\$?(\d{1,7})|\$?(\d{1,7}):\$?(\d{1,7}))(?![A-Za-z0-9_.:(])/g;

/** Running totals over the whole workbook. */
interface Totals {
  cells: number;
  rangeCells: number;
  mergedCells: number;
  readonly ranges: RangeBudget;
}

/** The parts exceljs reads as worksheets (it matches this anywhere in the part's name). */
const WORKSHEET_PART = /xl\/worksheets\/sheet(\d+)[.]xml/;

const ATTRIBUTES = new Map<string, RegExp>();

function attribute(tag: string, name: string): string | undefined {
  let pattern = ATTRIBUTES.get(name);
  if (!pattern) ATTRIBUTES.set(name, (pattern = new RegExp(`\\s${name}="([^"]*)"`)));
  const m = pattern.exec(tag);
  return m ? m[1] : undefined;
}

/** One worksheet's XML, read once (as Latin-1, so offsets are byte offsets). */
function scanSheet(xml: Buffer, sheet: string, totals: Totals): void {
  const text = xml.toString('latin1');
  const ranged = (what: string, ref: string) => {
    const merged = what === 'merged range';
    for (const one of ref.trim().split(/\s+/)) {
      const cells = rangeCells(one);
      const total = merged ? (totals.mergedCells += cells) : (totals.rangeCells += cells);
      const limit = merged ? MAX_MERGED_CELLS : MAX_RANGE_CELLS;
      if (total > limit) throw new InputRefused(merged ? CALC_MESSAGES.mergedTooLarge(sheet, one, cells, limit) : CALC_MESSAGES.areaTooLarge(sheet, what, one, cells, limit));
    }
  };
  let at = sheet; // the cell being read, for messages
  // A tag's attributes never hold "<" (XML forbids it), so each match stops at the next "<": one pass.
  for (const m of text.matchAll(/<(c|row|mergeCell|dataValidation|f|t|v)(?=[\s>/])([^<>]*)>/g)) {
    const [, tag, attrs] = m;
    if (tag === 'c' || tag === 'row') {
      if (tag === 'c' && ++totals.cells > MAX_CELLS) throw new InputRefused(CALC_MESSAGES.tooManyCells(sheet, totals.cells, MAX_CELLS));
      const r = attribute(attrs, 'r');
      if (tag === 'c') at = r === undefined ? sheet : `${sheet}!${r.slice(0, 20)}`;
      if (r !== undefined) {
        const ref = /^([A-Z]*)(\d+)$/.exec(r);
        const row = ref ? Number(ref[2]) : NaN;
        const column = tag === 'c' && ref ? columnNumber(ref[1]) : 1;
        if (!ref || (tag === 'c' && (ref[1] === '' || ref[1].length > 3)) || !(row >= 1 && row <= MAX_ROWS) || column > MAX_COLUMNS) {
          throw new InputRefused(CALC_MESSAGES.cellOutsideSheet(sheet, r.slice(0, 20)));
        }
      }
    } else if (tag === 'mergeCell') {
      ranged('merged range', attribute(attrs, 'ref') ?? '');
    } else if (tag === 'dataValidation') {
      ranged('data-validation rule', attribute(attrs, 'sqref') ?? '');
    } else if (!attrs.endsWith('/')) {
      // f, t, v: the text up to the next tag.
      const start = m.index! + m[0].length;
      const end = text.indexOf('<', start);
      const stop = end < 0 ? text.length : end;
      if (tag === 'f') {
        const ref = attribute(attrs, 'ref');
        if (ref !== undefined && /\st="array"/.test(attrs)) ranged('array formula', ref);
        const length = textLength(xml, start, stop, MAX_FORMULA_CHARS);
        if (length > MAX_FORMULA_CHARS) throw new InputRefused(CALC_MESSAGES.formulaTooLong(at, length, MAX_FORMULA_CHARS));
        const raw = text.slice(start, stop);
        // Brackets, quotes, operators and references are ASCII, so the Latin-1 reading finds them; some are written as entities.
        const formula = raw.includes('&') ? decodeXml(raw) : raw;
        checkShape(formula, at);
        const shared = ref !== undefined && /\st="shared"/.test(attrs);
        totals.ranges.count(formula, at, shared ? rangeCells(ref) || 1 : 1);
      } else {
        const length = textLength(xml, start, stop, MAX_CELL_CHARS);
        if (length > MAX_CELL_CHARS) throw new InputRefused(CALC_MESSAGES.textTooLong(at, length, MAX_CELL_CHARS));
      }
    }
  }
}

/** The shared texts: each item (its runs together) within a cell's limit. */
function scanSharedStrings(xml: Buffer): void {
  const text = xml.toString('latin1');
  let item = 0;
  for (const m of text.matchAll(/<(\/?)(si|t)(?=[\s>/])([^<>]*)>/g)) {
    const [, close, tag, attrs] = m;
    if (tag === 'si') {
      item = 0;
      continue;
    }
    if (close || attrs.endsWith('/')) continue;
    const start = m.index! + m[0].length;
    const end = text.indexOf('<', start);
    item += textLength(xml, start, end < 0 ? text.length : end, MAX_CELL_CHARS);
    if (item > MAX_CELL_CHARS) throw new InputRefused(CALC_MESSAGES.textTooLong('A shared text of the workbook', item, MAX_CELL_CHARS));
  }
}

/** Resolves a relationship target against the folder of the part that names it; undefined when it leaves the package. */
function resolveTarget(base: string, target: string): string | undefined {
  const parts = target.startsWith('/') ? [] : base.split('/').slice(0, -1);
  for (const piece of target.replace(/^\//, '').split('/')) {
    if (piece === '..') {
      if (parts.length === 0) return undefined;
      parts.pop();
    } else if (piece !== '.' && piece !== '') parts.push(piece);
  }
  return parts.join('/');
}

/**
 * Checks a workbook package against calc's limits before it is read.
 *
 * @param buf - the whole .xlsx file
 * @param input - its path, for messages
 * @returns the names of its worksheets, as the workbook lists them (to check the reader kept every one)
 * @throws InputRefused with the first limit passed, or the reason the package cannot be a workbook
 */
export function checkWorkbookPackage(buf: Buffer, input: string): string[] {
  if (buf.length > MAX_FILE_BYTES) throw new InputRefused(CALC_MESSAGES.fileTooLarge(input, buf.length, MAX_FILE_BYTES));
  const entries = readDirectory(buf, input).filter((e) => !e.name.endsWith('/'));
  const byName = new Map(entries.map((e) => [e.name.replace(/^\//, ''), e]));
  const small = (name: string) => {
    const entry = byName.get(name);
    return entry ? unpack(buf, entry, MAX_UNPACKED_BYTES, input).toString('utf8') : undefined;
  };
  // Sheet names, and the part each points to.
  const workbook = small('xl/workbook.xml');
  if (workbook === undefined) throw new InputRefused(CALC_MESSAGES.notAWorkbook(input, 'no xl/workbook.xml'));
  const rels = new Map<string, { target: string; external: boolean; worksheet: boolean }>();
  for (const m of (small('xl/_rels/workbook.xml.rels') ?? '').matchAll(/<Relationship\b([^<>]*)>/g)) {
    const id = attribute(m[1], 'Id');
    const target = attribute(m[1], 'Target');
    if (id !== undefined && target !== undefined)
      rels.set(id, { target: decodeXml(target), external: /\sTargetMode="External"/.test(m[1]), worksheet: /\sType="[^"]*\/worksheet"/.test(m[1]) });
  }
  const sheetOfPart = new Map<string, string>();
  const worksheets: string[] = [];
  for (const m of workbook.matchAll(/<sheet\b([^<>]*)>/g)) {
    const name = decodeXml(attribute(m[1], 'name') ?? `sheet ${sheetOfPart.size + 1}`);
    const link = rels.get(/\s[A-Za-z0-9]+:id="([^"]*)"/.exec(m[1])?.[1] ?? '');
    if (!link) throw new InputRefused(CALC_MESSAGES.sheetMissing(input, name, '(no link)'));
    const part = link.external || /^[a-z][a-z0-9+.-]*:/i.test(link.target) ? undefined : resolveTarget('xl/workbook.xml', link.target);
    if (part === undefined) throw new InputRefused(CALC_MESSAGES.sheetOutsidePackage(input, name, link.target));
    if (!byName.has(part)) throw new InputRefused(CALC_MESSAGES.sheetMissing(input, name, link.target));
    // The reader takes worksheets only from parts named like xl/worksheets/sheet3.xml and drops any other without a word.
    if (link.worksheet && !WORKSHEET_PART.test(part)) throw new InputRefused(CALC_MESSAGES.sheetUnreadable(input, name, part));
    if (link.worksheet) worksheets.push(name);
    sheetOfPart.set(part, name);
  }
  if (sheetOfPart.size === 0) throw new InputRefused(CALC_MESSAGES.noSheets(input));
  // Every part, unpacked within the budget (the reader reads them all); worksheets scanned,
  // linked or not (the reader takes every part named like one).
  let budget = MAX_UNPACKED_BYTES;
  const totals: Totals = { cells: 0, rangeCells: 0, mergedCells: 0, ranges: new RangeBudget() };
  for (const entry of entries) {
    const data = unpack(buf, entry, budget, input);
    budget -= data.length;
    const name = entry.name.replace(/^\//, '');
    if (name === 'xl/sharedStrings.xml') scanSharedStrings(data);
    else if (WORKSHEET_PART.test(name)) scanSheet(data, sheetOfPart.get(name) ?? name, totals);
  }
  return worksheets;
}
