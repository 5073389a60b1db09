/**
 * calc's memory and time on crafted inputs up to 50 MB: workbooks that ask for the far
 * corner of the grid, merges and validation rules over a whole sheet, huge texts and
 * formulas, a part that unpacks to far more than its directory says, and the largest
 * inputs calc accepts. Each case runs `calc` in a child process; the bench prints its peak
 * resident memory (the target: at most 1 GB on any input of at most 50 MB), its time and
 * what calc said. Exits 1 if a case passes 1 GB, takes more than 120 s, or ends other than
 * with a result (exit 0) or a clear error (exit 2). A bench, not a test: run it on a quiet machine.
 *
 * Run: npm run bench:calc-memory          (or add -- WORDS to run only the cases whose label holds them)
 */
import { spawnSync } from 'child_process';
import { mkdtempSync, rmSync, statSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import { randomBytes } from 'crypto';
import { MAX_CELLS, MAX_REFERENCED_CELLS } from '../src/cli/calcLimits';
import { cell, row, workbookParts, zip } from '../test/support/craftWorkbook';

const RSS_LIMIT_MB = 1024;
const TIME_LIMIT_MS = 120_000;
const MB = 1024 * 1024;

function denseSheet(cells: number, columns = 10): string {
  const rows: string[] = [];
  for (let r = 1; r <= Math.ceil(cells / columns); r++) {
    let line = '';
    for (let c = 0; c < columns && (r - 1) * columns + c < cells; c++) {
      const ref = `${String.fromCharCode(65 + c)}${r}`;
      line += c === 0 && r > 1 ? cell(ref, { f: `A${r - 1}+B${r}` }) : cell(ref, { n: r * c });
    }
    rows.push(row(r, line));
  }
  return rows.join('');
}

const formulaCell = row(1, cell('A1', { n: 2 }) + cell('B1', { f: 'A1*21' }));

type Case = [label: string, file: string, make: () => Buffer | string, outExt?: string];
const CELLS = Number(process.env.CALC_BENCH_CELLS ?? MAX_CELLS);
const cases: Case[] = [
  [`${CELLS.toLocaleString('en-US')} cells (the limit), a tenth of them formulas`, 'xlsx', () => zip(workbookParts([{ data: denseSheet(CELLS) }]))],
  [`${(CELLS + 1).toLocaleString('en-US')} cells`, 'xlsx', () => zip(workbookParts([{ data: denseSheet(CELLS + 1) }]))],
  [
    'a value in XFD1048576 and a formula reading it',
    'xlsx',
    () => zip(workbookParts([{ data: row(1, cell('A1', { f: 'XFD1048576+1' })) + row(1048576, cell('XFD1048576', { n: 41 })) }])),
  ],
  ['the same, written as CSV', 'xlsx', () => zip(workbookParts([{ data: row(1, cell('A1', { f: 'XFD1048576+1' })) + row(1048576, cell('XFD1048576', { n: 41 })) }])), 'csv'],
  ['a merge over C1:XFD1048576', 'xlsx', () => zip(workbookParts([{ data: formulaCell, after: '<mergeCells count="1"><mergeCell ref="C1:XFD1048576"/></mergeCells>' }]))],
  [
    'merges over 49,152 cells (three full rows; the limit is 50,000)',
    'xlsx',
    () => zip(workbookParts([{ data: formulaCell, after: '<mergeCells count="1"><mergeCell ref="A3:XFD5"/></mergeCells>' }])),
  ],
  [
    'every limit at once: the most cells, merges, one validated column, ranges',
    'xlsx',
    () =>
      zip(
        workbookParts([
          {
            data: denseSheet(CELLS - 1) + row(Math.ceil(CELLS / 10) + 1, cell(`L${Math.ceil(CELLS / 10) + 1}`, { f: `SUM(M1:M${MAX_REFERENCED_CELLS})` })),
            after:
              '<mergeCells count="1"><mergeCell ref="L1:XFD3"/></mergeCells><dataValidations count="1"><dataValidation type="whole" sqref="K1:K1048576"><formula1>1</formula1></dataValidation></dataValidations>',
          },
        ]),
      ),
  ],
  ['a formula reading C1:C1048576', 'xlsx', () => zip(workbookParts([{ data: row(1, cell('A1', { n: 2 }) + cell('B1', { f: 'SUM(C1:C1048576)' })) }]))],
  [
    'a formula filled down 1,000 rows, each reading 100,000 cells',
    'xlsx',
    () => zip(workbookParts([{ data: row(1, cell('A1', { n: 2 }) + '<c r="B1"><f t="shared" ref="B1:B1000" si="0">SUM(C1:C100000)</f></c>') }])),
  ],
  [
    'ranges up to the limit: a formula reading 100,000 cells',
    'xlsx',
    () => zip(workbookParts([{ data: row(1, cell('A1', { n: 2 }) + cell('B1', { f: `SUM(C1:C${MAX_REFERENCED_CELLS})` })) }])),
  ],
  [
    'a data-validation rule over the whole sheet',
    'xlsx',
    () =>
      zip(
        workbookParts([
          { data: formulaCell, after: '<dataValidations count="1"><dataValidation type="whole" sqref="A1:XFD1048576"><formula1>1</formula1></dataValidation></dataValidations>' },
        ]),
      ),
  ],
  [
    'a data-validation rule over one whole column (the limit)',
    'xlsx',
    () =>
      zip(
        workbookParts([
          { data: formulaCell, after: '<dataValidations count="1"><dataValidation type="whole" sqref="C1:C1048576"><formula1>1</formula1></dataValidation></dataValidations>' },
        ]),
      ),
  ],
  ['a 200 MB text cell in a small file', 'xlsx', () => zip(workbookParts([{ data: row(1, cell('A1', { text: 'x'.repeat(200 * MB) })) }]))],
  [
    '3,000 shared texts of 16,000 two-byte letters (96 MB unpacked, near the limit)',
    'xlsx',
    () =>
      zip(
        workbookParts(
          [{ data: Array.from({ length: 3000 }, (_, i) => row(i + 1, `<c r="A${i + 1}" t="s"><v>${i}</v></c>`)).join('') }],
          [
            {
              name: 'xl/sharedStrings.xml',
              data: `<sst xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main">${Array.from({ length: 3000 }, (_, i) => `<si><t>${i}${'é'.repeat(15_990)}</t></si>`).join('')}</sst>`,
            },
          ],
        ),
      ),
  ],
  [
    '1,000 texts of 32,767 characters (32 MB unpacked)',
    'xlsx',
    () => zip(workbookParts([{ data: Array.from({ length: 1000 }, (_, i) => row(i + 1, cell(`A${i + 1}`, { text: `${i}`.padEnd(32767, 'ab') }))).join('') }])),
  ],
  ['a 400,000-character formula', 'xlsx', () => zip(workbookParts([{ data: row(1, cell('A1', { f: `${'1+'.repeat(200_000)}1` })) }]))],
  ['a 1,000,000-letter formula', 'xlsx', () => zip(workbookParts([{ data: row(1, cell('A1', { f: 'A'.repeat(1_000_000) })) }]))],
  [
    'a part that claims 1 KB and unpacks to 101 MB',
    'xlsx',
    () => zip(workbookParts([{ data: formulaCell }], [{ name: 'xl/media/image1.png', data: Buffer.alloc(101 * MB), claimedSize: 1024 }])),
  ],
  ['a 19 MB workbook (a 19 MB picture)', 'xlsx', () => zip(workbookParts([{ data: formulaCell }], [{ name: 'xl/media/image1.png', data: randomBytes(19 * MB), stored: true }]))],
  ['a 50 MB workbook', 'xlsx', () => zip(workbookParts([{ data: formulaCell }], [{ name: 'xl/media/image1.png', data: randomBytes(50 * MB), stored: true }]))],
  [
    `CSV of ${CELLS.toLocaleString('en-US')} fields (the limit)`,
    'csv',
    () => `${Array.from({ length: CELLS / 10 }, (_, r) => `${r},=A${r + 1}*2,x,1,2,3,4,5,6,7`).join('\r\n')}\r\n`,
  ],
  ['CSV of 19 MB (600 texts of 32,000 characters)', 'csv', () => `${Array.from({ length: 600 }, (_, r) => `${r},${'t'.repeat(32_000)}`).join('\r\n')}\r\n`],
  ['CSV of 50 MB', 'csv', () => `${Array.from({ length: 1600 }, () => 'u'.repeat(32_000)).join('\r\n')}\r\n`],
];

const only = process.argv.slice(2).join(' ');
const dir = mkdtempSync(join(tmpdir(), 'proton-calc-memory-'));
const child = join(__dirname, 'calcMemoryChild.js');
console.log(`Proton Ledger calc memory bench — node ${process.version}, ${new Date().toISOString()} (limit ${RSS_LIMIT_MB} MB peak RSS, ${TIME_LIMIT_MS / 1000} s)`);
let failed = false;
let worstRss = 0;
let worstMs = 0;
try {
  cases.forEach(([label, ext, make, outExt = 'xlsx'], i) => {
    if (only && !label.includes(only)) return;
    const input = join(dir, `case${i}.${ext}`);
    writeFileSync(input, make());
    const size = statSync(input).size;
    const run = spawnSync(process.execPath, [child, input, '-o', join(dir, `out${i}.${outExt}`), '--force'], { encoding: 'utf8', timeout: TIME_LIMIT_MS });
    let report: { code: number; ms: number; maxRssMb: number; message: string } | undefined;
    try {
      report = JSON.parse(run.stdout.trim().split('\n').pop() ?? '');
    } catch {
      report = undefined;
    }
    const ok = report !== undefined && (report.code === 0 || report.code === 2) && report.maxRssMb <= RSS_LIMIT_MB && report.ms <= TIME_LIMIT_MS;
    if (!ok) failed = true;
    if (report) {
      worstRss = Math.max(worstRss, report.maxRssMb);
      worstMs = Math.max(worstMs, report.ms);
    }
    const line = report
      ? `${report.maxRssMb.toFixed(0).padStart(6)} MB ${(report.ms / 1000).toFixed(1).padStart(6)} s  exit ${report.code}`
      : `  died (${run.signal ?? `exit ${run.status}`}${run.error ? `, ${run.error.message}` : ''})`;
    console.log(
      `${ok ? '' : 'FAIL '}${line}  ${(size / MB).toFixed(2).padStart(6)} MB in  ${label}\n${' '.repeat(40)}${(report?.message ?? run.stderr.slice(-200)).slice(0, 160)}`,
    );
  });
} finally {
  rmSync(dir, { recursive: true, force: true });
}
console.log(`worst: ${worstRss.toFixed(0)} MB peak RSS, ${(worstMs / 1000).toFixed(1)} s`);
process.exitCode = failed ? 1 : 0;
