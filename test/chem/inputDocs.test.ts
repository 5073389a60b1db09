/** docs/input.md is generated from the input declarations and must not go stale. */
import { readFileSync } from 'fs';
import { join } from 'path';
import { INPUT_DOCS_PATH, inputDocsMarkdown } from '../../scripts/inputDocs';

describe('docs/input.md', () => {
  it('matches the field declarations (if this fails, run `npx tsx scripts/inputDocs.ts` to refresh)', () => {
    const committed = readFileSync(join(__dirname, '..', '..', INPUT_DOCS_PATH), 'utf8');
    if (committed !== inputDocsMarkdown()) throw new Error('docs/input.md is stale: run `npx tsx scripts/inputDocs.ts` to refresh it.');
    expect(committed).toBe(inputDocsMarkdown());
  });
});
