/**
 * Property-based tests (fast-check) over the model's whole input space, edges included: zero spokes,
 * a cover from hub to rim, the rim at its deepest, yaw 0 and +-90 deg, very low and very high speed,
 * air at altitude. What must hold (issue 7, "values at the model's edge"):
 *   - a case the case-file rules accept solves without throwing, and every output is finite, except
 *     the centre of pressure (NaN only when the side force is about zero) and the grid-convergence
 *     uncertainty (NaN only when not computed, or when the lattice is flagged as not converged);
 *   - points outside the validity range carry their flag (never a silent extrapolation);
 *   - a case the rules reject gets messages naming the key path (never a throw);
 *   - the model itself, handed any numbers (NaN, infinities, negatives), either returns finite
 *     results or throws a RangeError naming the offending input.
 * The rules are those of the README and src/model/wheel/validity.ts (common practice, no source).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { caseToModelInput, validateCase } from '../../src/compute/caseFile';
import {
  DEFAULT_MODEL_OPTIONS,
  DEFAULT_STEERING,
  DEMO_WHEEL,
  type PointResult,
  solveWheel,
  VALIDITY,
  type WheelInput,
} from '../../src/model/wheel';
import { checkProperty, rawCase } from './arbitraries';

const SEED = 20240607;
/** Time budget of one property (ms): fast-check stops generating after it (interruptAfterTimeLimit). */
const BUDGET_MS = 4000;

const SCALAR_KEYS = [
  'yawRad',
  'airspeedMps',
  'groundSpeedMps',
  'rhoKgPerM3',
  'axialN',
  'sideN',
  'verticalN',
  'windDragN',
  'windLiftN',
  'yawMomentNm',
  'rollMomentNm',
  'steeringMomentNm',
  'axleTorqueNm',
  'powerW',
  'cdaAxialM2',
] as const satisfies readonly (keyof PointResult)[];

/** Everything wrong with one point's result (empty when it is as the issue asks). */
function pointProblems(p: PointResult, gridConvergence: boolean): string[] {
  const out: string[] = [];
  for (const k of SCALAR_KEYS) if (!Number.isFinite(p[k])) out.push(`${k}=${p[k]}`);
  for (const [name, loads] of Object.entries(p.components)) {
    for (const [k, v] of Object.entries(loads)) if (!Number.isFinite(v)) out.push(`${name}.${k}=${v}`);
  }
  const q = 0.5 * p.rhoKgPerM3 * p.airspeedMps ** 2;
  for (const k of ['cpXM', 'cpZM'] as const) {
    // NaN only when the side force is about zero (the documented rule of assemblePoint: |F_y| <= 1e-9 q S).
    if (!Number.isFinite(p[k]) && !(Number.isNaN(p[k]) && Math.abs(p.sideN) <= 1e-9 * q * 10)) {
      out.push(`${k}=${p[k]} with sideN=${p.sideN}`);
    }
  }
  for (const k of ['uncertaintyAxialN', 'uncertaintySideN'] as const) {
    const v = p[k];
    if (Number.isFinite(v)) {
      if (v < 0) out.push(`${k}=${v} < 0`);
      continue;
    }
    const explained = !gridConvergence || p.flags.includes('lattice_not_converged');
    if (!(Number.isNaN(v) && explained)) out.push(`${k}=${v} (grid convergence ${gridConvergence})`);
  }
  if (Math.abs(p.yawRad) > VALIDITY.maxYawRad + 1e-12 && !p.flags.includes('yaw_beyond_range')) {
    out.push(`yaw ${p.yawRad} rad beyond the range without its flag`);
  }
  if (
    (p.airspeedMps < VALIDITY.minAirspeedMps || p.airspeedMps > VALIDITY.maxAirspeedMps) &&
    !p.flags.includes('airspeed_beyond_range')
  ) {
    out.push(`airspeed ${p.airspeedMps} m/s beyond the range without its flag`);
  }
  const ratio = p.groundSpeedMps / p.airspeedMps;
  if (ratio > VALIDITY.maxRotationRatio && !p.flags.includes('rotation_ratio_beyond_range')) {
    out.push(`rotation ratio ${ratio} beyond the range without its flag`);
  }
  return out;
}

