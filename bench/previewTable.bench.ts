/**
 * The 656-row recipe table (41 pH × 4 temperatures × 4 concentrations) built by the pane in
 * the preview page, in Chromium: prints the time from the click to the finished table, the
 * longest task that held the page (what the user feels as a freeze), and the longest task
 * after one settings edit on that sheet. Needs a built dist/ (npm run build) and Chromium.
 *
 * Run: npx tsx bench/previewTable.bench.ts [checkout]   (default: this one; pass another
 * checkout's directory, built, to compare)
 */
import { spawn } from 'child_process';
import { mkdtempSync, rmSync } from 'fs';
import { tmpdir } from 'os';
import { join, resolve } from 'path';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

async function main(): Promise<void> {
  const root = resolve(process.argv[2] ?? join(__dirname, '..'));
  const server = spawn(process.execPath, [join(root, 'scripts', 'serve.js'), '--port', '0', '--no-open', '--no-pid-file'], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'] });
  const url = await new Promise<string>((ok, fail) => {
    server.stdout!.on('data', (chunk: Buffer) => {
      const m = /(http:\/\/localhost:\d+\/)/.exec(chunk.toString());
      if (m) ok(m[1]);
    });
    server.on('exit', (code) => fail(new Error(`server exited with ${code}`)));
  });
  const { chromium } = await import('playwright-core');
  const profile = mkdtempSync(join(tmpdir(), 'proton-bench-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    viewport: { width: 1440, height: 900 },
  });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.addInitScript(() => {
      const w = window as unknown as { longTasks: number[] };
      w.longTasks = [];
      new PerformanceObserver((list) => list.getEntries().forEach((e) => w.longTasks.push(e.duration))).observe({ type: 'longtask', buffered: true });
    });
    await page.goto(url);
    await page.waitForSelector('body[data-ready="true"]');
    await page.fill('#field-phStart', '6.5');
    await page.fill('#field-phStop', '8.5');
    await page.fill('#field-phStep', '0.05');
    await page.fill('#field-useTemperaturesC', '4; 20; 25; 37');
    await page.fill('#field-concentrationsMm', '10; 25; 50; 100');
    await page.evaluate(() => ((window as unknown as { longTasks: number[] }).longTasks.length = 0));
    const t0 = Date.now();
    await page.click('#build-table');
    await page.waitForSelector('#pane-status.status-done', { timeout: 300000 });
    const buildMs = Date.now() - t0;
    const longest = async () => page.evaluate(() => Math.max(0, ...(window as unknown as { longTasks: number[] }).longTasks));
    const buildLongest = await longest();
    const status = await page.locator('#pane-status').textContent();
    // One settings edit: the bench temperature (its label in column A, value in B).
    const row = await page
      .locator('#grid-scroll td[data-col="0"]')
      .filter({ hasText: /^Bench temp\. \(°C\)$/ })
      .first()
      .getAttribute('data-row');
    await page.click(`#grid-scroll td[data-row="${row}"][data-col="1"]`);
    await page.evaluate(() => ((window as unknown as { longTasks: number[] }).longTasks.length = 0));
    const t1 = Date.now();
    await page.fill('#formula-input', '21');
    await page.press('#formula-input', 'Enter');
    await page.waitForFunction(() => document.querySelector('#formula-input') !== null);
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    const editMs = Date.now() - t1;
    console.log(`${root}: ${status}`);
    console.log(
      `656-row table in the preview: build ${(buildMs / 1000).toFixed(2)} s, longest task ${buildLongest.toFixed(0)} ms; one settings edit ${(editMs / 1000).toFixed(2)} s (longest task ${(await longest()).toFixed(0)} ms)`,
    );
  } finally {
    await context.close();
    server.kill('SIGTERM');
    rmSync(profile, { recursive: true, force: true });
  }
}

void main();
