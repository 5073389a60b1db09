/**
 * The pane's "from stocks" mode without a browser: a shelf on one sheet, targets typed in
 * the form, a new sheet whose MIX.VOLUMES formula computes in the preview workbook to the
 * core's plan; bad input writes nothing and names the field. Our own shelf.
 */
import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { PreviewWorkbook } from '../../src/preview/workbook';
import { MIX_LAYOUT, buildMixSheet, defaultMixForm, readTargets } from '../../src/taskpane/mixSheet';
import { PreviewAdapter } from '../../src/workbook/previewAdapter';

const SHELF = [
  ['name', 'form', 'concentration', 'titrant', 'pH', 'pH at °C'],
  ['Tris-HCl 1 M pH 8.0', 'tris base', '1 M', 'HCl', 8, 25],
  ['NaCl 5 M', 'NaCl', 5, null, null, null],
  ['EDTA 0.5 M pH 8.0', 'Na2EDTA·2H2O', '500 mM', 'NaOH', 8, null],
];

function setup() {
  const book = new PreviewWorkbook(createFormulaEngine({ 'Stock shelf': SHELF }));
  let active = 'Stock shelf';
  const port = new PreviewAdapter(
    book,
    () => ({ sheet: active, range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }),
    (s) => (active = s),
  );
  return { book, port, active: () => active };
}

const NOW = new Date('2026-03-02T09:30:00Z');

describe('mix sheet from the pane', () => {
  test('reads targets as "component amount" items, mM by default, % for additives', () => {
    expect(readTargets('tris 20 mM; NaCl 150; glycerol 10 %; EDTA 0,5')).toEqual([
      { component: 'tris', concentrationMm: '20 mM' },
      { component: 'NaCl', concentrationMm: '150' },
      { component: 'glycerol', percent: '10 %' },
      { component: 'EDTA', concentrationMm: '0,5' },
    ]);
  });

  test('writes a new sheet whose live MIX.VOLUMES formula gives the plan’s volumes and pH', async () => {
    const { book, port, active } = setup();
    const result = await buildMixSheet(port, { ...defaultMixForm(), shelf: "'Stock shelf'!A1:F4" }, NOW);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(active()).toBe(result.sheet);
    expect(result.sheet).toBe('Mix 50 mL at 4 °C');
    const tableRow = MIX_LAYOUT.firstTargetRow + 3 + 1;
    const v = (row: number, col: number) => book.value(result.sheet, row, col);
    expect(v(tableRow, 0)).toBe('item');
    expect(v(tableRow + 1, 0)).toBe('Tris-HCl 1 M pH 8.0');
    expect(v(tableRow + 1, 1)).toBe(1);
    expect(v(tableRow + 2, 1)).toBe(1.5);
    expect(v(tableRow + 3, 1)).toBe(0.1);
    expect(Math.abs((v(tableRow + 6, 1) as number) - result.plan.predictions.pHAtUse)).toBeLessThan(1e-12);
    // The label shift and the warning are written as notes below.
    const notes = Array.from({ length: 30 }, (_, i) => book.value(result.sheet, tableRow + 8 + i, 0)).filter((x) => typeof x === 'string') as string[];
    expect(notes.some((n) => n.startsWith('Label of Tris-HCl 1 M pH 8.0: pH 8.00 at 25 °C'))).toBe(true);
    expect(notes.some((n) => n.startsWith('The mixture reads pH'))).toBe(true);
  });

  test('refuses a shelf that is no range, a missing sheet and an unknown component, writing nothing', async () => {
    const { book, port } = setup();
    const form = { ...defaultMixForm(), shelf: "'Stock shelf'!A1:F4" };
    expect(await buildMixSheet(port, { ...form, shelf: 'the shelf' })).toMatchObject({ ok: false, errors: { shelf: expect.stringMatching(/^Give the range/) } });
    expect(await buildMixSheet(port, { ...form, shelf: "'Old shelf'!A1:F4" })).toMatchObject({ ok: false, errors: { shelf: expect.stringMatching(/no sheet named "Old shelf"/) } });
    expect(await buildMixSheet(port, { ...form, targets: 'MOPS 20 mM' })).toMatchObject({
      ok: false,
      errors: { targets: expect.stringMatching(/no stock on the shelf holds "MOPS"/) },
    });
    expect(await buildMixSheet(port, { ...form, targets: 'NaCl 4000 mM; tris 900 mM' })).toMatchObject({
      ok: false,
      errors: { targets: expect.stringMatching(/^The stocks do not fit/) },
    });
    expect(book.sheetNames()).toEqual(['Stock shelf']);
  });
});
