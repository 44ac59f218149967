import type { ComponentLoads } from './types';

/** A zeroed ComponentLoads record. */
export function emptyLoads(): ComponentLoads {
  return { fxN: 0, fyN: 0, fzN: 0, mxNm: 0, myNm: 0, mzNm: 0, axleTorqueNm: 0 };
}

/** Add a force (N) applied at point (x, y, z) (m, hub frame) to `loads`, with its moment about the hub. */
export function addForceAt(
  loads: ComponentLoads,
  fx: number,
  fy: number,
  fz: number,
  x: number,
  y: number,
  z: number,
): void {
  loads.fxN += fx;
  loads.fyN += fy;
  loads.fzN += fz;
  loads.mxNm += y * fz - z * fy;
  loads.myNm += z * fx - x * fz;
  loads.mzNm += x * fy - y * fx;
}

/** Zero a ComponentLoads record in place (each part's loads function starts from it; no allocation). */
export function clearLoads(loads: ComponentLoads): void {
  loads.fxN = loads.fyN = loads.fzN = loads.mxNm = loads.myNm = loads.mzNm = loads.axleTorqueNm = 0;
}
