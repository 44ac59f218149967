/**
 * Instantiates a WebAssembly module given as base64 (the kernels built by scripts/buildLuKernel.mjs).
 * Null where WebAssembly or its SIMD is missing, or where the page's Content-Security-Policy forbids
 * compiling it (no 'wasm-unsafe-eval'): the callers then run their plain TypeScript path, which gives
 * the same bits.
 */
export function simdInstance(base64: string): WebAssembly.Instance | null {
  try {
    if (typeof WebAssembly !== 'object' || typeof atob !== 'function') return null;
    const binary = atob(base64);
    const bytes = new Uint8Array(binary.length);
    for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
    return new WebAssembly.Instance(new WebAssembly.Module(bytes), {});
  } catch {
    return null;
  }
}

/** Grows a WebAssembly memory to at least `bytes`; false when the engine refuses. */
export function ensureMemory(memory: WebAssembly.Memory, bytes: number): boolean {
  const have = memory.buffer.byteLength;
  if (have >= bytes) return true;
  try {
    memory.grow(Math.ceil((bytes - have) / 65536));
    return true;
  } catch {
    return false;
  }
}
