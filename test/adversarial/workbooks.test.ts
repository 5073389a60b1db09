/**
 * Adversarial workbooks and CSV files for `calc`: small crafted files that ask for the far
 * corner of the grid, merges and validation rules over a whole sheet, huge texts and
 * formulas, parts that unpack to far more than the directory says, sheets linked outside
 * the package. Each must end in the right answer or a clear error naming the limit, fast.
 * The files are built here, part by part (test/support/craftWorkbook.ts).
 */
import { mkdtempSync, readFileSync, truncateSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import ExcelJS from 'exceljs';
import { main } from '../../src/cli/main';
import { parseCsv } from '../../src/workbook/delimited';
import { MAX_CELL_CHARS, MAX_CELLS, MAX_FORMULA_CHARS, MAX_FORMULA_DEPTH, MAX_FORMULA_OPERATORS, MAX_MERGED_CELLS, rangeCells } from '../../src/cli/calcLimits';
import { cell, Part, repeated, row, SHEET_HEAD, SHEET_TAIL, SheetSpec, workbookParts, zip } from '../support/craftWorkbook';

const dir = mkdtempSync(join(tmpdir(), 'proton-adversarial-'));
/** A refusal reads the package directory and scans a few KB; 5 s leaves room for a loaded machine (the old code ran 45–76 s or hung). */
const REFUSAL_BOUND_MS = 5000;
const MB = 1024 * 1024;
let serial = 0;

async function calc(file: Buffer | string, ext = 'xlsx', outExt = 'xlsx'): Promise<{ code: number; out: any; ms: number; output: string }> {
  const input = join(dir, `in${++serial}.${ext}`);
  const output = join(dir, `out${serial}.${outExt}`);
  writeFileSync(input, file);
  let text = '';
  const start = performance.now();
  const code = await main(['calc', input, '-o', output], (t) => (text += t));
  return { code, out: JSON.parse(text), ms: performance.now() - start, output };
}

function book(sheets: SheetSpec[], extra: Part[] = []): Buffer {
  return zip(workbookParts(sheets, extra));
}

const twoCells = row(1, cell('A1', { n: 2 }) + cell('B1', { f: 'A1*21' }));

async function refused(file: Buffer | string, pattern: RegExp, ext = 'xlsx', outExt = 'xlsx'): Promise<void> {
  const { code, out, ms } = await calc(file, ext, outExt);
  expect(out.error?.message).toMatch(pattern);
  expect(code).toBe(2);
  expect(out.error.field).toBeDefined();
  expect(ms).toBeLessThan(REFUSAL_BOUND_MS);
}

async function valueOf(output: string, address: string, sheet = 0): Promise<unknown> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(output);
  return wb.worksheets[sheet].getCell(address).value;
}

describe('the grid: right answers at its edges, a clear error beyond', () => {
  it('a value in XFD1048576 read by a formula: the right answer, in seconds and without the grid', async () => {
    const { code, out, output } = await calc(book([{ data: row(1, cell('A1', { f: 'XFD1048576+1' })) + row(1048576, cell('XFD1048576', { n: 41 })) }]));
    expect([code, out.formulas]).toEqual([0, 1]);
    expect(await valueOf(output, 'A1')).toBe(42);
    expect(await valueOf(output, 'XFD1048576')).toBe(41);
  }, 30000);

  it('the same sheet as CSV is refused: the CSV would hold the whole grid', async () => {
    await refused(
      book([{ data: row(1, cell('A1', { n: 1 })) + row(1048576, cell('XFD1048576', { n: 41 })) }]),
      /spans 1,048,576 rows by 16,384 columns; calc writes CSV of up to 200,000 cells/,
      'xlsx',
      'csv',
    );
  }, 30000);

  it.each([
    ['XFE1', /beyond the last cell of a worksheet/],
    ['A1048577', /beyond the last cell/],
    ['A0', /beyond the last cell/],
    ['AAAA1', /beyond the last cell/],
  ])('a cell at %s is refused', async (ref, pattern) => {
    await refused(book([{ data: `<row r="1"><c r="${ref}"><v>1</v></c></row>` }]), pattern);
  });
});

