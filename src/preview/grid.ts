/**
 * The preview page's worksheet grid: sheet tabs, a formula bar and a table of cells that
 * shows the engine's values. Users select a cell or a range (mouse drag, Shift+arrows),
 * type a value or a formula (=PROTON.…) in the formula bar or straight into the grid, and
 * press Enter; copy, cut and paste go through the clipboard as tab-separated text (to and
 * from other programs; within the page, relative references shift as in a spreadsheet);
 * Ctrl+D and Ctrl+R fill down and right; Delete empties; Ctrl+Z and Ctrl+Y undo and redo
 * (the engine's own undo). Charts sit over the sheet at their anchors, as in Excel. Text
 * goes in with textContent only.
 */
import type { RawCellContent } from 'hyperformula';
import { FORMULA_MESSAGES } from '../functions/messages';
import { engineFormula, formulaBeyondLimits, formulaProblem } from '../functions/formulaText';
import { parseDelimited, toTabSeparated } from '../workbook/delimited';
import { cellAddress, columnLetters, RangeRef, Selection } from '../workbook/port';
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
  /** The other corner of the selected range (the active cell is one corner). */
  private anchorRow = 0;
  private anchorCol = 0;
  private dragging = false;
  /** What this page last put on the clipboard: its text, and the cells it came from (to paste formulas with shifted references). */
  private clip: { text: string; sheet: string; range: RangeRef; cut: boolean } | null = null;
  private readonly nameBox: HTMLElement;
  private readonly input: HTMLInputElement;
  private readonly tabs: HTMLElement;
  private readonly scroller: HTMLElement;
  private readonly status: HTMLElement;
  private table: HTMLTableElement | null = null;
  private renderQueued = false;
  /** The last refused write and its cell, shown until the selection moves. */
  private refusal: { sheet: string; row: number; col: number; text: string } | null = null;
  private unsubscribe: () => void = () => undefined;
  /** First and last (exclusive) rows in the page, and the measured heights of rows drawn so far (px) on the sheet shown. */
  private windowTop = 0;
  private windowEnd = 0;
  private heights: number[] = [];
  /** A row the next drawing must include (a cell selected off screen). */
  private wantedRow: number | null = null;
  private lastRender = 0;

  constructor(
    private book: PreviewWorkbook,
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
    this.scroller.addEventListener('mousedown', (e) => {
      const td = (e.target as HTMLElement).closest('td[data-cell]') as HTMLElement | null;
      if (!td || e.button !== 0) return;
      const [r, c] = [Number(td.dataset.row), Number(td.dataset.col)];
      if (e.shiftKey) this.extend(r, c);
      else this.select(r, c);
      this.dragging = true;
    });
    this.scroller.addEventListener('mouseover', (e) => {
      if (!this.dragging) return;
      const td = (e.target as HTMLElement).closest('td[data-cell]') as HTMLElement | null;
      if (td) this.extend(Number(td.dataset.row), Number(td.dataset.col));
    });
    window.addEventListener('mouseup', () => (this.dragging = false));
    this.scroller.addEventListener('dblclick', () => this.input.focus());
    document.addEventListener('copy', (e) => this.onCopy(e, false));
    document.addEventListener('cut', (e) => this.onCopy(e, true));
    document.addEventListener('paste', (e) => this.onPaste(e));
    this.scroller.addEventListener('scroll', () => {
      const [first, last] = this.visibleRows();
      if (first < this.windowTop || last > this.windowEnd) this.queueRender();
    });
    this.unsubscribe = book.onChange(() => this.queueRender());
    this.render();
  }

  /** Shows another workbook (a new one, or one opened from a file). */
  setBook(book: PreviewWorkbook): void {
    this.unsubscribe();
    this.book = book;
    this.unsubscribe = book.onChange(() => this.queueRender());
    this.showSheet(book.sheetNames()[0]);
  }

  /** The sheet shown. */
  activeSheet(): string {
    return this.sheet;
  }

  selection(): Selection {
    return { sheet: this.sheet, range: this.selectedRange() };
  }

  /** The selected range (a single cell when nothing is extended). */
  selectedRange(): RangeRef {
    const row = Math.min(this.row, this.anchorRow);
    const col = Math.min(this.col, this.anchorCol);
    return { row, col, rowCount: Math.abs(this.row - this.anchorRow) + 1, colCount: Math.abs(this.col - this.anchorCol) + 1 };
  }

  /** Says what happened (or why not) under the grid. */
  tell(text: string): void {
    this.status.textContent = text;
  }

  showSheet(name: string): void {
    if (name !== this.sheet) this.heights = [];
    this.sheet = name;
    this.row = 0;
    this.col = 0;
    this.anchorRow = 0;
    this.anchorCol = 0;
    this.render();
    this.scroller.scrollTop = 0;
    this.scroller.scrollLeft = 0;
  }

  select(row: number, col: number): void {
    this.anchorRow = Math.max(0, row);
    this.anchorCol = Math.max(0, col);
    this.extend(row, col);
  }

  /** Moves the active cell, keeping the anchor: the range between them is selected. */
  extend(row: number, col: number): void {
    this.row = Math.max(0, row);
    this.col = Math.max(0, col);
    const td = this.cellElement(this.row, this.col);
    if (!td && this.table) {
      this.wantedRow = this.row;
      this.render();
    }
    this.markSelection();
    const current = this.cellElement(this.row, this.col);
    current?.scrollIntoView({ block: 'nearest', inline: 'nearest' });
    if (current) this.scroller.setAttribute('aria-activedescendant', current.id);
    this.input.value = this.book.rawText(this.sheet, this.row, this.col);
    this.showStatus();
  }

  private markSelection(): void {
    this.table?.querySelectorAll('td.selected, td.in-range').forEach((td) => td.classList.remove('selected', 'in-range'));
    const range = this.selectedRange();
    if (range.rowCount * range.colCount > 1) {
      for (let r = range.row; r < range.row + range.rowCount; r++) {
        for (let c = range.col; c < range.col + range.colCount; c++) this.cellElement(r, c)?.classList.add('in-range');
      }
    }
    this.cellElement(this.row, this.col)?.classList.add('selected');
    this.nameBox.textContent =
      range.rowCount * range.colCount > 1
        ? `${cellAddress(range.row, range.col)}:${cellAddress(range.row + range.rowCount - 1, range.col + range.colCount - 1)}`
        : cellAddress(this.row, this.col);
  }

  private showStatus(): void {
    // A refusal stays until the selection moves or a write succeeds: a drawing queued by an earlier change must not wipe it.
    if (this.refusal && this.refusal.row === this.row && this.refusal.col === this.col && this.refusal.sheet === this.sheet) {
      this.status.textContent = this.refusal.text;
      return;
    }
    this.refusal = null;
    const v = this.book.value(this.sheet, this.row, this.col);
    if (v === null || typeof v !== 'object') {
      this.status.textContent = '';
      return;
    }
    this.status.textContent = `${v.error} ${this.errorText(this.row, this.col, v)}`;
  }

  /** Why a cell shows an error: the function's own message, or, for a formula the engine could not read or a name it does not know, what and where in our words. */
  private errorText(row: number, col: number, v: { readonly error: string; readonly message: string }): string {
    if (v.error !== '#ERROR!' && v.error !== '#NAME?') return v.message;
    const formula = this.book.formula(this.sheet, row, col);
    const problem = formula !== undefined ? formulaProblem(formula, this.book.functionNames()) : undefined;
    if (problem) return problem.message;
    return v.error === '#ERROR!' && /^Parsing error/.test(v.message) ? FORMULA_MESSAGES.unreadable() : v.message;
  }

  private cellElement(row: number, col: number): HTMLElement | null {
    return this.table?.querySelector(`td[data-row="${row}"][data-col="${col}"]`) ?? null;
  }

  /** Writes what the user typed: a number, TRUE/FALSE, a formula or text. */
  commit(text: string): boolean {
    try {
      // A formula that cannot be read is refused, as a spreadsheet does, with what and where; a name the engine does not know is written (it shows #NAME? and a did-you-mean).
      const problem = text.trim().startsWith('=') ? formulaProblem(text.trim(), this.book.functionNames()) : undefined;
      if (problem && problem.code !== 'unknownFunction') return this.refuse(`Not written: ${problem.message}`);
      this.refusal = null;
      this.book.setContents(this.sheet, this.row, this.col, [[typedContent(text)]]);
      this.render();
      return true;
    } catch (error) {
      return this.refuse(`Not written: ${(error as Error).message}`);
    }
  }

  /** Says why a write was refused, under the grid, for the cell it was meant for. */
  private refuse(text: string): false {
    this.refusal = { sheet: this.sheet, row: this.row, col: this.col, text };
    this.status.textContent = text;
    return false;
  }

  /** Runs a change of the workbook, reporting a refusal under the grid instead of throwing. */
  private change(what: string, work: () => void): void {
    try {
      work();
      this.render();
    } catch (error) {
      this.status.textContent = `${what}: ${(error as Error).message}`;
    }
  }

  /** Copies the first row of the selection into the rows below it (Ctrl+D), or the first column rightwards (Ctrl+R). */
  fill(direction: 'down' | 'right'): void {
    const r = this.selectedRange();
    if (direction === 'down' ? r.rowCount < 2 : r.colCount < 2)
      return this.tell(`Select the cells to fill: the first ${direction === 'down' ? 'row' : 'column'} of the selection is copied into the rest.`);
    const source = direction === 'down' ? { ...r, rowCount: 1 } : { ...r, colCount: 1 };
    const target = direction === 'down' ? { ...r, row: r.row + 1, rowCount: r.rowCount - 1 } : { ...r, col: r.col + 1, colCount: r.colCount - 1 };
    this.change('Not filled', () => this.book.fill(this.sheet, source, target));
  }

  /** Empties the selected cells. */
  clearSelection(): void {
    this.change('Not deleted', () => this.book.clear(this.sheet, this.selectedRange()));
  }

  /** Inserts as many rows as are selected, above the selection; or deletes the selected rows. */
  shiftRows(insert: boolean): void {
    const r = this.selectedRange();
    this.change(insert ? 'Rows not inserted' : 'Rows not deleted', () => this.book.shiftRows(this.sheet, r.row, insert ? r.rowCount : -r.rowCount));
  }

  undo(): void {
    this.change('Not undone', () => {
      if (!this.book.undo()) this.tell('Nothing to undo.');
    });
    this.select(this.row, this.col);
  }

  redo(): void {
    this.change('Not redone', () => {
      if (!this.book.redo()) this.tell('Nothing to redo.');
    });
    this.select(this.row, this.col);
  }

  /** Adds an empty sheet after the others and shows it. */
  newSheet(): void {
    const taken = new Set(this.book.sheetNames().map((n) => n.toLowerCase()));
    let n = taken.size + 1;
    while (taken.has(`sheet${n}`)) n++;
    this.change('No sheet added', () => {
      this.book.addSheet(`Sheet${n}`);
      this.showSheet(this.book.sheetNames()[this.book.sheetNames().length - 1]);
    });
  }

  /** Renames the sheet shown, asking for the new name. */
  renameSheet(): void {
    const name = window.prompt(`New name for the sheet "${this.sheet}":`, this.sheet);
    if (name === null) return;
    this.change('Not renamed', () => {
      this.book.renameSheet(this.sheet, name);
      this.sheet = name.trim();
    });
  }

  /** True when the grid (not the formula bar or the pane) has the keyboard. */
  private gridHasFocus(): boolean {
    return document.activeElement === this.scroller;
  }

  private onCopy(e: ClipboardEvent, cut: boolean): void {
    if (!this.gridHasFocus() || !e.clipboardData) return;
    e.preventDefault();
    const range = this.selectedRange();
    const rows: string[][] = [];
    for (let r = range.row; r < range.row + range.rowCount; r++) {
      const line: string[] = [];
      for (let c = range.col; c < range.col + range.colCount; c++) line.push(formatValue(this.book.value(this.sheet, r, c), this.book.meta(this.sheet, r, c)?.numberFormat));
      rows.push(line);
    }
    const text = toTabSeparated(rows);
    e.clipboardData.setData('text/plain', text);
    this.clip = { text, sheet: this.sheet, range, cut };
    this.tell(`${cut ? 'Cut' : 'Copied'} ${range.rowCount * range.colCount} cell${range.rowCount * range.colCount === 1 ? '' : 's'}: paste with Ctrl+V.`);
  }

  private onPaste(e: ClipboardEvent): void {
    if (!this.gridHasFocus() || !e.clipboardData) return;
    e.preventDefault();
    const text = e.clipboardData.getData('text/plain');
    const at = this.selectedRange();
    const clip = this.clip;
    if (clip && clip.text === text && this.book.hasSheet(clip.sheet)) {
      // Our own cells: formulas come with their references shifted (moved, after a cut).
      if (clip.cut && clip.sheet === this.sheet) {
        this.change('Not pasted', () => this.book.move(this.sheet, clip.range, at.row, at.col));
        this.clip = null;
      } else {
        // A selection larger than the copy, by whole copies, is filled with repeats, as in a spreadsheet.
        const rows = at.rowCount % clip.range.rowCount === 0 ? at.rowCount : clip.range.rowCount;
        const cols = at.colCount % clip.range.colCount === 0 ? at.colCount : clip.range.colCount;
        this.change('Not pasted', () => this.book.fill(this.sheet, clip.range, { row: at.row, col: at.col, rowCount: rows, colCount: cols }, clip.sheet));
        if (clip.cut) {
          this.change('Not cut', () => this.book.clear(clip.sheet, clip.range));
          this.clip = null;
        }
      }
      return;
    }
    const rows = parseDelimited(text, '\t');
    if (rows.length === 0) return;
    const width = Math.max(...rows.map((r) => r.length));
    const contents = rows.map((r) => [...r, ...new Array<string>(width - r.length).fill('')].map(typedContent));
    this.change('Not pasted', () => this.book.setContents(this.sheet, at.row, at.col, contents));
    this.anchorRow = at.row;
    this.anchorCol = at.col;
    this.extend(at.row + rows.length - 1, at.col + width - 1);
  }

  private onInputKey(e: KeyboardEvent): void {
    if (e.key === 'Enter') {
      e.preventDefault();
      if (!this.commit(this.input.value)) return;
      this.select(this.row + 1, this.col);
      this.scroller.focus();
    } else if (e.key === 'Escape') {
      e.preventDefault();
      this.input.value = this.book.rawText(this.sheet, this.row, this.col);
      this.scroller.focus();
    } else if (e.key === 'Tab' && !e.shiftKey && this.input.value !== this.book.rawText(this.sheet, this.row, this.col)) {
      e.preventDefault();
      if (!this.commit(this.input.value)) return;
      this.select(this.row, this.col + 1);
      this.scroller.focus();
    }
  }

  private onGridKey(e: KeyboardEvent): void {
    const moves: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
    const move = moves[e.key];
    const ctrl = e.ctrlKey || e.metaKey;
    const letter = e.key.toLowerCase();
    if (move) {
      e.preventDefault();
      if (e.shiftKey) this.extend(this.row + move[0], this.col + move[1]);
      else this.select(this.row + move[0], this.col + move[1]);
    } else if (ctrl && !e.altKey && (letter === 'z' || letter === 'y' || letter === 'd' || letter === 'r')) {
      e.preventDefault();
      if (letter === 'z' && !e.shiftKey) this.undo();
      else if (letter === 'y' || letter === 'z') this.redo();
      else this.fill(letter === 'd' ? 'down' : 'right');
    } else if (e.key === 'Enter' || e.key === 'F2') {
      e.preventDefault();
      this.input.focus();
      this.input.setSelectionRange(this.input.value.length, this.input.value.length);
    } else if (e.key === 'Delete' || e.key === 'Backspace') {
      e.preventDefault();
      this.clearSelection();
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
    const sel = this.selectedRange();
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
            td.title = this.errorText(r, c, value);
          }
          if (this.book.hasFormula(this.sheet, r, c)) td.classList.add('has-formula');
        }
        if (r === this.row && c === this.col) td.classList.add('selected');
        else if (r >= sel.row && r < sel.row + sel.rowCount && c >= sel.col && c < sel.col + sel.colCount) td.classList.add('in-range');
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
    this.markSelection();
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
      b.addEventListener('dblclick', () => this.renameSheet());
      return b;
    });
    const add = document.createElement('button');
    add.type = 'button';
    add.className = 'tab-add';
    add.id = 'add-sheet';
    add.title = 'New sheet';
    add.setAttribute('aria-label', 'New sheet');
    add.textContent = '+';
    add.addEventListener('click', () => this.newSheet());
    this.tabs.replaceChildren(...buttons, add);
  }
}

/**
 * What the user typed or pasted, as the engine takes it: empty, a number, a formula in the
 * engine's forms (engineFormula), or text. A formula past the limits is refused (thrown).
 */
export function typedContent(text: string): RawCellContent {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  if (trimmed.startsWith('=')) {
    const beyond = formulaBeyondLimits(trimmed);
    if (beyond) throw new Error(beyond.message);
    return engineFormula(trimmed);
  }
  if (/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(trimmed)) return Number(trimmed);
  return text;
}
