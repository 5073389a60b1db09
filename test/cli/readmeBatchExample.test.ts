/**
 * The README shows the as-made check of our cold-room HEPES saline (docs/examples/
 * hepes-cold-room-batch.json) as a table. Every number in it must be what the command line
 * computes today, to the digits shown, so the README never shows an answer the tool no
 * longer gives (an earlier table went stale when the default activity model changed).
 */
import { readFileSync } from 'fs';
import { join } from 'path';
import { run } from '../../src/cli/main';

const ROOT = join(__dirname, '..', '..');

/** A table cell as a number: "−0.12 %" → -0.12, "7.400" → 7.4; blank or words → undefined. */
function numberIn(cell: string): { value: number; decimals: number } | undefined {
  const m = /^([+−-]?)(\d+(?:\.(\d+))?)( %)?$/.exec(cell.trim());
  if (!m) return undefined;
  return { value: (m[1] === '−' || m[1] === '-' ? -1 : 1) * Number(m[2]), decimals: m[3]?.length ?? 0 };
}

describe('the README example batch', () => {
  const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
  const start = readme.indexOf('| check | planned | as made | deviation | tolerance | result |');
  const table = readme
    .slice(start)
    .split('\n')
    .slice(2)
    .filter((_, i, lines) => lines.slice(0, i + 1).every((l) => l.startsWith('|')));
  let text = '';
  const code = run(['as-made', '--json', readFileSync(join(ROOT, 'docs/examples/hepes-cold-room-batch.json'), 'utf8')], (t) => (text += t));
  const out = JSON.parse(text);
  const computed: Record<string, [number, number, number, boolean | undefined]> = {};
  for (const c of out.components) computed[`${c.plannedName} (mM)`] = [c.plannedMm, c.actualMm, c.deviationPercent, c.pass];
  computed[`${out.titrant.name} (mM)`] = [out.titrant.plannedMm, out.titrant.actualMm, out.titrant.deviationPercent, undefined];
  for (const c of out.checks) computed[c.unit === 'pH' ? c.label : `${c.label} (${c.unit})`] = [c.planned, c.value, c.deviation, c.pass];

  it('passes, as the README says, and the table has a row for every component and check', () => {
    expect(code).toBe(0);
    expect(table.length).toBe(Object.keys(computed).length + 1);
  });

  it.each(table.filter((l) => !l.startsWith('| batch')).map((l) => [l.split('|')[1].trim(), l]))('row "%s" shows what as-made computes, to the digits shown', (label, line) => {
    const cells = line.split('|').slice(2, 7);
    const expected = computed[label];
    expect(expected).toBeDefined();
    for (let k = 0; k < 3; k++) {
      const shown = numberIn(cells[k]);
      if (!shown) continue;
      // Half a unit in the last digit shown, plus float slack.
      expect(Math.abs(shown.value - (expected[k] as number))).toBeLessThanOrEqual(0.5 * 10 ** -shown.decimals + 1e-9);
    }
    if (expected[3] !== undefined) expect(cells[4].trim()).toBe(expected[3] ? 'PASS' : 'FAIL');
  });
});
