/**
 * The page bench's memory figures, from /proc (Linux only; zeros elsewhere): the proportional set size
 * (PSS) of a process tree, and the PSS and private memory (USS) of the page's renderer process, the
 * renderer whose threads include the page's dedicated workers, sampled for its peaks.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import type { Browser } from 'playwright-core';

/** Whether a process has a dedicated-worker thread (the renderer of the page, whose workers live in it). */
function hostsWorkers(pid: number): boolean {
  try {
    return readdirSync(`/proc/${pid}/task`).some((tid) =>
      readFileSync(`/proc/${pid}/task/${tid}/comm`, 'utf8').startsWith('DedicatedWorker'),
    );
  } catch {
    return false;
  }
}

/** Proportional set size (bytes) of a process and all its descendants, from /proc (Linux only; 0 elsewhere);
 * and the PSS and private bytes (USS) of the page's renderer (the one hosting dedicated workers). */
export function treePssBytes(rootPid: number): {
  all: number;
  renderer: number;
  page: number;
  pageUss: number;
} {
  if (!existsSync('/proc')) return { all: 0, renderer: 0, page: 0, pageUss: 0 };
  const renderers = new Set<number>();
  const children = new Map<number, number[]>();
  const pss = new Map<number, number>();
  const uss = new Map<number, number>();
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
      const privateKb = ['Private_Clean', 'Private_Dirty'].reduce(
        (n, k) => n + Number(new RegExp(`^${k}:\\s+(\\d+)`, 'm').exec(rollup)?.[1] ?? 0),
        0,
      );
      const pid = Number(name);
      uss.set(pid, privateKb * 1024);
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
  let page = 0;
  let pageUss = 0;
  const stack = [rootPid];
  while (stack.length > 0) {
    const pid = stack.pop() as number;
    all += pss.get(pid) ?? 0;
    if (renderers.has(pid)) {
      renderer += pss.get(pid) ?? 0;
      if (hostsWorkers(pid)) {
        page += pss.get(pid) ?? 0;
        pageUss += uss.get(pid) ?? 0;
      }
    }
    stack.push(...(children.get(pid) ?? []));
  }
  return { all, renderer, page, pageUss };
}

/** Kilobytes of `field` (e.g. "Pss") in a process's smaps_rollup; 0 when the process is gone. */
function rollupKb(pid: number, fields: readonly string[]): number {
  try {
    const rollup = readFileSync(`/proc/${pid}/smaps_rollup`, 'utf8');
    return fields.reduce((n, k) => n + Number(new RegExp(`^${k}:\\s+(\\d+)`, 'm').exec(rollup)?.[1] ?? 0), 0);
  } catch {
    return 0;
  }
}

/** The renderer processes under `rootPid` that host dedicated workers. */
export function pageRenderers(rootPid: number): number[] {
  const children = new Map<number, number[]>();
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const ppid = Number(/^PPid:\s+(\d+)/m.exec(readFileSync(`/proc/${name}/status`, 'utf8'))?.[1] ?? -1);
      children.set(ppid, [...(children.get(ppid) ?? []), Number(name)]);
    } catch {
      // the process ended while we looked
    }
  }
  const out: number[] = [];
  const stack = [rootPid];
  while (stack.length > 0) {
    const pid = stack.pop() as number;
    if (hostsWorkers(pid)) out.push(pid);
    stack.push(...(children.get(pid) ?? []));
  }
  return out;
}

/**
 * Sample the page renderer's PSS and USS every `everyMs` until stop(), which returns the peaks (bytes).
 * The renderer is looked for until its workers have started.
 */
export function samplePageRenderer(rootPid: number, everyMs = 100): { stop(): { pss: number; uss: number } } {
  const peak = { pss: 0, uss: 0 };
  if (!existsSync('/proc')) return { stop: () => peak };
  let pids: number[] = [];
  const timer = setInterval(() => {
    if (pids.length === 0) pids = pageRenderers(rootPid);
    let pss = 0;
    let uss = 0;
    for (const pid of pids) {
      pss += rollupKb(pid, ['Pss']) * 1024;
      uss += rollupKb(pid, ['Private_Clean', 'Private_Dirty']) * 1024;
    }
    peak.pss = Math.max(peak.pss, pss);
    peak.uss = Math.max(peak.uss, uss);
  }, everyMs);
  return {
    stop: () => {
      clearInterval(timer);
      return peak;
    },
  };
}

/**
 * Ask every page and worker of the browser to collect its garbage (CDP HeapProfiler.collectGarbage through
 * the browser's target sessions), so that what stays is what the page holds. Returns how many were asked.
 */
export async function collectGarbageEverywhere(browser: Browser): Promise<number> {
  const session = await browser.newBrowserCDPSession();
  const { targetInfos } = (await session.send('Target.getTargets')) as {
    targetInfos: { targetId: string; type: string }[];
  };
  let asked = 0;
  for (const t of targetInfos) {
    if (t.type !== 'worker' && t.type !== 'page') continue;
    const { sessionId } = (await session.send('Target.attachToTarget', {
      targetId: t.targetId,
      flatten: false,
    })) as {
      sessionId: string;
    };
    const message = JSON.stringify({ id: 1, method: 'HeapProfiler.collectGarbage' });
    await session.send('Target.sendMessageToTarget', { sessionId, message });
    asked++;
  }
  await session.detach();
  return asked;
}
