/**
 * The preview as a workspace, in Chromium: the workbook is kept in the browser's storage
 * and comes back on reload, "New workbook" asks first, and a storage failure is shown.
 * The restore time of a 656-row recipe table goes to test-artifacts/restore-time.txt.
 */
import { writeFileSync } from 'fs';
import { join } from 'path';
import type { Page } from 'playwright-core';
import { ARTIFACTS, describeBrowser, openPreview, PreviewSession } from '../support/previewBrowser';
import { COL, LAYOUT } from '../../src/taskpane/recipeTable';
import { cellAddress } from '../../src/workbook/port';

/** The last of the 656 table rows, as an A1 row number. */
const LAST_ROW = LAYOUT.firstDataRow + 656;
/** That row's grams of the form and titrant mL. */
const GRAMS = cellAddress(LAST_ROW - 1, COL.formGrams);
const TITRANT = cellAddress(LAST_ROW - 1, COL.titrantMl);

/** Scrolls the grid to its end and waits until a cell of the last table row is drawn (the grid draws the rows in view). */
async function showLastRow(page: Page): Promise<void> {
  await page.evaluate(() => {
    const s = document.querySelector('#grid-scroll') as HTMLElement;
    s.scrollTop = s.scrollHeight;
  });
  await page.waitForSelector(`#grid-scroll td[data-cell="A${LAST_ROW}"]`);
}

describeBrowser('the preview keeps the work (Chromium)', () => {
  let session: PreviewSession;
  let page: Page;

  beforeAll(async () => {
    session = await openPreview();
    page = session.page;
  }, 240000);

  afterAll(async () => {
    await session?.close();
  });

  const cell = (address: string) => page.locator(`#grid-scroll td[data-cell="${address}"]`);
  const saved = () => page.waitForSelector('body[data-save-state="saved"]', { timeout: 60000 });
  const reload = async () => {
    await page.reload();
    await page.waitForSelector('body[data-ready="true"]', { timeout: 120000 });
  };

  test('an edit and the title come back after a reload', async () => {
    await cell('A30').click();
    await page.fill('#formula-input', '=PROTON.PKA("tris", 1, 25)');
    await page.press('#formula-input', 'Enter');
    const pka = await cell('A30').textContent();
    await page.fill('#workbook-title', 'Cold room buffers');
    await page.press('#workbook-title', 'Enter');
    await saved();
    await reload();
    expect(await page.getAttribute('body', 'data-restored')).toBe('true');
    expect(await cell('A30').textContent()).toBe(pka);
    expect(await page.inputValue('#workbook-title')).toBe('Cold room buffers');
    await cell('A30').click();
    expect(await page.inputValue('#formula-input')).toBe('=PROTON.PKA("tris", 1, 25)');
    expect(session.pageErrors).toEqual([]);
  });

  test('a storage failure is shown in the page, not swallowed', async () => {
    await page.evaluate(() => {
      (window as unknown as { realSetItem: unknown }).realSetItem = Storage.prototype.setItem;
      Storage.prototype.setItem = function () {
        throw new DOMException('full', 'QuotaExceededError');
      };
    });
    await cell('B30').click();
    await page.fill('#formula-input', '42');
    await page.press('#formula-input', 'Enter');
    await page.waitForSelector('body[data-save-state="failed"]', { timeout: 60000 });
    expect(await page.textContent('#save-status')).toMatch(/Not saved: the browser’s storage for this page is full\. Download the workbook/);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-storage-full.png') });
    await page.evaluate(() => {
      Storage.prototype.setItem = (window as unknown as { realSetItem: Storage['setItem'] }).realSetItem;
    });
    await cell('C30').click();
    await page.fill('#formula-input', '43');
    await page.press('#formula-input', 'Enter');
    await saved();
  });

  test('"New workbook" asks first; declined, nothing changes; accepted, one empty sheet', async () => {
    page.once('dialog', (d) => void d.dismiss());
    await page.click('#new-workbook');
    expect(await cell('B30').textContent()).toBe('42');
    page.once('dialog', (d) => void d.accept());
    await page.click('#new-workbook');
    await expect(page.locator('#sheet-tabs .tab').allTextContents()).resolves.toEqual(['Sheet1']);
    expect(await cell('A1').textContent()).toBe('');
    await saved();
    await reload();
    await expect(page.locator('#sheet-tabs .tab').allTextContents()).resolves.toEqual(['Sheet1']);
  });

  test('a 656-row recipe table (41 pH × 4 temperatures × 4 concentrations) comes back on reload; its restore time is recorded', async () => {
    await page.fill('#field-phStart', '6.8');
    await page.fill('#field-phStop', '8.8');
    await page.fill('#field-phStep', '0.05');
    await page.fill('#field-useTemperaturesC', '4; 20; 25; 37');
    await page.fill('#field-concentrationsMm', '10; 25; 50; 100');
    await page.click('#build-table');
    await page.waitForSelector('#pane-status.status-done', { timeout: 300000 });
    const tabs = await page.locator('#sheet-tabs .tab').allTextContents();
    // The demo sheet, the table and its live protocol sheet.
    expect(tabs).toHaveLength(3);
    await showLastRow(page);
    const lastPh = await cell(`A${LAST_ROW}`).textContent();
    const grams = await cell(GRAMS).textContent();
    const titrant = await cell(TITRANT).textContent();
    expect(lastPh).toBe('8.80');
    expect(Number(grams)).toBeGreaterThan(0);
    await saved();
    const bytes = await page.evaluate(() => localStorage.getItem('proton-ledger.preview.workbook')!.length);
    const times: number[] = [];
    for (let i = 0; i < 3; i++) {
      await reload();
      times.push(Number(await page.getAttribute('body', 'data-restore-ms')));
    }
    await page.locator('#sheet-tabs .tab').nth(1).click();
    await showLastRow(page);
    expect(await cell(`A${LAST_ROW}`).textContent()).toBe(lastPh);
    expect(await cell(GRAMS).textContent()).toBe(grams);
    expect(await cell(TITRANT).textContent()).toBe(titrant);
    await page.screenshot({ path: join(ARTIFACTS, 'preview-restored-656.png') });
    const note = [
      'Restore on reload of the preview workbook holding a 656-row recipe table',
      '(HEPES, pH 6.8–8.8 by 0.05, 4; 20; 25; 37 °C, 10; 25; 50; 100 mM), measured in the page',
      '(read from localStorage, rebuild the engine and compute every formula, draw the grid):',
      `saved size: ${bytes} characters`,
      `restore times, ms: ${times.join(', ')} (median ${[...times].sort((a, b) => a - b)[1]})`,
      `machine: ${process.platform}, ${require('os').cpus().length} cores, load average ${require('os')
        .loadavg()
        .map((l: number) => l.toFixed(1))
        .join(' ')}`,
      '',
    ].join('\n');
    writeFileSync(join(ARTIFACTS, 'restore-time.txt'), note);
    console.log(note);
    expect(session.pageErrors).toEqual([]);
  }, 600000);
});
