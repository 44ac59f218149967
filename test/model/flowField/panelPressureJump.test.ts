import { describe, expect, it } from 'vitest';
import { panelPressureJump } from '../../../src/model/flowField/panelPressureJump';
import { buildDiscLattice } from '../../../src/model/lattice/buildDiscLattice';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

describe('panelPressureJump', () => {
  it('integrates to the potential normal force Kp sin(b) cos(b) (Polhamus 1966 scaling), tol 1e-12 relative', () => {
    const lat = buildDiscLattice({ radiusM: 0.33, spanCount: 16, chordCount: 8, ground: true });
    const sol = solveLattice(lat, new Float64Array(lat.panelCount));
    const out = new Float64Array(lat.panelCount);
    for (const deg of [-25, -5, 3, 10, 30]) {
      const b = (deg * Math.PI) / 180;
      panelPressureJump(lat, sol.panelNormalCoefficient, b, out);
      let sum = 0;
      for (let i = 0; i < lat.panelCount; i++) sum += out[i]! * lat.areaM2[i]!;
      const got = sum / lat.referenceAreaM2;
      const exp = sol.normalSlope * Math.sin(b) * Math.cos(b);
      const tol = 1e-12 * Math.abs(exp);
      expect(Math.abs(got - exp), `yaw=${deg} deg got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(
        tol,
      );
    }
  });

  it('one chordwise panel at aspect ratio 100 gives the 2-D flat plate C_l = 2 pi alpha at mid-span, tol 3%', () => {
    // Lumped-vortex element: bound vortex at 1/4 chord, control point at 3/4 chord reproduces thin-aerofoil
    // theory's C_l = 2 pi alpha exactly in 2-D (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 5.3
    // and 12.3; from memory). At finite aspect ratio 100 the mid-span loss is about 2 / AR (lifting line).
    const span = 100;
    const lat = rectangularLattice(span, 1, 100, 1, -span / 2, Number.NaN);
    const sol = solveLattice(lat, new Float64Array(lat.panelCount));
    const b = (4 * Math.PI) / 180;
    const out = panelPressureJump(lat, sol.panelNormalCoefficient, b, new Float64Array(lat.panelCount));
    const got = out[50]!; // chord 1 m: the section's C_l equals the panel's Delta Cp
    const exp = 2 * Math.PI * Math.sin(b) * Math.cos(b);
    const tol = 0.03 * exp;
    expect(Math.abs(got - exp), `got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('is odd in yaw (exactly) and zero at zero yaw', () => {
    const lat = rectangularLattice(1, 0.5, 4, 3, 0, Number.NaN);
    const sol = solveLattice(lat, new Float64Array(lat.panelCount));
    const a = panelPressureJump(lat, sol.panelNormalCoefficient, 0.2, new Float64Array(lat.panelCount));
    const b = panelPressureJump(lat, sol.panelNormalCoefficient, -0.2, new Float64Array(lat.panelCount));
    const z = panelPressureJump(lat, sol.panelNormalCoefficient, 0, new Float64Array(lat.panelCount));
    for (let i = 0; i < lat.panelCount; i++) {
      expect(b[i], `panel ${i}`).toBe(-a[i]!);
      expect(Math.abs(z[i]!)).toBe(0);
      expect(a[i]!, `panel ${i} loads toward +y at positive yaw`).toBeGreaterThan(0);
    }
  });

  it('names the bad argument', () => {
    const lat = rectangularLattice(1, 0.5, 2, 2, 0, Number.NaN);
    const cn = new Float64Array(lat.panelCount);
    expect(() => panelPressureJump(lat, cn, 2, new Float64Array(4))).toThrow(/yawRad=2/);
    expect(() => panelPressureJump(lat, new Float64Array(3), 0.1, new Float64Array(4))).toThrow(
      /panelNormalCoefficient.length=3/,
    );
  });
});
