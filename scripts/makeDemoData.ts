/**
 * Regenerates public/demo/demo-tunnel.csv: invented "measurements" of the invented demo wheel, made
 * from the model itself with known parameters (porosity_scale 1.3, suction_recovered 0.35,
 * profile_drag_factor 1.15) plus Gaussian noise, written in deliberately mixed units, so that
 * `coversweep compare --calibrate` has something to find. Run after a model change:
 *   npx tsx scripts/makeDemoData.ts
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { caseToModelInput, parseCaseFile } from '../src/compute/caseFile';
import { NEWTONS_PER_LBF } from '../src/compute/compare/quantities';
import { G0_MPS2, kmhToMps } from '../src/compute/units';
import { mulberry32 } from '../src/model/random';
import { solveWheel } from '../src/model/wheel';

const parsed = parseCaseFile(readFileSync('public/demo/demo-case.json', 'utf8'));
if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
const speedsKmh = [30, 40, 50];
const yawsDeg = [-5, 0, 2.5, 5, 7.5, 10, 12.5, 15, 17.5, 20];
const base = caseToModelInput(parsed.value);
const input = {
  ...base,
  options: { ...base.options, porosityScale: 1.3, suctionRecovered: 0.35, profileDragFactor: 1.15 },
  points: speedsKmh.flatMap((kmh) =>
    yawsDeg.map((yawDeg) => ({
      ...base.points[0]!,
      airspeedMps: kmhToMps(kmh),
      groundSpeedMps: kmhToMps(kmh),
      yawRad: (yawDeg * Math.PI) / 180,
    })),
  ),
};
const solution = solveWheel(input);
// Gaussian noise by the Box-Muller transform (Box & Muller 1958) on a seeded generator.
const uniform = mulberry32(20240611);
const gaussian = () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
const lines = [
  '# Invented demo data for CoverSweep (not a real wheel, not a real tunnel): "Demo 50 mm half-cover".',
  '# Deliberately mixed units: speed in km/h, drag in grams-force, side force in pounds-force, yaw moment in N m.',
  'Yaw [deg],Speed [km/h],Drag [g],Side force [lbf],Yaw moment [N m]',
];
solution.points.forEach((p, i) => {
  const kmh = speedsKmh[Math.floor(i / yawsDeg.length)]!;
  const yawDeg = yawsDeg[i % yawsDeg.length]!;
  const dragN = p.axialN + 0.01 * gaussian();
  const sideN = p.sideN + 0.03 * gaussian();
  const yawMomentNm = p.yawMomentNm + 0.004 * gaussian();
  lines.push(
    [
      yawDeg.toFixed(1),
      String(kmh),
      ((dragN / G0_MPS2) * 1000).toFixed(1),
      (sideN / NEWTONS_PER_LBF).toFixed(4),
      yawMomentNm.toFixed(4),
    ].join(','),
  );
});
writeFileSync('public/demo/demo-tunnel.csv', `${lines.join('\n')}\n`);
console.log(`wrote public/demo/demo-tunnel.csv (${solution.points.length} rows)`);
