/**
 * The grid method of a design study: every design of a 6 x 4 grid (cover fraction x rim depth) is
 * evaluated and nothing else, and the optimum is the best of them, held here against an independent
 * brute force over the same grid (evaluateDesign on each cell, the feasibility order written out).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { designContext } from '../../../src/compute/design/designContext';
import { applyDesign } from '../../../src/compute/design/designVariables';
import { evaluateDesign } from '../../../src/compute/design/evaluateDesign';
import { optimiseStudy } from '../../../src/compute/design/optimiseStudy';
import { validateStudy } from '../../../src/compute/design/studyFile';

const example = JSON.parse(
  readFileSync(new URL('../../../public/examples/study.json', import.meta.url), 'utf8'),
) as Record<string, unknown>;

function gridStudy(search: Record<string, unknown>) {
  return validateStudy({ ...example, search: { ...(example.search as object), ...search } });
}

describe('design study, method "grid"', () => {
  it('evaluates exactly the 6 x 4 grid and its optimum is the brute-force best cell', () => {
    const parsed = gridStudy({ method: 'grid', grid_points: { cover_fraction: 6, rim_depth_m: 4 } });
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    const study = parsed.value;
    const outcome = optimiseStudy(study);
    expect(outcome.points.length).toBe(24);
    expect(outcome.runs).toBe(0);

    const context = designContext(study.ride, study.search.lattice);
    const limit = study.limits.steering_gust_Nm!;
    // Brute force: feasible cells first, then the smallest time (Deb 2000, written out independently).
    let best: { values: Record<string, number>; time: number; excess: number } | null = null;
    const seen = new Set<string>();
    for (let i = 0; i < 6; i++) {
      for (let j = 0; j < 4; j++) {
        const values = { cover_fraction: i / 5, rim_depth_m: 0.03 + (j / 3) * 0.06 };
        const o = evaluateDesign(context, applyDesign(study.ride.design, values), values).objectives;
        const excess = Math.max(0, o.steering_gust_Nm! / limit - 1);
        const better =
          best === null ||
          (excess === 0 && best.excess > 0) ||
          (excess === 0 && best.excess === 0 && o.time_s! < best.time) ||
          (excess > 0 && best.excess > 0 && excess < best.excess);
        if (better) best = { values, time: o.time_s!, excess };
        const hit = outcome.points.find(
          (p) =>
            Math.abs((p.values.cover_fraction as number) - values.cover_fraction) < 1e-12 &&
            Math.abs((p.values.rim_depth_m as number) - values.rim_depth_m) < 1e-12,
        );
        expect(hit, `grid cell ${JSON.stringify(values)} evaluated`).toBeDefined();
        seen.add(JSON.stringify(hit!.values));
      }
    }
    expect(seen.size).toBe(24);
    const opt = outcome.points[outcome.optimum]!;
    expect(
      [opt.values.cover_fraction, opt.values.rim_depth_m, opt.objectives.time_s],
      `optimum ${JSON.stringify(opt.values)}; brute force ${JSON.stringify(best)}`,
    ).toEqual([
      expect.closeTo(best!.values.cover_fraction, 12),
      expect.closeTo(best!.values.rim_depth_m, 12),
      best!.time,
    ]);
  });

  it('names the field and the rule for a bad method or a per-variable count of a variable not freed', () => {
    const bad = gridStudy({ method: 'simplex', grid_points: { tyre_width_m: 3 } });
    expect(bad.ok).toBe(false);
    const errors = bad.ok ? [] : bad.errors.join('\n');
    expect(errors).toContain('search.method: must be "nelder-mead" or "grid"');
    expect(errors).toContain('search.grid_points.tyre_width_m: not a freed continuous variable');
  });
});
