/**
 * Builds the large recipe table of issue 17 in the preview workbook (HyperFormula with the
 * PROTON functions, as the preview page runs it, here in Node): 41 pH × 4 temperatures × 4
 * concentrations = 656 rows. Prints the whole build time, the longest single step between
 * two yields (what a page would freeze for), and the time of one settings edit.
 *
 * Run: npx tsx bench/recipeTable.bench.ts
 */
import { createFormulaEngine } from '../src/functions/formulaEngine';
import { PreviewWorkbook } from '../src/preview/workbook';
import { defaultInput } from '../src/taskpane/form';
import { SETTING_VALUE_COL, settingRow } from '../src/taskpane/recipeTable';
import { buildRecipeTable } from '../src/taskpane/writer';
import { PreviewAdapter } from '../src/workbook/previewAdapter';

async function main(): Promise<void> {
  const book = new PreviewWorkbook(createFormulaEngine({ Notes: [['our own notes']] }));
  let active = 'Notes';
  const port = new PreviewAdapter(
    book,
    () => ({ sheet: active, range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }),
    (s) => (active = s),
  );
  const input = { ...defaultInput(), phMode: 'range', phStart: '6.0', phStop: '8.0', phStep: '0.05', useTemperaturesC: '4; 20; 25; 37', concentrationsMm: '10; 25; 50; 100' };
  let longestMs = 0;
  let last = performance.now();
  const t0 = performance.now();
  const result = await buildRecipeTable(port, input, {
    version: 'bench',
    onProgress: () => {
      const now = performance.now();
      longestMs = Math.max(longestMs, now - last);
      last = now;
    },
  });
  const totalMs = performance.now() - t0;
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  const t1 = performance.now();
  book.setContents(result.sheet, settingRow('Bench temp. (°C)'), SETTING_VALUE_COL, [[21]]);
  const editMs = performance.now() - t1;
  console.log(
    `recipe table, ${result.rows} rows: build ${(totalMs / 1000).toFixed(2)} s, longest step between progress reports ${longestMs.toFixed(0)} ms, one settings edit ${(editMs / 1000).toFixed(2)} s`,
  );
}

void main();
