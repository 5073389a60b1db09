/**
 * The workbook port over Office.js (Excel). All Office.js the pane needs lives here.
 * Each method is one Excel.run batch: queue the writes, one context.sync().
 */
import { CellBlock, CellStyle, CellValue, ChartSpec, PaneSettings, PrintLayout, RangeRef, Selection, WorkbookPort, literal, rangeAddress, uniqueName } from './port';

/** Document setting under which the pane keeps its settings (Office.context.document.settings). */
export const SETTINGS_KEY = 'protonLedger.settings';

/** Fill and font per cell style: quiet greys and one muted teal for inputs. */
const STYLE_FORMATS: Record<CellStyle, { bold?: boolean; italic?: boolean; size?: number; color?: string; fill?: string }> = {
  title: { bold: true, size: 14, color: '#1F3A44' },
  subtitle: { bold: true, size: 11, color: '#1F3A44' },
  label: { color: '#40505A' },
  header: { bold: true, color: '#1F3A44', fill: '#E4EAEC' },
  input: { color: '#0B4F5C', fill: '#EEF5F3' },
  result: {},
  note: { italic: true, color: '#52616B' },
  warning: { color: '#7A4A00', fill: '#FFF4DC' },
  caution: { bold: true, color: '#8A1C1C' },
  provenance: { color: '#40505A', fill: '#F3F3F0' },
  text: {},
};

/** Excel's API, as much of it as the adapter needs (lets tests pass office-addin-mock objects). */
export type ExcelRun = <T>(batch: (context: Excel.RequestContext) => Promise<T>) => Promise<T>;
/** Where settings are kept: Office.context.document.settings, or a stand-in in tests. */
export interface DocumentSettings {
  get(name: string): unknown;
  set(name: string, value: unknown): void;
  saveAsync(callback?: (result: { status: unknown }) => void): void;
}

export class ExcelAdapter implements WorkbookPort {
  constructor(
    private readonly run: ExcelRun,
    private readonly settings: DocumentSettings,
  ) {}

  async sheetNames(): Promise<string[]> {
    return this.run(async (context) => {
      const sheets = context.workbook.worksheets;
      sheets.load('items/name');
      await context.sync();
      return sheets.items.map((s) => s.name);
    });
  }

  /** Print area, orientation and fit to one page (page layout is ExcelApi 1.9; on older hosts the sheet prints with Excel's defaults). */
  async setPrintLayout(sheet: string, layout: PrintLayout): Promise<void> {
    const supported = typeof Office !== 'undefined' && Office.context?.requirements?.isSetSupported?.('ExcelApi', '1.9');
    if (!supported) return;
    await this.run(async (context) => {
      const page = context.workbook.worksheets.getItem(sheet).pageLayout;
      page.setPrintArea(rangeAddress(layout.area));
      page.orientation = layout.orientation === 'landscape' ? 'Landscape' : 'Portrait';
      if (layout.onePage) page.zoom = { horizontalFitToPages: 1, verticalFitToPages: 1 };
      await context.sync();
    });
  }

  async uniqueSheetName(base: string): Promise<string> {
    return uniqueName(base, await this.sheetNames());
  }

  async addSheet(name: string): Promise<void> {
    await this.run(async (context) => {
      // isNullObject is set by the sync itself; it needs no load (Office.js *OrNullObject methods).
      const existing = context.workbook.worksheets.getItemOrNullObject(name);
      await context.sync();
      if (!existing.isNullObject) throw new Error(`A sheet named "${name}" exists already.`);
      context.workbook.worksheets.add(name);
      await context.sync();
    });
  }

  async writeTable(sheet: string, block: CellBlock): Promise<void> {
    const width = Math.max(0, ...block.cells.map((l) => l.length));
    if (width === 0 || block.cells.length === 0) return;
    await this.run(async (context) => {
      const ws = context.workbook.worksheets.getItem(sheet);
      const target = ws.getRange(rangeAddress({ row: block.row, col: block.col, rowCount: block.cells.length, colCount: width }));
      const formulas = block.cells.map((line) => {
        const full: (string | number | boolean)[] = [];
        for (let c = 0; c < width; c++) {
          const cell = line[c];
          const content = cell ? (cell.formula ?? literal(cell.value ?? '')) : '';
          full.push(content === null ? '' : content);
        }
        return full;
      });
      target.formulas = formulas;
      const formats = block.cells.map((line) => {
        const full: string[] = [];
        for (let c = 0; c < width; c++) full.push(line[c]?.numberFormat ?? 'General');
        return full;
      });
      target.numberFormat = formats;
      // Styles: one call per run of equal styles in a row keeps the batch small.
      block.cells.forEach((line, r) => {
        let c = 0;
        while (c < line.length) {
          const style = line[c]?.style;
          let end = c;
          while (end + 1 < line.length && line[end + 1]?.style === style) end++;
          if (style) this.applyStyle(ws.getRange(rangeAddress({ row: block.row + r, col: block.col + c, rowCount: 1, colCount: end - c + 1 })), style);
          c = end + 1;
        }
      });
      await context.sync();
    });
  }

