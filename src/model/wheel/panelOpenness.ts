import type { DiscLattice } from '../lattice/types';
import { screenOpenness, spokeNormalForceLengthM, spokeScreenResistance } from './spokeScreen';
import type { WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

const SAMPLES_PER_SIDE = 4;

/**
 * Openness of every lattice panel (0 solid, 1 fully open). The lattice is a fixed grid over the disc,
 * so a panel may straddle region edges (rim, cover, hub); it takes the mean openness of a 4 x 4 grid of
 * sample points over its span x chord rectangle. This keeps one lattice (one influence matrix) for every
 * cover and rim depth, and makes results vary smoothly with them. Solid: tyre, rim, covers, hub
 * (r <= hub flange radius); open: the spoked annulus, with the screen openness of spokeScreen.
 *
 * `rotationRatio` = ground speed / airspeed (omega R / V): the spokes' rotation relative to the air.
 */
export function panelOpenness(
  lattice: DiscLattice,
  wheel: WheelGeometry,
  radii: WheelRadii,
  rotationRatio: number,
  porosityScale: number,
  out: Float64Array = new Float64Array(lattice.panelCount),
): Float64Array {
  if (out.length !== lattice.panelCount) {
    throw new RangeError(`out must have ${lattice.panelCount} entries, got ${out.length}`);
  }
  const forceLength = spokeNormalForceLengthM(wheel);
  const { rimInnerRadiusM: rimIn, hubRadiusM: hub, coverInnerRadiusM: cIn, coverOuterRadiusM: cOut } = radii;
  const hasCover = cOut > cIn;
  const outerR = radii.outerRadiusM;
  const n = SAMPLES_PER_SIDE;
  for (let p = 0; p < lattice.panelCount; p++) {
    const cx = lattice.centroidX[p]!;
    const cz = lattice.centroidZ[p]!;
    const dz = lattice.spanWidthM[p]!;
    const dx = lattice.chordLengthM[p]!;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const z = cz + ((i + 0.5) / n - 0.5) * dz;
      for (let j = 0; j < n; j++) {
        const x = cx + ((j + 0.5) / n - 0.5) * dx;
        const r = Math.sqrt(x * x + z * z);
        if (r >= rimIn || r <= hub) continue; // tyre, rim or hub: solid
        if (hasCover && r >= cIn && r <= cOut) continue; // covered: solid
        const k = spokeScreenResistance(r, wheel.spokeCount, forceLength, (rotationRatio * r) / outerR, porosityScale);
        sum += screenOpenness(k);
      }
    }
    out[p] = sum / (n * n);
  }
  return out;
}
