import { asMade, benchCorrection, plannedAsWeighed } from '../../src/chem/batch';
import { planRecipe } from '../../src/chem/planner';
import { AS_MADE_HEADER, AS_MADE_ROWS, readActualsRange } from '../../src/functions/batch';
import { asMadeCheck, spillShape, titrantNext } from '../../src/functions/functions';
import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { errorOf } from './errorOf';

/** The sheet functions call the core; their numbers are the core's, unrounded. */
const SAME = 1e-12;

/** Our own cold-room HEPES saline: 25 mM, pH 7.4 at 4 °C, 500 mL, adjusted at 22 °C with 1 M NaOH. */
const options = [
  ['form', 'HEPES free acid'],
  ['titrant', 'NaOH'],
  ['benchTemperatureC', 22],
];
const plan = planRecipe({
  buffer: 'HEPES',
  targetPh: 7.4,
  concentrationMm: 25,
  volumeMl: 500,
  useTemperatureC: 4,
  form: 'HEPES free acid',
  titrant: { form: 'NaOH', concentrationM: 1 },
  benchTemperatureC: 22,
  salts: [{ form: 'NaCl', concentrationMm: 150 }],
});
const grams = plannedAsWeighed(plan);

describe('the actuals range', () => {
  it('sorts rows into forms weighed (name, grams, purity) and fields by name or label', () => {
    const r = readActualsRange([
      ['HEPES free acid', '2.98 g', '99.5%'],
      ['Titrant added (mL)', 5.1],
      ['tolerance.ph', 0.1],
      ['reading.temperatureC', 23],
      ['', ''],
      ['actual.finalPh', ''],
    ]);
    expect(r.weighed).toEqual([{ form: 'HEPES free acid', grams: '2.98 g', purityPercent: '99.5%' }]);
    expect(r.actuals).toEqual({ titrantMl: 5.1 });
    expect(r.tolerances).toEqual({ ph: 0.1 });
    expect(r.bench).toEqual({ temperatureC: 23 });
  });

  it('refuses a field given twice (code givenTwice)', () => {
    expect(
      errorOf(() =>
        readActualsRange([
          ['actual.titrantMl', 1],
          ['Titrant added (mL)', 2],
        ]),
      ).code,
    ).toBe('givenTwice');
  });
});

