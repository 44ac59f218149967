import type { RingLattice } from '../lattice/types';
import { packLatticeVortices } from './packLatticeVortices';
import { planarVortexVelocity } from './planarVortexVelocity';
import type { PlanarVortexSet } from './types';

/** Undershoots of the ground smaller than this fraction of a step are rounding, not crossings. */
const GROUND_ROUNDING = 1e-9;
const u0 = new Float64Array(3);
const u1 = new Float64Array(3);
const vortices: PlanarVortexSet = {
  segments: new Float64Array(0),
  segmentCount: 0,
  legs: new Float64Array(0),
  legCount: 0,
  groundZM: Number.NaN,
};

/**
 * Unit tangent of the flow at (x, y, z): freestream plus the lattice's induced velocity
 * (the packed lattice, with its ground image). Writes into `out`; returns |u| (m/s).
 */
function tangent(
  fx: number,
  fy: number,
  fz: number,
  x: number,
  y: number,
  z: number,
  out: Float64Array,
): number {
  planarVortexVelocity(vortices, x, y, z, out);
  const vx = out[0]! + fx;
  const vy = out[1]! + fy;
  const vz = out[2]! + fz;
  const speed = Math.sqrt(vx * vx + vy * vy + vz * vz);
  out[0] = vx / speed;
  out[1] = vy / speed;
  out[2] = vz / speed;
  return speed;
}

/**
 * Streamline of the linearised flow past the lattice (freestream plus the velocity induced by the
 * rings with circulations `gamma`, their planar wakes and their ground images, as latticeVelocity
 * sums them; evaluated by packLatticeVortices + planarVortexVelocity): the integral curve of
 * the unit tangent u / |u| in arc length s, advanced by the midpoint (second-order Runge-Kutta) method
 * (Press et al., Numerical Recipes, 3rd ed., sec. 17.1) with a fixed step `stepM` from `seedM`, so a
 * step never jumps further than stepM however fast the air is near a vortex line.
 *
 * Stops early, after writing the point where it happens, when the line would cross the ground
 * (z < lattice.groundZM by more than 1e-9 of a step: the last point is moved back along the step onto
 * the plane; smaller undershoots, rounding on the plane where the image makes w = 0, are set on it), when it leaves
 * the sphere of radius `maxDistanceM` about the hub, or at a stagnation point (|u| below 1e-9 of the
 * freestream's speed, or not finite).
 * Writes (x, y, z) of up to steps + 1 points into `out` (seed first) and returns the number written.
 */
export function traceStreamline(
  lattice: RingLattice,
  gamma: Float64Array,
  freestreamMps: ArrayLike<number>,
  seedM: ArrayLike<number>,
  stepM: number,
  steps: number,
  out: Float64Array,
  maxDistanceM = Number.POSITIVE_INFINITY,
): number {
  if (freestreamMps.length !== 3) {
    throw new RangeError(`traceStreamline: freestreamMps.length=${freestreamMps.length} must be 3`);
  }
  if (seedM.length !== 3) throw new RangeError(`traceStreamline: seedM.length=${seedM.length} must be 3`);
  if (!(stepM > 0) || !Number.isFinite(stepM)) {
    throw new RangeError(`traceStreamline: stepM=${stepM} must be finite and > 0`);
  }
  if (!Number.isInteger(steps) || steps < 0) {
    throw new RangeError(`traceStreamline: steps=${steps} must be an integer >= 0`);
  }
  if (out.length < 3 * (steps + 1)) {
    throw new RangeError(
      `traceStreamline: out.length=${out.length} must be >= 3 * (steps + 1) = ${3 * (steps + 1)}`,
    );
  }
  if (!(maxDistanceM > 0)) throw new RangeError(`traceStreamline: maxDistanceM=${maxDistanceM} must be > 0`);
  const fx = freestreamMps[0]!;
  const fy = freestreamMps[1]!;
  const fz = freestreamMps[2]!;
  const freeSpeed = Math.sqrt(fx * fx + fy * fy + fz * fz);
  const slow = 1e-9 * freeSpeed;
  const groundZ = lattice.groundZM;
  const ground = Number.isFinite(groundZ);
  let x = seedM[0]!;
  let y = seedM[1]!;
  let z = seedM[2]!;
  if (!(Number.isFinite(x) && Number.isFinite(y) && Number.isFinite(z))) {
    throw new RangeError(`traceStreamline: seedM=(${x}, ${y}, ${z}) must be finite`);
  }
  if (ground && z < groundZ) {
    throw new RangeError(`traceStreamline: seed z=${z} must not be below the ground z=${groundZ}`);
  }
  out[0] = x;
  out[1] = y;
  out[2] = z;
  packLatticeVortices(lattice, gamma, vortices);
  const h = 0.5 * stepM;
  const r2max = maxDistanceM * maxDistanceM;
  for (let k = 1; k <= steps; k++) {
    const s0 = tangent(fx, fy, fz, x, y, z, u0);
    if (!(s0 > slow)) return k;
    const s1 = tangent(fx, fy, fz, x + h * u0[0]!, y + h * u0[1]!, z + h * u0[2]!, u1);
    if (!(s1 > slow)) return k;
    let nx = x + stepM * u1[0]!;
    let ny = y + stepM * u1[1]!;
    let nz = z + stepM * u1[2]!;
    let stop = false;
    if (ground && nz < groundZ) {
      if (groundZ - nz <= GROUND_ROUNDING * stepM) {
        // Rounding on the plane itself, where the image makes w = 0: stay on it and go on.
        nz = groundZ;
      } else {
        // A real crossing: back along the step onto the ground plane (z strictly decreased over it).
        const t = (z - groundZ) / (z - nz);
        nx = x + t * (nx - x);
        ny = y + t * (ny - y);
        nz = groundZ;
        stop = true;
      }
    }
    const o = 3 * k;
    out[o] = nx;
    out[o + 1] = ny;
    out[o + 2] = nz;
    if (stop || nx * nx + ny * ny + nz * nz > r2max) return k + 1;
    x = nx;
    y = ny;
    z = nz;
  }
  return steps + 1;
}
