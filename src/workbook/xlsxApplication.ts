/**
 * The application a .xlsx file names in its extended properties (docProps/app.xml). The
 * xlsx writer (exceljs) names another program there and offers no option, so the part is
 * replaced after writing: the file says it was made by Proton Ledger.
 *
 * Method: a .xlsx file is a ZIP package (ECMA-376 Part 2; the ZIP format as in PKWARE's
 * APPNOTE.TXT, sections 4.3.7, 4.3.12, 4.3.16). The package is rebuilt entry by entry:
 * every other part is copied byte for byte, the one part is written stored (method 0,
 * uncompressed, with its CRC-32), and the central directory follows with the new offsets.
 * No compression library is needed; a package it does not understand (ZIP64, several
 * disks, encryption) is returned unchanged.
 */

/** The name written as the application. */
export const APPLICATION_NAME = 'Proton Ledger';
/** The part that names the application. */
export const APP_PART = 'docProps/app.xml';

const LOCAL_SIGNATURE = 0x04034b50;
const CENTRAL_SIGNATURE = 0x02014b50;
const END_SIGNATURE = 0x06054b50;
/** General-purpose flag bit 11: the entry's name is UTF-8. */
const UTF8_NAME_FLAG = 0x0800;

let crcTable: Uint32Array | undefined;

/** CRC-32 (the ZIP polynomial 0xEDB88320, reflected), as APPNOTE 4.4.7 asks. */
export function crc32(bytes: Uint8Array): number {
  if (!crcTable) {
    crcTable = new Uint32Array(256);
    for (let n = 0; n < 256; n++) {
      let c = n;
      for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
      crcTable[n] = c >>> 0;
    }
  }
  let crc = 0xffffffff;
  for (let i = 0; i < bytes.length; i++) crc = crcTable[(crc ^ bytes[i]) & 0xff] ^ (crc >>> 8);
  return (crc ^ 0xffffffff) >>> 0;
}

/** One entry of a package's central directory. */
export interface ZipEntry {
  readonly name: string;
  readonly method: number;
  readonly compressedSize: number;
  /** Where its central-directory record starts and ends. */
  readonly centralStart: number;
  readonly centralEnd: number;
  readonly localOffset: number;
}

/** The central directory of a ZIP package, or undefined when it is not one this module reads. */
export function zipEntries(zip: Uint8Array): { entries: ZipEntry[]; centralOffset: number; endOffset: number } | undefined {
  const view = new DataView(zip.buffer, zip.byteOffset, zip.byteLength);
  let end = -1;
  for (let i = zip.length - 22; i >= Math.max(0, zip.length - 22 - 65535); i--) {
    if (view.getUint32(i, true) === END_SIGNATURE) {
      end = i;
      break;
    }
  }
  if (end < 0 || view.getUint16(end + 4, true) !== 0 || view.getUint16(end + 6, true) !== 0) return undefined;
  const count = view.getUint16(end + 10, true);
  const centralOffset = view.getUint32(end + 16, true);
  if (count === 0xffff || centralOffset === 0xffffffff || centralOffset > end) return undefined;
  const entries: ZipEntry[] = [];
  const decoder = new TextDecoder();
  let at = centralOffset;
  for (let k = 0; k < count; k++) {
    if (at + 46 > end || view.getUint32(at, true) !== CENTRAL_SIGNATURE) return undefined;
    const nameLength = view.getUint16(at + 28, true);
    const size = 46 + nameLength + view.getUint16(at + 30, true) + view.getUint16(at + 32, true);
    if ((view.getUint16(at + 8, true) & 1) !== 0) return undefined; // encrypted
    entries.push({
      name: decoder.decode(zip.subarray(at + 46, at + 46 + nameLength)),
      method: view.getUint16(at + 10, true),
      compressedSize: view.getUint32(at + 20, true),
      centralStart: at,
      centralEnd: at + size,
      localOffset: view.getUint32(at + 42, true),
    });
    at += size;
  }
  return { entries, centralOffset, endOffset: end };
}

/** The stored bytes of an entry (compressed as the method says), for reading a part back. */
export function entryData(zip: Uint8Array, entry: ZipEntry): Uint8Array {
  const view = new DataView(zip.buffer, zip.byteOffset, zip.byteLength);
  const start = entry.localOffset + 30 + view.getUint16(entry.localOffset + 26, true) + view.getUint16(entry.localOffset + 28, true);
  return zip.subarray(start, start + entry.compressedSize);
}

/**
 * A package with one part replaced by new content (stored uncompressed).
 *
 * @returns the new package, or undefined when the package is not one this module reads or lacks the part
 */
