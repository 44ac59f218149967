/**
 * Optimise a design study: minimise the chosen ride objective over the freed design variables subject
 * to the study's limits. Discrete variables are enumerated; over the continuous ones (scaled to the unit
 * box) a coarse grid is evaluated, and Nelder-Mead (nelderMead.ts, bounds by projection) runs from its
 * best points under Deb's feasibility order (constraintOrder.ts). Every evaluation is kept: the optimum
 * is the best of them, and the trade-off front (objective against a handling figure) is their
 * non-dominated set, widened by re-optimising with the handling limit swept across the front. The
 * optimum's figures get a lattice uncertainty from three lattices (designUncertainty.ts). Deterministic.
 */
import { constraintBetter, limitViolation, type Scored } from './constraintOrder';
import { designContext } from './designContext';
import { designUncertainty } from './designUncertainty';
import { applyDesign, DESIGN_VARIABLES } from './designVariables';
import { evaluateDesign } from './evaluateDesign';
import { nelderMead } from './nelderMead';
import { paretoFront } from './paretoFront';
import type { DesignStudy, StudyOutcome, StudyPoint } from './studyTypes';
import type { DesignValues, DesignWheel } from './types';

/** Progress: evaluations done of the search's budget (an upper bound; the search may stop early). */
export type StudyProgress = (done: number, budget: number) => void;

/** Share of the evaluations left after the start grids that the front's limit sweep may use. */
const SWEEP_SHARE = 0.3;
/** Initial simplex edge of the main runs and of the limit sweep's runs (box units). */
const START_STEP = 0.2;
const SWEEP_STEP = 0.1;

type Combo = (number | string)[];

function cartesian(lists: (number | string)[][]): Combo[] {
  return lists.reduce<Combo[]>((acc, list) => acc.flatMap((c) => list.map((v) => [...c, v])), [[]]);
}

/** Every registered variable's value for a wheel (the fixed ones as the wheel has them). */
export function wheelValues(wheel: DesignWheel): DesignValues {
  const out: DesignValues = {};
  for (const v of DESIGN_VARIABLES) out[v.id] = v.get(wheel);
  return out;
}

function score(point: StudyPoint, objective: string, limits: Record<string, number>): Scored {
  let violation = 0;
  for (const [id, limit] of Object.entries(limits)) {
    violation += limitViolation(point.objectives[id] ?? Number.NaN, limit);
  }
  return { objective: point.objectives[objective] ?? Number.NaN, violation };
}