describe('the model over its whole input space (fast-check)', () => {
  it('every case the rules accept solves to finite, flagged results; every rejection names the key', () => {
    let accepted = 0;
    let rejected = 0;
    checkProperty(
      fc.property(rawCase, (raw) => {
        const parsed = validateCase(raw);
        if (!parsed.ok) {
          rejected++;
          expect(parsed.errors.length).toBeGreaterThan(0);
          for (const e of parsed.errors)
            expect(e, JSON.stringify(raw)).toMatch(/^[a-z_.[\]0-9]+: |^conditions: /);
          return;
        }
        accepted++;
        const input = caseToModelInput(parsed.value);
        let problems: string[];
        try {
          const solution = solveWheel(input);
          problems = solution.points.flatMap((p, i) =>
            pointProblems(p, input.options.gridConvergence).map((m) => `point ${i}: ${m}`),
          );
        } catch (error) {
          problems = [`threw ${error instanceof Error ? `${error.name}: ${error.message}` : String(error)}`];
        }
        expect(problems, `case ${JSON.stringify(parsed.value)}`).toEqual([]);
      }),
      { seed: SEED, numRuns: 300, timeLimitMs: BUDGET_MS },
    );
    // The generator must mostly produce accepted cases, or the property says little.
    expect(accepted, `accepted=${accepted} rejected=${rejected}`).toBeGreaterThanOrEqual(20);
  });

  it('the named edges each give finite results or a flag: zero spokes, full cover, deepest rim, yaw 0/90, speed extremes, altitude', () => {
    const edges: Array<[string, Record<string, unknown>]> = [
      ['zero spokes', { wheel: { spokes: { count: 0 } } }],
      ['cover from hub to rim (full disc)', { wheel: { cover: { fraction: 1, placement: 'rim' } } }],
      [
        'explicit cover from hub flange to rim',
        { wheel: { cover: { placement: 'explicit', inner_radius_m: 0.028, outer_radius_m: 0.259 } } },
      ],
      [
        'no rim depth, rim wider than the tyre (28 mm rim, 25 mm tyre)',
        { wheel: { rim_depth_m: 0, rim_width_m: 0.028 } },
      ],
      ['rim at its deepest', { wheel: { rim_depth_m: 0.334 - 0.025 - 0.028 - 1e-6 } }],
      ['yaw 0 and +-90 deg', { conditions: { yaw_deg: [-90, 0, 90] } }],
      ['very low and very high speed', { conditions: { airspeed_mps: [0.001, 60] } }],
      ['air at altitude (4000 m, ISA day)', { conditions: { altitude_m: 4000 } }],
      ['air at 11 km on a -30 C day', { conditions: { altitude_m: 11000, temperature_c: -30 } }],
      ['still wheel', { conditions: { ground_speed_mps: 0 } }],
      ['ground speed 60 m/s at 1 m/s airspeed', { conditions: { airspeed_mps: 1, ground_speed_mps: 60 } }],
    ];
    for (const [name, patch] of edges) {
      const raw = {
        ...patch,
        conditions: { airspeed_mps: [13.9], yaw_deg: [0, 15, 90], ...(patch.conditions as object) },
        model: { lattice_span: 10, lattice_chord: 6, grid_convergence: true },
      };
      const parsed = validateCase(raw);
      expect(parsed.ok, `${name}: ${parsed.ok ? '' : parsed.errors.join('; ')}`).toBe(true);
      if (!parsed.ok) continue;
      const input = caseToModelInput(parsed.value);
      const solution = solveWheel(input);
      const problems = solution.points.flatMap((p) => pointProblems(p, true));
      expect(problems, name).toEqual([]);
    }
  });

  it("altitude above the air laws' temperature range without a temperature: a clear message", () => {
    const parsed = validateCase({ conditions: { airspeed_mps: 10, yaw_deg: 0, altitude_m: 11000 } });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors).toEqual([
      "conditions.altitude_m: the standard atmosphere's temperature at 11000 m is -56.5 C, outside the -40..50 C the air laws cover; give conditions.temperature_c for the day, got 11000",
    ]);
  });

  it('grid convergence on a lattice too coarse to coarsen twice (4 x 2): no throw, uncertainty not computed and flagged', () => {
    const parsed = validateCase({
      conditions: { airspeed_mps: 10, yaw_deg: [0, 10] },
      model: { lattice_span: 4, lattice_chord: 2, grid_convergence: true },
    });
    if (!parsed.ok) throw new Error(parsed.errors.join('; '));
    const solution = solveWheel(caseToModelInput(parsed.value));
    for (const p of solution.points) {
      expect(p.flags).toContain('lattice_not_converged');
      expect(pointProblems(p, true)).toEqual([]);
    }
  });

  it('solveWheel, handed any numbers, returns finite results or throws a RangeError naming the input', () => {
    const anyNumber = fc.oneof(
      { weight: 3, arbitrary: fc.double({ min: -2, max: 2 }) },
      { weight: 1, arbitrary: fc.constantFrom(Number.NaN, Infinity, -Infinity, 0, -0, 1e300, -1e-300) },
    );
    const wheelKeys = [
      'outerRadiusM',
      'tyreWidthM',
      'rimDepthM',
      'rimWidthM',
      'hubFlangeRadiusM',
      'spokeCount',
      'spokeDiameterM',
      'spokeWidthM',
      'spokeThicknessM',
      'coverFraction',
      'coverInnerRadiusM',
      'coverOuterRadiusM',
    ] as const;
    const optionKeys = [
      'latticeSpanCount',
      'latticeChordCount',
      'suctionRecovered',
      'porosityScale',
      'profileDragFactor',
      'oneSidedCoverSpokeShare',
    ] as const;
    const pointKeys = ['airspeedMps', 'yawRad', 'groundSpeedMps', 'rhoKgPerM3', 'muPaS'] as const;
    const mutation = fc.oneof(
      fc.record({
        where: fc.constant('wheel' as const),
        key: fc.constantFrom(...wheelKeys),
        value: anyNumber,
      }),
      fc.record({
        where: fc.constant('options' as const),
        key: fc.constantFrom(...optionKeys),
        value: anyNumber,
      }),
      fc.record({
        where: fc.constant('point' as const),
        key: fc.constantFrom(...pointKeys),
        value: anyNumber,
      }),
      fc.record({
        where: fc.constant('steering' as const),
        key: fc.constantFrom('headAngleRad', 'forkOffsetM'),
        value: anyNumber,
      }),
    );
    checkProperty(
      fc.property(fc.array(mutation, { minLength: 1, maxLength: 3 }), (mutations) => {
        const input: WheelInput = {
          wheel: { ...DEMO_WHEEL, coverFraction: 0.5 },
          options: {
            ...DEFAULT_MODEL_OPTIONS,
            latticeSpanCount: 8,
            latticeChordCount: 4,
            gridConvergence: false,
          },
          steering: { ...DEFAULT_STEERING },
          points: [{ airspeedMps: 13, yawRad: 0.2, groundSpeedMps: 13, rhoKgPerM3: 1.2, muPaS: 1.8e-5 }],
        };
        const names: string[] = [];
        for (const m of mutations) {
          const target = m.where === 'point' ? input.points[0]! : input[m.where];
          (target as unknown as Record<string, number>)[m.key] =
            m.key === 'latticeSpanCount' || m.key === 'latticeChordCount'
              ? Math.round(m.value * 10)
              : m.value;
          names.push(m.key);
        }
        let solved: ReturnType<typeof solveWheel>;
        try {
          solved = solveWheel(input);
        } catch (error) {
          expect(error, `${JSON.stringify(mutations)}: ${String(error)}`).toBeInstanceOf(RangeError);
          const message = (error as Error).message;
          // The message names one of the inputs changed (or the derived rule they broke).
          const named =
            names.some((n) => message.includes(n)) ||
            /spoked annulus|panels|spanCount|chordCount/.test(message);
          expect(named, `${JSON.stringify(mutations)} -> "${message}"`).toBe(true);
          return;
        }
        const problems = solved.points.flatMap((p) => pointProblems(p, false));
        expect(problems, JSON.stringify(mutations)).toEqual([]);
      }),
      { seed: SEED, numRuns: 300, timeLimitMs: BUDGET_MS },
    );
  });
});
