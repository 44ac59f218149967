/**
 * One callback that waits for the inputs to rest: `arm(fn)` runs fn after `restMs` unless `disarm()` (an
 * edit) comes first; arming again restarts the wait. With `firstAtOnce`, the first arm runs fn at once
 * (the 3D view's start-up at the page's first results, before anything is edited: waiting would only move
 * its long task into the user's first actions). The page's 3D view redraws through it
 * (pageCompute.ts): its start-up (a WebGL context and shader programs: one 240 ms task of the page's
 * thread and as much in the GPU process in software rendering) and each redraw (its field solved on a task
 * worker, then drawn) ran beside the next edit's run, and held the sweep workers idle while the page's
 * thread could not deal them jobs (a trace of a tyre-width edit right after a cover edit: workers idle
 * 230 ms, the edit done in 500-700 ms instead of 330-440 ms).
 */
export class AfterRest {
  private timer: ReturnType<typeof setTimeout> | null = null;
  private armedBefore = false;

  constructor(
    private readonly restMs: number,
    private readonly firstAtOnce = false,
  ) {
    if (!(restMs >= 0 && Number.isFinite(restMs)))
      throw new RangeError(`restMs=${restMs}: must be finite and >= 0`);
  }

  arm(fn: () => void): void {
    this.disarm();
    const first = !this.armedBefore;
    this.armedBefore = true;
    if (first && this.firstAtOnce) {
      fn();
      return;
    }
    this.timer = setTimeout(() => {
      this.timer = null;
      fn();
    }, this.restMs);
  }

  disarm(): void {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
  }

  get armed(): boolean {
    return this.timer !== null;
  }
}
