/**
 * The production build the browser and bundle tests read: built by webpack unless dist/ is
 * newer than every source file (CI builds first; set E2E_REBUILD=1 to force a build).
 */
import { execSync } from 'child_process';
import { existsSync, readdirSync, statSync } from 'fs';
import { join } from 'path';

export const ROOT = join(__dirname, '..', '..');
export const DIST = join(ROOT, 'dist');

/** Newest modification time of the files under a folder, ms. */
function newest(dir: string): number {
  let t = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    t = Math.max(t, entry.isDirectory() ? newest(path) : statSync(path).mtimeMs);
  }
  return t;
}

/** Builds dist/ when it is missing or older than src/. */
export function ensureBuild(): void {
  const index = join(DIST, 'index.html');
  const fresh = existsSync(index) && !process.env.E2E_REBUILD && statSync(index).mtimeMs > newest(join(ROOT, 'src'));
  if (!fresh) execSync('npx webpack --mode production', { cwd: ROOT, stdio: 'inherit' });
}
