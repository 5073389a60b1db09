/**
 * `proton-ledger calc`: a small workbook built with exceljs in a temp dir, evaluated, read
 * back. Values must equal the catalog's; text stays text; errors carry their message.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import ExcelJS from 'exceljs';
import { main } from '../../src/cli/main';
import { parseCsv } from '../../src/workbook/delimited';
import { ph, titrantMl, grams } from '../../src/functions/functions';

const dir = mkdtempSync(join(tmpdir(), 'proton-calc-'));

async function run(args: string[]): Promise<{ code: number; out: any }> {
  let text = '';
  const code = await main(args, (t) => (text += t));
  return { code, out: JSON.parse(text) };
}

describe('calc command', () => {
  const input = join(dir, 'book.xlsx');

  beforeAll(async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Prep');
    ws.getCell('A1').value = 'tris base';
    ws.getCell('B1').value = 50;
    ws.getCell('A2').value = 'NaCl';
    ws.getCell('B2').value = 150;
    ws.getCell('C1').value = { formula: 'PROTON.PH.OF(A1:B2)' } as ExcelJS.CellFormulaValue;
    ws.getCell('C2').value = { formula: '_xldudf_PROTON_TITRANT_ML("tris base",50,1000,7.4,"HCl",1)' } as ExcelJS.CellFormulaValue;
    ws.getCell('C3').value = { formula: 'ROUND(C1,1)+Other!A1' } as ExcelJS.CellFormulaValue;
    ws.getCell('C4').value = '=text, not a formula';
    ws.getCell('C5').value = { formula: 'PROTON.PH.OF(A1:B2,"hot")' } as ExcelJS.CellFormulaValue;
    ws.getCell('C6').value = { formula: 'PROTON.GRAMS("tris HCl",B1,250,"99%")' } as ExcelJS.CellFormulaValue;
    ws.getCell('C6').numFmt = '0.000';
    ws.getCell('E1').value = { formula: 'PROTON.SPECIES(A1:B2)' } as ExcelJS.CellFormulaValue;
    // Chart data leaves gaps with NA() by design; a PROTON #N/A says why.
    ws.getCell('C7').value = { formula: 'IF(B1>0,NA(),1)' } as ExcelJS.CellFormulaValue;
    ws.getCell('C8').value = { formula: 'PROTON.PKA("unobtainium")' } as ExcelJS.CellFormulaValue;
    wb.addWorksheet('Other').getCell('A1').value = 1;
    await wb.xlsx.writeFile(input);
  });

  test('fills formula cells (PROTON and ordinary, across sheets) with values and keeps formats and text', async () => {
    const output = join(dir, 'filled.xlsx');
    const { code, out } = await run(['calc', input, '-o', output]);
    expect(code).toBe(0);
    expect(out.formulas).toBe(8);
    expect(out.errors).toEqual([
      { cell: 'Prep!C5', value: '#VALUE!', message: 'temperatureC must be a number (typed, or as text such as "25" or "4 °C"); got "hot".' },
      { cell: 'Prep!C8', value: '#N/A', message: expect.stringMatching(/"unobtainium" is not in the substance library/) },
    ]);
    // The deliberate gap is listed apart, never as an error with an empty message.
    expect(out.notAvailable).toEqual(['Prep!C7']);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(output);
    const ws = wb.getWorksheet('Prep')!;
    const expectedPh = ph([
      ['tris base', 50],
      ['NaCl', 150],
    ]);
    expect(ws.getCell('C1').value).toBe(expectedPh);
    expect(ws.getCell('C2').value).toBe(titrantMl('tris base', 50, 1000, 7.4, 'HCl', 1));
    expect(ws.getCell('C3').value).toBeCloseTo(Math.round(expectedPh * 10) / 10 + 1, 12);
    expect(ws.getCell('C4').value).toBe('=text, not a formula');
    expect(ws.getCell('C5').value).toEqual({ error: '#VALUE!' });
    expect(String(ws.getCell('C5').note)).toMatch(/temperatureC must be a number/);
    expect(ws.getCell('C6').value).toBe(grams('tris HCl', 50, 250, '99%'));
    expect(ws.getCell('C6').numFmt).toBe('0.000');
    expect(ws.getCell('E1').value).toBe('species');
    expect(ws.getCell('E2').value).toBe('H+');
    expect(ws.getCell('H2').value).toBe(1);
  });

  test('writes CSV output; text beginning with = + - @ is prefixed with an apostrophe, never a formula', async () => {
    const output = join(dir, 'filled.csv');
    expect((await run(['calc', input, '-o', output])).code).toBe(0);
    const rows = parseCsv(readFileSync(output, 'utf8'));
    expect(Number(rows[0][2])).toBe(
      ph([
        ['tris base', 50],
        ['NaCl', 150],
      ]),
    );
    expect(rows[3][2]).toBe("'=text, not a formula");
    expect(rows[4][2]).toBe('#VALUE!');
  });

  test('reads CSV input (formulas start with "=", an apostrophe keeps text) and writes .xlsx', async () => {
    const csv = join(dir, 'book.csv');
    writeFileSync(csv, 'tris base,50,"=PROTON.PH.OF(A1:B1, 25)"\r\nNaCl,150,\'=not me\r\n-5 mM,,=PROTON.IONIC.STRENGTH.MM(A2:B2)\r\n');
    const output = join(dir, 'from-csv.xlsx');
    const { code } = await run(['calc', csv, '-o', output]);
    expect(code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(output);
    const ws = wb.worksheets[0];
    expect(ws.getCell('C1').value).toBe(ph([['tris base', 50]], 25));
    expect(ws.getCell('C2').value).toBe('=not me');
    expect(ws.getCell('A3').value).toBe('-5 mM');
    expect(ws.getCell('C3').value).toBeCloseTo(150, 3);
    expect(ws.getCell('B1').value).toBe(50);
  });

  test('bad usage and unreadable files give a JSON error and exit code 2', async () => {
    expect((await run(['calc', input])).code).toBe(2);
    expect((await run(['calc', join(dir, 'missing.xlsx'), '-o', join(dir, 'x.xlsx')])).code).toBe(2);
    const { code, out } = await run(['calc', input, '-o', join(dir, 'x.txt')]);
    expect(code).toBe(2);
    expect(out.error.message).toMatch(/\.xlsx or \.csv/);
  });

  test('other commands still run through main()', async () => {
    let text = '';
    expect(await main(['help'], (t) => (text += t))).toBe(0);
    expect(text).toMatch(/calc <book\.xlsx\|\.csv>/);
  });
});

describe('calc reads the forms Excel writes that the engine would refuse', () => {
  test('an upper-case exponent and doubled quotes inside a string compute as in Excel (the one normaliser the preview uses too)', async () => {
    const input = join(dir, 'excel-forms.xlsx');
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Forms');
    ws.getCell('A1').value = { formula: '6.022E+23/1E+23' } as ExcelJS.CellFormulaValue;
    ws.getCell('A2').value = { formula: 'LEN("say ""pH""")' } as ExcelJS.CellFormulaValue;
    await wb.xlsx.writeFile(input);
    const output = join(dir, 'excel-forms-filled.xlsx');
    const { code, out } = await run(['calc', input, '-o', output]);
    expect(code).toBe(0);
    expect(out.errors).toEqual([]);
    const back = new ExcelJS.Workbook();
    await back.xlsx.readFile(output);
    expect(back.getWorksheet('Forms')!.getCell('A1').value).toBeCloseTo(6.022, 12);
    expect(back.getWorksheet('Forms')!.getCell('A2').value).toBe(8); // say "pH"
  });
});
