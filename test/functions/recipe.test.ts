import { planRecipe } from '../../src/chem/planner';
import { RECIPE_ROW_HEADER, RECIPE_TABLE_ROWS, recipe, recipeRow, spillShape } from '../../src/functions/functions';
import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { errorOf } from './errorOf';

/** The sheet functions call the planner; their numbers are the planner's, unrounded. */
const SAME = 1e-12;
/** A RECIPE.ROW column by its header. */
const col = (name: (typeof RECIPE_ROW_HEADER)[number]) => RECIPE_ROW_HEADER.indexOf(name);

describe('RECIPE.ROW', () => {
  const options = [
    ['form', 'HEPES free acid'],
    ['titrant', 'NaOH'],
    ['titrant.concentrationM', 1],
    ['benchTemperatureC', 22],
    ['partVolumeFraction', 0.8],
  ];
  const row = () => recipeRow('HEPES', 7.4, 25, 500, 4, [['NaCl', 150]], options);
  /** The same recipe planned by the core: the row must carry its numbers. */
  const plan = planRecipe({
    buffer: 'HEPES',
    targetPh: 7.4,
    concentrationMm: 25,
    volumeMl: 500,
    form: 'HEPES free acid',
    titrant: { form: 'NaOH', concentrationM: 1 },
    useTemperatureC: 4,
    benchTemperatureC: 22,
    partVolumeFraction: 0.8,
    salts: [{ form: 'NaCl', concentrationMm: 150 }],
  });

  it("gives the planner's grams, titrant band, meter reading and predictions in the header's order", () => {
    const [r] = row();
    expect(r).toHaveLength(RECIPE_ROW_HEADER.length);
    expect(Math.abs((r[col('form (g)')] as number) - plan.components[0].grams!)).toBeLessThan(SAME);
    expect(Math.abs((r[col('titrant (mL)')] as number) - plan.titration!.volumeMl)).toBeLessThan(SAME);
    expect(r[col('titrant low (mL)')] as number).toBeLessThan(r[col('titrant (mL)')] as number);
    expect(r[col('titrant high (mL)')] as number).toBeGreaterThan(r[col('titrant (mL)')] as number);
    expect(Math.abs((r[col('meter reads (pH)')] as number) - plan.meter.pH)).toBeLessThan(SAME);
    expect(Math.abs((r[col('pH at use')] as number) - 7.4)).toBeLessThan(0.001);
    expect(r[col('warnings')]).toBe('');
  });

  it("gives the planner's osmolality and conductivity at the temperature of use and at 25 °C, the cold one reading lower", () => {
    const [r] = row();
    expect(Math.abs((r[col('osmolality (mOsm/kg)')] as number) - plan.predictions.osmolalityMosmKg)).toBeLessThan(SAME);
    expect(Math.abs((r[col('conductivity at use temp. (mS/cm)')] as number) - plan.predictions.conductivityMsPerCm)).toBeLessThan(SAME);
    expect(Math.abs((r[col('conductivity at 25 °C (mS/cm)')] as number) - plan.predictions.conductivity25MsPerCm)).toBeLessThan(SAME);
    // Ions move slower in cold water: κ at 4 °C is well below κ at 25 °C (about 2 % per °C, CRC).
    expect(r[col('conductivity at use temp. (mS/cm)')] as number).toBeLessThan(0.7 * (r[col('conductivity at 25 °C (mS/cm)')] as number));
    // Osmolality sits below the ideal osmolarity (osmotic coefficient below 1).
    expect(r[col('osmolality (mOsm/kg)')] as number).toBeLessThan(r[col('ideal osmolarity (mOsm/L)')] as number);
  });

  it('accepts numbers as text, blank optional arguments and mixed-case names', () => {
    const [r] = recipeRow(
      'hepes',
      '7,4',
      '25 mM',
      '0.5 L',
      null,
      undefined,
      [
        ['Form weighed', 'hepes FREE acid'],
        ['', ''],
      ],
      undefined,
    );
    expect(Math.abs((r[col('pH at use')] as number) - 7.4)).toBeLessThan(0.001);
  });

  it('carries warnings as text', () => {
    const [r] = recipeRow('HEPES', 9.3, 25, 500, '', undefined, [
      ['form', 'HEPES free acid'],
      ['titrant', 'NaOH'],
    ]);
    const plan = planRecipe({ buffer: 'HEPES', targetPh: 9.3, concentrationMm: 25, volumeMl: 500, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } });
    expect(plan.warnings.map((w) => w.code)).toContain('weakBuffering');
    expect(r[col('warnings')]).toBe(plan.warnings.map((w) => w.message).join(' '));
  });

  it('weighs more of a form that is less than pure: the same grams for 0.98, 98 and "98%", pure grams ÷ 0.98', () => {
    const mes = [
      ['form', 'MES free acid'],
      ['titrant', 'NaOH'],
    ];
    const pure = recipeRow('MES', 6.1, 20, 1000, '', undefined, mes)[0];
    for (const purity of [0.98, 98, '98%']) {
      const [r] = recipeRow('MES', 6.1, 20, 1000, '', undefined, [...mes, ['formPurityPercent', purity]]);
      expect(Math.abs((r[col('form (g)')] as number) - (pure[col('form (g)')] as number) / 0.98)).toBeLessThan(1e-9);
      // The chemistry is the same: only the mass weighed changes.
      expect(r[col('titrant (mL)')]).toBe(pure[col('titrant (mL)')]);
      expect(r[col('meter reads (pH)')]).toBe(pure[col('meter reads (pH)')]);
    }
    expect(errorOf(() => recipeRow('MES', 6.1, 20, 1000, '', undefined, [...mes, ['Form purity (%)', 150]]))).toMatchObject({ code: 'outOfRange', field: 'Form purity (%)' });
  });

  it('gives every route: two forms (acid and base grams, no titrant), a stock (its own meter reading, stock per batch), a salt to a target (its grams)', () => {
    const pair = [
      ['route', 'two-forms'],
      ['acidForm', 'sodium phosphate monobasic monohydrate'],
      ['baseForm', 'sodium phosphate dibasic heptahydrate'],
    ];
    const two = planRecipe({
      buffer: 'phosphate',
      targetPh: 7.0,
      concentrationMm: 100,
      volumeMl: 1000,
      route: 'two-forms',
      acidForm: 'sodium phosphate monobasic monohydrate',
      baseForm: 'sodium phosphate dibasic heptahydrate',
    });
    const [r2] = recipeRow('phosphate', 7.0, 100, 1000, '', undefined, pair);
    expect(Math.abs((r2[col('form (g)')] as number) - two.components.find((c) => c.role === 'acid form')!.grams!)).toBeLessThan(SAME);
    expect(Math.abs((r2[col('base form (g)')] as number) - two.components.find((c) => c.role === 'base form')!.grams!)).toBeLessThan(SAME);
    expect(r2[col('titrant (mL)')]).toBe(0);
    const stockOptions = [
      ['route', 'stock'],
      ['form', 'MES free acid'],
      ['titrant', 'NaOH'],
      ['titrant.concentrationM', 10],
      ['stock.fold', 10],
      ['stock.volumeMl', 200],
    ];
    const stock = planRecipe({
      buffer: 'MES',
      targetPh: 6.0,
      concentrationMm: 50,
      volumeMl: 1000,
      route: 'stock',
      form: 'MES free acid',
      titrant: { form: 'NaOH', concentrationM: 10 },
      stock: { fold: 10, volumeMl: 200 },
    });
    const [rs] = recipeRow('MES', 6.0, 50, 1000, '', undefined, stockOptions);
    expect(Math.abs((rs[col('meter reads (pH)')] as number) - stock.meter.pH)).toBeLessThan(SAME);
    expect(rs[col('stock per batch (mL)')]).toBe(100);
    // On the stock route the conductivity columns are the working dilution's, not the stock's.
    expect(Math.abs((rs[col('conductivity at 25 °C (mS/cm)')] as number) - stock.predictions.conductivity25MsPerCm)).toBeLessThan(SAME);
    expect(rs[col('conductivity at 25 °C (mS/cm)')] as number).toBeLessThan(stock.stock!.stockConductivity25MsPerCm);
    expect(Math.abs((rs[col('titrant (mL)')] as number) - stock.titration!.volumeMl)).toBeLessThan(SAME);
    const [rt] = recipeRow('HEPES', 7.4, 25, 500, '', undefined, [
      ['saltTarget.form', 'NaCl'],
      ['saltTarget.ionicStrengthM', 0.15],
    ]);
    const target = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 500, saltTarget: { form: 'NaCl', ionicStrengthM: 0.15 } });
    expect(Math.abs((rt[col('salt to target (g)')] as number) - target.components.find((c) => c.toTarget)!.grams!)).toBeLessThan(SAME);
    expect(Math.abs((rt[col('ionic strength (mM)')] as number) - 150)).toBeLessThan(0.01);
    expect(r2[col('salt to target (g)')]).toBe('');
  });

  it('names the argument on bad input', () => {
    expect(errorOf(() => recipeRow('HEPES', 15, 25, 500))).toMatchObject({ kind: 'value', code: 'outOfRange', field: 'targetPh' });
    expect(errorOf(() => recipeRow('HEPES', 7.4, 25, 500, 25, [['NaCl', 'lots']]))).toMatchObject({ kind: 'value', code: 'notANumber', field: 'salts row 1 (mM)' });
    expect(errorOf(() => recipeRow('HEPES', 7.4, 25, 500, '', undefined, [['titrant.concentrationM', 25]]))).toMatchObject({
      kind: 'value',
      code: 'outOfRange',
      field: 'titrant.concentrationM',
    });
  });

  it('reads an options range: names or labels, blank rows skipped, an unknown name gets "did you mean", a repeat is refused', () => {
    const byName = recipeRow('HEPES', 7.4, 25, 500, 4, undefined, [
      ['form', 'HEPES free acid'],
      ['benchTemperatureC', '22 °C'],
    ]);
    const byLabel = recipeRow('HEPES', 7.4, 25, 500, 4, undefined, [
      ['Form weighed', 'HEPES free acid'],
      ['', ''],
      ['Bench temp. (°C)', 22],
    ]);
    expect(byLabel).toEqual(byName);
    const unknown = errorOf(() => recipeRow('HEPES', 7.4, 25, 500, '', undefined, [['benchTemperatureF', 70]]));
    expect(unknown).toMatchObject({ kind: 'value', code: 'unknownField', field: 'benchTemperatureF' });
    expect(unknown.message).toContain('benchTemperatureC');
    expect(
      errorOf(() =>
        recipeRow('HEPES', 7.4, 25, 500, '', undefined, [
          ['form', 'HEPES free acid'],
          ['Form weighed', 'HEPES free acid'],
        ]),
      ),
    ).toMatchObject({ code: 'givenTwice', field: 'Form weighed' });
    expect(errorOf(() => recipeRow('HEPES', 7.4, 25, 500, 4, undefined, [['useTemperatureC', 4]]))).toMatchObject({ code: 'givenTwice', field: 'useTemperatureC' });
    expect(errorOf(() => recipeRow('HEPES', 7.4, 25, 500, '', undefined, [['targetPh', 7]]))).toMatchObject({ code: 'givenTwice', field: 'targetPh' });
    expect(errorOf(() => recipeRow('HEPES', 7.4, 25, 500, '', undefined, [['form']]))).toMatchObject({ code: 'tooFewColumns', field: 'options' });
  });
});

