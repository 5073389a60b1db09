/**
 * Pane logic end to end without a browser: a recipe table built from typical input into the
 * preview workbook (HyperFormula with the PROTON functions) must compute; bad input must
 * write nothing; a values copy carries values and provenance.
 */
import { BUFFERING_HALF_WIDTH } from '../../src/chem';
import { planRecipe } from '../../src/chem/planner';
import { pka } from '../../src/functions/functions';
import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { PreviewWorkbook } from '../../src/preview/workbook';
import { checkForm, defaultInput } from '../../src/taskpane/form';
import { COL, LAYOUT, SALTS_BLOCK, SETTING_VALUE_COL, SettingLabel, settingRow } from '../../src/taskpane/recipeTable';
import { PROTOCOL_FIRST_ROW } from '../../src/taskpane/protocol';
import { buildRecipeTable, showProtocol, valuesCopy } from '../../src/taskpane/writer';
import { PreviewAdapter } from '../../src/workbook/previewAdapter';

function setup() {
  const book = new PreviewWorkbook(createFormulaEngine({ Notes: [['our own notes']] }));
  let active = 'Notes';
  const port = new PreviewAdapter(
    book,
    () => ({ sheet: active, range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }),
    (s) => (active = s),
  );
  return { book, port, active: () => active };
}

const NOW = new Date('2026-03-02T09:30:00Z');

