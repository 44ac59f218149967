import type { RideObjective } from '../types';
import { ALWAYS, numberOrNaN } from './numberOrNaN';

/** Pedal power at the ride's constant speed (W), the ride's own figure (Martin et al. 1998). */
export const powerW: RideObjective = {
  id: 'power_W',
  label: 'Pedal power at the ride speed',
  unit: 'W',
  kind: 'performance',
  description:
    "mean pedal power at the ride's constant speed (the given speed, or the baseline's mean speed at the given power) over the ride's wind",
  applies: ALWAYS,
  compute: (d) => numberOrNaN(d.doc.power_W.design),
};
