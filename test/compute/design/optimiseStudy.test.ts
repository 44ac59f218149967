import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { constraintBetter } from '../../../src/compute/design/constraintOrder';
import { designContext } from '../../../src/compute/design/designContext';
import { convergenceLattices } from '../../../src/compute/design/designUncertainty';
import { applyDesign } from '../../../src/compute/design/designVariables';
import { evaluateDesign } from '../../../src/compute/design/evaluateDesign';
import { optimiseStudy } from '../../../src/compute/design/optimiseStudy';
import { parseStudyFile } from '../../../src/compute/design/studyFile';

const text = readFileSync(new URL('../../../public/examples/study.json', import.meta.url), 'utf8');

describe('optimiseStudy on the example study (cover fraction x rim depth, time at 300 W, steering moment limit)', () => {
  it('the optimum is no worse than the best point of a 21 x 11 brute-force grid under the same limit', () => {
    const parsed = parseStudyFile(text);
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    const study = parsed.value;
    const outcome = optimiseStudy(study);
    const opt = outcome.points[outcome.optimum]!;
    const limit = study.limits.steering_gust_Nm!;

    // The grid, on the same lattice and context as the optimiser's evaluations.
    const context = designContext(study.ride, study.search.lattice);
    const [cf, rd] = study.continuous;
    let best = { objective: Number.NaN, violation: Number.POSITIVE_INFINITY };
    let bestAt = '';
    for (let i = 0; i <= 20; i++) {
      for (let j = 0; j <= 10; j++) {
        const values = {
          [cf!.id]: cf!.min + (i / 20) * (cf!.max - cf!.min),
          [rd!.id]: rd!.min + (j / 10) * (rd!.max - rd!.min),
        };
        const o = evaluateDesign(context, applyDesign(study.ride.design, values), values).objectives;
        const s = { objective: o.time_s!, violation: Math.max(0, o.steering_gust_Nm! / limit - 1) };
        if (constraintBetter(s, best)) {
          best = s;
          bestAt = JSON.stringify(values);
        }
      }
    }
    expect(best.violation, 'the grid has feasible designs').toBe(0);
    expect(outcome.feasible).toBe(true);
    expect(opt.objectives.steering_gust_Nm!).toBeLessThanOrEqual(limit);
    expect(
      opt.objectives.time_s!,
      `optimum ${JSON.stringify(opt.values)} time ${opt.objectives.time_s} s after ${outcome.evaluations} evaluations; grid best ${bestAt} time ${best.objective} s`,
    ).toBeLessThanOrEqual(best.objective);
    expect(outcome.evaluations).toBeLessThanOrEqual(study.search.maxEvaluations);

    // The front: mutually non-dominated, by increasing steering moment, and holding the optimum.
    const f = outcome.front.map((k) => outcome.points[k]!.objectives);
    for (let k = 1; k < f.length; k++) {
      expect(f[k]!.steering_gust_Nm!).toBeGreaterThan(f[k - 1]!.steering_gust_Nm!);
      expect(f[k]!.time_s!).toBeLessThan(f[k - 1]!.time_s!);
    }
    expect(outcome.front).toContain(outcome.optimum);
    // The uncertainty of the optimum's objective, on the evaluations' lattice and two coarser ones.
    const u = outcome.uncertainty.find((x) => x.id === 'time_s')!;
    expect(u.values[0]).toBe(opt.objectives.time_s);
    expect(u.absolute >= 0 && Number.isFinite(u.absolute), `uncertainty ${JSON.stringify(u)}`).toBe(true);
  }, 300_000);

  it('the convergence lattices coarsen by 1.5 and 2.25, as the solve does (24 x 12 -> 16 x 8 -> 11 x 5)', () => {
    expect(convergenceLattices({ span: 24, chord: 12 })).toEqual([
      { span: 24, chord: 12 },
      { span: 16, chord: 8 },
      { span: 11, chord: 5 },
    ]);
    expect(convergenceLattices({ span: 4, chord: 2 })[2]).toEqual({ span: 4, chord: 2 });
  });
});

describe('optimiseStudy with discrete variables', () => {
  function study(change: (s: Record<string, unknown>) => void) {
    const s = JSON.parse(text);
    s.search = {
      grid_points: 3,
      starts: 1,
      max_evaluations: 30,
      tolerance: 0.02,
      lattice_span: 6,
      lattice_chord: 3,
    };
    s.front = { limit_steps: 0 };
    s.limits = {};
    change(s);
    const p = parseStudyFile(JSON.stringify(s));
    if (!p.ok) throw new Error(p.errors.join('\n'));
    return p.value;
  }

  it('only discrete choices: each is evaluated once and the optimum is the better one', () => {
    const o = optimiseStudy(
      study((s) => {
        s.variables = { spoke_section: ['round', 'bladed'] };
      }),
    );
    expect(o.points.map((p) => p.values.spoke_section)).toEqual(['round', 'bladed']);
    const times = o.points.map((p) => p.objectives.time_s!);
    expect(o.points[o.optimum]!.objectives.time_s).toBe(Math.min(...times));
    expect(o.runs).toBe(0);
  });

  it('a discrete choice with a continuous variable: a grid and a run per choice; the optimum is the best evaluated', () => {
    const o = optimiseStudy(
      study((s) => {
        s.variables = { cover_fraction: { min: 0, max: 1 }, cover_sides: [1, 2] };
      }),
    );
    for (const sides of [1, 2]) {
      expect(o.points.filter((p) => p.values.cover_sides === sides).length).toBeGreaterThan(3);
    }
    const best = Math.min(...o.points.map((p) => p.objectives.time_s!));
    expect(o.points[o.optimum]!.objectives.time_s).toBe(best);
    expect(o.evaluations).toBeLessThanOrEqual(30);
  });
});
