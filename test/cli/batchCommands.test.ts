import { mkdtempSync, readFileSync, rmSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import ExcelJS from 'exceljs';
import { asMade, benchCorrection, plannedAsWeighed } from '../../src/chem/batch';
import { planRecipe } from '../../src/chem/planner';
import { main, run } from '../../src/cli/main';

function call(args: string[]): { code: number; out: any } {
  let text = '';
  const code = run(args, (t) => (text += t));
  return { code, out: JSON.parse(text) };
}

/** Our own cold-room tris saline, titrated with 1 M HCl at 22 °C. */
const recipe = {
  buffer: 'tris',
  targetPh: 7.5,
  useTemperatureC: 4,
  benchTemperatureC: 22,
  concentrationMm: 50,
  volumeMl: 500,
  form: 'tris base',
  titrant: 'HCl',
  salts: 'NaCl 150 mM',
};
const plan = planRecipe({ ...recipe, titrant: { form: 'HCl', concentrationM: 1 } });

describe('proton-ledger as-made and correct', () => {
  it("as-made prints the core's check and exits 0 on a pass, 1 on a fail", () => {
    const weighed = plannedAsWeighed(plan);
    const ok = call(['as-made', '--json', JSON.stringify({ recipe, actual: { weighed, titrantMl: plan.titration!.volumeMl } })]);
    expect(ok.code).toBe(0);
    expect(ok.out.pass).toBe(true);
    expect(ok.out.predictions.pHAtUse).toBeCloseTo(asMade(plan, { weighed, titrantMl: plan.titration!.volumeMl }).predictions.pHAtUse, 12);
    const weak = call(['as-made', '--json', JSON.stringify({ recipe, actual: { weighed, titrantMl: plan.titration!.volumeMl, titrantConcentrationM: '0.9 M' } })]);
    expect(weak.code).toBe(1);
    expect(weak.out.warnings.map((w: { code: string }) => w.code)).toContain('stockOffNominal');
  });

  it('correct prints the next amount from the reading, as the core computes it', () => {
    const { code, out } = call(['correct', '--json', JSON.stringify({ recipe, actual: { titrantMl: 20 }, reading: { ph: 7.35 } })]);
    expect(code).toBe(0);
    expect(out.nextMl).toBeCloseTo(benchCorrection(plan, { titrantMl: 20, readingPh: 7.35 }).nextMl, 12);
  });

  it('refuses an unknown key and a missing reading, naming the field', () => {
    const unknown = call(['correct', '--json', JSON.stringify({ recipe, reading: { pH: 7 } })]);
    expect([unknown.code, unknown.out.error.code, unknown.out.error.field]).toEqual([2, 'unknownField', 'reading.pH']);
    const missing = call(['correct', '--json', JSON.stringify({ recipe, actual: { titrantMl: 3 } })]);
    expect([missing.out.error.code, missing.out.error.field]).toEqual(['missingValue', 'reading.ph']);
  });
});

describe('proton-ledger record', () => {
  let dir = '';
  beforeAll(() => (dir = mkdtempSync(join(tmpdir(), 'record-'))));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('writes the record as .xlsx (formulas with values, one-page A4 print area) and a printable .html beside it', async () => {
    let text = '';
    const xlsx = join(dir, 'tris.xlsx');
    const code = await main(['record', '-o', xlsx, '--json', JSON.stringify(recipe)], (t) => (text += t));
    expect(code).toBe(0);
    const summary = JSON.parse(text);
    expect(summary.html).toBe(join(dir, 'tris.html'));
    const html = readFileSync(summary.html, 'utf8');
    expect(html).toContain('Batch record: tris 50 mM, pH 7.5 at 4 °C, 500 mL');
    expect(html).toContain('INCOMPLETE');
    expect(html).not.toContain('<script');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(xlsx);
    const ws = wb.worksheets[0];
    expect(ws.pageSetup.fitToPage).toBe(true);
    expect(ws.pageSetup.printArea).toMatch(/^A1:F\d+$/);
    let asMadeFormula = '';
    ws.eachRow((row) =>
      row.eachCell((cell) => {
        const f = (cell.value as { formula?: string })?.formula;
        if (f?.startsWith('PROTON.AS.MADE(')) asMadeFormula = f;
      }),
    );
    expect(asMadeFormula).toMatch(/^PROTON\.AS\.MADE\(B\d+,B\d+,B\d+,B\d+,H1:J\d+,B\d+,A\d+:B\d+,A\d+:B\d+\)$/);
  });

  it('given a batch instead of a recipe, writes the record filled in, its check computed (PASS with the planned amounts)', async () => {
    let text = '';
    const html = join(dir, 'filled.html');
    const actual = { weighed: plannedAsWeighed(plan), titrantMl: plan.titration!.volumeMl, finalPh: 7.52 };
    expect(await main(['record', '-o', join(dir, 'filled.xlsx'), '--html', html, '--json', JSON.stringify({ recipe, actual })], (t) => (text += t))).toBe(0);
    const page = readFileSync(html, 'utf8');
    expect(page).not.toContain('INCOMPLETE');
    expect(page).toMatch(/<td class="s-result">batch<\/td>(<td[^>]*><\/td>){4}<td class="s-result">PASS<\/td>/);
  });

  it('refuses an output that is not .xlsx (field -o)', async () => {
    let text = '';
    expect(await main(['record', '-o', join(dir, 'x.pdf'), '--json', JSON.stringify(recipe)], (t) => (text += t))).toBe(2);
    expect(JSON.parse(text).error.field).toBe('-o');
  });
});
