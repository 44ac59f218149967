/**
 * The page's design-study jobs, run as tasks on the pool's task workers (pageJobs.ts, runTask.ts) like `coversweep optimise`:
 *  - a study: a study file's object validated (validateStudy), optimised (optimiseStudy, the grid or
 *    Nelder-Mead method) and written as the result document (studyDocument), with progress;
 *  - ride objectives over the design map's cells: each cell's design (cover fraction x rim depth set on
 *    the ride's design wheel) evaluated on the ride (evaluateDesign), one baseline curve for them all.
 * Nothing here is new physics: the same functions as the command line, on the same numbers.
 */
import { designContext, type LatticeCounts } from '../design/designContext';
import { applyDesign } from '../design/designVariables';
import { evaluateDesign } from '../design/evaluateDesign';
import { optimiseStudy } from '../design/optimiseStudy';
import { type StudyDocument, studyDocument } from '../design/studyDocument';
import { validateStudy } from '../design/studyFile';
import type { RideFile } from '../ride/index';

export type StudyJobResult = { ok: true; document: StudyDocument } | { ok: false; errors: string[] };

/** Progress: designs evaluated of the study's budget. */
export type StudyJobProgress = (done: number, budget: number) => void;

/** Validate and run a study (never throws: bad input and model errors come back as messages). */
export function studyJob(raw: unknown, onProgress?: StudyJobProgress): StudyJobResult {
  const parsed = validateStudy(raw);
  if (!parsed.ok) return parsed;
  try {
    return { ok: true, document: studyDocument(optimiseStudy(parsed.value, onProgress)) };
  } catch (error) {
    return { ok: false, errors: [error instanceof Error ? error.message : String(error)] };
  }
}

export interface MapObjectivesRequest {
  /** A validated ride: its design wheel is the base every cell changes. */
  ride: RideFile;
  /** The cells' designs: cover fraction (0..1) and rim depth (m). */
  cells: { coverFraction: number; rimDepthM: number }[];
  /** Lattice counts of the evaluations (undefined: the ride's own). */
  lattice?: LatticeCounts;
}

/** Every applicable ride objective of each cell's design, by objective id, in the cells' order. */
export function mapObjectivesJob(
  request: MapObjectivesRequest,
  onProgress?: StudyJobProgress,
): Record<string, number>[] {
  const context = designContext(request.ride, request.lattice);
  return request.cells.map((cell, k) => {
    const values = { cover_fraction: cell.coverFraction, rim_depth_m: cell.rimDepthM };
    const out = evaluateDesign(context, applyDesign(context.ride.design, values), values).objectives;
    onProgress?.(k + 1, request.cells.length);
    return out;
  });
}
