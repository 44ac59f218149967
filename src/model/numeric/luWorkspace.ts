import { luKernel } from './luKernel';
import { ensureMemory } from './simdInstance';

/** luFactor's panel width: the kernel's update packs two rows of this many multipliers. */
export const LU_OUTER_BLOCK = 32;
/** Below this order the copy into the kernel's memory costs more than SIMD saves. */
export const LU_WASM_MIN_N = 16;
/**
 * Above this order 'auto' keeps to TypeScript: the kernel's memory (a copy of the matrix) only grows,
 * and a thread should not hold on to more than 32 MiB for it (n = 2048).
 */
export const LU_WASM_MAX_N = 2048;

/** Byte offset of the pivots in the LU kernel's memory for order n: after the matrix (byte 0) and,
 * from byte n n 8 + 64, the two rows of multipliers packed by the kernel's update. */
export function luPivotsAt(n: number): number {
  return n * n * 8 + 64 + 16 * LU_OUTER_BLOCK;
}

/**
 * The n x n matrix of the LU kernel's memory (byte 0), for a caller to fill and hand to `luFactor`,
 * which then factorises it where it lies, with no copy in or out; the factors stay there for `luSolve`
 * until the next `luFactor` or `luWorkspace` call on this thread. Null where `luFactor` (path 'auto')
 * runs TypeScript for this order: no WebAssembly SIMD, n outside [LU_WASM_MIN_N, LU_WASM_MAX_N], or a
 * memory that cannot grow. The view is the kernel's scratch: never keep it, nor anything made from it.
 */
export function luWorkspace(n: number): Float64Array | null {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`luWorkspace: n=${n} must be a positive integer`);
  if (n < LU_WASM_MIN_N || n > LU_WASM_MAX_N) return null;
  const kernel = luKernel();
  if (kernel === null || !ensureMemory(kernel.memory, luPivotsAt(n) + 4 * n)) return null;
  return new Float64Array(kernel.memory.buffer, 0, n * n);
}
