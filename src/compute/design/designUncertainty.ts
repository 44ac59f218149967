/**
 * Lattice uncertainty of a design's ride figures: the figures computed on the evaluations' lattice and
 * on two coarser ones (each count divided by 1.5 and 2.25, as the solve's own convergence lattices in
 * src/model/wheel/surfaceCoefficients.ts), representative size h = sqrt(pi R^2 / panels), and the
 * grid convergence index of each figure (Celik et al. 2008, gridConvergenceIndex, Fs = 1.25). Where the
 * three values do not converge monotonically, the band is the conservative fallback of Roache (1994)
 * for an uncertain order: 3 x the largest relative change between the lattices.
 */
import { gridConvergenceIndex } from '../../model/convergence/gridConvergenceIndex';
import type { RideFile } from '../ride/index';
import { designContext, type LatticeCounts } from './designContext';
import { evaluateDesign } from './evaluateDesign';
import type { FigureUncertainty } from './studyTypes';
import type { DesignWheel } from './types';

/** The three lattices: the given counts and two coarsenings (each at least 4 x 2). */
export function convergenceLattices(fine: LatticeCounts): [LatticeCounts, LatticeCounts, LatticeCounts] {
  const coarsen = (f: number): LatticeCounts => ({
    span: Math.max(4, Math.round(fine.span / f)),
    chord: Math.max(2, Math.round(fine.chord / f)),
  });
  return [fine, coarsen(1.5), coarsen(2.25)];
}

export function designUncertainty(
  ride: RideFile,
  lattice: LatticeCounts | undefined,
  wheel: DesignWheel,
  fineFigures: Record<string, number>,
  ids: readonly string[],
): { figures: FigureUncertainty[]; evaluations: number } {
  const fine = lattice ?? { span: ride.model.lattice_span, chord: ride.model.lattice_chord };
  const levels = convergenceLattices(fine);
  const coarser = levels.slice(1).map((l) => evaluateDesign(designContext(ride, l), wheel, {}).objectives);
  const all = [fineFigures, ...coarser];
  const panels = levels.map((l) => l.span * l.chord) as [number, number, number];
  const area = Math.PI * wheel.outer_radius_m * wheel.outer_radius_m;
  const h = panels.map((n) => Math.sqrt(area / n));
  const figures = ids.map((id): FigureUncertainty => {
    const values = all.map((o) => o[id] ?? Number.NaN) as [number, number, number];
    const base = { id, values, panels };
    if (!(h[0]! < h[1]! && h[1]! < h[2]!)) {
      return {
        ...base,
        status: 'lattice too coarse to refine',
        observedOrder: Number.NaN,
        relative: Number.NaN,
        absolute: Number.NaN,
      };
    }
    const g = gridConvergenceIndex({
      h1: h[0]!,
      h2: h[1]!,
      h3: h[2]!,
      phi1: values[0],
      phi2: values[1],
      phi3: values[2],
    });
    const scale = Math.abs(values[0]);
    let relative = g.gciRelative;
    if (g.status === 'identical') relative = 0;
    else if (g.status !== 'monotonic') {
      relative =
        (3 * Math.max(Math.abs(values[0] - values[1]), Math.abs(values[1] - values[2]))) /
        Math.max(scale, 1e-300);
    }
    return {
      ...base,
      status: g.status,
      observedOrder: g.observedOrder,
      relative,
      absolute: relative * scale,
    };
  });
  return { figures, evaluations: 2 * coarser.length };
}
