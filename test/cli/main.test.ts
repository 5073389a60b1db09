import { conductivityAt } from '../../src/chem';
import { run } from '../../src/cli/main';
import { pHSAt25 } from '../chem/iupacStandards';

function call(args: string[]): { code: number; out: any } {
  let text = '';
  const code = run(args, (t) => (text += t));
  return { code, out: text.startsWith('{') || text.startsWith('[') ? JSON.parse(text) : text };
}

describe('proton-ledger recipe: a name that leaves the hydrate open', () => {
  it('weighs the library form under that name and warns with code hydrateAssumed, naming it and its molar mass', () => {
    const { code, out } = call([
      'recipe',
      '--json',
      JSON.stringify({ buffer: 'phosphate', targetPh: 7.2, concentrationMm: 50, volumeMl: 500, route: 'two-forms', acidForm: 'NaH2PO4·H2O', baseForm: 'sodium phosphate dibasic' }),
    ]);
    expect(code).toBe(0);
    const found = out.warnings.filter((w: { code: string }) => w.code === 'hydrateAssumed');
    expect(found).toHaveLength(1);
    expect(found[0].field).toBe('baseForm');
    expect(found[0].message).toMatch(/sodium phosphate dibasic anhydrous \(141\.9\d g\/mol\) is used/);
  });
});