export function replacePart(zip: Uint8Array, part: string, content: Uint8Array): Uint8Array | undefined {
  const found = zipEntries(zip);
  if (!found || !found.entries.some((e) => e.name === part)) return undefined;
  const byOffset = [...found.entries].sort((a, b) => a.localOffset - b.localOffset);
  const next = new Map(byOffset.map((e, i) => [e, i + 1 < byOffset.length ? byOffset[i + 1].localOffset : found.centralOffset]));
  const chunks: Uint8Array[] = [];
  let written = 0;
  const push = (bytes: Uint8Array) => {
    chunks.push(bytes);
    written += bytes.length;
  };
  const name = new TextEncoder().encode(part);
  const crc = crc32(content);
  const src = new DataView(zip.buffer, zip.byteOffset, zip.byteLength);
  const newOffset = new Map<ZipEntry, number>();
  for (const e of byOffset) {
    newOffset.set(e, written);
    if (e.name !== part) {
      push(zip.subarray(e.localOffset, next.get(e)));
      continue;
    }
    const header = new Uint8Array(30 + name.length);
    const h = new DataView(header.buffer);
    h.setUint32(0, LOCAL_SIGNATURE, true);
    h.setUint16(4, 20, true); // version needed: 2.0
    h.setUint16(6, UTF8_NAME_FLAG, true);
    h.setUint16(8, 0, true); // stored
    h.setUint16(10, src.getUint16(e.centralStart + 12, true), true); // time
    h.setUint16(12, src.getUint16(e.centralStart + 14, true), true); // date
    h.setUint32(14, crc, true);
    h.setUint32(18, content.length, true);
    h.setUint32(22, content.length, true);
    h.setUint16(26, name.length, true);
    header.set(name, 30);
    push(header);
    push(content);
  }
  const centralOffset = written;
  for (const e of found.entries) {
    const record = copyOf(zip.subarray(e.centralStart, e.centralEnd));
    const r = new DataView(record.buffer);
    r.setUint32(42, newOffset.get(e)!, true);
    if (e.name === part) {
      r.setUint16(8, UTF8_NAME_FLAG, true);
      r.setUint16(10, 0, true);
      r.setUint32(16, crc, true);
      r.setUint32(20, content.length, true);
      r.setUint32(24, content.length, true);
    }
    push(record);
  }
  const centralSize = written - centralOffset;
  const endRecord = copyOf(zip.subarray(found.endOffset));
  const er = new DataView(endRecord.buffer);
  er.setUint32(12, centralSize, true);
  er.setUint32(16, centralOffset, true);
  push(endRecord);
  const out = new Uint8Array(written);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}

/** A fresh copy with its own buffer (a Node or browser Buffer's slice is a view of the whole buffer). */
function copyOf(bytes: Uint8Array): Uint8Array {
  const out = new Uint8Array(bytes.length);
  out.set(bytes);
  return out;
}

/** Characters XML text must escape. */
function xmlText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/** The extended-properties part of a package written by Proton Ledger. */
export function appXml(worksheetNames: readonly string[]): string {
  const names = worksheetNames.map((n) => `<vt:lpstr>${xmlText(n)}</vt:lpstr>`).join('');
  return (
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
    '<Properties xmlns="http://schemas.openxmlformats.org/officeDocument/2006/extended-properties" xmlns:vt="http://schemas.openxmlformats.org/officeDocument/2006/docPropsVTypes">' +
    `<Application>${xmlText(APPLICATION_NAME)}</Application><DocSecurity>0</DocSecurity><ScaleCrop>false</ScaleCrop>` +
    `<HeadingPairs><vt:vector size="2" baseType="variant"><vt:variant><vt:lpstr>Worksheets</vt:lpstr></vt:variant><vt:variant><vt:i4>${worksheetNames.length}</vt:i4></vt:variant></vt:vector></HeadingPairs>` +
    `<TitlesOfParts><vt:vector size="${worksheetNames.length}" baseType="lpstr">${names}</vt:vector></TitlesOfParts>` +
    '<LinksUpToDate>false</LinksUpToDate><SharedDoc>false</SharedDoc><HyperlinksChanged>false</HyperlinksChanged></Properties>'
  );
}

/**
 * A written .xlsx package naming Proton Ledger as its application (the other program's
 * version number, which would mislead, is left out; the element is optional).
 *
 * @param bytes - the package as written
 * @param worksheetNames - its worksheets, in order (the part lists them)
 * @returns the package with the part replaced (unchanged when it cannot be read)
 */
export function nameApplication(bytes: ArrayBuffer | Uint8Array, worksheetNames: readonly string[]): Uint8Array {
  const zip = bytes instanceof Uint8Array ? new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength) : new Uint8Array(bytes);
  return replacePart(zip, APP_PART, new TextEncoder().encode(appXml(worksheetNames))) ?? zip;
}
