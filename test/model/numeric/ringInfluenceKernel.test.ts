import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript build script without type declarations
import { compileKernel } from '../../../scripts/buildLuKernel.mjs';
import { RING_INFLUENCE_KERNEL_WASM_BASE64 } from '../../../src/model/numeric/ringInfluenceKernelWasm';

// Its results are held to the ring-by-ring Biot-Savart sum and to the TypeScript path, bit for bit, in
// test/model/lattice/ringInfluenceMatrix.test.ts.
describe('the WebAssembly SIMD influence-matrix kernel', () => {
  it('is the compilation of ringInfluenceKernel.wat (run `node scripts/buildLuKernel.mjs` after editing it)', async () => {
    const bytes = (await compileKernel('ringInfluenceKernel')) as Uint8Array;
    const fresh = Buffer.from(bytes).toString('base64');
    expect(
      fresh === RING_INFLUENCE_KERNEL_WASM_BASE64,
      'ringInfluenceKernelWasm.ts is stale: bytes differ from ringInfluenceKernel.wat',
    ).toBe(true);
  });
});
