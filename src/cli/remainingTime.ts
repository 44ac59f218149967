/**
 * A smoothed estimate of the time left in a sweep. The rate is an exponentially weighted moving average
 * over time (points and seconds each decayed by exp(-dt / tau), the usual time-weighted EWMA; Hunter
 * 1986, "The exponentially weighted moving average", J. Quality Technology 18(4)), so a burst of cases
 * finishing together (a pool handing back several jobs at once) or one slow case moves it little. The
 * rate's clock starts at the first progress (worker start-up is not progress), an estimate is given only
 * once two progress steps have been seen, and the time since the last step counts as time without
 * progress. tau = 10 s: common practice, no source.
 */
export const RATE_TIME_CONSTANT_S = 10;

export interface RemainingTime {
  /** Record `pointsDone` at time `nowS` (seconds, any origin, non-decreasing). */
  update(pointsDone: number, nowS: number): void;
  /** Seconds left to reach `pointsTotal` as of `nowS`, or null while there is too little to go on. */
  estimate(pointsTotal: number, nowS: number): number | null;
}

export function remainingTime(tauS = RATE_TIME_CONSTANT_S): RemainingTime {
  if (!(tauS > 0 && Number.isFinite(tauS)))
    throw new RangeError(`tauS must be a positive number, got ${tauS}`);
  let lastPoints = 0;
  let lastS = Number.NaN;
  let weightedPoints = 0;
  let weightedS = 0;
  let steps = 0;
  return {
    update(pointsDone, nowS) {
      if (Number.isNaN(lastS)) {
        // The first call with progress starts the clock; calls before it only set the baseline.
        if (pointsDone > lastPoints) lastS = nowS;
        lastPoints = pointsDone;
        return;
      }
      const dp = pointsDone - lastPoints;
      if (dp <= 0) return;
      const dt = Math.max(0, nowS - lastS);
      const decay = Math.exp(-dt / tauS);
      weightedPoints = weightedPoints * decay + dp;
      weightedS = weightedS * decay + dt;
      lastPoints = pointsDone;
      lastS = nowS;
      steps++;
    },
    estimate(pointsTotal, nowS) {
      if (steps < 2) return null;
      const left = pointsTotal - lastPoints;
      if (left <= 0) return 0;
      const idle = Math.max(0, nowS - lastS);
      const rate = weightedPoints / (weightedS * Math.exp(-idle / tauS) + idle);
      return rate > 0 ? left / rate : null;
    },
  };
}
