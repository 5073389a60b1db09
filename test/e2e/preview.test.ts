/**
 * End to end, in a real browser: the preview page built by webpack, served by
 * scripts/serve.js on a free port, driven by playwright-core in Debian's Chromium (headless).
 * One browser launch; screenshots go to test-artifacts/ (gitignored).
 *
 * Without /usr/bin/chromium the tests are skipped with a message — except under CI=true,
 * where a missing browser is a failure.
 */
import { ChildProcess, spawn } from 'child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import type { BrowserContext, Page } from 'playwright-core';
import ExcelJS from 'exceljs';
import { ensureBuild } from '../support/build';
import { COL, LAYOUT } from '../../src/taskpane/recipeTable';
import { cellAddress } from '../../src/workbook/port';

/** A1 address of a table cell: the first data row plus `offset`, in a COL column. */
const at = (col: number, offset = 0) => cellAddress(LAYOUT.firstDataRow + offset, col);
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
    expect(tabs).toEqual(['North bench prep', 'HEPES 25 mM pH 7.2–7.6', 'Protocol HEPES 25 mM pH 7.2–7.6']);
    expect(await cell(at(COL.targetPh)).textContent()).toBe('7.20');
    expect(Number(await cell(at(COL.formGrams)).textContent())).toBeGreaterThan(2);
    expect(await cell(at(COL.check)).textContent()).toBe('7.20');
    expect(Number(await cell(at(COL.titrantMl)).textContent())).toBeGreaterThan(0);
    expect(Number(await cell(at(COL.meter)).textContent())).toBeGreaterThan(6.5);
    expect(await page.locator('figure.chart').count()).toBe(2);
    // "Form weighed" shows the form the library used, not the text typed ("HEPES").
    expect(await page.locator('#grid-scroll td[data-cell="B7"]').textContent()).toBe('HEPES free acid');
    await page.screenshot({ path: join(ARTIFACTS, 'preview-recipe-table.png') });
    await page.locator('#pane-root').screenshot({ path: join(ARTIFACTS, 'pane.png') });
    await page.locator('figure.chart').first().scrollIntoViewIfNeeded();
    await page.locator('#grid-scroll').screenshot({ path: join(ARTIFACTS, 'preview-charts.png') });
    expect(pageErrors).toEqual([]);
  });

  test('display: chart titles wrap instead of being cut, the band label sits clear of the capacity peak, warnings wrap in their column', async () => {
    const titles = await page.locator('figure.chart p.chart-title').evaluateAll((els) => els.map((e) => ({ scroll: e.scrollWidth, client: e.clientWidth, text: e.textContent })));
    for (const t of titles) expect(t.scroll).toBeLessThanOrEqual(t.client);
    const clear = await page
      .locator('figure.chart')
      .nth(1)
      .evaluate((figure) => {
        const label = figure.querySelector('.chart-band-label') as SVGGraphicsElement;
        const line = figure.querySelector('.chart-line') as SVGPathElement;
        const points = (line.getAttribute('d') ?? '')
          .split(/[ML]/)
          .map((p) => p.trim().split(/\s+/).map(Number))
          .filter((p) => p.length === 2);
        const peak = points.reduce((a, b) => (b[1] < a[1] ? b : a));
        const box = label.getBBox();
        return { peakInside: peak[0] >= box.x && peak[0] <= box.x + box.width && peak[1] >= box.y - 4 && peak[1] <= box.y + box.height + 4, labelY: box.y, peakY: peak[1] };
      });
    expect(clear.peakInside).toBe(false);
    expect(clear.labelY).toBeGreaterThan(clear.peakY);
    // A long warning (the 4 °C rows: a temperature beyond the data of some constants, or none) shows whole in its cell.
    const warnings = await page
      .locator('#grid-scroll td.style-warning span.cell-text')
      .evaluateAll((els) =>
        els.map((e) => ({ h: e.scrollHeight, ch: (e.parentElement as HTMLElement).clientHeight, w: e.scrollWidth, cw: (e.parentElement as HTMLElement).clientWidth })),
      );
    for (const w of warnings) {
      expect(w.w).toBeLessThanOrEqual(w.cw);
      expect(w.h).toBeLessThanOrEqual(w.ch);
    }
  });

  test('the protocol of any row is a live sheet: row 3 on request, its formula over that row', async () => {
    await page.fill('#protocol-row', '3');
    await page.click('#show-protocol');
    await page.waitForSelector('#pane-status.status-done');
    await expect(page.locator('#sheet-tabs .tab.active').textContent()).resolves.toBe('Protocol HEPES 25 mM pH 7.2–7.6');
    expect(await cell('B3').textContent()).toBe('3');
    // Row 3 of the table is pH 7.6 at 4 °C: the protocol's own read-back of the row.
    expect(await cell('B4').textContent()).toBe('7.60');
    expect(await cell('A6').textContent()).toBe('section');
    const steps = await page
      .locator('#grid-scroll td')
      .filter({ hasText: /^step$/ })
      .count();
    expect(steps).toBeGreaterThan(3);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-protocol.png') });
    expect(pageErrors).toEqual([]);
  });

  test('the protocol sheet prints as one A4 page through the print view', async () => {
    await page.click('#record-print-open');
    await page.waitForSelector('#record-print-view .print-paper');
    const paper = await page.locator('#record-print-view .print-paper').boundingBox();
    // One A4 page at 96 px per inch is 1123 px tall; a typical recipe's protocol must not run past it.
    expect(paper!.height).toBeLessThanOrEqual(1123);
    await expect(page.locator('#record-print-view').textContent()).resolves.toMatch(/step/);
    await page.locator('#record-print-view .print-paper').screenshot({ path: join(ARTIFACTS, 'preview-print-protocol.png') });
    await page.click('#record-print-close');
    await expect(page.locator('#record-print-view').count()).resolves.toBe(0);
  });

  test('rows that cannot be made are listed under the form with their code; leaving them out builds the rest', async () => {
    await page.selectOption('#field-phMode', 'list');
    await page.fill('#field-buffer', 'phosphate');
    await page.fill('#field-form', 'KH2PO4');
    await page.fill('#field-titrant', 'HCl');
    await page.fill('#field-phList', '3.5; 6.8');
    await page.fill('#field-useTemperaturesC', '25');
    await page.fill('#field-salts', '');
    const before = await page.locator('#sheet-tabs .tab').count();
    await page.click('#build-table');
    await page.waitForSelector('#unmakeable:not([hidden])');
    const items = page.locator('#unmakeable-list li');
    expect(await items.count()).toBe(1);
    expect(await items.first().getAttribute('data-code')).toBe('unreachablePh');
    expect(await items.first().textContent()).toMatch(/^Row 2: pH 6.8/);
    expect(await page.locator('#sheet-tabs .tab').count()).toBe(before);
    await page.locator('#pane-root').screenshot({ path: join(ARTIFACTS, 'pane-unmakeable.png') });
    await page.click('#drop-rows');
    await page.waitForSelector('#pane-status.status-done');
    expect(await page.locator('#pane-status').textContent()).toMatch(/1 rows that cannot be made were left out/);
    expect(await page.locator('#unmakeable').isHidden()).toBe(true);
    expect(await cell(at(COL.targetPh)).textContent()).toBe('3.50');
  });

  test('a 10× stock table: the stock is titrated and read, then diluted', async () => {
    await page.fill('#field-buffer', 'MES');
    await page.selectOption('#field-route', 'stock');
    await page.fill('#field-form', 'MES free acid');
    await page.fill('#field-titrant', 'NaOH');
    await page.fill('#field-titrantStockM', '10');
    await page.fill('#field-stockFold', '10');
    await page.fill('#field-stockVolumeMl', '100 mL');
    await page.fill('#field-phList', '6.0; 6.2');
    await page.fill('#field-concentrationsMm', '50');
    await page.fill('#field-volumeMl', '1 L');
    await page.click('#build-table');
    await page.waitForSelector('#pane-status.status-done');
    expect(await page.locator('#sheet-tabs .tab.active').textContent()).toBe('MES 50 mM 10x stock pH 6.0–6.2');
    expect(await cell(cellAddress(LAYOUT.tableHeaderRow, COL.meter)).textContent()).toBe('Stock meter reads at bench (pH)');
    expect(await cell(at(COL.stockPerBatchMl)).textContent()).toBe('100.0');
    expect(Number(await cell(at(COL.titrantMl)).textContent())).toBeGreaterThan(0);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-stock-table.png') });
  });

  test('a two-forms table with several salts: acid and base grams, no titrant', async () => {
    await page.fill('#field-buffer', 'phosphate');
    await page.selectOption('#field-route', 'two-forms');
    await page.fill('#field-acidForm', 'sodium phosphate monobasic monohydrate');
    await page.fill('#field-baseForm', 'sodium phosphate dibasic heptahydrate');
    await page.fill('#field-phList', '7.0; 7.4');
    await page.fill('#field-concentrationsMm', '10');
    await page.fill('#field-salts', 'NaCl 137 mM; KCl 2.7 mM');
    await page.click('#build-table');
    await page.waitForSelector('#pane-status.status-done');
    expect(await cell(cellAddress(LAYOUT.tableHeaderRow, COL.formGrams)).textContent()).toBe('Acid form (g)');
    expect(Number(await cell(at(COL.formGrams)).textContent())).toBeGreaterThan(0);
    expect(Number(await cell(at(COL.baseFormGrams)).textContent())).toBeGreaterThan(0);
    expect(await cell('D6').textContent()).toBe('potassium chloride');
    expect(Number(await cell(at(COL.ionicStrength)).textContent())).toBeGreaterThan(140);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-two-forms-table.png') });
  });

  test('a titrated table with three salts and a salt to an ionic strength', async () => {
    await page.fill('#field-buffer', 'HEPES');
    await page.selectOption('#field-route', 'titrate');
    await page.fill('#field-form', 'HEPES');
    await page.fill('#field-titrantStockM', '1');
    await page.fill('#field-phList', '7.4');
    await page.fill('#field-concentrationsMm', '20');
    await page.fill('#field-salts', 'KCl 5 mM; MgCl2·6H2O 1 mM; CaCl2·2H2O 2 mM');
    await page.selectOption('#field-saltTargetGoal', 'ionicStrengthM');
    await page.fill('#field-saltTargetForm', 'NaCl');
    await page.fill('#field-saltTargetValue', '0.16');
    await page.click('#build-table');
    await page.waitForSelector('#pane-status.status-done');
    expect(Number(await cell(at(COL.ionicStrength)).textContent())).toBeCloseTo(160, 0);
    expect(Number(await cell(at(COL.saltTargetGrams)).textContent())).toBeGreaterThan(5);
    expect(await cell('D6').textContent()).toBe('magnesium chloride hexahydrate');
    await page.selectOption('#field-saltTargetGoal', 'none');
  });

  test('the pane can be hidden and shown again', async () => {
    await page.click('#hide-pane');
    await page.waitForSelector('#pane-root', { state: 'hidden' });
    await page.screenshot({ path: join(ARTIFACTS, 'preview-pane-hidden.png') });
    await page.click('#show-pane');
    await page.waitForSelector('#pane-root', { state: 'visible' });
  });

  test('a 656-row table (41 pH × 4 temperatures × 4 concentrations) shows progress, keeps the page answering, and can be stopped', async () => {
    await page.fill('#field-buffer', 'HEPES');
    await page.fill('#field-form', 'HEPES');
    await page.fill('#field-salts', 'NaCl 150 mM');
    await page.selectOption('#field-phMode', 'range');
    await page.fill('#field-phStart', '6.5');
    await page.fill('#field-phStop', '8.5');
    await page.fill('#field-phStep', '0.05');
    await page.fill('#field-useTemperaturesC', '4; 20; 25; 37');
    await page.fill('#field-concentrationsMm', '10; 25; 50; 100');
    // Press Stop as soon as it shows (a state, not a delay): the build stops at its next slice.
    const pressed = page.evaluate(
      () =>
        new Promise<string>((resolve) => {
          const stop = document.getElementById('cancel-build') as HTMLButtonElement;
          const observer = new MutationObserver(() => {
            if (!stop.hidden) {
              observer.disconnect();
              const progress = document.getElementById('build-progress') as HTMLProgressElement;
              stop.click();
              resolve(`${progress.hidden ? 'no progress' : 'progress shown'}`);
            }
          });
          observer.observe(stop, { attributes: true });
        }),
    );
    await page.click('#build-table');
    expect(await pressed).toBe('progress shown');
    await page.waitForSelector('#pane-status.status-error');
    expect(await page.locator('#pane-status').textContent()).toMatch(/^Stopped/);
    // Then the whole table.
    await page.click('#build-table');
    await page.waitForSelector('#pane-status.status-done', { timeout: 120000 });
    expect(await page.locator('#pane-status').textContent()).toMatch(/^Wrote 656 rows/);
    // The grid draws the rows in view: scroll to the end and the last row is drawn, computed.
    await page.locator('#grid-scroll').evaluate((e) => (e.scrollTop = e.scrollHeight));
    await cell(at(COL.check, 655)).waitFor();
    expect(await cell(at(COL.check, 655)).textContent()).toMatch(/^\d\.\d\d$/);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-large-table.png') });
    expect(pageErrors).toEqual([]);
  }, 180000);

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
    // The first result cell holds the row's PROTON.RECIPE.ROW formula, written as an array formula over the row; the titrant cell holds its cached value.
    const first = recipe.getCell(at(COL.formGrams)).value as ExcelJS.CellFormulaValue & { shareType?: string; ref?: string };
    expect(first.formula).toMatch(/^PROTON\.RECIPE\.ROW\(/);
    expect(first.shareType).toBe('array');
    expect(first.ref).toBe(`${at(COL.formGrams)}:${at(COL.warnings)}`);
    expect(typeof recipe.getCell(at(COL.titrantMl)).value).toBe('number');
    expect(recipe.getCell(at(COL.targetPh)).value).toBe(7.2);
    // The file is named from the workbook's title and names Proton Ledger as its application.
    expect(download.suggestedFilename()).toBe('Proton Ledger workbook.xlsx');
    const zip = new Uint8Array(readFileSync(file));
    const app = Buffer.from(
      entryData(
        zip,
        zipEntries(zip)!.entries.find((e) => e.name === 'docProps/app.xml')!,
      ),
    ).toString('utf8');
    expect(app).toContain('<Application>Proton Ledger</Application>');
    expect(app).not.toMatch(/Microsoft/);
    // The table's header row is frozen and printed on every page; pages fit the paper's width.
    const headerRow = LAYOUT.tableHeaderRow + 1;
    expect(recipe.views[0]).toMatchObject({ state: 'frozen', ySplit: headerRow });
    expect(recipe.pageSetup).toMatchObject({ fitToPage: true, fitToWidth: 1, fitToHeight: 0, printTitlesRow: `${headerRow}:${headerRow}` });
    // Charts cannot be written: a note row under the sheet says so.
    const notes: string[] = [];
    recipe.eachRow((row) => row.eachCell((c) => typeof c.value === 'string' && c.value.startsWith('Charts in the preview') && notes.push(c.value)));
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatch(/not in this file: the \.xlsx writer cannot write charts/);
  });

  test('the pane plans a mix from a stock shelf typed into the sheet ("from stocks")', async () => {
    await page.locator('#sheet-tabs .tab').first().click();
    // Our shelf, typed as a user would: a titrated tris stock and a plain saline stock.
    const shelf = [
      ['Tris-HCl 1 M pH 8.0', 'tris base', '1 M', 'HCl', '8', '25'],
      ['NaCl 5 M', 'NaCl', '5', '', '', ''],
    ];
    for (const [r, row] of shelf.entries()) {
      for (const [c, value] of row.entries()) {
        if (value === '') continue;
        await cell(`${'ABCDEF'[c]}${33 + r}`).click();
        await page.fill('#formula-input', value);
        await page.press('#formula-input', 'Enter');
      }
    }
    await page.fill('#mix-shelf', "'North bench prep'!A33:F34");
    await page.fill('#mix-targets', 'tris 20 mM; NaCl 150 mM');
    await page.fill('#mix-volumeMl', '50');
    await page.fill('#mix-useTemperatureC', '4');
    await page.click('#build-mix');
    await page.waitForSelector('#mix-status.status-done', { timeout: 30000 });
    await expect(page.locator('#mix-status').textContent()).resolves.toMatch(/^Wrote the mix to the new sheet "Mix 50 mL at 4 °C": pH 8\.\d\d at 4 °C\.$/);
    // Targets in A10:B11, the MIX.VOLUMES spill from A13: 1 mL of the tris stock, 1.5 mL of the saline.
    await expect(cell('A14').textContent()).resolves.toBe('Tris-HCl 1 M pH 8.0');
    expect(Number(await cell('B14').textContent())).toBeCloseTo(1, 6);
    expect(Number(await cell('B15').textContent())).toBeCloseTo(1.5, 6);
    await page.locator('#pane-root').screenshot({ path: join(ARTIFACTS, 'pane-mix.png') });
    expect(pageErrors).toEqual([]);
  });
});
