import { buildWheelLattice, type WheelLattice } from '../lattice';

const CAPACITY = 6;
const cache = new Map<string, WheelLattice>();

/**
 * Wheel lattices by geometry, the most recently used kept (at most 6). A lattice depends on the
 * radius, ground, counts and the circles its panels follow (the open region's edges), so the yaw
 * angles, speeds, spokes and porosity of one wheel share it, as do the coarser refinements of a
 * convergence study when asked again. Deterministic: a lattice is a pure function of its key.
 */
export function cachedWheelLattice(
  radiusM: number,
  spanCount: number,
  chordCount: number,
  ground: boolean,
  openAnnuliM: ReadonlyArray<readonly [number, number]>,
): WheelLattice {
  const key = `${radiusM}|${spanCount}|${chordCount}|${ground ? 1 : 0}|${openAnnuliM.flat().join(',')}`;
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const lattice = buildWheelLattice({ radiusM, spanCount, chordCount, ground, openAnnuliM });
  cache.set(key, lattice);
  if (cache.size > CAPACITY) cache.delete(cache.keys().next().value as string);
  return lattice;
}
