/** docs/substances.md is generated from the library and must not go stale. */
import { readFileSync } from 'fs';
import { join } from 'path';
import { SUBSTANCE_DOCS_PATH, substanceDocsMarkdown } from '../../../scripts/substanceDocs';

describe('docs/substances.md', () => {
  it('matches the library data (if this fails, run `npx tsx scripts/substanceDocs.ts` to refresh)', () => {
    const committed = readFileSync(join(__dirname, '..', '..', '..', SUBSTANCE_DOCS_PATH), 'utf8');
    const fresh = substanceDocsMarkdown();
    if (committed !== fresh) throw new Error('docs/substances.md is stale: run `npx tsx scripts/substanceDocs.ts` to refresh it.');
    expect(committed).toBe(fresh);
  });
});
