/**
 * Convert a data table to the tool's axes and SI units with a map file: yaw in radians (> 0 for wind
 * from the rider's right), airspeed in m/s, density in kg/m^3, and every measured quantity as a force
 * (N) or moment (N m) in the README's frame: drag areas and coefficients are multiplied by the dynamic
 * pressure q = rho V^2 / 2 of their own row (and coefficients by their reference area); the side force
 * and moments by the map's sign. The table itself is never modified.
 */
import { clipText } from '../clipText';
import { displayNumber } from '../displayNumber';
import { type CsvTable, parseNumberCell } from './csv';
import type { MapFile } from './mapFile';
import { OUTPUTS, type Output, QUANTITY_OUTPUT, type Quantity, toSI, type Unit } from './quantities';

export interface DataPoint {
  /** Line of the data file the point comes from (1-based). */
  line: number;
  yawRad: number;
  /** The yaw as given, in degrees (echoed back as typed; absent for points not read from a file). */
  yawDeg?: number;
  airspeedMps: number;
  rhoKgPerM3: number;
  /** Measured values in SI and the tool's axes, by output (absent where the cell was empty). */
  values: Partial<Record<Output, number>>;
}

export interface OutputSource {
  column: string;
  quantity: Quantity;
  unit: Unit;
  reference_area_m2?: number;
}

export interface ConvertedData {
  points: DataPoint[];
  /** Outputs present in the data, in the order of OUTPUTS. */
  outputs: Output[];
  sources: Partial<Record<Output, OutputSource>>;
  /** Where the airspeed and density came from. */
  airspeedSource: string;
  /** Unit the airspeed was given in ('mps' when from the map's airspeed_mps). */
  speedUnit: Unit;
  densitySource: string;
  /** The map's signs, as applied (messages say what to change them to). */
  sideForceSign?: 1 | -1;
  yawMomentSign?: 1 | -1;
}

export type ConvertResult = { ok: true; value: ConvertedData } | { ok: false; errors: string[] };

const MAX_ERRORS = 20;

/**
 * @param defaultRhoKgPerM3 air density used when neither the map nor a column gives one (the case's).
 */