describe('recipe table in the preview workbook', () => {
  test('typical input: HEPES 25 mM with 150 mM NaCl, pH 7.0–7.6 at 4 and 25 °C gives computed rows', async () => {
    const { book, port, active } = setup();
    const progress: number[] = [];
    const result = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW, onProgress: (d) => progress.push(d) });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.rows).toBe(8); // 4 pH × 2 temperatures × 1 concentration
    expect(active()).toBe(result.sheet);
    expect(book.sheetNames()).toEqual(['Notes', result.sheet, result.protocolSheet]);
    expect(progress[progress.length - 1]).toBe(8);
    const row = LAYOUT.firstDataRow;
    const v = (col: number, r = row) => book.value(result.sheet, r, col);
    // Grams of HEPES free acid: 25 mM × 1 L × 238.3 g/mol ≈ 5.96 g (molar mass from the formula).
    expect(v(COL.formGrams)).toBeCloseTo(5.96, 1);
    expect(typeof v(COL.titrantMl)).toBe('number');
    expect(v(COL.titrantMl) as number).toBeGreaterThan(0);
    expect(v(COL.titrantLowMl) as number).toBeLessThan(v(COL.titrantMl) as number);
    expect(v(COL.titrantHighMl) as number).toBeGreaterThan(v(COL.titrantMl) as number);
    for (const col of [COL.meter, COL.check, COL.capacity, COL.ionicStrength, COL.osmolarity, COL.osmolality, COL.conductivity, COL.conductivity25])
      expect(typeof v(col)).toBe('number');
    // The QC columns sit under their headers: a conductivity in mS/cm, an osmolality in mOsm/kg.
    expect(book.value(result.sheet, LAYOUT.tableHeaderRow, COL.conductivity)).toBe('Conductivity at use temp. (mS/cm)');
    expect(book.value(result.sheet, LAYOUT.tableHeaderRow, COL.conductivity25)).toBe('Conductivity at 25 °C (mS/cm)');
    expect(book.value(result.sheet, LAYOUT.tableHeaderRow, COL.warnings)).toBe('Warnings');
    // One number format per spill column: the conductivities to 0.01 mS/cm, the warnings styled as warnings.
    expect(book.meta(result.sheet, row, COL.conductivity)?.numberFormat).toBe('0.00');
    expect(book.meta(result.sheet, row, COL.warnings)?.style).toBe('warning');
    // Check column: the row's recipe (salt included) solves back to its target within 0.001 pH.
    expect(Math.abs((v(COL.check) as number) - 7.0)).toBeLessThan(0.001);
    // The table's titrant volume is the planner's, salt included.
    const setting = (label: SettingLabel) => book.value(result.sheet, settingRow(label), SETTING_VALUE_COL);
    const plan = planRecipe({
      buffer: setting('Buffer system') as string,
      targetPh: 7.0,
      useTemperatureC: v(COL.useTemperatureC) as number,
      concentrationMm: v(COL.concentrationMm) as number,
      volumeMl: v(COL.volumeMl) as number,
      form: setting('Form weighed') as string,
      titrant: { form: setting('Titrant') as string, concentrationM: setting('Titrant stock (M)') as number },
      benchTemperatureC: setting('Bench temp. (°C)') as number,
      partVolumeFraction: setting('Adjust at (fraction)') as number,
      salts: [
        {
          form: book.value(result.sheet, SALTS_BLOCK.row + 1, SALTS_BLOCK.col) as string,
          concentrationMm: book.value(result.sheet, SALTS_BLOCK.row + 1, SALTS_BLOCK.col + 1) as number,
        },
      ],
    });
    expect(Math.abs((v(COL.titrantMl) as number) - plan.titration!.volumeMl)).toBeLessThan(1e-9);
    expect(Math.abs((v(COL.meter) as number) - plan.meter.pH)).toBeLessThan(1e-9);
    expect(v(COL.ionicStrength) as number).toBeGreaterThan(150);
    expect(book.charts(result.sheet)).toHaveLength(2);
  });

  test('editing an input recomputes its row (the results are formulas)', async () => {
    const { book, port } = setup();
    const result = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW });
    if (!result.ok) throw new Error('not built');
    const row = LAYOUT.firstDataRow;
    const before = book.value(result.sheet, row, COL.formGrams) as number;
    book.setContents(result.sheet, row, COL.concentrationMm, [[50]]);
    expect(book.value(result.sheet, row, COL.formGrams) as number).toBeCloseTo(before * 2, 6);
    expect(book.formula(result.sheet, row, COL.formGrams)).toMatch(/^=PROTON\.RECIPE\.ROW\(/);
  });

  test('purity of the form: kept in the settings and used by every row; out of range refused under its field', async () => {
    const { book, port } = setup();
    const pure = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW });
    const assayed = await buildRecipeTable(port, { ...defaultInput(), purityPercent: '99.5 %' }, { version: '0.1.0', now: NOW });
    if (!pure.ok || !assayed.ok) throw new Error('not built');
    expect(book.value(assayed.sheet, settingRow('Form purity (%)'), SETTING_VALUE_COL)).toBe(99.5);
    expect(book.value(pure.sheet, settingRow('Form purity (%)'), SETTING_VALUE_COL)).toBe(100);
    const row = LAYOUT.firstDataRow;
    const g = (sheet: string) => book.value(sheet, row, COL.formGrams) as number;
    expect(Math.abs(g(assayed.sheet) - g(pure.sheet) / 0.995)).toBeLessThan(1e-9);
    // Editing the purity cell recomputes the grams (it is an input of the live formulas).
    book.setContents(assayed.sheet, settingRow('Form purity (%)'), SETTING_VALUE_COL, [[98]]);
    expect(Math.abs(g(assayed.sheet) - g(pure.sheet) / 0.98)).toBeLessThan(1e-9);

    const bad = await buildRecipeTable(port, { ...defaultInput(), purityPercent: '120' }, { version: '0.1.0' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors.purityPercent).toMatch(/Form purity \(%\) is 120; allowed: 1 to 100 %/);
  });

  test('misspelt or mismatched names: the library nearest names under each field, and nothing written', async () => {
    const { book, port } = setup();
    const result = await buildRecipeTable(port, { ...defaultInput(), buffer: 'HEPSE', titrant: 'NaOHH', salts: 'sodium chlorid 100 mM' }, { version: '0.1.0' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.buffer).toMatch(/^"HEPSE" is not in the substance library; did you mean .*"HEPES"/);
    expect(result.errors.titrant).toMatch(/^"NaOHH" is not in the substance library; did you mean .*"NaOH"/);
    expect(result.errors.salts).toMatch(/did you mean .*"sodium chloride"/);
    expect(book.sheetNames()).toEqual(['Notes']);

    const mismatched = await buildRecipeTable(port, { ...defaultInput(), buffer: 'tris', form: 'HEPES free acid' }, { version: '0.1.0' });
    expect(mismatched.ok).toBe(false);
    if (!mismatched.ok) expect(mismatched.errors.form).toMatch(/^"HEPES free acid" does not contain tris; its forms are .*tris base/);
    const strong = await buildRecipeTable(port, { ...defaultInput(), buffer: 'NaCl' }, { version: '0.1.0' });
    expect(strong.ok).toBe(false);
    if (!strong.ok) expect(strong.errors.buffer).toMatch(/strong electrolyte, not a buffer system/);
    expect(book.sheetNames()).toEqual(['Notes']);
  });

  test('your substances: read from the workbook, a range without a sheet taken on the active sheet and written sheet-qualified', async () => {
    const header = [
      'name',
      'charge of most protonated form',
      'pKa list',
      'ΔH list kJ/mol',
      'ΔCp list J/(K·mol)',
      'form name',
      'molar mass g/mol',
      'counter-ions',
      'protons lost',
      'formula',
    ];
    const book = new PreviewWorkbook(
      createFormulaEngine({
        'Lab substances': [header, ['Lab amine', 1, '7.85', '40', '', 'Lab amine base', 131.2, '', '', ''], ['lab amine', '', '', '', '', 'Lab amine HCl', 167.6, 'Cl-', '', '']],
      }),
    );
    let active = 'Lab substances';
    const port = new PreviewAdapter(
      book,
      () => ({ sheet: active, range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }),
      (s) => (active = s),
    );
    const input = {
      ...defaultInput(),
      buffer: 'Lab amine',
      form: 'Lab amine base',
      titrant: 'HCl',
      phMode: 'list' as const,
      phList: '7.6',
      useTemperaturesC: '25',
      userSubstances: 'A1:J3',
    };
    const result = await buildRecipeTable(port, input, { version: '0.1.0', now: NOW });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(book.value(result.sheet, settingRow('Your substances'), SETTING_VALUE_COL)).toBe("'Lab substances'!A1:J3");
    expect(book.formula(result.sheet, LAYOUT.firstDataRow, COL.formGrams)).toContain("'Lab substances'!A1:J3");
    // 25 mM of a 131.2 g/mol base in 1 L: 3.28 g; the row's check solves back to its target.
    expect(book.value(result.sheet, LAYOUT.firstDataRow, COL.formGrams) as number).toBeCloseTo(3.28, 2);
    expect(Math.abs((book.value(result.sheet, LAYOUT.firstDataRow, COL.check) as number) - 7.6)).toBeLessThan(0.001);

    const missing = await buildRecipeTable(port, { ...input, userSubstances: "'No such sheet'!A1:J3" }, { version: '0.1.0' });
    expect(missing.ok).toBe(false);
    if (!missing.ok) expect(missing.errors.userSubstances).toBe('There is no sheet named "No such sheet" in this workbook.');
  });

  test('bad input: messages per field and nothing written', async () => {
    const { book, port } = setup();
    const result = await buildRecipeTable(port, { ...defaultInput(), phStart: '8', phStop: '7', volumeMl: 'lots', useTemperaturesC: '4; 140' }, { version: '0.1.0' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.phStop).toMatch(/not be below the first/);
    expect(result.errors.volumeMl).toMatch(/must be a number/);
    expect(result.errors.useTemperaturesC).toMatch(/temperature of use is 140; allowed: 0 to 100 °C/);
    expect(book.sheetNames()).toEqual(['Notes']);
  });

  test('a second table gets a new sheet name, never the first one', async () => {
    const { book, port } = setup();
    const a = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW });
    const b = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW });
    if (!a.ok || !b.ok) throw new Error('not built');
    expect(b.sheet).toBe(`${a.sheet} (2)`);
    expect(book.sheetNames()).toHaveLength(5); // two tables, each with its protocol sheet
  });

  test('values copy: numbers without formulas, under a provenance block', async () => {
    const { book, port } = setup();
    const built = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW });
    if (!built.ok) throw new Error('not built');
    const copy = await valuesCopy(port, { version: '0.1.0', now: NOW, sourceSheet: built.sheet });
    expect(copy.sheet).toBe(`${built.sheet} values`);
    const text = (r: number, c: number) => book.value(copy.sheet, r, c);
    expect(text(1, 1)).toBe('Proton Ledger 0.1.0');
    expect(text(2, 1)).toBe('pitzer');
    expect(text(4, 1)).toBe('4; 25');
    expect(String(text(5, 1))).toMatch(/HEPES: HEPES \(goldberg2002/);
    const gramsCopy = book.value(copy.sheet, 9 + LAYOUT.firstDataRow, COL.formGrams);
    expect(gramsCopy).toBeCloseTo(book.value(built.sheet, LAYOUT.firstDataRow, COL.formGrams) as number, 9);
    expect(book.formula(copy.sheet, 9 + LAYOUT.firstDataRow, COL.formGrams)).toBeUndefined();
    // The table's note about live formulas is not copied: a copy says it holds values only.
    const notes = book.values(copy.sheet, { row: 9, col: 0, rowCount: 3, colCount: 1 }).map((r) => String(r[0]));
    expect(notes.join(' ')).not.toMatch(/live PROTON formula/);
    expect(notes.join(' ')).toMatch(/Values only/);
  });

  test('every route (issue 17, item 1): a 10× stock, two forms and several salts, and a salt to a target, each row the planner’s', async () => {
    const { book, port } = setup();
    const stock = await buildRecipeTable(
      port,
      {
        ...defaultInput(),
        buffer: 'MES',
        form: 'MES free acid',
        route: 'stock',
        stockFold: '10',
        stockVolumeMl: '100 mL',
        titrantStockM: '10',
        phMode: 'list',
        phList: '6.0',
        useTemperaturesC: '25',
        concentrationsMm: '50',
        salts: '',
      },
      { version: '0.1.0', now: NOW },
    );
    if (!stock.ok) throw new Error(JSON.stringify(stock));
    const row = LAYOUT.firstDataRow;
    const plan = planRecipe({
      buffer: 'MES',
      targetPh: 6.0,
      concentrationMm: 50,
      volumeMl: 1000,
      useTemperatureC: 25,
      route: 'stock',
      form: 'MES free acid',
      titrant: { form: 'NaOH', concentrationM: 10 },
      stock: { fold: 10, volumeMl: 100 },
      benchTemperatureC: 22,
      partVolumeFraction: 0.8,
    });
    expect(Math.abs((book.value(stock.sheet, row, COL.titrantMl) as number) - plan.titration!.volumeMl)).toBeLessThan(1e-9);
    expect(Math.abs((book.value(stock.sheet, row, COL.meter) as number) - plan.meter.pH)).toBeLessThan(1e-9);
    expect(book.value(stock.sheet, row, COL.stockPerBatchMl)).toBe(100);
    expect(stock.sheet).toMatch(/10x stock pH 6$/);

    const two = await buildRecipeTable(
      port,
      {
        ...defaultInput(),
        buffer: 'phosphate',
        route: 'two-forms',
        acidForm: 'NaH2PO4·H2O',
        baseForm: 'sodium phosphate dibasic heptahydrate',
        salts: 'NaCl 137 mM; KCl 2.7 mM',
        phMode: 'list',
        phList: '7.4',
        useTemperaturesC: '25',
        concentrationsMm: '10',
      },
      { version: '0.1.0', now: NOW },
    );
    if (!two.ok) throw new Error(JSON.stringify(two));
    // The settings show the forms as the library names them, not as typed.
    expect(book.value(two.sheet, settingRow('Acid form'), SETTING_VALUE_COL)).toBe('sodium phosphate monobasic monohydrate');
    const twoPlan = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.4,
      concentrationMm: 10,
      volumeMl: 1000,
      useTemperatureC: 25,
      route: 'two-forms',
      acidForm: 'sodium phosphate monobasic monohydrate',
      baseForm: 'sodium phosphate dibasic heptahydrate',
      salts: [
        { form: 'sodium chloride', concentrationMm: 137 },
        { form: 'potassium chloride', concentrationMm: 2.7 },
      ],
      benchTemperatureC: 22,
    });
    expect(Math.abs((book.value(two.sheet, row, COL.baseFormGrams) as number) - twoPlan.components.find((c) => c.role === 'base form')!.grams!)).toBeLessThan(1e-9);
    expect(Math.abs((book.value(two.sheet, row, COL.ionicStrength) as number) - twoPlan.predictions.ionicStrengthM * 1000)).toBeLessThan(1e-9);
    expect(book.value(two.sheet, SALTS_BLOCK.row + 2, SALTS_BLOCK.col)).toBe('potassium chloride');

    const target = await buildRecipeTable(
      port,
      {
        ...defaultInput(),
        salts: '',
        saltTargetGoal: 'idealOsmolarityMosm',
        saltTargetForm: 'NaCl',
        saltTargetValue: '300',
        phMode: 'list',
        phList: '7.4',
        useTemperaturesC: '25',
      },
      { version: '0.1.0', now: NOW },
    );
    if (!target.ok) throw new Error(JSON.stringify(target));
    expect(Math.abs((book.value(target.sheet, row, COL.osmolarity) as number) - 300)).toBeLessThan(0.01);
    expect(book.value(target.sheet, row, COL.saltTargetGrams) as number).toBeGreaterThan(0);
  });

  test('rows that cannot be made (issue 17, item 4): listed with the planner’s code before anything is written; dropped on request', async () => {
    const { book, port } = setup();
    // KH2PO4 already reads about pH 4.5: HCl cannot bring it up to 6.8, but 3.5 is within reach.
    const input = { ...defaultInput(), buffer: 'phosphate', form: 'KH2PO4', titrant: 'HCl', phMode: 'list', phList: '3.5; 6.8', useTemperaturesC: '25', salts: '' };
    const asked = await buildRecipeTable(port, input, { version: '0.1.0', now: NOW });
    expect(asked.ok).toBe(false);
    if (asked.ok) return;
    expect(asked.unmakeable!.map((f) => [f.index, f.row.targetPh, f.code])).toEqual([[2, 6.8, 'unreachablePh']]);
    expect(book.sheetNames()).toEqual(['Notes']);
    const dropped = await buildRecipeTable(port, input, { version: '0.1.0', now: NOW, unmakeable: 'drop' });
    if (!dropped.ok) throw new Error('not built');
    expect(dropped.rows).toBe(1);
    expect(book.value(dropped.sheet, LAYOUT.firstDataRow, COL.targetPh)).toBe(3.5);
    expect(typeof book.value(dropped.sheet, LAYOUT.firstDataRow, COL.titrantMl)).toBe('number');
  });

  test('the protocol of any row is live (issue 17, item 2): it follows the row number and an edit of that row', async () => {
    const { book, port } = setup();
    const built = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW });
    if (!built.ok) throw new Error('not built');
    const meterLine = () => {
      const lines = book.values(built.protocolSheet, { row: PROTOCOL_FIRST_ROW, col: 0, rowCount: 48, colCount: 4 });
      return lines.find((l) => l[0] === 'meter')![2] as number;
    };
    await showProtocol(port, 3, built.sheet);
    const third = LAYOUT.firstDataRow + 2;
    expect(Math.abs(meterLine() - (book.value(built.sheet, third, COL.meter) as number))).toBeLessThan(1e-9);
    book.setContents(built.sheet, third, COL.targetPh, [[7.3]]);
    expect(Math.abs(meterLine() - (book.value(built.sheet, third, COL.meter) as number))).toBeLessThan(1e-9);
    expect(book.formula(built.protocolSheet, PROTOCOL_FIRST_ROW, 0)).toMatch(/^=PROTON\.RECIPE\(/);
    await expect(showProtocol(port, 99, built.sheet)).rejects.toThrow(/from 1 to 8/);
  });

  test('a build can be stopped between slices; progress reports planning, then writing', async () => {
    const { book, port } = setup();
    const phases: string[] = [];
    let slices = 0;
    const stopped = await buildRecipeTable(
      port,
      { ...defaultInput(), phStep: '0.01' },
      {
        version: '0.1.0',
        onProgress: (_d, _t, phase) => phases.push(phase),
        yieldToPage: async () => void slices++,
        cancelled: () => slices >= 2,
      },
    );
    expect(stopped.ok).toBe(false);
    if (!stopped.ok) expect(stopped.cancelled).toBe(true);
    expect(phases[0]).toBe('planning');
    expect(book.sheetNames()).toEqual(['Notes']);
  });

  test('a name that leaves the hydrate open is not resolved silently (issue 17, item 5): the pane asks which form is on the shelf', async () => {
    const { book, port } = setup();
    const asked = await buildRecipeTable(
      port,
      { ...defaultInput(), buffer: 'phosphate', route: 'two-forms', acidForm: 'NaH2PO4·H2O', baseForm: 'sodium phosphate dibasic', salts: 'calcium chloride 1 mM' },
      { version: '0.1.0', now: NOW },
    );
    expect(asked.ok).toBe(false);
    if (asked.ok) return;
    expect(asked.errors.baseForm).toMatch(
      /sodium phosphate dibasic anhydrous, 141\.9\d g\/mol.*sodium phosphate dibasic heptahydrate, 268\.0\d g\/mol.*name the one on your shelf/,
    );
    expect(asked.errors.salts).toMatch(/calcium chloride dihydrate/);
    expect(asked.errors.acidForm).toBeUndefined();
    expect(book.sheetNames()).toEqual(['Notes']);
  });

  test('a titrant of the buffer itself (issue 17, item 6): the row states the total it makes; the "hold" setting weighs less instead', async () => {
    const { book, port } = setup();
    const built = await buildRecipeTable(
      port,
      {
        ...defaultInput(),
        buffer: 'acetate',
        form: 'sodium acetate trihydrate',
        titrant: 'acetic acid',
        phMode: 'list',
        phList: '4.6',
        useTemperaturesC: '25',
        concentrationsMm: '100',
        salts: '',
      },
      { version: '0.1.0', now: NOW },
    );
    if (!built.ok) throw new Error(JSON.stringify(built));
    const row = LAYOUT.firstDataRow;
    expect(String(book.value(built.sheet, row, COL.warnings))).toMatch(
      /is itself a form of acetate: the finished buffer holds \d+(\.\d+)? mM acetate in all, not the 100 mM stated/,
    );
    const stated = book.value(built.sheet, row, COL.formGrams) as number;
    book.setContents(built.sheet, settingRow('Titrant of the buffer'), SETTING_VALUE_COL, [['hold']]);
    expect(String(book.value(built.sheet, row, COL.warnings))).not.toMatch(/is itself a form of acetate/);
    expect(book.value(built.sheet, row, COL.formGrams) as number).toBeLessThan(stated);
  });

  test('the chart’s usable band is the planner’s one buffering criterion (issue 17, item 7): pKa′ at the first row’s temperature and ionic strength ± BUFFERING_HALF_WIDTH', async () => {
    const { book, port } = setup();
    const built = await buildRecipeTable(port, defaultInput(), { version: '0.1.0', now: NOW });
    if (!built.ok) throw new Error('not built');
    const band = book.charts(built.sheet)[1].xBand!;
    const edges = book.values(built.sheet, band.x).map((r) => r[0] as number);
    const row = LAYOUT.firstDataRow;
    const pKaPrime = pka('HEPES', 1, book.value(built.sheet, row, COL.useTemperatureC), book.value(built.sheet, row, COL.ionicStrength), defaultInput().activityModel);
    expect(Math.abs(edges[0] - (pKaPrime - BUFFERING_HALF_WIDTH))).toBeLessThan(1e-12);
    expect(Math.abs(edges[3] - (pKaPrime + BUFFERING_HALF_WIDTH))).toBeLessThan(1e-12);
    expect(band.label).toContain(`± ${BUFFERING_HALF_WIDTH}`);
  });

  test('sheet names keep the decimals of the pH series (issue 17, item 9)', async () => {
    const { port } = setup();
    const built = await buildRecipeTable(port, { ...defaultInput(), phStart: '6.6', phStop: '7.0', phStep: '0.2', useTemperaturesC: '25' }, { version: '0.1.0', now: NOW });
    if (!built.ok) throw new Error('not built');
    expect(built.sheet).toBe('HEPES 25 mM pH 6.6–7.0');
  });
});

