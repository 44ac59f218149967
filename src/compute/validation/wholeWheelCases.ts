/**
 * Whole-wheel rows of the reference set (the acceptance list of this tool for whole-wheel figures): every value comes from the public
 * solve path (a case file, validateCase, solveCase: exactly what `coversweep solve` computes). Sea-level
 * ISA air (15 C, 101325 Pa, dry, 1.225 kg/m^3) and the tunnel convention (ground speed = airspeed)
 * throughout. The lattice's grid-convergence refinements are off where a row needs no uncertainty
 * (they change no value, only add the GCI); the refinement rows run their own lattices.
 */

import { spokeCageSwirl, wheelRadii } from '../../model/wheel';
import { caseToModelInput, type ResultDocument, validateCase } from '../caseFile';
import { kmhToMps } from '../units';
import { KINNER_SLOPE_PER_RAD, MARTIN_WHEEL_ROTATION_AREA } from './referenceValues';
import { richardsonLimit } from './richardsonLimit';
import type { ReferenceCase, SolveRaw } from './types';
import { need, pointAt } from './wheelCaseHelpers';

const MPH30 = 13.41;
const NO_GCI = { grid_convergence: false } as const;

/** A fully covered wheel (disc): R 0.335 m, 25 mm tyre, covers over the whole spoked region, both sides. */
function discCase(rimDepthM: number, yawDeg: number[], model: object = NO_GCI) {
  return {
    wheel: { outer_radius_m: 0.335, tyre_width_m: 0.025, rim_depth_m: rimDepthM, cover: { fraction: 1 } },
    conditions: { airspeed_mps: MPH30, yaw_deg: yawDeg },
    model,
  };
}
const DISC_YAWS = [0, 15, 20];
const DISC_TEXT = (rimMm: number) =>
  `disc (spoked region fully covered, both sides) over a ${rimMm} mm rim, R 0.335 m, 25 mm tyre, 30 mph (13.41 m/s), ISA sea level, ground on, default 24x12 lattice, grid convergence off`;

/** The 32-spoke box-rim wheel of Greenwell et al. (1995): R 0.34 m, 23 mm tyre, 20 mm deep and (assumed)
 * 20 mm wide rim, 32 round 2 mm spokes, no cover. */
function spoked32Case(airspeedMps: number, yawDeg: number[]) {
  return {
    wheel: {
      outer_radius_m: 0.34,
      tyre_width_m: 0.023,
      rim_depth_m: 0.02,
      rim_width_m: 0.02,
      spokes: { count: 32, section: 'round', diameter_m: 0.002 },
    },
    conditions: { airspeed_mps: airspeedMps, yaw_deg: yawDeg },
    model: NO_GCI,
  };
}
const GREENWELL_SPEED_MPS = 10.76;
const SPOKED32_TEXT = (speed: string) =>
  `open wheel, 32 round 2 mm spokes, 20 mm deep box rim (20 mm wide: an assumption), 23 mm tyre, R 0.34 m, ${speed}, ISA sea level, ground on, grid convergence off`;

export const GREENWELL =
  'D. I. Greenwell, N. J. Wood, E. K. L. Bridge, R. J. Addy (1995), "Aerodynamic characteristics of low-drag bicycle wheels", Aeronautical Journal 99, 109-120';
const TEW_SAYERS =
  'G. S. Tew, A. T. Sayers (1999), "Aerodynamics of yawed racing cycle wheels", J. Wind Eng. Ind. Aerodyn. 82, 209-222 (pages from memory)';
const MARTIN =
  'J. C. Martin, D. L. Milliken, J. E. Cobb, K. L. McFadden, A. R. Coggan (1998), "Validation of a mathematical model for road cycling power", J. Appl. Biomech. 14, 276-291';

/**
 * The page's default design space (src/ui: the default case and view): the demo wheel at 50 km/h, covering
 * fraction 0..1 in tenths (covers at the rim) x six rim depths from 10 to 100 mm. A browser-free test
 * (test/ui/validationDesignSpace.test.ts) holds this to the page's own plan.
 */
export const PAGE_DESIGN_SPACE = {
  airspeedMps: kmhToMps(50),
  fractions: [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1],
  rimDepthsM: [0.01, 0.028, 0.046, 0.064, 0.082, 0.1],
  yawDeg: 20,
} as const;

