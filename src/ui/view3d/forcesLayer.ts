/** The side and axial force arrows at the centre of pressure, with their values. */
import { CylinderGeometry, Mesh, MeshBasicMaterial } from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import { arrow, formatNumber, niceCeil, toThree } from './threeUtil';
import type { LayerScene } from './types';

export function buildForces(f: ViewField, s: LayerScene): void {
  const R = f.radii.outerRadiusM;
  const biggest = Math.max(Math.abs(f.sideN), Math.abs(f.axialN));
  // The larger force draws up to R long at a round scale (N per m of arrow).
  const nPerM = niceCeil(biggest / R);
  s.legend.nPerM = nPerM;
  s.legend.side = f.sideN;
  s.legend.axial = f.axialN;
  const o = f.forceOriginM;
  const tiny = 0.03 * R;
  const sideLen = Math.abs(f.sideN) / nPerM;
  if (sideLen >= tiny) {
    arrow(s.groups.forces, o, [0, Math.sign(f.sideN), 0], sideLen, SCENE_COLOURS.sideForce, R);
  }
  // Axial force acts along -x when positive (resisting motion).
  const axialLen = Math.abs(f.axialN) / nPerM;
  if (axialLen >= tiny) {
    arrow(s.groups.forces, o, [-Math.sign(f.axialN), 0, 0], axialLen, SCENE_COLOURS.axialForce, R);
  }
  // A small sphere marks the centre of pressure.
  const dot = new Mesh(
    new CylinderGeometry(0.018 * R, 0.018 * R, 0.004, 20),
    new MeshBasicMaterial({ color: SCENE_COLOURS.sideForce, depthTest: false }),
  );
  toThree(o[0], o[1], o[2], dot.position);
  dot.rotation.x = Math.PI / 2;
  dot.renderOrder = 6;
  s.groups.forces.add(dot);
  const cpText = Number.isFinite(f.cpXM) ? 'centre of pressure' : 'hub (no side force)';
  s.addLabel(
    `side ${formatNumber(f.sideN)} N`,
    [o[0], o[1] + Math.sign(f.sideN || 1) * Math.max(sideLen, tiny), o[2]],
    'forces',
    SCENE_COLOURS.sideForce,
  );
  s.addLabel(
    `axial ${formatNumber(f.axialN)} N`,
    [o[0] - Math.sign(f.axialN || 1) * Math.max(axialLen, tiny), o[1], o[2] - 0.06 * R],
    'forces',
    SCENE_COLOURS.axialForce,
  );
  s.addLabel(cpText, [o[0], o[1], o[2] - 0.22 * R], 'forces', '#444');
}
