import type { RideObjective } from '../types';
import { ALWAYS, numberOrNaN } from './numberOrNaN';

/** |Lean angle| to balance the wheel's roll moment in the ride's design gust (deg): the ride's figure
 * (static balance by gravity, leanAngleRad). */
export const leanGustDeg: RideObjective = {
  id: 'lean_gust_deg',
  label: 'Lean in the design gust',
  unit: 'deg',
  kind: 'handling',
  description:
    "the lean angle that balances the wheel's aerodynamic roll moment in the ride's design gust (rider and bike as one rigid body)",
  applies: ALWAYS,
  compute: (d) => Math.abs(numberOrNaN(d.doc.lean_deg.design)),
};
