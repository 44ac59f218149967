import type { RideObjective } from '../types';
import { ALWAYS, numberOrNaN } from './numberOrNaN';

/** Time over the ride's distance or course at the ride's constant power (s): the ride's own figure
 * (Martin et al. 1998 power model, each wind state and segment at its steady speed). */
export const timeS: RideObjective = {
  id: 'time_s',
  label: 'Time over the ride',
  unit: 's',
  kind: 'performance',
  description:
    "time over the ride's distance or course at the ride's constant power (the given power, or the baseline's mean power at the given speed)",
  applies: ALWAYS,
  compute: (d) => numberOrNaN(d.doc.time_s.design),
};