describe('proton-ledger solve', () => {
  it('solves an inline composition given in mM and prints one JSON result', () => {
    const { code, out } = call([
      'solve',
      '--json',
      JSON.stringify({ systems: [{ name: 'MES', chargeOfMostProtonated: 0, pKa: [6.27], totalMm: 50 }], strongIonsMm: { 'Na+': 25 }, activityModel: 'ideal' }),
    ]);
    expect(code).toBe(0);
    // Half-neutralised with the ideal model: pH = pKa within 0.001 (Henderson–Hasselbalch at 50 mM).
    expect(Math.abs(out.pH - 6.27)).toBeLessThan(0.001);
    expect(out.species.map((s: { name: string }) => s.name)).toEqual(['H+', 'OH-', 'Na+', 'MES 0', 'MES 1−']);
  });

  it("adds the conductivity at the composition's temperature and at 25 °C, as the core computes it", () => {
    const composition = { systems: [], strongIonsMm: { 'K+': 10, 'Cl-': 10 }, temperatureC: 20 };
    const { code, out } = call(['solve', '--json', JSON.stringify(composition)]);
    expect(code).toBe(0);
    expect(out.conductivity.temperatureC).toBe(20);
    expect(out.conductivity.msPerCm).toBeCloseTo(conductivityAt({ systems: [], strongIons: { 'K+': 0.01, 'Cl-': 0.01 }, temperatureC: 20 }).conductivityMsPerCm, 12);
    expect(out.conductivity.at25MsPerCm).toBeCloseTo(conductivityAt({ systems: [], strongIons: { 'K+': 0.01, 'Cl-': 0.01 } }).conductivityMsPerCm, 12);
    expect(out.conductivity.estimates).toEqual([]);
  });

  it('runs the demo composition', () => {
    const { code, out } = call(['demo']);
    expect(code).toBe(0);
    expect(out.result.pH).toBeGreaterThan(7);
    expect(out.result.temperatureC).toBe(4);
  });

  it.each([
    ['invalid JSON', ['solve', '--json', '{nope'], 'notJson', 'input'],
    ['a missing field', ['solve', '--json', '{"systems":[{"name":"x","pKa":[6]}]}'], 'notANumber', 'systems[0].chargeOfMostProtonated'],
    ['an unknown field', ['solve', '--json', '{"temperature":25}'], 'unknownField', 'temperature'],
    ['an unknown field inside a system', ['solve', '--json', '{"systems":[{"name":"x","chargeOfMostProtonated":0,"pKa":[6],"totalMM":5}]}'], 'unknownField', 'systems[0].totalMM'],
    ['a chemistry error', ['solve', '--json', '{"systems":[],"temperatureC":150,"strongIonsMm":{"Na+":1}}'], 'outOfRange', 'temperatureC'],
    [
      'mismatched ΔH list',
      ['solve', '--json', '{"systems":[{"name":"x","chargeOfMostProtonated":0,"pKa":[4,6],"deltaHkJ":[1],"totalMm":10}]}'],
      'listLengthMismatch',
      'systems[0].deltaHkJ',
    ],
    ['a misspelt form', ['solve', '--json', '{"forms":[{"form":"tris bsae","mM":5}]}'], 'unknownSubstance', 'forms[0].form'],
    ['an ambiguous unit', ['solve', '--json', '{"forms":[{"form":"tris base","mM":"5 m"}]}'], 'ambiguousUnit', 'forms[0].mM'],
    ['an unknown command', ['brew'], 'unknownField', 'command'],
  ])('given %s, prints a JSON error with kind, code, field and message, and exits 2', (_label, args, code, field) => {
    const { code: exit, out } = call(args as string[]);
    expect(exit).toBe(2);
    expect(out.error).toMatchObject({ kind: 'invalid-input', code, field });
    expect(typeof out.error.message).toBe('string');
  });

  it('reads numbers with units in a composition, as the worksheet functions do', () => {
    const typed = call([
      'solve',
      '--json',
      JSON.stringify({
        forms: [
          { form: 'tris base', mM: '0,05 M' },
          { form: 'HCl', mM: '25 mM' },
        ],
        temperatureC: '4 °C',
      }),
    ]);
    const plain = call([
      'solve',
      '--json',
      JSON.stringify({
        forms: [
          { form: 'tris base', mM: 50 },
          { form: 'HCl', mM: 25 },
        ],
        temperatureC: 4,
      }),
    ]);
    expect(typed.out.pH).toBe(plain.out.pH);
  });

  it('warns when a library system is used outside the temperatures its data cover (tris at 60 °C, Bates & Hetzer measured 0–50 °C)', () => {
    const { code, out } = call([
      'solve',
      '--json',
      JSON.stringify({
        forms: [
          { form: 'tris base', mM: 20 },
          { form: 'tris HCl', mM: 30 },
        ],
        temperatureC: 60,
      }),
    ]);
    expect(code).toBe(0);
    expect(out.warnings).toContainEqual(
      expect.objectContaining({ code: 'outsideDataRange', message: expect.stringMatching(/^Temperature 60 °C lies outside 0–50 °C, the temperatures the data for tris/) }),
    );
  });

  it('prints usage for help', () => {
    expect(call(['help']).out).toMatch(/Usage:/);
  });
});

describe('proton-ledger solve with forms by name', () => {
  it('takes forms in mM or as grams in a volume: KH2PO4 + Na2HPO4 (0.025 + 0.025) solves to the IUPAC 6.865 standard within 0.015 (Buck et al. 2002)', () => {
    const { code, out } = call([
      'solve',
      '--json',
      JSON.stringify({
        forms: [
          { form: 'KH2PO4', mM: 25 },
          { form: 'Na2HPO4', grams: 0.025 * 141.96, volumeMl: 1000 },
        ],
      }),
    ]);
    expect(code).toBe(0);
    expect(Math.abs(out.pH - pHSAt25('phosphate1to1'))).toBeLessThan(0.015);
  });

  it('lists the plain-words warnings with the result: none for a phosphate buffer, metal complexes once MgCl2 joins it', () => {
    const phosphate = [
      { form: 'Na2HPO4', mM: 30 },
      { form: 'NaH2PO4·H2O', mM: 20 },
    ];
    expect(call(['solve', '--json', JSON.stringify({ forms: phosphate })]).out.warnings).toEqual([]);
    const withMg = call(['solve', '--json', JSON.stringify({ forms: [...phosphate, { form: 'MgCl2·6H2O', mM: 2 }] })]).out;
    expect(withMg.warnings).toEqual([expect.objectContaining({ code: 'metalComplexes', message: expect.stringMatching(/^Mg2\+ with phosphate/) })]);
  });

  it('refuses an unknown form with did-you-mean', () => {
    const { code, out } = call(['solve', '--json', JSON.stringify({ forms: [{ form: 'tris bas', mM: 25 }] })]);
    expect(code).toBe(2);
    expect(out.error.message).toMatch(/did you mean/i);
  });

  it('accepts user substances', () => {
    const userSubstances = [{ name: 'lab acid Y', chargeOfMostProtonated: 0, pKa: [5.5], forms: [{ name: 'lab acid Y free acid', molarMass: 100, protonsLost: 0 }] }];
    const { code, out } = call([
      'solve',
      '--json',
      JSON.stringify({ forms: [{ form: 'lab acid Y free acid', mM: 10 }], strongIonsMm: { 'Na+': 5 }, userSubstances, activityModel: 'ideal' }),
    ]);
    expect(code).toBe(0);
    expect(Math.abs(out.pH - 5.5)).toBeLessThan(0.01);
  });
});

