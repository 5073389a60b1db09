import { asMade, benchCorrection, plannedAsWeighed } from '../../src/chem/batch';
import { planRecipe, RecipeInput } from '../../src/chem/planner';
import { AS_MADE_ROWS } from '../../src/functions/batch';
import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { PreviewWorkbook } from '../../src/preview/workbook';
import { batchRecordLayout, writeBatchRecord } from '../../src/workbook/batchRecord';
import { PreviewAdapter } from '../../src/workbook/previewAdapter';

/** Our own cold-room tris saline: 50 mM tris, pH 7.5 at 4 °C, 500 mL, adjusted at 22 °C with 1 M HCl. */
const INPUT: RecipeInput = {
  buffer: 'tris',
  targetPh: 7.5,
  useTemperatureC: 4,
  benchTemperatureC: 22,
  concentrationMm: 50,
  volumeMl: 500,
  form: 'tris base',
  titrant: { form: 'HCl', concentrationM: 1 },
  salts: [{ form: 'NaCl', concentrationMm: 150 }],
};
const plan = planRecipe(INPUT);

async function record() {
  const book = new PreviewWorkbook(createFormulaEngine({ Sheet1: [] }));
  const port = new PreviewAdapter(
    book,
    () => ({ sheet: 'Sheet1', range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }),
    () => undefined,
  );
  const sheet = await writeBatchRecord(port, INPUT, plan, 'test');
  const layout = batchRecordLayout(INPUT, plan, 'test');
  const set = (at: { row: number; col: number }, value: number) => book.setContents(sheet, at.row, at.col, [[value]]);
  const verdict = () => {
    const { row, col } = layout.checkAt;
    for (let r = row; r < row + AS_MADE_ROWS; r++) if (book.value(sheet, r, col) === 'batch') return book.value(sheet, r, col + 5);
    const first = book.value(sheet, row, col);
    return first !== null && typeof first === 'object' ? first.error : first;
  };
  return { book, sheet, layout, set, verdict };
}

describe('batch record sheet (written through the port, computed by the formula engine)', () => {
  it('prints on one page: the print area is the six record columns and fits a portrait page of about 75 rows', () => {
    const layout = batchRecordLayout(INPUT, plan);
    expect(layout.printArea.colCount).toBe(6);
    expect(layout.printArea.rowCount).toBeLessThanOrEqual(80);
  });

  it('shows the check INCOMPLETE until the amounts are entered, then PASS with the planned amounts, then FAIL with a short weighing', async () => {
    const { set, verdict, layout, book, sheet } = await record();
    expect(verdict()).toBe('INCOMPLETE');
    const weighed = plannedAsWeighed(plan);
    layout.inputs.grams.forEach((g, i) => set(g.at, weighed[i].grams as number));
    set(layout.inputs.titrantMl!, plan.titration!.volumeMl);
    expect(verdict()).toBe('PASS');
    set(layout.inputs.grams[0].at, (weighed[0].grams as number) * 0.9);
    expect(verdict()).toBe('FAIL');
    // The same as the core's check of the same numbers.
    const core = asMade(plan, { weighed: [{ ...weighed[0], grams: (weighed[0].grams as number) * 0.9 }, weighed[1]], titrantMl: plan.titration!.volumeMl });
    expect(core.pass).toBe(false);
    // The final pH line stays blank until a pH is entered.
    expect(book.value(sheet, layout.inputs.finalPh.row, 5)).toBe('');
  });

  it("says what to add next while the pH is adjusted: waits until the titrant so far and the reading are entered, then gives the core's correction at the bench temperature entered", async () => {
    const { set, layout, book, sheet } = await record();
    const at = layout.inputs.adjusting!;
    const row = () => [0, 1, 2, 3, 4, 5].map((c) => book.value(sheet, at.nextAt.row, at.nextAt.col + c));
    expect(row()[0]).toBe('waiting for a reading');
    expect(Math.abs((row()[3] as number) - plan.meter.pH)).toBeLessThan(1e-12);
    set(at.titrantAddedMl, 15);
    expect(row()[0]).toBe('waiting for a reading');
    set(at.readingPh, 7.6);
    set(layout.inputs.benchTemperatureC, 21);
    const core = benchCorrection(plan, { titrantMl: 15, readingPh: 7.6, temperatureC: 21 });
    expect(row()[0]).toBe('1 M hydrochloric acid');
    expect(Math.abs((row()[1] as number) - core.nextMl)).toBeLessThan(1e-9);
    expect(Math.abs((row()[2] as number) - core.firstPortionMl)).toBeLessThan(1e-9);
    expect(Math.abs((row()[3] as number) - core.endPointPh)).toBeLessThan(1e-9);
  });

  it('a measured final pH outside the tolerance fails its own line and the batch; a wider tolerance passes both', async () => {
    const { set, verdict, layout, book, sheet } = await record();
    const weighed = plannedAsWeighed(plan);
    layout.inputs.grams.forEach((g, i) => set(g.at, weighed[i].grams as number));
    set(layout.inputs.titrantMl!, plan.titration!.volumeMl);
    set(layout.inputs.finalPh, 7.58);
    const line = () => book.value(sheet, layout.inputs.finalPh.row, 5);
    expect([line(), verdict()]).toEqual(['FAIL', 'FAIL']);
    set(layout.inputs.tolerancePh, 0.1);
    expect([line(), verdict()]).toEqual(['PASS', 'PASS']);
  });
});
