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