describe('proton-ledger recipe and substances', () => {
  const recipe = { buffer: 'tris', targetPh: 7.5, concentrationMm: 20, volumeMl: 1000, titrant: { form: 'HCl', concentrationM: 1 } };

  it('accepts a salt target by conductivity and prints the predicted conductivity', () => {
    const { code, out } = call(['recipe', '--json', JSON.stringify({ ...recipe, saltTarget: { form: 'NaCl', conductivityMsPerCm: 15, conductivityTemperatureC: 20 } })]);
    expect(code).toBe(0);
    expect(conductivityAt(out.composition, 20).conductivityMsPerCm).toBeCloseTo(15, 6);
    expect(out.predictions.conductivity25MsPerCm).toBeGreaterThan(15);
  });

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
    expect(out.error).toMatchObject({ code: 'unknownField', field: 'volumeML' });
    expect(out.error.message).toMatch(/did you mean "volumeMl"/);
  });

  it('lists the library as a table and as JSON', () => {
    expect(call(['substances']).out).toMatch(/^substance\s+pKa at 25 °C\s+forms/);
    const { out } = call(['substances', '--json']);
    expect(out.length).toBeGreaterThanOrEqual(45);
    expect(out.find((s: { name: string }) => s.name === 'HEPES').pKa).toEqual([7.564]);
  });
});

