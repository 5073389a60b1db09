/**
 * Security checks on the source and on the built pages and bundles: no code from strings,
 * no HTML from strings, no network requests from any bundle of ours, the Excel pages loading
 * Office.js from Microsoft's CDN (and nothing else remote) under a Content-Security-Policy,
 * the preview page fully local under its own, and the least permission in the manifest.
 */
import { existsSync, readFileSync, readdirSync } from 'fs';
import { join } from 'path';
import { DIST, ROOT, ensureBuild } from './support/build';

const webpackConfig = require('../webpack.config.js') as ((env: unknown, argv: { mode: string }) => unknown) & { OFFICE_JS_CDN: string; excelCsp: (local: boolean) => string };
const { OFFICE_JS_CDN, excelCsp } = webpackConfig;

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
      // Calls and constructions, not mere names: a bundled setImmediate polyfill tests `!global.importScripts` to detect a worker.
      for (const api of ['fetch(', 'new XMLHttpRequest', 'new WebSocket', 'new EventSource', 'sendBeacon(', 'importScripts(']) {
        expect({ file, api, found: text.includes(api) }).toEqual({ file, api, found: false });
      }
    }
  });

  /** The pages Excel opens (they load Office.js); every other page is ours alone. */
  const EXCEL_PAGES = ['taskpane.html', 'functions.html'];

  it('load scripts, styles and images from their own origin only; the Excel pages add Office.js from Microsoft and nothing else', () => {
    for (const page of pages()) {
      const html = readFileSync(page, 'utf8');
      const excel = EXCEL_PAGES.some((name) => page === join(DIST, name));
      const addresses = [...html.matchAll(/\b(?:src|href)\s*=\s*"([^"]*)"/g)].map((m) => m[1]);
      const remote = addresses.filter((address) => /^([a-z]+:)?\/\//i.test(address));
      expect({ page, remote }).toEqual({ page, remote: excel ? [OFFICE_JS_CDN] : [] });
    }
  });

  it.each(EXCEL_PAGES)("%s loads Office.js from Microsoft's CDN in <head>, under a CSP that allows scripts from there and our origin only", (name) => {
    const html = readFileSync(join(DIST, name), 'utf8');
    const head = html.slice(0, html.indexOf('</head>'));
    expect(OFFICE_JS_CDN).toBe('https://appsforoffice.microsoft.com/lib/1/hosted/office.js');
    expect(head).toContain(`<script src="${OFFICE_JS_CDN}"></script>`);
    const csp = /http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(head)?.[1] ?? '';
    expect(head.indexOf('Content-Security-Policy')).toBeLessThan(head.indexOf(OFFICE_JS_CDN));
    expect(csp).toMatch(/(^|; )script-src 'self' https:\/\/appsforoffice\.microsoft\.com(;|$)/);
    expect(csp).toMatch(/object-src 'none'/);
    expect(csp).not.toMatch(/unsafe-inline|unsafe-eval/);
    expect(html).not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>/);
  });

  it('no copy of Office.js in a default build (only OFFICE_JS=local writes dist/office)', () => {
    expect(existsSync(join(DIST, 'office'))).toBe(false);
  });

  it('the preview page loads no Office.js', () => {
    const html = readFileSync(join(DIST, 'index.html'), 'utf8');
    expect(html).not.toMatch(/office\.js|appsforoffice/i);
    expect(readFileSync(join(DIST, 'preview.js'), 'utf8')).not.toMatch(/appsforoffice/);
  });
});

describe('OFFICE_JS=local (closed networks)', () => {
  const saved = process.env.OFFICE_JS;
  afterEach(() => {
    if (saved === undefined) delete process.env.OFFICE_JS;
    else process.env.OFFICE_JS = saved;
  });
  type Plugin = { userOptions?: { filename?: string; templateParameters?: { officeJs: string; csp: string } }; patterns?: { to: string }[] };
  const plugins = () => (webpackConfig({}, { mode: 'production' }) as { plugins: Plugin[] }).plugins;

  it('serves Office.js from our own origin, copies it into office/, and narrows the CSP to our origin', () => {
    process.env.OFFICE_JS = 'local';
    const pages = plugins().filter((p) => ['taskpane.html', 'functions.html'].includes(p.userOptions?.filename ?? ''));
    expect(pages).toHaveLength(2);
    for (const page of pages) expect(page.userOptions!.templateParameters).toEqual({ officeJs: 'office/office.js', csp: excelCsp(true) });
    expect(excelCsp(true)).toMatch(/^script-src 'self';/);
    expect(
      plugins()
        .flatMap((p) => p.patterns ?? [])
        .some((c) => c.to === 'office/[name][ext]'),
    ).toBe(true);
  });

  it('any other value stops the build', () => {
    process.env.OFFICE_JS = 'offline';
    expect(() => plugins()).toThrow(/OFFICE_JS must be "cdn" \(the default\) or "local"/);
  });
});

describe('manifest.xml', () => {
  it('asks for the least permission that works (ReadWriteDocument: the pane writes sheets; nothing more)', () => {
    const xml = readFileSync(join(ROOT, 'manifest.xml'), 'utf8');
    const permissions = [...xml.matchAll(/<Permissions>([^<]+)<\/Permissions>/g)].map((m) => m[1].trim());
    expect(permissions).toEqual(['ReadWriteDocument']);
  });
});

describe('citations stay inside the repository', () => {
  it('no source, test, script or doc cites a planning file outside the repository (SCIENCE.md, "the brief")', () => {
    const { execSync } = jest.requireActual('child_process') as typeof import('child_process');
    const hits = execSync("git grep -n -I -E 'SCIENCE\\.md|the brief\\b|brief.s bar' -- src test scripts bench docs README.md DEVELOPERS.md ':!test/security.test.ts' || true", {
      cwd: `${__dirname}/..`,
      encoding: 'utf8',
    });
    expect(hits).toBe('');
  });
});
