/**
 * Small hand-made workbooks for the adversarial tests: a minimal .xlsx package written
 * part by part (a zip writer of our own, so a test can also make a package lie about its
 * sizes), with one or more worksheets given as the XML inside <sheetData>…</sheetData>
 * plus whatever follows it (merges, validations).
 */
import { constants, crc32, deflateRawSync } from 'zlib';

export interface Part {
  readonly name: string;
  readonly data: string | Buffer;
  /** Write this as the unpacked size in the directory instead of the true one. */
  readonly claimedSize?: number;
  /** Store without packing. */
  readonly stored?: boolean;
  /** Already packed (raw deflate) with this unpacked size: see repeated(). */
  readonly packed?: { readonly data: Buffer; readonly size: number };
}

/**
 * A part of `head`, then `chunk` `times` over, then `tail`, packed without ever being held
 * unpacked: the chunk is packed once and its packed form repeated (each piece ends on a
 * byte boundary and refers to nothing before it, so the pieces join into one valid stream).
 * A 200 MB text costs a few hundred KB and a few milliseconds to make.
 */
export function repeated(name: string, head: string, chunk: string, times: number, tail: string): Part {
  const sync = { finishFlush: constants.Z_SYNC_FLUSH };
  const packedChunk = deflateRawSync(Buffer.from(chunk, 'utf8'), sync);
  const data = Buffer.concat([deflateRawSync(Buffer.from(head, 'utf8'), sync), ...Array<Buffer>(times).fill(packedChunk), deflateRawSync(Buffer.from(tail, 'utf8'))]);
  return { name, data: '', packed: { data, size: Buffer.byteLength(head) + Buffer.byteLength(chunk) * times + Buffer.byteLength(tail) } };
}

/** A zip file of the parts (PKWARE APPNOTE: local headers, central directory, end record). */
export function zip(parts: readonly Part[]): Buffer {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const part of parts) {
    const raw = typeof part.data === 'string' ? Buffer.from(part.data, 'utf8') : part.data;
    const packed = part.packed?.data ?? (part.stored ? raw : deflateRawSync(raw));
    const name = Buffer.from(part.name, 'utf8');
    const size = part.claimedSize ?? part.packed?.size ?? raw.length;
    const crc = part.packed ? 0 : crc32(raw); // a repeated part is refused before anyone checks it
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(20, 4);
    local.writeUInt16LE(0x0800, 6); // UTF-8 names
    local.writeUInt16LE(part.stored ? 0 : 8, 8);
    local.writeUInt32LE(crc, 14);
    local.writeUInt32LE(packed.length, 18);
    local.writeUInt32LE(size, 22);
    local.writeUInt16LE(name.length, 26);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(20, 4);
    central.writeUInt16LE(20, 6);
    central.writeUInt16LE(0x0800, 8);
    central.writeUInt16LE(part.stored ? 0 : 8, 10);
    central.writeUInt32LE(crc, 16);
    central.writeUInt32LE(packed.length, 20);
    central.writeUInt32LE(size, 24);
    central.writeUInt16LE(name.length, 28);
    central.writeUInt32LE(offset, 42);
    locals.push(local, name, packed);
    centrals.push(central, name);
    offset += local.length + name.length + packed.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.length, 8);
  end.writeUInt16LE(parts.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, directory, end]);
}

const NS = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
const REL = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships';

export interface SheetSpec {
  readonly name?: string;
  /** The XML inside <sheetData>. */
  readonly data: string;
  /** XML after </sheetData> (mergeCells, dataValidations). */
  readonly after?: string;
  /** Where the workbook's link points (default worksheets/sheetN.xml). */
  readonly target?: string;
  readonly external?: boolean;
}

/** The XML of a worksheet around its <sheetData> content, split where the content goes. */
export const SHEET_HEAD = `<?xml version="1.0" encoding="UTF-8"?><worksheet xmlns="${'http://schemas.openxmlformats.org/spreadsheetml/2006/main'}"><sheetData>`;
export const SHEET_TAIL = '</sheetData></worksheet>';

/** The parts of a workbook with these sheets (and any extra parts). */
export function workbookParts(sheets: readonly SheetSpec[], extra: readonly Part[] = []): Part[] {
  const types = `<?xml version="1.0" encoding="UTF-8"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>${sheets
    .map((_s, i) => `<Override PartName="/xl/worksheets/sheet${i + 1}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>`)
    .join('')}</Types>`;
  const rootRels = `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="${REL}/officeDocument" Target="xl/workbook.xml"/></Relationships>`;
  const workbook = `<?xml version="1.0" encoding="UTF-8"?><workbook xmlns="${NS}" xmlns:r="${REL}"><sheets>${sheets
    .map((s, i) => `<sheet name="${s.name ?? `Sheet${i + 1}`}" sheetId="${i + 1}" r:id="rId${i + 1}"/>`)
    .join('')}</sheets></workbook>`;
  const rels = `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">${sheets
    .map((s, i) => `<Relationship Id="rId${i + 1}" Type="${REL}/worksheet" Target="${s.target ?? `worksheets/sheet${i + 1}.xml`}"${s.external ? ' TargetMode="External"' : ''}/>`)
    .join('')}</Relationships>`;
  return [
    { name: '[Content_Types].xml', data: types },
    { name: '_rels/.rels', data: rootRels },
    { name: 'xl/workbook.xml', data: workbook },
    { name: 'xl/_rels/workbook.xml.rels', data: rels },
    ...sheets.map((s, i) => ({
      name: `xl/worksheets/sheet${i + 1}.xml`,
      data: `<?xml version="1.0" encoding="UTF-8"?><worksheet xmlns="${NS}" xmlns:r="${REL}"><sheetData>${s.data}</sheetData>${s.after ?? ''}</worksheet>`,
    })),
    ...extra,
  ];
}

/** A cell holding a number, inline text or a formula. */
export function cell(ref: string, content: { n?: number; text?: string; f?: string }): string {
  if (content.f !== undefined) return `<c r="${ref}"><f>${xml(content.f)}</f></c>`;
  if (content.text !== undefined) return `<c r="${ref}" t="inlineStr"><is><t>${xml(content.text)}</t></is></c>`;
  return `<c r="${ref}"><v>${content.n}</v></c>`;
}

export function row(r: number, cells: string): string {
  return `<row r="${r}">${cells}</row>`;
}

function xml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
