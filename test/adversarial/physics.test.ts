/**
 * Physics invariants on seeded random valid cases (issue 14's families): every number finite; mirror
 * symmetry in yaw (a wheel is symmetric about its own plane, so side force, yaw and roll moments change
 * sign with the yaw angle and axial force does not: geometry, exact); no side force head-on; the
 * lifting-surface and vortex loads scale exactly with dynamic pressure (linear potential theory, Katz &
 * Plotkin; Polhamus 1966: both are q x a coefficient of the angle alone). Tolerances: 1e-9 relative
 * (the solve is the same arithmetic mirrored; rounding only).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { type CaseFile, COMPONENT_NAMES, parseCaseFile, solveCase } from '../../src/compute/caseFile';
import { mulberry32 } from '../../src/model/random';
import { family } from './tally';

const physics = family('CLI: physics invariants on random valid cases', 'test/adversarial/physics.test.ts');
afterAll(() => physics.save());

function randomCase(random: () => number): CaseFile | null {
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(random() * xs.length)]!;
  const outer = 0.25 + random() * 0.12;
  const tyre = 0.018 + random() * 0.02;
  const hub = 0.02 + random() * 0.02;
  const rimDepth = random() * (outer - tyre - hub) * 0.8;
  const yaw = 1 + random() * 29;
  const speed = 3 + random() * 15;
  const text = JSON.stringify({
    wheel: {
      outer_radius_m: outer,
      tyre_width_m: tyre,
      rim_depth_m: rimDepth,
      hub_flange_radius_m: hub,
      spokes: { count: pick([0, 16, 20, 24, 28, 32]), section: pick(['round', 'bladed']) },
      cover: {
        fraction: random() < 0.2 ? pick([0, 1]) : random(),
        placement: pick(['rim', 'hub', 'centre']),
        sides: pick([1, 2]),
      },
    },
    conditions: {
      airspeed_mps: [speed, 2 * speed],
      yaw_deg: [-yaw, 0, yaw],
      temperature_c: -10 + random() * 40,
    },
    model: {
      ground: random() < 0.7,
      lattice_span: 6 + Math.floor(random() * 10),
      lattice_chord: 3 + Math.floor(random() * 5),
      grid_convergence: false,
      suction_recovered: random(),
    },
  });
  const parsed = parseCaseFile(text);
  return parsed.ok ? parsed.value : null;
}

const close = (a: number | null, b: number | null) =>
  a !== null && b !== null && Math.abs(a - b) <= 1e-9 * Math.max(1e-12, Math.abs(a), Math.abs(b));

describe('physics invariants on random valid cases', () => {
  it('finite outputs, yaw mirror symmetry, no side force head-on, exact q-scaling of the potential loads', () => {
    const random = mulberry32(1417);
    let solved = 0;
    for (let k = 0; k < 160 && solved < 120; k++) {
      const c = randomCase(random);
      if (c === null) continue;
      const doc = solveCase(c);
      solved++;
      physics.tried++;
      const rows = doc.results;
      for (const row of rows) {
        for (const key of [
          'axial_N',
          'side_N',
          'wind_drag_N',
          'power_W',
          'cda_axial_m2',
          'yaw_moment_Nm',
          'roll_moment_Nm',
          'steering_moment_Nm',
          'axle_torque_Nm',
        ] as const) {
          const v = row[key] as number | null;
          if (v === null || !Number.isFinite(v)) physics.crashes++;
          expect(Number.isFinite(v), `case ${k} ${key} = ${v}`).toBe(true);
        }
      }
      for (const s of [0, 3]) {
        const [minus, zero, plus] = [rows[s]!, rows[s + 1]!, rows[s + 2]!];
        const what = `case ${k}, airspeed ${plus.airspeed_mps}, yaw +-${plus.yaw_deg}`;
        expect(
          close(plus.side_N, minus.side_N === null ? null : -minus.side_N),
          `${what}: side ${plus.side_N} vs ${minus.side_N}`,
        ).toBe(true);
        expect(close(plus.axial_N, minus.axial_N), `${what}: axial ${plus.axial_N} vs ${minus.axial_N}`).toBe(
          true,
        );
        expect(
          close(plus.yaw_moment_Nm, minus.yaw_moment_Nm === null ? null : -minus.yaw_moment_Nm),
          `${what}: yaw moment`,
        ).toBe(true);
        expect(Math.abs(zero.side_N ?? Number.NaN), `${what}: side at 0 yaw`).toBeLessThanOrEqual(1e-9);
      }
      // Twice the airspeed, same yaw, same air: q x 4 for the surface and vortex parts.
      for (const part of ['surface', 'vortex'] as const) {
        const slow = rows[2]!.components[part].side_N;
        const fast = rows[5]!.components[part].side_N;
        expect(
          close(fast, slow === null ? null : 4 * slow),
          `case ${k} ${part}: side ${fast} vs 4 x ${slow}`,
        ).toBe(true);
      }
      expect(COMPONENT_NAMES.length).toBeGreaterThan(0);
    }
    expect(solved).toBeGreaterThanOrEqual(100);
  }, 60_000);
});
