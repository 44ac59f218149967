/** The steering axis, dashed, with its head angle and offset. */
import { BufferGeometry, Float32BufferAttribute, Line, LineDashedMaterial } from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import type { LayerScene } from './types';

export function buildSteering(f: ViewField, s: LayerScene): void {
  const a = f.steeringAxisM;
  const geo = new BufferGeometry();
  geo.setAttribute('position', new Float32BufferAttribute([a[0]!, a[2]!, -a[1]!, a[3]!, a[5]!, -a[4]!], 3));
  const line = new Line(
    geo,
    new LineDashedMaterial({ color: SCENE_COLOURS.steering, dashSize: 0.02, gapSize: 0.012 }),
  );
  line.computeLineDistances();
  s.groups.steeringAxis.add(line);
  s.addLabel(
    `steering axis (${((f.headAngleRad * 180) / Math.PI).toFixed(0)}°, ${(f.forkOffsetM * 1000).toFixed(0)} mm offset)`,
    [a[3]!, a[4]!, a[5]!],
    'steeringAxis',
    SCENE_COLOURS.steering,
  );
}