export function convertTable(table: CsvTable, map: MapFile, defaultRhoKgPerM3: number): ConvertResult {
  const errors: string[] = [];
  const index = new Map<string, number>();
  for (const [k, h] of table.headers.entries()) index.set(h, k);
  let yawCol = -1;
  let speedCol = -1;
  let rhoCol = -1;
  let yawUnit: Unit = 'deg';
  let speedUnit: Unit = 'mps';
  const measured: {
    col: number;
    out: Output;
    unit: Unit;
    quantity: Quantity;
    area: number;
    header: string;
  }[] = [];
  const sources: Partial<Record<Output, OutputSource>> = {};
  for (const [header, c] of Object.entries(map.columns)) {
    const k = index.get(header);
    if (k === undefined) {
      if (c.quantity !== 'ignore') {
        errors.push(
          `map columns.${header}: no column "${header}" in the data file (its columns are: ${table.headers.map((h) => `"${h}"`).join(', ')})`,
        );
      }
      continue;
    }
    if (c.quantity === 'yaw_deg') {
      yawCol = k;
      yawUnit = c.unit;
    } else if (c.quantity === 'speed') {
      speedCol = k;
      speedUnit = c.unit;
    } else if (c.quantity === 'air_density') {
      rhoCol = k;
    } else {
      const out = QUANTITY_OUTPUT[c.quantity];
      if (out) {
        measured.push({
          col: k,
          out,
          unit: c.unit,
          quantity: c.quantity,
          area: c.reference_area_m2 ?? 1,
          header,
        });
        sources[out] = {
          column: header,
          quantity: c.quantity,
          unit: c.unit,
          ...(c.reference_area_m2 !== undefined ? { reference_area_m2: c.reference_area_m2 } : {}),
        };
      }
    }
  }
  if (errors.length > 0) return { ok: false, errors };
  const sideSign = map.side_force_sign;
  const momentSign = map.yaw_moment_sign ?? map.side_force_sign;
  const points: DataPoint[] = [];
  const cellNumber = (
    row: string[],
    col: number,
    line: number,
    what: string,
    required: boolean,
  ): number | null => {
    const raw = row[col] ?? '';
    const v = parseNumberCell(raw, table.decimalComma);
    if (v === null) {
      if (required)
        errors.push(
          `line ${line}, column "${table.headers[col]}": empty, but the ${what} is required on every row`,
        );
      return null;
    }
    if (!Number.isFinite(v)) {
      errors.push(
        `line ${line}, column "${clipText(table.headers[col] ?? '')}": "${clipText(raw)}" is not a number (${what})`,
      );
      return null;
    }
    return v;
  };
  for (let r = 0; r < table.rows.length && errors.length < MAX_ERRORS; r++) {
    const row = table.rows[r]!;
    const line = table.lineNumbers[r]!;
    const yawValue = cellNumber(row, yawCol, line, 'yaw angle', true);
    const speedValue =
      speedCol >= 0 ? cellNumber(row, speedCol, line, 'airspeed', true) : (map.airspeed_mps ?? null);
    const rhoValue = rhoCol >= 0 ? cellNumber(row, rhoCol, line, 'air density', true) : null;
    const values: Partial<Record<Output, number>> = {};
    const raw: [Output, number, (typeof measured)[number]][] = [];
    for (const m of measured) {
      const v = cellNumber(row, m.col, line, m.quantity, false);
      if (v !== null) raw.push([m.out, v, m]);
    }
    if (yawValue === null || speedValue === null || (rhoCol >= 0 && rhoValue === null)) continue;
    const yawRad = yawCol >= 0 ? toSI(yawValue, yawUnit) : 0;
    if (!(Math.abs(yawRad) <= Math.PI / 2)) {
      errors.push(
        `line ${line}, column "${table.headers[yawCol]}": yaw ${yawValue} ${yawUnit} is beyond 90 deg`,
      );
      continue;
    }
    const airspeedMps = speedCol >= 0 ? toSI(speedValue, speedUnit) : speedValue;
    if (!(airspeedMps > 0 && airspeedMps <= 60)) {
      errors.push(`line ${line}: airspeed ${airspeedMps} m/s must be greater than 0 and at most 60 m/s`);
      continue;
    }
    const rhoKgPerM3 = rhoValue ?? map.air_density_kgpm3 ?? defaultRhoKgPerM3;
    if (!(rhoKgPerM3 >= 0.3 && rhoKgPerM3 <= 1.6)) {
      errors.push(`line ${line}: air density ${rhoKgPerM3} kg/m^3 must be between 0.3 and 1.6`);
      continue;
    }
    const q = 0.5 * rhoKgPerM3 * airspeedMps * airspeedMps;
    for (const [out, v, m] of raw) {
      let si: number;
      if (m.quantity === 'drag_area' || m.quantity === 'drag_area_wind') si = toSI(v, m.unit) * q;
      else if (
        m.quantity === 'drag_coefficient' ||
        m.quantity === 'drag_coefficient_wind' ||
        m.quantity === 'side_coefficient'
      ) {
        si = v * m.area * q;
      } else si = toSI(v, m.unit);
      if (out === 'side_N') si *= sideSign;
      if (out === 'yaw_moment_Nm' || out === 'steering_moment_Nm') si *= momentSign;
      values[out] = si;
    }
    const yawDeg = yawCol < 0 ? 0 : yawUnit === 'deg' ? yawValue : displayNumber((yawRad * 180) / Math.PI);
    points.push({ line, yawRad, yawDeg, airspeedMps, rhoKgPerM3, values });
  }
  if (errors.length > 0) return { ok: false, errors: errors.slice(0, MAX_ERRORS) };
  if (points.length === 0) return { ok: false, errors: ['no usable data rows after conversion'] };
  const outputs = OUTPUTS.filter((o) => points.some((p) => p.values[o] !== undefined));
  return {
    ok: true,
    value: {
      points,
      outputs,
      sources,
      speedUnit: speedCol >= 0 ? speedUnit : 'mps',
      sideForceSign: sideSign,
      yawMomentSign: momentSign,
      airspeedSource:
        speedCol >= 0 ? `column "${table.headers[speedCol]}" (${speedUnit})` : 'map airspeed_mps',
      densitySource:
        rhoCol >= 0
          ? `column "${table.headers[rhoCol]}"`
          : map.air_density_kgpm3 !== undefined
            ? 'map air_density_kgpm3'
            : "the case's air",
    },
  };
}

/** A point's yaw in degrees as the user gave it, or converted back and rounded for display. */
export function pointYawDeg(p: DataPoint): number {
  return p.yawDeg ?? displayNumber((p.yawRad * 180) / Math.PI);
}
