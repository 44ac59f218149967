import { spokeSectionDrag } from './spokeSectionDrag';
import { tandemDragRatio } from './tandemDragRatio';

/**
 * Steps of the fixed-point iteration on the shielded speed. The section laws vary slowly with Reynolds
 * number (cylinder: d ln Cd / d ln Re ~ -0.04 at Re 2e3), so each step shrinks the error by ~1e-2:
 * two steps (Cd at the free speed, then at the shielded speed) leave it below ~1e-3 above Re ~1e3 and
 * below ~1e-2 at Re ~1e2, where the law is steeper (tested against the converged fixed point; the
 * section laws' own bias is 5-17 %).
 */
const FIXED_POINT_STEPS = 2;

function rowInputError(
  refLengthM: number,
  spacingM: number,
  tangentialMps: number,
  normalMps: number,
  nu: number,
  out: Float64Array,
): RangeError {
  if (!(refLengthM > 0) || !Number.isFinite(refLengthM)) {
    return new RangeError(`refLengthM=${refLengthM}: must be finite and > 0`);
  }
  if (!(spacingM > 0) || !Number.isFinite(spacingM)) {
    return new RangeError(`spacingM=${spacingM}: must be finite and > 0`);
  }
  if (!Number.isFinite(tangentialMps) || !Number.isFinite(normalMps)) {
    return new RangeError(`crossflow must be finite, got u_t=${tangentialMps}, u_n=${normalMps}`);
  }
  if (!(nu > 0) || !Number.isFinite(nu)) {
    return new RangeError(`kinematicViscosityM2PerS=${nu}: must be finite and > 0`);
  }
  return new RangeError(`out must have at least 3 entries, got ${out.length}`);
}

/**
 * Drag of one spoke element in a row of equal spokes that cross the same air one after another (the
 * spokes of a wheel at one radius), at spacing s along their path: the element meets the crossflow
 * (tangential u_t in the row's direction, normal u_n across it) inside the wake of the spoke ahead.
 *
 * The wake of the spoke ahead is Schlichting's plane far wake (tandemDragRatio) of the drag length
 * Cd L. The air the element meets was crossed by the spoke ahead a time s / |u_t| earlier; meanwhile
 * it moved by u_n across the row, so the wake's axis runs along the relative flow (u_t, u_n): the
 * element sits s cos(phi) behind the spoke ahead and s sin(phi) off its wake's centreline,
 * tan(phi) = |u_n| / |u_t|. A through-flow carries the wake off the row; no through-flow leaves the
 * element on the centreline. The same law is the momentum balance of the whole row: a row of drag
 * length Cd L per spacing s feeds a merged wake of accumulated drag Cd L x / s at distance x, whose
 * self-similar centreline deficit 0.98 (Cd L / s)^(1/2) is the single spoke-ahead value, so the
 * older wakes are not added again (derivation from Schlichting's law; the wakes of older crossings
 * also sit farther off the row under a through-flow).
 *
 * The drag coefficient and the shielding depend on each other through the Reynolds number of the
 * shielded speed: solved to consistency by fixed-point iteration, as blade-element momentum theory
 * solves its inflow (H. Glauert 1935, "Airplane propellers", in Durand, Aerodynamic Theory, vol. IV).
 *
 * Writes into out: [0] the section drag coefficient Cd (on L, at the shielded speed), [1] the drag
 * ratio (shielded / unshielded at equal Cd), [2] the Reynolds number of the shielded speed. The
 * element's force per length is 0.5 rho Cd out[1] L |u| u with u the unshielded crossflow.
 *
 * @param round true for a round spoke (L = diameter), false for bladed (L = thickness)
 * @param thicknessToWidth bladed thickness / width in (0, 1] (ignored for round)
 * @param refLengthM L, the frontal size (> 0)
 * @param spacingM s, the distance between successive spokes along the path (> 0)
 * @param tangentialMps u_t, crossflow along the row (finite)
 * @param normalMps u_n, crossflow across the row (finite)
 * @param kinematicViscosityM2PerS nu (> 0)
 * @param out a Float64Array of at least 3 entries
 * @throws RangeError when an argument breaks its rule.
 */
export function spokeRowDrag(
  round: boolean,
  thicknessToWidth: number,
  refLengthM: number,
  spacingM: number,
  tangentialMps: number,
  normalMps: number,
  kinematicViscosityM2PerS: number,
  out: Float64Array,
): void {
  // One combined test keeps the hot path small (it runs for every spoke element); the message is built
  // only on failure.
  if (
    !(refLengthM > 0 && refLengthM < Number.POSITIVE_INFINITY) ||
    !(spacingM > 0 && spacingM < Number.POSITIVE_INFINITY) ||
    !(Math.abs(tangentialMps) < Number.POSITIVE_INFINITY && Math.abs(normalMps) < Number.POSITIVE_INFINITY) ||
    !(kinematicViscosityM2PerS > 0 && kinematicViscosityM2PerS < Number.POSITIVE_INFINITY) ||
    out.length < 3
  ) {
    throw rowInputError(refLengthM, spacingM, tangentialMps, normalMps, kinematicViscosityM2PerS, out);
  }
  const nu = kinematicViscosityM2PerS;
  const ut = Math.abs(tangentialMps);
  const un = Math.abs(normalMps);
  spokeRowDragAt(
    round,
    thicknessToWidth,
    refLengthM,
    spacingM,
    ut,
    un,
    Math.sqrt(ut * ut + un * un),
    nu,
    out,
  );
}

