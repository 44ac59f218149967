/**
 * The one column table of a solved operating point: the order of a packed worker row (packPoints), the
 * result cube's column names and units, and the link to the result document's and CSV's names
 * (`document`, a key of the case file's ResultRow; the CSV's result columns follow the document). The
 * component block follows COMPONENT_NAMES (src/model/wheel/types.ts): append-only, so old packed rows,
 * CSV columns and documents keep their places.
 */
import { COMPONENT_NAMES, type ComponentLoads, type PointResult } from '../../model/wheel';

export interface ColumnSpec {
  /** Name in a packed row and in the cube: the PointResult key, or `component.field`. */
  name: string;
  /** SI unit ('1' for a plain number, '' for the flag bits). */
  unit: string;
  /** The result document's (and CSV's) name for the same number, where it is the same number. */
  document?: string;
}

export const SCALAR_COLUMNS = [
  'yawRad',
  'airspeedMps',
  'groundSpeedMps',
  'rhoKgPerM3',
  'axialN',
  'sideN',
  'verticalN',
  'windDragN',
  'windLiftN',
  'cpXM',
  'cpZM',
  'yawMomentNm',
  'rollMomentNm',
  'steeringMomentNm',
  'axleTorqueNm',
  'powerW',
  'cdaAxialM2',
  'uncertaintyAxialN',
  'uncertaintySideN',
] as const satisfies ReadonlyArray<keyof PointResult>;

export const COMPONENT_FIELDS = [
  'fxN',
  'fyN',
  'fzN',
  'mxNm',
  'myNm',
  'mzNm',
  'axleTorqueNm',
] as const satisfies ReadonlyArray<keyof ComponentLoads>;

const SCALAR_META: Record<(typeof SCALAR_COLUMNS)[number], [unit: string, document?: string]> = {
  yawRad: ['rad'],
  airspeedMps: ['m/s', 'airspeed_mps'],
  groundSpeedMps: ['m/s', 'ground_speed_mps'],
  rhoKgPerM3: ['kg/m^3', 'air_density_kgpm3'],
  axialN: ['N', 'axial_N'],
  sideN: ['N', 'side_N'],
  verticalN: ['N', 'vertical_N'],
  windDragN: ['N', 'wind_drag_N'],
  windLiftN: ['N', 'wind_lift_N'],
  cpXM: ['m', 'cp_x_m'],
  cpZM: ['m', 'cp_z_m'],
  yawMomentNm: ['N m', 'yaw_moment_Nm'],
  rollMomentNm: ['N m', 'roll_moment_Nm'],
  steeringMomentNm: ['N m', 'steering_moment_Nm'],
  axleTorqueNm: ['N m', 'axle_torque_Nm'],
  powerW: ['W', 'power_W'],
  cdaAxialM2: ['m^2', 'cda_axial_m2'],
  uncertaintyAxialN: ['N', 'gci_axial_N'],
  uncertaintySideN: ['N', 'gci_side_N'],
};

const FIELD_UNITS: Record<(typeof COMPONENT_FIELDS)[number], string> = {
  fxN: 'N',
  fyN: 'N',
  fzN: 'N',
  mxNm: 'N m',
  myNm: 'N m',
  mzNm: 'N m',
  axleTorqueNm: 'N m',
};

/** Every column of a packed row, in order. */
export const RESULT_COLUMNS: readonly ColumnSpec[] = [
  ...SCALAR_COLUMNS.map((name) => {
    const [unit, document] = SCALAR_META[name];
    return document === undefined ? { name, unit } : { name, unit, document };
  }),
  { name: 'flagBits', unit: '' },
  ...COMPONENT_NAMES.flatMap((c) =>
    COMPONENT_FIELDS.map((f) => ({ name: `${c}.${f}`, unit: FIELD_UNITS[f] })),
  ),
];

export const COLUMN_NAMES: readonly string[] = RESULT_COLUMNS.map((c) => c.name);
export const COLUMN_COUNT = COLUMN_NAMES.length;

/** Columns by their cube name and, where they have one, by their result-document (and CSV) name. */
const INDEX = new Map<string, number>([
  ...COLUMN_NAMES.map((name, i): [string, number] => [name, i]),
  ...RESULT_COLUMNS.flatMap((c, i): Array<[string, number]> => (c.document ? [[c.document, i]] : [])),
]);

/**
 * Position of a column in a packed row, by its cube name (`axialN`) or its document name (`axial_N`);
 * throws a RangeError naming the column for an unknown name.
 */
export function columnIndex(name: string): number {
  const i = INDEX.get(name);
  if (i === undefined) {
    throw new RangeError(`column "${name}" is not a result column (columns: ${COLUMN_NAMES.join(', ')})`);
  }
  return i;
}
