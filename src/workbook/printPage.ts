/**
 * A sheet's print area as a printable page: one look for the command line's HTML file and
 * the preview's print view, from computed values and the port's cell styles. Pure (text and
 * plain style objects); the hosts put it on paper their own way.
 */
import type { CellStyle } from './port';

/** One printed cell: its text as shown, and its style. */
export interface PrintCell {
  readonly text: string;
  readonly style?: CellStyle;
  /** Right-aligned (numbers). */
  readonly numeric?: boolean;
}

/** CSS of each cell style, as property → value (kebab-case), matching the Excel adapter's look. */
export const PRINT_STYLES: Readonly<Record<CellStyle, Readonly<Record<string, string>>>> = {
  title: { 'font-weight': '700', 'font-size': '13pt', color: '#1F3A44' },
  subtitle: { 'font-weight': '700', 'font-size': '9pt', color: '#1F3A44', 'padding-top': '5pt', 'border-bottom': '1px solid #1F3A44' },
  label: { color: '#40505A' },
  header: { 'font-weight': '700', color: '#1F3A44', background: '#E4EAEC' },
  input: { color: '#0B4F5C', background: '#EEF5F3', border: '1px solid #9DBDB5', 'min-width': '3em' },
  result: {},
  note: { 'font-style': 'italic', color: '#52616B' },
  warning: { color: '#7A4A00', background: '#FFF4DC' },
  text: { 'white-space': 'normal' },
  caution: { 'font-weight': '700', color: '#8A1C1C' },
  provenance: { color: '#40505A', background: '#F3F3F0' },
};

/** Styles of the page itself: A4 portrait, small type, so a record fits one page. */
export const PAGE_STYLE: Readonly<Record<string, string>> = { 'font-family': 'Segoe UI, Helvetica, Arial, sans-serif', 'font-size': '7.5pt', 'line-height': '1.2', color: '#111' };

/** Style of every printed cell. */
export const CELL_STYLE: Readonly<Record<string, string>> = {
  padding: '1pt 3pt',
  'vertical-align': 'top',
  overflow: 'hidden',
  'white-space': 'nowrap',
  'text-overflow': 'ellipsis',
  'font-size': '7.5pt',
  'line-height': '1.2',
  height: 'auto',
};

const escapeHtml = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const css = (o: Readonly<Record<string, string>>) =>
  Object.entries(o)
    .map(([k, v]) => `${k}: ${v}`)
    .join('; ');

/** True when a printed row is one long text (a title, a caution) to run across the page. */
export function spansRow(row: readonly PrintCell[]): boolean {
  return row.length > 0 && row[0].text.length > 40 && row.slice(1).every((c) => c.text === '' && (c.style === undefined || c.style === row[0].style || c.style === 'result'));
}

/**
 * The page as a standalone HTML document (for a file: its own style sheet, no scripts).
 *
 * @param title - the document's title
 * @param rows - the print area's cells, row by row
 * @param widths - column widths in characters
 */
export function printPageHtml(title: string, rows: readonly (readonly PrintCell[])[], widths: readonly number[]): string {
  const cols = widths.map((w) => `<col style="width: ${w}ch">`).join('');
  const body = rows
    .map((row) => {
      if (spansRow(row)) return `<tr><td colspan="${widths.length}" class="s-${row[0].style ?? 'result'}">${escapeHtml(row[0].text)}</td></tr>`;
      const cells = widths.map((_, i) => {
        const c = row[i];
        if (!c) return '<td></td>';
        return `<td class="s-${c.style ?? 'result'}${c.numeric ? ' num' : ''}">${escapeHtml(c.text)}</td>`;
      });
      return `<tr>${cells.join('')}</tr>`;
    })
    .join('\n');
  const styles = Object.entries(PRINT_STYLES)
    .map(([k, v]) => `td.s-${k} { ${css(v)} }`)
    .join('\n');
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(title)}</title>
<style>
@page { size: A4 portrait; margin: 12mm; }
body { ${css(PAGE_STYLE)}; margin: 0; }
table { border-collapse: collapse; table-layout: fixed; width: 100%; }
td { ${css(CELL_STYLE)} }
td[colspan] { white-space: normal; }
td.num { text-align: right; }
${styles}
</style></head>
<body><table><colgroup>${cols}</colgroup>
${body}
</table></body></html>
`;
}
