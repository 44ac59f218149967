/** Words for the data panel: each quantity and unit a column may hold, and one colour per airspeed. */
import type { Quantity, Unit } from '../../compute/compare/index';

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
