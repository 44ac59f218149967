/**
 * The design as the report prints it: every key number of the case file (wheel, spokes, cover,
 * conditions, air, steering axis, model options), converted from the file's SI to the units a wheel
 * engineer reads (mm, deg, km/h or mph), each with its unit. `rhoKgPerM3` is the air density the page
 * solved with (given, or from temperature, pressure and humidity).
 */
import type { CaseFile } from '../../compute/caseFile';
import { speedFromMps, speedUnitText } from '../displayUnits';
import type { SpeedUnit } from '../viewState';
import { formatQuantity as q } from './formatQuantity';
import type { ReportGroup } from './reportTypes';

const PLACEMENT: Record<string, string> = {
  rim: 'at the rim',
  hub: 'at the hub',
  centre: 'mid-annulus',
  explicit: 'between given radii',
};

function mm(m: number, decimals = 1): string {
  return q(m * 1000, decimals, 'mm');
}

function speeds(mps: readonly number[], unit: SpeedUnit): string {
  const u = speedUnitText(unit);
  return mps.map((v) => `${q(speedFromMps(v, unit), 1, u)} (${q(v, 2, 'm/s')})`).join(', ');
}

function yawRange(yawDeg: readonly number[]): string {
  const lo = Math.min(...yawDeg);
  const hi = Math.max(...yawDeg);
  return `${q(lo, 1, '°')} to ${q(hi, 1, '°')}, ${yawDeg.length} angles`;
}

export function geometryGroups(c: CaseFile, rhoKgPerM3: number, speedUnit: SpeedUnit): ReportGroup[] {
  if (!(rhoKgPerM3 > 0)) throw new RangeError(`geometryGroups: rhoKgPerM3 must be > 0, got ${rhoKgPerM3}`);
  const w = c.wheel;
  const s = w.spokes;
  const cond = c.conditions;
  const m = c.model;
  const cover = w.cover;
  const coverRows = [
    { label: 'Covered fraction', value: `${q(cover.fraction, 3, '')} (${q(cover.fraction * 100, 1, '%')})` },
    { label: 'Placement', value: PLACEMENT[cover.placement] ?? cover.placement },
    { label: 'Sides covered', value: cover.sides === 2 ? 'both (2)' : 'one (1)' },
  ];
  if (cover.placement === 'explicit') {
    coverRows.push({
      label: 'Cover radii',
      value: `${mm(cover.inner_radius_m ?? Number.NaN)} to ${mm(cover.outer_radius_m ?? Number.NaN)}`,
    });
  }
  const air =
    cond.air_density_kgpm3 !== undefined
      ? [{ label: 'Air density (set)', value: q(cond.air_density_kgpm3, 4, 'kg/m³') }]
      : [
          { label: 'Temperature', value: q(cond.temperature_c, 1, '°C') },
          cond.altitude_m !== undefined
            ? { label: 'Altitude', value: q(cond.altitude_m, 0, 'm') }
            : { label: 'Pressure', value: q(cond.pressure_pa ?? Number.NaN, 0, 'Pa') },
          { label: 'Relative humidity', value: q((cond.relative_humidity ?? 0) * 100, 0, '%') },
          { label: 'Air density', value: q(rhoKgPerM3, 4, 'kg/m³') },
        ];
  return [
    {
      title: 'Wheel',
      rows: [
        { label: 'Outer radius', value: mm(w.outer_radius_m) },
        { label: 'Tyre width', value: mm(w.tyre_width_m) },
        { label: 'Rim depth', value: mm(w.rim_depth_m) },
        { label: 'Rim width', value: mm(w.rim_width_m) },
        { label: 'Hub flange radius', value: mm(w.hub_flange_radius_m) },
        {
          label: 'Hub Ø × width',
          value: `${q(w.hub_shell_diameter_m * 1000, 1, '')} × ${mm(w.hub_shell_width_m)}`,
        },
      ],
    },
    {
      title: 'Spokes and cover',
      rows: [
        {
          label: 'Spokes',
          value:
            s.section === 'round'
              ? `${s.count} round, Ø ${mm(s.diameter_m, 2)}`
              : `${s.count} bladed, ${mm(s.width_m, 2)} × ${mm(s.thickness_m, 2)}`,
        },
        ...coverRows,
      ],
    },
    {
      title: 'Conditions',
      rows: [
        { label: 'Airspeed', value: speeds(cond.airspeed_mps, speedUnit) },
        { label: 'Yaw', value: yawRange(cond.yaw_deg) },
        {
          label: 'Ground speed',
          value: cond.ground_speed_mps === null ? '= airspeed' : q(cond.ground_speed_mps, 2, 'm/s'),
        },
        ...air,
      ],
    },
    {
      title: 'Steering axis and model',
      rows: [
        { label: 'Head angle', value: q(c.steering.head_angle_deg, 1, '°') },
        { label: 'Fork offset', value: mm(c.steering.fork_offset_m) },
        { label: 'Ground image', value: m.ground ? 'on' : 'off' },
        { label: 'Lattice span × chord', value: `${m.lattice_span} × ${m.lattice_chord}` },
        { label: 'Suction recovered', value: q(m.suction_recovered, 3, '') },
        { label: 'Porosity scale', value: q(m.porosity_scale, 3, '') },
        { label: 'Profile drag factor', value: q(m.profile_drag_factor, 3, '') },
        { label: 'One-sided spoke share', value: q(m.one_sided_cover_spoke_share, 3, '') },
        { label: 'Grid convergence', value: m.grid_convergence ? 'on' : 'off' },
      ],
    },
  ];
}
