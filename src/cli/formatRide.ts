/** `coversweep ride --format table`: the ride result as a readable summary (JSON stays the default). */
import type { Pair, RideDocument } from '../compute/ride/index';
import { mpsToKmh } from '../compute/units';
import { bullets, fixed, num, table } from './formatTable';

function clock(seconds: number | null): string {
  if (seconds === null || !Number.isFinite(seconds)) return '-';
  const h = Math.floor(seconds / 3600);
  const m = Math.floor((seconds - 3600 * h) / 60);
  const s = seconds - 3600 * h - 60 * m;
  return `${h}:${String(m).padStart(2, '0')}:${s.toFixed(1).padStart(4, '0')}`;
}

function row(what: string, p: Pair, unit: string, digits = 4, scale = 1): string[] {
  const d = p.design === null ? null : p.design * scale;
  const b = p.baseline === null ? null : p.baseline * scale;
  return [what, num(d, digits), num(b, digits), d !== null && b !== null ? num(d - b, 3) : '-', unit];
}

export function formatRideTable(doc: RideDocument): string {
  const kmh = (v: number | null) => (v === null ? '-' : num(mpsToKmh(v), 4));
  const rows: string[][] = [
    row(`power at ${kmh(doc.constant_speed_mps)} km/h`, doc.power_W, 'W'),
    [
      `time at ${num(doc.constant_power_W)} W over ${num((doc.distance_m ?? 0) / 1000)} km`,
      clock(doc.time_s.design),
      clock(doc.time_s.baseline),
      doc.delta_time_s === null ? '-' : `${fixed(doc.delta_time_s, 1)} s`,
      'h:mm:ss',
    ],
    row('mean speed', doc.speed_mps, 'km/h', 4, 3.6),
    row('wind-averaged axial drag', doc.wind_averaged_axial_N, 'N'),
    row('wind-averaged drag area', doc.wind_averaged_cda_m2, 'cm^2', 4, 1e4),
    row('wind-averaged side force', doc.wind_averaged_side_N, 'N'),
    row('lean in the worst gust', doc.lean_deg, 'deg', 3),
    row('gust impulse', doc.gust_impulse_Ns, 'N s', 3),
    row('gust yaw', doc.gust.yaw_deg, 'deg', 3),
  ];
  if (doc.steering) {
    rows.push(
      row(
        'steering moment slope',
        {
          design: doc.steering.design.slope_Nm_per_deg,
          baseline: doc.steering.baseline.slope_Nm_per_deg,
        },
        'N m/deg',
        3,
      ),
    );
  }
  const header = ['', 'design', 'baseline', 'difference', 'unit'];
  const windLine =
    doc.wind.mean_speed_mps === null
      ? 'no wind'
      : `wind ${num(doc.wind.mean_speed_mps, 3)} m/s at the reference height, ${num(doc.wind.hub_mean_speed_mps, 3)} m/s at the hub (x${num(doc.wind.hub_speed_factor, 3)})`;
  return (
    `${doc.ride.name ?? 'ride'}\n` +
    `${doc.position} wheel; air ${num(doc.air_density_kgpm3)} kg/m^3; ${windLine}; yaw at the hub: mean ${num(doc.yaw_mean_deg, 3)} deg, 90% of the time below ${num(doc.yaw_p90_deg, 3)} deg\n\n` +
    table(header, rows) +
    (doc.flags.length > 0 ? `\nFlags:\n${bullets(doc.flags)}` : '') +
    `\nCautions:\n${bullets(doc.cautions)}`
  );
}
