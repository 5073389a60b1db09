/**
 * The generated metadata is the single source every host registers from: it must match
 * the JSDoc it is generated from, and every function must have an implementation, a help
 * anchor in docs/functions.md and (when it spills) a predictable size.
 */
import { readFileSync } from 'fs';
import { join } from 'path';
import { generateMetadataFiles, METADATA_FILE, ASSOCIATIONS_FILE } from '../../scripts/functionsMetadata';
import { CATALOG } from '../../src/functions/catalog';
import { spillShape } from '../../src/functions/functions';

const DOCS = readFileSync(join(__dirname, '../../docs/functions.md'), 'utf8');

describe('function metadata', () => {
  test('metadata.json and associations.json are up to date with the JSDoc (else run npm run metadata)', async () => {
    const fresh = await generateMetadataFiles();
    expect(readFileSync(METADATA_FILE, 'utf8')).toBe(fresh.metadata);
    expect(readFileSync(ASSOCIATIONS_FILE, 'utf8')).toBe(fresh.associations);
  }, 60000);

  test.each(CATALOG.map((f) => [f.id, f] as const))('%s: id equals name, has a description, a help anchor in docs/functions.md, units-bearing parameter names', (_id, fn) => {
    expect(fn.name).toBe(fn.id);
    expect(fn.description.length).toBeGreaterThan(20);
    const anchor = fn.helpUrl.split('#')[1];
    expect(fn.helpUrl).toMatch(/^https:\/\/localhost:3000\/help\/functions\.html#/);
    expect(DOCS).toContain(`<a id="${anchor}"></a>`);
    for (const p of fn.parameters) expect(p.description && p.description.length).toBeTruthy();
    expect(
      spillShape(
        fn.id,
        fn.parameters.map(() => 1),
      ) !== undefined,
    ).toBe(fn.spills);
  });
});
