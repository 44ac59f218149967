import { describe, expect, it } from 'vitest';
import { DEFAULT_MODEL_OPTIONS, DEMO_WHEEL, wheelRadii } from '../../../src/model/wheel';
import { spokeElements } from '../../../src/model/wheel/spokeElements';
import { spokeElementTable } from '../../../src/model/wheel/spokeElementTable';
import type { ModelOptions, WheelGeometry } from '../../../src/model/wheel/types';

/** The table's entries against spokeElements (the path it keeps), exact equality. */
function expectSame(wheel: WheelGeometry, options: ModelOptions, label: string) {
  const radii = wheelRadii(wheel);
  const table = spokeElementTable(wheel, radii, options);
  const ref = spokeElements(wheel, radii, options);
  expect(table.count, `${label}: count got=${table.count} expected=${ref.radiusM.length}`).toBe(
    ref.radiusM.length,
  );
  for (let e = 0; e < table.count; e++) {
    for (const [name, got, expected] of [
      ['radiusM', table.radiusM[e], ref.radiusM[e]],
      ['weightM', table.weightM[e], ref.weightM[e]],
      ['share', table.share[e], ref.share[e]],
    ] as const) {
      expect(Object.is(got, expected), `${label}: ${name}[${e}] got=${got} expected=${expected} tol=0`).toBe(
        true,
      );
    }
  }
}

describe('spokeElementTable', () => {
  it('holds the elements of spokeElements for whichever design was asked for last', () => {
    // A sequence that changes each field the elements depend on, and returns to earlier designs (new
    // objects with the same values, and the same objects changed between calls).
    const designs: [WheelGeometry, ModelOptions, string][] = [
      [DEMO_WHEEL, DEFAULT_MODEL_OPTIONS, 'open'],
      [{ ...DEMO_WHEEL, coverFraction: 0.4 }, DEFAULT_MODEL_OPTIONS, 'cover 0.4 at the rim, two sides'],
      [{ ...DEMO_WHEEL, coverFraction: 0.4, coverSides: 1 }, DEFAULT_MODEL_OPTIONS, 'one side'],
      [
        { ...DEMO_WHEEL, coverFraction: 0.4, coverSides: 1 },
        { ...DEFAULT_MODEL_OPTIONS, oneSidedCoverSpokeShare: 0.3 },
        'one side, share 0.3',
      ],
      [
        { ...DEMO_WHEEL, coverFraction: 0.4, coverPlacement: 'centre', coverSides: 1 },
        DEFAULT_MODEL_OPTIONS,
        'centre',
      ],
      [{ ...DEMO_WHEEL, coverFraction: 0.4, coverPlacement: 'hub' }, DEFAULT_MODEL_OPTIONS, 'hub'],
      [{ ...DEMO_WHEEL, rimDepthM: 0.08 }, DEFAULT_MODEL_OPTIONS, 'deep rim'],
      [{ ...DEMO_WHEEL, hubFlangeRadiusM: 0.03 }, DEFAULT_MODEL_OPTIONS, 'larger hub'],
      [{ ...DEMO_WHEEL, coverFraction: 1 }, DEFAULT_MODEL_OPTIONS, 'full disc'],
      [{ ...DEMO_WHEEL }, { ...DEFAULT_MODEL_OPTIONS }, 'open again, new objects'],
    ];
    for (const [wheel, options, label] of designs) expectSame(wheel, options, label);
    for (const [wheel, options, label] of designs.reverse()) expectSame(wheel, options, `${label} (again)`);
    const wheel = { ...DEMO_WHEEL };
    expectSame(wheel, DEFAULT_MODEL_OPTIONS, 'mutable');
    wheel.rimDepthM = 0.03;
    expectSame(wheel, DEFAULT_MODEL_OPTIONS, 'the same object, its rim changed');
  });
});
