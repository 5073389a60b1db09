/**
 * The same catalog in HyperFormula: formulas as typed in Excel evaluate in the engine,
 * errors come back as the engine's error values with messages, spills have the predicted
 * size, and a what-if grid equals direct core calls cell for cell.
 */
import { DetailedCellError } from 'hyperformula';
import { titrantForPh } from '../../src/chem';
import { defaultLibrary } from '../../src/chem/library';
import { CATALOG } from '../../src/functions/catalog';
import { createFormulaEngine, padToSpill, toEngineFormula } from '../../src/functions/formulaEngine';
import { ph, RECIPE_TABLE_ROWS, species, SPECIES_TABLE_ROWS } from '../../src/functions/functions';
import { SheetError } from '../../src/functions/errors';
import { clearCallCache } from '../../src/functions/memo';

/** Engine and direct call run the same arithmetic (smartRounding is off): only the mL scaling may round differently. */
const GRID_RELATIVE_TOLERANCE = 1e-12;

const lib = defaultLibrary();

describe('formula engine', () => {
  test('every catalog function is registered as PROTON.<NAME>', () => {
    const hf = createFormulaEngine();
    const names = hf.getRegisteredFunctionNames();
    for (const fn of CATALOG) expect(names).toContain(`PROTON.${fn.id}`);
    hf.destroy();
  });

  test("formulas as typed in Excel (any case) give the catalog's values; ordinary formulas mix in", () => {
    const hf = createFormulaEngine({
      Prep: [
        ['tris base', 50, '=PROTON.PH.OF(A1:B2)', '=proton.ph.of(A1:B2, "25", "Pitzer")', '=ROUND(C1, 2)'],
        ['NaCl', 150, '=PROTON.GRAMS("tris HCl", 50, 1000, 99%)', '=PROTON.GRAMS("tris HCl", 50, 1000, "99%")', '=PROTON.PH.OF({"tris base",50;"NaCl",150})'],
      ],
    });
    const at = (row: number, col: number) => hf.getCellValue({ sheet: 0, row, col });
    clearCallCache();
    const direct = ph([
      ['tris base', 50],
      ['NaCl', 150],
    ]);
    expect(at(0, 2)).toBe(direct);
    expect(at(0, 3)).toBe(direct);
    expect(at(0, 4)).toBe(Math.round(direct * 100) / 100);
    expect(at(1, 2)).toBe(at(1, 3));
    expect(at(1, 4)).toBe(direct);
    hf.destroy();
  });

  test("errors are the engine's #VALUE! / #N/A with the message; upstream errors propagate; wrong argument counts are caught", () => {
    const hf = createFormulaEngine({
      S: [
        ['tris base', 50, '=PROTON.PH.OF(A1:B1, 120)', '=PROTON.PH.OF(A2:B2)', '=PROTON.PH.OF(A1:B1, 1/0)', '=PROTON.PH.OF()'],
        ['HEPSE', 10, '=PROTON.TITRANT.ML("tris base", 50, 1000, 11, "HCl", 1)'],
      ],
    });
    const at = (row: number, col: number) => hf.getCellValue({ sheet: 0, row, col }) as DetailedCellError;
    expect(at(0, 2)).toBeInstanceOf(DetailedCellError);
    expect(at(0, 2).value).toBe('#VALUE!');
    expect(at(0, 2).message).toBe('temperatureC is 120; allowed: 0 to 100 °C.');
    expect(at(0, 3).value).toBe('#N/A');
    expect(at(0, 3).message).toMatch(/did you mean "HEPES"/);
    expect(at(0, 4).value).toBe('#DIV/0!');
    expect(at(0, 5)).toBeInstanceOf(DetailedCellError);
    expect(at(1, 2).value).toBe('#N/A');
    expect(at(1, 2).message).toMatch(/cannot be reached/);
    hf.destroy();
  });

  test('spilling functions take the size predicted from their arguments', () => {
    const hf = createFormulaEngine({ S: [['tris base', 50, null, '=PROTON.SPECIES(A1:B1)', null, null, null, '=PROTON.SUBSTANCES()', '=PROTON.FORMS(A20:J22)']] });
    expect(hf.getSheetDimensions(0).height).toBe(Math.max(SPECIES_TABLE_ROWS, lib.list().length, lib.records().flatMap((r) => r.forms).length + 3));
    expect(hf.getCellValue({ sheet: 0, row: 0, col: 3 })).toBe('species');
    expect(hf.getCellValue({ sheet: 0, row: 1, col: 3 })).toBe('H+');
    expect(hf.getCellValue({ sheet: 0, row: SPECIES_TABLE_ROWS - 1, col: 6 })).toBe('');
    expect(hf.getCellValue({ sheet: 0, row: 0, col: 7 })).toBe(lib.list()[0].name);
    hf.destroy();
  });

  test('only this host pads: SPECIES and RECIPE fill their fixed shape with blank text here, though the functions return only the rows they have', () => {
    const hf = createFormulaEngine({ S: [['tris base', 50, '=PROTON.SPECIES(A1:B1)', null, null, null, '=PROTON.RECIPE("tris", 8, 50, 1000)']] });
    const speciesRows = species([['tris base', 50]]).length;
    expect(speciesRows).toBeLessThan(SPECIES_TABLE_ROWS);
    expect(hf.getCellValue({ sheet: 0, row: speciesRows - 1, col: 2 })).not.toBe('');
    for (let row = speciesRows; row < SPECIES_TABLE_ROWS; row++) expect(hf.getCellValue({ sheet: 0, row, col: 2 })).toBe('');
    expect(hf.getCellValue({ sheet: 0, row: RECIPE_TABLE_ROWS - 1, col: 6 })).toBe('');
    expect(hf.getSheetDimensions(0).height).toBe(RECIPE_TABLE_ROWS);
    hf.destroy();
  });

  test('padToSpill pads ragged rows and refuses a result larger than the reserved size', () => {
    expect(padToSpill([[1], ['a', 2]], { width: 2, height: 3 })).toEqual([
      [1, ''],
      ['a', 2],
      ['', ''],
    ]);
    expect(padToSpill([[1, 2, 3]], { width: 2, height: 3 })).toBeInstanceOf(SheetError);
  });

  test('formulas as Excel saves them (_xldudf_PROTON_…, _xlfn.) are translated', () => {
    expect(toEngineFormula('_xldudf_PROTON_TITRANT_ML(A1,50,1000,7.4,"HCl",1)+_xlfn.XLOOKUP(1,A:A,B:B)')).toBe('PROTON.TITRANT.ML(A1,50,1000,7.4,"HCl",1)+XLOOKUP(1,A:A,B:B)');
    expect(toEngineFormula('[1]!_xldudf_PROTON_IONIC_STRENGTH_MM(A1:B3)')).toBe('PROTON.IONIC.STRENGTH.MM(A1:B3)');
    // Prefixes another add-in's registration can leave, as reported in OfficeDev/office-js issues 2568 and 3872.
    expect(toEngineFormula('Other.xla!_xldudf_PROTON_PH_OF(A1:B3)+1')).toBe('PROTON.PH.OF(A1:B3)+1');
    expect(toEngineFormula("'Lab tools.xlam'!_xldudf_PROTON_WARNINGS(A1:B3)")).toBe('PROTON.WARNINGS(A1:B3)');
    expect(toEngineFormula('_xldudf_OTHER_ADDIN_FN(1)')).toBe('_xldudf_OTHER_ADDIN_FN(1)');
  });

  test('what-if grid: 100 target pH × 50 temperatures of TITRANT.ML through the engine equal direct core calls cell for cell', () => {
    const targets = Array.from({ length: 100 }, (_, i) => 7 + i * 0.02);
    const temperatures = Array.from({ length: 50 }, (_, j) => j);
    const letter = (c: number) => (c < 26 ? String.fromCharCode(65 + c) : String.fromCharCode(64 + Math.floor(c / 26)) + String.fromCharCode(65 + (c % 26)));
    const rows: unknown[][] = [[null, ...temperatures]];
    targets.forEach((t, i) => rows.push([t, ...temperatures.map((_, j) => `=PROTON.TITRANT.ML("tris base", 50, 1000, $A${i + 2}, "HCl", 1, ${letter(j + 1)}$1)`)]));
    clearCallCache();
    const hf = createFormulaEngine({ Grid: rows });
    const values = hf.getSheetValues(0);
    let compared = 0;
    targets.forEach((target, i) =>
      temperatures.forEach((temperatureC, j) => {
        const composition = lib.compositionFromForms([{ form: 'tris base', concentrationM: 0.05 }], { temperatureC, activityModel: 'pitzer' });
        const expected = (titrantForPh(composition, { name: 'hydrochloric acid', strongIons: { 'Cl-': 1 } }, target).concentrationM * 1000) / 1;
        const got = values[i + 1][j + 1] as number;
        if (Math.abs(got - expected) > GRID_RELATIVE_TOLERANCE * expected)
          throw new Error(`pH ${target}, ${temperatureC} °C: engine ${got}, core ${expected}, difference ${got - expected}, tolerance ${GRID_RELATIVE_TOLERANCE} relative`);
        compared++;
      }),
    );
    expect(compared).toBe(5000);
    hf.destroy();
  });
});
