/** What the "Your data" panel is given (the design's context) and what it asks to run. */
import type { MapFile, UncertainRange } from '../../compute/compare/index';
import type { TableRef } from '../dataJobs';
import type { SpeedUnit } from '../viewState';

export type DataPanelState = 'empty' | 'mapping' | 'computing' | 'done' | 'error';

export interface DataContext {
  /** The design's disc area pi R^2 (m^2), the coefficients' assumed reference area. */
  referenceAreaM2: number;
  /** The design's first airspeed (m/s), assumed when no column holds the speed. */
  airspeedMps: number;
  rhoKgPerM3: number;
  speedUnit: SpeedUnit;
  designName: string;
}

export interface DataRunRequest {
  /** The table (kept in the worker that read it; read again from its source by a fresh worker). */
  ref: TableRef;
  /** Data rows in the table (scales the job's deadline). */
  rowCount: number;
  map: MapFile;
  label: string;
  calibrate: boolean;
  convergence: boolean;
  uncertainty: UncertainRange[] | null;
}
