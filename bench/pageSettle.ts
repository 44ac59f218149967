/**
 * The page bench's start line: a freshly launched Chromium keeps both cores of a small machine busy for
 * about half a second after its first page opens (its own start-up: the browser's user-interface
 * renderers load their scripts, about 450 ms of CPU measured here on 2026-12-02), and a navigation at
 * once makes the page's first load compete with it. A user's browser has finished starting before they
 * open the page, so the bench waits until the browser's processes are quiet (/proc, Linux only; no wait
 * elsewhere) before it navigates.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';

/** CPU time (user + system, ms) of a process and all its descendants, from /proc/<pid>/stat. */
export function treeCpuMs(rootPid: number): number {
  if (!existsSync('/proc')) return 0;
  const children = new Map<number, number[]>();
  const ticks = new Map<number, number>();
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, 'utf8');
      // Fields after the command name (which may hold spaces), from field 3 (state) on.
      const f = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      const ppid = Number(f[1]); // f[11], f[12]: utime, stime in clock ticks
      ticks.set(Number(name), Number(f[11]) + Number(f[12]));
      const list = children.get(ppid) ?? [];
      list.push(Number(name));
      children.set(ppid, list);
    } catch {
      // the process ended while we looked
    }
  }
  let sum = 0;
  const queue = [rootPid];
  while (queue.length > 0) {
    const pid = queue.pop()!;
    sum += ticks.get(pid) ?? 0;
    queue.push(...(children.get(pid) ?? []));
  }
  return sum * 10; // USER_HZ is 100 on Linux
}

/** CPU time (user + system, ms) of one process, all its threads. */
export function processCpuMs(pid: number): number {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    const f = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return (Number(f[11]) + Number(f[12])) * 10;
  } catch {
    return Number.NaN;
  }
}

/**
 * Wait until the process tree of `rootPid` used under `quietMs` of CPU in each of two consecutive
 * `windowMs` windows, or `maxMs` passed. Returns the ms waited.
 */
export async function waitQuiet(
  rootPid: number,
  windowMs = 250,
  quietMs = 20,
  maxMs = 5000,
): Promise<number> {
  const t0 = performance.now();
  let last = treeCpuMs(rootPid);
  let quiet = 0;
  while (performance.now() - t0 < maxMs && quiet < 2) {
    await new Promise((ok) => setTimeout(ok, windowMs));
    const now = treeCpuMs(rootPid);
    quiet = now - last < quietMs ? quiet + 1 : 0;
    last = now;
  }
  return Math.round(performance.now() - t0);
}
