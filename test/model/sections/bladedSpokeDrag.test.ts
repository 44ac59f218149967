import { describe, expect, it } from 'vitest';
import { bladedSpokeDrag } from '../../../src/model/sections/bladedSpokeDrag';
import { cylinderDrag } from '../../../src/model/sections/cylinderDrag';

// Reference: subcritical ("laminar") drag of elliptic cylinders, thickness-based, Hoerner, Fluid-Dynamic Drag
// ch. 3, as tabulated in White, Fluid Mechanics Table 7.2 (Re >= 1e4; from memory):
// t/c = 1 -> 1.2, 1/2 -> 0.6, 1/4 -> 0.35, 1/8 -> 0.25.
const HOERNER = [
  { tc: 0.5, cd: 0.6 },
  { tc: 0.25, cd: 0.35 },
  { tc: 0.125, cd: 0.25 },
];

describe('bladedSpokeDrag', () => {
  it('matches elliptic-cylinder data at Re 1e4 and 1e5 within 17 % (inherits the cylinder fit bias)', () => {
    // The cylinder fit gives 1.02 at 1e4 and 1.005 at 1e5 against the table's 1.2, i.e. 15-16 % low; the
    // elliptic values inherit that: tolerance 17 % relative.
    for (const re of [1e4, 1e5]) {
      for (const row of HOERNER) {
        const got = bladedSpokeDrag(re, row.tc);
        const tol = 0.17;
        expect(
          Math.abs(got / row.cd - 1),
          `Re=${re} t/c=${row.tc} got=${got} expected=${row.cd} tol(rel)=${tol}`,
        ).toBeLessThanOrEqual(tol);
      }
    }
  });

  it("keeps Hoerner's elliptic-to-circular ratio where the wake term dominates (1e-12 relative)", () => {
    // Same source: ratios 0.6/1.2, 0.35/1.2, 0.25/1.2 at Re 1e5 (the friction floor is well below there).
    for (const row of HOERNER) {
      const got = bladedSpokeDrag(1e5, row.tc) / cylinderDrag(1e5);
      const exp = row.cd / 1.2;
      expect(
        Math.abs(got / exp - 1),
        `t/c=${row.tc} got=${got} expected=${exp} tol(rel)=1e-12`,
      ).toBeLessThanOrEqual(1e-12);
    }
  });

  it('equals the circular cylinder at t/c = 1 and never exceeds it', () => {
    // Common practice, no source: a round section is the t/c = 1 limit; flattening cannot add drag on the
    // frontal basis in this model.
    for (const re of [10, 300, 3000, 3e4]) {
      expect(bladedSpokeDrag(re, 1)).toBe(cylinderDrag(re));
      for (const tc of [0.05, 0.2, 0.4, 0.7]) {
        const got = bladedSpokeDrag(re, tc);
        expect(got, `Re=${re} t/c=${tc} got=${got} cylinder=${cylinderDrag(re)}`).toBeLessThanOrEqual(
          cylinderDrag(re),
        );
      }
    }
  });

  it('is friction-dominated for thin sections: 2 Cf (1 + 2 t/c) c/t from the Blasius law', () => {
    // Reference: Hoerner's friction and supervelocity terms with Blasius C_f (Schlichting ch. 7):
    // t/c = 0.02, Re_t = 1e3 -> Re_c = 5e4, Cf = 1.328/sqrt(5e4) = 0.0059391, Cd_t = 2 Cf 1.04 / 0.02 = 0.61763.
    const got = bladedSpokeDrag(1e3, 0.02);
    const exp = 0.61763;
    const tol = 1e-4;
    expect(Math.abs(got / exp - 1), `got=${got} expected=${exp} tol(rel)=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('rejects invalid arguments', () => {
    expect(() => bladedSpokeDrag(1e3, 0)).toThrow(/thicknessToWidth/);
    expect(() => bladedSpokeDrag(1e3, 1.5)).toThrow(/thicknessToWidth/);
    expect(() => bladedSpokeDrag(-5, 0.5)).toThrow(/reynolds/);
  });

  it('gives the same bits whichever section was evaluated before (the kept t/c lookup)', () => {
    // The table lookup is kept for the last t/c; each value, asked for after another section and
    // again after its own, must be the same to the bit (exact equality).
    const sections = [0.45, 0.1, 0.3, 1, 0.125];
    const first = sections.map((tc, i) => {
      bladedSpokeDrag(2e3, sections[(i + 1) % sections.length]!);
      return bladedSpokeDrag(1.5e3, tc);
    });
    sections.forEach((tc, i) => {
      const again = bladedSpokeDrag(1.5e3, tc);
      expect(Object.is(again, first[i]), `t/c=${tc} got=${again} expected=${first[i]} tol=0`).toBe(true);
      expect(Object.is(bladedSpokeDrag(1.5e3, tc), first[i]), `t/c=${tc} repeated`).toBe(true);
    });
  });
});
