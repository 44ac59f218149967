/**
 * `npm run bench:page`: the page's speed and memory in headless Chromium on this machine, printed as JSON
 * lines like `npm run bench` (never a timed test). Builds the page (vite build) into a temporary folder,
 * serves it with `vite preview`, and for each of N fresh browser pages measures, from the page's own clock
 * (performance.now(), whose origin is the navigation):
 *   - firstHeadlineMs: the first current-design result on screen (the page's data-first-result-ms mark),
 *   - doneMs: every plot and the design map drawn (body data-state first becomes "done"),
 *   - controlChangeMs: from the Enter key that commits a cover-fraction edit to "done" again,
 *   - memory: the page's JS heap (CDP Runtime.getHeapUsage) and the proportional set size (PSS) of every
 *     Chromium process of the run (renderer and its dedicated workers included), read from /proc.
 * Medians of the runs are printed with the targets beside them. Needs /usr/bin/chromium
 * (apt-get install -y chromium); says so and exits 0 when it is missing, like the browser tests.
 */
import { type ChildProcess, execFileSync, spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { availableParallelism, cpus, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium } from 'playwright-core';
import { median } from './timing';

const ROOT = resolve(import.meta.dirname, '..');
const CHROMIUM = '/usr/bin/chromium';
const VITE = join(ROOT, 'node_modules/vite/bin/vite.js');
const RUNS = Math.max(1, Number(process.env.COVERSWEEP_PAGE_BENCH_RUNS ?? 5));
const machine = { cores: availableParallelism(), cpu: cpus()[0]?.model ?? 'unknown', node: process.version };

function print(name: string, figures: Record<string, unknown>): void {
  console.log(JSON.stringify({ bench: name, ...figures, machine }));
}

function freePort(): Promise<number> {
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

async function waitForServer(url: string, child: ChildProcess): Promise<void> {
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error('vite preview exited early');
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((ok) => setTimeout(ok, 100));
  }
  throw new Error(`vite preview did not answer at ${url}`);
}

/** Proportional set size (bytes) of a process and all its descendants, from /proc (Linux only; 0 elsewhere). */
function treePssBytes(rootPid: number): { all: number; renderer: number } {
  if (!existsSync('/proc')) return { all: 0, renderer: 0 };
  const renderers = new Set<number>();
  const children = new Map<number, number[]>();
  const pss = new Map<number, number>();
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const status = readFileSync(`/proc/${name}/status`, 'utf8');
      const ppid = Number(/^PPid:\s+(\d+)/m.exec(status)?.[1] ?? -1);
      // Proportional set size: shared pages divided among the processes sharing them, so the sum over
      // the tree is not inflated by the code every Chromium process maps.
      const rollup = existsSync(`/proc/${name}/smaps_rollup`)
        ? readFileSync(`/proc/${name}/smaps_rollup`, 'utf8')
        : '';
      const kb = Number(/^Pss:\s+(\d+)/m.exec(rollup)?.[1] ?? /^VmRSS:\s+(\d+)/m.exec(status)?.[1] ?? 0);
      const pid = Number(name);
      if (readFileSync(`/proc/${name}/cmdline`, 'utf8').includes('--type=renderer')) renderers.add(pid);
      pss.set(pid, kb * 1024);
      const list = children.get(ppid) ?? [];
      list.push(pid);
      children.set(ppid, list);
    } catch {
      // the process ended while we looked
    }
  }
  let all = 0;
  let renderer = 0;
  const stack = [rootPid];
  while (stack.length > 0) {
    const pid = stack.pop() as number;
    all += pss.get(pid) ?? 0;
    if (renderers.has(pid)) renderer += pss.get(pid) ?? 0;
    stack.push(...(children.get(pid) ?? []));
  }
  return { all, renderer };
}

/** Marks the page's own timeline: each data-state/data-stage change and the Enter key that commits an edit. */
const MARKS_SCRIPT = `
  window.__benchMarks = { states: [], enter: [] };
  document.addEventListener('keydown', (e) => { if (e.key === 'Enter') window.__benchMarks.enter.push(performance.now()); }, true);
  const watch = () => {
    new MutationObserver(() => {
      window.__benchMarks.states.push([document.body.dataset.state || '', document.body.dataset.stage || '', performance.now()]);
    }).observe(document.body, { attributes: true, attributeFilter: ['data-state', 'data-stage'] });
  };
  if (document.body) watch(); else document.addEventListener('DOMContentLoaded', watch);
`;

interface Marks {
  states: [string, string, number][];
  enter: number[];
}

