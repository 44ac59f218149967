/**
 * Shared pieces of the adversarial page families: build the page (vite build --mode e2e, with the test
 * hooks) into its own folder, serve it with `vite preview`, start the system Chromium, and record one
 * row of counts per family in test-results/adversarial-page.json (merged with the command-line
 * families' rows into README's hardening table).
 */
import { type ChildProcess, execFileSync, spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';

export { mulberry32 as seeded } from '../../src/model/random/mulberry32';

export const ROOT = resolve(__dirname, '../..');
export const CHROMIUM = '/usr/bin/chromium';
export const OUT = join(ROOT, 'test-results');
export const VITE = join(ROOT, 'node_modules/vite/bin/vite.js');
export const haveBrowser = existsSync(CHROMIUM);
export const requireBrowser = process.env.COVERSWEEP_REQUIRE_BROWSER === '1';
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--enable-unsafe-swiftshader',
];

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

/** Build the page (`mode`: 'e2e' keeps the test hooks, 'production' is what ships) into `dir`. */
export function buildPage(dir: string, mode: 'e2e' | 'production'): void {
  mkdirSync(OUT, { recursive: true });
  execFileSync(
    process.execPath,
    [VITE, 'build', '--mode', mode, '--outDir', dir, '--emptyOutDir', '--logLevel', 'warn'],
    { cwd: ROOT, stdio: 'pipe' },
  );
}

/** Serve `dir` with vite preview; resolves with the base URL and the server process. */
export async function servePage(dir: string): Promise<{ base: string; server: ChildProcess }> {
  const port = await freePort();
  let log = '';
  const server = spawn(
    process.execPath,
    [VITE, 'preview', '--outDir', dir, '--host', '127.0.0.1', '--port', String(port), '--strictPort'],
    { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] },
  );
  server.stdout?.on('data', (d) => {
    log += String(d);
  });
  server.stderr?.on('data', (d) => {
    log += String(d);
  });
  const base = `http://127.0.0.1:${port}/`;
  await waitForServer(base, server, () => log);
  return { base, server };
}

/** Wait until the page has finished computing (or failed); returns the final state. */
export async function settled(page: Page, timeout = 90_000): Promise<string> {
  await page.waitForFunction(
    () => document.body.dataset.state === 'done' || document.body.dataset.state === 'error',
    null,
    { timeout },
  );
  return page.evaluate(() => document.body.dataset.state ?? '');
}

export async function panelState(
  page: Page,
  id: string,
  states: string[],
  timeout = 60_000,
): Promise<string> {
  await page.waitForFunction(
    ({ id, states }) => states.includes(document.getElementById(id)?.dataset.state ?? ''),
    { id, states },
    { timeout },
  );
  return page.evaluate((id) => document.getElementById(id)?.dataset.state ?? '', id);
}

/** One family's counts (a row of README's hardening table). */
export interface FamilyRow {
  family: string;
  inputs: number;
  crashes: number;
  hangs: number;
  lost_work: number;
  executed_injections: number;
  /** Anything else measured (e.g. the longest main-thread block). */
  notes?: Record<string, number | string>;
}

export const RESULTS_FILE = join(OUT, 'adversarial-page.json');

/** Add or replace a family's row in test-results/adversarial-page.json, and print it. */
export function recordFamily(row: FamilyRow): void {
  mkdirSync(OUT, { recursive: true });
  let rows: FamilyRow[] = [];
  try {
    rows = JSON.parse(readFileSync(RESULTS_FILE, 'utf8')) as FamilyRow[];
    if (!Array.isArray(rows)) rows = [];
  } catch {
    rows = [];
  }
  rows = [...rows.filter((r) => r.family !== row.family), row];
  writeFileSync(RESULTS_FILE, `${JSON.stringify(rows, null, 2)}\n`);
  process.stdout.write(`[adversarial] ${JSON.stringify(row)}\n`);
}
