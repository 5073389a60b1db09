/**
 * The preview page's worksheet grid: sheet tabs, a formula bar and a table of cells that
 * shows the engine's values. Users select a cell, type a value or a formula (=PROTON.…) in
 * the formula bar or straight into the grid, and press Enter. Charts sit over the sheet at
 * their anchors, as in Excel. Text goes in with textContent only.
 */
import type { RawCellContent } from 'hyperformula';
import { cellAddress, columnLetters, Selection } from '../workbook/port';
import { drawChart } from './chart';
import { formatValue } from './format';
import type { PreviewWorkbook } from './workbook';

const ROW_HEIGHT_PX = 24;
const ROW_HEADER_PX = 44;
/** Left and right padding of a cell (preview.css: 5 px each side). */
const CELL_PADDING_PX = 10;
const CHAR_PX = 7.2;
const MIN_ROWS = 40;
/**
 * Rows drawn above and below the visible ones. Only a window of rows is in the page (a
 * 656-row table would be some 30,000 cells, seconds of drawing on every change); spacer rows
 * stand for the rest, with each row's height as last measured (24 px until drawn).
 */
const WINDOW_MARGIN_ROWS = 40;
/** Least time between two drawings caused by changes to the book, ms. */
const RENDER_INTERVAL_MS = 250;
const MIN_COLS = 12;

export class Grid {
  private sheet: string;
  private row = 0;
  private col = 0;
  private readonly nameBox: HTMLElement;
  private readonly input: HTMLInputElement;
  private readonly tabs: HTMLElement;
  private readonly scroller: HTMLElement;
  private readonly status: HTMLElement;
  private table: HTMLTableElement | null = null;
  private renderQueued = false;
  /** First and last (exclusive) rows in the page, and the measured heights of rows drawn so far (px) on the sheet shown. */
  private windowTop = 0;
  private windowEnd = 0;
  private heights: number[] = [];
  /** A row the next drawing must include (a cell selected off screen). */
  private wantedRow: number | null = null;
  private lastRender = 0;

  constructor(
    private readonly book: PreviewWorkbook,
    root: HTMLElement,
  ) {
    this.sheet = book.sheetNames()[0];
    this.nameBox = root.querySelector('#name-box') as HTMLElement;
    this.input = root.querySelector('#formula-input') as HTMLInputElement;
    this.tabs = root.querySelector('#sheet-tabs') as HTMLElement;
    this.scroller = root.querySelector('#grid-scroll') as HTMLElement;
    this.status = root.querySelector('#grid-status') as HTMLElement;
    this.input.addEventListener('keydown', (e) => this.onInputKey(e));
    this.scroller.addEventListener('keydown', (e) => this.onGridKey(e));
    this.scroller.addEventListener('click', (e) => {
      const td = (e.target as HTMLElement).closest('td[data-cell]') as HTMLElement | null;
      if (td) this.select(Number(td.dataset.row), Number(td.dataset.col));
    });
    this.scroller.addEventListener('dblclick', () => this.input.focus());
    this.scroller.addEventListener('scroll', () => {
      const [first, last] = this.visibleRows();
      if (first < this.windowTop || last > this.windowEnd) this.queueRender();
    });
    book.onChange(() => this.queueRender());
    this.render();
  }

  /** The sheet shown. */
  activeSheet(): string {
    return this.sheet;
  }

  selection(): Selection {
    return { sheet: this.sheet, range: { row: this.row, col: this.col, rowCount: 1, colCount: 1 } };
  }

  showSheet(name: string): void {
    if (name !== this.sheet) this.heights = [];
    this.sheet = name;
    this.row = 0;
    this.col = 0;
    this.render();
    this.scroller.scrollTop = 0;
    this.scroller.scrollLeft = 0;
  }

  select(row: number, col: number): void {
    this.row = Math.max(0, row);
    this.col = Math.max(0, col);
    this.table?.querySelectorAll('td.selected').forEach((td) => td.classList.remove('selected'));
    const td = this.cellElement(this.row, this.col);
    if (!td && this.table) {
      this.wantedRow = this.row;
      this.render();
    }
    const current = this.cellElement(this.row, this.col);
    current?.classList.add('selected');
    current?.scrollIntoView({ block: 'nearest', inline: 'nearest' });
    if (current) this.scroller.setAttribute('aria-activedescendant', current.id);
    this.nameBox.textContent = cellAddress(this.row, this.col);
    this.input.value = this.book.rawText(this.sheet, this.row, this.col);
    this.showStatus();
  }

  private showStatus(): void {
    const v = this.book.value(this.sheet, this.row, this.col);
    this.status.textContent = v !== null && typeof v === 'object' ? `${v.error} ${v.message}` : '';
  }

  private cellElement(row: number, col: number): HTMLElement | null {
    return this.table?.querySelector(`td[data-row="${row}"][data-col="${col}"]`) ?? null;
  }