describe('merges, validation rules and array formulas over huge ranges', () => {
  it.each([
    [
      'a merge over C1:XFD1048576',
      '<mergeCells count="1"><mergeCell ref="C1:XFD1048576"/></mergeCells>',
      /merged range C1:XFD1048576 covers 17,177,772,032 cells; calc reads merged ranges covering up to 50,000 cells/,
    ],
    ['a merge over one whole column', '<mergeCells count="1"><mergeCell ref="C1:C1048576"/></mergeCells>', /merged range C1:C1048576 covers 1,048,576 cells/],
    [
      'many small merges adding up',
      `<mergeCells>${Array.from({ length: 30 }, (_, i) => `<mergeCell ref="A${i * 10 + 3}:XFD${i * 10 + 3}"/>`).join('')}</mergeCells>`,
      /calc reads merged ranges covering up to 50,000 cells in all/,
    ],
    [
      'a data-validation rule over the whole sheet',
      '<dataValidations count="1"><dataValidation type="whole" sqref="A1:XFD1048576"><formula1>1</formula1></dataValidation></dataValidations>',
      /data-validation rule over A1:XFD1048576 covers 17,179,869,184 cells/,
    ],
    [
      'a data-validation rule over two whole columns',
      '<dataValidations count="1"><dataValidation type="whole" sqref="C1:C1048576 E1:E1048576"><formula1>1</formula1></dataValidation></dataValidations>',
      /data-validation rule over E1:E1048576/,
    ],
  ])('%s: a clear error at once', async (_label, after, pattern) => {
    await refused(book([{ data: twoCells, after }]), pattern);
  });

  it('an array formula over the whole sheet: a clear error at once', async () => {
    await refused(book([{ data: row(1, '<c r="A1"><f t="array" ref="A1:XFD1048576">1</f></c>') }]), /array formula over A1:XFD1048576/);
  });

  it('a worksheet part the workbook does not list is still checked (the reader takes it anyway)', async () => {
    const hidden: Part = {
      name: 'xl/worksheets/sheet9.xml',
      data: `<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData/><mergeCells><mergeCell ref="A1:XFD1048576"/></mergeCells></worksheet>`,
    };
    await refused(book([{ data: twoCells }], [hidden]), /xl\/worksheets\/sheet9\.xml": the merged range/);
  });

  it('a sum over a merged range counts its value once (the other cells of a merge are empty)', async () => {
    const { code, output } = await calc(
      book([{ data: row(1, cell('A1', { n: 5 }) + cell('D1', { f: 'SUM(A1:C1)' })), after: '<mergeCells count="1"><mergeCell ref="A1:C1"/></mergeCells>' }]),
    );
    expect(code).toBe(0);
    expect(await valueOf(output, 'D1')).toBe(5);
  });

  it(`merges up to the limit (${MAX_MERGED_CELLS.toLocaleString('en-US')} cells) are read`, async () => {
    expect(rangeCells('A3:XFD5')).toBeLessThanOrEqual(MAX_MERGED_CELLS);
    const { code, output } = await calc(book([{ data: twoCells, after: '<mergeCells count="1"><mergeCell ref="A3:XFD5"/></mergeCells>' }]));
    expect(code).toBe(0);
    expect(await valueOf(output, 'B1')).toBe(42);
  }, 30000);
});

describe('texts and formulas', () => {
  it('a 200 MB text cell in a file of a few hundred KB: refused while unpacking, never held', async () => {
    const sheet = repeated('xl/worksheets/sheet1.xml', `${SHEET_HEAD}<row r="1"><c r="A1" t="inlineStr"><is><t>`, 'x'.repeat(MB), 200, `</t></is></c></row>${SHEET_TAIL}`);
    const file = zip(workbookParts([{ data: '' }]).map((p) => (p.name === sheet.name ? sheet : p)));
    expect(file.length).toBeLessThan(300 * 1024);
    await refused(file, /the part xl\/worksheets\/sheet1\.xml unpacks to more than 100 MB/);
  });

  it('a 60 MB text cell (within the unpacking limit): refused by the length of a cell', async () => {
    const sheet = repeated('xl/worksheets/sheet1.xml', `${SHEET_HEAD}<row r="1"><c r="A1" t="inlineStr"><is><t>`, 'y'.repeat(MB), 60, `</t></is></c></row>${SHEET_TAIL}`);
    await refused(zip(workbookParts([{ data: '' }]).map((p) => (p.name === sheet.name ? sheet : p))), /Sheet1!A1: a text of 62,914,560 characters; a cell holds up to 32,767/);
  }, 20000);

  it.each([
    ['an inline text', (t: string) => book([{ data: row(1, cell('A1', { text: t })) }]), /Sheet1!A1: a text of 40,000 characters; a cell holds up to 32,767/],
    [
      'a shared text in runs',
      (t: string) =>
        book(
          [{ data: row(1, '<c r="A1" t="s"><v>0</v></c>') }],
          [
            {
              name: 'xl/sharedStrings.xml',
              data: `<sst xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><si><r><t>${t.slice(0, 20000)}</t></r><r><t>${t.slice(20000)}</t></r></si></sst>`,
            },
          ],
        ),
      /A shared text of the workbook: a text of 40,000 characters/,
    ],
  ])('%s over 32,767 characters is refused', async (_label, make, pattern) => {
    await refused(make('é'.repeat(40_000)), pattern);
  });

  it(`a text of exactly ${MAX_CELL_CHARS} characters is kept whole`, async () => {
    const text = 'ä'.repeat(MAX_CELL_CHARS);
    const { code, output } = await calc(book([{ data: row(1, cell('A1', { text }) + cell('B1', { f: 'LEN(A1)' })) }]));
    expect(code).toBe(0);
    expect(await valueOf(output, 'A1')).toBe(text);
    expect(await valueOf(output, 'B1')).toBe(MAX_CELL_CHARS);
  });

  it.each([
    ['400,000 characters', `${'1+'.repeat(200_000)}1`, /Sheet1!A1: a formula of 400,001 characters; a formula may have up to 8,192/],
    ['1,000,000 letters', 'A'.repeat(1_000_000), /a formula of 1,000,000 characters/],
    [`nested ${MAX_FORMULA_DEPTH + 1} deep`, `${'ABS('.repeat(MAX_FORMULA_DEPTH + 1)}1${')'.repeat(MAX_FORMULA_DEPTH + 1)}`, /nested 65 levels deep; a formula may nest up to 64/],
    ['nested 4,000 deep', `${'('.repeat(4000)}1${')'.repeat(4000)}`, /nested 4,000 levels deep/],
    ['4,095 additions (8,191 characters)', `${'1+'.repeat(4095)}1`, /a formula with 4,095 operators; calc evaluates formulas with up to 500/],
    ['4,000 minus signs', `${'-'.repeat(4000)}1`, /4,000 operators/],
    ['2,000 comparisons written as entities', `${'1<'.repeat(2000)}1`, /2,000 operators/],
  ])('a formula of %s is refused before the formula engine sees it', async (_label, f, pattern) => {
    await refused(book([{ data: row(1, cell('A1', { f })) }]), pattern);
  });

  it(`formulas at the limits still evaluate: nested ${MAX_FORMULA_DEPTH} deep, ${MAX_FORMULA_CHARS} characters, ${MAX_FORMULA_OPERATORS} operators inside ${MAX_FORMULA_DEPTH} brackets`, async () => {
    const deep = `${'ABS('.repeat(MAX_FORMULA_DEPTH)}-7${')'.repeat(MAX_FORMULA_DEPTH)}`;
    const long = `SUM(${'1,'.repeat(MAX_FORMULA_CHARS / 2 - 4)}111)`;
    expect(long.length).toBe(MAX_FORMULA_CHARS);
    const busy = `${'('.repeat(MAX_FORMULA_DEPTH)}${'1+'.repeat(MAX_FORMULA_OPERATORS)}1${')'.repeat(MAX_FORMULA_DEPTH)}`;
    const { code, output } = await calc(book([{ data: row(1, cell('A1', { f: deep }) + cell('B1', { f: long }) + cell('C1', { f: busy })) }]));
    expect(code).toBe(0);
    expect(await valueOf(output, 'A1')).toBe(7);
    expect(await valueOf(output, 'B1')).toBe(MAX_FORMULA_CHARS / 2 - 4 + 111);
    expect(await valueOf(output, 'C1')).toBe(MAX_FORMULA_OPERATORS + 1);
  });

  it('brackets inside quoted text do not count as nesting', async () => {
    const f = `LEN("${'('.repeat(500)}")`;
    const { code, output } = await calc(book([{ data: row(1, cell('A1', { f })) }]));
    expect(code).toBe(0);
    expect(await valueOf(output, 'A1')).toBe(500);
  });
});

describe('ranges read by formulas', () => {
  it.each([
    ['one column written cell by cell', 'SUM(C1:C1048576)', /Sheet1!B1: the range C1:C1048576 \(1,048,576 cells\) brings the cells read through ranges past 100,000/],
    ['every row', 'SUM(1:1048576)', /the range 1:1048576 \(17,179,869,184 cells\)/],
    ['the whole sheet', 'SUM(A1:XFD1048576)', /the range A1:XFD1048576/],
  ])('%s: a clear error at once (the engine builds a range cell by cell)', async (_label, f, pattern) => {
    await refused(book([{ data: row(1, cell('A1', { n: 3 }) + cell('B1', { f })) }]), pattern);
  });

  it('a shared formula filled down 1,000 rows over ranges of 1,000 cells counts each shifted range (the engine took 200 s on such)', async () => {
    const master = '<c r="B1"><f t="shared" ref="B1:B1000" si="0">SUM(A1:A1000)</f></c>';
    await refused(book([{ data: row(1, cell('A1', { n: 3 }) + master) }]), /the range A1:A1000 \(1,000 cells\) brings the cells read through ranges past 100,000/);
  });

  it('whole columns (A:A), fixed ranges and ranges inside quoted text cost nothing against the limit', async () => {
    const f = 'SUM(A:A)+SUM($A$1:$A$90000)+SUM($A$1:$A$90000)+LEN("A1:XFD1048576")';
    const { code, output } = await calc(book([{ data: row(1, cell('A1', { n: 3 }) + cell('B1', { f })) }]));
    expect(code).toBe(0);
    expect(await valueOf(output, 'B1')).toBe(3 + 3 + 3 + 'A1:XFD1048576'.length);
  }, 30000);

  it('the same limit holds in a CSV file', async () => {
    await refused('1,=SUM(A1:A200000)\r\n', /A1:A200000 \(200,000 cells\)/, 'csv');
  });
});

describe('the package itself', () => {
  it.each([
    ['a sheet linked outside the package', { target: '../../../etc/passwd' }, /points to \.\.\/\.\.\/\.\.\/etc\/passwd, outside the workbook's package/],
    ['a sheet linked to another file', { target: 'file:///etc/passwd', external: true }, /outside the workbook's package/],
    ['a sheet linked to a web address', { target: 'https://example.invalid/sheet.xml' }, /outside the workbook's package/],
    ['a sheet linked to a missing part', { target: 'worksheets/sheet7.xml' }, /points to worksheets\/sheet7\.xml, which the package does not hold/],
  ])('%s: an error, not success with 0 sheets', async (_label, link, pattern) => {
    await refused(book([{ data: twoCells, ...link }]), pattern);
  });

  it('a sheet stored under a part name the reader skips: an error, not a sheet silently dropped', async () => {
    const parts = workbookParts([{ data: twoCells }, { data: row(1, cell('A1', { f: 'Sheet1!B1+1' })), target: 'worksheets/data.xml' }]).map((p) =>
      p.name === 'xl/worksheets/sheet2.xml' ? { ...p, name: 'xl/worksheets/data.xml' } : p,
    );
    await refused(zip(parts), /the sheet "Sheet2" is stored as xl\/worksheets\/data\.xml; calc reads worksheets stored as xl\/worksheets\/sheet<number>\.xml/);
  });

  it('sheet names with escaped characters are matched as the reader reads them', async () => {
    const { code, out, output } = await calc(book([{ name: 'R&amp;D &lt;cold&gt;', data: twoCells }, { data: row(1, cell('A1', { f: "'R&D <cold>'!B1+1" })) }]));
    expect([code, out.sheets]).toEqual([0, ['R&D <cold>', 'Sheet2']]);
    expect(await valueOf(output, 'A1', 1)).toBe(43);
  });

  it('a workbook with no sheets: an error', async () => {
    const parts = workbookParts([{ data: twoCells }]).map((p) => (p.name === 'xl/workbook.xml' ? { ...p, data: String(p.data).replace(/<sheet [^>]*\/>/, '') } : p));
    await refused(zip(parts), /holds no worksheets/);
  });

  it('a part whose directory claims 1 KB but that unpacks to 101 MB: refused while unpacking', async () => {
    const bomb = repeated('xl/media/image1.png', '', '\0'.repeat(MB), 101, '');
    await refused(book([{ data: twoCells }], [{ ...bomb, claimedSize: 1024 }]), /xl\/media\/image1\.png unpacks to more than 100 MB/);
  });

  it.each([
    ['not a zip at all', () => Buffer.from('hello, I am text'), /not a readable \.xlsx workbook \(no zip directory\)/],
    ['an empty file', () => Buffer.alloc(0), /no zip directory/],
    ['a zip cut in half', () => book([{ data: twoCells }]).subarray(0, 700), /not a readable \.xlsx workbook/],
    ['a zip without a workbook part', () => zip([{ name: 'hello.txt', data: 'hi' }]), /no xl\/workbook\.xml/],
    [
      'a part packed with an unknown method',
      () => {
        const file = book([{ data: twoCells }]);
        const central = file.indexOf(Buffer.from([0x50, 0x4b, 0x01, 0x02]));
        file.writeUInt16LE(99, central + 10);
        return file;
      },
      /packed with method 99/,
    ],
  ])('%s: a clear error', async (_label, make, pattern) => {
    await refused(make(), pattern);
  });

  it('a file over 20 MB is refused before it is read', async () => {
    const input = join(dir, 'huge.xlsx');
    writeFileSync(input, '');
    truncateSync(input, 21 * MB);
    let text = '';
    expect(await main(['calc', input, '-o', join(dir, 'huge-out.xlsx')], (t) => (text += t))).toBe(2);
    expect(JSON.parse(text).error.message).toMatch(/is 21 MB; calc reads files up to 20 MB/);
  });
});

describe('CSV input', () => {
  it.each([
    ['quotes, doubled quotes, CRLF, LF and CR', 'a,"b,""c""",d\r\ne\nf\rg', [['a', 'b,"c"', 'd'], ['e'], ['f'], ['g']]],
    ['a quote in the middle of a field kept as written, as spreadsheet programs read it (one reader with the preview)', 'x"y,z"w,v\n', [['x"y', 'z"w', 'v']]],
    ['an unterminated quote runs to the end', 'a,"b\nc', [['a', 'b\nc']]],
    [
      'empty fields and a trailing separator',
      ',,\r\n,',
      [
        ['', '', ''],
        ['', ''],
      ],
    ],
    ['20 MB in one quoted field', `"${'q'.repeat(20 * MB)}`, [['q'.repeat(20 * MB)]]],
  ])('splits %s', (_label, text, rows) => {
    expect(parseCsv(text)).toEqual(rows);
  });

  it.each([
    ['a field of 40,000 characters', `a,${'b'.repeat(40_000)}\r\n`, /B1 of the CSV file: a text of 40,000 characters/],
    ['a formula of 9,000 characters', `1,=${'1+'.repeat(4500)}1\r\n`, /B1 of the CSV file: a formula of 9,002 characters/],
    ['a formula nested 4,000 deep', `=${'('.repeat(4000)}1${')'.repeat(4000)}\r\n`, /A1 of the CSV file: a formula nested 4,000 levels deep/],
    ['one field more than the limit', `${'1,'.repeat(MAX_CELLS)}1\r\n`, /The file has more than 200,000 cells with content/],
  ])(
    '%s: a clear error',
    async (_label, text, pattern) => {
      await refused(text, pattern, 'csv');
    },
    30000,
  );

  it('200 fields of 30,000 digits and a letter are read as text in linear time (each took 1.7 s)', async () => {
    const field = `${'1'.repeat(30_000)}x`;
    const { code, output, ms } = await calc(`${Array.from({ length: 200 }, () => field).join(',')}\r\n`, 'csv', 'csv');
    expect(code).toBe(0);
    expect(ms).toBeLessThan(REFUSAL_BOUND_MS);
    expect(readFileSync(output, 'utf8').split(',')[0]).toBe(field);
  });

  it('a CSV file with text that would run as a formula keeps it as text in its CSV output', async () => {
    const { code, output } = await calc(`"\n=1+1",\t=2,＝3\r\n`, 'csv', 'csv');
    expect(code).toBe(0);
    expect(readFileSync(output, 'utf8')).toBe(`"'\n=1+1",'\t=2,'＝3\r\n`);
  });
});
