/** The trailing-wake sketch: filaments coloured by the sign and strength of their circulation. */
import { Color, LineBasicMaterial, LineSegments } from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import { polylineSegments, WAKE_MIN_SHARE } from './threeUtil';
import type { LayerScene } from './types';

export function buildWake(f: ViewField, s: LayerScene): void {
  let strongest = 0;
  for (const s of f.wakeStrengthM2ps) strongest = Math.max(strongest, Math.abs(s));
  if (!(strongest > 0)) return;
  const pos = new Color(SCENE_COLOURS.wakePositive);
  const neg = new Color(SCENE_COLOURS.wakeNegative);
  const bg = new Color(SCENE_COLOURS.background);
  const tmp = new Color();
  const geo = polylineSegments(
    f.wakePointsM,
    f.wakeOffsets,
    (i) => Math.abs(f.wakeStrengthM2ps[i]!) >= WAKE_MIN_SHARE * strongest,
    (i, out) => {
      const s = f.wakeStrengthM2ps[i]!;
      // Weak filaments fade toward the background.
      tmp.copy(bg).lerp(s >= 0 ? pos : neg, 0.35 + 0.65 * Math.sqrt(Math.abs(s) / strongest));
      out[0] = tmp.r;
      out[1] = tmp.g;
      out[2] = tmp.b;
    },
  );
  s.groups.wake.add(new LineSegments(geo, new LineBasicMaterial({ vertexColors: true })));
}
