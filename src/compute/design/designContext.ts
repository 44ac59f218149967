/**
 * The part of a design study that every design shares: the baseline's yaw curve (one lattice solve),
 * the speed the curves are solved at (the rider's still-air speed, which does not depend on the design
 * wheel's loads), the air, the hub-height wind states and the gust directions.
 */
import { type RideFile, rideCases, rideReferenceSpeed, solveRideCurve } from '../ride/index';
import { gustDirectionsRad, rideHubStates } from './rideHubStates';
import type { DesignContext } from './types';

/** Lattice counts of a context (a study's evaluations may use a coarser lattice than the ride's). */
export interface LatticeCounts {
  span: number;
  chord: number;
}

/** The ride with its model's lattice counts replaced (the ride's own when `lattice` is undefined). */
export function withLattice(ride: RideFile, lattice: LatticeCounts | undefined): RideFile {
  if (lattice === undefined) return ride;
  return { ...ride, model: { ...ride.model, lattice_span: lattice.span, lattice_chord: lattice.chord } };
}

export function designContext(ride: RideFile, lattice?: LatticeCounts): DesignContext {
  const r = withLattice(ride, lattice);
  const cases = rideCases(r);
  const ref = rideReferenceSpeed(r, cases.rhoKgPerM3);
  return {
    ride: r,
    baseline: solveRideCurve(cases.baseline, ref.speedMps),
    referenceSpeedMps: ref.speedMps,
    referenceSpeedCapped: ref.capped,
    rhoKgPerM3: cases.rhoKgPerM3,
    hubStates: rideHubStates(r),
    gustDirectionsRad: gustDirectionsRad(r),
  };
}
