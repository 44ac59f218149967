/** Helpers of the browser tests: the page built, served and opened (port and server helpers from the adversarial harness). */
import { execFileSync, spawn } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { type Browser, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe } from 'vitest';
import { freePort, waitForServer } from '../adversarial/pageHarness';

export { freePort, waitForServer };

/** A page built with `vite build --mode e2e` into `dist`, served by `vite preview`, and a headless Chromium. */
export interface E2ePage {
  base: string;
  browser: Browser;
  close(): Promise<void>;
}

/**
 * Build the page (test hooks kept) into `dist`, serve it on a free port and launch the system's Chromium
 * (`chromiumPath`; no browser is downloaded). `close` stops both.
 */
export async function startE2ePage(root: string, dist: string, chromiumPath: string): Promise<E2ePage> {
  const vite = join(root, 'node_modules/vite/bin/vite.js');
  execFileSync(
    process.execPath,
    [vite, 'build', '--mode', 'e2e', '--outDir', dist, '--emptyOutDir', '--logLevel', 'warn'],
    {
      cwd: root,
      stdio: 'pipe',
    },
  );
  const port = await freePort();
  const server = spawn(
    process.execPath,
    [vite, 'preview', '--outDir', dist, '--host', '127.0.0.1', '--port', String(port), '--strictPort'],
    { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] },
  );
  let serverLog = '';
  server.stdout?.on('data', (d) => {
    serverLog += String(d);
  });
  server.stderr?.on('data', (d) => {
    serverLog += String(d);
  });
  const base = `http://127.0.0.1:${port}/`;
  await waitForServer(base, server, () => serverLog);
  const browser = await chromium.launch({
    executablePath: chromiumPath,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--enable-unsafe-swiftshader'],
  });
  return {
    base,
    browser,
    async close() {
      await browser.close();
      if (server.exitCode === null) server.kill('SIGTERM');
    },
  };
}

/** The project's root, where browser tests write their outputs (test-results/), and the system's Chromium. */
export const E2E_ROOT = resolve(__dirname, '../..');
export const E2E_OUT = join(E2E_ROOT, 'test-results');
export const CHROMIUM = '/usr/bin/chromium';
export const haveBrowser = existsSync(CHROMIUM);
export const requireBrowser = process.env.COVERSWEEP_REQUIRE_BROWSER === '1';

/** A describe for browser tests: skipped where Chromium is missing, unless COVERSWEEP_REQUIRE_BROWSER=1,
 * where the missing browser fails instead (CI sets it). */
export const describeInBrowser = describe.skipIf(!haveBrowser && !requireBrowser);

/**
 * Register the enclosing describe's hooks: build the page into test-results/<distName>, serve it and launch
 * Chromium before the tests (`ready` receives the page and browser), and close both after them.
 */
export function servePage(distName: string, ready: (page: E2ePage) => void): void {
  let served: E2ePage | null = null;
  beforeAll(async () => {
    if (!haveBrowser) throw new Error(`${CHROMIUM} is missing and COVERSWEEP_REQUIRE_BROWSER=1`);
    mkdirSync(E2E_OUT, { recursive: true });
    served = await startE2ePage(E2E_ROOT, join(E2E_OUT, distName), CHROMIUM);
    ready(served);
  }, 300_000);
  afterAll(async () => {
    await served?.close();
  });
}

/** Wait until the page has finished computing (body[data-state="done"]). */
export async function settled(page: Page, timeoutMs = 90_000): Promise<void> {
  await page.waitForFunction(() => document.body.dataset.state === 'done', null, { timeout: timeoutMs });
}
