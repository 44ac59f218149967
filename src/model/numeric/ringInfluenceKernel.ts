/**
 * The WebAssembly SIMD influence matrix of a planar vortex-ring lattice (source: ringInfluenceKernel.wat,
 * bytes: ringInfluenceKernelWasm.ts), instantiated once per thread on first use; the inputs are copied
 * into its memory and the matrix out of it. Same arguments and the same bits as the TypeScript loops of
 * `ringInfluenceMatrix` (which checks the arguments and computes `shared`); false where WebAssembly SIMD
 * is missing, its memory cannot grow or the order is above WASM_MAX_N, and the caller then runs those
 * loops.
 */
import { RING_INFLUENCE_KERNEL_WASM_BASE64 } from './ringInfluenceKernelWasm';
import { ensureMemory, simdInstance } from './simdInstance';

interface RingInfluenceKernel {
  memory: WebAssembly.Memory;
  build: (
    spanCount: number,
    chordCount: number,
    ground: number,
    g2: number,
    out: number,
    edgeZ: number,
    lowerX: number,
    upperX: number,
    ctrlX: number,
    ctrlZ: number,
    shared: number,
    work: number,
  ) => void;
}

/**
 * Above this order the TypeScript loops run instead: the kernel's memory (a copy of the matrix) only
 * grows, and a thread should not hold on to more than about 32 MiB for it (as luFactor's WASM_MAX_N).
 */
const WASM_MAX_N = 2048;

let kernel: RingInfluenceKernel | null | undefined;

function ringInfluenceKernel(): RingInfluenceKernel | null {
  if (kernel === undefined) {
    const instance = simdInstance(RING_INFLUENCE_KERNEL_WASM_BASE64);
    kernel = instance === null ? null : (instance.exports as unknown as RingInfluenceKernel);
  }
  return kernel;
}

/** Byte offsets of the kernel's inputs, output and work space (each a multiple of 16). */
function layout(spanCount: number, chordCount: number) {
  const up16 = (bytes: number) => Math.ceil(bytes / 16) * 16;
  const n = spanCount * chordCount;
  const cols = chordCount + 1;
  const edgeZ = up16(n * n * 8);
  const lowerX = edgeZ + up16((spanCount + 1) * 8);
  const upperX = lowerX + up16(spanCount * cols * 8);
  const ctrlX = upperX + up16(spanCount * cols * 8);
  const ctrlZ = ctrlX + up16(n * 8);
  const shared = ctrlZ + up16(n * 8);
  const work = shared + up16(spanCount * 4);
  return { edgeZ, lowerX, upperX, ctrlX, ctrlZ, shared, work, end: work + 4 * cols * 48 + n * 16 };
}

export function ringInfluenceWasm(
  edgeZ: Float64Array,
  nodeLowerX: Float64Array,
  nodeUpperX: Float64Array,
  chordCount: number,
  controlX: Float64Array,
  controlZ: Float64Array,
  groundZM: number,
  shared: Uint8Array,
  out: Float64Array,
): boolean {
  const spanCount = edgeZ.length - 1;
  if (spanCount * chordCount > WASM_MAX_N) return false;
  const k = ringInfluenceKernel();
  const at = layout(spanCount, chordCount);
  if (k === null || !ensureMemory(k.memory, at.end)) return false;
  const buffer = k.memory.buffer;
  const n = spanCount * chordCount;
  new Float64Array(buffer, at.edgeZ, spanCount + 1).set(edgeZ);
  new Float64Array(buffer, at.lowerX, nodeLowerX.length).set(nodeLowerX);
  new Float64Array(buffer, at.upperX, nodeUpperX.length).set(nodeUpperX);
  new Float64Array(buffer, at.ctrlX, n).set(controlX);
  new Float64Array(buffer, at.ctrlZ, n).set(controlZ);
  const flags = new Int32Array(buffer, at.shared, spanCount);
  for (let s = 0; s < spanCount; s++) flags[s] = shared[s]!;
  const ground = Number.isFinite(groundZM);
  k.build(
    spanCount,
    chordCount,
    ground ? 1 : 0,
    ground ? 2 * groundZM : 0,
    0,
    at.edgeZ,
    at.lowerX,
    at.upperX,
    at.ctrlX,
    at.ctrlZ,
    at.shared,
    at.work,
  );
  out.set(new Float64Array(buffer, 0, n * n));
  return true;
}
