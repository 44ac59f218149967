/** A design study (what `coversweep optimise` reads, after validation) and what optimising it gives. */
import type { RideFile } from '../ride/index';
import type { LatticeCounts } from './designContext';
import type { DesignEvaluation } from './types';

export interface ContinuousRange {
  id: string;
  min: number;
  max: number;
}

export interface DiscreteChoices {
  id: string;
  choices: (number | string)[];
}

export interface StudySearch {
  /**
   * 'nelder-mead' (the default): the coarse grid, then Nelder-Mead from its best points and the front's
   * limit sweep. 'grid': the grid alone (every design of it evaluated, nothing else), the optimum the best
   * grid design by the feasibility order: a brute-force study at the grid's resolution.
   */
  method: 'nelder-mead' | 'grid';
  /** Points per continuous variable of the coarse start grid. */
  gridPoints: number;
  /** Points of the grid per continuous variable where they differ from gridPoints (by variable id). */
  gridCounts: Record<string, number>;
  /** Nelder-Mead runs per discrete combination, from the best grid points. */
  starts: number;
  /** Evaluations the whole search may use (the start grids, the runs and the limit sweep). */
  maxEvaluations: number;
  /** Nelder-Mead stops when the simplex is this small (fraction of each variable's range). */
  xTolerance: number;
  /** Lattice counts for the evaluations (undefined: the ride's model.lattice_span and lattice_chord). */
  lattice?: LatticeCounts;
}

export interface StudyFront {
  /** The handling figure the front is drawn against (an objective id of kind 'handling'). */
  handling: string;
  /** Extra optimisations with that figure's limit swept across the front's range. */
  limitSteps: number;
}

export interface DesignStudy {
  name?: string;
  ride: RideFile;
  continuous: ContinuousRange[];
  discrete: DiscreteChoices[];
  objective: string;
  /** Largest allowed value of each limited objective (in the objective's unit). */
  limits: Record<string, number>;
  search: StudySearch;
  front: StudyFront;
}

/** One evaluated design with its feasibility under the study's limits. */
export interface StudyPoint extends DesignEvaluation {
  /** Index in the order the designs were evaluated. */
  index: number;
  /** Sum of the limits' relative excesses (0: every limit holds). */
  violation: number;
}

/** Lattice uncertainty of one figure at the optimum (three lattices; Celik et al. 2008). */
export interface FigureUncertainty {
  id: string;
  /** Values on the fine (the evaluations'), medium and coarse lattices. */
  values: [number, number, number];
  panels: [number, number, number];
  status: string;
  observedOrder: number;
  /** Relative uncertainty (fraction) and the absolute band (in the figure's unit). */
  relative: number;
  absolute: number;
}

export interface StudyOutcome {
  study: DesignStudy;
  baseline: DesignEvaluation;
  points: StudyPoint[];
  /** Index (into points) of the optimum: the best evaluated design by the feasibility order. */
  optimum: number;
  /** True when the optimum meets every limit. */
  feasible: boolean;
  /** Indices (into points) of the trade-off front, by increasing handling figure. */
  front: number[];
  /** The limits swept for the front and each sweep run's best point (index into points, or -1). */
  limitSweep: { limit: number; best: number }[];
  uncertainty: FigureUncertainty[];
  /** Evaluations used by the search (cache hits not counted) and by the uncertainty estimate. */
  evaluations: number;
  uncertaintyEvaluations: number;
  /** Nelder-Mead runs and how many of them converged (the rest stopped at their budget). */
  runs: number;
  convergedRuns: number;
}
