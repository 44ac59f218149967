import type { RingLattice } from '../lattice/types';
import { screenOpenness, spokeScreenForceLengthM, spokeScreenResistance } from './spokeScreen';
import type { WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/**
 * The open annuli [inner, outer] (m): the centre (hub and spokes) out to the cover and the cover to
 * the rim, or the centre out to the rim when uncovered. The wheel lattice puts panel edges on their
 * circles.
 */
export function openAnnuli(radii: WheelRadii): Array<[number, number]> {
  const edges: Array<[number, number]> = [];
  const open = (a: number, b: number) => {
    if (b - a > 1e-9 * radii.outerRadiusM) edges.push([a, b]);
  };
  // A cover narrower than 1e-9 R (a cover fraction of ~1e-9 or less) is no cover for the lattice:
  // its two circles would bound a strip of almost zero width and make the system singular.
  if (radii.coverOuterRadiusM - radii.coverInnerRadiusM > 1e-9 * radii.outerRadiusM) {
    // The hub's disc opens with the spokes next to it (see panelOpenness).
    if (radii.coverInnerRadiusM - radii.hubRadiusM > 1e-9 * radii.outerRadiusM)
      open(0, radii.coverInnerRadiusM);
    open(radii.coverOuterRadiusM, radii.rimInnerRadiusM);
  } else {
    open(0, radii.rimInnerRadiusM);
  }
  return edges;
}

/**
 * Openness of every lattice panel (0 solid, 1 fully open), read at the panel's centroid: solid for
 * the tyre, rim and covers; for the open spoked region the linear screen openness of spokeScreen at
 * that radius. The hub (inside the flange radius) is a narrow shell whose flanges block little of the
 * through-flow: it takes the spokes' openness at the flange radius unless a cover reaches it, and
 * carries no lifting load of its own (a stated simplification; it avoids a tiny solid island that
 * the lattice resolves poorly). The wheel lattice's panels do not straddle the
 * region edges (openAnnuli), so one sample per panel classifies it.
 *
 * `rotationRatio` = ground speed / airspeed (omega R / V): the spokes' rotation relative to the air.
 */
export function panelOpenness(
  lattice: RingLattice,
  wheel: WheelGeometry,
  radii: WheelRadii,
  rotationRatio: number,
  porosityScale: number,
  out: Float64Array = new Float64Array(lattice.panelCount),
): Float64Array {
  if (out.length !== lattice.panelCount) {
    throw new RangeError(`out must have ${lattice.panelCount} entries, got ${out.length}`);
  }
  const { rimInnerRadiusM: rimIn, hubRadiusM: hub, coverInnerRadiusM: cIn, coverOuterRadiusM: cOut } = radii;
  const hasCover = cOut > cIn;
  for (let p = 0; p < lattice.panelCount; p++) {
    const x = lattice.centroidX[p]!;
    const z = lattice.centroidZ[p]!;
    const r = Math.sqrt(x * x + z * z);
    if (r >= rimIn || (hasCover && r >= cIn && r <= cOut)) {
      out[p] = 0;
      continue;
    }
    const rs = Math.max(r, hub);
    const a = (rotationRatio * r) / radii.outerRadiusM;
    const k = spokeScreenResistance(
      rs,
      wheel.spokeCount,
      spokeScreenForceLengthM(wheel, rs, a),
      a,
      porosityScale,
    );
    out[p] = screenOpenness(k);
  }
  return out;
}
