import { describe, expect, it } from 'vitest';
import { DEMO_WHEEL } from '../../../src/model/wheel';
import {
  SPOKE_ANGLE_STEPS,
  spokeAnnulusLoads,
  spokeAnnulusLoadsFrozen,
} from '../../../src/model/wheel/spokeAnnulusLoads';
import { spokeRowOf } from '../../../src/model/wheel/spokeRowOf';

const point = { airspeedMps: 12, yawRad: 0.2, groundSpeedMps: 12, rhoKgPerM3: 1.225, muPaS: 1.7894e-5 };
const spokes = spokeRowOf(DEMO_WHEEL, point);
const r = 0.15;
const spin = (12 / DEMO_WHEEL.outerRadiusM) * r;

function sumsAt(spinMps: number, coefficients?: Float64Array): Float64Array {
  const out = new Float64Array(8);
  out[3] = Number.POSITIVE_INFINITY;
  spokeAnnulusLoads(spokes, r, spinMps, 1, out, coefficients);
  return out;
}

describe('spokeAnnulusLoads and spokeAnnulusLoadsFrozen', () => {
  it('at frozen coefficients reproduce the loads at the same spin (identity, 1e-13 relative)', () => {
    const coefficients = new Float64Array(SPOKE_ANGLE_STEPS);
    const full = sumsAt(spin, coefficients);
    const frozen = new Float64Array(3);
    spokeAnnulusLoadsFrozen(spokes, r, spin, coefficients, frozen);
    for (let i = 0; i < 3; i++) {
      const tol = 1e-13 * Math.abs(full[2]! / r);
      expect(
        Math.abs(frozen[i]! - full[i]!),
        `[${i}] got=${frozen[i]} expected=${full[i]} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('give the slopes with the spin at frozen coefficients (central difference, 1e-6 relative)', () => {
    // d(|u| u_t)/d(spin) = |u| + u_t^2 / |u| (calculus); checked by a central difference of the frozen loads.
    const coefficients = new Float64Array(SPOKE_ANGLE_STEPS);
    const full = sumsAt(spin, coefficients);
    const h = 1e-4 * spin;
    const plus = new Float64Array(3);
    const minus = new Float64Array(3);
    spokeAnnulusLoadsFrozen(spokes, r, spin + h, coefficients, plus);
    spokeAnnulusLoadsFrozen(spokes, r, spin - h, coefficients, minus);
    for (let i = 0; i < 3; i++) {
      const exp = (plus[i]! - minus[i]!) / (2 * h);
      const tol = 1e-6 * Math.abs(full[7]! / r);
      expect(
        Math.abs(full[5 + i]! - exp),
        `slope [${i}] got=${full[5 + i]} expected=${exp} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it("the frozen loads move with the spin as the full ones do, to the section laws' Reynolds slope", () => {
    // A 3 % slower spin: the full loads re-evaluate Cd (d ln Cd / d ln Re ~ -0.04, Hoerner's cylinder
    // curve near Re 1e3) and the shielding; at this yaw the wakes are off the plane, so only Cd moves:
    // the frozen torque within 0.2 % of the full one.
    const coefficients = new Float64Array(SPOKE_ANGLE_STEPS);
    sumsAt(spin, coefficients);
    const slower = 0.97 * spin;
    const full = sumsAt(slower);
    const frozen = new Float64Array(3);
    spokeAnnulusLoadsFrozen(spokes, r, slower, coefficients, frozen);
    const rel = Math.abs(frozen[2]! / full[2]! - 1);
    expect(rel, `got=${frozen[2]} expected=${full[2]} tol(rel)=2e-3`).toBeLessThanOrEqual(2e-3);
  });
});
