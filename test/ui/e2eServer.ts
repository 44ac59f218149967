/** Helpers of the browser tests: a free local port, and waiting for `vite preview` to answer. */
import { type ChildProcess, execFileSync, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { type Browser, chromium } from 'playwright-core';

export function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      srv.close(() => ok(port));
    });
  });
}

export async function waitForServer(url: string, child: ChildProcess, log: () => string): Promise<void> {
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error(`vite preview exited early:\n${log()}`);
    try {
      const r = await fetch(url);
      if (r.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((ok) => setTimeout(ok, 100));
  }
  throw new Error(`vite preview did not answer at ${url}:\n${log()}`);
}

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
