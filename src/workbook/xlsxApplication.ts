/**
 * The application a .xlsx file names in its extended properties (docProps/app.xml). The
 * xlsx writer (exceljs) names another program there and offers no option, so the part is
 * rewritten after writing: the file says it was made by Proton Ledger. JSZip reads and
 * writes the package (the writer itself uses it).
 */
import JSZip from 'jszip';

/** The name written as the application. */
export const APPLICATION_NAME = 'Proton Ledger';

/** Characters XML text must escape. */
function xmlText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/**
 * A written .xlsx package with docProps/app.xml naming Proton Ledger as its application
 * (the other program's version number, which would mislead, is dropped; the element is optional).
 *
 * @param bytes - the package as written
 * @returns the package with the part rewritten (unchanged when it has no such part)
 */
export async function nameApplication(bytes: ArrayBuffer | Uint8Array): Promise<Uint8Array> {
  const zip = await JSZip.loadAsync(bytes);
  const part = zip.file('docProps/app.xml');
  if (!part) return bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes);
  const xml = await part.async('string');
  const named = xml.replace(/<Application>[^<]*<\/Application>/, `<Application>${xmlText(APPLICATION_NAME)}</Application>`).replace(/<AppVersion>[^<]*<\/AppVersion>/, '');
  zip.file('docProps/app.xml', named);
  return zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE' });
}
