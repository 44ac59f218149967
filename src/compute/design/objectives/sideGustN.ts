import type { RideObjective } from '../types';
import { ALWAYS, numberOrNaN } from './numberOrNaN';

/** |Side force| in the ride's design gust (N): the ride's gust (mean hub wind x gust factor from the
 * direction of the largest roll moment). */
export const sideGustN: RideObjective = {
  id: 'side_gust_N',
  label: 'Side force in the design gust',
  unit: 'N',
  kind: 'handling',
  description:
    "the wheel's side force in the ride's design gust (hub mean wind x gust factor, from the direction of the largest roll moment)",
  applies: ALWAYS,
  compute: (d) => Math.abs(numberOrNaN(d.doc.gust.side_N.design)),
};
