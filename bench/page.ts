/**
 * `npm run bench:page`: the page's speed and memory in headless Chromium on this machine, printed as JSON
 * lines like `npm run bench` (never a timed test). Builds the page (vite build) into a temporary folder,
 * serves it with `vite preview`, and for each of N fresh browser pages measures, from the page's own clock
 * (performance.now(), whose origin is the navigation):
 *   - firstHeadlineMs: the first current-design result on screen (the page's data-first-result-ms mark),
 *   - doneMs: every plot and the design map drawn (body data-state first becomes "done"),
 *   - controlChangeMs: from the Enter key that commits a cover-fraction edit to "done" again (the map,
 *     the family and the cover sweep do not depend on the current design's cover fraction: they are
 *     kept from the first run, and only the current design is solved),
 *   - everyDesignChangeMs: the same for a tyre-width edit, which changes every design of every study
 *     (the map's included), so nothing is kept, made at once after the cover edit (the 3D view, on
 *     another tab, is not started); mapTabChangeMs: another tyre-width edit on the "Design map & 3D"
 *     tab, with the map and the 3D view on screen, once the view has drawn; mapStageMs is the last
 *     edit's design-map stage alone,
 *   - memory: the page's JS heap (CDP Runtime.getHeapUsage); the proportional set size (PSS) and the
 *     private memory (USS) of the page's renderer process, the one whose threads include the page's
 *     dedicated workers (JS heap, workers, Blink and the WebGL client together); and the PSS of every
 *     Chromium process of the run, read from /proc (bench/pageMemory.ts): at rest 3 s after the edits,
 *     the renderer's peaks sampled every 100 ms from the navigation on, and its USS once every page and
 *     worker has collected its garbage (CDP HeapProfiler.collectGarbage). PSS shares pages mapped by
 *     several processes among them, so it falls when other Chromium instances run on the machine; USS
 *     does not.
 * and `firstLoad`, the first load step by step (firstLoadBreakdown below) with its CPU time.
 * Each fresh browser is left to finish its own start-up before the navigation (pageSettle.ts; about 0.5 s
 * of both cores here); COVERSWEEP_PAGE_BENCH_SETTLE=0 navigates at once, as the bench did before.
 * Medians of the runs are printed with the targets beside them. COVERSWEEP_PAGE_BENCH_DIST=<dir>
 * serves a page built elsewhere (e.g. another commit's `vite build --outDir <dir>`), to compare trees in one
 * sitting. Needs /usr/bin/chromium (apt-get install -y chromium); says so and exits 0 when it is missing,
 * like the browser tests.
 */
