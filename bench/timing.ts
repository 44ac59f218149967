/** Timing helpers shared by the benchmarks: inputs are built before timing, every result feeds a checksum. */

/** The median (the upper middle value for an even count). */
export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] ?? Number.NaN;
}

/** Time `fn` `repeats` times; its results are summed into the checksum so none is optimised away. */
export function timeIt(repeats: number, fn: () => number): { medianMs: number; checksum: number } {
  let checksum = 0;
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    checksum += fn();
    times.push(performance.now() - t0);
  }
  return { medianMs: median(times), checksum };
}
