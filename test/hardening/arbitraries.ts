/** fast-check generators shared by the hardening tests. */
import fc from 'fast-check';
import { LIMITS } from '../../src/compute/caseFile';

export const finiteIn = (lo: number, hi: number) =>
  fc.double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true });

/** A number from a range, or one of its edges. */
export const edgeOr = (lo: number, hi: number, ...edges: number[]) =>
  fc.oneof(
    { weight: 2, arbitrary: finiteIn(lo, hi) },
    { weight: 1, arbitrary: fc.constantFrom(lo, hi, ...edges) },
  );

/** A raw case (as a user would write it) spanning the accepted ranges and their edges. */
export const rawCase = fc
  .record({
    outer: edgeOr(0.05, 1, 0.334),
    tyreShare: edgeOr(0.005, 0.3),
    hub: edgeOr(0.002, 0.2, 0.028),
    rimShare: fc.oneof(fc.constant(0), fc.constant(0.999999), finiteIn(0, 0.999999)),
    spokeCount: fc.oneof(fc.constantFrom(0, 1, 200), fc.integer({ min: 0, max: 200 })),
    section: fc.constantFrom('round', 'bladed'),
    diameter: edgeOr(1e-5, 0.02, 0.002),
    width: edgeOr(1e-5, 0.05),
    thickness: edgeOr(1e-5, 0.02),
    fraction: edgeOr(0, 1, 0.5),
    placement: fc.constantFrom('rim', 'hub', 'centre', 'explicit'),
    explicitA: edgeOr(0, 1),
    explicitB: edgeOr(0, 1),
    sides: fc.constantFrom(1, 2),
    rimWidth: edgeOr(1e-4, 0.15, 0.028),
    airspeed: fc.array(edgeOr(1e-3, LIMITS.maxSpeedMps, 0.5, 2, 40), { minLength: 1, maxLength: 3 }),
    yaw: fc.array(edgeOr(-90, 90, 0, 30, -30, 89.999), { minLength: 1, maxLength: 4 }),
    groundSpeed: fc.oneof(fc.constant(null), edgeOr(0, LIMITS.maxSpeedMps)),
    air: fc.oneof(
      fc.record({ air_density_kgpm3: edgeOr(LIMITS.minDensityKgPerM3, LIMITS.maxDensityKgPerM3) }),
      fc.record({ altitude_m: edgeOr(-610, 11000, 0, 2500), relative_humidity: edgeOr(0, 1) }),
      fc.record({
        temperature_c: edgeOr(-40, 50),
        pressure_pa: edgeOr(60000, 110000),
        relative_humidity: edgeOr(0, 1),
      }),
    ),
    ground: fc.boolean(),
    span: fc.integer({ min: 4, max: 12 }),
    chord: fc.integer({ min: 2, max: 8 }),
    suction: edgeOr(0, 1),
    porosity: edgeOr(1e-3, 1000, 1),
    profile: edgeOr(1e-3, 100, 1),
    share: edgeOr(0, 1),
    gc: fc.boolean(),
    headAngle: edgeOr(45, 90, 73),
    forkOffset: edgeOr(-0.1, 0.2),
  })
  .map((g) => {
    const tyre = Math.min(0.15, g.tyreShare * g.outer);
    const hub = Math.min(g.hub, 0.5 * (g.outer - tyre));
    const room = g.outer - tyre - hub;
    const rimDepth = Math.min(1, g.rimShare * room);
    const rimInner = g.outer - tyre - rimDepth;
    const lo = Math.min(g.explicitA, g.explicitB);
    const hi = Math.max(g.explicitA, g.explicitB);
    // An explicit cover is set by its radii; a fraction beside them is refused.
    const cover: Record<string, unknown> = {
      ...(g.placement === 'explicit' ? {} : { fraction: g.fraction }),
      placement: g.placement,
      sides: g.sides,
    };
    if (g.placement === 'explicit') {
      cover.inner_radius_m = hub + lo * (rimInner - hub);
      cover.outer_radius_m = hub + hi * (rimInner - hub);
    }
    return {
      wheel: {
        outer_radius_m: g.outer,
        tyre_width_m: tyre,
        rim_depth_m: rimDepth,
        rim_width_m: g.rimWidth,
        hub_flange_radius_m: hub,
        spokes: {
          count: g.spokeCount,
          section: g.section,
          diameter_m: g.diameter,
          width_m: g.width,
          thickness_m: g.thickness,
        },
        cover,
      },
      conditions: {
        airspeed_mps: g.airspeed,
        yaw_deg: g.yaw,
        ground_speed_mps: g.groundSpeed,
        ...g.air,
      },
      steering: { head_angle_deg: g.headAngle, fork_offset_m: g.forkOffset },
      model: {
        ground: g.ground,
        lattice_span: g.span,
        lattice_chord: g.chord,
        suction_recovered: g.suction,
        porosity_scale: g.porosity,
        profile_drag_factor: g.profile,
        one_sided_cover_spoke_share: g.share,
        grid_convergence: g.gc,
      },
    };
  });

/**
 * Run a property with fast-check, bounded in runs and time (interruptAfterTimeLimit), and throw a
 * readable failure: the seed, the counterexample and the error it raised.
 */
export function checkProperty<T>(
  property: fc.IProperty<T> | fc.IAsyncProperty<T>,
  params: { seed: number; numRuns: number; timeLimitMs: number },
): fc.RunDetails<T> | Promise<fc.RunDetails<T>> {
  const options = {
    seed: params.seed,
    numRuns: params.numRuns,
    interruptAfterTimeLimit: params.timeLimitMs,
    markInterruptAsFailure: false,
  };
  const report = (result: fc.RunDetails<T>) => {
    if (result.failed) {
      const error =
        result.errorInstance instanceof Error ? result.errorInstance.message : String(result.errorInstance);
      throw new Error(
        `property failed (seed ${params.seed}): counterexample ${fc.stringify(result.counterexample)}\n${error}`,
      );
    }
    return result;
  };
  const result = fc.check(property as fc.IProperty<T>, options) as
    | fc.RunDetails<T>
    | Promise<fc.RunDetails<T>>;
  return result instanceof Promise ? result.then(report) : report(result);
}
