import { influenceMatrix } from './influenceMatrix';
import type { StripLattice } from './types';

/** Planform of a strip lattice: strip edges and the chord of each edge line and control station. */
export interface StripLatticeSpec {
  /** Strip edges in z (m), strictly increasing, spanCount + 1 values. */
  edgeZ: Float64Array;
  /** Leading-edge x (m) and chord (m, >= 0) on each strip edge line. */
  edgeLeadingX: Float64Array;
  edgeChordM: Float64Array;
  /** Spanwise station of each strip's control points (m, strictly inside the strip). */
  controlZ: Float64Array;
  /** Leading-edge x (m) and chord (m, > 0) of the strip at its control station. */
  controlLeadingX: Float64Array;
  controlChordM: Float64Array;
  /** Chordwise panel edges as fractions of the local chord: 0 = f_0 < f_1 < ... < f_M = 1. */
  chordFractions: Float64Array;
  /** Ground plane height (m) for the mirror image; NaN for none. */
  groundZM: number;
  referenceAreaM2: number;
}

/**
 * Builds a planar vortex-ring lattice of strips (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed.,
 * sec. 12.3): on each strip edge line the ring corners sit at the quarter chord of each panel
 * (the last ring's trailing corners a quarter panel behind the trailing edge, where the wake legs
 * start); each control point is at its panel's three-quarter chord, evaluated with the strip's
 * chord at the control station. Panels are the trapezoids between edge lines; the load acts at
 * the middle of the bound (leading) segment. Also fills the influence matrix.
 */
