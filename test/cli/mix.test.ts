/** The `mix` command: the shelf from a file or the JSON, JSON or text out, errors with code and field. */
import { join } from 'path';
import { planMix } from '../../src/chem/mixing';
import { run } from '../../src/cli/main';

const SHELF_FILE = join(__dirname, '..', '..', 'docs', 'examples', 'shelf.json');

function call(args: string[]): { code: number; text: string } {
  let text = '';
  const code = run(args, (t) => (text += t));
  return { code, text };
}

const MIX = {
  volumeMl: '50 mL',
  useTemperatureC: '4 °C',
  targets: [
    { component: 'tris', concentrationMm: 20 },
    { component: 'NaCl', concentrationMm: '150 mM' },
    { component: 'EDTA', concentrationMm: 1 },
  ],
};

describe('proton-ledger mix', () => {
  it('plans from the example shelf file and prints the same plan the core gives', () => {
    const { code, text } = call(['mix', '--shelf', SHELF_FILE, '--json', JSON.stringify(MIX)]);
    expect(code).toBe(0);
    const out = JSON.parse(text);
    const shelf = require(SHELF_FILE).stocks;
    const core = planMix({ ...MIX, stocks: shelf });
    expect(out.predictions.pHAtUse).toBeCloseTo(core.predictions.pHAtUse, 12);
    expect(out.components.map((c: { name: string }) => c.name)).toEqual(['Tris-HCl 1 M pH 8.0', 'NaCl 5 M', 'EDTA 0.5 M pH 8.0', 'water']);
    expect(out.warnings.map((w: { code: string }) => w.code)).toContain('mixDiffersFromLabel');
  });

  it('prints a text plan with --text', () => {
    const { code, text } = call(['mix', '--text', '--shelf', SHELF_FILE, '--json', JSON.stringify(MIX)]);
    expect(code).toBe(0);
    expect(text.split('\n')[0]).toBe('Mix 50 mL, used at 4 °C');
    expect(text).toMatch(/^ {2}1 mL +Tris-HCl 1 M pH 8\.0 +→ 20 mM tris$/m);
  });

  it('reports stocks that cannot fit as an infeasible target, with code and field', () => {
    const { code, text } = call([
      'mix',
      '--shelf',
      SHELF_FILE,
      '--json',
      JSON.stringify({
        volumeMl: 10,
        targets: [
          { component: 'NaCl', concentrationMm: 4000 },
          { component: 'KCl', concentrationMm: 1000 },
        ],
      }),
    ]);
    expect(code).toBe(2);
    expect(JSON.parse(text).error).toMatchObject({ kind: 'infeasible-target', code: 'stocksDoNotFit', field: 'targets' });
  });

  it('takes the shelf from the JSON itself, and names a stock field at fault', () => {
    const { code, text } = call([
      'mix',
      '--json',
      JSON.stringify({ volumeMl: 10, stocks: [{ name: 'KCl', form: 'KCl', concentration: '3 kg' }], targets: [{ component: 'KCl', concentrationMm: 100 }] }),
    ]);
    expect(code).toBe(2);
    expect(JSON.parse(text).error).toMatchObject({ kind: 'invalid-input', code: 'wrongUnit', field: 'stocks[0].concentration' });
  });

  it('has help', () => {
    expect(call(['help', 'mix']).text).toMatch(/^Usage: proton-ledger mix/);
  });
});