  /** Writes what the user typed: a number, TRUE/FALSE, a formula or text. */
  commit(text: string): void {
    let content: RawCellContent = text;
    const trimmed = text.trim();
    if (trimmed === '') content = null;
    else if (!trimmed.startsWith('=') && /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(trimmed)) content = Number(trimmed);
    try {
      this.book.setContents(this.sheet, this.row, this.col, [[content]]);
      this.render();
    } catch (error) {
      this.status.textContent = `Not written: ${(error as Error).message}`;
    }
  }

  private onInputKey(e: KeyboardEvent): void {
    if (e.key === 'Enter') {
      e.preventDefault();
      this.commit(this.input.value);
      this.select(this.row + 1, this.col);
      this.scroller.focus();
    } else if (e.key === 'Escape') {
      e.preventDefault();
      this.input.value = this.book.rawText(this.sheet, this.row, this.col);
      this.scroller.focus();
    } else if (e.key === 'Tab' && !e.shiftKey && this.input.value !== this.book.rawText(this.sheet, this.row, this.col)) {
      e.preventDefault();
      this.commit(this.input.value);
      this.select(this.row, this.col + 1);
      this.scroller.focus();
    }
  }

  private onGridKey(e: KeyboardEvent): void {
    const moves: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
    const move = moves[e.key];
    if (move) {
      e.preventDefault();
      this.select(this.row + move[0], this.col + move[1]);
    } else if (e.key === 'Enter' || e.key === 'F2') {
      e.preventDefault();
      this.input.focus();
      this.input.setSelectionRange(this.input.value.length, this.input.value.length);
    } else if (e.key === 'Delete' || e.key === 'Backspace') {
      e.preventDefault();
      this.commit('');
      this.select(this.row, this.col);
    } else if (e.key.length === 1 && !e.ctrlKey && !e.metaKey && !e.altKey) {
      e.preventDefault();
      this.input.value = e.key;
      this.input.focus();
    }
  }

  /**
   * Draws again on the next frame, at most once per RENDER_INTERVAL_MS while changes keep
   * coming (a table being written changes the book dozens of times a second).
   */
  private queueRender(): void {
    if (this.renderQueued) return;
    this.renderQueued = true;
    const wait = Math.max(0, this.lastRender + RENDER_INTERVAL_MS - performance.now());
    setTimeout(
      () =>
        requestAnimationFrame(() => {
          this.renderQueued = false;
          this.render();
        }),
      wait,
    );
  }

  private rowPx(row: number): number {
    return this.heights[row] ?? ROW_HEIGHT_PX;
  }

  /** Top of a row within the sheet, px (header row excluded). */
  private rowTopPx(row: number): number {
    let y = 0;
    for (let r = 0; r < row; r++) y += this.rowPx(r);
    return y;
  }

  /** First and last (exclusive) rows in view, from the scroll position and the rows' heights. */
  private visibleRows(): [number, number] {
    const top = this.scroller.scrollTop;
    const bottom = top + (this.scroller.clientHeight || 900);
    let y = 0;
    let r = 0;
    while (y + this.rowPx(r) <= top && r < 1e6) y += this.rowPx(r++);
    const first = r;
    while (y < bottom && r < 1e6) y += this.rowPx(r++);
    return [first, r];
  }

  private columnPx(col: number): number {
    return Math.round(this.book.columnWidth(this.sheet, col) * CHAR_PX + 12);
  }