describe('proton-ledger help, version and batches', () => {
  const { main } = jest.requireActual('../../src/cli/main') as typeof import('../../src/cli/main');
  const { mkdtempSync, writeFileSync, readFileSync } = jest.requireActual('fs') as typeof import('fs');
  const { join } = jest.requireActual('path') as typeof import('path');
  const { tmpdir } = jest.requireActual('os') as typeof import('os');

  async function cli(args: string[]): Promise<{ code: number; text: string }> {
    let text = '';
    const code = await main(args, (t) => (text += t));
    return { code, text };
  }

  it('prints every recipe field with its unit and default for recipe --help, and the version for --version', async () => {
    const help = await cli(['recipe', '--help']);
    expect(help.code).toBe(0);
    for (const field of ['targetPh', 'titrant.concentrationM', 'saltTarget.conductivityMsPerCm', 'partVolumeFraction']) expect(help.text).toContain(field);
    expect(help.text).toMatch(/0\.001 to 20 M; default: 1/);
    expect((await cli(['calc', '--help'])).text).toMatch(/Usage: proton-ledger calc/);
    expect((await cli(['--version'])).text).toMatch(/^proton-ledger \d+\.\d+\.\d+/);
  });

  it('plans a CSV batch of our own what-if table: one row per input, an impossible row keeps its error and the exit code says so', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pl-batch-'));
    const input = join(dir, 'grid.csv');
    writeFileSync(
      input,
      [
        'buffer,targetPh,concentrationMm,volumeMl,useTemperatureC,titrant.form',
        'HEPES,7.2,25 mM,1 L,4,NaOH',
        'HEPES,"7,6",25,1000,25,NaOH',
        'HEPES,7.4,25,1000,25,HCl',
        'tris,8.1,50,500,4,',
      ].join('\n'),
    );
    const out = join(dir, 'grid.jsonl');
    const result = await cli(['recipe', '--batch', input, '-o', out]);
    expect(result.code).toBe(1);
    expect(JSON.parse(result.text)).toEqual({ rows: 4, planned: 3, failed: 1, output: out });
    const rows = readFileSync(out, 'utf8')
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(rows.map((r) => r.row)).toEqual([1, 2, 3, 4]);
    expect(Math.abs(rows[1]['pH at use'] - 7.6)).toBeLessThan(0.001);
    // HCl lowers the pH of HEPES free acid: the target is out of reach, said in its row.
    expect(rows[2].error).toMatchObject({ kind: 'infeasible-target', code: 'unreachablePh' });
    expect(rows[3]['titrant (mL)']).toBeGreaterThan(0);
    // QC figures: the 4 °C row's conductivity at use reads below its conductivity at 25 °C.
    expect(rows[0]['conductivity at use temp. (mS/cm)']).toBeLessThan(rows[0]['conductivity at 25 °C (mS/cm)']);
    expect(rows[0]['osmolality (mOsm/kg)']).toBeGreaterThan(0);
    const csv = await cli(['recipe', '--batch', input]);
    expect(csv.text.split('\n')[0]).toMatch(/^row,form \(g\),base form \(g\),titrant \(mL\)/);
    expect(csv.text.split('\n')[0]).toContain('ideal osmolarity (mOsm/L),osmolality (mOsm/kg),conductivity at use temp. (mS/cm),conductivity at 25 °C (mS/cm),salt to target (g)');
  });

  it('reads a batch CSV as a spreadsheet program saved it (byte-order mark, CRLF, a blank line, padded fields) with the reader calc and the preview use', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pl-batch-'));
    const input = join(dir, 'saved.csv');
    writeFileSync(input, '\uFEFFbuffer,targetPh,concentrationMm,volumeMl\r\n MES , 6.1 ,"20 mM", 250 \r\n,,,\r\nMOPS,7.2,20,250\r\n');
    const result = await cli(['recipe', '--batch', input, '-o', join(dir, 'out.jsonl')]);
    expect(JSON.parse(result.text)).toMatchObject({ rows: 2, planned: 2, failed: 0 });
    const rows = readFileSync(join(dir, 'out.jsonl'), 'utf8')
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(Math.abs(rows[0]['pH at use'] - 6.1)).toBeLessThan(0.001);
  });

  it('writes a batch as .xlsx, and solves a JSON-lines batch of compositions', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pl-batch-'));
    const input = join(dir, 'mixes.jsonl');
    writeFileSync(
      input,
      [
        JSON.stringify({
          forms: [
            { form: 'tris base', mM: 50 },
            { form: 'HCl', mM: 25 },
          ],
        }),
        'not json',
        JSON.stringify({ forms: [{ form: 'MES free acid', mM: '20 mM' }], temperatureC: '37 °C' }),
      ].join('\n'),
    );
    const out = join(dir, 'mixes.xlsx');
    const result = await cli(['solve', '--batch', input, '-o', out]);
    expect(result.code).toBe(1);
    expect(JSON.parse(result.text)).toMatchObject({ rows: 3, planned: 2, failed: 1 });
    const ExcelJS = jest.requireActual('exceljs');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    const ws = wb.worksheets[0];
    expect(ws.getRow(1).getCell(2).value).toBe('pH');
    expect(ws.getRow(3).getCell(6).value).toBe('notJson');
    expect(Math.abs((ws.getRow(2).getCell(2).value as number) - 8.07)).toBeLessThan(0.1);
  });
});
