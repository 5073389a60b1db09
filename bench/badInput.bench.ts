/**
 * Bad input, timed: every case must come back with a clear error (never an uncaught
 * exception), and none may take more than 50 ms. Prints each case's time and message and
 * the slowest; exits 1 if a case escapes as a plain exception or breaks the 50 ms bound.
 *
 * Run: npm run bench:bad-input
 */
import { ChemError, speciate } from '../src/chem';
import { RecipeInput, planRecipe } from '../src/chem/planner';
import { clearCallCache } from '../src/functions/memo';
import { forms, grams, ph, pka, recipeRow, titrantMl } from '../src/functions/functions';
import { toEngineFormula } from '../src/functions/formulaEngine';
import { literal } from '../src/workbook/port';
import { SheetError } from '../src/functions/errors';
import { run } from '../src/cli/main';

const LIMIT_MS = 50;
const huge = Array.from({ length: 100_000 }, () => ['NaCl', 1]);
const hugeUserRange = Array.from({ length: 100_000 }, (_, i) => [`A${i}`, 1, '8', '', '', '', 100]);
const userRows = (counterIons: string, formula = '') => [['MyAmine', 0, '7', '', '', 'MyAmine salt', formula ? '' : 100, counterIons, '', formula]];

const cases: [string, () => unknown][] = [
  // First, so that it is the cold call: the first miss of a session builds the library and warms the name search.
  ['PH.OF: non-ASCII name (cold)', () => ph([['трис', 50]])],
  ['PH.OF: 100,000-row composition', () => ph(huge)],
  ['PH.OF: unknown name', () => ph([['tris baes', 50]])],
  ['PH.OF: 300-character name', () => ph([['x'.repeat(300), 50]])],
  ['PH.OF: 32,767-character name', () => ph([['трис'.repeat(8192).slice(0, 32767), 50]])],
  ['PH.OF: -20 °C', () => ph([['tris base', 50]], -20)],
  ['PH.OF: 150 °C', () => ph([['tris base', 50]], 150)],
  ['PH.OF: 10 M NaOH', () => ph([['NaOH', 10000]])],
  ['PH.OF: NaN as text', () => ph([['tris base', 'NaN']])],
  ['PH.OF: one-column range', () => ph([['tris base'], ['HCl']])],
  ['GRAMS: "50 kg"', () => grams('NaCl', '50 kg', 1000)],
  ['GRAMS: negative volume', () => grams('NaCl', 50, -1)],
  ['TITRANT.ML: pH 15', () => titrantMl('tris base', 50, 1000, 15, 'HCl', 1)],
  ['TITRANT.ML: wrong direction', () => titrantMl('tris base', 50, 1000, 11, 'HCl', 1)],
  ['TITRANT.ML: decimal comma thousands', () => titrantMl('tris base', '1,000', 1000, 7, 'HCl', 1)],
  ['PKA: step 9', () => pka('phosphate', 9)],
  ['RECIPE.ROW: unknown buffer', () => recipeRow('HEPPES', 7.4, 25, 500)],
  ['RECIPE.ROW: pH far from any pKa', () => recipeRow('HEPES', 1, 25, 500)],
  [
    'planner: titrant too dilute',
    () => planRecipe({ buffer: 'tris', targetPh: 7, concentrationMm: 1000, volumeMl: 100, titrant: { form: 'HCl', concentrationM: 0.001 } } as RecipeInput),
  ],
  ['planner: salt target passed', () => planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 100, saltTarget: { form: 'NaCl', idealOsmolarityMosm: 1 } })],
  ['RECIPE.ROW: 100,000 salt rows', () => recipeRow('HEPES', 7.4, 25, 500, undefined, huge)],
  ['FORMS: 100,000 user-substance rows', () => forms(hugeUserRange)],
  ['user substance: 20,000 blanks in counter-ions', () => ph([['MyAmine salt', 5]], 25, undefined, userRows(`Na${' '.repeat(20_000)}x`))],
  ['user substance: 20,000 brackets in a formula', () => ph([['MyAmine salt', 5]], 25, undefined, userRows('', '('.repeat(20_000)))],
  ['formula conversion: 1,000,000 letters', () => expectText(toEngineFormula('A'.repeat(1_000_000)))],
  ['text mark: 1,000,000 blanks then a letter', () => expectText(literal(`${' '.repeat(1_000_000)}x`))],
  ['core: empty composition', () => speciate({ systems: [] })],
  ['core: pKa out of order', () => speciate({ systems: [{ name: 'x', chargeOfMostProtonated: 0, steps: [{ pKa: 9 }, { pKa: 2 }], totalM: 0.1 }] })],
  ['CLI: invalid JSON', () => cliExpectingError(['solve', '--json', '{'])],
  ['CLI: 10 M and 150 °C', () => cliExpectingError(['solve', '--json', '{"temperatureC":150,"strongIonsMm":{"Na+":10000}}'])],
  ['CLI: recipe with a misspelt field', () => cliExpectingError(['recipe', '--json', '{"buffer":"tris","targetPh":8,"concentrationMm":20,"volumeML":100}'])],
];

/** A case whose right answer is text, not an error: returned, it counts as a result. */
function expectText(value: unknown): unknown {
  if (typeof value !== 'string') throw new Error('expected text');
  return value;
}

function cliExpectingError(args: string[]): never {
  let out = '';
  const code = run(args, (t) => (out += t));
  throw Object.assign(new Error(JSON.parse(out).error?.message ?? out), { cliCode: code });
}

console.log(`Proton Ledger bad-input bench — node ${process.version}, ${new Date().toISOString()} (limit ${LIMIT_MS} ms each)`);
let worst = 0;
let failed = false;
for (const [label, call] of cases) {
  clearCallCache();
  const start = performance.now();
  let message = '';
  let clear = false;
  try {
    call();
    message = 'no error (a result)';
    clear = true;
  } catch (e) {
    const known = e instanceof ChemError || e instanceof SheetError || (e as { cliCode?: number }).cliCode === 2;
    clear = known;
    message = `${known ? '' : 'UNTYPED: '}${(e as Error).message}`;
  }
  const ms = performance.now() - start;
  worst = Math.max(worst, ms);
  if (!clear || ms > LIMIT_MS) failed = true;
  console.log(`${ms.toFixed(2).padStart(8)} ms  ${label.padEnd(40)} ${message.slice(0, 110)}`);
}
console.log(`slowest: ${worst.toFixed(2)} ms (limit ${LIMIT_MS} ms)`);
process.exitCode = failed ? 1 : 0;
