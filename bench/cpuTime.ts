/**
 * Wall and CPU time of repeated runs (medians). On a shared machine the CPU time of this process (user +
 * system, `process.cpuUsage`, which counts every thread: call it where no worker runs) leaves out the
 * time other processes held the cores, so figures compared in CPU time are far steadier under load;
 * bench/lapackLu.py reports LAPACK's the same way (`time.process_time`).
 */
import { median } from './timing';

export function timeWallAndCpu(
  repeats: number,
  fn: () => number,
): { medianMs: number; medianCpuMs: number; checksum: number } {
  let checksum = 0;
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    checksum += fn();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { medianMs: median(wall), medianCpuMs: median(cpu), checksum };
}
