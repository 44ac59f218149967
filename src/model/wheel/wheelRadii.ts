import type { WheelGeometry } from './types';

/** Radii that bound the wheel's regions (m), from the tyre inward. */
export interface WheelRadii {
  outerRadiusM: number;
  /** Inner edge of the tyre = the rim's bead seat; the tyre's section height equals its width. */
  tyreInnerRadiusM: number;
  /** Inner edge of the rim = outer edge of the spoked annulus. */
  rimInnerRadiusM: number;
  /** Inner edge of the spoked annulus (hub flange). */
  hubRadiusM: number;
  /** Covered annulus (m); equal radii mean no cover. */
  coverInnerRadiusM: number;
  coverOuterRadiusM: number;
}

/**
 * Derive the region radii of a wheel. The covered annulus holds `coverFraction` of the spoked
 * annulus's area, placed against the rim ('rim'), against the hub ('hub'), or with the open area
 * split equally inside and outside it ('centre'); 'explicit' takes the radii as given.
 * Geometry only (annulus areas), no source needed beyond pi r^2.
 */
export function wheelRadii(wheel: WheelGeometry): WheelRadii {
  const outer = wheel.outerRadiusM;
  const tyreInner = outer - wheel.tyreWidthM;
  const rimInner = tyreInner - wheel.rimDepthM;
  const hub = wheel.hubFlangeRadiusM;
  if (!(outer > 0)) throw new RangeError(`outerRadiusM must be > 0, got ${outer}`);
  if (!(wheel.tyreWidthM > 0)) throw new RangeError(`tyreWidthM must be > 0, got ${wheel.tyreWidthM}`);
  if (!(wheel.rimDepthM >= 0)) throw new RangeError(`rimDepthM must be >= 0, got ${wheel.rimDepthM}`);
  if (!(hub > 0)) throw new RangeError(`hubFlangeRadiusM must be > 0, got ${hub}`);
  if (!(rimInner > hub)) {
    throw new RangeError(
      `tyre width + rim depth (${wheel.tyreWidthM + wheel.rimDepthM} m) must leave a spoked annulus outside the hub flange radius ${hub} m within outer radius ${outer} m`,
    );
  }
  const f = wheel.coverFraction;
  if (!(f >= 0 && f <= 1)) throw new RangeError(`coverFraction must be in [0, 1], got ${f}`);
  const ro2 = rimInner * rimInner;
  const ri2 = hub * hub;
  const span2 = ro2 - ri2;
  let coverInner: number;
  let coverOuter: number;
  switch (wheel.coverPlacement) {
    case 'rim':
      coverOuter = rimInner;
      coverInner = Math.sqrt(ro2 - f * span2);
      break;
    case 'hub':
      coverInner = hub;
      coverOuter = Math.sqrt(ri2 + f * span2);
      break;
    case 'centre': {
      const openHalf = 0.5 * (1 - f) * span2;
      coverInner = Math.sqrt(ri2 + openHalf);
      coverOuter = Math.sqrt(ro2 - openHalf);
      break;
    }
    case 'explicit':
      coverInner = wheel.coverInnerRadiusM;
      coverOuter = wheel.coverOuterRadiusM;
      if (!(coverInner >= hub && coverOuter <= rimInner && coverOuter >= coverInner)) {
        throw new RangeError(
          `explicit cover radii [${coverInner}, ${coverOuter}] m must lie inside the spoked annulus [${hub}, ${rimInner}] m`,
        );
      }
      break;
    default:
      throw new RangeError(
        `coverPlacement must be rim, hub, centre or explicit, got ${String(wheel.coverPlacement)}`,
      );
  }
  return {
    outerRadiusM: outer,
    tyreInnerRadiusM: tyreInner,
    rimInnerRadiusM: rimInner,
    hubRadiusM: hub,
    coverInnerRadiusM: coverInner,
    coverOuterRadiusM: coverOuter,
  };
}

/** Covered fraction of the spoked annulus's area implied by the radii (for reporting). */
export function coveredAreaFraction(r: WheelRadii): number {
  const span2 = r.rimInnerRadiusM ** 2 - r.hubRadiusM ** 2;
  return (r.coverOuterRadiusM ** 2 - r.coverInnerRadiusM ** 2) / span2;
}
