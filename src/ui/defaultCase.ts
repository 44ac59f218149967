import { type CaseFile, validateCase } from '../compute/caseFile';
import { kmhToMps } from '../compute/units';
import { clean, yawRange } from './fields';

/** The invented default design: the model's demo wheel at 50 km/h, yaw 0..20 deg in 0.5 deg steps. */
export function defaultCase(): CaseFile {
  const r = validateCase({
    name: 'Demo wheel (invented)',
    conditions: { airspeed_mps: [clean(kmhToMps(50))], yaw_deg: yawRange(20, 0.5) },
  });
  if (!r.ok) throw new Error(`the default case is invalid: ${r.errors.join('; ')}`);
  return r.value;
}
