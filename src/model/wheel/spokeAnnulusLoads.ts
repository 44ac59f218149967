import { spokeRowDrag, spokeRowDragAll } from '../sections';

/** Revolution positions averaged (midpoint rule, spectrally accurate for a periodic integrand). */
export const SPOKE_ANGLE_STEPS = 36;

const sinTheta = new Float64Array(SPOKE_ANGLE_STEPS);
const cosTheta = new Float64Array(SPOKE_ANGLE_STEPS);
/** Scratch for spokeRowDrag: drag coefficient, wake drag ratio, Reynolds number. */
const row = new Float64Array(3);
for (let k = 0; k < SPOKE_ANGLE_STEPS; k++) {
  const theta = ((k + 0.5) * 2 * Math.PI) / SPOKE_ANGLE_STEPS;
  sinTheta[k] = Math.sin(theta);
  cosTheta[k] = Math.cos(theta);
}
/** For each position, its mirror image about the vertical (theta -> pi - theta) when that one comes
 * earlier in the loop, else -1. Mirror positions have equal sines in exact arithmetic; where the
 * crossflow u_t = V cos(beta) sin(theta) + spin computed at both comes out the very same number (the
 * sines equal, or their last-bit difference lost in the sum), so does everything the section law takes
 * (u_t, u_n, |u|): the earlier position's answer serves, to the bit. */
const mirrorOf = new Int8Array(SPOKE_ANGLE_STEPS).fill(-1);
for (let k = 0; k < SPOKE_ANGLE_STEPS; k++) {
  // theta_k = (k + 1/2) 2 pi / STEPS; pi - theta_k is theta_(STEPS/2 - 1 - k), taken modulo 2 pi.
  const m = (((SPOKE_ANGLE_STEPS / 2 - 1 - k) % SPOKE_ANGLE_STEPS) + SPOKE_ANGLE_STEPS) % SPOKE_ANGLE_STEPS;
  if (m < k) mirrorOf[k] = m;
}
/** The current call's positions: crossflow u_t and |u|, and the law entry whose answer each takes (-1:
 * none, no crossflow). */
const utAt = new Float64Array(SPOKE_ANGLE_STEPS);
const speedAt = new Float64Array(SPOKE_ANGLE_STEPS);
const entryOf = new Int8Array(SPOKE_ANGLE_STEPS);
/** The law's entries (spokeRowDragAll): u_t >= 0 and |u| in, Cd, shielding and Reynolds number out,
 * then 0.5 rho Cd L x shielding x weight. */
const lawUt = new Float64Array(SPOKE_ANGLE_STEPS);
const lawSpeed = new Float64Array(SPOKE_ANGLE_STEPS);
const lawOut = new Float64Array(3 * SPOKE_ANGLE_STEPS);
const perSpeedOf = new Float64Array(SPOKE_ANGLE_STEPS);

/** A wheel's spoke section and the air, fixed for one flow point. */
export interface SpokeRow {
  round: boolean;
  /** Bladed thickness / width (1 for round). */
  thicknessRatio: number;
  /** Frontal size L: diameter (round) or thickness (bladed) (m). */
  refLengthM: number;
  /** 2 pi / N: the spacing between successive spokes per metre of radius. */
  spacingPerRadius: number;
  /** In-plane freestream V cos(beta) and through-flow V sin(beta) (m/s). */
  vInPlaneMps: number;
  vNormalMps: number;
  rhoKgPerM3: number;
  nuM2PerS: number;
}

/**
 * In-plane loads of the spoke elements at one radius, summed over SPOKE_ANGLE_STEPS positions around the
 * revolution (the caller scales by N / SPOKE_ANGLE_STEPS): at position theta (from +x toward +z) the air
 * crosses the spoke in the plane at u_t = V cos(beta) sin(theta) + spin and along y at V sin(beta); the
 * element's force per length is 0.5 rho Cd L |u| u_t times the wake shielding of the spoke ahead
 * (spokeRowDrag), times `weightM` (the element's length). See spokeLoads for the model.
 *
 * Adds into out: [0] x force, [1] z force, [2] torque about the hub resisting rotation; keeps in [3] and
 * [4] the smallest and largest section Reynolds number met (a spoke wholly stalled in the wake ahead
 * carries no load and does not count toward the smallest); adds into [5], [6], [7] the slopes of [0],
 * [1], [2] with the spin, d/d(spin) at fixed drag coefficient and shielding (the section law's
 * Reynolds-number slope, about -0.04 in ln Cd / ln Re at these Reynolds numbers, left out): the
 * derivative of |u| u_t is |u| + u_t^2 / |u|. out needs 8 entries. When `coefficients` (at least
 * SPOKE_ANGLE_STEPS entries) is given, it receives each position's 0.5 rho Cd L x shielding x weight, for
 * spokeAnnulusLoadsFrozen.
 *
 * @param radiusM r (> 0)
 * @param spinMps the spokes' own speed across the air from rotation: omega r less any swirl of the air
 * @param weightM the element's length (m)
 */
