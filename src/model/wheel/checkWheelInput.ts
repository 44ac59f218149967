import type { WheelInput } from './wheelInput';

function fail(name: string, value: unknown, rule: string): never {
  throw new RangeError(`${name} must be ${rule}, got ${String(value)}`);
}

/** Largest length, speed and density the model takes: far beyond any wheel, yet squares and
 * products of them stay finite in double precision. */
const MAX_LENGTH_M = 100;
const MAX_SPEED_MPS = 1e4;
/** Smallest airspeed (m/s): below it the dynamic pressure underflows towards 0 and the coefficients
 * (force / q) stop being numbers. */
export const MIN_AIRSPEED_MPS = 1e-6;
/** Lattice size limits: 5000 panels make a 200 MB influence matrix (8 bytes x panels^2). */
const MAX_LATTICE_COUNT = 1000;
const MAX_LATTICE_PANELS = 5000;

function positiveUpTo(name: string, v: number, max: number): void {
  if (!(Number.isFinite(v) && v > 0 && v <= max)) fail(name, v, `a finite number > 0 and <= ${max}`);
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
  positiveUpTo('wheel.outerRadiusM', w.outerRadiusM, MAX_LENGTH_M);
  positiveUpTo('wheel.tyreWidthM', w.tyreWidthM, MAX_LENGTH_M);
  finiteWithin('wheel.rimDepthM', w.rimDepthM, 0, MAX_LENGTH_M);
  positiveUpTo('wheel.rimWidthM', w.rimWidthM, MAX_LENGTH_M);
  positiveUpTo('wheel.hubFlangeRadiusM', w.hubFlangeRadiusM, MAX_LENGTH_M);
  positiveUpTo('wheel.hubShellDiameterM', w.hubShellDiameterM, MAX_LENGTH_M);
  positiveUpTo('wheel.hubShellWidthM', w.hubShellWidthM, MAX_LENGTH_M);
  if (!(Number.isInteger(w.spokeCount) && w.spokeCount >= 0)) {
    fail('wheel.spokeCount', w.spokeCount, 'an integer >= 0');
  }
  if (w.spokeSection === 'round') {
    positiveUpTo('wheel.spokeDiameterM', w.spokeDiameterM, MAX_LENGTH_M);
  } else if (w.spokeSection === 'bladed') {
    positiveUpTo('wheel.spokeWidthM', w.spokeWidthM, MAX_LENGTH_M);
    positiveUpTo('wheel.spokeThicknessM', w.spokeThicknessM, MAX_LENGTH_M);
    if (w.spokeThicknessM > w.spokeWidthM) {
      fail(
        'wheel.spokeThicknessM',
        w.spokeThicknessM,
        `at most wheel.spokeWidthM = ${w.spokeWidthM} (a bladed spoke is wider than thick)`,
      );
    }
  } else {
    fail('wheel.spokeSection', w.spokeSection, '"round" or "bladed"');
  }
  finiteWithin('wheel.coverFraction', w.coverFraction, 0, 1);
  if (w.coverSides !== 1 && w.coverSides !== 2) fail('wheel.coverSides', w.coverSides, '1 or 2');
  if (
    !(
      Number.isInteger(o.latticeSpanCount) &&
      o.latticeSpanCount >= 2 &&
      o.latticeSpanCount <= MAX_LATTICE_COUNT
    )
  ) {
    fail('options.latticeSpanCount', o.latticeSpanCount, `an integer within [2, ${MAX_LATTICE_COUNT}]`);
  }
  if (
    !(
      Number.isInteger(o.latticeChordCount) &&
      o.latticeChordCount >= 1 &&
      o.latticeChordCount <= MAX_LATTICE_COUNT
    )
  ) {
    fail('options.latticeChordCount', o.latticeChordCount, `an integer within [1, ${MAX_LATTICE_COUNT}]`);
  }
  if (o.latticeSpanCount * o.latticeChordCount > MAX_LATTICE_PANELS) {
    fail(
      'options.latticeSpanCount x options.latticeChordCount',
      o.latticeSpanCount * o.latticeChordCount,
      `at most ${MAX_LATTICE_PANELS} panels (the influence matrix holds panels^2 numbers)`,
    );
  }
  finiteWithin('options.suctionRecovered', o.suctionRecovered, 0, 1);
  positiveUpTo('options.porosityScale', o.porosityScale, 1e6);
  finiteWithin('options.profileDragFactor', o.profileDragFactor, 0, 1e6);
  finiteWithin('options.oneSidedCoverSpokeShare', o.oneSidedCoverSpokeShare, 0, 1);
  if (!(Number.isFinite(s.headAngleRad) && s.headAngleRad > 0 && s.headAngleRad < Math.PI)) {
    fail('steering.headAngleRad', s.headAngleRad, 'a finite number within (0, pi)');
  }
  if (!Number.isFinite(s.forkOffsetM)) fail('steering.forkOffsetM', s.forkOffsetM, 'a finite number');
  for (const [i, p] of points.entries()) {
    finiteWithin(`points[${i}].airspeedMps`, p.airspeedMps, MIN_AIRSPEED_MPS, MAX_SPEED_MPS);
    finiteWithin(`points[${i}].groundSpeedMps`, p.groundSpeedMps, 0, MAX_SPEED_MPS);
    finiteWithin(`points[${i}].yawRad`, p.yawRad, -Math.PI / 2, Math.PI / 2);
    finiteWithin(`points[${i}].rhoKgPerM3`, p.rhoKgPerM3, 1e-6, 1e4);
    finiteWithin(`points[${i}].muPaS`, p.muPaS, 1e-9, 1);
  }
}