  private applyStyle(range: Excel.Range, style: CellStyle): void {
    const f = STYLE_FORMATS[style];
    if (f.bold !== undefined) range.format.font.bold = f.bold;
    if (f.italic !== undefined) range.format.font.italic = f.italic;
    if (f.size !== undefined) range.format.font.size = f.size;
    if (f.color !== undefined) range.format.font.color = f.color;
    if (f.fill !== undefined) range.format.fill.color = f.fill;
    // Warnings wrap in their column (they are long and the charts sit to their right); notes run over empty cells.
    if (style === 'warning' || style === 'text') range.format.wrapText = true;
    if (style === 'note') range.format.wrapText = false;
  }

  async setColumnWidths(sheet: string, widths: readonly number[]): Promise<void> {
    await this.run(async (context) => {
      const ws = context.workbook.worksheets.getItem(sheet);
      // Excel measures column width in points; about 7 points per character of the default font.
      widths.forEach((w, c) => (ws.getRange(rangeAddress({ row: 0, col: c, rowCount: 1, colCount: 1 })).format.columnWidth = Math.round(w * 7)));
      await context.sync();
    });
  }

  async addChart(sheet: string, chart: ChartSpec): Promise<void> {
    await this.run(async (context) => {
      const ws = context.workbook.worksheets.getItem(sheet);
      const first = chart.series[0];
      const made = ws.charts.add(Excel.ChartType.xyscatterLinesNoMarkers, ws.getRange(rangeAddress(first.y)), Excel.ChartSeriesBy.columns);
      made.title.text = chart.title;
      made.axes.categoryAxis.title.text = chart.xTitle;
      made.axes.valueAxis.title.text = chart.yTitle;
      made.legend.position = Excel.ChartLegendPosition.bottom;
      const s0 = made.series.getItemAt(0);
      s0.name = first.name;
      s0.setXAxisValues(ws.getRange(rangeAddress(first.x)));
      chart.series.slice(1).forEach((spec) => {
        const s = made.series.add(spec.name);
        s.setXAxisValues(ws.getRange(rangeAddress(spec.x)));
        s.setValues(ws.getRange(rangeAddress(spec.y)));
        if (spec.markersOnly) {
          s.chartType = Excel.ChartType.xyscatter;
          s.markerStyle = Excel.ChartMarkerStyle.diamond;
          s.markerSize = 9;
        }
      });
      if (chart.xBand) {
        const band = made.series.add(chart.xBand.label);
        band.setXAxisValues(ws.getRange(rangeAddress(chart.xBand.x)));
        band.setValues(ws.getRange(rangeAddress(chart.xBand.y)));
        band.format.line.color = '#7AA6A0';
        band.format.line.lineStyle = Excel.ChartLineStyle.dash;
      }
      made.setPosition(
        rangeAddress({ ...chart.anchor, rowCount: 1, colCount: 1 }),
        rangeAddress({ row: chart.anchor.row + chart.anchor.rowCount - 1, col: chart.anchor.col + chart.anchor.colCount - 1, rowCount: 1, colCount: 1 }),
      );
      await context.sync();
    });
  }

  async readValues(sheet: string, range: RangeRef): Promise<CellValue[][]> {
    return this.run(async (context) => {
      const r = context.workbook.worksheets.getItem(sheet).getRange(rangeAddress(range));
      r.load('values');
      await context.sync();
      return r.values as CellValue[][];
    });
  }

  async usedRange(sheet: string): Promise<RangeRef | null> {
    return this.run(async (context) => {
      const used = context.workbook.worksheets.getItem(sheet).getUsedRangeOrNullObject(true);
      used.load(['rowIndex', 'columnIndex', 'rowCount', 'columnCount']);
      await context.sync();
      if (used.isNullObject) return null;
      // From A1, so that positions in the copy match the original.
      return { row: 0, col: 0, rowCount: used.rowIndex + used.rowCount, colCount: used.columnIndex + used.columnCount };
    });
  }

  async readSelection(): Promise<Selection> {
    return this.run(async (context) => {
      const range = context.workbook.getSelectedRange();
      range.load(['rowIndex', 'columnIndex', 'rowCount', 'columnCount', 'worksheet/name']);
      await context.sync();
      return { sheet: range.worksheet.name, range: { row: range.rowIndex, col: range.columnIndex, rowCount: range.rowCount, colCount: range.columnCount } };
    });
  }

  async activateSheet(sheet: string): Promise<void> {
    await this.run(async (context) => {
      context.workbook.worksheets.getItem(sheet).activate();
      await context.sync();
    });
  }

  async loadSettings(): Promise<Partial<PaneSettings>> {
    const raw = this.settings.get(SETTINGS_KEY);
    if (typeof raw !== 'string') return {};
    try {
      const parsed: unknown = JSON.parse(raw);
      return parsed && typeof parsed === 'object' ? (parsed as Partial<PaneSettings>) : {};
    } catch {
      return {};
    }
  }

  async saveSettings(settings: PaneSettings): Promise<void> {
    this.settings.set(SETTINGS_KEY, JSON.stringify(settings));
    await new Promise<void>((resolve, reject) =>
      this.settings.saveAsync((result) => (String(result.status) === 'failed' ? reject(new Error('Could not save the settings in the document.')) : resolve())),
    );
  }
}
