import { MessageChannel } from 'node:worker_threads';
import { expose, wrap } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';
import { describe, expect, it } from 'vitest';
import type { SolverApi, ViewField } from '../../../src/compute/engine/protocol';
import { viewField } from '../../../src/compute/engine/viewField';
import { solverApi } from '../../../src/compute/worker/solverApi';
import {
  DEFAULT_MODEL_OPTIONS,
  DEFAULT_STEERING,
  DEMO_WHEEL,
  groundTrailM,
  solveWheel,
  type WheelInput,
} from '../../../src/model/wheel';

const deg = Math.PI / 180;

function input(yawDeg: number, coverFraction = 0.5): WheelInput {
  return {
    wheel: { ...DEMO_WHEEL, coverFraction },
    options: { ...DEFAULT_MODEL_OPTIONS, latticeSpanCount: 16, latticeChordCount: 8 },
    steering: { ...DEFAULT_STEERING },
    points: [{ airspeedMps: 12, yawRad: yawDeg * deg, groundSpeedMps: 12, rhoKgPerM3: 1.2, muPaS: 1.8e-5 }],
  };
}

function quadArea(c: Float64Array, p: number): number {
  let a = 0;
  for (let j = 0; j < 4; j++) {
    const k = (j + 1) % 4;
    a += c[8 * p + 2 * j]! * c[8 * p + 2 * k + 1]! - c[8 * p + 2 * k]! * c[8 * p + 2 * j + 1]!;
  }
  return 0.5 * Math.abs(a);
}

function checkPolylines(points: Float64Array, offsets: Uint32Array, R: number, what: string): void {
  expect(offsets[0]).toBe(0);
  for (let i = 1; i < offsets.length; i++)
    expect(offsets[i]!, `${what} offset ${i}`).toBeGreaterThan(offsets[i - 1]!);
  expect(offsets[offsets.length - 1]! * 3).toBe(points.length);
  for (let i = 0; i < points.length; i += 3) {
    expect(Number.isFinite(points[i]! + points[i + 1]! + points[i + 2]!), `${what} point ${i / 3}`).toBe(
      true,
    );
    expect(points[i + 2]!, `${what} point ${i / 3} above ground`).toBeGreaterThanOrEqual(-R);
  }
}

