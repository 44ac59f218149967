/**
 * What every export says about itself: the design (name and key geometry, lengths in mm as the page's
 * inputs), the conditions (airspeeds, yaw angles, air), the model options, whether a calibrated model is
 * in use, the tool's version and the date. One structure feeds the figures' caption block, the CSV
 * header lines and the JSON metadata, so the three never disagree.
 */
import type { CaseFile } from '../../compute/caseFile';
import type { CalibrationMark } from '../appState';
import { designFileStem } from '../designFileStem';
import { speedFromMps, speedUnitText } from '../displayUnits';
import { defaultRoad, type RoadState } from '../roadState';
import type { SpeedUnit } from '../viewState';
import { rideSummary } from './rideSummary';
import { TOOL_VERSION } from './toolVersion';

export interface ExportSource {
  case: CaseFile;
  calibration?: CalibrationMark | null;
  speedUnit: SpeedUnit;
  /** The road panel's inputs (absent: the defaults). */
  road?: RoadState;
}

export interface ExportMeta {
  tool: 'CoverSweep';
  version: string;
  /** ISO 8601, UTC, to the second. */
  date: string;
  design: { name: string; file_stem: string; summary: string };
  conditions: { summary: string; speed_unit: string };
  model: { summary: string; options: CaseFile['model'] };
  calibrated: boolean;
  /** What the calibration fitted and to which data (null when none is applied). */
  calibration: string | null;
  /** The road panel's inputs in words (its figures and tables add it to their captions). */
  ride: string;
  units: string;
}

const num = (x: number, digits = 4): string => String(Number(x.toPrecision(digits)));
const mm = (m: number): string => `${num(m * 1000, 6)} mm`;

function listed(values: readonly number[], unit: string): string {
  const u = unit === '°' ? unit : ` ${unit}`;
  if (values.length <= 6) return `${values.map((v) => num(v)).join(', ')}${u}`;
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  return `${num(lo)} to ${num(hi)}${u} (${values.length} values)`;
}

function designSummary(c: CaseFile): string {
  const w = c.wheel;
  const cover = w.cover;
  const where =
    cover.placement === 'explicit'
      ? `covers from ${mm(cover.inner_radius_m ?? 0)} to ${mm(cover.outer_radius_m ?? 0)} radius`
      : `covered fraction ${num(cover.fraction)} at the ${cover.placement}`;
  const s = w.spokes;
  const spokes =
    s.section === 'bladed'
      ? `${s.count} bladed spokes ${mm(s.width_m)} × ${mm(s.thickness_m)}`
      : `${s.count} round spokes ${mm(s.diameter_m)}`;
  return `outer radius ${mm(w.outer_radius_m)}, rim depth ${mm(w.rim_depth_m)}, tyre ${mm(w.tyre_width_m)}, ${where} (${cover.sides} side${cover.sides === 1 ? '' : 's'}), ${spokes}`;
}

function conditionsSummary(c: CaseFile, u: SpeedUnit): string {
  const k = c.conditions;
  const su = speedUnitText(u);
  const speeds = listed(
    k.airspeed_mps.map((v) => speedFromMps(v, u)),
    su,
  );
  const ground =
    k.ground_speed_mps === null
      ? 'ground speed = airspeed'
      : `ground speed ${num(speedFromMps(k.ground_speed_mps, u))} ${su}`;
  const air =
    k.air_density_kgpm3 !== undefined
      ? `air density ${num(k.air_density_kgpm3)} kg/m³, ${num(k.temperature_c)} °C`
      : `air ${num(k.temperature_c)} °C, ${k.altitude_m !== undefined ? `altitude ${num(k.altitude_m)} m` : `${num(k.pressure_pa ?? 101325, 6)} Pa`}, RH ${num((k.relative_humidity ?? 0) * 100)} %`;
  return `airspeed ${speeds} (${ground}); yaw ${listed(k.yaw_deg, '°')}; ${air}; reference speed ${num(k.reference_speed_kmh)} km/h`;
}

function modelSummary(m: CaseFile['model']): string {
  return [
    `ground image ${m.ground ? 'on' : 'off'}`,
    `lattice ${m.lattice_span} × ${m.lattice_chord}`,
    `suction recovered ${num(m.suction_recovered)}`,
    `porosity scale ${num(m.porosity_scale)}`,
    `profile drag factor ${num(m.profile_drag_factor)}`,
    `one-sided cover spoke share ${num(m.one_sided_cover_spoke_share)}`,
    `grid convergence ${m.grid_convergence ? 'on' : 'off'}`,
  ].join(', ');
}

function calibrationSummary(mark: CalibrationMark): string {
  const fitted = Object.entries(mark.values)
    .map(
      ([k, v]) =>
        `${k} ${num(v as number)}${mark.original[k as keyof typeof mark.original] !== undefined ? ` (was ${num(mark.original[k as keyof typeof mark.original]!)})` : ''}`,
    )
    .join(', ');
  return `model options fitted to ${mark.data} (${mark.points} points): ${fitted}`;
}

export function exportMeta(source: ExportSource, date: Date): ExportMeta {
  if (!(date instanceof Date) || Number.isNaN(date.getTime())) {
    throw new RangeError('exportMeta: date must be a valid Date');
  }
  const c = source.case;
  const calibration = source.calibration ?? null;
  return {
    tool: 'CoverSweep',
    version: TOOL_VERSION,
    date: `${date.toISOString().slice(0, 19)}Z`,
    design: { name: c.name ?? 'unnamed design', file_stem: designFileStem(c), summary: designSummary(c) },
    conditions: {
      summary: conditionsSummary(c, source.speedUnit),
      speed_unit: speedUnitText(source.speedUnit),
    },
    model: { summary: modelSummary(c.model), options: { ...c.model } },
    calibrated: calibration !== null,
    calibration: calibration ? calibrationSummary(calibration) : null,
    ride: rideSummary(source.road ?? defaultRoad(), source.speedUnit),
    units: `SI unless a column or axis names its unit; speeds in ${speedUnitText(source.speedUnit)}, wheel lengths in mm`,
  };
}
