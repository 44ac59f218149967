import { convectWake, panelCorners, panelPressureJump, traceStreamline } from '../../model/flowField';
import {
  groundTrailM,
  type SurfaceCoefficients,
  solveWheel,
  surfaceSolution,
  wheelRadii,
} from '../../model/wheel';
import type { ViewField, ViewFieldRequest } from './viewFieldTypes';

/** Streamline seeds: heights (fractions of R) where they would cross x = 0.25 R in the disc's plane
 * undisturbed, on both sides of it (fractions of R in y). */
const SEED_HEIGHTS = [-0.75, -0.4, -0.05, 0.3, 0.62, 0.9, 1.1];
const SEED_SIDES = [-0.08, 0.08];
const SEED_TARGET_X = 0.25;
/** Seeds start this far upstream of their target, and run this far in all (in R). */
const SEED_UPSTREAM = 1.6;
const STREAM_LENGTH = 4.2;
const STREAM_STEPS = 36;
/** Wake filaments run this far (in R) in this many steps. */
const WAKE_LENGTH = 2.2;
const WAKE_STEPS = 20;
/** Lines stop beyond this distance from the hub (in R). */
const FAR = 6;
/** The colour scale covers this quantile of |Delta Cp|; the leading-edge panels' singular loading
 * (thin-aerofoil theory's 1/sqrt(x)) saturates rather than washing out the rest. */
const COLOUR_QUANTILE = 0.9;
/** Smallest colour-scale limit, used when the loading is zero (zero yaw): display only. */
const MIN_COLOUR_LIMIT = 0.05;

/** Round up to 1, 2, 2.5 or 5 times a power of ten (a readable scale end). */
function niceCeil(v: number): number {
  const p = 10 ** Math.floor(Math.log10(v));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= v * (1 - 1e-12)) return m * p;
  return 10 * p;
}

/**
 * The 3D view's data for one wheel at one operating point (`input.points[0]`): wheel geometry, the
 * lattice panels with their pressure jump, a convected trailing-wake sketch, streamlines seeded
 * upstream, the model's total forces and centre of pressure (solveWheel, the same numbers as a sweep)
 * and the steering axis.
 *
 * Flow field: the lattice solved for unit forcing (surfaceSolution) scaled to this point. The ring
 * circulations are gamma_unit V sin(b), which meets the no-through-flow condition for the freestream's
 * normal component V sin(b); the panel loads use the chordwise component V cos(b) in Kutta-Joukowski,
 * giving the assembly's potential normal force Kp sin(b) cos(b) (Polhamus 1966) and the Delta Cp of
 * panelPressureJump. Streamlines and wake follow freestream + induced velocity (traceStreamline,
 * convectWake). `cache` (optional) is the caller's surface-coefficient cache shared with solveJob.
 */
