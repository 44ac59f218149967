import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { spokeRowDrag } from '../../../src/model/sections';
import { DEMO_WHEEL } from '../../../src/model/wheel';
import {
  SPOKE_ANGLE_STEPS,
  type SpokeRow,
  spokeAnnulusLoads,
  spokeAnnulusLoadsFrozen,
} from '../../../src/model/wheel/spokeAnnulusLoads';
import { spokeRowOf } from '../../../src/model/wheel/spokeRowOf';

/** The loop as first written (spokeRowDrag checked and evaluated at each of the positions, no
 * position's answer reused), for an element of 0.7 m. */
function plain(row: SpokeRow, radiusM: number, spinMps: number, sums: Float64Array, co: Float64Array): void {
  const law = new Float64Array(3);
  for (let k = 0; k < SPOKE_ANGLE_STEPS; k++) {
    const theta = ((k + 0.5) * 2 * Math.PI) / SPOKE_ANGLE_STEPS;
    const sinT = Math.sin(theta);
    const cosT = Math.cos(theta);
    const ut = row.vInPlaneMps * sinT + spinMps;
    const speed = Math.sqrt(ut * ut + row.vNormalMps * row.vNormalMps);
    co[k] = 0;
    if (speed === 0) continue;
    const s = row.spacingPerRadius * radiusM;
    spokeRowDrag(row.round, row.thicknessRatio, row.refLengthM, s, ut, row.vNormalMps, row.nuM2PerS, law);
    if (law[1]! > 0 && law[2]! < sums[3]!) sums[3] = law[2]!;
    if (law[2]! > sums[4]!) sums[4] = law[2]!;
    const perSpeed = 0.5 * row.rhoKgPerM3 * law[0]! * law[1]! * row.refLengthM * 0.7;
    co[k] = perSpeed;
    const ft = perSpeed * speed * ut;
    sums[0] -= sinT * ft;
    sums[1] += cosT * ft;
    sums[2] += radiusM * ft;
    const slope = perSpeed * (speed + (ut * ut) / speed);
    sums[5] -= sinT * slope;
    sums[6] += cosT * slope;
    sums[7] += radiusM * slope;
  }
}

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

  it('give the bits of the plain loop over spokeRowDrag at every revolution position', () => {
    // The loop as first written (spokeRowDrag checked and evaluated at each of the positions, no
    // position's answer reused): the same sums and coefficients, exact equality; round and bladed, at
    // yaw, without yaw (no through-flow) and with a reversed in-plane flow.
    for (const wheel of [DEMO_WHEEL, { ...DEMO_WHEEL, spokeSection: 'bladed' as const }]) {
      for (const [yawRad, v] of [
        [0, 12],
        [0.2, 8],
        [0.5, 13],
        [3, 10],
      ] as const) {
        const row = spokeRowOf(wheel, { ...point, yawRad, airspeedMps: v });
        for (const spinMps of [0.4 * v, spin, 2 * v]) {
          expectPlainBits(row, r, spinMps, `${wheel.spokeSection} yaw=${yawRad} V=${v} spin=${spinMps}`);
        }
      }
    }
  });

  it('give the bits of the plain loop on varied rows, radii, spins and yaws (mirror positions, no crossflow)', () => {
    // The positions share law evaluations (mirror positions whose crossflow comes out the same number)
    // and evaluate the law at all positions at once: exact equality with the plain loop, over round and
    // bladed rows, any yaw (reversed in-plane flow included), spins from a standstill up, and calls
    // where one position meets no crossflow at all (no yaw, the spin cancelling the freestream's
    // crossflow there). Calls follow one another: nothing a call leaves behind may change the next.
    fc.assert(
      fc.property(
        fc.boolean(),
        fc.double({ min: 0.3, max: 1, noNaN: true }),
        fc.double({ min: 0.5, max: 30, noNaN: true }),
        fc.oneof(fc.constant(0), fc.double({ min: -Math.PI, max: Math.PI, noNaN: true })),
        fc.double({ min: 0.02, max: 0.32, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.option(fc.integer({ min: 0, max: SPOKE_ANGLE_STEPS - 1 })),
        (round, thickness, v, yawRad, radiusM, spinRatio, stalledAt) => {
          const wheel = round
            ? DEMO_WHEEL
            : { ...DEMO_WHEEL, spokeSection: 'bladed' as const, spokeThicknessM: thickness * 0.0022 };
          const yaw = stalledAt === null ? yawRad : 0;
          const row = spokeRowOf(wheel, { ...point, yawRad: yaw, airspeedMps: v });
          const spinMps =
            stalledAt === null
              ? spinRatio * v
              : -(row.vInPlaneMps * Math.sin(((stalledAt + 0.5) * 2 * Math.PI) / SPOKE_ANGLE_STEPS));
          expectPlainBits(
            row,
            radiusM,
            spinMps,
            `round=${round} V=${v} yaw=${yaw} r=${radiusM} spin=${spinMps}`,
          );
        },
      ),
      { numRuns: 400 },
    );
  });
});

/** spokeAnnulusLoads against the plain loop (`plain`), sums and coefficients equal to the bit. */
function expectPlainBits(
  row: ReturnType<typeof spokeRowOf>,
  radiusM: number,
  spinMps: number,
  label: string,
): void {
  const got = new Float64Array(8);
  const expected = new Float64Array(8);
  got[3] = expected[3] = Number.POSITIVE_INFINITY;
  const gotCo = new Float64Array(SPOKE_ANGLE_STEPS);
  const expectedCo = new Float64Array(SPOKE_ANGLE_STEPS);
  spokeAnnulusLoads(row, radiusM, spinMps, 0.7, got, gotCo);
  plain(row, radiusM, spinMps, expected, expectedCo);
  for (let i = 0; i < 8; i++) {
    expect(
      Object.is(got[i], expected[i]),
      `${label} [${i}] got=${got[i]} expected=${expected[i]} tol=0`,
    ).toBe(true);
  }
  for (let k = 0; k < SPOKE_ANGLE_STEPS; k++) {
    expect(
      Object.is(gotCo[k], expectedCo[k]),
      `${label} coefficient ${k} got=${gotCo[k]} expected=${expectedCo[k]} tol=0`,
    ).toBe(true);
  }
}
