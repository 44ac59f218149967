import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript build script without type declarations
import { compileLuKernel } from '../../../scripts/buildLuKernel.mjs';
import { luFactor } from '../../../src/model/numeric/luFactor';
import { luKernel } from '../../../src/model/numeric/luKernel';
import { LU_KERNEL_WASM_BASE64 } from '../../../src/model/numeric/luKernelWasm';
import { seededMatrix } from './seeded';

describe('the WebAssembly SIMD trailing update of luFactor', () => {
  it('is the compilation of luKernel.wat (run `node scripts/buildLuKernel.mjs` after editing it)', async () => {
    const bytes = (await compileLuKernel()) as Uint8Array;
    const fresh = Buffer.from(bytes).toString('base64');
    expect(fresh === LU_KERNEL_WASM_BASE64, 'luKernelWasm.ts is stale: bytes differ from luKernel.wat').toBe(
      true,
    );
  });

  it('is available under Node (WebAssembly SIMD)', () => {
    expect(luKernel(), 'luKernel() got=null expected=an instance').not.toBeNull();
  });

  it('gives the TypeScript path bit for bit: the same pivots and factors (tolerance 0), odd and even orders', () => {
    // Invariant of the design: every element receives the same IEEE-754 operations in the same order.
    for (const n of [1, 2, 5, 16, 17, 31, 33, 57, 64, 65, 66, 67, 97, 130, 288]) {
      for (const shift of [0, 0.5 * Math.sqrt(n)]) {
        const a = seededMatrix(n, 17 * n + 1, shift);
        const viaTs = Float64Array.from(a);
        const viaWasm = Float64Array.from(a);
        const viaAuto = Float64Array.from(a);
        const pTs = new Int32Array(n);
        const pWasm = new Int32Array(n);
        const pAuto = new Int32Array(n);
        luFactor(viaTs, n, pTs, 'typescript');
        luFactor(viaWasm, n, pWasm, 'wasm');
        luFactor(viaAuto, n, pAuto);
        let differing = -1;
        for (let i = 0; i < n * n && differing < 0; i++) {
          if (!Object.is(viaTs[i], viaWasm[i]) || !Object.is(viaTs[i], viaAuto[i])) differing = i;
        }
        const at = Math.max(differing, 0);
        expect(
          differing,
          `n=${n} shift=${shift} first differing entry ${differing}: typescript=${viaTs[at]} wasm=${viaWasm[at]} auto=${viaAuto[at]} tol=0`,
        ).toBe(-1);
        expect(Array.from(pWasm), `n=${n} shift=${shift} pivots wasm vs typescript`).toEqual(Array.from(pTs));
        expect(Array.from(pAuto), `n=${n} shift=${shift} pivots auto vs typescript`).toEqual(Array.from(pTs));
      }
    }
  });

  it('reports a singular matrix as the TypeScript path does (the same column and value)', () => {
    // Column 70 of a 100 x 100 matrix is zero: elimination meets an exactly zero pivot column there.
    const n = 100;
    const a = seededMatrix(n, 5, 10);
    for (let i = 0; i < n; i++) a[i * n + 70] = 0;
    const message = (path: 'typescript' | 'wasm') => {
      try {
        luFactor(Float64Array.from(a), n, new Int32Array(n), path);
      } catch (e) {
        return (e as Error).message;
      }
      return 'no error';
    };
    const viaTs = message('typescript');
    expect(viaTs, `typescript path: got "${viaTs}"`).toMatch(/pivot column 70 has largest \|a\|=0/);
    expect(message('wasm'), 'wasm path message vs typescript').toBe(viaTs);
  });

  it('names the first non-finite entry as the TypeScript path does', () => {
    const cases = [
      { n: 100, bad: [4321, 5000] },
      { n: 100, bad: [4320] },
      { n: 65, bad: [65 * 65 - 1] },
      { n: 64, bad: [0, 1] },
    ];
    for (const { n, bad } of cases) {
      for (const value of [Number.POSITIVE_INFINITY, Number.NaN, Number.NEGATIVE_INFINITY]) {
        const a = seededMatrix(n, 3, n);
        for (const i of bad) a[i] = value;
        const message = (path: 'typescript' | 'wasm') => {
          try {
            luFactor(Float64Array.from(a), n, new Int32Array(n), path);
          } catch (e) {
            return (e as Error).message;
          }
          return 'no error';
        };
        const expected = `luFactor: a[${bad[0]}]=${value} must be finite`;
        expect(message('typescript'), `n=${n} bad=${bad} typescript`).toBe(expected);
        expect(message('wasm'), `n=${n} bad=${bad} wasm`).toBe(expected);
      }
    }
  });

  it('rejects an unknown path by name', () => {
    const a = Float64Array.from([2, 1, 1, 3]);
    expect(() => luFactor(a, 2, new Int32Array(2), 'gpu' as never)).toThrow(/path=gpu/);
  });
});
