/**
 * Adversarial: calc never loses a file. The output may not be the input under any name
 * (the same path, ./, a/../, a symbolic link, a hard link); an existing output is replaced
 * only with --force; a failed write leaves nothing behind and the old file as it was.
 */
import { linkSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync, symlinkSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import ExcelJS from 'exceljs';
import { main } from '../../src/cli/main';

const dir = mkdtempSync(join(tmpdir(), 'proton-files-'));

async function calc(args: string[]): Promise<{ code: number; out: any }> {
  let text = '';
  const code = await main(['calc', ...args], (t) => (text += t));
  return { code, out: JSON.parse(text) };
}

async function book(path: string): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet('Prep');
  ws.getCell('A1').value = 2;
  ws.getCell('B1').value = { formula: 'A1*21' } as ExcelJS.CellFormulaValue;
  await wb.xlsx.writeFile(path);
  return readFileSync(path);
}

function leftovers(): string[] {
  return readdirSync(dir).filter((f) => f.endsWith('.tmp'));
}

describe('calc -o never destroys its input', () => {
  const input = join(dir, 'book.xlsx');
  let original: Buffer;
  beforeAll(async () => {
    original = await book(input);
    symlinkSync(input, join(dir, 'link.xlsx'));
    linkSync(input, join(dir, 'hard.xlsx'));
    mkdirSync(join(dir, 'sub'));
    writeFileSync(join(dir, 'book.csv'), '1,=A1+1\r\n');
    symlinkSync(join(dir, 'book.csv'), join(dir, 'link.csv'));
  });

  it.each([
    ['the same path', () => input],
    ['the path through ./', () => `${dir}/./book.xlsx`],
    ['the path through sub/..', () => `${dir}/sub/../book.xlsx`],
    ['a symbolic link to the input', () => join(dir, 'link.xlsx')],
    ['a hard link to the input', () => join(dir, 'hard.xlsx')],
  ])('refuses %s as the output, even with --force, and leaves the input byte for byte', async (_label, output) => {
    for (const force of [[], ['--force']]) {
      const { code, out } = await calc([input, '-o', output(), ...force]);
      expect(code).toBe(2);
      expect(out.error.field).toBe('output');
      expect(out.error.message).toMatch(/is the input file/);
      expect(readFileSync(input).equals(original)).toBe(true);
    }
    expect(leftovers()).toEqual([]);
  });

  it('refuses a CSV written onto itself through a symbolic link', async () => {
    const { code, out } = await calc([join(dir, 'link.csv'), '-o', join(dir, 'book.csv'), '--force']);
    expect(code).toBe(2);
    expect(out.error.message).toMatch(/is the input file/);
    expect(readFileSync(join(dir, 'book.csv'), 'utf8')).toBe('1,=A1+1\r\n');
  });

  it('refuses to replace an existing output without --force, and replaces it with --force', async () => {
    const output = join(dir, 'filled.xlsx');
    writeFileSync(output, 'keep me');
    const refused = await calc([input, '-o', output]);
    expect(refused.code).toBe(2);
    expect(refused.out.error.message).toMatch(/already exists.*--force/);
    expect(readFileSync(output, 'utf8')).toBe('keep me');
    // A second name for the old output shows it was replaced by a new file, not rewritten in place.
    linkSync(output, join(dir, 'old-filled.xlsx'));
    const forced = await calc([input, '-o', output, '--force']);
    expect(forced.code).toBe(0);
    expect(readFileSync(join(dir, 'old-filled.xlsx'), 'utf8')).toBe('keep me');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(output);
    expect(wb.getWorksheet('Prep')!.getCell('B1').value).toBe(42);
    expect(leftovers()).toEqual([]);
  });

  it('refuses a directory as the output and an output in a missing directory, leaving no temporary file', async () => {
    mkdirSync(join(dir, 'folder.xlsx'));
    const asDir = await calc([input, '-o', join(dir, 'folder.xlsx'), '--force']);
    expect(asDir.out.error.message).toMatch(/is a directory/);
    const missing = await calc([input, '-o', join(dir, 'no', 'such', 'out.xlsx')]);
    expect(missing.code).toBe(2);
    expect(missing.out.error.message).toMatch(/Could not write .*Nothing was replaced/);
    expect(leftovers()).toEqual([]);
    expect(statSync(input).size).toBe(original.length);
  });

  it('refuses a missing or a directory input before touching the output', async () => {
    const output = join(dir, 'never.xlsx');
    expect((await calc([join(dir, 'missing.xlsx'), '-o', output])).out.error.field).toBe('input');
    expect(readdirSync(dir)).not.toContain('never.xlsx');
  });
});
