import { type CaseFile, caseToModelInput } from '../caseFile';
import type { ViewFieldRequest } from '../engine/protocol';
import { degToRad } from '../units';

/**
 * The 3D view's field: the design at its first airspeed and air, at one yaw angle, without the
 * grid-convergence lattices (the view draws one lattice). Sent to a solver worker's viewField.
 */
export function viewFieldRequest(c: CaseFile, yawDeg: number): ViewFieldRequest {
  const input = caseToModelInput(c);
  const p0 = input.points[0]!;
  return {
    input: {
      ...input,
      options: { ...input.options, gridConvergence: false },
      points: [{ ...p0, yawRad: degToRad(yawDeg) }],
    },
  };
}
