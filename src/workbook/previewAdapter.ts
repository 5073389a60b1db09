/**
 * The workbook port over the preview page's in-browser workbook (HyperFormula + our own
 * formats and charts). Writes go through the same formulas Excel gets.
 */
import type { PreviewWorkbook } from '../preview/workbook';
import { rememberPrintLayout } from '../preview/printArea';
import { CellBlock, CellValue, ChartSpec, PaneSettings, PrintLayout, RangeRef, Selection, WorkbookPort, literal, uniqueName } from './port';

/** The grid's current selection, supplied by the page. */
export type SelectionSource = () => Selection;

export class PreviewAdapter implements WorkbookPort {
  constructor(
    private book: PreviewWorkbook,
    private readonly selection: SelectionSource,
    private readonly activate: (sheet: string) => void,
  ) {}

  /** Works on another workbook from now on (the page opened a file or started a new one). */
  useBook(book: PreviewWorkbook): void {
    this.book = book;
  }

  async sheetNames(): Promise<string[]> {
    return this.book.sheetNames();
  }

  async uniqueSheetName(base: string): Promise<string> {
    return uniqueName(base, this.book.sheetNames());
  }

  async addSheet(name: string): Promise<void> {
    this.book.addSheet(name);
  }

  async writeTable(sheet: string, block: CellBlock): Promise<void> {
    this.book.batch(() => {
      const contents = block.cells.map((line) => line.map((cell) => (cell ? (cell.formula ?? literal(cell.value ?? null)) : null)));
      const width = Math.max(0, ...contents.map((l) => l.length));
      const rect = contents.map((l) => [...l, ...Array(width - l.length).fill(null)]);
      if (width > 0) this.book.setContents(sheet, block.row, block.col, rect);
      block.cells.forEach((line, r) =>
        line.forEach((cell, c) => {
          if (cell && (cell.numberFormat || cell.style)) this.book.setMeta(sheet, block.row + r, block.col + c, { numberFormat: cell.numberFormat, style: cell.style });
        }),
      );
    });
  }

  async setColumnWidths(sheet: string, widths: readonly number[]): Promise<void> {
    this.book.setColumnWidths(sheet, widths);
  }

  async addChart(sheet: string, chart: ChartSpec): Promise<void> {
    this.book.addChart(sheet, chart);
  }

  async readValues(sheet: string, range: RangeRef): Promise<CellValue[][]> {
    return this.book.values(sheet, range).map((line) => line.map((v) => (v !== null && typeof v === 'object' ? v.error : v)));
  }

  async usedRange(sheet: string): Promise<RangeRef | null> {
    const { rows, cols } = this.book.dimensions(sheet);
    return rows > 0 && cols > 0 ? { row: 0, col: 0, rowCount: rows, colCount: cols } : null;
  }

  async readSelection(): Promise<Selection> {
    return this.selection();
  }

  async activateSheet(sheet: string): Promise<void> {
    this.activate(sheet);
  }

  async loadSettings(): Promise<Partial<PaneSettings>> {
    return this.book.loadSettings();
  }

  async saveSettings(settings: PaneSettings): Promise<void> {
    this.book.saveSettings(settings);
  }

  async setPrintLayout(sheet: string, layout: PrintLayout): Promise<void> {
    rememberPrintLayout(this.book, sheet, layout);
  }
}
