/**
 * A printable bench protocol for one recipe: the recipe-table sheet's title, its settings,
 * the amounts of the table row its protocol was written for, and the protocol's steps,
 * cautions and verification line, laid out for paper by the print stylesheet (preview.css,
 * `@media print`) and printed with the browser's own print. It reads the sheet's cells, so
 * what is printed is what the sheet shows. Text goes in with textContent only.
 */
import { LAYOUT } from '../taskpane/recipeTable';
import { PROTOCOL_COL, PROTOCOL_MAX_ROWS, PROTOCOL_ROW } from '../taskpane/protocol';
import { formatValue } from './format';
import type { PreviewWorkbook } from './workbook';

/** Columns of the table row printed under "Amounts" (the rest stay on the sheet). */
const PRINTED_COLUMNS = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 14, 15];

function el<K extends keyof HTMLElementTagNameMap>(name: K, text?: string, className?: string): HTMLElementTagNameMap[K] {
  const node = document.createElement(name);
  if (text !== undefined) node.textContent = text;
  if (className) node.className = className;
  return node;
}

/** One label and its value, kept together on the page. */
function pair(label: string, value: string): HTMLElement {
  const row = el('div', undefined, 'print-pair');
  row.appendChild(el('dt', label));
  row.appendChild(el('dd', value));
  return row;
}

/** True when the sheet holds a bench protocol written by the pane. */
export function hasProtocol(book: PreviewWorkbook, sheet: string): boolean {
  const heading = book.value(sheet, PROTOCOL_ROW, PROTOCOL_COL);
  return typeof heading === 'string' && heading.startsWith('Bench protocol');
}

/**
 * Fills `root` with the printable protocol of a recipe-table sheet.
 *
 * @returns false (and leaves `root` empty) when the sheet has no protocol
 */
export function buildPrintView(book: PreviewWorkbook, sheet: string, root: HTMLElement): boolean {
  root.replaceChildren();
  if (!hasProtocol(book, sheet)) return false;
  const text = (row: number, col: number) => formatValue(book.value(sheet, row, col), book.meta(sheet, row, col)?.numberFormat);
  const heading = text(PROTOCOL_ROW, PROTOCOL_COL);
  root.appendChild(el('h1', text(0, 0)));
  root.appendChild(el('h2', heading));

  const tableRow = /table row (\d+)/.exec(heading);
  if (tableRow) {
    const row = LAYOUT.firstDataRow + Number(tableRow[1]) - 1;
    const amounts = el('dl', undefined, 'print-pairs print-amounts');
    for (const c of PRINTED_COLUMNS) {
      const value = text(row, c);
      if (value !== '') amounts.appendChild(pair(LAYOUT.columns[c], value));
    }
    const warnings = text(row, LAYOUT.columns.indexOf('Warnings'));
    root.appendChild(el('h3', 'Amounts'));
    root.appendChild(amounts);
    if (warnings !== '' && warnings !== 'none') root.appendChild(el('p', `Warnings: ${warnings}`, 'print-warning'));
  }

  root.appendChild(el('h3', 'Steps'));
  const steps = el('ol', undefined, 'print-steps');
  const after: HTMLElement[] = [];
  for (let r = PROTOCOL_ROW + 1; r < PROTOCOL_ROW + PROTOCOL_MAX_ROWS; r++) {
    const line = text(r, PROTOCOL_COL);
    if (line === '') break;
    const step = /^\d+\.\s+(.*)$/.exec(line);
    if (step) steps.appendChild(el('li', step[1]));
    else after.push(el('p', line, line.startsWith('Caution') || line.startsWith('Verify') ? 'print-caution' : line.startsWith('Warning') ? 'print-warning' : 'print-note'));
  }
  root.appendChild(steps);
  for (const p of after) root.appendChild(p);

  const settings = el('dl', undefined, 'print-pairs print-settings');
  for (let r = LAYOUT.settingsRow + 1; r < LAYOUT.tableHeaderRow; r++) {
    const label = text(r, 0);
    if (label !== '') settings.appendChild(pair(label, text(r, 1)));
  }
  root.appendChild(el('h3', 'Settings'));
  root.appendChild(settings);
  root.appendChild(el('p', `Printed from the sheet "${sheet}" of the Proton Ledger preview workbook.`, 'print-note'));
  return true;
}
