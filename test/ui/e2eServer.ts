/** Helpers of the browser tests: the page built, served and opened (port and server helpers from the adversarial harness). */
import { execFileSync, spawn } from 'node:child_process';
import { join } from 'node:path';
import { type Browser, chromium } from 'playwright-core';
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
