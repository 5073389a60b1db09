/**
 * The preview workbook: sheets of cells computed by HyperFormula (with the PROTON functions
 * registered by src/functions/formulaEngine.ts), plus what HyperFormula does not keep —
 * number formats, cell styles, column widths, charts and the pane's settings.
 */
import type { HyperFormula, RawCellContent } from 'hyperformula';
import { MAX_SHEET_NAME_LENGTH } from '../workbook/port';
import type { CellStyle, CellValue, ChartSpec, PaneSettings, RangeRef } from '../workbook/port';

/** What a computed cell shows: a value, or a spreadsheet error with its message. */
export type ComputedValue = CellValue | { readonly error: string; readonly message: string };

export interface CellMeta {
  readonly numberFormat?: string;
  readonly style?: CellStyle;
}

interface SheetExtras {
  meta: Map<string, CellMeta>;
  widths: number[];
  charts: ChartSpec[];
}

type Listener = () => void;

const key = (row: number, col: number) => `${row},${col}`;

/** The title a new workbook gets. */
export const DEFAULT_TITLE = 'Proton Ledger workbook';

/** One sheet as the browser's storage keeps it. */
export interface SavedSheet {
  readonly name: string;
  /** Raw contents: numbers, text (an apostrophe in front keeps text that looks like a formula), `=formulas`; cells a result spills into are left empty. */
  readonly cells: RawCellContent[][];
  readonly meta: readonly (readonly [string, CellMeta])[];
  readonly widths: readonly (number | null)[];
  readonly charts: readonly ChartSpec[];
}

/** The whole workbook as the browser's storage keeps it (JSON). */
export interface SavedWorkbook {
  readonly format: typeof SAVED_FORMAT;
  readonly title: string;
  readonly sheets: readonly SavedSheet[];
  readonly settings: Partial<PaneSettings>;
}

/** Marks a saved workbook and its layout's version. */
export const SAVED_FORMAT = 'proton-ledger-preview-1';

/** True when `value` has the layout of a saved workbook (checked before it is trusted). */
export function isSavedWorkbook(value: unknown): value is SavedWorkbook {
  const v = value as SavedWorkbook | null;
  return (
    typeof v === 'object' &&
    v !== null &&
    v.format === SAVED_FORMAT &&
    typeof v.title === 'string' &&
    Array.isArray(v.sheets) &&
    v.sheets.length > 0 &&
    v.sheets.every(
      (s) =>
        typeof s?.name === 'string' &&
        Array.isArray(s.cells) &&
        s.cells.every((row: unknown) => Array.isArray(row)) &&
        Array.isArray(s.meta) &&
        Array.isArray(s.widths) &&
        Array.isArray(s.charts),
    )
  );
}

export class PreviewWorkbook {
  private readonly extras = new Map<string, SheetExtras>();
  private readonly listeners = new Set<Listener>();
  private settings: Partial<PaneSettings> = {};
  private batchDepth = 0;
  private pendingNotify = false;

  /** The workbook's title: the name of the downloaded file. */
  private titleText = DEFAULT_TITLE;
  private knownFunctions: ReadonlySet<string> | undefined;

  constructor(readonly engine: HyperFormula) {
    for (const event of ['valuesUpdated', 'sheetAdded', 'sheetRemoved', 'sheetRenamed'] as const) engine.on(event, () => this.notify());
  }

  title(): string {
    return this.titleText;
  }

  setTitle(title: string): void {
    this.titleText = title.trim() || DEFAULT_TITLE;
    this.notify();
  }

