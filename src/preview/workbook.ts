/**
 * The preview workbook: sheets of cells computed by HyperFormula (with the PROTON functions
 * registered by src/functions/formulaEngine.ts), plus what HyperFormula does not keep —
 * number formats, cell styles, column widths, charts and the pane's settings.
 */
import type { HyperFormula, RawCellContent } from 'hyperformula';
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

export class PreviewWorkbook {
  private readonly extras = new Map<string, SheetExtras>();
  private readonly listeners = new Set<Listener>();
  private settings: Partial<PaneSettings> = {};
  private batchDepth = 0;
  private pendingNotify = false;

  constructor(readonly engine: HyperFormula) {
    engine.on('valuesUpdated', () => this.notify());
    engine.on('sheetAdded', () => this.notify());
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
    const spilled = (r: number, c: number) => this.engine.isCellPartOfArray({ sheet: id, row: r, col: c }) && this.engine.getCellFormula({ sheet: id, row: r, col: c }) === undefined;
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
  }
}
