/** The direction of travel and the relative wind (always shown). */
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import { arrow } from './threeUtil';
import type { LayerScene } from './types';

export function buildCues(f: ViewField, s: LayerScene): void {
  const R = f.radii.outerRadiusM;
  // Direction of travel, on the ground in front of the wheel (rider's right side).
  arrow(s.cues, [0.75 * R, -0.55 * R, -R], [1, 0, 0], 0.6 * R, SCENE_COLOURS.travel, R);
  s.addLabel('travel (+x)', [1.1 * R, -0.55 * R, -R], null, SCENE_COLOURS.travel);
  // Relative wind, upstream.
  const [ux, uy] = f.freestreamMps;
  const speed = Math.hypot(ux, uy) || 1;
  const ex = ux / speed;
  const ey = uy / speed;
  const start: [number, number, number] = [0.9 * R - 1.3 * R * ex, -1.3 * R * ey, 0.8 * R];
  arrow(s.cues, start, [ex, ey, 0], 0.55 * R, SCENE_COLOURS.wind, R);
  s.addLabel(
    `wind ${(f.airspeedMps * 3.6).toFixed(1)} km/h, yaw ${((f.yawRad * 180) / Math.PI).toFixed(1)}°`,
    [start[0] + 0.55 * R * ex, start[1] + 0.55 * R * ey, start[2]],
    null,
    SCENE_COLOURS.wind,
  );
}
