import { buildWheelLattice, type WheelLattice } from '../lattice';

const CAPACITY = 6;
/** The fixed lattice's (empty) list of circles: pass it for the lattice shared by every design. */
export const FIXED: ReadonlyArray<readonly [number, number]> = Object.freeze([]);
const cache = new Map<string, WheelLattice>();
/** The influence arrays of evicted lattices, oldest first, for the next builds (at most SPARE_COUNT
 * arrays and SPARE_ENTRIES values in all): a fresh n x n array costs its zeroing and the page faults
 * of new memory, measured as much as a third of a lattice build (README, Performance). */
const spare: Float64Array[] = [];
const SPARE_COUNT = 3;
const SPARE_ENTRIES = 2 ** 21;
/** What an evicted lattice holds instead of its influence matrix (assembleSystem rejects it). */
const EVICTED = new Float64Array(0);

function spareInfluence(entries: number): Float64Array {
  for (let i = 0; i < spare.length; i++) {
    const a = spare[i]!;
    if (a.length === entries) {
      spare.splice(i, 1);
      return a;
    }
  }
  return new Float64Array(entries);
}

/** Takes the oldest lattice out of the cache and keeps its influence array for a later build; the
 * lattice itself keeps its geometry but no longer its matrix. */
function evictOldest(): void {
  const key = cache.keys().next().value as string;
  const old = cache.get(key)!;
  cache.delete(key);
  spare.push(old.influence);
  old.influence = EVICTED;
  let entries = 0;
  for (const a of spare) entries += a.length;
  while (spare.length > SPARE_COUNT || entries > SPARE_ENTRIES) entries -= spare.shift()!.length;
}

/** Chordwise clustering of the fixed lattice (buildWheelLattice's chordClustering): the panels along a
 * strip closer together at its ends, where the tyre, rim and their edges sit in every design. Chosen by
 * measurement (README, lattice convergence): over 42 designs of the demo wheel at 24 x 12 it cut the
 * side-force slope's RMS error against a 48 x 24 aligned lattice from 2.2 % to 1.8 % (max 8.9 % to
 * 6.0 %) and moves the plain solid disc's slope by at most 0.02 %. */
export const FIXED_CHORD_CLUSTERING = 0.5;

/**
 * Wheel lattices by geometry, the most recently used kept (at most 6). A lattice depends on the
 * radius, ground, counts and the circles its panels follow (the open region's edges), so the yaw
 * angles, speeds, spokes and porosity of one wheel share it, as do the coarser refinements of a
 * convergence study when asked again. The fixed lattice (`FIXED`: no circles, chordwise clustering;
 * options.fixedLattice) has one key per radius, counts and ground and serves every design of the
 * radius, with its influence matrix. Deterministic: a lattice is a pure function of its key.
 * A lattice is lent, not given: use it within the call that got it. When it leaves the cache (six
 * newer lattices later) its influence array goes to a later build and it keeps an empty one.
 */
export function cachedWheelLattice(
  radiusM: number,
  spanCount: number,
  chordCount: number,
  ground: boolean,
  openAnnuliM: ReadonlyArray<readonly [number, number]>,
): WheelLattice {
  const fixed = openAnnuliM === FIXED;
  const key = `${radiusM}|${spanCount}|${chordCount}|${ground ? 1 : 0}|${fixed ? 'fixed' : openAnnuliM.flat().join(',')}`;
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const lattice = buildWheelLattice({
    radiusM,
    spanCount,
    chordCount,
    ground,
    openAnnuliM,
    chordClustering: fixed ? FIXED_CHORD_CLUSTERING : 0,
    influenceArray: spareInfluence,
  });
  cache.set(key, lattice);
  if (cache.size > CAPACITY) evictOldest();
  return lattice;
}
