import type { RideObjective } from '../types';
import { ALWAYS, numberOrNaN } from './numberOrNaN';

/** The wheel's axial force averaged over the ride's own wind (speed distribution and directions) at the
 * ride's constant speed (N): SAE J1252's averaging generalised to the ride's wind (windAveragedWheelLoads). */
export const windAxialN: RideObjective = {
  id: 'wind_axial_N',
  label: "Wind-averaged axial drag (ride's wind)",
  unit: 'N',
  kind: 'performance',
  description:
    "the wheel's axial force (not wind-axis drag) averaged over the ride's wind speeds and directions at hub height, at the ride's constant speed",
  applies: ALWAYS,
  compute: (d) => numberOrNaN(d.doc.wind_averaged_axial_N.design),
};
