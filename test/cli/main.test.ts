import { run } from '../../src/cli/main';
import { pHSAt25 } from '../chem/iupacStandards';

function call(args: string[]): { code: number; out: any } {
  let text = '';
  const code = run(args, (t) => (text += t));
  return { code, out: text.startsWith('{') || text.startsWith('[') ? JSON.parse(text) : text };
}

describe('proton-ledger solve', () => {
  it('solves an inline composition given in mM and prints one JSON result', () => {
    const { code, out } = call(['solve', '--json', JSON.stringify({ systems: [{ name: 'MES', chargeOfMostProtonated: 0, pKa: [6.27], totalMm: 50 }], strongIonsMm: { 'Na+': 25 }, activityModel: 'ideal' })]);
    expect(code).toBe(0);
    // Half-neutralised with the ideal model: pH = pKa within 0.001 (Henderson–Hasselbalch at 50 mM).
    expect(Math.abs(out.pH - 6.27)).toBeLessThan(0.001);
    expect(out.species.map((s: { name: string }) => s.name)).toEqual(['H+', 'OH-', 'Na+', 'MES 0', 'MES 1−']);
  });

  it('runs the demo composition', () => {
    const { code, out } = call(['demo']);
    expect(code).toBe(0);
    expect(out.result.pH).toBeGreaterThan(7);
    expect(out.result.temperatureC).toBe(4);
  });

  it.each([
    ['invalid JSON', ['solve', '--json', '{nope'], /not valid JSON/],
    ['a missing field', ['solve', '--json', '{"systems":[{"name":"x","pKa":[6]}]}'], /systems\.0\.chargeOfMostProtonated: Required/],
    ['an unknown field', ['solve', '--json', '{"temperature":25}'], /Unrecognized key/],
    ['a chemistry error', ['solve', '--json', '{"systems":[],"temperatureC":150,"strongIonsMm":{"Na+":1}}'], /temperatureC is 150/],
    ['mismatched ΔH list', ['solve', '--json', '{"systems":[{"name":"x","chargeOfMostProtonated":0,"pKa":[4,6],"deltaHkJ":[1],"totalMm":10}]}'], /one value per pKa step/],
    ['an unknown command', ['brew'], /Unknown command "brew"/],
  ])('given %s, prints a JSON error and exits 2', (_label, args, message) => {
    const { code, out } = call(args as string[]);
    expect(code).toBe(2);
    expect(out.error.message).toMatch(message);
  });

  it('warns when a library system is used outside the temperatures its data cover (tris at 60 °C, Bates & Hetzer measured 0–50 °C)', () => {
    const { code, out } = call(['solve', '--json', JSON.stringify({ forms: [{ form: 'tris base', mM: 20 }, { form: 'tris HCl', mM: 30 }], temperatureC: 60 })]);
    expect(code).toBe(0);
    expect(out.warnings).toContainEqual(expect.stringMatching(/^Temperature 60 °C lies outside 0–50 °C, the temperatures the data for tris/));
  });

  it('prints usage for help', () => {
    expect(call(['help']).out).toMatch(/Usage:/);
  });
});

describe('proton-ledger solve with forms by name', () => {
  it('takes forms in mM or as grams in a volume: KH2PO4 + Na2HPO4 (0.025 + 0.025) solves to the IUPAC 6.865 standard within 0.015 (Buck et al. 2002)', () => {
    const { code, out } = call(['solve', '--json', JSON.stringify({ forms: [{ form: 'KH2PO4', mM: 25 }, { form: 'Na2HPO4', grams: 0.025 * 141.96, volumeMl: 1000 }] })]);
    expect(code).toBe(0);
    expect(Math.abs(out.pH - pHSAt25('phosphate1to1'))).toBeLessThan(0.015);
  });

  it('lists the plain-words warnings with the result: none for a phosphate buffer, metal complexes once MgCl2 joins it', () => {
    const phosphate = [{ form: 'Na2HPO4', mM: 30 }, { form: 'NaH2PO4·H2O', mM: 20 }];
    expect(call(['solve', '--json', JSON.stringify({ forms: phosphate })]).out.warnings).toEqual([]);
    const withMg = call(['solve', '--json', JSON.stringify({ forms: [...phosphate, { form: 'MgCl2·6H2O', mM: 2 }] })]).out;
    expect(withMg.warnings).toEqual([expect.stringMatching(/^Mg2\+ with phosphate: metal–buffer complexes are not modelled/)]);
  });

  it('refuses an unknown form with did-you-mean', () => {
    const { code, out } = call(['solve', '--json', JSON.stringify({ forms: [{ form: 'tris bas', mM: 25 }] })]);
    expect(code).toBe(2);
    expect(out.error.message).toMatch(/did you mean/i);
  });

  it('accepts user substances', () => {
    const userSubstances = [{ name: 'lab acid Y', chargeOfMostProtonated: 0, pKa: [5.5], forms: [{ name: 'lab acid Y free acid', molarMass: 100, protonsLost: 0 }] }];
    const { code, out } = call(['solve', '--json', JSON.stringify({ forms: [{ form: 'lab acid Y free acid', mM: 10 }], strongIonsMm: { 'Na+': 5 }, userSubstances, activityModel: 'ideal' })]);
    expect(code).toBe(0);
    expect(Math.abs(out.pH - 5.5)).toBeLessThan(0.01);
  });
});

describe('proton-ledger recipe and substances', () => {
  const recipe = { buffer: 'tris', targetPh: 7.5, concentrationMm: 20, volumeMl: 1000, titrant: { form: 'HCl', concentrationM: 1 } };

  it('prints the plan as JSON', () => {
    const { code, out } = call(['recipe', '--json', JSON.stringify(recipe)]);
    expect(code).toBe(0);
    expect(Math.abs(out.predictions.pHAtUse - 7.5)).toBeLessThan(0.001);
    expect(out.titration.titrant).toBe('hydrochloric acid');
  });

  it('takes the purity of the form weighed', () => {
    const pure = call(['recipe', '--json', JSON.stringify(recipe)]).out;
    const assayed = call(['recipe', '--json', JSON.stringify({ ...recipe, formPurityPercent: 99 })]).out;
    const grams = (plan: { components: { role: string; grams?: number }[] }) => plan.components.find((c) => c.role === 'buffer')!.grams!;
    expect(Math.abs(grams(assayed) - grams(pure) / 0.99)).toBeLessThan(1e-9);
  });

  it('prints the plan as text with --text', () => {
    const { code, out } = call(['recipe', '--text', '--json', JSON.stringify(recipe)]);
    expect(code).toBe(0);
    expect(out).toMatch(/Weigh 2\.42\d g of tris base/);
    expect(out).toMatch(/Cautions/);
  });

  it('refuses a misspelt field', () => {
    const { code, out } = call(['recipe', '--json', JSON.stringify({ ...recipe, volumeML: 5 })]);
    expect(code).toBe(2);
    expect(out.error.message).toMatch(/Unrecognized key/);
  });

  it('lists the library as a table and as JSON', () => {
    expect(call(['substances']).out).toMatch(/^substance\s+pKa at 25 °C\s+forms/);
    const { out } = call(['substances', '--json']);
    expect(out.length).toBeGreaterThanOrEqual(45);
    expect(out.find((s: { name: string }) => s.name === 'HEPES').pKa).toEqual([7.564]);
  });
});
