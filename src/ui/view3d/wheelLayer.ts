/** The wheel: tyre, rim, covers, spokes and hub. */
import {
  BufferAttribute,
  BufferGeometry,
  CylinderGeometry,
  DoubleSide,
  LineBasicMaterial,
  LineSegments,
  Mesh,
  MeshStandardMaterial,
  RingGeometry,
  TorusGeometry,
} from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import type { LayerScene } from './types';

export function buildWheel(f: ViewField, s: LayerScene): void {
  const g = s.groups.wheel;
  const { radii } = f;
  const R = radii.outerRadiusM;
  const half = Math.max(f.rimWidthM, f.tyreWidthM) / 2;
  // Tyre: a torus in the wheel plane (three's x-y plane is the model's x-z plane).
  const tube = f.tyreWidthM / 2;
  const tyre = new Mesh(
    new TorusGeometry(R - tube, tube, 16, 96),
    new MeshStandardMaterial({ color: SCENE_COLOURS.tyre, roughness: 0.85 }),
  );
  g.add(tyre);
  // Rim: the band between the rim's inner radius and the bead seat, rimWidth thick.
  const rimMat = new MeshStandardMaterial({
    color: SCENE_COLOURS.rim,
    metalness: 0.35,
    roughness: 0.45,
    side: DoubleSide,
  });
  const rimOuter = radii.tyreInnerRadiusM;
  const rimInner = radii.rimInnerRadiusM;
  for (const s of [-1, 1]) {
    const face = new Mesh(new RingGeometry(rimInner, rimOuter, 96, 1), rimMat);
    face.position.z = (s * f.rimWidthM) / 2;
    g.add(face);
  }
  const inner = new Mesh(new CylinderGeometry(rimInner, rimInner, f.rimWidthM, 96, 1, true), rimMat);
  inner.rotation.x = Math.PI / 2;
  g.add(inner);
  // Covers: translucent annuli on one face (drawn on the rider's right, -y) or both.
  if (f.hasCover) {
    const coverMat = new MeshStandardMaterial({
      color: SCENE_COLOURS.cover,
      transparent: true,
      opacity: 0.38,
      side: DoubleSide,
      depthWrite: false,
      roughness: 0.6,
    });
    const sides = f.coverSides === 2 ? [-1, 1] : [1];
    for (const s of sides) {
      const cover = new Mesh(
        new RingGeometry(radii.coverInnerRadiusM, radii.coverOuterRadiusM, 96, 1),
        coverMat,
      );
      cover.position.z = s * half * 0.98; // three +z is the model's -y
      g.add(cover);
    }
  }
  // Spokes: thin lines in the wheel plane.
  if (f.spokeCount > 0) {
    const pos = new Float32Array(6 * f.spokeCount);
    for (let k = 0; k < f.spokeCount; k++) {
      pos.set(
        [
          f.spokeEndsM[4 * k]!,
          f.spokeEndsM[4 * k + 1]!,
          0,
          f.spokeEndsM[4 * k + 2]!,
          f.spokeEndsM[4 * k + 3]!,
          0,
        ],
        6 * k,
      );
    }
    const geo = new BufferGeometry();
    geo.setAttribute('position', new BufferAttribute(pos, 3));
    g.add(new LineSegments(geo, new LineBasicMaterial({ color: SCENE_COLOURS.spoke })));
  }
  // Hub: a short cylinder along the axle.
  const hub = new Mesh(
    new CylinderGeometry(radii.hubRadiusM, radii.hubRadiusM, 2.2 * half, 32),
    new MeshStandardMaterial({ color: SCENE_COLOURS.rim, metalness: 0.4, roughness: 0.4 }),
  );
  hub.rotation.x = Math.PI / 2;
  g.add(hub);
}
