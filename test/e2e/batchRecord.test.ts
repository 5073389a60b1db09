/**
 * End to end, in a real browser: a batch record created from the pane in the preview page,
 * filled in cell by cell, its live check moving from INCOMPLETE to PASS to FAIL; then the
 * print view, screenshotted to test-artifacts/ (look at it). Same server and browser set-up
 * as preview.test.ts; skipped without /usr/bin/chromium (except under CI=true).
 */
import { ChildProcess, spawn } from 'child_process';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import type { BrowserContext, Page } from 'playwright-core';
import { plannedAsWeighed } from '../../src/chem/batch';
import { RecipeInput, planRecipe } from '../../src/chem/planner';
import { batchRecordLayout } from '../../src/workbook/batchRecord';
import { cellAddress } from '../../src/workbook/port';
import { ensureBuild } from '../support/build';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const ROOT = join(__dirname, '..', '..');
const ARTIFACTS = join(ROOT, 'test-artifacts');
const haveBrowser = existsSync(CHROMIUM);
const inCi = process.env.CI === 'true' || process.env.CI === '1';
const describeBrowser = haveBrowser || inCi ? describe : describe.skip;

/** Our own cold-room tris saline, as typed into the pane's Batch record box. */
const TYPED: Record<string, string> = {
  buffer: 'tris',
  targetPh: '7.5',
  concentrationMm: '50',
  volumeMl: '500',
  useTemperatureC: '4',
  form: 'tris base',
  'titrant.form': 'HCl',
  'titrant.concentrationM': '1',
  benchTemperatureC: '22',
  salts: 'NaCl 150 mM',
};
const INPUT = {
  buffer: 'tris',
  targetPh: '7.5',
  concentrationMm: '50',
  volumeMl: '500',
  useTemperatureC: '4',
  form: 'tris base',
  titrant: { form: 'HCl', concentrationM: '1' },
  benchTemperatureC: '22',
  salts: 'NaCl 150 mM',
} as RecipeInput;

describeBrowser('batch record in the preview (Chromium)', () => {
  let server: ChildProcess;
  let context: BrowserContext;
  let page: Page;
  let profile = '';
  const pageErrors: string[] = [];

  beforeAll(async () => {
    if (!haveBrowser) throw new Error(`CI=true and no Chromium at ${CHROMIUM}.`);
    ensureBuild();
    mkdirSync(ARTIFACTS, { recursive: true });
    server = spawn(process.execPath, [join(ROOT, 'scripts', 'serve.js'), '--port', '0', '--no-open', '--no-pid-file'], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
    const baseUrl = await new Promise<string>((resolve, reject) => {
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
    profile = mkdtempSync(join(tmpdir(), 'proton-e2e-record-'));
    context = await chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
      viewport: { width: 1440, height: 900 },
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

  const cell = (at: { row: number; col: number }) => page.locator(`#grid-scroll td[data-cell="${cellAddress(at.row, at.col)}"]`);
  const type = async (at: { row: number; col: number }, value: string) => {
    await cell(at).click();
    await page.fill('#formula-input', value);
    await page.press('#formula-input', 'Enter');
  };
  /** Waits until the check's verdict (column F of its `batch` row) reads `verdict`. */
  const verdictIs = (checkRow: number, verdict: string) =>
    page.waitForFunction(
      ({ row, want }) => {
        for (let r = row + 1; r <= row + 24; r++) {
          if (document.querySelector(`#grid-scroll td[data-cell="A${r}"]`)?.textContent === 'batch')
            return document.querySelector(`#grid-scroll td[data-cell="F${r}"]`)?.textContent === want;
        }
        return false;
      },
      { row: checkRow, want: verdict },
      { timeout: 15000 },
    );

  test('the pane writes a batch record; filling it moves its check from INCOMPLETE to PASS to FAIL; the print view is one page', async () => {
    for (const [name, value] of Object.entries(TYPED)) await page.fill(`#record-${name.replace('.', '-')}`, value);
    await page.click('#batch-record-create');
    await page.waitForSelector('#batch-record-status.status-done', { timeout: 20000 });
    const plan = planRecipe(INPUT);
    const layout = batchRecordLayout(INPUT, plan);
    await verdictIs(layout.checkAt.row, 'INCOMPLETE');

    const weighed = plannedAsWeighed(plan);
    for (const [i, g] of layout.inputs.grams.entries()) await type(g.at, (weighed[i].grams as number).toFixed(4));
    await type(layout.inputs.titrantMl!, plan.titration!.volumeMl.toFixed(3));
    await verdictIs(layout.checkAt.row, 'PASS');
    await type(layout.inputs.finalPh, '7.52');
    await expect(cell({ row: layout.inputs.finalPh.row, col: 5 }).textContent()).resolves.toBe('PASS');
    await page.screenshot({ path: join(ARTIFACTS, 'batch-record-pass.png') });

    // 10 % short on tris: the amount and the pH at use fail, and the batch with them.
    await type(layout.inputs.grams[0].at, ((weighed[0].grams as number) * 0.9).toFixed(4));
    await verdictIs(layout.checkAt.row, 'FAIL');

    // A page taller than one A4 sheet, so the whole print view is on screen for its screenshot.
    await page.setViewportSize({ width: 1440, height: 1300 });
    await page.click('#record-print-open');
    await page.waitForSelector('#record-print-view .print-paper');
    const paper = await page.locator('#record-print-view .print-paper').boundingBox();
    // One A4 page at 96 px per inch is 1123 px tall; the record must not run past it.
    expect(paper!.height).toBeLessThanOrEqual(1123);
    expect(await page.locator('#record-print-view').textContent()).toContain('FAIL');
    await page.locator('#record-print-view .print-paper').screenshot({ path: join(ARTIFACTS, 'batch-record-print.png') });
    await page.click('#record-print-close');
    await expect(page.locator('#record-print-view').count()).resolves.toBe(0);
    expect(pageErrors).toEqual([]);
  }, 120000);
});
