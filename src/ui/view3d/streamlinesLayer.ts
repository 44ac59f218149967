/** Streamlines seeded upstream. */
import { LineBasicMaterial, LineSegments } from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import { polylineSegments } from './threeUtil';
import type { LayerScene } from './types';

export function buildStreamlines(f: ViewField, s: LayerScene): void {
  const geo = polylineSegments(f.streamPointsM, f.streamOffsets, () => true);
  s.groups.streamlines.add(new LineSegments(geo, new LineBasicMaterial({ color: SCENE_COLOURS.streamline })));
}
