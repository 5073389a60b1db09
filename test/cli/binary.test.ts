/**
 * The command line as a user runs it: the built `lib/cli/main.js` in a child process (built
 * here first with the project's tsc config, so the test never runs a stale copy).
 */
import { execFileSync, spawnSync } from 'child_process';
import { join } from 'path';

const ROOT = join(__dirname, '..', '..');
const BIN = join(ROOT, 'lib', 'cli', 'main.js');

function cli(args: string[], input?: string): { status: number | null; stdout: string } {
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, input: input ?? '', encoding: 'utf8', timeout: 60_000 });
  return { status: r.status, stdout: r.stdout };
}

beforeAll(() => {
  execFileSync(process.execPath, [join(ROOT, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', 'tsconfig.cli.json'], { cwd: ROOT, stdio: 'inherit' });
}, 180_000);

describe('the built proton-ledger binary', () => {
  it('answers --help, <command> --help and --version without waiting for input', () => {
    expect(cli(['--help'])).toMatchObject({ status: 0, stdout: expect.stringMatching(/^Usage: proton-ledger <command>/) });
    expect(cli(['recipe', '--help'])).toMatchObject({ status: 0, stdout: expect.stringMatching(/titrant\.concentrationM/) });
    expect(cli(['solve', '--help'])).toMatchObject({ status: 0, stdout: expect.stringMatching(/strongIonsMm/) });
    expect(cli(['--version'])).toMatchObject({ status: 0, stdout: expect.stringMatching(/^proton-ledger \d+\.\d+\.\d+\n$/) });
  });

  // `script` (util-linux) gives the command a terminal as standard input, as a person typing it would.
  const hasScript = spawnSync('script', ['--version']).status === 0;
  (hasScript ? it : it.skip)('with a terminal and no input, prints the command’s usage instead of waiting', () => {
    const r = spawnSync('script', ['-qec', `"${process.execPath}" "${BIN}" recipe`, '/dev/null'], {
      cwd: ROOT,
      encoding: 'utf8',
      timeout: 30_000,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/Usage: proton-ledger recipe/);
  });

  it('plans a recipe piped on standard input, numbers with units included', () => {
    const r = cli(['recipe'], JSON.stringify({ buffer: 'MES', targetPh: '6,1', concentrationMm: '20 mM', volumeMl: '0.25 L' }));
    expect(r.status).toBe(0);
    const plan = JSON.parse(r.stdout);
    expect(Math.abs(plan.predictions.pHAtUse - 6.1)).toBeLessThan(0.001);
    expect(plan.volumeMl).toBe(250);
  });

  it('exits 2 with a JSON error naming the field as the user wrote it', () => {
    const r = cli(['recipe', '--json', JSON.stringify({ buffer: 'MES', targetPh: 6.1, concentrationMm: '9 M', volumeMl: 250 })]);
    expect(r.status).toBe(2);
    expect(JSON.parse(r.stdout).error).toMatchObject({ kind: 'invalid-input', code: 'outOfRange', field: 'concentrationMm', allowed: '0.001 to 5000 mM' });
  });
});
