/**
 * The production builds the browser, bundle and conformance tests read: built by webpack
 * unless the output is newer than every input (sources, docs, scripts, manifest, icons,
 * webpack.config.js); CI builds first; set E2E_REBUILD=1 to force a build.
 */
import { execSync } from 'child_process';
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync, statSync, writeFileSync } from 'fs';
import { basename, join } from 'path';

export const ROOT = join(__dirname, '..', '..');
export const DIST = join(ROOT, 'dist');
/** Where the conformance test puts its deployment build (ADDIN_ORIGIN set). */
export const DEPLOY_DIST = join(ROOT, 'test-artifacts', 'dist-deploy');
/** The origin of that deployment build. */
export const DEPLOY_ORIGIN = 'https://example.org';

/** What a build reads: a change to any of these makes a build stale. */
const INPUTS = ['src', 'docs/functions.md', 'scripts', 'assets', 'manifest.xml', 'webpack.config.js', 'package-lock.json'];

/** Newest modification time of the files under a path, ms. */
function newest(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let t = 0;
  for (const entry of readdirSync(path, { withFileTypes: true })) t = Math.max(t, newest(join(path, entry.name)));
  return t;
}

/** Runs `work` holding a lock directory, so test files in parallel workers never build the same output at once. */
function withLock(name: string, work: () => void): void {
  const lock = join(ROOT, 'test-artifacts', `${name}.lock`);
  mkdirSync(join(ROOT, 'test-artifacts'), { recursive: true });
  const deadline = Date.now() + 600_000;
  for (;;) {
    try {
      mkdirSync(lock);
      break;
    } catch {
      if (existsSync(lock) && Date.now() - statSync(lock).mtimeMs > 600_000) rmSync(lock, { recursive: true, force: true });
      if (Date.now() > deadline) throw new Error(`${lock} is held for too long; remove it if no build is running`);
      Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 500);
    }
  }
  try {
    work();
  } finally {
    rmSync(lock, { recursive: true, force: true });
  }
}

/** Builds into `dir` (with extra environment) when its stamp is missing, older than the inputs, or from other settings. */
function build(dir: string, env: Record<string, string>): void {
  withLock(basename(dir), () => buildUnlocked(dir, env));
}

function buildUnlocked(dir: string, env: Record<string, string>): void {
  // The stamp is written after each build here (webpack leaves unchanged files untouched, so
  // their times say nothing); a build made by `npm run build` has none and is judged by index.html.
  const settings = join(dir, '.build-settings.json');
  const stamp = existsSync(settings) ? settings : join(dir, 'index.html');
  const wanted = JSON.stringify(env);
  const inputs = Math.max(...INPUTS.map((p) => newest(join(ROOT, p))));
  const fresh =
    !process.env.E2E_REBUILD &&
    existsSync(stamp) &&
    statSync(stamp).mtimeMs > inputs &&
    (existsSync(settings) ? readFileSync(settings, 'utf8') : JSON.stringify({})) === wanted &&
    // A build by hand with ADDIN_ORIGIN or OFFICE_JS=local writes these; the default build does not.
    existsSync(join(dir, 'manifest.xml')) === 'ADDIN_ORIGIN' in env &&
    !existsSync(join(dir, 'office'));
  if (fresh) return;
  const clean = { ...process.env };
  delete clean.ADDIN_ORIGIN;
  delete clean.OFFICE_JS;
  execSync('npx webpack --mode production', { cwd: ROOT, stdio: 'inherit', env: { ...clean, ...env, DIST_DIR: dir } });
  writeFileSync(settings, wanted);
}

/** Builds dist/ (the default build: no origin, Office.js from the CDN) when it is missing or stale. */
export function ensureBuild(): void {
  build(DIST, {});
}

/** Builds the deployment build for DEPLOY_ORIGIN into DEPLOY_DIST when it is missing or stale. */
export function ensureDeployBuild(): void {
  build(DEPLOY_DIST, { ADDIN_ORIGIN: DEPLOY_ORIGIN });
}