export function buildStripLattice(spec: StripLatticeSpec): StripLattice {
  const { edgeZ, edgeLeadingX, edgeChordM, controlZ, controlLeadingX, controlChordM, chordFractions } = spec;
  const spanCount = edgeZ.length - 1;
  const chordCount = chordFractions.length - 1;
  if (spanCount < 1) throw new RangeError(`buildStripLattice: edgeZ.length=${edgeZ.length} must be >= 2`);
  if (chordCount < 1) {
    throw new RangeError(`buildStripLattice: chordFractions.length=${chordFractions.length} must be >= 2`);
  }
  if (edgeLeadingX.length !== spanCount + 1 || edgeChordM.length !== spanCount + 1) {
    throw new RangeError(`buildStripLattice: edge arrays must have edgeZ.length=${spanCount + 1} values`);
  }
  if (
    controlZ.length !== spanCount ||
    controlLeadingX.length !== spanCount ||
    controlChordM.length !== spanCount
  ) {
    throw new RangeError(`buildStripLattice: control arrays must have spanCount=${spanCount} values`);
  }
  if (chordFractions[0] !== 0 || chordFractions[chordCount] !== 1) {
    throw new RangeError(
      `buildStripLattice: chordFractions must run from 0 to 1, got ${chordFractions[0]}..${chordFractions[chordCount]}`,
    );
  }
  for (let m = 0; m < chordCount; m++) {
    if (!(chordFractions[m + 1]! > chordFractions[m]!)) {
      throw new RangeError(
        `buildStripLattice: chordFractions[${m + 1}]=${chordFractions[m + 1]} must increase`,
      );
    }
  }
  for (let k = 0; k <= spanCount; k++) {
    if (!Number.isFinite(edgeZ[k]!) || !Number.isFinite(edgeLeadingX[k]!) || !(edgeChordM[k]! >= 0)) {
      throw new RangeError(
        `buildStripLattice: edge ${k} (z=${edgeZ[k]}, x=${edgeLeadingX[k]}, chord=${edgeChordM[k]}) must be finite with chord >= 0`,
      );
    }
    if (k > 0 && !(edgeZ[k]! > edgeZ[k - 1]!)) {
      throw new RangeError(
        `buildStripLattice: edgeZ[${k}]=${edgeZ[k]} must exceed edgeZ[${k - 1}]=${edgeZ[k - 1]}`,
      );
    }
  }
  for (let s = 0; s < spanCount; s++) {
    if (!(controlZ[s]! > edgeZ[s]! && controlZ[s]! < edgeZ[s + 1]!)) {
      throw new RangeError(
        `buildStripLattice: controlZ[${s}]=${controlZ[s]} must lie strictly inside its strip`,
      );
    }
    if (!(edgeChordM[s]! + edgeChordM[s + 1]! > 0)) {
      throw new RangeError(
        `buildStripLattice: strip ${s} has zero chord on both edges (its area must be > 0)`,
      );
    }
    if (!(controlChordM[s]! > 0) || !Number.isFinite(controlLeadingX[s]!)) {
      throw new RangeError(
        `buildStripLattice: controlChordM[${s}]=${controlChordM[s]} must be > 0 and finite`,
      );
    }
  }
  if (!(spec.referenceAreaM2 > 0)) {
    throw new RangeError(`buildStripLattice: referenceAreaM2=${spec.referenceAreaM2} must be > 0`);
  }
  if (!Number.isNaN(spec.groundZM) && !(spec.groundZM <= edgeZ[0]!)) {
    throw new RangeError(
      `buildStripLattice: groundZM=${spec.groundZM} must be NaN (no ground) or at or below edgeZ[0]=${edgeZ[0]}`,
    );
  }

  const cols = chordCount + 1;
  const n = spanCount * chordCount;
  // Vortex line positions in chord fraction: each panel's quarter chord, then the wake start.
  const lineFraction = new Float64Array(cols);
  for (let m = 0; m < chordCount; m++) {
    lineFraction[m] = chordFractions[m]! + 0.25 * (chordFractions[m + 1]! - chordFractions[m]!);
  }
  lineFraction[chordCount] = 1 + 0.25 * (chordFractions[chordCount]! - chordFractions[chordCount - 1]!);
  const nodeX = new Float64Array((spanCount + 1) * cols);
  for (let k = 0; k <= spanCount; k++) {
    for (let m = 0; m < cols; m++) {
      nodeX[k * cols + m] = edgeLeadingX[k]! - lineFraction[m]! * edgeChordM[k]!;
    }
  }

  const controlX = new Float64Array(n);
  const controlZOut = new Float64Array(n);
  const boundX = new Float64Array(n);
  const boundZ = new Float64Array(n);
  const centroidX = new Float64Array(n);
  const centroidZ = new Float64Array(n);
  const areaM2 = new Float64Array(n);
  const spanWidthM = new Float64Array(n);
  const chordLengthM = new Float64Array(n);
  for (let s = 0; s < spanCount; s++) {
    const z0 = edgeZ[s]!;
    const z1 = edgeZ[s + 1]!;
    const width = z1 - z0;
    for (let c = 0; c < chordCount; c++) {
      const p = s * chordCount + c;
      const f0 = chordFractions[c]!;
      const f1 = chordFractions[c + 1]!;
      controlX[p] = controlLeadingX[s]! - (f0 + 0.75 * (f1 - f0)) * controlChordM[s]!;
      controlZOut[p] = controlZ[s]!;
      boundX[p] = 0.5 * (nodeX[s * cols + c]! + nodeX[(s + 1) * cols + c]!);
      boundZ[p] = 0.5 * (z0 + z1);
      // Trapezoid with sides parallel to x: lower side [xa1, xa0] at z0, upper [xb1, xb0] at z1.
      const xa0 = edgeLeadingX[s]! - f0 * edgeChordM[s]!;
      const xa1 = edgeLeadingX[s]! - f1 * edgeChordM[s]!;
      const xb0 = edgeLeadingX[s + 1]! - f0 * edgeChordM[s + 1]!;
      const xb1 = edgeLeadingX[s + 1]! - f1 * edgeChordM[s + 1]!;
      const la = xa0 - xa1;
      const lb = xb0 - xb1;
      const area = 0.5 * (la + lb) * width;
      areaM2[p] = area;
      spanWidthM[p] = width;
      chordLengthM[p] = 0.5 * (la + lb);
      // Centroid of a trapezoid: weights of the two parallel sides (Bronshtein, Handbook of Mathematics).
      const ma = 0.5 * (xa0 + xa1);
      const mb = 0.5 * (xb0 + xb1);
      const sum = la + lb;
      centroidZ[p] = z0 + (width * (la + 2 * lb)) / (3 * sum);
      centroidX[p] = (ma * (2 * la + lb) + mb * (la + 2 * lb)) / (3 * sum);
    }
  }
  // Adjacent strips share corners: strip s's lower corners are edge s's, its upper ones edge s + 1's.
  const nodeLowerX = nodeX.slice(0, spanCount * cols);
  const nodeUpperX = nodeX.slice(cols);
  const influence = new Float64Array(n * n);
  influenceMatrix(edgeZ, nodeX, chordCount, controlX, controlZOut, spec.groundZM, influence);
  return {
    spanCount,
    chordCount,
    panelCount: n,
    referenceAreaM2: spec.referenceAreaM2,
    groundZM: spec.groundZM,
    edgeZ: Float64Array.from(edgeZ),
    nodeX,
    nodeLowerX,
    nodeUpperX,
    controlX,
    controlZ: controlZOut,
    boundX,
    boundZ,
    centroidX,
    centroidZ,
    areaM2,
    spanWidthM,
    chordLengthM,
    influence,
  };
}
