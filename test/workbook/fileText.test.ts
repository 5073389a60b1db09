/**
 * The shared pieces of reading and writing workbook files: delimited text as spreadsheets
 * exchange it (RFC 4180 quoting, the clipboard's tab-separated form), the cells of a CSV
 * file for the engine with their limits, and the application a written .xlsx names.
 */
import ExcelJS from 'exceljs';
import { parseDelimited, toTabSeparated } from '../../src/workbook/delimited';
import { CellBudget, csvRows, FileRefused, worksheetRows } from '../../src/workbook/fileCells';
import { inflateRawSync } from 'zlib';
import { APP_PART, APPLICATION_NAME, crc32, entryData, nameApplication, zipEntries } from '../../src/workbook/xlsxApplication';
import { xlsxFileName } from '../../src/preview/xlsx';

describe('delimited text (RFC 4180)', () => {
  test('tab-separated text round-trips fields holding tabs, line breaks and quotes', () => {
    const rows = [
      ['HEPES', 'a\tb'],
      ['say "hi"', 'two\r\nlines'],
      ['', '7.4'],
    ];
    const text = toTabSeparated(rows);
    expect(text).toBe('HEPES\t"a\tb"\r\n"say ""hi"""\t"two\r\nlines"\r\n\t7.4\r\n');
    expect(parseDelimited(text, '\t')).toEqual(rows);
  });

  test('a quote inside an unquoted field is kept as written, as spreadsheet programs read it', () => {
    expect(parseDelimited('5" tube,2\n', ',')).toEqual([['5" tube', '2']]);
  });
});

describe('CSV cells for the engine', () => {
  test('formulas normalised, numbers as numbers, text kept as text', () => {
    expect(csvRows('\uFEFFname,mM\r\ntris,50\r\n=1E+2,"=_xldudf_PROTON_PKA(""tris"",1,25)"\r\n')).toEqual([
      ["'name", "'mM"],
      ["'tris", 50],
      ['=1e+2', '=PROTON.PKA("tris",1,25)'],
    ]);
  });

  test('a formula past the nesting limit and a file past the cell budget are refused with the cell', () => {
    expect(() => csvRows(`a\r\n=${'('.repeat(65)}1${')'.repeat(65)}\r\n`)).toThrow(
      new FileRefused('A2 of the CSV file: a formula nested 65 levels deep; a formula may nest up to 64 levels.'),
    );
    expect(() => csvRows('1,2,3\r\n4,5,6\r\n', new CellBudget(5))).toThrow(FileRefused);
  });
});

describe('worksheet cells for the engine', () => {
  test("a merged range keeps its value in its first cell only; an array formula's other cells are left to it; a saved PROTON name is restored", () => {
    const ws = new ExcelJS.Workbook().addWorksheet('Prep');
    ws.getCell('A1').value = 'Cold room';
    ws.mergeCells('A1:C1');
    ws.getCell('A2').value = { formula: '_xldudf_PROTON_PKA("tris",1,25)', result: 8.07 } as ExcelJS.CellFormulaValue;
    ws.getCell('B2').value = { formula: 'TRANSPOSE(A3:A4)', result: 1, shareType: 'array', ref: 'B2:C2' } as unknown as ExcelJS.CellFormulaValue;
    ws.getCell('C2').value = 2;
    expect(worksheetRows(ws)).toEqual([["'Cold room"], ['=PROTON.PKA("tris",1,25)', '=TRANSPOSE(A3:A4)']]);
  });
});

describe('the written .xlsx names Proton Ledger', () => {
  test("docProps/app.xml names Proton Ledger, not the library's default program, and the workbook still reads", async () => {
    const wb = new ExcelJS.Workbook();
    wb.addWorksheet('Prep').getCell('A1').value = 42;
    const written = new Uint8Array((await wb.xlsx.writeBuffer()) as ArrayBuffer);
    const named = nameApplication(written, ['Prep']);
    const part = (zip: Uint8Array, name: string) => {
      const entry = zipEntries(zip)!.entries.find((e) => e.name === name)!;
      const data = entryData(zip, entry);
      return Buffer.from(entry.method === 8 ? inflateRawSync(data) : data).toString('utf8');
    };
    expect(part(written, APP_PART)).toContain('<Application>Microsoft Excel</Application>');
    const app = part(named, APP_PART);
    expect(app).toContain(`<Application>${APPLICATION_NAME}</Application>`);
    expect(app).toContain('<vt:lpstr>Prep</vt:lpstr>');
    expect(app).not.toMatch(/Microsoft|AppVersion/);
    // A Buffer (whose slices are views of a larger buffer, as the writer returns in Node and the browser) gives the same package.
    expect(Buffer.from(nameApplication(Buffer.concat([Buffer.from(written)]), ['Prep']))).toEqual(Buffer.from(named));
    // Every other part is copied unchanged.
    for (const e of zipEntries(written)!.entries.filter((x) => x.name !== APP_PART)) expect(part(named, e.name)).toBe(part(written, e.name));
    const back = new ExcelJS.Workbook();
    await back.xlsx.load(Buffer.from(named) as unknown as ArrayBuffer);
    expect(back.getWorksheet('Prep')!.getCell('A1').value).toBe(42);
  });

  test('CRC-32 of "123456789" is CBF43926 (the check value of the ZIP polynomial, APPNOTE 4.4.7; common practice)', () => {
    expect(crc32(new TextEncoder().encode('123456789')).toString(16)).toBe('cbf43926');
  });

  test('the file name comes from the title, without characters file systems refuse', () => {
    expect(xlsxFileName('Cold room: HEPES / NaCl?')).toBe('Cold room HEPES NaCl.xlsx');
    expect(xlsxFileName('  ..  ')).toBe('workbook.xlsx');
  });
});
