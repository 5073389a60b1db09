/**
 * Deployment builds: with ADDIN_ORIGIN set, the manifest and the functions' help URLs the
 * build writes point at that origin and nowhere else; a bad origin stops the build.
 */
import { readFileSync } from 'fs';
import { join } from 'path';
import { XMLParser } from 'fast-xml-parser';

const { DEV_ORIGIN, checkOrigin, withOrigin } = require('../scripts/deployOrigin.js') as {
  DEV_ORIGIN: string;
  checkOrigin: (text: string) => string;
  withOrigin: (text: string, origin: string) => string;
};

const webpackConfig = require('../webpack.config.js') as (
  env: unknown,
  argv: { mode: string },
) => { plugins: { patterns?: { from: string; to: string; transform?: (content: Buffer) => string }[] }[] };

const ROOT = join(__dirname, '..');
const ORIGIN = 'https://addins.northbench.example';

function copyPatterns() {
  return webpackConfig({}, { mode: 'production' }).plugins.flatMap((p) => p.patterns ?? []);
}

describe('deployment origin', () => {
  const saved = process.env.ADDIN_ORIGIN;
  afterEach(() => {
    if (saved === undefined) delete process.env.ADDIN_ORIGIN;
    else process.env.ADDIN_ORIGIN = saved;
  });

  it('accepts an https origin (a port too) and drops a trailing slash', () => {
    expect(checkOrigin('https://addins.northbench.example/')).toBe(ORIGIN);
    expect(checkOrigin(' https://lab-server:8443 ')).toBe('https://lab-server:8443');
  });

  it.each([
    ['http://addins.northbench.example', /must use https/],
    ['https://addins.northbench.example/proton', /origin only/],
    ['https://user:pw@addins.northbench.example', /origin only/],
    ['addins.northbench.example', /is not a URL/],
  ])('refuses %p', (text, message) => {
    expect(() => checkOrigin(text)).toThrow(message);
  });

  it('a development build writes no manifest and leaves the help URLs alone', () => {
    delete process.env.ADDIN_ORIGIN;
    const patterns = copyPatterns();
    expect(patterns.some((p) => p.to === 'manifest.xml')).toBe(false);
    expect(patterns.find((p) => p.to === 'functions.json')?.transform).toBeUndefined();
  });

  it('a deployment build rewrites every development URL of the manifest and the help URLs, and the manifest still parses', () => {
    process.env.ADDIN_ORIGIN = `${ORIGIN}/`;
    const patterns = copyPatterns();
    const manifest = patterns.find((p) => p.to === 'manifest.xml');
    const functions = patterns.find((p) => p.to === 'functions.json');
    expect(manifest?.transform).toBeDefined();
    const source = readFileSync(join(ROOT, 'manifest.xml'));
    const written = manifest!.transform!(source);
    expect(source.toString()).toContain(DEV_ORIGIN);
    expect(written).not.toContain('localhost');
    expect(written.split(ORIGIN).length - 1).toBe(source.toString().split(DEV_ORIGIN).length - 1);
    const doc = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '@' }).parse(written).OfficeApp;
    expect(doc.SourceLocation?.['@DefaultValue'] ?? doc.DefaultSettings?.SourceLocation?.['@DefaultValue']).toMatch(new RegExp(`^${ORIGIN}/`));
    const metadata = JSON.parse(functions!.transform!(readFileSync(join(ROOT, 'src/functions/metadata.json'))));
    for (const f of metadata.functions) expect(f.helpUrl).toMatch(new RegExp(`^${ORIGIN}/help/functions\\.html#`));
  });

  it('a bad origin stops the build with the reason', () => {
    process.env.ADDIN_ORIGIN = 'http://addins.northbench.example';
    expect(() => copyPatterns()).toThrow(/must use https/);
  });

  it('replaces only the development origin', () => {
    expect(withOrigin(`<a href="${DEV_ORIGIN}/x"/> https://localhost:3001/y`, ORIGIN)).toBe(`<a href="${ORIGIN}/x"/> https://localhost:3001/y`);
  });
});
