import { planRecipe } from '../../src/chem/planner';
import { RECIPE_ROW_HEADER, RECIPE_TABLE_ROWS, recipe, recipeRow, spillShape } from '../../src/functions/functions';
import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { SheetError } from '../../src/functions/errors';

/** The sheet functions call the planner; their numbers are the planner's, unrounded. */
const SAME = 1e-12;

describe('RECIPE.ROW', () => {
  const row = () => recipeRow('HEPES', 7.4, 25, 500, 'HEPES free acid', 'NaOH', 1, 4, 22, 0.8, [['NaCl', 150]]);

  it('gives the planner\'s grams, titrant band, meter reading and predictions in the header\'s order', () => {
    const plan = planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 500, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 }, useTemperatureC: 4, benchTemperatureC: 22, partVolumeFraction: 0.8, salts: [{ form: 'NaCl', concentrationMm: 150 }] });
    const [r] = row();
    expect(r).toHaveLength(RECIPE_ROW_HEADER.length);
    expect(Math.abs((r[0] as number) - plan.components[0].grams!)).toBeLessThan(SAME);
    expect(Math.abs((r[1] as number) - plan.titration!.volumeMl)).toBeLessThan(SAME);
    expect(r[2] as number).toBeLessThan(r[1] as number);
    expect(r[3] as number).toBeGreaterThan(r[1] as number);
    expect(Math.abs((r[4] as number) - plan.meter.pH)).toBeLessThan(SAME);
    expect(Math.abs((r[5] as number) - 7.4)).toBeLessThan(0.001);
    expect(r[10]).toBe('');
  });

  it('accepts numbers as text, blank optional arguments and mixed-case names', () => {
    const [r] = recipeRow('hepes', '7.4', '25', '500', 'hepes FREE acid', null, null, null, null, null, undefined, null, undefined);
    expect(Math.abs((r[5] as number) - 7.4)).toBeLessThan(0.001);
  });

  it('carries warnings as text', () => {
    const [r] = recipeRow('HEPES', 9.3, 25, 500, 'HEPES free acid', 'NaOH', 1);
    expect(r[10]).toMatch(/buffer weakly/);
  });

  it('weighs more of a form that is less than pure: the same grams for 0.98, 98 and "98%", pure grams ÷ 0.98', () => {
    const pure = recipeRow('MES', 6.1, 20, 1000, 'MES free acid', 'NaOH', 1)[0];
    for (const purity of [0.98, 98, '98%']) {
      const [r] = recipeRow('MES', 6.1, 20, 1000, 'MES free acid', 'NaOH', 1, '', '', '', undefined, '', '', purity);
      expect(Math.abs((r[0] as number) - (pure[0] as number) / 0.98)).toBeLessThan(1e-9);
      // The chemistry is the same: only the mass weighed changes.
      expect(r[1]).toBe(pure[1]);
      expect(r[4]).toBe(pure[4]);
    }
    expect(() => recipeRow('MES', 6.1, 20, 1000, 'MES free acid', 'NaOH', 1, '', '', '', undefined, '', '', 150)).toThrow(/purity is 150/);
  });

  it('names the argument on bad input', () => {
    expect(() => recipeRow('HEPES', 15, 25, 500)).toThrow(/targetPh/);
    expect(() => recipeRow('HEPES', 7.4, 25, 500, 'NaH2PO4 + Na2HPO4')).toThrow(SheetError);
    expect(() => recipeRow('HEPES', 7.4, 25, 500, 'HEPES free acid', 'NaOH', 1, 25, 25, 0.8, [['NaCl', 'lots']])).toThrow(/salts row 1 \(mM\)/);
  });
});

describe('RECIPE', () => {
  it('spills one row per line (at most 48) × 4 with amounts, meter reading, steps and cautions, and no blank padding', () => {
    const rows = recipe('tris', 8.0, 50, 1000, 'tris base', 'HCl', 6, 4, 25);
    expect(rows.length).toBeLessThanOrEqual(RECIPE_TABLE_ROWS);
    expect(rows.every((r) => r.length === 4)).toBe(true);
    expect(rows.some((r) => r.every((cell) => cell === ''))).toBe(false);
    const sections = rows.map((r) => r[0]);
    for (const s of ['amount', 'meter', 'titrant', 'predicted', 'step', 'caution']) expect(sections).toContain(s);
    const meter = rows.find((r) => r[0] === 'meter')!;
    // Tris adjusted at 25 °C for use at 4 °C reads well below target on the bench (common practice).
    expect(meter[2] as number).toBeLessThan(7.6);
    expect(rows.filter((r) => r[0] === 'caution').map((r) => r[2]).join(' ')).toMatch(/hydrochloric acid: corrosive/);
  });

  it('weighs two forms when given "acid form + base form"', () => {
    const rows = recipe('phosphate', 7.0, 100, 1000, 'NaH2PO4·H2O + Na2HPO4·7H2O');
    const amounts = rows.filter((r) => r[0] === 'amount' && r[3] === 'g');
    expect(amounts).toHaveLength(2);
    expect(rows.some((r) => r[0] === 'titrant')).toBe(false);
  });

  it('applies one purity to both forms of a pair and says so in the weighing step', () => {
    const pure = recipe('phosphate', 7.0, 100, 1000, 'NaH2PO4·H2O + Na2HPO4·7H2O').filter((r) => r[0] === 'amount' && r[3] === 'g');
    const rows = recipe('phosphate', 7.0, 100, 1000, 'NaH2PO4·H2O + Na2HPO4·7H2O', '', '', '', '', '', undefined, '', '', '99%');
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
    const hf = createFormulaEngine({ Sheet1: [['NaCl', 150], ['=PROTON.RECIPE.ROW("HEPES", 7.4, 25, 500, "HEPES free acid", "NaOH", 1, 4, 22, 0.8, A1:B1)']] });
    const phAtUse = hf.getCellValue({ sheet: 0, row: 1, col: 5 }) as number;
    expect(Math.abs(phAtUse - 7.4)).toBeLessThan(0.001);
    expect(typeof hf.getCellValue({ sheet: 0, row: 1, col: 4 })).toBe('number');
  });

  it('RECIPE spills 48 rows', () => {
    const hf = createFormulaEngine({ Sheet1: [['=PROTON.RECIPE("MES", 6.0, 20, 250, "MES free acid", "NaOH", 1)']] });
    expect(hf.getCellValue({ sheet: 0, row: 0, col: 0 })).toBe('section');
    expect(hf.getCellValue({ sheet: 0, row: 47, col: 0 })).toBe('');
    expect(hf.getCellValue({ sheet: 0, row: 2, col: 1 })).toMatch(/buffer: MES free acid/);
  });
});