describe('RECIPE', () => {
  it('spills one row per line (at most 48) × 4 with amounts, meter reading, steps and cautions, and no blank padding', () => {
    const rows = recipe('tris', 8.0, 50, 1000, 4, undefined, [
      ['form', 'tris base'],
      ['titrant', 'HCl'],
      ['titrant.concentrationM', 6],
      ['benchTemperatureC', 25],
    ]);
    expect(rows.length).toBeLessThanOrEqual(RECIPE_TABLE_ROWS);
    expect(rows.every((r) => r.length === 4)).toBe(true);
    expect(rows.some((r) => r.every((cell) => cell === ''))).toBe(false);
    const sections = rows.map((r) => r[0]);
    for (const s of ['amount', 'meter', 'titrant', 'predicted', 'step', 'caution']) expect(sections).toContain(s);
    const meter = rows.find((r) => r[0] === 'meter')!;
    // Tris adjusted at 25 °C for use at 4 °C reads well below target on the bench (common practice).
    expect(meter[2] as number).toBeLessThan(7.6);
    expect(
      rows
        .filter((r) => r[0] === 'caution')
        .map((r) => r[2])
        .join(' '),
    ).toMatch(/hydrochloric acid: corrosive/);
  });

  it("lists the planner's predicted conductivity at the temperature of use and at 25 °C", () => {
    const plan = planRecipe({
      buffer: 'tris',
      targetPh: 8.0,
      concentrationMm: 50,
      volumeMl: 1000,
      form: 'tris base',
      titrant: { form: 'HCl', concentrationM: 6 },
      useTemperatureC: 4,
      benchTemperatureC: 25,
    });
    const rows = recipe('tris', 8.0, 50, 1000, 4, undefined, [
      ['form', 'tris base'],
      ['titrant', 'HCl'],
      ['titrant.concentrationM', 6],
      ['benchTemperatureC', 25],
    ]);
    const atUse = rows.find((r) => r[1] === 'conductivity at 4 °C')!;
    const at25 = rows.find((r) => r[1] === 'conductivity at 25 °C')!;
    expect(Math.abs((atUse[2] as number) - plan.predictions.conductivityMsPerCm)).toBeLessThan(SAME);
    expect(Math.abs((at25[2] as number) - plan.predictions.conductivity25MsPerCm)).toBeLessThan(SAME);
    expect(atUse[3]).toBe('mS/cm');
  });

  it('weighs two forms when given "acid form + base form"', () => {
    const rows = recipe('phosphate', 7.0, 100, 1000, '', undefined, [['form', 'NaH2PO4·H2O + Na2HPO4·7H2O']]);
    const amounts = rows.filter((r) => r[0] === 'amount' && r[3] === 'g');
    expect(amounts).toHaveLength(2);
    expect(rows.some((r) => r[0] === 'titrant')).toBe(false);
  });

  it('applies one purity to both forms of a pair and says so in the weighing step', () => {
    const pair = [['form', 'NaH2PO4·H2O + Na2HPO4·7H2O']];
    const pure = recipe('phosphate', 7.0, 100, 1000, '', undefined, pair).filter((r) => r[0] === 'amount' && r[3] === 'g');
    const rows = recipe('phosphate', 7.0, 100, 1000, '', undefined, [...pair, ['formPurityPercent', '99%']]);
    const amounts = rows.filter((r) => r[0] === 'amount' && r[3] === 'g');
    amounts.forEach((a, i) => expect(Math.abs((a[2] as number) - (pure[i][2] as number) / 0.99)).toBeLessThan(1e-9));
    expect(rows.find((r) => r[0] === 'step' && r[1] === '1')![2]).toMatch(/99 % pure.*99 % pure/);
  });

  it('has a spill shape every host can know from the arguments', () => {
    expect(spillShape('RECIPE', [1, 1, 1, 1])).toEqual({ rows: 48, columns: 4 });
    expect(spillShape('RECIPE.ROW', [1, 1, 1, 1])).toEqual({ rows: 1, columns: RECIPE_ROW_HEADER.length });
  });
});

