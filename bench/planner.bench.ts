/**
 * Recipe planner benchmark: median and p95 µs per recipe for fixed recipes, so figures
 * compare from run to run. Target: ≤ 20 µs median.
 *
 * Run: npm run bench
 */
import { defaultLibrary } from '../src/chem/library';
import { RecipeInput, planRecipe } from '../src/chem/planner';
import { measure } from './measure';

const CALLS = 20_000;
const BATCH = 10;

const recipes: [string, RecipeInput][] = [
  [
    'titrate: HEPES + NaOH, NaCl, use 4 °C, bench 22 °C',
    {
      buffer: 'HEPES',
      targetPh: 7.4,
      useTemperatureC: 4,
      benchTemperatureC: 22,
      concentrationMm: 25,
      volumeMl: 500,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      salts: [{ form: 'NaCl', concentrationMm: 150 }],
    },
  ],
  [
    'two forms: sodium phosphates, 100 mM',
    { buffer: 'phosphate', targetPh: 7.0, concentrationMm: 100, volumeMl: 1000, route: 'two-forms', acidForm: 'NaH2PO4·H2O', baseForm: 'Na2HPO4·7H2O' },
  ],
  [
    'stock: 10× tris with 6 M HCl',
    { buffer: 'tris', targetPh: 8.0, concentrationMm: 50, volumeMl: 200, route: 'stock', stock: { fold: 10, volumeMl: 500 }, titrant: { form: 'HCl', concentrationM: 6 } },
  ],
  [
    'salt target: HEPES to 290 mOsm/L with NaCl',
    {
      buffer: 'HEPES',
      targetPh: 7.2,
      concentrationMm: 10,
      volumeMl: 1000,
      form: 'HEPES free acid',
      titrant: { form: 'NaOH', concentrationM: 1 },
      saltTarget: { form: 'NaCl', idealOsmolarityMosm: 290 },
    },
  ],
];

console.log(`Proton Ledger planner bench — node ${process.version}, ${new Date().toISOString()}`);
const library = defaultLibrary();
for (const [label, input] of recipes) measure(label, () => planRecipe(input, library), label.startsWith('salt') ? 2_000 : CALLS, BATCH);