  /** Calls `listener` after every change (values, sheets, charts). Returns an unsubscribe function. */
  onChange(listener: Listener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private notify(): void {
    if (this.batchDepth > 0) {
      this.pendingNotify = true;
      return;
    }
    for (const l of this.listeners) l();
  }

  /** Runs several changes with one recalculation and one notification. */
  batch(change: () => void): void {
    this.batchDepth++;
    try {
      this.engine.batch(change);
    } finally {
      this.batchDepth--;
    }
    if (this.batchDepth === 0 && this.pendingNotify) {
      this.pendingNotify = false;
      this.notify();
    }
  }

  /** Every function name the engine knows (upper case): the built-in ones and the PROTON catalog. */
  functionNames(): ReadonlySet<string> {
    this.knownFunctions ??= new Set(this.engine.getRegisteredFunctionNames().map((n) => n.toUpperCase()));
    return this.knownFunctions;
  }

  sheetNames(): string[] {
    return this.engine.getSheetNames();
  }

  hasSheet(name: string): boolean {
    return this.engine.doesSheetExist(name);
  }

  addSheet(name: string): void {
    if (this.engine.doesSheetExist(name)) throw new Error(`A sheet named "${name}" exists already.`);
    this.engine.addSheet(name);
    this.extras.set(name, { meta: new Map(), widths: [], charts: [] });
    this.notify();
  }

  /** Renames a sheet (its formats, widths and charts go with it); references to it in formulas follow. */
  renameSheet(from: string, to: string): void {
    const name = to.trim();
    if (name === from) return;
    if (name === '') throw new Error('A sheet needs a name.');
    if (/[\\/?*[\]:]/.test(name) || name.length > MAX_SHEET_NAME_LENGTH) throw new Error(`A sheet name has at most ${MAX_SHEET_NAME_LENGTH} characters and none of \\ / ? * [ ] :`);
    if (this.sheetNames().some((n) => n.toLowerCase() === name.toLowerCase() && n !== from)) throw new Error(`A sheet named "${name}" exists already.`);
    this.engine.renameSheet(this.sheetId(from), name);
    const e = this.extras.get(from);
    if (e) {
      this.extras.delete(from);
      this.extras.set(name, e);
    }
    this.notify();
  }

  private range(sheet: string, r: RangeRef) {
    const id = this.sheetId(sheet);
    return { start: { sheet: id, row: r.row, col: r.col }, end: { sheet: id, row: r.row + r.rowCount - 1, col: r.col + r.colCount - 1 } };
  }

  /** True when a cell only shows part of another cell's array result. */
  private isSpilled(sheet: string, row: number, col: number): boolean {
    const address = { sheet: this.sheetId(sheet), row, col };
    return this.engine.isCellPartOfArray(address) && !this.engine.doesCellHaveFormula(address);
  }

  /**
   * Fills `target` from `source` (repeated over it), relative references shifting as in a
   * spreadsheet's fill or paste (the engine's own fill data); formats go with the cells.
   * One step to undo. Cells that only show part of an array result are copied as empty:
   * the formula they come from fills them again.
   *
   * @param sheet - the target sheet
   * @param source - the cells copied (on `sourceSheet`, default the same sheet)
   */
  fill(sheet: string, source: RangeRef, target: RangeRef, sourceSheet = sheet): void {
    const data = this.engine.getFillRangeData(this.range(sourceSheet, source), this.range(sheet, target), true);
    const contents = data.map((line, i) =>
      line.map((content, j) => (this.isSpilled(sourceSheet, source.row + (i % source.rowCount), source.col + (j % source.colCount)) ? null : content)),
    );
    this.engine.setCellContents({ sheet: this.sheetId(sheet), row: target.row, col: target.col }, contents);
    for (let i = 0; i < target.rowCount; i++) {
      for (let j = 0; j < target.colCount; j++) {
        const meta = this.meta(sourceSheet, source.row + (i % source.rowCount), source.col + (j % source.colCount));
        const at = key(target.row + i, target.col + j);
        if (meta) this.extra(sheet).meta.set(at, meta);
        else this.extras.get(sheet)?.meta.delete(at);
      }
    }
  }

  /** Empties a range (one step to undo); formats stay, as in a spreadsheet's Delete. */
  clear(sheet: string, range: RangeRef): void {
    const empty = Array.from({ length: range.rowCount }, () => new Array<null>(range.colCount).fill(null));
    this.engine.setCellContents({ sheet: this.sheetId(sheet), row: range.row, col: range.col }, empty);
  }

  /** Moves cells (cut and paste): formulas that read them follow them. */
  move(sheet: string, source: RangeRef, row: number, col: number): void {
    this.engine.moveCells(this.range(sheet, source), { sheet: this.sheetId(sheet), row, col });
    const e = this.extras.get(sheet);
    if (!e) return;
    const moved: [string, CellMeta][] = [];
    for (let i = 0; i < source.rowCount; i++) {
      for (let j = 0; j < source.colCount; j++) {
        const from = key(source.row + i, source.col + j);
        const m = e.meta.get(from);
        e.meta.delete(from);
        if (m) moved.push([key(row + i, col + j), m]);
      }
    }
    for (const [k, m] of moved) e.meta.set(k, m);
  }

  /** Inserts (count > 0) or deletes (count < 0) whole rows at `row`; formulas follow, formats shift with their rows. */
  shiftRows(sheet: string, row: number, count: number): void {
    const id = this.sheetId(sheet);
    if (count > 0) this.engine.addRows(id, [row, count]);
    else if (count < 0) this.engine.removeRows(id, [row, -count]);
    const e = this.extras.get(sheet);
    if (!e || count === 0) return;
    const shifted = new Map<string, CellMeta>();
    for (const [k, m] of e.meta) {
      const [r, c] = k.split(',').map(Number);
      if (r < row) shifted.set(k, m);
      else if (count > 0) shifted.set(key(r + count, c), m);
      else if (r >= row - count) shifted.set(key(r + count, c), m);
    }
    e.meta = shifted;
  }

  /** Undoes the last change of cells, rows or sheets; false when there is none. */
  undo(): boolean {
    if (!this.engine.isThereSomethingToUndo()) return false;
    this.engine.undo();
    return true;
  }

  redo(): boolean {
    if (!this.engine.isThereSomethingToRedo()) return false;
    this.engine.redo();
    return true;
  }

  /** The workbook as plain data for the browser's storage. */
  toSaved(): SavedWorkbook {
    const sheets = this.sheetNames().map((name): SavedSheet => {
      const id = this.sheetId(name);
      const cells = this.engine
        .getSheetSerialized(id)
        .map((row, r) =>
          row.map((content, c) =>
            this.engine.isCellPartOfArray({ sheet: id, row: r, col: c }) && !this.engine.doesCellHaveFormula({ sheet: id, row: r, col: c }) ? null : content,
          ),
        );
      const e = this.extras.get(name);
      return { name, cells, meta: e ? [...e.meta.entries()] : [], widths: e ? Array.from(e.widths, (w) => w ?? null) : [], charts: e ? e.charts : [] };
    });
    return { format: SAVED_FORMAT, title: this.titleText, sheets, settings: { ...this.settings } };
  }

  /**
   * A workbook from saved data.
   *
   * @param saved - what toSaved gave
   * @param createEngine - builds the engine from sheet name → rows (createFormulaEngine)
   */
  static fromSaved(saved: SavedWorkbook, createEngine: (sheets: Record<string, RawCellContent[][]>) => HyperFormula): PreviewWorkbook {
    const sheets: Record<string, RawCellContent[][]> = {};
    for (const s of saved.sheets) sheets[s.name] = s.cells;
    const book = new PreviewWorkbook(createEngine(sheets));
    for (const s of saved.sheets) {
      book.extras.set(s.name, { meta: new Map(s.meta.map(([k, m]) => [k, m])), widths: s.widths.map((w) => w ?? 10), charts: [...s.charts] });
    }
    book.titleText = saved.title || DEFAULT_TITLE;
    book.settings = { ...saved.settings };
    return book;
  }

  private sheetId(name: string): number {
    const id = this.engine.getSheetId(name);
    if (id === undefined) throw new Error(`No sheet named "${name}".`);
    return id;
  }

  private extra(name: string): SheetExtras {
    let e = this.extras.get(name);
    if (!e) {
      e = { meta: new Map(), widths: [], charts: [] };
      this.extras.set(name, e);
    }
    return e;
  }

  /** Writes raw contents (numbers, text, `=formulas`) from (row, col). */
  setContents(sheet: string, row: number, col: number, contents: RawCellContent[][]): void {
    this.engine.setCellContents({ sheet: this.sheetId(sheet), row, col }, contents);
  }

  setMeta(sheet: string, row: number, col: number, meta: CellMeta): void {
    this.extra(sheet).meta.set(key(row, col), meta);
  }

  meta(sheet: string, row: number, col: number): CellMeta | undefined {
    return this.extras.get(sheet)?.meta.get(key(row, col));
  }

  setColumnWidths(sheet: string, widths: readonly number[]): void {
    const e = this.extra(sheet);
    widths.forEach((w, i) => (e.widths[i] = w));
    this.notify();
  }

  /** Column width in characters (default 10). */
  columnWidth(sheet: string, col: number): number {
    return this.extras.get(sheet)?.widths[col] ?? 10;
  }

  addChart(sheet: string, chart: ChartSpec): void {
    this.extra(sheet).charts.push(chart);
    this.notify();
  }

  charts(sheet: string): readonly ChartSpec[] {
    return this.extras.get(sheet)?.charts ?? [];
  }

  /** Rows and columns in use. */
  dimensions(sheet: string): { rows: number; cols: number } {
    const d = this.engine.getSheetDimensions(this.sheetId(sheet));
    return { rows: d.height, cols: d.width };
  }

  value(sheet: string, row: number, col: number): ComputedValue {
    const v = this.engine.getCellValue({ sheet: this.sheetId(sheet), row, col });
    if (v === null || v === undefined) return null;
    if (typeof v === 'object') {
      const err = v as { value?: string; message?: string };
      return { error: String(err.value ?? '#ERROR!'), message: String(err.message ?? '') };
    }
    return v as CellValue;
  }

  /** The formula of a cell (with `=`), or undefined for a value cell. */
  /** Every computed value of a sheet at once (one engine call; the grid draws from it rather than asking cell by cell). */
  sheetValues(sheet: string): ComputedValue[][] {
    return this.engine.getSheetValues(this.sheetId(sheet)).map((line) =>
      line.map((v) => {
        if (v === null || v === undefined) return null;
        if (typeof v === 'object') {
          const err = v as { value?: string; message?: string };
          return { error: String(err.value ?? '#ERROR!'), message: String(err.message ?? '') };
        }
        return v as CellValue;
      }),
    );
  }

  /** Whether a cell holds a formula (cheap: the grid asks it of every cell it draws; `formula` rebuilds the text). */
  hasFormula(sheet: string, row: number, col: number): boolean {
    return this.engine.doesCellHaveFormula({ sheet: this.sheetId(sheet), row, col });
  }

  formula(sheet: string, row: number, col: number): string | undefined {
    return this.engine.getCellFormula({ sheet: this.sheetId(sheet), row, col });
  }

  /**
   * The rectangle a formula's result fills (1×1 for a single value): the cells to its right
   * and below that belong to an array and hold no formula of their own.
   */
  spillSize(sheet: string, row: number, col: number): { rows: number; cols: number } {
    const id = this.sheetId(sheet);
    const spilled = (r: number, c: number) =>
      this.engine.isCellPartOfArray({ sheet: id, row: r, col: c }) && this.engine.getCellFormula({ sheet: id, row: r, col: c }) === undefined;
    let cols = 1;
    while (spilled(row, col + cols)) cols++;
    let rows = 1;
    while (spilled(row + rows, col)) rows++;
    return { rows, cols };
  }

  /** What the formula bar shows: the formula, or the raw value as text. */
  rawText(sheet: string, row: number, col: number): string {
    const f = this.formula(sheet, row, col);
    if (f !== undefined) return f;
    const raw = this.engine.getCellSerialized({ sheet: this.sheetId(sheet), row, col });
    return raw === null || raw === undefined ? '' : String(raw);
  }

  values(sheet: string, range: RangeRef): ComputedValue[][] {
    const out: ComputedValue[][] = [];
    for (let r = 0; r < range.rowCount; r++) {
      const line: ComputedValue[] = [];
      for (let c = 0; c < range.colCount; c++) line.push(this.value(sheet, range.row + r, range.col + c));
      out.push(line);
    }
    return out;
  }

  loadSettings(): Partial<PaneSettings> {
    return { ...this.settings };
  }

  saveSettings(settings: PaneSettings): void {
    this.settings = { ...settings };
    this.notify();
  }
}