async function main(): Promise<void> {
  if (!existsSync(CHROMIUM)) {
    print('page', { skipped: `${CHROMIUM} is missing (apt-get install -y chromium)` });
    return;
  }
  const dist = mkdtempSync(join(tmpdir(), 'coversweep-page-bench-'));
  execFileSync(process.execPath, [VITE, 'build', '--outDir', dist, '--emptyOutDir', '--logLevel', 'error'], {
    cwd: ROOT,
    stdio: 'inherit',
  });
  const port = await freePort();
  const server = spawn(
    process.execPath,
    [VITE, 'preview', '--outDir', dist, '--host', '127.0.0.1', '--port', String(port), '--strictPort'],
    { cwd: ROOT, stdio: 'ignore' },
  );
  const url = `http://127.0.0.1:${port}/`;
  const rows: {
    firstHeadlineMs: number;
    doneMs: number;
    controlChangeMs: number;
    heapMB: number;
    pssMB: number;
    rendererPssMB: number;
  }[] = [];
  try {
    await waitForServer(url, server);
    for (let run = 0; run < RUNS; run++) {
      // A fresh browser per run: nothing cached between runs but the operating system's file cache.
      const browserServer = await chromium.launchServer({ executablePath: CHROMIUM, args: ['--no-sandbox'] });
      const browser = await chromium.connect(browserServer.wsEndpoint());
      try {
        const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
        await page.addInitScript(MARKS_SCRIPT);
        await page.goto(url);
        await page.waitForFunction(() => document.body.dataset.state === 'done', null, { timeout: 120_000 });
        const first = await page.evaluate(() => Number(document.body.dataset.firstResultMs));
        const marks1 = await page.evaluate(() => (window as unknown as { __benchMarks: Marks }).__benchMarks);
        const done = marks1.states.find(([state]) => state === 'done')?.[2] ?? Number.NaN;
        const cdp = await page.context().newCDPSession(page);
        const heap = (await cdp.send('Runtime.getHeapUsage')) as { usedSize: number };
        const browserPid = browserServer.process().pid;
        const pss = browserPid ? treePssBytes(browserPid) : { all: Number.NaN, renderer: Number.NaN };

        // One control change: the cover fraction, committed with Enter, to "done" again.
        const before = marks1.states.length;
        const input = page.locator('[data-field="coverFraction"] input').first();
        await input.fill(run % 2 === 0 ? '0.55' : '0.45');
        await input.press('Enter');
        await page.waitForFunction(
          (n) => {
            const m = (window as unknown as { __benchMarks: Marks }).__benchMarks;
            return (
              m.states.slice(n).some(([s]) => s === 'computing') && document.body.dataset.state === 'done'
            );
          },
          before,
          { timeout: 120_000 },
        );
        const marks2 = await page.evaluate(() => (window as unknown as { __benchMarks: Marks }).__benchMarks);
        const enterAt = marks2.enter.at(-1) ?? Number.NaN;
        const doneMarks = marks2.states.slice(before).filter(([s]) => s === 'done');
        const doneAgain = doneMarks[doneMarks.length - 1]?.[2] ?? Number.NaN;
        rows.push({
          firstHeadlineMs: Math.round(first),
          doneMs: Math.round(done),
          controlChangeMs: Math.round(doneAgain - enterAt),
          heapMB: Math.round(heap.usedSize / 1e6),
          pssMB: Math.round(pss.all / 1e6),
          rendererPssMB: Math.round(pss.renderer / 1e6),
        });
        print('page-run', { run, ...rows.at(-1) });
      } finally {
        await browser.close();
        await browserServer.close();
      }
    }
  } finally {
    server.kill();
    rmSync(dist, { recursive: true, force: true });
  }
  const pick = (k: keyof (typeof rows)[number]) => median(rows.map((r) => r[k]));
  print('page', {
    runs: rows.length,
    firstHeadlineMs: pick('firstHeadlineMs'),
    firstHeadlineTargetMs: 1000,
    doneMs: pick('doneMs'),
    doneTargetMs: 2500,
    controlChangeMs: pick('controlChangeMs'),
    controlChangeTargetMs: 300,
    pageHeapMB: pick('heapMB'),
    rendererPssMB: pick('rendererPssMB'),
    chromiumAllProcessesPssMB: pick('pssMB'),
    memoryTargetMB: 300,
    note: 'medians; page clock from navigation; PSS sums every Chromium process of the run (browser, utility processes, renderer with its workers), so it overstates the page alone; rendererPssMB is the page renderer process with its dedicated workers',
  });
}

await main();
