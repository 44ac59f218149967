/** The lattice coloured by its pressure jump, on both faces. */
import { BufferAttribute, BufferGeometry, DoubleSide, Mesh, MeshBasicMaterial } from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { loadingColour } from './colours';
import type { LayerScene } from './types';

export function buildLoading(f: ViewField, s: LayerScene): void {
  const g = s.groups.loading;
  const n = f.panelCount;
  const pos = new Float32Array(n * 18);
  const col = new Float32Array(n * 24);
  const c = new Float32Array(3);
  const limit = f.colourLimit;
  for (let p = 0; p < n; p++) {
    loadingColour(f.pressureJump[p]! / limit, c, 0);
    // Porous panels lighter in opacity so the spokes behind show through.
    const alpha = 1 - 0.55 * Math.min(1, Math.max(0, f.panelOpenness[p]!));
    const k = 8 * p;
    const corner = (j: number, o: number) => {
      pos[o] = f.panelCornersM[k + 2 * j]!;
      pos[o + 1] = f.panelCornersM[k + 2 * j + 1]!;
      pos[o + 2] = 0;
    };
    const order = [0, 1, 2, 0, 2, 3];
    for (let v = 0; v < 6; v++) {
      corner(order[v]!, 18 * p + 3 * v);
      col.set(c, 24 * p + 4 * v);
      col[24 * p + 4 * v + 3] = alpha;
    }
  }
  const geo = new BufferGeometry();
  geo.setAttribute('position', new BufferAttribute(pos, 3));
  geo.setAttribute('color', new BufferAttribute(col, 4));
  const mat = new MeshBasicMaterial({
    vertexColors: true,
    transparent: true,
    side: DoubleSide,
    depthWrite: false,
    polygonOffset: true,
    polygonOffsetFactor: -1,
  });
  // The jump painted on both faces, just outside the rim and tyre so it reads as the wheel's skin.
  const half = Math.max(f.rimWidthM, f.tyreWidthM) / 2 + 0.001;
  for (const s of [-1, 1]) {
    const mesh = new Mesh(geo, mat);
    mesh.position.z = s * half;
    mesh.renderOrder = 2;
    g.add(mesh);
  }
  // Saturation flags for the legend.
  s.legend.limit = limit;
  s.legend.saturatedLow = f.pressureJumpMin < -limit;
  s.legend.saturatedHigh = f.pressureJumpMax > limit;
}