describe('AS.MADE', () => {
  const actuals = [...grams.map((g) => [g.form, g.grams]), ['actual.titrantMl', plan.titration!.volumeMl]];

  it("gives the core's check as a table, with the verdict last, and passes the planned amounts", () => {
    const t = asMadeCheck('HEPES', 7.4, 25, 500, actuals, 4, [['NaCl', 150]], options);
    const core = asMade(plan, { weighed: grams, titrantMl: plan.titration!.volumeMl });
    expect(t[0]).toEqual([...AS_MADE_HEADER]);
    expect(t.length).toBeLessThanOrEqual(AS_MADE_ROWS);
    expect(t[t.length - 1]).toEqual(['batch', '', '', '', '', 'PASS']);
    const phRow = t.find((r) => String(r[0]).startsWith('pH at 4 °C, as made'))!;
    expect(Math.abs((phRow[2] as number) - core.predictions.pHAtUse)).toBeLessThan(SAME);
  });

  it('fails a batch weighed short (2 % tolerance) and passes it with a wider one', () => {
    const short = actuals.map((r) => (r[0] === 'HEPES free acid' ? [r[0], (r[1] as number) * 0.95] : r));
    expect(asMadeCheck('HEPES', 7.4, 25, 500, short, 4, [['NaCl', 150]], options).at(-1)![5]).toBe('FAIL');
    expect(asMadeCheck('HEPES', 7.4, 25, 500, [...short, ['tolerance.concentrationPercent', 6], ['tolerance.ph', 0.2]], 4, [['NaCl', 150]], options).at(-1)![5]).toBe('PASS');
  });

  it('is INCOMPLETE, listing what is entered, until every planned form and the titrant have an amount', () => {
    const t = asMadeCheck(
      'HEPES',
      7.4,
      25,
      500,
      [
        ['HEPES free acid', grams[0].grams],
        ['NaCl', ''],
        ['actual.titrantMl', ''],
      ],
      4,
      [['NaCl', 150]],
      options,
    );
    expect(t.map((r) => r[5])).toEqual(['result', 'entered', 'not entered', 'not entered', 'INCOMPLETE']);
  });

  it('spills 24 × 6 in the formula engine, padded below the verdict', () => {
    expect(spillShape('AS.MADE', [1, 1, 1, 1, 3])).toEqual({ rows: AS_MADE_ROWS, columns: AS_MADE_HEADER.length });
    const hf = createFormulaEngine({
      Sheet1: [
        ['form', 'HEPES free acid', null, 'HEPES free acid', grams[0].grams, null, 'NaCl', 150],
        ['titrant', 'NaOH', null, 'NaCl', grams[1].grams],
        ['benchTemperatureC', 22, null, 'actual.titrantMl', plan.titration!.volumeMl],
        ['=PROTON.AS.MADE("HEPES", 7.4, 25, 500, D1:E3, 4, G1:H1, A1:B3)'],
      ],
    });
    const cells = hf.getSheetValues(0).slice(3);
    const verdictRow = cells.findIndex((r) => r[0] === 'batch');
    expect(cells[verdictRow][5]).toBe('PASS');
    expect(cells[AS_MADE_ROWS - 1]?.[0] ?? '').toBe(verdictRow === AS_MADE_ROWS - 1 ? 'batch' : '');
  });
});

describe('TITRANT.NEXT', () => {
  it("gives the core's next amount and first portion for a reading", () => {
    const [row] = titrantNext('HEPES', 7.4, 25, 500, 3, 7.0, 4, [['NaCl', 150]], options);
    const c = benchCorrection(plan, { titrantMl: 3, readingPh: 7.0 });
    expect(row[0]).toBe('1 M sodium hydroxide');
    expect(Math.abs((row[1] as number) - c.nextMl)).toBeLessThan(SAME);
    expect(Math.abs((row[2] as number) - c.firstPortionMl)).toBeLessThan(SAME);
  });

  it('waits, with no number to act on, while the titrant so far or the reading is blank (a record sheet asks before the meter is read)', () => {
    for (const [added, reading] of [
      [null, null],
      [3, ''],
      ['', 7.0],
    ]) {
      const [row] = titrantNext('HEPES', 7.4, 25, 500, added, reading, 4, [['NaCl', 150]], options);
      expect(row[0]).toBe('waiting for a reading');
      expect([row[1], row[2], row[4]]).toEqual(['', '', '']);
      expect(Math.abs((row[3] as number) - plan.meter.pH)).toBeLessThan(SAME);
    }
  });

  it('names the argument in an error (field readingPh)', () => {
    expect(errorOf(() => titrantNext('HEPES', 7.4, 25, 500, 3, 'seven', 4, [['NaCl', 150]], options)).field).toBe('readingPh');
  });

  it('spills 1 × 6 in the formula engine', () => {
    const hf = createFormulaEngine({
      Sheet1: [
        ['form', 'HEPES free acid', null, 'NaCl', 150],
        ['titrant', 'NaOH'],
        ['benchTemperatureC', 22],
        ['=PROTON.TITRANT.NEXT("HEPES", 7.4, 25, 500, 3, 7.0, 4, D1:E1, A1:B3)'],
      ],
    });
    const c = benchCorrection(plan, { titrantMl: 3, readingPh: 7.0 });
    expect(Math.abs((hf.getCellValue({ sheet: 0, row: 3, col: 1 }) as number) - c.nextMl)).toBeLessThan(SAME);
  });
});
