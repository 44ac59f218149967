/** The ground: a grid and a translucent plane at z = -R. */
import { DoubleSide, GridHelper, Mesh, MeshBasicMaterial, PlaneGeometry } from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import type { LayerScene } from './types';

export function buildGround(f: ViewField, s: LayerScene): void {
  const R = f.radii.outerRadiusM;
  const size = 10 * R;
  const grid = new GridHelper(size, 20, SCENE_COLOURS.gridCentre, SCENE_COLOURS.grid);
  grid.position.set(-0.35 * R, -R - 0.0005, 0);
  s.groups.ground.add(grid);
  const plane = new Mesh(
    new PlaneGeometry(size, size),
    new MeshBasicMaterial({
      color: SCENE_COLOURS.ground,
      side: DoubleSide,
      transparent: true,
      opacity: 0.55,
      depthWrite: false,
    }),
  );
  plane.rotation.x = -Math.PI / 2;
  plane.position.set(-0.35 * R, -R - 0.002, 0);
  s.groups.ground.add(plane);
}