describe('form checks', () => {
  test('typed pH list with decimal commas and semicolons', () => {
    const c = checkForm({ ...defaultInput(), phMode: 'list', phList: '7,2; 7,4; 7.6' });
    expect(c.ok && c.request.targetPhs).toEqual([7.2, 7.4, 7.6]);
  });
  test('start/stop/step series is inclusive and rounded to the step', () => {
    const c = checkForm({ ...defaultInput(), phStart: '6.8', phStop: '7.4', phStep: '0.1' });
    expect(c.ok && c.request.targetPhs).toEqual([6.8, 6.9, 7, 7.1, 7.2, 7.3, 7.4]);
  });
  test('too many rows is refused with the count', () => {
    const c = checkForm({ ...defaultInput(), phStart: '1', phStop: '13', phStep: '0.01', useTemperaturesC: '4; 25' });
    expect(!c.ok && c.errors.phStep).toMatch(/2402 rows/);
  });
  test('blank required fields name what to give', () => {
    const c = checkForm({ ...defaultInput(), buffer: ' ', titrantStockM: '' });
    expect(!c.ok && c.errors.buffer).toBe('Give a buffer system.');
    expect(!c.ok && c.errors.titrantStockM).toBe('Give the titrant stock concentration.');
  });
  test('a salt without an amount is refused with the reader’s code', () => {
    const c = checkForm({ ...defaultInput(), salts: 'NaCl' });
    expect(!c.ok && c.codes.salts).toBe('notANumber');
  });
  test('a salt target needs its salt and a value in the goal’s declared range', () => {
    const c = checkForm({ ...defaultInput(), saltTargetGoal: 'ionicStrengthM', saltTargetForm: '', saltTargetValue: '9' });
    expect(!c.ok && c.errors.saltTargetForm).toMatch(/Name the salt/);
    expect(!c.ok && c.codes.saltTargetValue).toBe('outOfRange');
  });
});