/** spokeRowDragAt's single entry for spokeRowDragAll. */
const oneUt = new Float64Array(1);
const oneSpeed = new Float64Array(1);

/**
 * spokeRowDrag's law for a caller that has checked the arguments and already holds the crossflow's
 * magnitudes: u_t = |tangential|, u_n = |normal| and speed = sqrt(u_t^2 + u_n^2), computed exactly so
 * (the same operations, so the same bits as spokeRowDrag). No checks: the arguments are spokeRowDrag's,
 * already valid. Writes out as spokeRowDrag. One entry of spokeRowDragAll.
 */
export function spokeRowDragAt(
  round: boolean,
  thicknessToWidth: number,
  refLengthM: number,
  spacingM: number,
  ut: number,
  un: number,
  speed: number,
  kinematicViscosityM2PerS: number,
  out: Float64Array,
): void {
  oneUt[0] = ut;
  oneSpeed[0] = speed;
  spokeRowDragAll(
    round,
    thicknessToWidth,
    refLengthM,
    spacingM,
    oneUt,
    un,
    oneSpeed,
    1,
    kinematicViscosityM2PerS,
    out,
  );
}

/** spokeRowDragAll's scratch: each entry's distance behind and offset from the wake of the spoke
 * ahead, its shielded speed between steps, and the entries still iterating (grown on demand). */
let distanceAt = new Float64Array(64);
let offsetAt = new Float64Array(64);
let shieldedAt = new Float64Array(64);
let pending = new Int32Array(64);

/**
 * The law of spokeRowDrag for `count` crossflows of one row at once, for a caller that has checked the
 * arguments (the spokes' loads: the revolution positions of one radius): entry i has u_t = ut[i] (>= 0),
 * u_n = un (>= 0, one through-flow for all) and speed[i] = sqrt(u_t^2 + u_n^2), and gets its drag
 * coefficient, drag ratio and Reynolds number in out[3 i], out[3 i + 1], out[3 i + 2] (spokeRowDrag's
 * out, entry after entry). Each entry's fixed point is the same operations on the same numbers as
 * spokeRowDrag's (so the same bits); they run step by step over all entries, and within a step the
 * section law over all entries before the wake law: the entries are independent, so the processor
 * overlaps their long chains of dependent operations (a cube root, exponentials, square roots and
 * divisions in turn) instead of waiting on each in turn. No checks.
 */
export function spokeRowDragAll(
  round: boolean,
  thicknessToWidth: number,
  refLengthM: number,
  spacingM: number,
  ut: Float64Array,
  un: number,
  speed: Float64Array,
  count: number,
  kinematicViscosityM2PerS: number,
  out: Float64Array,
): void {
  if (pending.length < count) {
    distanceAt = new Float64Array(count);
    offsetAt = new Float64Array(count);
    shieldedAt = new Float64Array(count);
    pending = new Int32Array(count);
  }
  const nu = kinematicViscosityM2PerS;
  let open = 0;
  for (let i = 0; i < count; i++) {
    const s = speed[i]!;
    const t = ut[i]!;
    if (s === 0) {
      out[3 * i] = Number.NaN;
      out[3 * i + 1] = 1;
      out[3 * i + 2] = 0;
    } else if (t === 0) {
      // Moving straight across the row: the wake of the spoke ahead never reaches the element.
      const reFree = (s * refLengthM) / nu;
      out[3 * i] = spokeSectionDrag(round, reFree, thicknessToWidth);
      out[3 * i + 1] = 1;
      out[3 * i + 2] = reFree;
    } else {
      distanceAt[i] = (spacingM * t) / s;
      offsetAt[i] = (spacingM * un) / s;
      shieldedAt[i] = s;
      pending[open++] = i;
    }
  }
  for (let step = 0; step < FIXED_POINT_STEPS && open > 0; step++) {
    for (let p = 0; p < open; p++) {
      const i = pending[p]!;
      const reShielded = (shieldedAt[i]! * refLengthM) / nu;
      out[3 * i + 2] = reShielded;
      // A spoke fully stalled in the wake still has a tiny speed: keep Re > 0 for the section law.
      out[3 * i] = spokeSectionDrag(round, Math.max(reShielded, 1e-6), thicknessToWidth);
    }
    let still = 0;
    for (let p = 0; p < open; p++) {
      const i = pending[p]!;
      const ratio = tandemDragRatio(distanceAt[i]!, offsetAt[i]!, out[3 * i]! * refLengthM, refLengthM);
      out[3 * i + 1] = ratio;
      // Off the wake the shielded speed is the free one to 1e-6: Cd would not move. The shielded speed
      // is then the one just used, and so is its Reynolds number (out[3 i + 2] already).
      if (!(ratio >= 1 - 1e-6)) {
        shieldedAt[i] = speed[i]! * Math.sqrt(ratio);
        pending[still++] = i;
      }
    }
    open = still;
  }
  // Entries still in the wake after the last step: the Reynolds number of their last shielded speed.
  for (let p = 0; p < open; p++) {
    const i = pending[p]!;
    out[3 * i + 2] = (shieldedAt[i]! * refLengthM) / nu;
  }
}