export function viewField(
  request: ViewFieldRequest,
  cache: Map<string, SurfaceCoefficients> = new Map(),
): ViewField {
  const { input } = request;
  const point = input.points[0];
  if (!point) throw new RangeError('viewField: input.points must hold at least one operating point, got 0');
  const single = { ...input, points: [point] };
  const result = solveWheel(single, cache).points[0]!;
  const { wheel, options, steering } = input;
  const radii = wheelRadii(wheel);
  const R = radii.outerRadiusM;
  const V = point.airspeedMps;
  const b = point.yawRad;
  const sinB = Math.sin(b);
  const cosB = Math.cos(b);
  const { lattice, openness, solution } = surfaceSolution(wheel, radii, options, point.groundSpeedMps / V);
  const n = lattice.panelCount;

  const gamma = new Float64Array(n);
  for (let i = 0; i < n; i++) gamma[i] = solution.gamma[i]! * V * sinB;
  const freestream: [number, number, number] = [-V * cosB, V * sinB, 0];

  const corners = panelCorners(lattice, new Float64Array(8 * n));
  const jump = panelPressureJump(lattice, solution.panelNormalCoefficient, b, new Float64Array(n));
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  const magnitudes = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    lo = Math.min(lo, jump[i]!);
    hi = Math.max(hi, jump[i]!);
    magnitudes[i] = Math.abs(jump[i]!);
  }
  magnitudes.sort();
  const q95 = magnitudes[Math.min(n - 1, Math.floor(COLOUR_QUANTILE * n))]!;
  const colourLimit = q95 > 0 ? niceCeil(q95) : MIN_COLOUR_LIMIT;

  // Wake.
  const wakeStep = (WAKE_LENGTH * R) / WAKE_STEPS;
  const filaments = lattice.spanCount + 1;
  const wakeAll = new Float64Array(3 * filaments * (WAKE_STEPS + 1));
  const wakeOffsets = new Uint32Array(filaments + 1);
  const wakeStrength = new Float64Array(filaments);
  convectWake(lattice, gamma, freestream, wakeStep, WAKE_STEPS, wakeAll, wakeOffsets, wakeStrength, FAR * R);
  const wakePoints = wakeAll.slice(0, 3 * wakeOffsets[filaments]!);

  // Streamlines: each seeded upstream of a target point along the freestream direction.
  const streamStep = (STREAM_LENGTH * R) / STREAM_STEPS;
  const lines = SEED_HEIGHTS.length * SEED_SIDES.length;
  const streamAll = new Float64Array(3 * lines * (STREAM_STEPS + 1));
  const streamOffsets = new Uint32Array(lines + 1);
  const seed = new Float64Array(3);
  const line = new Float64Array(3 * (STREAM_STEPS + 1));
  let written = 0;
  let li = 0;
  for (const side of SEED_SIDES) {
    for (const h of SEED_HEIGHTS) {
      const up = SEED_UPSTREAM * R;
      seed[0] = SEED_TARGET_X * R + up * cosB;
      seed[1] = side * R - up * sinB;
      seed[2] = h * R;
      const count = traceStreamline(
        lattice,
        gamma,
        freestream,
        seed,
        streamStep,
        STREAM_STEPS,
        line,
        FAR * R,
      );
      streamAll.set(line.subarray(0, 3 * count), 3 * written);
      written += count;
      streamOffsets[++li] = written;
    }
  }
  const streamPoints = streamAll.slice(0, 3 * written);

  // Spokes: radial, evenly spaced, in the wheel plane, from the hub flange to the rim.
  const spokes = Math.max(0, Math.floor(wheel.spokeCount));
  const spokeEnds = new Float64Array(4 * spokes);
  for (let k = 0; k < spokes; k++) {
    const t = ((k + 0.5) * 2 * Math.PI) / spokes;
    const c = Math.cos(t);
    const s = Math.sin(t);
    spokeEnds[4 * k] = radii.hubRadiusM * c;
    spokeEnds[4 * k + 1] = radii.hubRadiusM * s;
    spokeEnds[4 * k + 2] = radii.rimInnerRadiusM * c;
    spokeEnds[4 * k + 3] = radii.rimInnerRadiusM * s;
  }

  // Steering axis: direction (-cos h, 0, sin h) through -d (sin h, 0, cos h) (see model/wheel/steeringAxis).
  const hd = steering.headAngleRad;
  const trail = groundTrailM(R, steering);
  const p0x = -steering.forkOffsetM * Math.sin(hd);
  const p0z = -steering.forkOffsetM * Math.cos(hd);
  const along = (z: number): number => p0x - ((z - p0z) / Math.sin(hd)) * Math.cos(hd);
  const topZ = 1.4 * R;
  const axis = Float64Array.from([along(-R), 0, -R, along(topZ), 0, topZ]);

  const cpKnown = Number.isFinite(result.cpXM) && Number.isFinite(result.cpZM);
  return {
    yawRad: b,
    airspeedMps: V,
    groundSpeedMps: point.groundSpeedMps,
    rhoKgPerM3: point.rhoKgPerM3,
    dynamicPressurePa: 0.5 * point.rhoKgPerM3 * V * V,
    freestreamMps: freestream,
    radii,
    tyreWidthM: wheel.tyreWidthM,
    rimWidthM: wheel.rimWidthM,
    hasCover: radii.coverOuterRadiusM > radii.coverInnerRadiusM,
    coverSides: wheel.coverSides,
    spokeCount: spokes,
    spokeThicknessM: wheel.spokeSection === 'bladed' ? wheel.spokeThicknessM : wheel.spokeDiameterM,
    spokeEndsM: spokeEnds,
    panelCount: n,
    panelCornersM: corners,
    panelOpenness: Float64Array.from(openness),
    pressureJump: jump,
    pressureJumpMin: lo,
    pressureJumpMax: hi,
    colourLimit,
    wakePointsM: wakePoints,
    wakeOffsets,
    wakeStrengthM2ps: wakeStrength,
    streamPointsM: streamPoints,
    streamOffsets,
    sideN: result.sideN,
    axialN: result.axialN,
    verticalN: result.verticalN,
    cpXM: result.cpXM,
    cpZM: result.cpZM,
    forceOriginM: cpKnown ? [result.cpXM, 0, result.cpZM] : [0, 0, 0],
    latticeCentreXM: solution.centreX,
    latticeCentreZM: solution.centreZ,
    steeringMomentNm: result.steeringMomentNm,
    headAngleRad: hd,
    forkOffsetM: steering.forkOffsetM,
    steeringAxisM: axis,
    groundTrailM: trail,
    flags: [...result.flags],
    wakeStepM: wakeStep,
    streamStepM: streamStep,
  };
}

/** The buffers of a view field, to transfer rather than copy. */
export function viewFieldTransferables(field: ViewField): ArrayBuffer[] {
  return [
    field.spokeEndsM,
    field.panelCornersM,
    field.panelOpenness,
    field.pressureJump,
    field.wakePointsM,
    field.wakeOffsets,
    field.wakeStrengthM2ps,
    field.streamPointsM,
    field.streamOffsets,
    field.steeringAxisM,
  ].map((a) => a.buffer as ArrayBuffer);
}
