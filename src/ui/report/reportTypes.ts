/** What the printable report reads from the page, and the plain rows its sections are built from. */

import type { Parsed } from '../../compute/caseFile';
import type { RideResponse } from '../../compute/engine/pageJobs';
import type { RideFile } from '../../compute/ride/index';
import type { ValidationReport } from '../../compute/validation/types';
import type { AppState } from '../appState';
import type { PlotSpec } from '../linePlot';
import type { PageResults } from '../views/pageResults';

/** The page's four main plots, by the name App gives them. */
export type ReportPlotName = 'dragYaw' | 'sideYaw' | 'handling' | 'dragCover';

/** The page as the report sees it (App implements it). */
export interface ReportHost {
  readonly state: AppState;
  readonly results: PageResults | null;
  /** What a main plot shows now (null before it is drawn). */
  reportPlotSpec(name: ReportPlotName): PlotSpec | null;
  /** The road panel's last evaluated ride (null when none was run), and the ride the state defines now. */
  lastRide(): RideResponse | null;
  rideFor(s: AppState): Parsed<RideFile>;
  /** The Help tab's validation table (computed once, shared with Help). */
  validationReport(): Promise<ValidationReport>;
  /** Whether the page's results are this state's: still computing (the report waits), ready, or
   * incomplete (the run was cancelled or failed: the report is refused rather than mixing designs). */
  computePhase(): 'computing' | 'ready' | 'incomplete';
}

/** A labelled value: "Rim depth" / "80 mm". */
export interface ReportRow {
  label: string;
  value: string;
}

/** A group of rows under a small heading (geometry: wheel, spokes, cover, ...). */
export interface ReportGroup {
  title: string;
  rows: ReportRow[];
}

/** A table: column headings and rows of cells (the first cell names the row). */
export interface ReportTable {
  head: string[];
  rows: string[][];
  /** Notes printed under the table (conditions, what "n/a" means). */
  notes: string[];
}
