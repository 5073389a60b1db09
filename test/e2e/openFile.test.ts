/**
 * Opening files in the preview, in Chromium: a workbook as Excel saves PROTON formulas
 * (`_xldudf_` names, upper-case exponents, doubled quotes) computes live; a downloaded
 * workbook opened again computes the same values; a file past the limits is refused
 * with the reason, and the workbook in the page stays.
 */
import { writeFileSync } from 'fs';
import { join } from 'path';
import ExcelJS from 'exceljs';
import type { Page } from 'playwright-core';
import { ARTIFACTS, describeBrowser, openPreview, PreviewSession } from '../support/previewBrowser';

describeBrowser('opening files in the preview (Chromium)', () => {
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
  const open = async (file: string, outcome: 'done' | 'refused') => {
    page.once('dialog', (d) => void d.accept());
    await page.setInputFiles('#open-file-input', file);
    await page.waitForSelector(`body[data-opened="${outcome}"]`, { timeout: 60000 });
  };

  test('a downloaded workbook, opened again, computes the same values (round trip)', async () => {
    const addresses = ['E6', 'E7', 'E8', 'E9', 'E10', 'E14', 'E15', 'E21', 'E22', 'E23', 'I7', 'H8', 'G6'];
    const before = await Promise.all(addresses.map((a) => cell(a).textContent()));
    expect(before.every((t) => t !== '' && !t!.startsWith('#'))).toBe(true);
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#download-xlsx')]);
    const file = join(ARTIFACTS, 'round-trip.xlsx');
    await download.saveAs(file);
    await cell('A30').click();
    await page.fill('#formula-input', 'changed before opening');
    await page.press('#formula-input', 'Enter');
    await open(file, 'done');
    expect(await page.locator('#sheet-tabs .tab').allTextContents()).toEqual(['North bench prep']);
    expect(await Promise.all(addresses.map((a) => cell(a).textContent()))).toEqual(before);
    expect(await cell('A30').textContent()).toBe('');
    await cell('E6').click();
    expect(await page.inputValue('#formula-input')).toBe('=PROTON.PH.OF(A6:B8, 4)');
    expect(await page.inputValue('#workbook-title')).toBe('round-trip');
    expect(session.pageErrors).toEqual([]);
  });

  test("PROTON formulas as Excel saves them are live; Excel's exponent and doubled quotes are read", async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Saved by Excel');
    ws.getCell('A1').value = 'tris pKa at 25 °C';
    ws.getCell('B1').value = { formula: '_xldudf_PROTON_PKA("tris",1,25)', result: 0 } as ExcelJS.CellFormulaValue;
    ws.getCell('B2').value = { formula: '\'Other add-in.xlam\'!_xldudf_PROTON_PKA("tris",1,4)', result: 0 } as ExcelJS.CellFormulaValue;
    ws.getCell('B3').value = { formula: '6.022E+23/1E+23', result: 0 } as ExcelJS.CellFormulaValue;
    ws.getCell('B4').value = { formula: 'LEN("a""b")', result: 0 } as ExcelJS.CellFormulaValue;
    ws.getCell('B5').value = '=not a formula';
    const file = join(ARTIFACTS, 'saved-by-excel.xlsx');
    await wb.xlsx.writeFile(file);
    await open(file, 'done');
    // Tris pKa at 25 °C, I = 0: 8.072 (Goldberg et al. 2002, the library's value).
    expect(Number(await cell('B1').textContent())).toBeCloseTo(8.072, 2);
    expect(Number(await cell('B2').textContent())).toBeGreaterThan(8.5);
    expect(await cell('B3').textContent()).toBe('6.022');
    expect(await cell('B4').textContent()).toBe('3');
    expect(await cell('B5').textContent()).toBe('=not a formula');
    await cell('B1').click();
    expect(await page.inputValue('#formula-input')).toBe('=PROTON.PKA("tris",1,25)');
    await page.screenshot({ path: join(ARTIFACTS, 'preview-opened-excel-forms.png') });
  });

  test('a CSV file with a formula nested past the limit is refused with the cell and the reason; the workbook stays', async () => {
    const file = join(ARTIFACTS, 'too-deep.csv');
    writeFileSync(file, `name,value\r\ndeep,"=${'('.repeat(80)}1${')'.repeat(80)}"\r\n`);
    await open(file, 'refused');
    expect(await page.textContent('#page-status')).toBe('"too-deep.csv" was not opened: B2 of the CSV file: a formula nested 80 levels deep; a formula may nest up to 64 levels.');
    expect(await page.locator('#sheet-tabs .tab').allTextContents()).toEqual(['Saved by Excel']);
    const ok = join(ARTIFACTS, 'doses.csv');
    writeFileSync(ok, 'buffer,mM\r\ntris,50\r\n,=B2*2\r\n');
    await open(ok, 'done');
    expect(await page.locator('#sheet-tabs .tab').allTextContents()).toEqual(['doses']);
    expect(await cell('B3').textContent()).toBe('100');
  });
});
