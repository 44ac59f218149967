import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { buildWheelLattice, type WheelLatticeOptions } from '../../../src/model/lattice';
import { seededUniform } from '../numeric/seeded';

/** Varied lattices: random radius, counts, ground, clustering, open-panel weight and up to three open
 * annuli (some touching the hub or the rim), from a fixed seed. */
function cases(count: number): WheelLatticeOptions[] {
  const next = seededUniform(20261202);
  const out: WheelLatticeOptions[] = [];
  for (let c = 0; c < count; c++) {
    const R = 0.2 + 0.2 * next();
    const annuli: Array<[number, number]> = [];
    let from = 0;
    const wanted = Math.floor(4 * next());
    for (let i = 0; i < wanted && from < R; i++) {
      const a = from + 0.5 * (R - from) * next();
      const b = a + (R - a) * next();
      if (b > a) annuli.push([next() < 0.2 ? 0 : a, next() < 0.1 ? R : b]);
      from = b;
    }
    out.push({
      radiusM: R,
      spanCount: 2 + Math.floor(30 * next()),
      chordCount: 1 + Math.floor(16 * next()),
      ground: next() < 0.6,
      openAnnuliM: annuli,
      chordClustering: next() < 0.3 ? next() : 0,
      openPanelWeight: next() < 0.3 ? 0.1 + 0.9 * next() : 0.35,
    });
  }
  return out;
}

describe('buildWheelLattice bits', () => {
  it('gives the bits of the original (closure and array based) build on 400 varied lattices', () => {
    // SHA-256 of every case's counts and arrays (geometry and influence matrix), computed with the
    // build as it stood before its scratch-array rewrite (main at e3fd30c, same cases). The rewrite
    // keeps every floating-point operation and its order, so any change of a bit changes the digest.
    const hash = createHash('sha256');
    for (const options of cases(400)) {
      const l = buildWheelLattice(options);
      hash.update(new Float64Array([l.spanCount, l.chordCount, l.panelCount, l.groundZM]));
      for (const a of [
        l.edgeZ,
        l.nodeLowerX,
        l.nodeUpperX,
        l.panelEdgeLowerX,
        l.panelEdgeUpperX,
        l.controlX,
        l.controlZ,
        l.boundX,
        l.boundZ,
        l.centroidX,
        l.centroidZ,
        l.areaM2,
        l.spanWidthM,
        l.chordLengthM,
        l.influence,
      ]) {
        hash.update(new Uint8Array(a.buffer, a.byteOffset, a.byteLength));
      }
    }
    expect(hash.digest('hex')).toBe('3ec0821050db0bd65c8bd20c9f40906bd126fd95ac5bc8ebe988bc042b4a9080');
  });
});
