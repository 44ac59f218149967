/**
 * Side-force rows of the reference set. Published side-force data of isolated bicycle wheels at yaw were
 * searched for; what could be confirmed are trends (which wheel makes more side force, what controls it),
 * not numbers this project could re-read, so these rows hold the model to those trends, each with its
 * source and strength. All through the public solve path; ISA sea level; grid convergence off.
 */

import type { ReferenceCase, SolveRaw } from './types';
import { need, pointAt } from './wheelCaseHelpers';
import { GREENWELL } from './wholeWheelCases';

const MPH30 = 13.41;
const NO_GCI = { grid_convergence: false } as const;
const CRANE_MORTON =
  'R. Crane, C. Morton (2018), "Drag and side force analysis on bicycle wheel-tire combinations", J. Fluids Eng. 140, doi:10.1115/1.4039513 (wind tunnel, rim depth 55-90 mm, tyre 21.4-26.15 mm, 0-12.6 deg at 13.4 m/s); its abstract: side-force area is controlled primarily by rim depth and only weakly by tyre width';
const CRANE_MORTON_YAW_DEG = 12.6;

/** A deep-rim spoked wheel like those of Crane & Morton (2018): R 0.335 m, 23 mm wide rim, 20 round spokes
 * (the model's default; the paper's spokes are not modelled), no cover, 13.4 m/s. */
function deepRimSide(solve: SolveRaw, rimDepthM: number, tyreWidthM: number): number {
  const document = solve({
    wheel: { outer_radius_m: 0.335, rim_depth_m: rimDepthM, rim_width_m: 0.023, tyre_width_m: tyreWidthM },
    conditions: { airspeed_mps: 13.4, yaw_deg: CRANE_MORTON_YAW_DEG },
    model: NO_GCI,
  });
  return need(pointAt(document, CRANE_MORTON_YAW_DEG).side_N, 'side force');
}

function discSlope(solve: SolveRaw, ground: boolean): number {
  const document = solve({
    wheel: { outer_radius_m: 0.335, tyre_width_m: 0.025, rim_depth_m: 0.06, cover: { fraction: 1 } },
    conditions: { airspeed_mps: MPH30, yaw_deg: 5 },
    model: { ground, grid_convergence: false },
  });
  return need(document.surface.side_slope_per_rad, 'side-force slope');
}

function spokedSlope(solve: SolveRaw, ground: boolean): number {
  const document = solve({
    wheel: {
      outer_radius_m: 0.335,
      tyre_width_m: 0.023,
      rim_depth_m: 0.015,
      rim_width_m: 0.02,
      spokes: { count: 36 },
    },
    conditions: { airspeed_mps: MPH30, yaw_deg: 5 },
    model: { ground, grid_convergence: false },
  });
  return need(document.surface.side_slope_per_rad, 'side-force slope');
}

export const SIDE_FORCE_CASES: readonly ReferenceCase[] = [
  {
    id: 'side-depth-controls',
    group: 'side force',
    quantity: 'side force of a 90 mm over a 55 mm rim at 12.6 deg',
    description:
      'open wheel, R 0.335 m, 23 mm tyre on a 23 mm wide rim 55 or 90 mm deep, 20 round spokes, 13.4 m/s, 12.6 deg, ISA sea level, ground on, grid convergence off',
    source: CRANE_MORTON,
    strength: 'measured (trend)',
    reference: null,
    band: { low: 1, high: null, lowOpen: true },
    unit: '-',
    compute: (solve) => {
      const deep = deepRimSide(solve, 0.09, 0.023);
      const shallow = deepRimSide(solve, 0.055, 0.023);
      return { value: deep / shallow, note: `${deep.toFixed(2)} N vs ${shallow.toFixed(2)} N` };
    },
  },
  {
    id: 'side-tyre-weaker-than-depth',
    group: 'side force',
    quantity:
      'change of side force with tyre width (21.4 -> 26.15 mm) over its change with rim depth (55 -> 90 mm)',
    description:
      'the wheel above with a 55 mm rim and a 21.4 or 26.15 mm tyre, against the 55 -> 90 mm rim change with a 23 mm tyre; 12.6 deg, 13.4 m/s, ISA sea level, ground on, grid convergence off',
    source: CRANE_MORTON,
    strength: 'measured (trend)',
    reference: null,
    band: { low: 0, high: 1, highOpen: true },
    unit: '-',
    compute: (solve) => {
      const depthChange = deepRimSide(solve, 0.09, 0.023) / deepRimSide(solve, 0.055, 0.023) - 1;
      const tyreChange = deepRimSide(solve, 0.055, 0.02615) / deepRimSide(solve, 0.055, 0.0214) - 1;
      return {
        value: Math.abs(tyreChange) / Math.abs(depthChange),
        note: `tyre ${(100 * tyreChange).toFixed(1)} %, depth ${(100 * depthChange).toFixed(1)} %`,
      };
    },
  },
  {
    id: 'side-disc-over-spoked',
    group: 'side force',
    quantity: 'side force of a disc over that of a 36-spoke box-rim wheel at 10 deg',
    description:
      'disc over a 60 mm rim vs an open 36-spoke (round 2 mm) wheel with a 15 mm deep, 20 mm wide box rim; both R 0.335 m, 23 mm tyre, 30 mph (13.41 m/s), 10 deg, ISA sea level, ground on, grid convergence off',
    source: `${GREENWELL}: the disc wheels showed the highest side force and yawing moment of the wheels tested, against a standard 36-spoke box-rim wheel (trend; as summarised in the trade press of the time)`,
    strength: 'measured (trend)',
    reference: null,
    band: { low: 1, high: null, lowOpen: true },
    unit: '-',
    compute: (solve) => {
      const side = (wheel: object) =>
        need(
          pointAt(solve({ wheel, conditions: { airspeed_mps: MPH30, yaw_deg: 10 }, model: NO_GCI }), 10)
            .side_N,
          'side force',
        );
      const disc = side({
        outer_radius_m: 0.335,
        tyre_width_m: 0.023,
        rim_depth_m: 0.06,
        cover: { fraction: 1 },
      });
      const spoked = side({
        outer_radius_m: 0.335,
        tyre_width_m: 0.023,
        rim_depth_m: 0.015,
        rim_width_m: 0.02,
        spokes: { count: 36 },
      });
      return { value: disc / spoked, note: `${disc.toFixed(2)} N vs ${spoked.toFixed(2)} N` };
    },
  },
  {
    id: 'side-ground-raises-slope',
    group: 'side force',
    quantity: 'side-force slope of the solid disc with the ground image over its slope without',
    description:
      'disc over a 60 mm rim, R 0.335 m, 30 mph, default 24x12 lattice, ground on vs off, grid convergence off',
    source:
      'A. W. Carter (1961), NASA TN D-970: aspect-ratio-1 wings gain lift-curve slope as the ground approaches (towing-tank measurements); mirror-image ground effect (J. Katz, A. Plotkin, Low-Speed Aerodynamics). No measured isolated-wheel data with and without ground were found',
    strength: 'measured (trend)',
    reference: null,
    band: { low: 1, high: null, lowOpen: true },
    unit: '-',
    compute: (solve) => {
      const withGround = discSlope(solve, true);
      const free = discSlope(solve, false);
      const spokedRatio = spokedSlope(solve, true) / spokedSlope(solve, false);
      return {
        value: withGround / free,
        note: `${withGround.toFixed(3)} vs ${free.toFixed(3)} per rad; an open 36-spoke wheel: x${spokedRatio.toFixed(2)}`,
      };
    },
  },
];
