import { buildDiscLattice } from '../lattice';
import type { DiscLattice } from '../lattice/types';

const CAPACITY = 6;
const cache = new Map<string, DiscLattice>();

/**
 * Disc lattices by geometry, most recently used kept (at most 6). Building the influence matrix is
 * the costly geometric step and depends only on radius, ground and lattice counts, so every cover,
 * rim depth, spoke set, yaw angle and speed of one wheel size share it. Deterministic: a lattice is a
 * pure function of its key.
 */
export function cachedDiscLattice(radiusM: number, spanCount: number, chordCount: number, ground: boolean): DiscLattice {
  const key = `${radiusM}|${spanCount}|${chordCount}|${ground ? 1 : 0}`;
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const lattice = buildDiscLattice({ radiusM, spanCount, chordCount, ground });
  cache.set(key, lattice);
  if (cache.size > CAPACITY) cache.delete(cache.keys().next().value as string);
  return lattice;
}
