/**
 * The WebAssembly SIMD panel factorisation, block-row solve and trailing update of `luFactor` (source:
 * luKernel.wat, bytes: luKernelWasm.ts), instantiated once per thread on first use. Returns null where WebAssembly or its SIMD is missing, or
 * where the page's Content-Security-Policy forbids compiling it: `luFactor` then runs the plain
 * TypeScript path, which gives the same bits.
 */
import { LU_KERNEL_WASM_BASE64 } from './luKernelWasm';
import { simdInstance } from './simdInstance';

export interface LuKernel {
  memory: WebAssembly.Memory;
  /** A22 -= L21 U12 on the matrix at byte 0 (see luKernel.wat for the rows, columns and p covered). */
  update: (n: number, k0: number, kEnd: number, c1: number) => void;
  /** The block-row solve U12 = L11^-1 A12 of rows k0..kEnd-1, columns kEnd..c1-1 (see luKernel.wat). */
  blockRow: (n: number, k0: number, kEnd: number, c1: number) => void;
  /** Panel factorisation of columns k0..kEnd-1, pivots at byte `piv`: -1, or the singular column. */
  panel: (n: number, k0: number, kEnd: number, piv: number) => number;
  /** Index of the first element of the matrix at byte 0 (count values) that is not finite, or -1. */
  firstNonFinite: (count: number) => number;
}

let kernel: LuKernel | null | undefined;

export function luKernel(): LuKernel | null {
  if (kernel !== undefined) return kernel;
  const instance = simdInstance(LU_KERNEL_WASM_BASE64);
  kernel = instance === null ? null : (instance.exports as unknown as LuKernel);
  if (kernel !== null) {
    const { memory, update, blockRow, panel, firstNonFinite } = kernel;
    kernel = { memory, update, blockRow, panel, firstNonFinite };
  }
  return kernel;
}
