/** The display units and decimals the page's tables share. */

import type { DataTable } from '../dataTable';
import { fmt, speedFromMps, speedUnitText, unitShort } from '../displayUnits';
import type { Present } from './present';

export type Tables = ReadonlyMap<string, DataTable>;

export function tableFormat(ctx: Present) {
  const u = ctx.units;
  return {
    u,
    /** Force and area unit texts, and their decimals. */
    fu: unitShort('force', u),
    au: unitShort('area', u),
    fd: u.force === 'N' ? 4 : 1,
    ad: u.area === 'm2' ? 6 : 2,
    refText: `${fmt(speedFromMps(u.referenceSpeedMps, u.speed), 3)} ${speedUnitText(u.speed)}`,
    sp: speedUnitText(u.speed),
    c: ctx.state.case,
    yaws: ctx.state.case.conditions.yaw_deg,
  };
}