export function optimiseStudy(study: DesignStudy, onProgress?: StudyProgress): StudyOutcome {
  const { ride, continuous, discrete, objective, limits, search, front } = study;
  const context = designContext(ride, search.lattice);
  const baseline = evaluateDesign(context, context.ride.baseline, wheelValues(context.ride.baseline));
  const d = continuous.length;
  const combos = cartesian(discrete.map((v) => v.choices));
  const points: StudyPoint[] = [];
  const where = new Map<number, { combo: Combo; u: Float64Array }>();
  const cache = new Map<string, StudyPoint>();
  const gridSize =
    combos.length * continuous.reduce((a, v) => a * (search.gridCounts[v.id] ?? search.gridPoints), 1);
  // Progress counts against the budget (a grid study evaluates its grid and nothing else).
  const budget = search.method === 'grid' ? gridSize : search.maxEvaluations;
  let runs = 0;
  let convergedRuns = 0;

  const valuesAt = (combo: Combo, u: Float64Array): DesignValues => {
    const values: DesignValues = {};
    discrete.forEach((v, i) => {
      values[v.id] = combo[i]!;
    });
    continuous.forEach((v, i) => {
      values[v.id] = v.min + u[i]! * (v.max - v.min);
    });
    return values;
  };
  const evaluateAt = (combo: Combo, u: Float64Array): StudyPoint => {
    const key = `${combo.join('|')}|${Array.from(u, (x) => x.toFixed(12)).join('|')}`;
    const hit = cache.get(key);
    if (hit !== undefined) return hit;
    const values = valuesAt(combo, u);
    const wheel = applyDesign(context.ride.design, values);
    const e = evaluateDesign(context, wheel, { ...wheelValues(wheel), ...values });
    const point: StudyPoint = { ...e, index: points.length, violation: 0 };
    point.violation = score(point, objective, limits).violation;
    points.push(point);
    where.set(point.index, { combo, u: Float64Array.from(u) });
    cache.set(key, point);
    onProgress?.(points.length, budget);
    return point;
  };
  const orderBy = (lim: Record<string, number>) => (a: StudyPoint, b: StudyPoint) =>
    constraintBetter(score(a, objective, lim), score(b, objective, lim));
  const bestOf = (list: StudyPoint[], lim: Record<string, number>) => {
    const better = orderBy(lim);
    return list.reduce((best, p) => (better(p, best) ? p : best));
  };
  const run = (
    combo: Combo,
    start: Float64Array,
    lim: Record<string, number>,
    step: number,
    evals: number,
  ) => {
    if (d === 0 || evals < d + 3) return;
    const better = orderBy(lim);
    const r = nelderMead(start, (u) => evaluateAt(combo, u), better, {
      step,
      xTolerance: search.xTolerance,
      maxEvaluations: evals,
    });
    runs++;
    if (r.converged) convergedRuns++;
  };

  // 1. The coarse grid of every discrete combination.
  const gridUs = cartesian(
    continuous.map((v) => {
      const g = search.gridCounts[v.id] ?? search.gridPoints;
      return Array.from({ length: g }, (_, k) => (g === 1 ? 0.5 : k / (g - 1)));
    }),
  );
  const gridOf = new Map<Combo, StudyPoint[]>();
  for (const combo of combos) {
    gridOf.set(
      combo,
      gridUs.map((u) => evaluateAt(combo, Float64Array.from(u as number[]))),
    );
  }
  // 2. Nelder-Mead from the best grid points of each combination (none in a grid study).
  const searching = search.method === 'nelder-mead';
  const left = Math.max(0, budget - points.length);
  const sweepBudget = searching && front.limitSteps > 0 ? Math.floor(left * SWEEP_SHARE) : 0;
  const perRun = Math.floor((left - sweepBudget) / Math.max(1, combos.length * search.starts));
  const better = orderBy(limits);
  for (const combo of searching ? combos : []) {
    const ranked = [...gridOf.get(combo)!].sort((a, b) =>
      better(a, b) ? -1 : better(b, a) ? 1 : a.index - b.index,
    );
    for (const p of ranked.slice(0, search.starts))
      run(combo, where.get(p.index)!.u, limits, START_STEP, perRun);
  }
  // 3. The front, widened by sweeping the handling limit across it.
  const h = front.handling;
  const otherLimits = Object.fromEntries(Object.entries(limits).filter(([id]) => id !== h));
  const frontOf = () => {
    const eligible = points.filter((p) => score(p, objective, otherLimits).violation === 0);
    const idx = paretoFront(
      eligible.map((p) => p.objectives[h] ?? Number.NaN),
      eligible.map((p) => p.objectives[objective] ?? Number.NaN),
    );
    return idx.map((i) => eligible[i]!.index);
  };
  const limitSweep: { limit: number; best: number }[] = [];
  const first = frontOf();
  if (searching && first.length >= 2 && front.limitSteps > 0) {
    const lo = points[first[0]!]!.objectives[h]!;
    const hi = points[first[first.length - 1]!]!.objectives[h]!;
    const perStep = Math.floor(sweepBudget / front.limitSteps);
    for (let k = 1; k <= front.limitSteps; k++) {
      const limit = lo + ((hi - lo) * k) / (front.limitSteps + 1);
      // The front shows the trade-off beyond the study's own limit on h too: the sweep replaces it.
      const lim = { ...limits, [h]: limit };
      const start = bestOf(points, lim);
      const at = where.get(start.index)!;
      run(at.combo, at.u, lim, SWEEP_STEP, perStep);
      const best = bestOf(points, lim);
      limitSweep.push({ limit, best: score(best, objective, lim).violation === 0 ? best.index : -1 });
    }
  }
  const optimum = bestOf(points, limits);
  const figures = [...new Set([objective, ...Object.keys(limits), h])];
  const u = designUncertainty(ride, search.lattice, optimum.wheel, optimum.objectives, figures);
  return {
    study,
    baseline,
    points,
    optimum: optimum.index,
    feasible: optimum.violation === 0,
    front: frontOf(),
    limitSweep,
    uncertainty: u.figures,
    evaluations: points.length,
    uncertaintyEvaluations: u.evaluations,
    runs,
    convergedRuns,
  };
}
