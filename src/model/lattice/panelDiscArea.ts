/**
 * Area (m^2) of the part of a lattice panel inside the disc x^2 + z^2 <= r^2. The panel is a strip
 * panel: z0 <= z <= z1, between a trailing side x = T(z) and a leading side x = L(z) >= T(z), each a
 * straight line from its corner on the lower edge line (z0) to its corner on the upper (z1).
 *
 * Exact up to rounding: at height z the disc covers |x| <= h(z) = sqrt(r^2 - z^2), so the area is the
 * integral of max(0, min(L, h) - max(T, -h)) dz. Between the breakpoints (z0, z1, z = +-r and every
 * crossing of a side line with the circle, from the quadratic (a + b z)^2 + z^2 = r^2) the choice of
 * each bound is fixed; it is read at the interval's midpoint and integrated in closed form: a side
 * line exactly by the midpoint rule, h by its antiderivative (z h + r^2 asin(z / r)) / 2 (the area
 * of a circular segment, elementary calculus).
 */
export function panelDiscArea(
  lowerLeadX: number,
  lowerTrailX: number,
  upperLeadX: number,
  upperTrailX: number,
  z0M: number,
  z1M: number,
  radiusM: number,
): number {
  if (!(z1M > z0M)) throw new RangeError(`panelDiscArea: z1M=${z1M} must exceed z0M=${z0M}`);
  if (!(radiusM >= 0) || !Number.isFinite(radiusM)) {
    throw new RangeError(`panelDiscArea: radiusM=${radiusM} must be finite and >= 0`);
  }
  if (radiusM === 0 || z0M >= radiusM || z1M <= -radiusM) return 0;
  const r = radiusM;
  const width = z1M - z0M;
  // Sides as x = a + b z.
  const bLead = (upperLeadX - lowerLeadX) / width;
  const aLead = lowerLeadX - bLead * z0M;
  const bTrail = (upperTrailX - lowerTrailX) / width;
  const aTrail = lowerTrailX - bTrail * z0M;
  const lo = Math.max(z0M, -r);
  const hi = Math.min(z1M, r);
  const cuts = [lo, hi];
  const crossings = (a: number, b: number) => {
    // (1 + b^2) z^2 + 2 a b z + a^2 - r^2 = 0
    const qa = 1 + b * b;
    const qb = a * b;
    const disc = qb * qb - qa * (a * a - r * r);
    if (disc <= 0) return;
    const root = Math.sqrt(disc);
    for (const z of [(-qb - root) / qa, (-qb + root) / qa]) if (z > lo && z < hi) cuts.push(z);
  };
  crossings(aLead, bLead);
  crossings(aTrail, bTrail);
  cuts.sort((p, q) => p - q);
  const h = (z: number): number => {
    const q = r * r - z * z;
    return q > 0 ? Math.sqrt(q) : 0;
  };
  const segment = (z: number): number => {
    const c = Math.max(-r, Math.min(r, z));
    return 0.5 * (c * h(c) + r * r * Math.asin(c / r));
  };
  let area = 0;
  for (let k = 0; k + 1 < cuts.length; k++) {
    const za = cuts[k]!;
    const zb = cuts[k + 1]!;
    if (!(zb > za)) continue;
    const zm = 0.5 * (za + zb);
    const hm = h(zm);
    const leadM = aLead + bLead * zm;
    const trailM = aTrail + bTrail * zm;
    if (Math.min(leadM, hm) <= Math.max(trailM, -hm)) continue;
    const circle = segment(zb) - segment(za);
    const span = zb - za;
    const upper = leadM < hm ? leadM * span : circle;
    const lower = trailM > -hm ? trailM * span : -circle;
    area += upper - lower;
  }
  return area;
}
