/** What the "Your data" panel is given (the design's context), asks to run, and is made of. */
import type { MapFile, UncertainInput, UncertainRange } from '../../compute/compare/index';
import type { TableRef } from '../../compute/engine/dataTaskTypes';
import type { DataTable } from '../dataTable';
import type { LinePlot } from '../linePlot';
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

export type DataPlotName = 'dataForce' | 'dataSide';

/** What the panel's controls ask for (the panel's own methods). */
export interface DataPanelActions {
  readFile(file: File): void;
  readText(text: string, label: string): void;
  loadDemo(): void;
  apply(): void;
  cancel(): void;
  run(extra: { calibrate?: boolean; convergence?: boolean; uncertainty?: UncertainRange[] }): void;
  runUncertainty(): void;
  useCalibratedChanged(checked: boolean): void;
}

export interface DataPanelDom {
  status: HTMLElement;
  readErrors: HTMLElement;
  mapping: HTMLElement;
  mapBody: HTMLTableSectionElement;
  mapErrors: HTMLElement;
  guessNotes: HTMLElement;
  preview: HTMLElement;
  sideSign: HTMLSelectElement;
  speedInput: HTMLInputElement;
  speedUnitEl: HTMLElement;
  densityInput: HTMLInputElement;
  results: HTMLElement;
  summary: HTMLElement;
  flags: HTMLElement;
  plots: Record<DataPlotName, LinePlot>;
  plotTitles: Record<DataPlotName, HTMLElement>;
  residuals: DataTable;
  residualSummary: DataTable;
  fitBlock: HTMLElement;
  fitTable: DataTable;
  fitText: HTMLElement;
  useCalibrated: HTMLInputElement;
  convergenceBlock: HTMLElement;
  convergenceTable: DataTable;
  uncertaintyBlock: HTMLElement;
  uncertaintyTable: DataTable;
  rangeInputs: Map<UncertainInput, { min: HTMLInputElement; max: HTMLInputElement }>;
  cancelButton: HTMLButtonElement;
  actionButtons: HTMLButtonElement[];
}
