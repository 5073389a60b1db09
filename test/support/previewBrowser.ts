/**
 * The preview page in a real browser for the e2e tests: builds dist/ when stale, starts
 * scripts/serve.js on a free port and launches Debian's Chromium through playwright-core
 * with a fresh profile (so its storage starts empty). Waits for states, never for times.
 */
import { ChildProcess, spawn } from 'child_process';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import type { BrowserContext, Page } from 'playwright-core';
import { ensureBuild } from './build';

export const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
export const ROOT = join(__dirname, '..', '..');
export const ARTIFACTS = join(ROOT, 'test-artifacts');
export const haveBrowser = existsSync(CHROMIUM);
const inCi = process.env.CI === 'true' || process.env.CI === '1';
/** describe, or describe.skip with a warning when there is no Chromium (outside CI). */
export const describeBrowser = haveBrowser || inCi ? describe : describe.skip;
if (!haveBrowser && !inCi) console.warn(`Browser tests skipped: no Chromium at ${CHROMIUM} (install it with: apt-get install -y chromium).`);

export interface PreviewSession {
  readonly baseUrl: string;
  readonly context: BrowserContext;
  readonly page: Page;
  /** Errors the page logged or threw. */
  readonly pageErrors: string[];
  close(): Promise<void>;
}

/** Builds if needed, serves dist/, opens the preview page and waits until it is ready. */
export async function openPreview(): Promise<PreviewSession> {
  if (!haveBrowser) throw new Error(`CI=true and no Chromium at ${CHROMIUM}: the browser tests must run in CI (apt-get install -y chromium).`);
  ensureBuild();
  mkdirSync(ARTIFACTS, { recursive: true });
  const server: ChildProcess = spawn(process.execPath, [join(ROOT, 'scripts', 'serve.js'), '--port', '0', '--no-open', '--no-pid-file'], {
    cwd: ROOT,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const baseUrl = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('server did not start')), 30000);
    server.stdout!.on('data', (chunk: Buffer) => {
      const m = /(http:\/\/localhost:\d+\/)/.exec(chunk.toString());
      if (m) {
        clearTimeout(timer);
        resolve(m[1]);
      }
    });
    server.on('exit', (code) => reject(new Error(`server exited with ${code}`)));
  });
  const { chromium } = await import('playwright-core');
  const profile = mkdtempSync(join(tmpdir(), 'proton-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    viewport: { width: 1440, height: 900 },
    acceptDownloads: true,
    permissions: ['clipboard-read', 'clipboard-write'],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const pageErrors: string[] = [];
  page.on('pageerror', (e) => pageErrors.push(`pageerror: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() === 'error') pageErrors.push(`console: ${m.text()}`);
  });
  await page.goto(baseUrl);
  await page.waitForSelector('body[data-ready="true"]', { timeout: 60000 });
  return {
    baseUrl,
    context,
    page,
    pageErrors,
    async close() {
      await context.close();
      server.kill('SIGTERM');
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
