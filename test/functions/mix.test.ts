/**
 * MIX.VOLUMES and MIX.PH: the stock shelf read from a range (src/functions/stockRange.ts),
 * the same numbers as the core's mix planner, fixed spill shapes, and errors with code and
 * field. Our own shelf and buffers.
 */
import { mixByVolumes, planMix, printedVolume, resolveShelf } from '../../src/chem/mixing';
import { solvePh } from '../../src/chem';
import { createFormulaEngine } from '../../src/functions/formulaEngine';
import { MIX_TABLE_HEADER, mixPh, mixVolumes, spillShape } from '../../src/functions/functions';
import { stocksFrom } from '../../src/functions/stockRange';
import { errorOf } from './errorOf';

/** The functions call the core; their numbers are the core's (volumes as printed). */
const SAME = 1e-12;

const SHELF = [
  ['name', 'form', 'concentration', 'titrant', 'pH', 'pH at °C'],
  ['Tris-HCl 1 M pH 8.0', 'tris base', '1 M', 'HCl', 8, 25],
  ['NaCl 5 M', 'NaCl', 5, null, null, null],
  ['EDTA 0.5 M pH 8.0', 'Na2EDTA·2H2O', '500 mM', 'NaOH', '8,0', null],
  ['glycerol 50 %', 'glycerol', '50 %', null, null, null],
  [null, null, null, null, null, null],
];
const TARGETS = [
  ['tris', 50],
  ['NaCl', '300 mM'],
  ['EDTA', 1],
  ['glycerol', '10 %'],
];

describe('the stock shelf from a range', () => {
  it('skips the header and blank rows and keeps what the user wrote for the core to read', () => {
    const stocks = stocksFrom(SHELF);
    expect(stocks.map((s) => s.name)).toEqual(['Tris-HCl 1 M pH 8.0', 'NaCl 5 M', 'EDTA 0.5 M pH 8.0', 'glycerol 50 %']);
    expect(stocks[2]).toEqual({ name: 'EDTA 0.5 M pH 8.0', form: 'Na2EDTA·2H2O', concentration: '500 mM', titrant: 'NaOH', ph: '8,0' });
  });

  it('names the row of a stock the core refuses', () => {
    const e = errorOf(() => mixVolumes([...SHELF.slice(0, 2), ['bad', 'NaCl', '5 kg']], [['NaCl', 100]], 10));
    expect(e).toMatchObject({ code: 'wrongUnit', field: 'stocks[1].concentration' });
    expect(e.message).toMatch(/^stocks, row 3: /);
  });
});

describe('MIX.VOLUMES', () => {
  it('gives the planner’s volumes, correction, water and pH in (targets + 5) rows × 4 columns', () => {
    const table = mixVolumes(SHELF, TARGETS, 50, 7.9, 4);
    const plan = planMix({
      stocks: stocksFrom(SHELF),
      targets: [
        { component: 'tris', concentrationMm: 50 },
        { component: 'NaCl', concentrationMm: 300 },
        { component: 'EDTA', concentrationMm: 1 },
        { component: 'glycerol', percent: 10 },
      ],
      volumeMl: 50,
      targetPh: 7.9,
      useTemperatureC: 4,
    });
    expect(table[0]).toEqual([...MIX_TABLE_HEADER]);
    expect(table).toHaveLength(TARGETS.length + 5);
    expect(table.slice(1, 5).map((r) => r[0])).toEqual(['Tris-HCl 1 M pH 8.0', 'NaCl 5 M', 'EDTA 0.5 M pH 8.0', 'glycerol 50 %']);
    expect(table[1].slice(1)).toEqual([2.5, 'mL', '50 mM']);
    expect(table[5][0]).toBe('pH correction: 1 M HCl');
    expect(table[5][1]).toBe(printedVolume(plan.correction!.millilitres));
    expect(Math.abs((table[7][1] as number) - plan.predictions.pHAtUse)).toBeLessThan(SAME);
    expect(Math.abs((table[8][1] as number) - plan.predictions.pHAtBench)).toBeLessThan(SAME);
    expect(spillShape('MIX.VOLUMES', [6, TARGETS.length, 1])).toEqual({ rows: TARGETS.length + 5, columns: 4 });
  });

  it('says "none" for the correction when no pH target is given, and takes options', () => {
    const table = mixVolumes(SHELF, [['NaCl', 150]], 10, null, null, [
      ['smallestVolumeUl', '1 µL'],
      ['benchTemperatureC', 22],
    ]);
    expect(table[2]).toEqual(['pH correction: none', 0, 'mL', '']);
    expect(table[5][0]).toBe('predicted pH at 22 °C (bench)');
  });

  it('refuses an unknown option and stocks that cannot fit, with codes', () => {
    expect(errorOf(() => mixVolumes(SHELF, [['NaCl', 150]], 10, null, null, [['tolerance', 0.1]]))).toMatchObject({ code: 'unknownField', field: 'tolerance' });
    expect(
      errorOf(() =>
        mixVolumes(
          SHELF,
          [
            ['NaCl', 4000],
            ['tris', 500],
          ],
          10,
        ),
      ),
    ).toMatchObject({ kind: 'na', code: 'stocksDoNotFit' });
  });
});

describe('MIX.PH', () => {
  it('is the core’s pH of the stocks mixed by volume', () => {
    const shelf = resolveShelf(stocksFrom(SHELF));
    const expected = solvePh(
      mixByVolumes(
        shelf,
        [
          { stock: 'Tris-HCl 1 M pH 8.0', millilitres: 2 },
          { stock: 'NaCl 5 M', millilitres: 3 },
        ],
        100,
        4,
      ).composition,
    );
    expect(
      Math.abs(
        mixPh(
          SHELF,
          [
            ['Tris-HCl 1 M pH 8.0', 2],
            ['NaCl 5 M', '3 mL'],
          ],
          100,
          4,
        ) - expected,
      ),
    ).toBeLessThan(SAME);
  });

  it('refuses volumes that overflow the final volume, and an unknown stock by name', () => {
    expect(
      errorOf(() =>
        mixPh(
          SHELF,
          [
            ['NaCl 5 M', 60],
            ['Tris-HCl 1 M pH 8.0', 50],
          ],
          100,
        ),
      ),
    ).toMatchObject({ code: 'stocksDoNotFit' });
    expect(errorOf(() => mixPh(SHELF, [['HEPES 1 M', 2]], 100))).toMatchObject({ code: 'noStockFor' });
  });

  it('evaluates in the formula engine from a shelf on another sheet', () => {
    const hf = createFormulaEngine({
      Shelf: SHELF as unknown[][],
      Prep: [
        ['Tris-HCl 1 M pH 8.0', 2, '=PROTON.MIX.PH(Shelf!A1:F6, A1:B2, 100, 4)'],
        ['NaCl 5 M', 3],
      ],
    });
    const value = hf.getCellValue({ sheet: hf.getSheetId('Prep') as number, row: 0, col: 2 });
    expect(
      Math.abs(
        (value as number) -
          mixPh(
            SHELF,
            [
              ['Tris-HCl 1 M pH 8.0', 2],
              ['NaCl 5 M', 3],
            ],
            100,
            4,
          ),
      ),
    ).toBeLessThan(SAME);
    hf.destroy();
  });
});
