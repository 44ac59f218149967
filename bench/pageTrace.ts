/**
 * `npx tsx bench/pageTrace.ts`: where the page's time goes after an edit that re-solves every design (the
 * tyre width, as `npm run bench:page` edits it), from a Chromium trace of a fresh page in headless Chromium.
 * Per run it prints, for each stage of that edit's computing (the page's `coversweep:*` performance
 * marks: compute, the quick current design, the sweeps, the design map), each thread's busy time (wall
 * time of its top-level tasks) and CPU time (the trace's thread clock): the page's main thread, each
 * dedicated worker, the compositor and GPU threads; plus the main thread's biggest tasks in the map stage.
 * A diagnostic, printed, never a timed test; like bench:page it serves a build (COVERSWEEP_PAGE_BENCH_DIST
 * or a fresh `vite build`) and needs /usr/bin/chromium.
 */
import { spawn } from 'node:child_process';
import { rmSync } from 'node:fs';
import { loadavg } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { pageBuild, waitForServer } from './previewServer';

const ROOT = resolve(import.meta.dirname, '..');
const CHROMIUM = '/usr/bin/chromium';
const VITE = join(ROOT, 'node_modules/vite/bin/vite.js');
const RUNS = Math.max(1, Number(process.env.COVERSWEEP_PAGE_BENCH_RUNS ?? 3));
const PORT = Number(process.env.COVERSWEEP_TRACE_PORT ?? 4191);

interface TraceEvent {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  tdur?: number;
  pid: number;
  tid: number;
  cat?: string;
  args?: { name?: string; data?: Record<string, unknown> };
}

async function edit(page: Page, field: string, value: string): Promise<void> {
  const input = page.locator(`[data-field="${field}"] input`).first();
  await input.fill(value);
  await page.evaluate(() => {
    document.body.dataset.state = 'edited';
  });
  await input.press('Enter');
  await page.waitForFunction(() => document.body.dataset.state === 'done', null, { timeout: 120_000 });
}

/** Busy and CPU ms of each thread between two trace times (us), from its outermost tasks (nested task
 * events of one thread are counted once). */
function threadTimes(events: TraceEvent[], names: Map<string, string>, t0: number, t1: number) {
  const out = new Map<string, { busyMs: number; cpuMs: number; end: number }>();
  const tasks = events
    .filter(
      (e) =>
        e.ph === 'X' &&
        e.dur !== undefined &&
        (e.name === 'ThreadControllerImpl::RunTask' || e.name === 'RunTask'),
    )
    .sort((a, b) => a.ts - b.ts);
  for (const e of tasks) {
    const name = names.get(`${e.pid}:${e.tid}`) ?? `${e.pid}:${e.tid}`;
    const row = out.get(name) ?? { busyMs: 0, cpuMs: 0, end: -1 };
    out.set(name, row);
    if (e.ts < row.end) continue; // nested in the previous outermost task
    row.end = e.ts + e.dur!;
    const a = Math.max(t0, e.ts);
    const b = Math.min(t1, e.ts + e.dur!);
    if (b <= a) continue;
    row.busyMs += (b - a) / 1000;
    row.cpuMs += ((e.tdur ?? 0) * (b - a)) / Math.max(1, e.dur!) / 1000;
  }
  return Object.fromEntries(
    [...out]
      .filter(([, v]) => v.busyMs >= 1)
      .sort((x, y) => y[1].busyMs - x[1].busyMs)
      .map(([k, v]) => [k, { busyMs: Math.round(v.busyMs), cpuMs: Math.round(v.cpuMs) }]),
  );
}

