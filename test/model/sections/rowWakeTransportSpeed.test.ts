import { describe, expect, it } from 'vitest';
import { planeWakeDeficit } from '../../../src/model/sections/planeWakeDeficit';
import { rowWakeTransportSpeed } from '../../../src/model/sections/rowWakeTransportSpeed';

describe('rowWakeTransportSpeed', () => {
  it("is 0.266 (Cd L / s)^(1/2) u from Schlichting's plane-wake constants", () => {
    // Schlichting, Boundary-Layer Theory, the plane wake (from memory): half-value width 0.25 (x Cd d)^(1/2),
    // Gaussian profile; (1/2) 0.25 sqrt(pi / ln 2) = 0.26612. 1e-4 relative.
    const got = rowWakeTransportSpeed(0.0022, 0.04, 7) / (Math.sqrt(0.0022 / 0.04) * 7);
    expect(Math.abs(got / 0.26612 - 1), `got=${got} expected=0.26612 tol(rel)=1e-4`).toBeLessThanOrEqual(
      1e-4,
    );
  });

  it("equals the momentum growth of the row's merged wake built from planeWakeDeficit (independent)", () => {
    // The merged wake of a row (drag length Cd L per spacing s) at distance x holds the accumulated drag
    // length Cd L x / s. Its deficit integral M(x) = integral of u1/U dy grows at dM/dx; written as the
    // through-flow of two faces leaving with the centre-line deficit delta: U_w = u (dM/dx) / (2 delta).
    // Midpoint rule across the wake and a central difference in x: 1e-3 relative.
    const cdl = 0.0022;
    const s = 0.04;
    const u = 7;
    const deficitIntegral = (x: number) => {
      const drag = (cdl * x) / s;
      const dy = 1e-5;
      let sum = 0;
      for (let y = -0.5 + dy / 2; y < 0.5; y += dy) sum += planeWakeDeficit(x, y, drag) * dy;
      return sum;
    };
    const x = 1;
    const h = 0.01;
    const slope = (deficitIntegral(x + h) - deficitIntegral(x - h)) / (2 * h);
    const delta = planeWakeDeficit(x, 0, (cdl * x) / s);
    const exp = (u * slope) / (2 * delta);
    const got = rowWakeTransportSpeed(cdl, s, u);
    expect(Math.abs(got / exp - 1), `got=${got} expected=${exp} tol(rel)=1e-3`).toBeLessThanOrEqual(1e-3);
  });

  it('names the field and the rule of bad input', () => {
    expect(() => rowWakeTransportSpeed(-1, 0.04, 7)).toThrow(/dragLengthM=-1: must be finite and >= 0/);
    expect(() => rowWakeTransportSpeed(0.002, 0, 7)).toThrow(/spacingM=0: must be finite and > 0/);
    expect(() => rowWakeTransportSpeed(0.002, 0.04, Number.NaN)).toThrow(/speedMps=NaN/);
  });
});