function minAxialOverDesignSpace(solve: SolveRaw) {
  let min = Number.POSITIVE_INFINITY;
  let where = '';
  const s = PAGE_DESIGN_SPACE;
  for (const depth of s.rimDepthsM) {
    for (const fraction of s.fractions) {
      const document = solve({
        wheel: { rim_depth_m: depth, cover: { fraction, placement: 'rim' } },
        conditions: { airspeed_mps: s.airspeedMps, yaw_deg: s.yawDeg },
        model: NO_GCI,
      });
      const axial = need(pointAt(document, s.yawDeg).axial_N, 'axial force');
      if (axial < min) {
        min = axial;
        where = `cover ${fraction}, rim ${Math.round(depth * 1000)} mm`;
      }
    }
  }
  return { value: min, note: `lowest at ${where} (of ${s.fractions.length * s.rimDepthsM.length} wheels)` };
}

/** Side-force slope per rad of the fully solid disc (lattice only) from the solve path at one lattice. */
function discSlope(solve: SolveRaw, ground: boolean, span: number, chord: number): number {
  const document = solve(
    discCase(0.06, [5], { ground, lattice_span: span, lattice_chord: chord, grid_convergence: false }),
  );
  return need(document.surface.side_slope_per_rad, 'side-force slope');
}

/** The spoke cage's swirl of a case (spokeCageSwirl at its first point), in words: the range over the
 * spokes' radii of the mean swirl of the air flushed through the disc and of the swirl at the spoke plane
 * in the merged wake of the spokes ahead, and the largest swirl added beyond that wake. */
function cageSwirlNote(raw: object): string {
  const parsed = validateCase(raw);
  if (!parsed.ok) throw new Error(`invalid reference case: ${parsed.errors.join('; ')}`);
  const input = caseToModelInput(parsed.value);
  const point = input.points[0];
  if (!point) throw new Error('the case has no flow point');
  const swirl = spokeCageSwirl(input.wheel, wheelRadii(input.wheel), point, input.options);
  const pct = (values: Float64Array) =>
    `${(100 * Math.min(...values)).toFixed(1)}-${(100 * Math.max(...values)).toFixed(1)} %`;
  return `cage swirl ${pct(swirl.meanSwirl)} of omega r (Glauert balance), merged-wake swirl ${pct(swirl.planeSwirl)}, added ${(100 * Math.max(...swirl.extraSwirl)).toFixed(1)} %`;
}

/** Axial force at a yaw angle over its value at 0 deg, from one solved document. */
function axialYawRatio(document: ResultDocument, yawDeg: number) {
  const a0 = need(pointAt(document, 0).axial_N, 'axial force');
  const a = need(pointAt(document, yawDeg).axial_N, 'axial force');
  return { value: a / a0, note: `${a.toFixed(3)} N at ${yawDeg} deg, ${a0.toFixed(3)} N at 0 deg` };
}

