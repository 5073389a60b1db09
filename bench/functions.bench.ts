/**
 * Worksheet-function benchmarks (not tests): a 10,000-cell what-if grid (100 target pH ×
 * 100 temperatures of TITRANT.ML) through the function layer and through the formula
 * engine, and the size of the Excel functions bundle when it has been built.
 *
 *   npx tsx bench/functions.bench.ts      (npm run bench:functions)
 *
 * Targets: ≤ 25 ms for the grid through the function layer in Node; ≤ 100 KB minified
 * for dist/functions.js.
 */
import { existsSync, statSync, readFileSync } from 'fs';
import { join } from 'path';
import { gzipSync } from 'zlib';
import { titrantMl } from '../src/functions/functions';
import { clearCallCache } from '../src/functions/memo';
import { createFormulaEngine } from '../src/functions/formulaEngine';

const TARGETS = Array.from({ length: 100 }, (_, i) => 7 + i * 0.02);
const TEMPERATURES = Array.from({ length: 100 }, (_, j) => j * 0.5);
const GRID_TARGET_MS = 25;
const BUNDLE_TARGET_KB = 100;

function grid(): number {
  let sum = 0;
  for (const target of TARGETS) for (const t of TEMPERATURES) sum += titrantMl('tris base', 50, 1000, target, 'HCl', 1, t);
  return sum;
}

function time<T>(run: () => T): { ms: number; value: T } {
  const start = performance.now();
  const value = run();
  return { ms: performance.now() - start, value };
}

// Function layer: first a warm-up grid (JIT), then cold-cache grids (every cell computed), then a warm-cache one (memo hits).
clearCallCache();
grid();
const cold: number[] = [];
for (let k = 0; k < 5; k++) {
  clearCallCache();
  cold.push(time(grid).ms);
}
const warm = time(grid).ms;
const best = Math.min(...cold);
console.log(
  `function layer, 10,000 cells, every cell computed: best ${best.toFixed(1)} ms, median ${cold.sort((a, b) => a - b)[2].toFixed(1)} ms (target ≤ ${GRID_TARGET_MS} ms: ${best <= GRID_TARGET_MS ? 'met' : 'NOT met'})`,
);
console.log(`function layer, 10,000 cells, recalculated (every cell a memo hit): ${warm.toFixed(1)} ms`);

// Formula engine: build and evaluate a sheet of 10,000 formula cells.
const letter = (c: number) => (c < 26 ? String.fromCharCode(65 + c) : String.fromCharCode(64 + Math.floor(c / 26)) + String.fromCharCode(65 + (c % 26)));
const rows: unknown[][] = [[null, ...TEMPERATURES]];
TARGETS.forEach((target, i) => rows.push([target, ...TEMPERATURES.map((_, j) => `=PROTON.TITRANT.ML("tris base", 50, 1000, $A${i + 2}, "HCl", 1, ${letter(j + 1)}$1)`)]));
clearCallCache();
createFormulaEngine({ Warm: [['tris base', 1, '=PROTON.PH.OF(A1:B1)']] }).destroy();
const engine = time(() => createFormulaEngine({ Grid: rows }));
const values = engine.value.getSheetValues(0);
const errors = values.flat().filter((v) => typeof v === 'object' && v !== null).length;
console.log(`formula engine, 10,000 formula cells, build + evaluate: ${engine.ms.toFixed(0)} ms (${errors} error cells)`);
const edit = time(() => engine.value.setCellContents({ sheet: 0, row: 0, col: 1 }, 1));
console.log(`formula engine, change one temperature (100 cells recalculated): ${edit.ms.toFixed(1)} ms`);
engine.value.destroy();

// Bundle size: the webpack side builds dist/functions.js.
const bundle = join(process.cwd(), 'dist/functions.js');
if (existsSync(bundle)) {
  const kb = statSync(bundle).size / 1024;
  console.log(
    `dist/functions.js: ${kb.toFixed(1)} KB minified, ${(gzipSync(readFileSync(bundle)).length / 1024).toFixed(1)} KB gzipped (target ≤ ${BUNDLE_TARGET_KB} KB: ${kb <= BUNDLE_TARGET_KB ? 'met' : 'NOT met'})`,
  );
} else {
  console.log('dist/functions.js not found: build it with the webpack config (npm run build) to measure the bundle size.');
}
