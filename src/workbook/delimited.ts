/**
 * Delimited text, read and written the way spreadsheet programs do: CSV files (RFC 4180:
 * fields in double quotes when they hold the delimiter, a quote or a line break; a quote
 * inside doubled) and the tab-separated text spreadsheets put on the clipboard.
 */

/**
 * Splits delimited text into rows of fields.
 *
 * @param text - the text (CRLF, LF or CR line ends)
 * @param delimiter - one character: "," for CSV, "\t" for the clipboard
 * @returns rows of fields; a line break at the very end adds no empty row
 * @example parseDelimited('a\t"b ""c"""\r\n1\t2\r\n', '\t') //=> [['a', 'b "c"'], ['1', '2']]
 */
export function parseDelimited(text: string, delimiter: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"' && field === '') quoted = true;
    else if (ch === delimiter) {
      row.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  return rows;
}

/** Splits CSV text into rows of strings. */
export function parseCsv(text: string): string[][] {
  return parseDelimited(text, ',');
}

/**
 * Rows of text as tab-separated lines, as spreadsheets put them on the clipboard: a field
 * holding a tab, a line break or a quote is quoted, its quotes doubled.
 *
 * @example toTabSeparated([['a', 'b\tc'], ['1', '']]) //=> 'a\t"b\tc"\r\n1\t\r\n'
 */
export function toTabSeparated(rows: readonly (readonly string[])[]): string {
  return rows.map((row) => row.map((f) => (/[\t\r\n"]/.test(f) ? `"${f.replace(/"/g, '""')}"` : f)).join('\t') + '\r\n').join('');
}
