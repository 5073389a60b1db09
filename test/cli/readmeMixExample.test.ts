/**
 * The README shows `mix --text` on our own shelf (docs/examples/shelf.json) and what it
 * prints. The printed block must be what the command prints today, line for line, so the
 * README never shows an answer the tool no longer gives (an earlier block went stale when
 * the default activity model changed).
 */
import { readFileSync } from 'fs';
import { join } from 'path';
import { run } from '../../src/cli/main';

const ROOT = join(__dirname, '..', '..');

it('the README mix example prints what the README shows, line for line', () => {
  const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
  const command = /node lib\/cli\/main\.js mix --text --shelf docs\/examples\/shelf\.json --json '([^']+)'/.exec(readme);
  expect(command).not.toBeNull();
  const start = readme.indexOf('```text\n', command!.index) + '```text\n'.length;
  const shown = readme.slice(start, readme.indexOf('```', start)).trimEnd().split('\n');
  let text = '';
  const code = run(['mix', '--text', '--shelf', join(ROOT, 'docs/examples/shelf.json'), '--json', command![1]], (t) => (text += t));
  expect(code).toBe(0);
  expect(text.split('\n').slice(0, shown.length)).toEqual(shown);
});
