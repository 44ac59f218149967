import { describe, expect, it } from 'vitest';
import {
  calibrate,
  calibratedCase,
  convertTable,
  type MapFile,
  parseCsvText,
} from '../../../src/compute/compare/index';
import { gaussian, gridPoints, testCase, truthAt } from './helpers';

describe('calibrate', () => {
  it('recovers known parameters from noisy synthetic data within its 95% intervals', () => {
    // Common practice, no source: data made by the model with known parameters plus Gaussian noise
    // (sd 0.01 N drag, 0.03 N side) must give the parameters back inside their confidence intervals.
    // A 95% interval misses the truth in 1 draw of 20, so five seeded draws are made and each parameter's
    // interval must cover it in at least 4 of 5 (binomial probability of fewer at 95% coverage: 2.3%).
    const caseFile = testCase({ grid_convergence: false });
    const points = gridPoints([8.33, 11.1, 13.9]);
    // porosity_scale multiplies the derived screen resistance, which includes the wake shielding of the
    // spoke ahead (about half the bare crossflow value): 2 gives a screen as closed as 1.4 did without it.
    const known = { porosity_scale: 2, suction_recovered: 0.3, profile_drag_factor: 1.2 };
    const truth = truthAt(caseFile, points, known);
    const covered = { porosity_scale: 0, suction_recovered: 0, profile_drag_factor: 0 };
    const seeds = [1, 2, 3, 4, 5];
    for (const seed of seeds) {
      const noise = gaussian(seed);
      let csv = 'yaw,speed,drag,side\n';
      points.forEach((p, i) => {
        csv += `${(p.yawRad * 180) / Math.PI},${p.airspeedMps},${truth[i]!.axialN + noise(0.01)},${truth[i]!.sideN + noise(0.03)}\n`;
      });
      const table = parseCsvText(csv);
      if (!table.ok) throw new Error(table.errors.join());
      const map: MapFile = {
        format: 'coversweep-map',
        version: 1,
        columns: {
          yaw: { quantity: 'yaw_deg', unit: 'deg' },
          speed: { quantity: 'speed', unit: 'mps' },
          drag: { quantity: 'axial_force', unit: 'N' },
          side: { quantity: 'side_force', unit: 'N' },
        },
        side_force_sign: 1,
        air_density_kgpm3: 1.2,
      };
      const conv = convertTable(table.value, map, 1.2);
      if (!conv.ok) throw new Error(conv.errors.join());
      const fit = calibrate(caseFile, conv.value, 'synthetic.csv');
      expect(fit.converged, `seed ${seed}: ${fit.reason}`).toBe(true);
      for (const p of fit.parameters) {
        const exp = known[p.name];
        expect(p.interval, `seed ${seed} ${p.name}: no interval`).not.toBeNull();
        const [lo, hi] = p.interval!;
        if (exp >= lo && exp <= hi) covered[p.name] += 1;
        // And the interval is informative: narrower than +-25% of the value.
        expect(hi - lo, `seed ${seed} ${p.name}: interval width ${hi - lo}`).toBeLessThan(0.5 * exp);
      }
      // Residual sd close to the noise put in (pooled sd of 0.01 and 0.03 N: 0.0224 N), within 40%.
      expect(
        Math.abs(fit.residual_sd / 0.0224 - 1),
        `seed ${seed}: residual sd=${fit.residual_sd}`,
      ).toBeLessThan(0.4);
      const after = fit.residuals_after.find((r) => r.output === 'axial_N')!;
      const before = fit.residuals_before.find((r) => r.output === 'axial_N')!;
      expect(after.rms).toBeLessThan(before.rms);
      expect(fit.degrees_of_freedom).toBe(2 * points.length - 3);
      if (seed === 1) {
        const cal = calibratedCase(caseFile, fit);
        expect(cal.name).toMatch(/CALIBRATED: calibrated to synthetic\.csv/);
        expect(cal.model.suction_recovered).toBe(fit.parameters[1]!.value);
      }
    }
    for (const [name, count] of Object.entries(covered)) {
      expect(
        count,
        `${name}: truth inside the 95% interval in ${count} of ${seeds.length} draws`,
      ).toBeGreaterThanOrEqual(4);
    }
  });

  it('rejects unknown parameters and too few points', () => {
    const caseFile = testCase({ grid_convergence: false });
    const conv = {
      points: [{ line: 2, yawRad: 0.1, airspeedMps: 10, rhoKgPerM3: 1.2, values: { axial_N: 1 } }],
      outputs: ['axial_N' as const],
      sources: {},
      airspeedSource: '',
      speedUnit: 'mps' as const,
      densitySource: '',
    };
    expect(() => calibrate(caseFile, conv, 'x', { parameters: ['spin' as never] })).toThrow(
      /"spin" is not one of/,
    );
    expect(() => calibrate(caseFile, conv, 'x')).toThrow(/1 measured values cannot determine 3 parameters/);
  });
});
