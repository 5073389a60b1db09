/**
 * manifest.xml checked offline with an XML parser (office-addin-manifest's validator needs
 * the network; `npm run validate` runs it where there is one): ids, the PROTON namespace,
 * the shared runtime, every URL mapping to a file the build writes, icons on disk at their
 * sizes, the requirement sets (SharedRuntime 1.1, ExcelApi 1.7) and the least permission
 * that works; the structural checks shared with the deployment build (support/manifestChecks.ts).
 */
import { readFileSync, existsSync } from 'fs';
import { join } from 'path';
import { XMLParser } from 'fast-xml-parser';
import { manifestProblems, pngSize } from './support/manifestChecks';

const ROOT = join(__dirname, '..');
const xml = readFileSync(join(ROOT, 'manifest.xml'), 'utf8');
const parser = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '@' });
const doc = parser.parse(xml).OfficeApp;

const { OUTPUTS, DEV_PORT } = require('../webpack.config.js') as { OUTPUTS: string[]; DEV_PORT: number };
const ORIGIN = `https://localhost:${DEV_PORT}`;

const overrides = doc.VersionOverrides;
const host = overrides.Hosts.Host;
const resources = overrides.Resources;
const asList = <T>(x: T | T[]): T[] => (Array.isArray(x) ? x : [x]);
const urls = new Map(asList(resources['bt:Urls']['bt:Url']).map((u: Record<string, string>) => [u['@id'], u['@DefaultValue']]));
const images = new Map(asList(resources['bt:Images']['bt:Image']).map((u: Record<string, string>) => [u['@id'], u['@DefaultValue']]));
const shortStrings = new Map(asList(resources['bt:ShortStrings']['bt:String']).map((u: Record<string, string>) => [u['@id'], u['@DefaultValue']]));

/** What the build serves at a path, before building: a placeholder for each file it writes, the icons from assets/. */
function sourceServed(path: string): Buffer | undefined {
  if (OUTPUTS.includes(path)) return Buffer.from('built');
  const file = join(ROOT, path);
  return path.startsWith('assets/') && existsSync(file) ? readFileSync(file) : undefined;
}

/** The path a dev URL serves from dist/, e.g. `https://localhost:3000/taskpane.html` → `taskpane.html`. */
function servedPath(url: string): string {
  expect(url.startsWith(`${ORIGIN}/`)).toBe(true);
  return url.slice(ORIGIN.length + 1);
}

