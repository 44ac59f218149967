import {
  DEFAULT_MODEL_OPTIONS,
  DEFAULT_STEERING,
  DEMO_WHEEL,
  type WheelInput,
} from '../../../src/model/wheel';

const deg = Math.PI / 180;

/** A small invented sweep: cover fraction x rim depth, a short yaw curve at two speeds. */
export function smallSweep(fractions = [0, 0.5, 1], depths = [0.03, 0.06]): WheelInput[] {
  const cases: WheelInput[] = [];
  for (const coverFraction of fractions) {
    for (const rimDepthM of depths) {
      cases.push({
        wheel: { ...DEMO_WHEEL, coverFraction, rimDepthM },
        // A coarse lattice keeps the tests quick; the engine does not care about the resolution.
        options: { ...DEFAULT_MODEL_OPTIONS, latticeSpanCount: 10, latticeChordCount: 6 },
        steering: { ...DEFAULT_STEERING },
        points: [8, 13.41].flatMap((v) =>
          [0, 5, 10, 15].map((y) => ({
            airspeedMps: v,
            yawRad: y * deg,
            groundSpeedMps: v,
            rhoKgPerM3: 1.225,
            muPaS: 1.79e-5,
          })),
        ),
      });
    }
  }
  return cases;
}