describe('viewField (one operating point for the 3D view)', () => {
  const f = viewField({ input: input(10) });
  const R = DEMO_WHEEL.outerRadiusM;

  it('carries the same forces and centre of pressure as solveWheel (exactly)', () => {
    const p = solveWheel(input(10)).points[0]!;
    expect(f.sideN).toBe(p.sideN);
    expect(f.axialN).toBe(p.axialN);
    expect(f.cpXM).toBe(p.cpXM);
    expect(f.cpZM).toBe(p.cpZM);
    expect(f.forceOriginM).toEqual([p.cpXM, 0, p.cpZM]);
    expect(f.flags).toEqual(p.flags);
    expect(f.dynamicPressurePa).toBe(0.5 * 1.2 * 144);
  });

  it('panel Delta Cp integrates to Kp sin(b) cos(b) on pi R^2 (Polhamus 1966 potential normal force), tol 1e-10', () => {
    const s = solveWheel(input(10)).surface; // rotation ratio 1, as this point
    expect(f.panelCornersM.length).toBe(8 * f.panelCount);
    let sum = 0;
    for (let p = 0; p < f.panelCount; p++) sum += f.pressureJump[p]! * quadArea(f.panelCornersM, p);
    const got = sum / (Math.PI * R * R);
    const exp = s.sideSlopePerRad * Math.sin(10 * deg) * Math.cos(10 * deg);
    const tol = 1e-10 * exp;
    expect(Math.abs(got - exp), `got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
    expect(f.colourLimit).toBeGreaterThan(0);
    expect(f.pressureJumpMax).toBeGreaterThanOrEqual(f.colourLimit * 0.5);
  });

  it('polylines are well formed and never below the ground; the wake has one filament per strip edge', () => {
    checkPolylines(f.wakePointsM, f.wakeOffsets, R, 'wake');
    checkPolylines(f.streamPointsM, f.streamOffsets, R, 'stream');
    expect(f.wakeOffsets.length - 1).toBe(16 + 1);
    expect(f.wakeStrengthM2ps.length).toBe(f.wakeOffsets.length - 1);
    expect(f.streamOffsets.length - 1).toBeGreaterThanOrEqual(12);
  });

  it('the steering axis meets the ground the ground trail ahead of the contact point (Cossalter; from memory)', () => {
    const exp = groundTrailM(R, DEFAULT_STEERING);
    expect(f.groundTrailM).toBe(exp);
    expect(f.steeringAxisM[2]).toBe(-R);
    expect(Math.abs(f.steeringAxisM[0]! - exp), `x=${f.steeringAxisM[0]} trail=${exp}`).toBeLessThanOrEqual(
      1e-15,
    );
    // Tilted back by the head angle: dx/dz = -cos h / sin h.
    const slope = (f.steeringAxisM[3]! - f.steeringAxisM[0]!) / (f.steeringAxisM[5]! - f.steeringAxisM[2]!);
    const h = DEFAULT_STEERING.headAngleRad;
    expect(Math.abs(slope + Math.cos(h) / Math.sin(h))).toBeLessThanOrEqual(1e-14);
  });

  it('yaw -> -yaw mirrors the picture: loads flip, streamlines and wake mirror in y (tol 1e-12 m)', () => {
    const g = viewField({ input: input(-10) });
    expect(g.sideN).toBeCloseTo(-f.sideN, 12);
    for (let p = 0; p < f.panelCount; p++) expect(g.pressureJump[p]).toBe(-f.pressureJump[p]!);
    expect(Array.from(g.wakeOffsets)).toEqual(Array.from(f.wakeOffsets));
    for (let i = 0; i < f.wakePointsM.length; i += 3) {
      expect(Math.abs(g.wakePointsM[i + 1]! + f.wakePointsM[i + 1]!), `wake ${i / 3}`).toBeLessThanOrEqual(
        1e-12,
      );
    }
    // The seeds' sides swap: line j on one side at +yaw is line j on the other side at -yaw.
    const lines = f.streamOffsets.length - 1;
    const half = lines / 2;
    for (let j = 0; j < lines; j++) {
      const k = (j + half) % lines;
      const a0 = f.streamOffsets[j]!;
      const b0 = g.streamOffsets[k]!;
      const len = f.streamOffsets[j + 1]! - a0;
      expect(g.streamOffsets[k + 1]! - b0, `line ${j} length`).toBe(len);
      for (let i = 0; i < len; i++) {
        const a = 3 * (a0 + i);
        const b = 3 * (b0 + i);
        expect(Math.abs(g.streamPointsM[b]! - f.streamPointsM[a]!)).toBeLessThanOrEqual(1e-12);
        expect(Math.abs(g.streamPointsM[b + 1]! + f.streamPointsM[a + 1]!)).toBeLessThanOrEqual(1e-12);
        expect(Math.abs(g.streamPointsM[b + 2]! - f.streamPointsM[a + 2]!)).toBeLessThanOrEqual(1e-12);
      }
    }
  });

  it('zero yaw: no loading, straight streamlines along -x, a display-only colour limit', () => {
    const z = viewField({ input: input(0) });
    for (let p = 0; p < z.panelCount; p++) expect(Math.abs(z.pressureJump[p]!)).toBe(0);
    expect(z.colourLimit).toBe(0.05);
    for (let j = 0; j + 1 < z.streamOffsets.length; j++) {
      const a = 3 * z.streamOffsets[j]!;
      const b = 3 * (z.streamOffsets[j + 1]! - 1);
      expect(z.streamPointsM[b + 1]).toBe(z.streamPointsM[a + 1]);
      expect(z.streamPointsM[b + 2]).toBe(z.streamPointsM[a + 2]);
      expect(z.streamPointsM[b]!).toBeLessThan(z.streamPointsM[a]!);
    }
    expect(Number.isNaN(z.cpXM)).toBe(true);
    expect(z.forceOriginM).toEqual([0, 0, 0]);
  });

  it('rejects an input without a point', () => {
    expect(() => viewField({ input: { ...input(5), points: [] } })).toThrow(/at least one operating point/);
  });

  it('crosses a worker boundary (comlink over a MessageChannel) with its typed arrays intact', async () => {
    const { port1, port2 } = new MessageChannel();
    expose(solverApi, nodeEndpoint(port1));
    const remote = wrap<SolverApi>(nodeEndpoint(port2));
    const got = (await remote.runTask({ kind: 'viewField', request: { input: input(10) } })) as ViewField;
    expect(got.pressureJump).toBeInstanceOf(Float64Array);
    expect(got.streamOffsets).toBeInstanceOf(Uint32Array);
    expect(Array.from(got.pressureJump)).toEqual(Array.from(f.pressureJump));
    expect(got.sideN).toBe(f.sideN);
    port1.close();
    port2.close();
  });
});
