/**
 * Weibull scale c (m/s) of a Rayleigh wind-speed distribution (Weibull shape k = 2) with a given mean:
 * mean = c Gamma(1 + 1/2) = c sqrt(pi) / 2, so c = 2 mean / sqrt(pi) (e.g. IEC 61400-1, sec. 6.3.1.1,
 * where V_ave = sqrt(pi)/2 C; from memory).
 *
 * @throws RangeError when meanMps is negative or not finite.
 */
export function rayleighScaleMps(meanMps: number): number {
  if (!(meanMps >= 0) || !Number.isFinite(meanMps))
    throw new RangeError(`meanMps=${meanMps}: must be finite and >= 0`);
  return (2 * meanMps) / Math.sqrt(Math.PI);
}
