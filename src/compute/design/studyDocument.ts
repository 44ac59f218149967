/**
 * The study result (JSON, format "coversweep-study-result") and its table (CSV): the optimum with its
 * lattice uncertainty and savings against the baseline, the trade-off front, every evaluated design,
 * the limits with where they came from, and the ride's cautions, which travel with every output.
 */
import { finiteOrNull } from '../caseFile';
import { csvLine } from '../resultTable';
import { RIDE_CAUTIONS } from '../ride/index';
import { designVariable } from './designVariables';
import { OBJECTIVES, rideObjective } from './objectives/index';
import type { StudyOutcome, StudyPoint } from './studyTypes';
import type { DesignValues } from './types';

export const STUDY_RESULT_FORMAT = 'coversweep-study-result';
export const STUDY_RESULT_VERSION = 1;

export const STUDY_NOTES: readonly string[] = [
  'every objective is minimised; savings are baseline - design (positive: the design is better)',
  "handling limits have no defaults: no published or trade figure for a largest steering moment, lean or side force was found to support one; the limits here are the study file's own",
  "the optimum is the best evaluated design by Deb's (2000) feasibility order: a design meeting every limit beats one that does not; among those meeting them, the smaller objective wins",
  'search: the coarse grid of every discrete combination, then (method "nelder-mead") Nelder-Mead (Lagarias et al. 1998) from its best points with bounds by projection, or (method "grid") nothing more: the grid is the whole study; deterministic',
  "uncertainty: each figure of the optimum on the evaluations' lattice and two coarser ones (counts / 1.5 and / 2.25), grid convergence index of Celik et al. (2008), or 3 x the largest change where the three do not converge monotonically (Roache 1994)",
  "the front: the designs meeting every other limit that no other design beats in both the objective and the handling figure, widened by re-optimising with the handling figure's limit swept across it",
];

const round = (x: number | string) => (typeof x === 'number' ? finiteOrNull(x) : x);

function figures(objectives: Record<string, number>): Record<string, number | null> {
  const out: Record<string, number | null> = {};
  for (const o of OBJECTIVES) if (o.id in objectives) out[o.id] = finiteOrNull(objectives[o.id]);
  return out;
}

function designOf(o: StudyOutcome, values: DesignValues): Record<string, number | string | null> {
  const out: Record<string, number | string | null> = {};
  for (const v of [...o.study.continuous, ...o.study.discrete]) out[v.id] = round(values[v.id]!);
  return out;
}

function pointDoc(o: StudyOutcome, p: StudyPoint) {
  const saved: Record<string, number | null> = {};
  for (const [id, value] of Object.entries(p.objectives)) {
    saved[id] = finiteOrNull((o.baseline.objectives[id] ?? Number.NaN) - value);
  }
  return {
    index: p.index,
    design: designOf(o, p.values),
    objectives: figures(p.objectives),
    saved_vs_baseline: saved,
    violation: finiteOrNull(p.violation),
    meets_limits: p.violation === 0,
  };
}

const described = (id: string) => {
  const o = rideObjective(id)!;
  return { id, label: o.label, unit: o.unit, description: o.description };
};

export function studyDocument(o: StudyOutcome) {
  const s = o.study;
  const opt = o.points[o.optimum]!;
  const lattice = s.search.lattice ?? { span: s.ride.model.lattice_span, chord: s.ride.model.lattice_chord };
  return {
    format: STUDY_RESULT_FORMAT,
    version: STUDY_RESULT_VERSION,
    ...(s.name !== undefined ? { name: s.name } : {}),
    objective: described(s.objective),
    limits: Object.entries(s.limits).map(([id, max]) => ({
      ...described(id),
      max,
      source: 'the study file (no default)',
    })),
    variables: [
      ...s.continuous.map((v) => ({ id: v.id, unit: designVariable(v.id)!.unit, min: v.min, max: v.max })),
      ...s.discrete.map((v) => ({ id: v.id, unit: designVariable(v.id)!.unit, choices: v.choices })),
    ],
    baseline: { objectives: figures(o.baseline.objectives) },
    optimum: {
      ...pointDoc(o, opt),
      wheel: opt.wheel,
      flags: opt.flags,
      uncertainty: o.uncertainty.map((u) => ({
        id: u.id,
        unit: rideObjective(u.id)!.unit,
        values_fine_medium_coarse: u.values.map(finiteOrNull),
        panels: u.panels,
        status: u.status,
        observed_order: finiteOrNull(u.observedOrder),
        relative: finiteOrNull(u.relative),
        absolute: finiteOrNull(u.absolute),
      })),
    },
    feasible: o.feasible,
    front: {
      handling: described(s.front.handling),
      points: o.front.map((i) => pointDoc(o, o.points[i]!)),
      limit_sweep: o.limitSweep.map((l) => ({
        limit: finiteOrNull(l.limit),
        best_index: l.best < 0 ? null : l.best,
      })),
    },
    search: {
      evaluations: o.evaluations,
      uncertainty_curve_solves: o.uncertaintyEvaluations,
      nelder_mead_runs: o.runs,
      converged_runs: o.convergedRuns,
      method: s.search.method,
      grid_points: s.search.gridPoints,
      grid_counts: s.search.gridCounts,
      starts: s.search.starts,
      max_evaluations: s.search.maxEvaluations,
      tolerance: s.search.xTolerance,
      lattice_span: lattice.span,
      lattice_chord: lattice.chord,
    },
    designs: o.points.map((p) => pointDoc(o, p)),
    ride: s.ride,
    notes: [...STUDY_NOTES],
    cautions: [...RIDE_CAUTIONS],
  };
}

export type StudyDocument = ReturnType<typeof studyDocument>;

/**
 * The study table (CSV): first one `caution` row per caution (in the note column), then the baseline,
 * then every evaluated design in the order evaluated, one row each: role (baseline, optimum, front,
 * design), index, the study's variables, every objective (units in the names), the limits' violation,
 * whether it meets them and whether it is on the front.
 */
export function studyCsv(o: StudyOutcome): string {
  const s = o.study;
  const vars = [...s.continuous, ...s.discrete].map((v) => v.id);
  const objs = OBJECTIVES.filter((x) => x.id in o.baseline.objectives).map((x) => x.id);
  const onFront = new Set(o.front);
  let text = csvLine(['role', 'index', ...vars, ...objs, 'violation', 'meets_limits', 'on_front', 'note']);
  for (const c of RIDE_CAUTIONS)
    text += csvLine(['caution', null, ...vars.map(() => null), ...objs.map(() => null), null, null, null, c]);
  const base = o.baseline;
  text += csvLine([
    'baseline',
    null,
    ...vars.map((id) => base.values[id]),
    ...objs.map((id) => base.objectives[id]),
    null,
    null,
    null,
    '',
  ]);
  for (const p of o.points) {
    const role = p.index === o.optimum ? 'optimum' : onFront.has(p.index) ? 'front' : 'design';
    text += csvLine([
      role,
      p.index,
      ...vars.map((id) => p.values[id]),
      ...objs.map((id) => p.objectives[id]),
      p.violation,
      p.violation === 0 ? 1 : 0,
      onFront.has(p.index) ? 1 : 0,
      '',
    ]);
  }
  return text;
}
