/** Small three.js and DOM helpers shared by the 3D view's layers. */
import {
  ArrowHelper,
  BufferAttribute,
  BufferGeometry,
  Color,
  type Group,
  type Material,
  type Object3D,
  Vector3,
} from 'three';

/** Trailing filaments weaker than this share of the strongest are not drawn (clutter). */
export const WAKE_MIN_SHARE = 0.03;

// Scratch objects (no allocation while rendering).
export const scratch = new Vector3();
const scratchDir = new Vector3();

/** Model point -> three.js point: (x, y, z) -> (x, z, -y). */
export function toThree(x: number, y: number, z: number, out: Vector3): Vector3 {
  return out.set(x, z, -y);
}

/** 1, 2, 2.5 or 5 times a power of ten, at or above v. */
export function niceCeil(v: number): number {
  if (!(v > 0) || !Number.isFinite(v)) return 1;
  const p = 10 ** Math.floor(Math.log10(v));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= v * (1 - 1e-12)) return m * p;
  return 10 * p;
}

export function formatNumber(v: number, digits = 2): string {
  if (!Number.isFinite(v)) return '–';
  const a = Math.abs(v);
  if (a !== 0 && (a < 0.01 || a >= 1e4)) return v.toExponential(1);
  return v.toFixed(a >= 100 ? 0 : a >= 10 ? 1 : digits);
}

export function disposeTree(root: Object3D): void {
  root.traverse((o) => {
    const any = o as Object3D & { geometry?: BufferGeometry; material?: Material | Material[] };
    any.geometry?.dispose();
    if (Array.isArray(any.material)) for (const m of any.material) m.dispose();
    else any.material?.dispose();
  });
}

export function clearGroup(g: Group): void {
  for (const child of [...g.children]) {
    disposeTree(child);
    g.remove(child);
  }
}

/** Packed polylines (model xyz) -> one LineSegments geometry (three coords), with optional colours. */
export function polylineSegments(
  points: Float64Array,
  offsets: Uint32Array,
  keep: (line: number) => boolean,
  colourOf?: (line: number, out: Float32Array, offset: number) => void,
): BufferGeometry {
  let segments = 0;
  for (let i = 0; i + 1 < offsets.length; i++) {
    if (keep(i)) segments += Math.max(0, offsets[i + 1]! - offsets[i]! - 1);
  }
  const pos = new Float32Array(6 * segments);
  const col = colourOf ? new Float32Array(6 * segments) : null;
  const c = new Float32Array(3);
  let o = 0;
  for (let i = 0; i + 1 < offsets.length; i++) {
    if (!keep(i)) continue;
    if (colourOf) colourOf(i, c, 0);
    for (let k = offsets[i]!; k + 1 < offsets[i + 1]!; k++) {
      for (const q of [k, k + 1]) {
        pos[o] = points[3 * q]!;
        pos[o + 1] = points[3 * q + 2]!;
        pos[o + 2] = -points[3 * q + 1]!;
        if (col) col.set(c, o);
        o += 3;
      }
    }
  }
  const g = new BufferGeometry();
  g.setAttribute('position', new BufferAttribute(pos, 3));
  if (col) g.setAttribute('color', new BufferAttribute(col, 3));
  return g;
}

export function el<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  style: Partial<CSSStyleDeclaration> = {},
  text?: string,
): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  Object.assign(e.style, style);
  if (text !== undefined) e.textContent = text;
  return e;
}

/** An arrow (model frame) drawn over everything. */
export function arrow(
  group: Group,
  origin: [number, number, number],
  dir: [number, number, number],
  lengthM: number,
  colour: string,
  R: number,
): void {
  toThree(dir[0], dir[1], dir[2], scratchDir).normalize();
  toThree(origin[0], origin[1], origin[2], scratch);
  const head = Math.min(0.35 * lengthM, 0.12 * R);
  const a = new ArrowHelper(
    scratchDir.clone(),
    scratch.clone(),
    lengthM,
    new Color(colour).getHex(),
    head,
    0.5 * head,
  );
  for (const m of [a.line.material, a.cone.material] as Material[]) {
    m.depthTest = false;
    m.transparent = true;
  }
  a.renderOrder = 5;
  a.line.renderOrder = 5;
  a.cone.renderOrder = 5;
  group.add(a);
}
