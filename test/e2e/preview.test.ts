/**
 * End to end, in a real browser: the preview page built by webpack, served by
 * scripts/serve.js on a free port, driven by playwright-core in Debian's Chromium (headless).
 * One browser launch; screenshots go to test-artifacts/ (gitignored).
 *
 * Without /usr/bin/chromium the tests are skipped with a message — except under CI=true,
 * where a missing browser is a failure.
 */
import { ChildProcess, spawn } from 'child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import type { BrowserContext, Page } from 'playwright-core';
import ExcelJS from 'exceljs';
import { ensureBuild } from '../support/build';
import { entryData, zipEntries } from '../../src/workbook/xlsxApplication';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const ROOT = join(__dirname, '..', '..');
const ARTIFACTS = join(ROOT, 'test-artifacts');
const haveBrowser = existsSync(CHROMIUM);
const inCi = process.env.CI === 'true' || process.env.CI === '1';

if (!haveBrowser && !inCi) {
  console.warn(`Browser tests skipped: no Chromium at ${CHROMIUM} (install it with: apt-get install -y chromium).`);
}

const describeBrowser = haveBrowser || inCi ? describe : describe.skip;

describeBrowser('preview workbook in Chromium', () => {
  let server: ChildProcess;
  let baseUrl = '';
  let context: BrowserContext;
  let page: Page;
  let profile = '';
  const pageErrors: string[] = [];

  beforeAll(async () => {
    if (!haveBrowser) throw new Error(`CI=true and no Chromium at ${CHROMIUM}: the browser tests must run in CI (apt-get install -y chromium).`);
    ensureBuild();
    mkdirSync(ARTIFACTS, { recursive: true });
    server = spawn(process.execPath, [join(ROOT, 'scripts', 'serve.js'), '--port', '0', '--no-open', '--no-pid-file'], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
    baseUrl = await new Promise<string>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error('server did not start')), 15000);
      server.stdout!.on('data', (chunk: Buffer) => {
        const m = /(http:\/\/localhost:\d+\/)/.exec(chunk.toString());
        if (m) {
          clearTimeout(timer);
          resolve(m[1]);
        }
      });
      server.on('exit', (code) => reject(new Error(`server exited with ${code}`)));
    });
    const { chromium } = await import('playwright-core');
    profile = mkdtempSync(join(tmpdir(), 'proton-e2e-'));
    // A fresh profile directory (playwright passes it to Chromium as --user-data-dir).
    context = await chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
      viewport: { width: 1440, height: 900 },
      acceptDownloads: true,
    });
    page = context.pages()[0] ?? (await context.newPage());
    page.on('pageerror', (e) => pageErrors.push(`pageerror: ${e.message}`));
    page.on('console', (m) => {
      if (m.type() === 'error') pageErrors.push(`console: ${m.text()}`);
    });
    await page.goto(baseUrl);
    await page.waitForSelector('body[data-ready="true"]', { timeout: 20000 });
  }, 180000);

  afterAll(async () => {
    await context?.close();
    server?.kill('SIGTERM');
    if (profile) rmSync(profile, { recursive: true, force: true });
  });

  const cell = (address: string) => page.locator(`#grid-scroll td[data-cell="${address}"]`);

  test('the demo sheet computes its PROTON formulas, under the CSP, with no page errors', async () => {
    await expect(cell('E6').textContent()).resolves.toMatch(/^\d+\.\d\d$/);
    const ph = Number(await cell('E6').textContent());
    expect(ph).toBeGreaterThan(7);
    expect(ph).toBeLessThan(8.5);
    // The whole recipe spills beside it: HEPES free acid for 2 L at 20 mM, 238.3 g/mol → 9.53 g.
    await expect(cell('G6').textContent()).resolves.toBe('recipe');
    expect(Number(await cell('I7').textContent())).toBeCloseTo(9.53, 2);
    // Text runs over empty cells and stops at the first holding a value (the spill's G27), as in Excel.
    const caution = await page.locator('#cell-A27 span.cell-text').boundingBox();
    const stop = await cell('G27').boundingBox();
    expect(caution!.x + caution!.width).toBeLessThanOrEqual(stop!.x);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-demo.png') });
    expect(pageErrors).toEqual([]);
  });

  test('a PROTON formula typed into the grid shows its value', async () => {
    await cell('A30').click();
    await page.fill('#formula-input', '=PROTON.PKA("tris", 1, 25)');
    await page.press('#formula-input', 'Enter');
    const text = await cell('A30').textContent();
    // Tris pKa at 25 °C, I = 0: 8.072 (Goldberg et al. 2002, as in the library); tables give 8.06–8.08.
    expect(Number(text)).toBeGreaterThan(8.05);
    expect(Number(text)).toBeLessThan(8.09);
    await cell('A31').click();
    await page.fill('#formula-input', '=PROTON.GRAMS("no such salt", 10, 100)');
    await page.press('#formula-input', 'Enter');
    await expect(cell('A31').textContent()).resolves.toMatch(/^#(VALUE!|N\/A)$/);
  });

  test('the pane refuses bad input with a message beside the field and writes nothing', async () => {
    const before = await page.locator('#sheet-tabs .tab').count();
    await page.fill('#field-volumeMl', 'a lot');
    await page.click('#build-table');
    await expect(page.locator('#error-volumeMl').textContent()).resolves.toMatch(/must be a number/);
    expect(await page.locator('#field-volumeMl').getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#sheet-tabs .tab').count()).toBe(before);
    await page.fill('#field-volumeMl', '500');
    // A misspelt buffer: the library's nearest names under the field, still nothing written.
    const buffer = await page.inputValue('#field-buffer');
    await page.fill('#field-buffer', 'HEPSE');
    await page.click('#build-table');
    await expect(page.locator('#error-buffer').textContent()).resolves.toMatch(/"HEPSE" is not in the substance library; did you mean .*"HEPES"/);
    expect(await page.locator('#sheet-tabs .tab').count()).toBe(before);
    await page.fill('#field-buffer', buffer);
  });

  test('the pane builds a recipe table on a new sheet whose cells are computed', async () => {
    await page.fill('#field-phStart', '7.2');
    await page.fill('#field-phStop', '7.6');
    await page.fill('#field-phStep', '0.2');
    await page.fill('#field-useTemperaturesC', '4; 25');
    await page.click('#build-table');
    await page.waitForSelector('#pane-status.status-done', { timeout: 30000 });
    const tabs = await page.locator('#sheet-tabs .tab').allTextContents();
    expect(tabs).toHaveLength(2);
    expect(tabs[1]).toMatch(/^HEPES 25 mM pH 7\.2–7\.6$/);
    // First data row is sheet row 21: target pH A21, grams G21, titrant H21, meter K21, pH at use L21.
    expect(await cell('A21').textContent()).toBe('7.20');
    expect(Number(await cell('G21').textContent())).toBeGreaterThan(2);
    expect(await cell('L21').textContent()).toBe('7.20');
    expect(Number(await cell('H21').textContent())).toBeGreaterThan(0);
    expect(Number(await cell('K21').textContent())).toBeGreaterThan(6.5);
    expect(await page.locator('figure.chart').count()).toBe(2);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-recipe-table.png') });
    await page.locator('#pane-root').screenshot({ path: join(ARTIFACTS, 'pane.png') });
    await page.locator('figure.chart').first().scrollIntoViewIfNeeded();
    await page.locator('#grid-scroll').screenshot({ path: join(ARTIFACTS, 'preview-charts.png') });
    expect(pageErrors).toEqual([]);
  });

  test('the bench protocol of the recipe sheet prints on one A4 page (print stylesheet)', async () => {
    await page.evaluate(() => {
      window.print = () => {
        document.body.dataset.printed = 'true';
      };
    });
    await page.click('#print-protocol');
    await page.waitForSelector('body[data-printed="true"]');
    await expect(page.textContent('#print-view h2')).resolves.toMatch(/^Bench protocol, table row \d+: pH /);
    expect(await page.locator('#print-view .print-steps li').count()).toBeGreaterThanOrEqual(4);
    await expect(page.locator('#print-view .print-amounts dt').allTextContents()).resolves.toContain('Form to weigh (g)');
    expect(await page.isVisible('#print-view')).toBe(false);
    await page.emulateMedia({ media: 'print' });
    expect(await page.isVisible('#print-view')).toBe(true);
    expect(await page.isVisible('#grid-scroll')).toBe(false);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-print-protocol.png'), fullPage: true });
    const pdf = await page.pdf({ format: 'A4', preferCSSPageSize: true });
    writeFileSync(join(ARTIFACTS, 'preview-print-protocol.pdf'), pdf);
    const pages = pdf.toString('latin1').match(/\/Type\s*\/Page(?!s)/g) ?? [];
    expect(pages).toHaveLength(1);
    await page.emulateMedia({ media: 'screen' });
  });

  test('the workbook downloads as .xlsx with formulas and their values', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#download-xlsx')]);
    const file = join(ARTIFACTS, 'preview-download.xlsx');
    await download.saveAs(file);
    expect(statSync(file).size).toBeGreaterThan(5000);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(file);
    const names = wb.worksheets.map((w) => w.name);
    expect(names[0]).toBe('North bench prep');
    const e6 = wb.getWorksheet('North bench prep')!.getCell('E6').value as ExcelJS.CellFormulaValue;
    expect(e6.formula).toBe('PROTON.PH.OF(A6:B8, 4)');
    expect(typeof e6.result).toBe('number');
    const recipe = wb.getWorksheet(names[1])!;
    // G21 holds the row's PROTON.RECIPE.ROW formula, written as an array formula over G21:Q21; H21 (titrant mL) holds its cached value.
    const g21 = recipe.getCell('G21').value as ExcelJS.CellFormulaValue & { shareType?: string; ref?: string };
    expect(g21.formula).toMatch(/^PROTON\.RECIPE\.ROW\(/);
    expect(g21.shareType).toBe('array');
    expect(g21.ref).toBe('G21:Q21');
    expect(Number(recipe.getCell('H21').value)).toBeCloseTo(Number(await cell('H21').textContent()), 2);
    expect(recipe.getCell('A21').value).toBe(7.2);
    // The file is named from the workbook's title and names Proton Ledger as its application.
    expect(download.suggestedFilename()).toBe('Proton Ledger workbook.xlsx');
    const zip = new Uint8Array(readFileSync(file));
    const app = Buffer.from(entryData(zip, zipEntries(zip)!.entries.find((e) => e.name === 'docProps/app.xml')!)).toString('utf8');
    expect(app).toContain('<Application>Proton Ledger</Application>');
    expect(app).not.toMatch(/Microsoft/);
    // The table's header row (sheet row 20) is frozen and printed on every page; pages fit the paper's width.
    expect(recipe.views[0]).toMatchObject({ state: 'frozen', ySplit: 20 });
    expect(recipe.pageSetup).toMatchObject({ fitToPage: true, fitToWidth: 1, fitToHeight: 0, printTitlesRow: '20:20' });
    expect(recipe.getCell('A20').alignment).toMatchObject({ wrapText: true });
    // Charts cannot be written: a note row under the sheet says so.
    const notes: string[] = [];
    recipe.eachRow((row) => row.eachCell((c) => typeof c.value === 'string' && c.value.startsWith('Charts in the preview') && notes.push(c.value)));
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatch(/not in this file: the \.xlsx writer cannot write charts/);
  });
});