  render(): void {
    this.lastRender = performance.now();
    if (!this.book.hasSheet(this.sheet)) this.sheet = this.book.sheetNames()[0];
    this.renderTabs();
    const dims = this.book.dimensions(this.sheet);
    const sheetValues = this.book.sheetValues(this.sheet);
    const valueAt = (r: number, c: number) => sheetValues[r]?.[c] ?? null;
    const charts = this.book.charts(this.sheet);
    const chartRows = Math.max(0, ...charts.map((c) => c.anchor.row + c.anchor.rowCount));
    const chartCols = Math.max(0, ...charts.map((c) => c.anchor.col + c.anchor.colCount));
    const rows = Math.max(MIN_ROWS, dims.rows + 6, chartRows + 2, this.row + 2);
    const cols = Math.max(MIN_COLS, dims.cols + 2, chartCols + 1, this.col + 2);

    const table = document.createElement('table');
    table.className = 'grid';
    const colgroup = document.createElement('colgroup');
    const headCol = document.createElement('col');
    headCol.width = String(ROW_HEADER_PX);
    colgroup.appendChild(headCol);
    for (let c = 0; c < cols; c++) {
      const col = document.createElement('col');
      col.width = String(this.columnPx(c));
      colgroup.appendChild(col);
    }
    table.appendChild(colgroup);
    const thead = document.createElement('thead');
    const hr = document.createElement('tr');
    const corner = document.createElement('th');
    corner.className = 'corner';
    hr.appendChild(corner);
    for (let c = 0; c < cols; c++) {
      const th = document.createElement('th');
      th.scope = 'col';
      th.textContent = columnLetters(c);
      hr.appendChild(th);
    }
    thead.appendChild(hr);
    table.appendChild(thead);
    const tbody = document.createElement('tbody');
    const [firstVisible, lastVisible] = this.visibleRows();
    let top = Math.max(0, firstVisible - WINDOW_MARGIN_ROWS);
    let end = Math.min(rows, lastVisible + WINDOW_MARGIN_ROWS);
    const wanted = this.wantedRow;
    this.wantedRow = null;
    if (wanted !== null && (wanted < top || wanted >= end)) {
      top = Math.max(0, wanted - WINDOW_MARGIN_ROWS);
      end = Math.min(rows, wanted + WINDOW_MARGIN_ROWS * 2);
    }
    const spacer = (heightPx: number) => {
      const tr = document.createElement('tr');
      tr.className = 'grid-spacer';
      const td = document.createElement('td');
      td.colSpan = cols + 1;
      td.style.height = `${heightPx}px`;
      tr.appendChild(td);
      return tr;
    };
    if (top > 0) tbody.appendChild(spacer(this.rowTopPx(top)));
    for (let r = top; r < end; r++) {
      const tr = document.createElement('tr');
      const th = document.createElement('th');
      th.scope = 'row';
      th.textContent = String(r + 1);
      tr.appendChild(th);
      for (let c = 0; c < cols; c++) {
        const td = document.createElement('td');
        const address = cellAddress(r, c);
        td.id = `cell-${address}`;
        td.dataset.cell = address;
        td.dataset.row = String(r);
        td.dataset.col = String(c);
        td.setAttribute('role', 'gridcell');
        if (r < dims.rows && c < dims.cols) {
          const value = valueAt(r, c);
          const meta = this.book.meta(this.sheet, r, c);
          const text = formatValue(value, meta?.numberFormat);
          if (typeof value === 'string' && text !== '' && meta?.style !== 'header') {
            // Text runs over empty cells to its right and stops at the first one holding a value, as in Excel.
            let px = this.columnPx(c) - CELL_PADDING_PX;
            // A warning or a protocol's text wraps within its own column instead (the charts sit to its right).
            for (let k = c + 1; meta?.style !== 'warning' && meta?.style !== 'text' && k < cols; k++) {
              const next = k < dims.cols ? valueAt(r, k) : null;
              if (next !== null && next !== '') break;
              px += this.columnPx(k);
            }
            const span = document.createElement('span');
            span.className = 'cell-text';
            span.style.width = `${Math.max(0, px)}px`;
            span.textContent = text;
            td.appendChild(span);
          } else {
            td.textContent = text;
          }
          if (meta?.style) td.classList.add(`style-${meta.style}`);
          if (typeof value === 'number') td.classList.add('num');
          if (value !== null && typeof value === 'object') {
            td.classList.add('cell-error');
            td.title = value.message;
          }
          if (this.book.hasFormula(this.sheet, r, c)) td.classList.add('has-formula');
        }
        if (r === this.row && c === this.col) td.classList.add('selected');
        tr.appendChild(td);
      }
      tbody.appendChild(tr);
    }
    if (end < rows) tbody.appendChild(spacer(this.rowTopPx(rows) - this.rowTopPx(end)));
    table.appendChild(tbody);
    this.windowTop = top;
    this.windowEnd = end;

    const layer = document.createElement('div');
    layer.className = 'grid-layer';
    layer.appendChild(table);
    for (const spec of charts) {
      const figure = drawChart(this.book, this.sheet, spec);
      let left = ROW_HEADER_PX;
      for (let c = 0; c < spec.anchor.col; c++) left += this.columnPx(c);
      let width = 0;
      for (let c = spec.anchor.col; c < spec.anchor.col + spec.anchor.colCount; c++) width += this.columnPx(c);
      figure.classList.add('chart-floating');
      figure.style.left = `${left}px`;
      figure.style.top = `${ROW_HEIGHT_PX + this.rowTopPx(spec.anchor.row)}px`;
      figure.style.width = `${width}px`;
      layer.appendChild(figure);
    }
    const keepTop = this.scroller.scrollTop;
    const keepLeft = this.scroller.scrollLeft;
    this.scroller.replaceChildren(layer);
    this.scroller.scrollTop = keepTop;
    this.scroller.scrollLeft = keepLeft;
    this.table = table;
    // Measure the rows drawn (a wrapped warning makes a row taller), for the spacers of the next drawing.
    tbody.querySelectorAll('tr:not(.grid-spacer)').forEach((tr, i) => (this.heights[top + i] = (tr as HTMLElement).offsetHeight || ROW_HEIGHT_PX));
    const current = this.cellElement(this.row, this.col);
    if (current) this.scroller.setAttribute('aria-activedescendant', current.id);
    this.nameBox.textContent = cellAddress(this.row, this.col);
    if (document.activeElement !== this.input) this.input.value = this.book.rawText(this.sheet, this.row, this.col);
    this.showStatus();
  }

  private renderTabs(): void {
    const names = this.book.sheetNames();
    const buttons = names.map((name) => {
      const b = document.createElement('button');
      b.type = 'button';
      b.setAttribute('role', 'tab');
      b.setAttribute('aria-selected', String(name === this.sheet));
      b.className = name === this.sheet ? 'tab active' : 'tab';
      b.textContent = name;
      b.addEventListener('click', () => this.showSheet(name));
      return b;
    });
    this.tabs.replaceChildren(...buttons);
  }
}
