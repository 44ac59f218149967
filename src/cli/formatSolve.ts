/** `coversweep solve --format table`: the result document as a readable summary (JSON stays the default). */
import type { ResultDocument } from '../compute/caseFile';
import { displayNumber } from '../compute/displayNumber';
import { mpsToKmh } from '../compute/units';
import { bullets, num, table } from './formatTable';

export function formatSolveTable(doc: ResultDocument): string {
  const c = doc.case;
  const refKmh = displayNumber(mpsToKmh(doc.reference_speed_mps));
  const rows = doc.results.map((r) => [
    num(r.airspeed_mps, 6),
    r.airspeed_mps === null ? '-' : num(mpsToKmh(r.airspeed_mps), 6),
    num(r.yaw_deg, 6),
    num(r.axial_N),
    num(r.side_N),
    num(r.wind_drag_N),
    num(r.cda_axial_cm2),
    num(r.axial_gf_ref),
    num(r.yaw_moment_Nm),
    num(r.steering_moment_Nm),
    num(r.power_W),
    num(r.uncertainty.axial_N, 2),
    r.flags.length > 0 ? r.flags.join(',') : '',
  ]);
  const header = [
    'airspeed',
    '',
    'yaw',
    'axial',
    'side',
    'wind drag',
    'CdA',
    `drag @${num(refKmh, 6)}`,
    'yaw moment',
    'steering',
    'power',
    '+-axial',
    'flags',
  ];
  const units = ['m/s', 'km/h', 'deg', 'N', 'N', 'N', 'cm^2', 'gf', 'N m', 'N m', 'W', 'N', ''];
  const s = doc.surface;
  return (
    `${c.name ?? 'case'}: ${doc.results.length} operating point(s), air ${num(doc.results[0]?.air_density_kgpm3 ?? null)} kg/m^3\n` +
    `wheel: outer radius ${num(c.wheel.outer_radius_m)} m, rim depth ${num(c.wheel.rim_depth_m)} m, ${c.wheel.spokes.count} spokes, cover ${num(c.wheel.cover.fraction)} (${c.wheel.cover.placement}, ${c.wheel.cover.sides} side(s))\n` +
    `lifting surface: side slope ${num(s.side_slope_per_rad)} per rad, ${s.panels ?? '-'} panels${s.convergence?.gci_relative != null ? `, lattice GCI ${num(100 * s.convergence.gci_relative, 2)}%` : ''}\n\n` +
    table(header, rows, units) +
    "\naxial = along the direction of travel (not wind-axis drag), positive resisting motion; side > 0 pushes the wheel to the rider's left; yaw > 0 is wind from the rider's right.\n" +
    `Notes:\n${bullets(doc.notes)}`
  );
}