describe('the settings block is the row formulas’ options range', () => {
  it('every option setting’s label is a declared recipe option (src/chem/input), so RECIPE.ROW reads the block as it stands', () => {
    const { recipeFieldOf } = jest.requireActual('../../src/chem/input') as typeof import('../../src/chem/input');
    const { OPTION_SETTINGS } = jest.requireActual('../../src/taskpane/recipeTable') as typeof import('../../src/taskpane/recipeTable');
    for (const label of OPTION_SETTINGS) expect(recipeFieldOf(label).label).toBe(label);
  });
});

describe('the table’s result columns are RECIPE.ROW’s spill', () => {
  it('has one header, one COL entry and one number format per RECIPE.ROW column, in its order, the charts clear of the warnings', () => {
    const { RECIPE_ROW_HEADER } = jest.requireActual('../../src/functions/recipeRow') as typeof import('../../src/functions/recipeRow');
    expect(LAYOUT.columns).toHaveLength(COL.formGrams + RECIPE_ROW_HEADER.length);
    expect(COL.warnings).toBe(COL.formGrams + RECIPE_ROW_HEADER.indexOf('warnings'));
    expect(COL.osmolality).toBe(COL.formGrams + RECIPE_ROW_HEADER.indexOf('osmolality (mOsm/kg)'));
    expect(COL.conductivity).toBe(COL.formGrams + RECIPE_ROW_HEADER.indexOf('conductivity at use temp. (mS/cm)'));
    expect(COL.conductivity25).toBe(COL.formGrams + RECIPE_ROW_HEADER.indexOf('conductivity at 25 °C (mS/cm)'));
    expect(COL.saltTargetGrams).toBe(COL.formGrams + RECIPE_ROW_HEADER.indexOf('salt to target (g)'));
    expect(COL.stockPerBatchMl).toBe(COL.formGrams + RECIPE_ROW_HEADER.indexOf('stock per batch (mL)'));
    expect(LAYOUT.chartCol).toBeGreaterThan(COL.warnings);
  });
});
