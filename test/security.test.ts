/**
 * Security checks on the source and on the built pages and bundles: no code from strings,
 * no HTML from strings, no network requests at run time, a Content-Security-Policy on the
 * preview page, and the least permission in the manifest.
 */
import { readFileSync, readdirSync, statSync } from 'fs';
import { join } from 'path';
import { DIST, ROOT, ensureBuild } from './support/build';

function filesUnder(dir: string, ending: RegExp): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const path = join(dir, e.name);
    return e.isDirectory() ? filesUnder(path, ending) : ending.test(e.name) ? [path] : [];
  });
}

describe('our source', () => {
  const sources = filesUnder(join(ROOT, 'src'), /\.ts$/);

  it.each([
    ['eval', /\beval\s*\(/],
    ['new Function', /new\s+Function\s*\(/],
    ['innerHTML / outerHTML', /\.(inner|outer)HTML\b/],
    ['insertAdjacentHTML', /insertAdjacentHTML/],
    ['document.write', /document\.write/],
  ])('uses no %s', (_label, pattern) => {
    const hits = sources.filter((f) => pattern.test(readFileSync(f, 'utf8').replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, '')));
    expect(hits).toEqual([]);
  });
});

describe('the built pages and bundles', () => {
  beforeAll(() => ensureBuild(), 600_000);

  /** Our own bundles: the functions, the pane and the preview page. */
  const bundles = () => ['functions.js', 'taskpane.js', 'preview.js'].map((f) => join(DIST, f));
  const pages = () => filesUnder(DIST, /\.html$/).filter((f) => !f.includes(`${join(DIST, 'office')}`));

  it('make no network requests: no fetch, XMLHttpRequest, WebSocket, EventSource, sendBeacon or importScripts in our bundles', () => {
    for (const file of bundles()) {
      const text = readFileSync(file, 'utf8');
      for (const api of ['fetch(', 'XMLHttpRequest', 'WebSocket', 'EventSource', 'sendBeacon', 'importScripts']) {
        expect({ file, api, found: text.includes(api) }).toEqual({ file, api, found: false });
      }
    }
  });

  it('load scripts, styles and images from their own origin only (relative addresses; Office.js is served from dist/office)', () => {
    for (const page of pages()) {
      const html = readFileSync(page, 'utf8');
      const addresses = [...html.matchAll(/\b(?:src|href)\s*=\s*"([^"]*)"/g)].map((m) => m[1]);
      for (const address of addresses) expect({ page, address, remote: /^([a-z]+:)?\/\//i.test(address) }).toEqual({ page, address, remote: false });
    }
  });

  it('the preview page carries a Content-Security-Policy that forbids inline script, eval and remote code', () => {
    const html = readFileSync(join(DIST, 'index.html'), 'utf8');
    const csp = /http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(html)?.[1] ?? '';
    expect(csp).toMatch(/default-src 'self'/);
    expect(csp).toMatch(/script-src 'self'(;|$)/);
    expect(csp).toMatch(/connect-src 'self'/);
    expect(csp).not.toMatch(/unsafe-inline|unsafe-eval|https?:/);
    expect(html).not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>/);
  });

  it('the Excel pages load Office.js from our own origin', () => {
    const html = readFileSync(join(DIST, 'taskpane.html'), 'utf8');
    expect(html).toMatch(/src="office\/office\.js"/);
    expect(statSync(join(DIST, 'office', 'office.js')).size).toBeGreaterThan(1000);
  });
});

describe('manifest.xml', () => {
  it('asks for the least permission that works (ReadWriteDocument: the pane writes sheets; nothing more)', () => {
    const xml = readFileSync(join(ROOT, 'manifest.xml'), 'utf8');
    const permissions = [...xml.matchAll(/<Permissions>([^<]+)<\/Permissions>/g)].map((m) => m[1].trim());
    expect(permissions).toEqual(['ReadWriteDocument']);
  });
});