import { spawn } from 'node:child_process';
import { existsSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { availableParallelism, cpus, loadavg } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { collectGarbageEverywhere, pageRenderers, samplePageRenderer, treePssBytes } from './pageMemory';
import { processCpuMs, treeCpuMs, waitQuiet } from './pageSettle';
import { pageBuild, waitForServer } from './previewServer';
import { median } from './timing';

const ROOT = resolve(import.meta.dirname, '..');
const CHROMIUM = '/usr/bin/chromium';
const VITE = join(ROOT, 'node_modules/vite/bin/vite.js');
const RUNS = Math.max(1, Number(process.env.COVERSWEEP_PAGE_BENCH_RUNS ?? 5));
/** Navigate once the fresh browser has finished starting (pageSettle.ts); 0: at once, as before. */
const SETTLE = process.env.COVERSWEEP_PAGE_BENCH_SETTLE !== '0';
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

/** Marks the page's own timeline: each data-state/data-stage change and the Enter key that commits an edit. */
const MARKS_SCRIPT = `
  window.__benchMarks = { states: [], enter: [] };
  document.addEventListener('keydown', (e) => { if (e.key === 'Enter') window.__benchMarks.enter.push(performance.now()); }, true);
  const watch = () => {
    new MutationObserver(() => {
      window.__benchMarks.states.push([document.body.dataset.state || '', document.body.dataset.stage || '', performance.now()]);
    }).observe(document.body, { attributes: true, attributeFilter: ['data-state', 'data-stage'] });
    // The frame that paints the first headline figures: the animation frame after they enter the DOM.
    const headline = document.getElementById('headline');
    if (headline) {
      const seen = new MutationObserver(() => {
        if (!headline.querySelector('.value')) return;
        seen.disconnect();
        requestAnimationFrame(() => { window.__benchMarks.headlineFrame = performance.now(); });
      });
      seen.observe(headline, { childList: true, subtree: true });
    }
  };
  if (document.body) watch(); else document.addEventListener('DOMContentLoaded', watch);
  window.__benchLongTasks = [];
  try {
    new PerformanceObserver((list) => {
      if (window.__benchMarks.states.some(([s]) => s === 'done')) return;
      for (const e of list.getEntries()) window.__benchLongTasks.push(e.duration);
    }).observe({ type: 'longtask', buffered: true });
  } catch {}
`;

interface Marks {
  states: [string, string, number][];
  enter: number[];
  headlineFrame?: number;
}

/** Type `value` into the control `field`, commit it with Enter, and return the ms from Enter to "done". */
async function editToDone(page: Page, field: string, value: string): Promise<number> {
  const marks = () => page.evaluate(() => (window as unknown as { __benchMarks: Marks }).__benchMarks);
  const before = (await marks()).states.length;
  const input = page.locator(`[data-field="${field}"] input`).first();
  await input.fill(value);
  await input.press('Enter');
  await page.waitForFunction(
    (n) => {
      const m = (window as unknown as { __benchMarks: Marks }).__benchMarks;
      return m.states.slice(n).some(([s]) => s === 'computing') && document.body.dataset.state === 'done';
    },
    before,
    { timeout: 120_000 },
  );
  const after = await marks();
  const enterAt = after.enter.at(-1) ?? Number.NaN;
  const doneMarks = after.states.slice(before).filter(([s]) => s === 'done');
  return Math.round((doneMarks[doneMarks.length - 1]?.[2] ?? Number.NaN) - enterAt);
}

/**
 * The first load, step by step, in ms after navigation (medians printed as `firstLoad`): the document
 * received and parsed, the page's script started, every sweep worker loaded and answering, the first
 * solve posted, its answer in, the headline on screen, the plots, the map; and the main thread's long
 * tasks (over 50 ms) from the navigation to the first "done": their count and summed length. From
 * the page's performance marks (`coversweep:*`, pageCompute.ts and earlyPool.ts) and its navigation
 * timing; a tree without the marks (before they were added) reports what its data-timings holds.
 */
async function firstLoadBreakdown(page: Page): Promise<Record<string, number>> {
  return page.evaluate(() => {
    const out: Record<string, number> = {};
    const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined;
    if (nav) {
      out.responseEnd = nav.responseEnd;
      out.domInteractive = nav.domInteractive;
      out.domContentLoaded = nav.domContentLoadedEventEnd;
    }
    for (const m of performance.getEntriesByType('mark')) {
      const name = m.name.replace(/^coversweep:/, '');
      if (name !== m.name && out[name] === undefined) out[name] = m.startTime;
    }
    const t = JSON.parse(document.body.dataset.timings ?? '{}') as Record<string, number>;
    out.script ??= t.scriptStartMs ?? Number.NaN;
    out['workers-ready'] ??= t.workersReadyMs ?? Number.NaN;
    out.compute ??= t.computeStartMs ?? Number.NaN;
    out.headline ??= t.firstResultMs ?? Number.NaN;
    out.headlineFrame =
      (window as unknown as { __benchMarks: Marks }).__benchMarks.headlineFrame ?? Number.NaN;
    const lt = (window as unknown as { __benchLongTasks?: number[] }).__benchLongTasks ?? [];
    out.longTasks = lt.length;
    out.longTaskMs = lt.reduce((a, b) => a + b, 0);
    for (const k of Object.keys(out)) out[k] = Math.round(out[k]!);
    return out;
  });
}

async function main(): Promise<void> {
  if (!existsSync(CHROMIUM)) {
    print('page', { skipped: `${CHROMIUM} is missing (apt-get install -y chromium)` });
    return;
  }
  // COVERSWEEP_PAGE_BENCH_DIST: serve a page built elsewhere (another commit's `vite build`) instead.
  const { dist, given } = pageBuild('coversweep-page-bench-');
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
    everyDesignChangeMs: number;
    mapTabChangeMs: number;
    mapStageMs: number;
    heapMB: number;
    pssMB: number;
    rendererPssMB: number;
    pageRendererPssMB: number;
    pageRendererUssMB: number;
    pageRendererPeakPssMB: number;
    pageRendererPeakUssMB: number;
    pageRendererLiveUssMB: number;
  }[] = [];
  const breakdowns: Record<string, number>[] = [];
  try {
    await waitForServer(url, server);
    for (let run = 0; run < RUNS; run++) {
      // A fresh browser per run: nothing cached between runs but the operating system's file cache.
      const browserServer = await chromium.launchServer({ executablePath: CHROMIUM, args: ['--no-sandbox'] });
      const browser = await chromium.connect(browserServer.wsEndpoint());
      try {
        const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
        await page.addInitScript(MARKS_SCRIPT);
        const browserPid = browserServer.process().pid;
        const settleMs = SETTLE && browserPid ? await waitQuiet(browserPid) : 0;
        const sampler = browserPid ? samplePageRenderer(browserPid) : null;
        const cpuBefore = browserPid ? treeCpuMs(browserPid) : Number.NaN;
        await page.goto(url);
        await page.waitForFunction(() => document.body.dataset.state === 'done', null, { timeout: 120_000 });
        // CPU time of the first load (clock ticks of 10 ms): the page's renderer (its main thread, workers,
        // compositor) since it started, and every Chromium process since the navigation.
        const rendererCpuMs = browserPid
          ? pageRenderers(browserPid).reduce((n, pid) => n + processCpuMs(pid), 0)
          : Number.NaN;
        const browserCpuMs = browserPid ? treeCpuMs(browserPid) - cpuBefore : Number.NaN;
        const first = await page.evaluate(() => Number(document.body.dataset.firstResultMs));
        const marks1 = await page.evaluate(() => (window as unknown as { __benchMarks: Marks }).__benchMarks);
        const done = marks1.states.find(([state]) => state === 'done')?.[2] ?? Number.NaN;
        const breakdown = { ...(await firstLoadBreakdown(page)), rendererCpuMs, browserCpuMs };
        breakdowns.push(breakdown);

        // One control change: the cover fraction, committed with Enter, to "done" again.
        const controlChangeMs = await editToDone(page, 'coverFraction', run % 2 === 0 ? '0.55' : '0.45');
        // One that changes every design: the tyre width (mm).
        const everyDesignChangeMs = await editToDone(page, 'tyreWidthMm', run % 2 === 0 ? '26' : '24');
        // The same kind of edit on the design-map tab, where the map and the 3D view are on screen, once
        // the view has started and drawn the last design (it starts when its tab is first shown, and
        // redraws once the inputs have rested 250 ms after a run).
        await page.click('#tab-map');
        await page.waitForFunction(
          () => /Pressure jump/.test(document.getElementById('view3d-note')?.textContent ?? ''),
          null,
          { timeout: 60_000 },
        );
        await page.waitForTimeout(500);
        const mapTabChangeMs = await editToDone(page, 'tyreWidthMm', run % 2 === 0 ? '25.5' : '23.5');
        // Memory at rest, 3 s after the edits (the 3D view redrawn, the kept designs of three states held);
        // the peaks were sampled every 100 ms from the navigation to here.
        await page.waitForTimeout(3000);
        const peak = sampler?.stop() ?? { pss: Number.NaN, uss: Number.NaN };
        const cdp = await page.context().newCDPSession(page);
        const heap = (await cdp.send('Runtime.getHeapUsage')) as { usedSize: number };
        const none = { all: Number.NaN, renderer: Number.NaN, page: Number.NaN, pageUss: Number.NaN };
        const pss = browserPid ? treePssBytes(browserPid) : none;
        // What the page holds: the same process once every page and worker has collected its garbage.
        await collectGarbageEverywhere(browser);
        await page.waitForTimeout(1500);
        const live = browserPid ? treePssBytes(browserPid) : none;
        const timings = JSON.parse((await page.evaluate(() => document.body.dataset.timings)) ?? '{}') as {
          mapMs?: number;
        };
        rows.push({
          firstHeadlineMs: Math.round(first),
          doneMs: Math.round(done),
          controlChangeMs,
          everyDesignChangeMs,
          mapTabChangeMs,
          mapStageMs: timings.mapMs ?? Number.NaN,
          heapMB: Math.round(heap.usedSize / 1e6),
          pssMB: Math.round(pss.all / 1e6),
          rendererPssMB: Math.round(pss.renderer / 1e6),
          pageRendererPssMB: Math.round(pss.page / 1e6),
          pageRendererUssMB: Math.round(pss.pageUss / 1e6),
          pageRendererPeakPssMB: Math.round(peak.pss / 1e6),
          pageRendererPeakUssMB: Math.round(peak.uss / 1e6),
          pageRendererLiveUssMB: Math.round(live.pageUss / 1e6),
        });
        print('page-run', { run, ...rows.at(-1), browserSettleMs: settleMs, firstLoad: breakdown });
      } finally {
        await browser.close();
        await browserServer.close();
      }
    }
  } finally {
    server.kill();
    if (!given) rmSync(dist, { recursive: true, force: true });
  }
  const pick = (k: keyof (typeof rows)[number]) => median(rows.map((r) => r[k]));
  const firstLoad = Object.fromEntries(
    [...new Set(breakdowns.flatMap((b) => Object.keys(b)))].map((k) => [
      k,
      median(breakdowns.map((b) => b[k] ?? Number.NaN)),
    ]),
  );
  print('page', {
    runs: rows.length,
    firstHeadlineMs: pick('firstHeadlineMs'),
    firstHeadlineTargetMs: 1000,
    doneMs: pick('doneMs'),
    doneTargetMs: 2500,
    controlChangeMs: pick('controlChangeMs'),
    controlChangeTargetMs: 300,
    everyDesignChangeMs: pick('everyDesignChangeMs'),
    mapTabChangeMs: pick('mapTabChangeMs'),
    mapStageMs: pick('mapStageMs'),
    mapTargetMs: 300,
    pageHeapMB: pick('heapMB'),
    pageRendererPssMB: pick('pageRendererPssMB'),
    pageRendererUssMB: pick('pageRendererUssMB'),
    pageRendererPeakPssMB: pick('pageRendererPeakPssMB'),
    pageRendererPeakUssMB: pick('pageRendererPeakUssMB'),
    pageRendererLiveUssMB: pick('pageRendererLiveUssMB'),
    memoryTargetMB: 300,
    rendererPssMB: pick('rendererPssMB'),
    chromiumAllProcessesPssMB: pick('pssMB'),
    firstLoad,
    browserSettled: SETTLE,
    loadAverage1min: Number(loadavg()[0]!.toFixed(2)),
    note: "medians; page clock from navigation; controlChangeMs edits the cover fraction (the map, family and cover sweep are kept from the first run), everyDesignChangeMs the tyre width right after (every design solved again), mapTabChangeMs the tyre width again on the design-map tab once its 3D view has drawn, mapStageMs is the last edit's design-map stage; pageRenderer* is the renderer process hosting the page and its dedicated workers, at rest 3 s after the edits, at its peak (sampled every 100 ms from the navigation) and live (USS once every page and worker collected its garbage); rendererPssMB sums every renderer process (spare ones included), chromiumAllProcessesPssMB every Chromium process; PSS falls when other Chromium instances share the pages, USS does not",
  });
}

await main();