export function spokeAnnulusLoads(
  spokes: SpokeRow,
  radiusM: number,
  spinMps: number,
  weightM: number,
  out: Float64Array,
  coefficients?: Float64Array,
): void {
  const { round, thicknessRatio, refLengthM, vInPlaneMps, vNormalMps, nuM2PerS } = spokes;
  const spacing = spokes.spacingPerRadius * radiusM;
  const half = 0.5 * spokes.rhoKgPerM3;
  const un = Math.abs(vNormalMps);
  // The row's arguments are checked once here (spokeRowDrag throws naming the bad one), each position's
  // crossflow below; the positions then take the unchecked law with the speed already at hand.
  if (
    !(refLengthM > 0 && refLengthM < Number.POSITIVE_INFINITY) ||
    !(spacing > 0 && spacing < Number.POSITIVE_INFINITY) ||
    !(nuM2PerS > 0 && nuM2PerS < Number.POSITIVE_INFINITY)
  ) {
    spokeRowDrag(round, thicknessRatio, refLengthM, spacing, spinMps, vNormalMps, nuM2PerS, row);
  }
  // The crossflow at each position; the law's entries are the positions whose crossflow is new.
  let entries = 0;
  for (let k = 0; k < SPOKE_ANGLE_STEPS; k++) {
    const ut = vInPlaneMps * sinTheta[k]! + spinMps;
    const speed = Math.sqrt(ut * ut + vNormalMps * vNormalMps);
    utAt[k] = ut;
    speedAt[k] = speed;
    if (speed === 0) {
      entryOf[k] = -1;
      continue;
    }
    const mirror = mirrorOf[k]!;
    if (mirror >= 0 && entryOf[mirror]! >= 0 && utAt[mirror] === ut) {
      // The same crossflow as the mirror position: the same law's answer (its Reynolds numbers met there).
      entryOf[k] = entryOf[mirror]!;
      continue;
    }
    if (!(speed < Number.POSITIVE_INFINITY)) {
      spokeRowDrag(round, thicknessRatio, refLengthM, spacing, ut, vNormalMps, nuM2PerS, row);
    }
    lawUt[entries] = Math.abs(ut);
    lawSpeed[entries] = speed;
    entryOf[k] = entries++;
  }
  // The law at every entry at once (spokeRowDragAll: the same bits as one position at a time).
  spokeRowDragAll(round, thicknessRatio, refLengthM, spacing, lawUt, un, lawSpeed, entries, nuM2PerS, lawOut);
  for (let j = 0; j < entries; j++) {
    const re = lawOut[3 * j + 2]!;
    if (lawOut[3 * j + 1]! > 0 && re < out[3]!) out[3] = re;
    if (re > out[4]!) out[4] = re;
    perSpeedOf[j] = half * lawOut[3 * j]! * lawOut[3 * j + 1]! * refLengthM * weightM;
  }
  // The sums in position order.
  for (let k = 0; k < SPOKE_ANGLE_STEPS; k++) {
    const entry = entryOf[k]!;
    if (entry < 0) {
      if (coefficients) coefficients[k] = 0;
      continue;
    }
    const ut = utAt[k]!;
    const speed = speedAt[k]!;
    const perSpeed = perSpeedOf[entry]!;
    if (coefficients) coefficients[k] = perSpeed;
    const ft = perSpeed * speed * ut;
    out[0] -= sinTheta[k]! * ft;
    out[1] += cosTheta[k]! * ft;
    out[2] += radiusM * ft;
    const slope = perSpeed * (speed + (ut * ut) / speed);
    out[5] -= sinTheta[k]! * slope;
    out[6] += cosTheta[k]! * slope;
    out[7] += radiusM * slope;
  }
}

/**
 * The in-plane loads of spokeAnnulusLoads at another spin, with each revolution position's drag
 * coefficient and wake shielding kept as spokeAnnulusLoads found them (`coefficients`): only the
 * relative velocity changes, u_t = V cos(beta) sin(theta) + spin, force per length coefficient x |u| u_t.
 * For small changes of the spin (a few per cent), where Cd moves with the Reynolds number by
 * d ln Cd / d ln Re ~ -0.04. Adds into out [0] x force, [1] z force, [2] torque (as spokeAnnulusLoads).
 */
export function spokeAnnulusLoadsFrozen(
  spokes: SpokeRow,
  radiusM: number,
  spinMps: number,
  coefficients: Float64Array,
  out: Float64Array,
): void {
  const { vInPlaneMps, vNormalMps } = spokes;
  const vn2 = vNormalMps * vNormalMps;
  for (let k = 0; k < SPOKE_ANGLE_STEPS; k++) {
    const ut = vInPlaneMps * sinTheta[k]! + spinMps;
    const ft = coefficients[k]! * Math.sqrt(ut * ut + vn2) * ut;
    out[0] -= sinTheta[k]! * ft;
    out[1] += cosTheta[k]! * ft;
    out[2] += radiusM * ft;
  }
}