describe('manifest.xml', () => {
  test('is a task pane add-in for Excel workbooks with a GUID id and a four-part version', () => {
    expect(doc['@xsi:type']).toBe('TaskPaneApp');
    expect(doc.Id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
    expect(doc.Version).toMatch(/^\d+\.\d+\.\d+\.\d+$/);
    expect(doc.Hosts.Host['@Name']).toBe('Workbook');
    expect(host['@xsi:type']).toBe('Workbook');
  });

  test('asks for ReadWriteDocument, the least permission that writes sheets', () => {
    expect(doc.Permissions).toBe('ReadWriteDocument');
  });

  test("requires SharedRuntime 1.1 and ExcelApi 1.7 (the pane's chart calls) and declares one long-lived shared runtime", () => {
    const sets = asList(doc.Requirements.Sets.Set).map((s: Record<string, string>) => [s['@Name'], s['@MinVersion']]);
    expect(sets).toEqual([
      ['SharedRuntime', '1.1'],
      ['ExcelApi', '1.7'],
    ]);
    const runtime = host.Runtimes.Runtime;
    expect(runtime['@lifetime']).toBe('long');
    expect(runtime['@resid']).toBe('Shared.Url');
  });

  test('custom functions use the PROTON namespace, the shared page, and the built script and metadata', () => {
    const cf = host.AllFormFactors.ExtensionPoint;
    expect(cf['@xsi:type']).toBe('CustomFunctions');
    expect(shortStrings.get(cf.Namespace['@resid'])).toBe('PROTON');
    expect(cf.Page.SourceLocation['@resid']).toBe('Shared.Url');
    expect(servedPath(urls.get(cf.Script.SourceLocation['@resid'])!)).toBe('functions.js');
    expect(servedPath(urls.get(cf.Metadata.SourceLocation['@resid'])!)).toBe('functions.json');
  });

  test('the task pane button opens the shared page', () => {
    const desktop = host.DesktopFormFactor;
    expect(desktop.FunctionFile['@resid']).toBe('Shared.Url');
    const control = desktop.ExtensionPoint.OfficeTab.Group.Control;
    expect(control['@xsi:type']).toBe('Button');
    expect(control.Action['@xsi:type']).toBe('ShowTaskpane');
    expect(control.Action.SourceLocation['@resid']).toBe('Shared.Url');
  });

  test('every URL is https://localhost and maps to a file the build writes', () => {
    for (const [id, url] of urls) {
      const path = servedPath(url!);
      expect({ id, path, built: OUTPUTS.includes(path) }).toEqual({ id, path, built: true });
    }
    expect(servedPath(doc.DefaultSettings.SourceLocation['@DefaultValue'])).toBe('taskpane.html');
    expect(doc.AppDomains.AppDomain).toBe(ORIGIN);
  });

  test('icons exist in assets/ as PNGs of the stated sizes', () => {
    const all = [...images.values(), doc.IconUrl['@DefaultValue'], doc.HighResolutionIconUrl['@DefaultValue']];
    for (const url of all) {
      const file = join(ROOT, servedPath(url));
      expect(existsSync(file)).toBe(true);
      const png = readFileSync(file);
      expect(png.subarray(1, 4).toString('ascii')).toBe('PNG');
      const size = Number(/icon-(\d+)\.png$/.exec(url)![1]);
      expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([size, size]);
    }
    for (const id of ['Icon.16', 'Icon.32', 'Icon.80']) expect(images.has(id)).toBe(true);
  });

  test('passes every structural check: resids resolve to resources of their kind, https URLs the build serves, icon sizes from the PNG headers, requirement sets', () => {
    expect(manifestProblems(xml, ORIGIN, sourceServed)).toEqual([]);
  });
});

describe('the structural checks themselves', () => {
  const broken = (from: string, to: string) => manifestProblems(xml.replace(from, to), ORIGIN, sourceServed);

  test('a resid with no resource, or of the wrong kind, is found', () => {
    expect(broken('<Label resid="Group.Label"/>', '<Label resid="Group.Missing"/>')).toEqual(['Label resid Group.Missing is not a short resource']);
    expect(broken('<Title resid="GetStarted.Title"/>', '<Title resid="Help.Url"/>')).toEqual(['Title resid Help.Url is not a short resource']);
  });

  test('an icon of another size than stated, an http URL and a missing requirement set are found', () => {
    expect(broken('<bt:Image size="32" resid="Icon.32"/>', '<bt:Image size="32" resid="Icon.16"/>')).toContain(
      'Icon.16: https://localhost:3000/assets/icon-16.png is 16×16, stated 32×32',
    );
    expect(
      broken('DefaultValue="https://localhost:3000/help/functions.html"/>\n  <AppDomains>', 'DefaultValue="http://localhost:3000/help/functions.html"/>\n  <AppDomains>').join(
        '\n',
      ),
    ).toMatch(/SupportUrl: http:\/\/localhost:3000\/help\/functions\.html is not https/);
    expect(broken('<Set Name="ExcelApi" MinVersion="1.7"/>', '').join('\n')).toMatch(/requirement sets/);
  });

  test('pngSize reads the IHDR of our icons and refuses what is not a PNG', () => {
    expect(pngSize(readFileSync(join(ROOT, 'assets/icon-80.png')))).toEqual({ width: 80, height: 80 });
    expect(pngSize(Buffer.from('GIF89a and more bytes than twenty-four'))).toBeUndefined();
  });
});
