export interface SteeringFeatures {
  /** Least-squares slope through the origin over 0 < yaw <= slopeRangeRad (N m per rad). */
  slopeNmPerRad: number;
  /** Yaw angles (rad, > 0) where the moment changes sign, linearly interpolated. */
  signChangesRad: number[];
  /** Mid-yaw (rad) of table intervals where the moment jumps abruptly. */
  jumpsRad: number[];
}

/**
 * Features of a steering-moment-vs-yaw curve that matter to a rider: the initial slope (least squares
 * through the origin, the moment being odd in yaw), the yaw angles where the moment changes sign
 * (linear interpolation between table points; the trivial zero at yaw 0 excluded), and abrupt jumps:
 * table intervals whose change |dM| exceeds jumpFactor times the median |dM| of the curve and
 * minJumpFraction of the curve's largest |M| (a screening rule, common practice, no source).
 *
 * @throws RangeError when the arrays differ in length or have fewer than 2 points, yaw is not strictly
 * ascending from >= 0, a value is not finite, or a parameter is not > 0.
 */
export function steeringFeatures(
  yawRad: Float64Array,
  momentNm: Float64Array,
  slopeRangeRad = (5 * Math.PI) / 180,
  jumpFactor = 5,
  minJumpFraction = 0.05,
): SteeringFeatures {
  const n = yawRad.length;
  if (momentNm.length !== n)
    throw new RangeError(`momentNm.length=${momentNm.length}: must equal yawRad.length=${n}`);
  if (n < 2) throw new RangeError(`yawRad.length=${n}: must be at least 2`);
  if (!(slopeRangeRad > 0)) throw new RangeError(`slopeRangeRad=${slopeRangeRad}: must be > 0`);
  if (!(jumpFactor > 0)) throw new RangeError(`jumpFactor=${jumpFactor}: must be > 0`);
  if (!(minJumpFraction >= 0)) throw new RangeError(`minJumpFraction=${minJumpFraction}: must be >= 0`);
  if (!(yawRad[0]! >= 0)) throw new RangeError(`yawRad[0]=${yawRad[0]}: must be >= 0`);
  let maxAbs = 0;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(yawRad[i]!)) throw new RangeError(`yawRad[${i}]=${yawRad[i]}: must be finite`);
    if (!Number.isFinite(momentNm[i]!)) throw new RangeError(`momentNm[${i}]=${momentNm[i]}: must be finite`);
    if (i > 0 && !(yawRad[i]! > yawRad[i - 1]!)) {
      throw new RangeError(`yawRad[${i}]=${yawRad[i]}: must be greater than the previous value`);
    }
    maxAbs = Math.max(maxAbs, Math.abs(momentNm[i]!));
  }
  // Slope through the origin.
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < n; i++) {
    const x = yawRad[i]!;
    if (x > 0 && x <= slopeRangeRad * (1 + 1e-12)) {
      sxy += x * momentNm[i]!;
      sxx += x * x;
    }
  }
  if (sxx === 0) {
    // No point inside the range: use the first positive yaw.
    const i = yawRad[0]! > 0 ? 0 : 1;
    sxy = yawRad[i]! * momentNm[i]!;
    sxx = yawRad[i]! * yawRad[i]!;
  }
  const slopeNmPerRad = sxy / sxx;
  // Sign changes.
  const signChangesRad: number[] = [];
  let prev = -1;
  for (let i = 0; i < n; i++) {
    const m = momentNm[i]!;
    if (m === 0 || yawRad[i] === 0) continue;
    if (prev >= 0 && Math.sign(m) !== Math.sign(momentNm[prev]!)) {
      const m0 = momentNm[prev]!;
      signChangesRad.push(yawRad[prev]! + ((yawRad[i]! - yawRad[prev]!) * m0) / (m0 - m));
    }
    prev = i;
  }
  // Jumps.
  const diffs = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) diffs[i] = Math.abs(momentNm[i + 1]! - momentNm[i]!);
  const sorted = Float64Array.from(diffs).sort();
  const mid = sorted.length >> 1;
  const median = sorted.length % 2 === 1 ? sorted[mid]! : 0.5 * (sorted[mid - 1]! + sorted[mid]!);
  const jumpsRad: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    if (diffs[i]! > jumpFactor * median && diffs[i]! > minJumpFraction * maxAbs) {
      jumpsRad.push(0.5 * (yawRad[i]! + yawRad[i + 1]!));
    }
  }
  return { slopeNmPerRad, signChangesRad, jumpsRad };
}
