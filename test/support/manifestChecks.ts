/**
 * Structural checks of an add-in manifest, offline (Microsoft's validator needs the network):
 * shared by test/manifest.test.ts (the source manifest, for https://localhost:3000) and the
 * conformance test (the manifest of a deployment build, for its origin).
 *
 * Rules from Microsoft's add-in-only manifest reference (learn.microsoft.com/javascript/api/manifest):
 * a `resid` names a resource of the kind its element takes (a URL for SourceLocation,
 * Runtime, FunctionFile and LearnMoreUrl; an image for bt:Image; a short string for Label,
 * Title and Namespace; a long string for Description) and is at most 32 characters; short
 * strings hold at most 125 characters and long strings 250; add-in URLs are https; an
 * icon's image is a PNG of the size the element states; IconUrl is 32 × 32 and
 * HighResolutionIconUrl 64 × 64 pixels.
 */
import { XMLParser } from 'fast-xml-parser';

/** Largest resid, short string and long string (Microsoft's manifest schema). */
export const MAX_RESID_LENGTH = 32;
export const MAX_SHORT_STRING = 125;
export const MAX_LONG_STRING = 250;

/** Requirement sets the add-in needs: the shared runtime, and ExcelApi 1.7 for the pane's charts. */
export const REQUIRED_SETS: Readonly<Record<string, string>> = { SharedRuntime: '1.1', ExcelApi: '1.7' };

type Node = Record<string, unknown>;
const asList = <T>(x: T | T[] | undefined): T[] => (x === undefined ? [] : Array.isArray(x) ? x : [x]);

/** The resource kind each element with a resid refers to. */
const RESID_KIND: Readonly<Record<string, 'url' | 'image' | 'short' | 'long'>> = {
  SourceLocation: 'url',
  Runtime: 'url',
  FunctionFile: 'url',
  LearnMoreUrl: 'url',
  'bt:Image': 'image',
  Label: 'short',
  Title: 'short',
  Namespace: 'short',
  Description: 'long',
};

/** Width and height of a PNG from its IHDR chunk, or undefined when the bytes are not a PNG. */
export function pngSize(bytes: Buffer): { width: number; height: number } | undefined {
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  if (bytes.length < 24 || !bytes.subarray(0, 8).equals(signature) || bytes.subarray(12, 16).toString('ascii') !== 'IHDR') return undefined;
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

/** The manifest, parsed with attributes as `@name`. */
export function parseManifest(xml: string): Node {
  return new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '@' }).parse(xml).OfficeApp as Node;
}

/** Every element (name, node) under a node, depth first. */
function elements(node: unknown, name = ''): [string, Node][] {
  if (Array.isArray(node)) return node.flatMap((n) => elements(n, name));
  if (node === null || typeof node !== 'object') return [];
  const here: [string, Node][] = name ? [[name, node as Node]] : [];
  return [
    ...here,
    ...Object.entries(node as Node)
      .filter(([k]) => !k.startsWith('@'))
      .flatMap(([k, v]) => elements(v, k)),
  ];
}

/**
 * Everything wrong with a manifest, as readable lines (empty when it passes).
 *
 * @param xml - the manifest text
 * @param origin - the origin every URL must be under, e.g. https://localhost:3000
 * @param served - the bytes the build serves at a path under the origin (e.g. `assets/icon-16.png`), or undefined when it serves nothing there
 */