describe('recipe functions through the formula engine', () => {
  it('RECIPE.ROW spills across a row and its pH at use solves back to the target', () => {
    const hf = createFormulaEngine({
      Sheet1: [['NaCl', 150, null, 'form', 'HEPES free acid'], [null, null, null, 'benchTemperatureC', 22], ['=PROTON.RECIPE.ROW("HEPES", 7.4, 25, 500, 4, A1:B1, D1:E2)']],
    });
    const phAtUse = hf.getCellValue({ sheet: 0, row: 2, col: col('pH at use') }) as number;
    expect(Math.abs(phAtUse - 7.4)).toBeLessThan(0.001);
    expect(typeof hf.getCellValue({ sheet: 0, row: 2, col: col('meter reads (pH)') })).toBe('number');
  });

  it('RECIPE spills 48 rows', () => {
    const hf = createFormulaEngine({
      Sheet1: [
        ['form', 'MES free acid', null, '=PROTON.RECIPE("MES", 6.0, 20, 250, , , A1:B2)'],
        ['titrant', 'NaOH'],
      ],
    });
    expect(hf.getCellValue({ sheet: 0, row: 0, col: 3 })).toBe('section');
    expect(hf.getCellValue({ sheet: 0, row: 47, col: 3 })).toBe('');
    expect(hf.getCellValue({ sheet: 0, row: 2, col: 4 })).toMatch(/buffer: MES free acid/);
  });
});