async function main(): Promise<void> {
  const { dist, given } = pageBuild('coversweep-page-trace-');
  const server = spawn(
    process.execPath,
    [VITE, 'preview', '--outDir', dist, '--host', '127.0.0.1', '--port', String(PORT), '--strictPort'],
    { cwd: ROOT, stdio: 'ignore' },
  );
  const url = `http://127.0.0.1:${PORT}/`;
  try {
    await waitForServer(url, server);
    for (let run = 0; run < RUNS; run++) {
      const browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--no-sandbox'] });
      try {
        const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
        await page.goto(url);
        await page.waitForFunction(() => document.body.dataset.state === 'done', null, { timeout: 120_000 });
        await edit(page, 'coverFraction', run % 2 === 0 ? '0.55' : '0.45');
        await browser.startTracing(page, {
          categories: [
            'devtools.timeline',
            'disabled-by-default-devtools.timeline',
            'blink.user_timing',
            'toplevel',
            'v8.execute',
            '__metadata',
          ],
        });
        const traceStart = await page.evaluate(() => performance.now());
        await edit(page, 'tyreWidthMm', run % 2 === 0 ? '26' : '24');
        const buffer = await browser.stopTracing();
        const timings = JSON.parse(
          (await page.evaluate(() => document.body.dataset.timings)) ?? '{}',
        ) as Record<string, number>;
        const { traceEvents } = JSON.parse(buffer.toString('utf8')) as { traceEvents: TraceEvent[] };
        const names = new Map<string, string>();
        for (const e of traceEvents) {
          if (e.ph === 'M' && e.name === 'thread_name') names.set(`${e.pid}:${e.tid}`, e.args?.name ?? '');
        }
        let w = 0;
        for (const [k, v] of names) if (v.startsWith('DedicatedWorker')) names.set(k, `worker${w++}`);
        // The page's marks of this edit's run (the last of each name), in trace time.
        const marks = new Map<string, number>();
        for (const e of traceEvents) {
          if (e.cat?.includes('blink.user_timing') && e.name.startsWith('coversweep:')) {
            marks.set(e.name.replace('coversweep:', ''), e.ts);
          }
        }
        const order = [...marks].sort((a, b) => a[1] - b[1]);
        const t0 = marks.get('compute') ?? order[0]?.[1] ?? 0;
        const stages: Record<string, unknown> = {};
        for (let k = 0; k + 1 < order.length; k++) {
          const [from, a] = order[k]!;
          const [to, b] = order[k + 1]!;
          stages[`${from}->${to}`] = {
            ms: Math.round((b - a) / 1000),
            threads: threadTimes(traceEvents, names, a, b),
          };
        }
        const tEnd = order.at(-1)?.[1] ?? t0;
        // The main thread's longest tasks from the sweeps' end to the map.
        const mainKey = [...names].find(([, v]) => v === 'CrRendererMain')?.[0];
        const tSweeps = marks.get('sweeps-solved') ?? marks.get('plots') ?? t0;
        const longMain = traceEvents
          .filter(
            (e) =>
              e.ph === 'X' &&
              `${e.pid}:${e.tid}` === mainKey &&
              e.ts >= tSweeps &&
              e.ts <= tEnd &&
              (e.dur ?? 0) > 5000 &&
              e.name !== 'ThreadControllerImpl::RunTask' &&
              e.name !== 'RunTask',
          )
          .map(
            (e) =>
              `${e.name}${e.args?.data?.functionName ? `(${e.args.data.functionName})` : ''}@${Math.round((e.ts - t0) / 1000)}+${Math.round((e.dur ?? 0) / 1000)}`,
          )
          .slice(0, 40);
        const measures = traceEvents
          .filter((e) => e.cat?.includes('blink.user_timing') && e.name.startsWith('cs:') && e.ph === 'b')
          .map((e) => `${e.name}@${Math.round((e.ts - t0) / 1000)}`);
        const measureEnds = traceEvents
          .filter((e) => e.cat?.includes('blink.user_timing') && e.name.startsWith('cs:') && e.ph === 'e')
          .map((e) => `${e.name}@${Math.round((e.ts - t0) / 1000)}`);
        // The main thread's time by event kind in the map stage (nested kinds are counted in each).
        const kinds = new Map<string, number>();
        for (const e of traceEvents) {
          if (e.ph !== 'X' || `${e.pid}:${e.tid}` !== mainKey || e.ts < tSweeps || e.ts > tEnd) continue;
          kinds.set(e.name, (kinds.get(e.name) ?? 0) + (e.dur ?? 0) / 1000);
        }
        const mainKinds = Object.fromEntries(
          [...kinds]
            .filter(([, v]) => v >= 3)
            .sort((a, b) => b[1] - a[1])
            .map(([k, v]) => [k, Math.round(v)]),
        );
        // Every thread's outermost tasks over 2 ms from the edit's compute mark to the map, as start+length
        // (ms from that mark), so the workers' idle gaps show.
        const lanes: Record<string, string[]> = {};
        const laneEnd = new Map<string, number>();
        for (const e of [...traceEvents].sort((a, b) => a.ts - b.ts)) {
          if (e.ph !== 'X' || (e.name !== 'ThreadControllerImpl::RunTask' && e.name !== 'RunTask')) continue;
          const who = names.get(`${e.pid}:${e.tid}`) ?? '';
          if (!(who.startsWith('worker') || who === 'CrRendererMain')) continue;
          if (e.ts < (laneEnd.get(who) ?? -1)) continue;
          laneEnd.set(who, e.ts + (e.dur ?? 0));
          if (e.ts + (e.dur ?? 0) < t0 || e.ts > tEnd || (e.dur ?? 0) < 2000) continue;
          (lanes[who] ??= []).push(`${Math.round((e.ts - t0) / 1000)}+${Math.round((e.dur ?? 0) / 1000)}`);
        }
        console.log(
          JSON.stringify({
            lanes,
            mainKinds,
            measures,
            measureEnds,
            bench: 'page-trace',
            run,
            traceStartMs: Math.round(traceStart),
            mapStageMs: timings.mapMs,
            marksMs: Object.fromEntries(order.map(([k, v]) => [k, Math.round((v - t0) / 1000)])),
            total: { ms: Math.round((tEnd - t0) / 1000), threads: threadTimes(traceEvents, names, t0, tEnd) },
            stages,
            mainTasksAfterSweeps: longMain,
            loadAverage1min: Number(loadavg()[0]!.toFixed(2)),
          }),
        );
      } finally {
        await browser.close();
      }
    }
  } finally {
    server.kill();
    if (!given) rmSync(dist, { recursive: true, force: true });
  }
}

await main();