export const WHOLE_WHEEL_CASES: readonly ReferenceCase[] = [
  {
    id: 'disc-drag-30mph',
    group: 'wheel',
    quantity: 'axial drag of a disc at 0 deg (grams-force at 30 mph)',
    description: DISC_TEXT(60),
    source:
      'trade wind-tunnel practice for disc wheels at 30 mph: about 130-250 g, CdA of order 0.012-0.02 m^2 (from memory; no single citation)',
    strength: 'trade practice, from memory',
    reference: null,
    band: { low: 130, high: 250 },
    unit: 'gf',
    compute: (solve) => {
      const p = pointAt(solve(discCase(0.06, DISC_YAWS)), 0);
      return {
        value: need(p.axial_gf_30mph, 'axial drag'),
        note: `CdA ${need(p.cda_axial_m2, 'drag area').toFixed(4)} m^2`,
      };
    },
  },
  {
    id: 'disc-hidden-rim',
    group: 'wheel',
    quantity: "change of a disc's axial drag at 0 deg from a 60 mm to a 20 mm rim under the cover (%)",
    description: `${DISC_TEXT(60)}; the same with a 20 mm rim`,
    source:
      "a rim hidden under a full cover does not change the wheel's outer shape, so it cannot change the drag much (the acceptance band of this tool: less than 10 %)",
    strength: 'physical reasoning',
    reference: 0,
    band: { low: -10, high: 10, lowOpen: true, highOpen: true },
    unit: '%',
    compute: (solve) => {
      const deep = need(pointAt(solve(discCase(0.06, DISC_YAWS)), 0).axial_N, 'axial force');
      const shallow = need(pointAt(solve(discCase(0.02, DISC_YAWS)), 0).axial_N, 'axial force');
      return {
        value: 100 * (shallow / deep - 1),
        note: `${shallow.toFixed(3)} N (20 mm) vs ${deep.toFixed(3)} N (60 mm)`,
      };
    },
  },
  {
    id: 'spoked32-drag-area',
    group: 'wheel',
    quantity: 'axial drag area of a 32-spoke wheel at 0 deg (m^2)',
    description: SPOKED32_TEXT('10.76 m/s'),
    source: `${GREENWELL}: CdA about 0.0176 m^2 (127 gf at 10.76 m/s) (from memory); band +-25 %`,
    strength: 'measured',
    reference: 0.0176,
    band: { low: 0.0176 * 0.75, high: 0.0176 * 1.25 },
    unit: 'm^2',
    compute: (solve) => {
      const p = pointAt(solve(spoked32Case(GREENWELL_SPEED_MPS, [0, 15])), 0);
      return {
        value: need(p.cda_axial_m2, 'drag area'),
        note: `${need(p.axial_gf_ref, 'gf').toFixed(0)} gf at 50 km/h`,
      };
    },
  },
  {
    id: 'spoked32-spoke-share',
    group: 'wheel',
    quantity: "the spokes' share of that wheel's axial drag at 0 deg",
    description: SPOKED32_TEXT('10.76 m/s'),
    source: `${GREENWELL}: the tyre and rim carry a large share of a spoked wheel's drag (the acceptance band of this tool: spokes at most 60 %)`,
    strength: 'measured (trend)',
    reference: null,
    band: { low: 0, high: 0.6 },
    unit: '-',
    compute: (solve) => {
      const p = pointAt(solve(spoked32Case(GREENWELL_SPEED_MPS, [0, 15])), 0);
      const total = need(p.axial_N, 'axial force');
      const spokes = need(p.components.spokes.axial_N, 'spoke axial force');
      const rim = need(p.components.rim_tyre.axial_N, 'rim/tyre axial force');
      return { value: spokes / total, note: `rim and tyre ${(rim / total).toFixed(2)}` };
    },
  },
  {
    id: 'martin-rotation-area',
    group: 'wheel',
    quantity: 'rotational drag area of a pair of 32-spoke wheels, 2 T omega / (0.5 rho V^3) (m^2)',
    description: SPOKED32_TEXT('40 km/h (11.11 m/s), 0 deg'),
    source: `${MARTIN}: incremental drag area of wheel rotation F_W = 0.0044 m^2 (from memory); the acceptance band of this tool 0.0029-0.0059`,
    strength: 'measured',
    reference: MARTIN_WHEEL_ROTATION_AREA.valueM2,
    band: { low: MARTIN_WHEEL_ROTATION_AREA.lowM2, high: MARTIN_WHEEL_ROTATION_AREA.highM2 },
    unit: 'm^2',
    knownDisagreement:
      "the swirl of the whole spoke cage is now balanced (Glauert's annulus angular-momentum balance, the air flushed edgewise through the disc at the airspeed): rolling head-on it is 1-3 % of omega r, well inside the 19-54 % the spokes already meet in the merged wake of the spokes ahead, so it changes nothing here (see the note). Spun in still air the same pair gives 0.0051 m^2, inside the band; rolling, the spokes at the top cross the air at up to twice the road speed, those at the bottom at almost none, and by the crossflow principle the difference adds a torque of order rho Cd d V omega r^2 per spoke length that spinning in still air does not have. Not modelled and candidates for the rest: the in-plane freestream slowed inside the rim by the front arc's wake (about 25 % on its centre line at the hub; a scratch estimate with the spokes' in-plane freestream 25 % slower gives about 0.0078 m^2 for the whole wheel, still outside the band), dish and lacing, the unsteady, non-uniform flow the spokes meet near the rim",
    compute: (solve) => {
      const v = kmhToMps(40);
      const raw = spoked32Case(v, [0]);
      const p = pointAt(solve(raw), 0);
      const torque = need(p.axle_torque_Nm, 'axle torque');
      const rho = need(p.air_density_kgpm3, 'air density');
      const omega = need(p.ground_speed_mps, 'ground speed') / 0.34;
      const spokeShare = need(p.components.spokes.axle_torque_Nm, 'spoke torque') / torque;
      return {
        value: (2 * torque * omega) / (0.5 * rho * v ** 3),
        note: `spokes ${(100 * spokeShare).toFixed(0)} % of the torque; ${cageSwirlNote(raw)}`,
      };
    },
  },
  {
    id: 'disc-yaw15-ratio',
    group: 'wheel',
    quantity: "a disc's axial drag at 15 deg over its value at 0 deg",
    description: DISC_TEXT(60),
    source: `${GREENWELL}; ${TEW_SAYERS}: a disc's axial drag falls with yaw but stays a drag at 15 deg (trend, from memory)`,
    strength: 'measured (trend)',
    reference: null,
    band: { low: 0, high: 1, lowOpen: true, highOpen: true },
    unit: '-',
    compute: (solve) => axialYawRatio(solve(discCase(0.06, DISC_YAWS)), 15),
  },
  {
    id: 'spoked32-yaw15-ratio',
    group: 'wheel',
    quantity: "a shallow 32-spoke wheel's axial drag at 15 deg over its value at 0 deg",
    description: SPOKED32_TEXT('10.76 m/s'),
    source: `${GREENWELL}; ${TEW_SAYERS}: a shallow spoked wheel's axial drag does not fall with yaw (trend, from memory; the acceptance band of this tool: at least 0.95)`,
    strength: 'measured (trend)',
    reference: null,
    band: { low: 0.95, high: null },
    unit: '-',
    compute: (solve) => axialYawRatio(solve(spoked32Case(GREENWELL_SPEED_MPS, [0, 15])), 15),
  },
  {
    id: 'design-space-yaw20',
    group: 'wheel',
    quantity: "lowest axial force at 20 deg over the page's default design space (N)",
    description:
      "the page's default wheel (R 0.334 m, 25 mm tyre, 20 round spokes) at 50 km/h, 20 deg, cover fraction 0..1 in tenths (at the rim) x rim depth 10..100 mm (66 wheels), ISA sea level, ground on, grid convergence off",
    source: `${GREENWELL}; ${TEW_SAYERS} (axial drag stays positive at 15 deg, from memory); no published source found that shows these wheels' axial drag below zero at 20 deg (the acceptance rule of this tool)`,
    strength: 'measured (trend)',
    reference: null,
    band: { low: 0, high: null },
    unit: 'N',
    compute: minAxialOverDesignSpace,
  },
  {
    id: 'disc-slope-kinner',
    group: 'wheel',
    quantity: 'side-force slope of the fully solid disc without ground, from the solve path (per rad)',
    description:
      'disc (cover fraction 1) over a 60 mm rim, R 0.335 m, ground off, default 24x12 wheel lattice, grid convergence off; band +-0.5 %',
    source:
      'W. Kinner (1937), Ingenieur-Archiv 8, 47-80; P. F. Jordan (1973): thin circular wing 1.790 per rad (from memory)',
    strength: 'theory (exact)',
    reference: KINNER_SLOPE_PER_RAD,
    band: { low: KINNER_SLOPE_PER_RAD * 0.995, high: KINNER_SLOPE_PER_RAD * 1.005 },
    unit: '1/rad',
    compute: (solve) => ({ value: discSlope(solve, false, 24, 12) }),
  },
  {
    id: 'disc-slope-ground-richardson',
    group: 'wheel',
    quantity: 'side-force slope of the solid disc with ground: default lattice vs its Richardson limit (%)',
    description:
      'disc over a 60 mm rim, R 0.335 m, ground on; wheel lattices 12x6, 24x12, 48x24 through the solve path; limit by Richardson extrapolation (Celik et al. 2008 procedure); band +-1 %',
    source:
      'refinement study of the model itself (P. J. Roache 1994, J. Fluids Eng. 116; Celik et al. 2008, J. Fluids Eng. 130, 078001); the acceptance band of this tool: within 1 %',
    strength: 'numerical (refinement study)',
    reference: 0,
    band: { low: -1, high: 1 },
    unit: '%',
    compute: (solve) => {
      const f = [12, 24, 48].map((n) => discSlope(solve, true, n, n / 2));
      const { limit, order } = richardsonLimit(f[0]!, f[1]!, f[2]!, 48);
      return {
        value: 100 * (f[1]! / limit - 1),
        note: `24x12 ${f[1]!.toFixed(4)}, limit ${limit.toFixed(4)} (order ${order.toFixed(2)})`,
      };
    },
  },
];
