/**
 * The invented example files printed by `coversweep example` (and kept in public/examples/).
 * The wheel is made up: "Demo 50 mm half-cover", not any product.
 */

export function exampleCase(): Record<string, unknown> {
  return {
    format: 'coversweep-case',
    version: 1,
    name: 'Demo 50 mm half-cover',
    wheel: {
      outer_radius_m: 0.334,
      tyre_width_m: 0.025,
      rim_depth_m: 0.05,
      rim_width_m: 0.028,
      hub_flange_radius_m: 0.028,
      spokes: { count: 20, section: 'bladed', diameter_m: 0.002, width_m: 0.0022, thickness_m: 0.001 },
      cover: { fraction: 0.5, placement: 'rim', sides: 2 },
    },
    conditions: {
      airspeed_mps: 13.9,
      yaw_deg: [0, 2.5, 5, 7.5, 10, 12.5, 15, 20],
      temperature_c: 20,
      pressure_pa: 101325,
      relative_humidity: 0.5,
      reference_speed_kmh: 50,
    },
    steering: { head_angle_deg: 73, fork_offset_m: 0.045 },
    model: { ground: true, suction_recovered: 1, grid_convergence: true },
  };
}

export function examplePlan(): Record<string, unknown> {
  return {
    format: 'coversweep-plan',
    version: 1,
    name: 'Demo cover x rim sweep',
    wheel: {
      rim_depth_m: [0.035, 0.05, 0.08],
      spokes: { count: 20, section: 'bladed' },
      cover: { fraction: { from: 0, to: 1, step: 0.25 }, placement: 'rim', sides: 2 },
    },
    conditions: {
      airspeed_mps: 13.9,
      yaw_deg: { from: 0, to: 15, step: 5 },
      temperature_c: 20,
      relative_humidity: 0.5,
    },
    model: { grid_convergence: false },
  };
}

/** The example study: the example ride's front wheel, cover fraction x rim depth, time at 300 W under a
 * steering-moment limit. The limit is an invented example value, not a recommendation. */
export function exampleStudy(): Record<string, unknown> {
  const { cover: _cover, ...wheel } = exampleCase().wheel as Record<string, unknown>;
  return {
    format: 'coversweep-study',
    version: 1,
    name: 'Demo: front wheel cover and rim depth for 40 km at 300 W, steering moment at most 2.5 N m (an invented limit)',
    ride: {
      format: 'coversweep-ride',
      version: 1,
      design: { ...wheel, cover: { fraction: 0.5, placement: 'rim', sides: 2 } },
      baseline: { ...wheel, cover: { fraction: 0, placement: 'rim', sides: 2 } },
      position: 'front',
      rider: { mass_kg: 80, cda_m2: 0.24, crr: 0.004, drivetrain_efficiency: 0.976, com_height_m: 1.0 },
      ride: { power_W: 300, distance_m: 40000 },
      air: { temperature_c: 20, pressure_pa: 101325, relative_humidity: 0.5 },
      wind: { speed_mps: 5, direction_deg: 'uniform', reference_height_m: 10, roughness_length_m: 0.03 },
      handling: { gust_factor: 1.5, gust_duration_s: 3 },
      steering: { head_angle_deg: 73, fork_offset_m: 0.045 },
    },
    variables: { cover_fraction: { min: 0, max: 1 }, rim_depth_m: { min: 0.03, max: 0.09 } },
    objective: 'time_s',
    limits: { steering_gust_Nm: 2.5 },
    search: {
      grid_points: 5,
      starts: 3,
      max_evaluations: 200,
      tolerance: 0.002,
      lattice_span: 12,
      lattice_chord: 6,
    },
    front: { handling: 'steering_gust_Nm', limit_steps: 3 },
  };
}
