import type { WheelInput } from './solveWheel';

function fail(name: string, value: unknown, rule: string): never {
  throw new RangeError(`${name} must be ${rule}, got ${String(value)}`);
}

function finiteAtLeast(name: string, v: number, min: number, open: boolean): void {
  const ok = Number.isFinite(v) && (open ? v > min : v >= min);
  if (!ok) fail(name, v, `a finite number ${open ? '>' : '>='} ${min}`);
}

function finiteWithin(name: string, v: number, min: number, max: number): void {
  if (!(Number.isFinite(v) && v >= min && v <= max)) fail(name, v, `a finite number within [${min}, ${max}]`);
}

/**
 * Check every number the wheel model reads, so that no NaN, infinity or negative size reaches the
 * physics and comes out as a silent NaN or infinite load (issue 7, "values at the model's edge").
 * Region radii (rim deeper than the wheel, cover radii) are checked by wheelRadii; lattice counts by
 * buildWheelLattice. Plain input validation, no published source needed.
 * @throws RangeError naming the field, its value and the rule.
 */
export function checkWheelInput(input: WheelInput): void {
  const { wheel: w, options: o, steering: s, points } = input;
  finiteAtLeast('wheel.outerRadiusM', w.outerRadiusM, 0, true);
  finiteAtLeast('wheel.tyreWidthM', w.tyreWidthM, 0, true);
  finiteAtLeast('wheel.rimDepthM', w.rimDepthM, 0, false);
  finiteAtLeast('wheel.rimWidthM', w.rimWidthM, 0, true);
  finiteAtLeast('wheel.hubFlangeRadiusM', w.hubFlangeRadiusM, 0, true);
  if (!(Number.isInteger(w.spokeCount) && w.spokeCount >= 0)) {
    fail('wheel.spokeCount', w.spokeCount, 'an integer >= 0');
  }
  if (w.spokeSection === 'round') {
    finiteAtLeast('wheel.spokeDiameterM', w.spokeDiameterM, 0, true);
  } else if (w.spokeSection === 'bladed') {
    finiteAtLeast('wheel.spokeWidthM', w.spokeWidthM, 0, true);
    finiteAtLeast('wheel.spokeThicknessM', w.spokeThicknessM, 0, true);
  } else {
    fail('wheel.spokeSection', w.spokeSection, '"round" or "bladed"');
  }
  finiteWithin('wheel.coverFraction', w.coverFraction, 0, 1);
  if (w.coverSides !== 1 && w.coverSides !== 2) fail('wheel.coverSides', w.coverSides, '1 or 2');
  finiteWithin('options.suctionRecovered', o.suctionRecovered, 0, 1);
  finiteAtLeast('options.porosityScale', o.porosityScale, 0, true);
  finiteAtLeast('options.profileDragFactor', o.profileDragFactor, 0, false);
  finiteWithin('options.oneSidedCoverSpokeShare', o.oneSidedCoverSpokeShare, 0, 1);
  if (!(Number.isFinite(s.headAngleRad) && s.headAngleRad > 0 && s.headAngleRad < Math.PI)) {
    fail('steering.headAngleRad', s.headAngleRad, 'a finite number within (0, pi)');
  }
  if (!Number.isFinite(s.forkOffsetM)) fail('steering.forkOffsetM', s.forkOffsetM, 'a finite number');
  for (const [i, p] of points.entries()) {
    finiteAtLeast(`points[${i}].airspeedMps`, p.airspeedMps, 0, true);
    finiteAtLeast(`points[${i}].groundSpeedMps`, p.groundSpeedMps, 0, false);
    finiteWithin(`points[${i}].yawRad`, p.yawRad, -Math.PI / 2, Math.PI / 2);
    finiteAtLeast(`points[${i}].rhoKgPerM3`, p.rhoKgPerM3, 0, true);
    finiteAtLeast(`points[${i}].muPaS`, p.muPaS, 0, true);
  }
}
