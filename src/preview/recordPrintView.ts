/**
 * The preview's print view: the active sheet's print area (as the workbook port set it for a
 * batch record, or the used range) shown as a page, from the computed values, in the same
 * look as the command line's printable HTML (src/workbook/printPage.ts). Styles are set
 * through the DOM (the page's Content-Security-Policy allows no inline style sheets); while
 * printing, everything else on the page is hidden.
 */
import { CELL_STYLE, PAGE_STYLE, PRINT_STYLES, spansRow } from '../workbook/printPage';
import { printArea, printCells } from './printArea';
import type { PreviewWorkbook } from './workbook';

function styled<K extends keyof HTMLElementTagNameMap>(tag: K, parent: Element, css: Readonly<Record<string, string>> = {}): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(css)) node.style.setProperty(k, v);
  parent.appendChild(node);
  return node;
}

/** Shows the page over the preview, with Print and Close. */
export function showPrintView(book: PreviewWorkbook, sheet: string): HTMLElement {
  document.getElementById('record-print-view')?.remove();
  const overlay = styled('div', document.body, { position: 'fixed', inset: '0', background: '#8a9399', overflow: 'auto', 'z-index': '1000', padding: '16px' });
  overlay.id = 'record-print-view';
  overlay.setAttribute('role', 'dialog');
  overlay.setAttribute('aria-label', `Print view of ${sheet}`);
  const bar = styled('div', overlay, { display: 'flex', gap: '8px', 'justify-content': 'center', 'margin-bottom': '12px' });
  const print = styled('button', bar);
  print.type = 'button';
  print.textContent = 'Print';
  const close = styled('button', bar);
  close.type = 'button';
  close.textContent = 'Close print view';
  close.id = 'record-print-close';
  // An A4 sheet at 96 px per inch: 210 mm × 297 mm, 12 mm margins.
  const paper = styled('div', overlay, {
    background: '#fff',
    width: '794px',
    'min-height': '1123px',
    margin: '0 auto',
    padding: '45px',
    'box-sizing': 'border-box',
    'box-shadow': '0 2px 8px rgba(0,0,0,0.3)',
    ...PAGE_STYLE,
  });
  paper.className = 'print-paper';
  const cells = printCells(book, sheet);
  const widths = Array.from({ length: cells[0]?.length ?? 0 }, (_, c) => book.columnWidth(sheet, printArea(book, sheet).col + c));
  const table = styled('table', paper, { 'border-collapse': 'collapse', 'table-layout': 'fixed', width: '100%' });
  const colgroup = styled('colgroup', table);
  for (const w of widths) styled('col', colgroup, { width: `${w}ch` });
  const body = styled('tbody', table);
  for (const row of cells) {
    const tr = styled('tr', body);
    const cellCss = CELL_STYLE;
    if (spansRow(row)) {
      const td = styled('td', tr, { ...cellCss, 'white-space': 'normal', ...PRINT_STYLES[row[0].style ?? 'result'] });
      td.colSpan = row.length;
      td.textContent = row[0].text;
      continue;
    }
    for (const c of row) {
      const td = styled('td', tr, { ...cellCss, ...(c.numeric ? { 'text-align': 'right' } : {}), ...PRINT_STYLES[c.style ?? 'result'] });
      td.textContent = c.text;
    }
  }
  const hidden: HTMLElement[] = [];
  const before = () => {
    for (const child of Array.from(document.body.children) as HTMLElement[]) {
      if (child !== overlay && child.style.display !== 'none') {
        hidden.push(child);
        child.style.display = 'none';
      }
    }
    bar.style.display = 'none';
    overlay.style.position = 'static';
    overlay.style.background = '#fff';
    overlay.style.padding = '0';
  };
  const after = () => {
    for (const child of hidden.splice(0)) child.style.display = '';
    bar.style.display = 'flex';
    overlay.style.position = 'fixed';
    overlay.style.background = '#8a9399';
    overlay.style.padding = '16px';
  };
  window.addEventListener('beforeprint', before);
  window.addEventListener('afterprint', after);
  print.addEventListener('click', () => window.print());
  close.addEventListener('click', () => {
    window.removeEventListener('beforeprint', before);
    window.removeEventListener('afterprint', after);
    overlay.remove();
  });
  close.focus();
  return overlay;
}

/** Adds a "Print view" button that shows the active sheet as a page. */
export function mountPrintView(parent: Element, book: () => PreviewWorkbook, activeSheet: () => string): void {
  const button = document.createElement('button');
  button.type = 'button';
  button.id = 'record-print-open';
  button.textContent = 'Print view';
  parent.insertBefore(button, parent.firstChild);
  // The workbook is read at the click: the page may have opened or started another since.
  button.addEventListener('click', () => showPrintView(book(), activeSheet()));
}
