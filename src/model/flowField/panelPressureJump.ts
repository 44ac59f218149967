import type { RingLattice } from '../lattice/types';

/**
 * Pressure-jump coefficient of every lattice panel at yaw beta, Delta Cp = (p_windward - p_leeward) / q
 * (positive pushes the wheel toward +y, the rider's left), from the lattice solved for unit forcing:
 *   Delta Cp_i = C_n,i S / A_i * sin(beta) cos(beta),
 * C_n,i the panel's normal-force coefficient on S = referenceAreaM2 and A_i its area. The sin cos
 * scaling is the potential normal force of Polhamus' formulation (E. C. Polhamus 1966, NASA TN
 * D-3767), C_N,p = Kp sin(beta) cos(beta), the one the wheel assembly uses, so that
 * sum(Delta Cp_i A_i) / S = Kp sin(beta) cos(beta) exactly. Only the potential (attached-flow) loading:
 * the vortex-lift share of the suction analogy has no panel distribution in the model.
 * Writes panelCount values into `out` and returns it.
 */
export function panelPressureJump(
  lattice: RingLattice,
  panelNormalCoefficient: Float64Array,
  yawRad: number,
  out: Float64Array,
): Float64Array {
  const n = lattice.panelCount;
  if (panelNormalCoefficient.length !== n) {
    throw new RangeError(
      `panelPressureJump: panelNormalCoefficient.length=${panelNormalCoefficient.length} must equal panelCount=${n}`,
    );
  }
  if (out.length < n) throw new RangeError(`panelPressureJump: out.length=${out.length} must be >= ${n}`);
  if (!(Math.abs(yawRad) <= Math.PI / 2)) {
    throw new RangeError(`panelPressureJump: yawRad=${yawRad} must be within [-pi/2, pi/2]`);
  }
  const scale = lattice.referenceAreaM2 * Math.sin(yawRad) * Math.cos(yawRad);
  for (let i = 0; i < n; i++) {
    const a = lattice.areaM2[i]!;
    // Degenerate (zero-area) panels at the disc's top and bottom carry no pressure.
    out[i] = a > 0 ? (panelNormalCoefficient[i]! * scale) / a : 0;
  }
  return out;
}