export function manifestProblems(xml: string, origin: string, served: (path: string) => Buffer | undefined): string[] {
  const problems: string[] = [];
  const doc = parseManifest(xml);
  const overrides = doc.VersionOverrides as Node;
  const resources = overrides.Resources as Node;
  const table = (group: string, item: string) =>
    new Map(asList((resources[group] as Node | undefined)?.[item] as Node[] | Node).map((n) => [String(n['@id']), String(n['@DefaultValue'])]));
  const kinds = {
    url: table('bt:Urls', 'bt:Url'),
    image: table('bt:Images', 'bt:Image'),
    short: table('bt:ShortStrings', 'bt:String'),
    long: table('bt:LongStrings', 'bt:String'),
  };

  // Identity and permission.
  if (doc['@xsi:type'] !== 'TaskPaneApp') problems.push(`type is ${doc['@xsi:type']}, not TaskPaneApp`);
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(String(doc.Id))) problems.push(`Id ${doc.Id} is not a GUID`);
  if (!/^\d+\.\d+\.\d+\.\d+$/.test(String(doc.Version))) problems.push(`Version ${doc.Version} is not four numbers`);
  if (doc.Permissions !== 'ReadWriteDocument') problems.push(`Permissions ${doc.Permissions}, not ReadWriteDocument`);
  if ((doc.Hosts as Node)?.Host && ((doc.Hosts as Node).Host as Node)['@Name'] !== 'Workbook') problems.push('host is not Workbook');

  // Requirement sets: exactly the ones the add-in needs.
  const sets = asList(((doc.Requirements as Node)?.Sets as Node)?.Set as Node[] | Node).map((s) => [String(s['@Name']), String(s['@MinVersion'])]);
  const wanted = Object.entries(REQUIRED_SETS);
  if (JSON.stringify([...sets].sort()) !== JSON.stringify([...wanted].sort())) problems.push(`requirement sets ${JSON.stringify(sets)}, wanted ${JSON.stringify(wanted)}`);

  // Resource ids: unique, short enough; strings within their limits.
  const allIds = Object.values(kinds).flatMap((m) => [...m.keys()]);
  for (const id of allIds) {
    if (allIds.filter((x) => x === id).length > 1) problems.push(`resource id ${id} is defined twice`);
    if (id.length > MAX_RESID_LENGTH) problems.push(`resource id ${id} is longer than ${MAX_RESID_LENGTH} characters`);
  }
  for (const [id, text] of kinds.short) if (text.length > MAX_SHORT_STRING) problems.push(`short string ${id} is longer than ${MAX_SHORT_STRING} characters`);
  for (const [id, text] of kinds.long) if (text.length > MAX_LONG_STRING) problems.push(`long string ${id} is longer than ${MAX_LONG_STRING} characters`);

  // Every resid resolves to a resource of the kind its element takes.
  const used = elements(overrides).filter(([, n]) => typeof n['@resid'] === 'string');
  if (used.length === 0) problems.push('no resid is used');
  for (const [name, node] of used) {
    const kind = RESID_KIND[name];
    const id = String(node['@resid']);
    if (!kind) problems.push(`element ${name} with resid ${id}: unknown kind`);
    else if (!kinds[kind].has(id)) problems.push(`${name} resid ${id} is not a ${kind} resource`);
  }

  // Every URL: https under the origin, and served by the build.
  const urls: [string, string][] = [
    ...[...kinds.url].map(([id, url]) => [id, url] as [string, string]),
    ...[...kinds.image].map(([id, url]) => [id, url] as [string, string]),
    ...(['IconUrl', 'HighResolutionIconUrl', 'SupportUrl'] as const).map((k) => [k, String((doc[k] as Node)?.['@DefaultValue'])] as [string, string]),
    ['DefaultSettings/SourceLocation', String(((doc.DefaultSettings as Node)?.SourceLocation as Node)?.['@DefaultValue'])],
  ];
  const pathOf = (url: string) => (url.startsWith(`${origin}/`) ? url.slice(origin.length + 1) : undefined);
  for (const [id, url] of urls) {
    if (!url.startsWith('https://')) problems.push(`${id}: ${url} is not https`);
    const path = pathOf(url);
    if (path === undefined) problems.push(`${id}: ${url} is not under ${origin}`);
    else if (!served(path.split('#')[0])) problems.push(`${id}: the build serves nothing at ${path}`);
  }
  if (!asList((doc.AppDomains as Node)?.AppDomain as string[] | string).includes(origin)) problems.push(`AppDomains lacks ${origin}`);

  // Icons: PNGs of the size each place states.
  const iconChecks: [string, string | undefined, number][] = [
    ['IconUrl', String((doc.IconUrl as Node)?.['@DefaultValue']), 32],
    ['HighResolutionIconUrl', String((doc.HighResolutionIconUrl as Node)?.['@DefaultValue']), 64],
    ...elements(overrides)
      .filter(([name, n]) => name === 'bt:Image' && n['@size'] !== undefined)
      .map(([, n]) => [String(n['@resid']), kinds.image.get(String(n['@resid'])), Number(n['@size'])] as [string, string | undefined, number]),
  ];
  for (const [id, url, size] of iconChecks) {
    const path = url && pathOf(url);
    const bytes = path ? served(path) : undefined;
    const png = bytes && pngSize(bytes);
    if (!png) problems.push(`${id}: ${url} is not a PNG the build serves`);
    else if (png.width !== size || png.height !== size) problems.push(`${id}: ${url} is ${png.width}×${png.height}, stated ${size}×${size}`);
  }
  return problems;
}
