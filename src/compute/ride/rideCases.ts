/** A ride's design and baseline wheels as case files. */
import { type CaseFile, caseAirDensity } from '../caseFile';
import type { RideCases, RideFile } from './rideFileTypes';

/** The design and baseline as normalised case files (for the model input), and the air density. */
export function rideCases(ride: RideFile): RideCases {
  const conditions = {
    airspeed_mps: [10],
    yaw_deg: [0],
    ground_speed_mps: null,
    reference_speed_kmh: 50,
    ...ride.air,
  };
  const base = {
    format: 'coversweep-case' as const,
    version: 1 as const,
    conditions,
    steering: ride.steering,
    model: ride.model,
  };
  const design: CaseFile = { ...base, wheel: ride.design };
  const baseline: CaseFile = { ...base, wheel: ride.baseline };
  return { design, baseline, rhoKgPerM3: caseAirDensity(design) };
}
