/**
 * The tasks of the one protocol (protocol.ts): besides the sweeps' solve jobs, a solver worker runs one
 * task at a time, a plain object naming its kind. Each kind's result is plain data (typed arrays
 * transferred). The pool deals tasks to its task workers (workerPool.ts), a TaskChannel keeps the
 * latest of one client's tasks (taskChannel.ts); compute/worker/runTask.ts runs them in the worker. The
 * data panel's kinds (dataTaskTypes.ts) carry an affinity: they go back to the worker holding the table.
 */
import type { GuessContext } from '../compare/index';
import type { RideCurves, RideDocument, RideFile } from '../ride/index';
import type { ValidationReport } from '../validation/types';
import type { PackedResult, ReadOutcome, TableCompareRequest, TableRef, TextOutcome } from './dataTaskTypes';
import type { MapObjectivesRequest, StudyJobResult } from './studyJobs';
import type { ViewField, ViewFieldRequest } from './viewFieldTypes';

export interface RideRequest {
  /** A validated ride (validateRide's value). */
  ride: RideFile;
}

export interface RideResponse {
  document: RideDocument;
  curves: RideCurves;
  /** True when the yaw curves came from this worker's cache (no lattice solve). */
  curvesReused: boolean;
}

export type TaskRequest =
  /** The 3D view's data at one operating point (request.input.points[0]). */
  | { kind: 'viewField'; request: ViewFieldRequest }
  /** A ride: both wheels' yaw curves (kept per worker) and the ride's evaluation. */
  | { kind: 'ride'; request: RideRequest }
  /** A design study (a study file's object), as `coversweep optimise`; progress: designs of the budget. */
  | { kind: 'study'; raw: unknown }
  /** Every ride objective of the design map's cells; progress: cells done. */
  | { kind: 'mapObjectives'; request: MapObjectivesRequest }
  /** The built-in reference set, as `coversweep validate`. */
  | { kind: 'validate' }
  /** The data panel: read a table (kept in the worker under `ref.id`) into a summary. */
  | { kind: 'dataRead'; ref: TableRef; context: GuessContext }
  /** The data panel: a table's text as read (a large one is held back by dataRead). */
  | { kind: 'dataText'; ref: TableRef }
  /** The data panel: compare a table with the model (and fit, convergence, uncertainty on request). */
  | { kind: 'dataCompare'; request: TableCompareRequest };

export type TaskKind = TaskRequest['kind'];

/** What each kind of task answers. */
export interface TaskResults {
  viewField: ViewField;
  ride: RideResponse;
  study: StudyJobResult;
  mapObjectives: Record<string, number>[];
  validate: ValidationReport;
  dataRead: ReadOutcome;
  dataText: TextOutcome;
  dataCompare: PackedResult;
}

export type TaskResult = TaskResults[TaskKind];

/** The task of one kind. */
export type TaskOf<K extends TaskKind> = Extract<TaskRequest, { kind: K }>;

/** Progress of a task: steps done of the steps planned. */
export type TaskProgress = (done: number, total: number) => void;
