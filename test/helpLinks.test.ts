/**
 * Every function's help link (`helpUrl` in the built functions.json, which Excel shows as
 * "Help on this function") lands on a heading of the built help page.
 */
import { readFileSync } from 'fs';
import { join } from 'path';
import { DIST, ensureBuild } from './support/build';

/** Every id="…" of an HTML page. */
function idsOf(html: string): Set<string> {
  return new Set([...html.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]));
}

describe('help links', () => {
  beforeAll(() => ensureBuild(), 600_000);

  test('every helpUrl of dist/functions.json points at an id of dist/help/functions.html', () => {
    const functions = JSON.parse(readFileSync(join(DIST, 'functions.json'), 'utf8')) as { functions: { id: string; helpUrl: string }[] };
    const ids = idsOf(readFileSync(join(DIST, 'help', 'functions.html'), 'utf8'));
    expect(functions.functions.length).toBeGreaterThan(10);
    for (const f of functions.functions) {
      const [page, anchor] = f.helpUrl.split('#');
      expect({ id: f.id, page: page.replace(/^https:\/\/[^/]+\//, '') }).toEqual({ id: f.id, page: 'help/functions.html' });
      expect({ id: f.id, anchor, found: ids.has(anchor) }).toEqual({ id: f.id, anchor, found: true });
    }
  });

  test('the anchor of a function is the id of its own heading', () => {
    const html = readFileSync(join(DIST, 'help', 'functions.html'), 'utf8');
    expect(html).toMatch(/<h3 id="ph-of">PH\.OF\(/);
    expect(html).toMatch(/<h3 id="titrant-ml">TITRANT\.ML\(/);
    expect(html).not.toContain('&lt;a id=');
  });
});
