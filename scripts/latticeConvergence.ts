/**
 * Prints README's lattice-convergence tables: the side-force slope per rad of the demo wheel's rows at
 * 16 x 8, 24 x 12 (default), 48 x 24 and 80 x 40, on the aligned lattice (the default: panels follow the
 * design's region circles) and on the fixed lattice (options.fixedLattice: one lattice per radius and
 * counts, regions in the boundary condition); then, over 42 designs of the demo wheel (rim depth 20-90 mm
 * x rim-cover fraction 0-0.85), each lattice's error at 24 x 12 (and the fixed one's at 28 x 14 and
 * 32 x 16) against the aligned lattice at 48 x 24: side-force slope, suction slope and the inner edge's
 * suction share. Usage: npx tsx scripts/latticeConvergence.ts
 */
import { DEFAULT_MODEL_OPTIONS, DEMO_WHEEL, surfaceCoefficients, wheelRadii } from '../src/model/wheel';
import type { WheelGeometry } from '../src/model/wheel/types';

const solve = (wheel: WheelGeometry, fixed: boolean, span: number, chord: number, ground = true) =>
  surfaceCoefficients(
    wheel,
    wheelRadii(wheel),
    {
      ...DEFAULT_MODEL_OPTIONS,
      ground,
      gridConvergence: false,
      fixedLattice: fixed,
      latticeSpanCount: span,
      latticeChordCount: chord,
    },
    1,
  );

const rows: Array<[string, Partial<WheelGeometry>, boolean]> = [
  ['fully covered demo wheel without ground', { coverFraction: 1 }, false],
  ['fully covered demo wheel', { coverFraction: 1 }, true],
  ['spoked, no cover', {}, true],
  ['40% rim cover', { coverFraction: 0.4 }, true],
  ['40% hub cover', { coverFraction: 0.4, coverPlacement: 'hub' }, true],
  ['spoked, 90 mm rim', { rimDepthM: 0.09 }, true],
];
const sizes = [
  [16, 8],
  [24, 12],
  [48, 24],
  [80, 40],
] as const;
for (const fixed of [false, true]) {
  console.log(
    `\n${fixed ? 'fixed' : 'aligned'} lattice | ${sizes.map(([s, c]) => `${s} x ${c}`).join(' | ')}`,
  );
  for (const [name, patch, ground] of rows) {
    const wheel = { ...DEMO_WHEEL, ...patch };
    const values = sizes.map(([s, c]) => solve(wheel, fixed, s, c, ground).normalSlope.toFixed(4));
    console.log(`| ${name} | ${values.join(' | ')} |`);
  }
}

const designs: WheelGeometry[] = [];
for (const rimDepthM of [0.02, 0.035, 0.05, 0.065, 0.08, 0.09]) {
  for (const coverFraction of [0, 0.1, 0.25, 0.4, 0.55, 0.7, 0.85]) {
    designs.push({ ...DEMO_WHEEL, rimDepthM, coverFraction });
  }
}
const reference = designs.map((w) => solve(w, false, 48, 24));
console.log('\nover 42 designs against the aligned 48 x 24: RMS and max |error|');
console.log('| lattice | side-force slope (%) | suction slope (%) | inner-edge share (abs.) |');
for (const [fixed, span, chord] of [
  [false, 24, 12],
  [true, 24, 12],
  [true, 28, 14],
  [true, 32, 16],
] as const) {
  const e = designs.map((w, i) => {
    const c = solve(w, fixed, span, chord);
    const r = reference[i]!;
    return [
      (100 * (c.normalSlope - r.normalSlope)) / r.normalSlope,
      (100 * (c.suctionSlope - r.suctionSlope)) / r.suctionSlope,
      c.innerEdgeShare - r.innerEdgeShare,
    ];
  });
  const stat = (k: number) => {
    const v = e.map((x) => x[k]!);
    const rms = Math.sqrt(v.reduce((a, b) => a + b * b, 0) / v.length);
    return `${rms.toFixed(k === 2 ? 3 : 2)} / ${Math.max(...v.map(Math.abs)).toFixed(k === 2 ? 3 : 2)}`;
  };
  console.log(`| ${fixed ? 'fixed' : 'aligned'} ${span} x ${chord} | ${stat(0)} | ${stat(1)} | ${stat(2)} |`);
}
