/**
 * Mulberry32: a 32-bit-state pseudo-random generator (T. Ettinger, 2017, public-domain C source
 * "mulberry32"; a Weyl sequence with increment 0x6D2B79F5 followed by an xorshift-multiply output
 * mix in the style of SplitMix, Steele, Lea & Flood 2014, OOPSLA). Period 2^32, one draw per call.
 * Used for reproducible Monte Carlo: the same seed gives the same sequence on every platform
 * (only 32-bit integer arithmetic: Math.imul, shifts).
 */

/** Returns a generator of uniform numbers in [0, 1) (multiples of 2^-32) from a 32-bit seed.
 * @throws RangeError when seed is not an integer in [0, 2^32).
 */
export function mulberry32(seed: number): () => number {
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    throw new RangeError(`seed=${seed}: must be an integer in [0, 4294967295]`);
  }
  let state = seed | 0;
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), state | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
