/** Words for the data panel: each quantity and unit a column may hold, and one colour per airspeed. */
import type { Quantity, SlipLabels, Unit } from '../../compute/compare/index';

export const QUANTITY_TEXT: Record<Quantity, string> = {
  yaw_deg: 'yaw angle',
  speed: 'airspeed',
  air_density: 'air density',
  axial_force: 'axial drag (along travel)',
  drag_force_wind: 'drag along the wind',
  side_force: 'side force',
  drag_area: 'drag area (axial)',
  drag_area_wind: 'drag area (wind axis)',
  drag_coefficient: 'drag coefficient (axial)',
  drag_coefficient_wind: 'drag coefficient (wind axis)',
  side_coefficient: 'side-force coefficient',
  yaw_moment: 'yaw moment',
  steering_moment: 'steering moment',
  ignore: '— ignore —',
};

export const UNIT_TEXT: Record<Unit, string> = {
  N: 'N',
  gf: 'grams-force',
  kgf: 'kgf',
  lbf: 'lbf',
  m2: 'm²',
  cm2: 'cm²',
  deg: 'deg',
  rad: 'rad',
  mps: 'm/s',
  kmh: 'km/h',
  mph: 'mph',
  '1': '(none)',
  Nm: 'N m',
  Nmm: 'N mm',
  kgpm3: 'kg/m³',
};

export const SPEED_COLOURS = ['#1c6876', '#c2412d', '#6b4fa0', '#b8860b', '#2e7d32', '#5d4037'];

/** The mapping controls' labels: shown on the panel and named in the slip messages, from one place. */
export const MAPPING_LABELS = {
  sideForceSign: 'Side force sign',
  sideForceLeft: '+ to the rider’s left (this tool’s axes)',
  sideForceRight: '+ to the rider’s right (mirrored)',
  unit: 'Unit',
  referenceArea: 'Reference area, m²',
} as const;

/**
 * What the slip messages call the map's keys on this panel ("set <label> to -1"): the control's
 * label, with what 1 and -1 mean on it (its choices are worded, not numbered). The panel has no
 * yaw-moment sign control, so that key keeps its name.
 */
export const DATA_SLIP_LABELS: SlipLabels = {
  side_force_sign: `“${MAPPING_LABELS.sideForceSign}” (1 = “${MAPPING_LABELS.sideForceLeft}”, -1 = “${MAPPING_LABELS.sideForceRight}”)`,
  unit: `“${MAPPING_LABELS.unit}” (in “What each column holds”)`,
  reference_area_m2: `“${MAPPING_LABELS.referenceArea}” (in “What each column holds”)`,
  unit_values: UNIT_TEXT,
};
