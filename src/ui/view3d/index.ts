/**
 * The 3D view of one wheel at one operating point: the wheel (tyre, rim, spokes, covers), the lattice
 * coloured by its pressure jump, the trailing-wake sketch, streamlines, the ground, the side and axial
 * force arrows at the centre of pressure and the steering axis. three.js, rendered on demand.
 *
 * Axes: the model's frame (x forward, y to the rider's left, z up) maps to three.js as
 * (x, y, z)_model -> (x, z, -y)_three (a rotation of -90 deg about x), so three's y is up and the
 * ground sits at the bottom. The camera starts on the rider's right (the windward side for yaw > 0),
 * slightly ahead and above, so the direction of travel points to the viewer's right.
 */
import {
  ArrowHelper,
  BufferAttribute,
  BufferGeometry,
  Color,
  CylinderGeometry,
  DirectionalLight,
  DoubleSide,
  Float32BufferAttribute,
  GridHelper,
  Group,
  HemisphereLight,
  Line,
  LineBasicMaterial,
  LineDashedMaterial,
  LineSegments,
  type Material,
  Mesh,
  MeshBasicMaterial,
  MeshStandardMaterial,
  type Object3D,
  PerspectiveCamera,
  PlaneGeometry,
  RingGeometry,
  Scene,
  TorusGeometry,
  Vector3,
  WebGLRenderer,
} from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import type { ViewField } from '../../compute/engine/protocol';
import { LOADING_STOPS, loadingColour, loadingGradientCss, SCENE_COLOURS } from './colours';

export interface ViewLayers {
  wheel: boolean;
  loading: boolean;
  wake: boolean;
  streamlines: boolean;
  ground: boolean;
  forces: boolean;
  steeringAxis: boolean;
}

export interface WheelView {
  /** The WebGL canvas (preserveDrawingBuffer: its pixels can be read back after a render). */
  readonly canvas: HTMLCanvasElement;
  /** Draw a new field (replaces the previous one); the camera keeps its place. */
  update(field: ViewField): void;
  setLayers(partial: Partial<ViewLayers>): void;
  layers(): ViewLayers;
  /** Put the camera back to its starting place, framing the current wheel. */
  resetCamera(): void;
  /** Render now (synchronously); normally renders happen on demand by themselves. */
  render(): void;
  /** The view as a PNG: the 3D image with the colour legend and the force values drawn onto it. */
  toPngBlob(): Promise<Blob>;
  dispose(): void;
}

export const DEFAULT_LAYERS: Readonly<ViewLayers> = Object.freeze({
  wheel: true,
  loading: true,
  wake: true,
  streamlines: true,
  ground: true,
  forces: true,
  steeringAxis: true,
});

const LAYER_LABELS: Record<keyof ViewLayers, string> = {
  wheel: 'Wheel',
  loading: 'Loading (ΔCp)',
  wake: 'Wake',
  streamlines: 'Streamlines',
  ground: 'Ground',
  forces: 'Forces',
  steeringAxis: 'Steering axis',
};

/** Trailing filaments weaker than this share of the strongest are not drawn (clutter). */
const WAKE_MIN_SHARE = 0.03;

// Scratch objects (no allocation while rendering).
const scratch = new Vector3();
const scratchDir = new Vector3();

/** Model point -> three.js point: (x, y, z) -> (x, z, -y). */
function toThree(x: number, y: number, z: number, out: Vector3): Vector3 {
  return out.set(x, z, -y);
}

/** 1, 2, 2.5 or 5 times a power of ten, at or above v. */
function niceCeil(v: number): number {
  if (!(v > 0) || !Number.isFinite(v)) return 1;
  const p = 10 ** Math.floor(Math.log10(v));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= v * (1 - 1e-12)) return m * p;
  return 10 * p;
}

function formatNumber(v: number, digits = 2): string {
  if (!Number.isFinite(v)) return '–';
  const a = Math.abs(v);
  if (a !== 0 && (a < 0.01 || a >= 1e4)) return v.toExponential(1);
  return v.toFixed(a >= 100 ? 0 : a >= 10 ? 1 : digits);
}

function disposeTree(root: Object3D): void {
  root.traverse((o) => {
    const any = o as Object3D & { geometry?: BufferGeometry; material?: Material | Material[] };
    any.geometry?.dispose();
    if (Array.isArray(any.material)) for (const m of any.material) m.dispose();
    else any.material?.dispose();
  });
}

function clearGroup(g: Group): void {
  for (const child of [...g.children]) {
    disposeTree(child);
    g.remove(child);
  }
}

/** Packed polylines (model xyz) -> one LineSegments geometry (three coords), with optional colours. */
function polylineSegments(
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

function el<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  style: Partial<CSSStyleDeclaration> = {},
  text?: string,
): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  Object.assign(e.style, style);
  if (text !== undefined) e.textContent = text;
  return e;
}

interface Label {
  element: HTMLDivElement;
  /** Model-space anchor. */
  at: [number, number, number];
  layer: keyof ViewLayers | null;
}

/**
 * Create the view inside `container` (which should have a size; the view fills it). The container
 * gets a relative position if it has none, a canvas, an overlay with the colour legend, the force
 * values and the layer toggles (checkboxes), and labels that follow the scene.
 */
export function createWheelView(container: HTMLElement, initialLayers: Partial<ViewLayers> = {}): WheelView {
  const state: ViewLayers = { ...DEFAULT_LAYERS, ...initialLayers };
  if (getComputedStyle(container).position === 'static') container.style.position = 'relative';
  container.style.overflow = 'hidden';

  const renderer = new WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
  renderer.setPixelRatio(Math.min(2, globalThis.devicePixelRatio || 1));
  renderer.setClearColor(new Color(SCENE_COLOURS.background), 1);
  const canvas = renderer.domElement;
  canvas.tabIndex = 0;
  canvas.setAttribute('role', 'img');
  canvas.setAttribute(
    'aria-label',
    '3D view of the wheel: drag or use the arrow keys to orbit, the mouse wheel to zoom',
  );
  Object.assign(canvas.style, { display: 'block', width: '100%', height: '100%', outline: 'none' });
  container.appendChild(canvas);

  const scene = new Scene();
  const camera = new PerspectiveCamera(32, 1, 0.01, 100);
  scene.add(new HemisphereLight(0xffffff, 0x8a8370, 1.6));
  const sun = new DirectionalLight(0xffffff, 1.6);
  sun.position.set(1.5, 3, 2.5);
  scene.add(sun);

  const groups: Record<keyof ViewLayers, Group> = {
    wheel: new Group(),
    loading: new Group(),
    wake: new Group(),
    streamlines: new Group(),
    ground: new Group(),
    forces: new Group(),
    steeringAxis: new Group(),
  };
  for (const g of Object.values(groups)) scene.add(g);
  const cues = new Group(); // travel and wind arrows: always shown
  scene.add(cues);

  const controls = new OrbitControls(camera, canvas);
  controls.enableDamping = false;
  controls.listenToKeyEvents(canvas);
  controls.keyPanSpeed = 12;

  // ---- overlay: legend (top left), toggles (top right), labels (follow the scene) ----
  const font = '12px system-ui, sans-serif';
  // Legend bottom-left and layer switches folded top-right, so the wheel itself stays in view.
  const legend = el('div', {
    position: 'absolute',
    left: '6px',
    bottom: '6px',
    padding: '4px 6px',
    background: 'rgba(255,255,255,0.86)',
    border: '1px solid #d5d2c8',
    borderRadius: '4px',
    font,
    color: '#222',
    pointerEvents: 'none',
    maxWidth: '200px',
    fontSize: '11px',
  });
  const legendTitle = el('div', { fontWeight: '600', marginBottom: '3px' }, 'Pressure jump ΔCp');
  const legendSub = el('div', { fontSize: '11px', color: '#555' }, 'windward − leeward face, over q');
  const bar = el('div', {
    height: '8px',
    width: '150px',
    margin: '4px 0 1px',
    background: loadingGradientCss(),
    border: '1px solid #999',
  });
  const ticks = el('div', {
    display: 'flex',
    justifyContent: 'space-between',
    width: '152px',
    fontSize: '11px',
  });
  const tickLo = el('span');
  const tickMid = el('span', {}, '0');
  const tickHi = el('span');
  ticks.append(tickLo, tickMid, tickHi);
  const legendForces = el('div', { marginTop: '5px', lineHeight: '1.35' });
  const legendNote = el('div', { marginTop: '4px', fontSize: '11px', color: '#555' });
  legend.append(legendTitle, legendSub, bar, ticks, legendForces, legendNote);

  const togglesBox = el('details', {
    position: 'absolute',
    right: '6px',
    top: '6px',
    background: 'rgba(255,255,255,0.9)',
    border: '1px solid #d5d2c8',
    borderRadius: '4px',
    font,
    color: '#222',
  });
  const togglesSummary = el('summary', { padding: '3px 8px', cursor: 'pointer' }, 'Layers');
  const toggles = el('fieldset', { margin: '0', padding: '2px 8px 6px', border: 'none' });
  togglesBox.append(togglesSummary, toggles);
  const legendEl = el(
    'legend',
    { position: 'absolute', width: '1px', height: '1px', overflow: 'hidden' },
    'Layers',
  );
  toggles.appendChild(legendEl);
  const boxes = {} as Record<keyof ViewLayers, HTMLInputElement>;
  for (const key of Object.keys(LAYER_LABELS) as (keyof ViewLayers)[]) {
    const label = el('label', { display: 'block', cursor: 'pointer', whiteSpace: 'nowrap' });
    const box = el('input');
    box.type = 'checkbox';
    box.checked = state[key];
    box.dataset.layer = key;
    box.addEventListener('change', () => setLayers({ [key]: box.checked }));
    boxes[key] = box;
    label.append(box, document.createTextNode(` ${LAYER_LABELS[key]}`));
    toggles.appendChild(label);
  }
  const resetButton = el('button', { marginTop: '4px', font, cursor: 'pointer' }, 'Reset view');
  resetButton.type = 'button';
  resetButton.addEventListener('click', () => resetCamera());
  toggles.appendChild(resetButton);

  const labelLayer = el('div', {
    position: 'absolute',
    inset: '0',
    pointerEvents: 'none',
    font,
    color: '#222',
  });
  container.append(labelLayer, legend, togglesBox);
  let labels: Label[] = [];
  const addLabel = (
    text: string,
    at: [number, number, number],
    layer: keyof ViewLayers | null,
    colour = '#222',
  ) => {
    const element = el(
      'div',
      {
        position: 'absolute',
        left: '0',
        top: '0',
        padding: '1px 4px',
        background: 'rgba(255,255,255,0.78)',
        borderRadius: '3px',
        color: colour,
        whiteSpace: 'nowrap',
        fontSize: '12px',
      },
      text,
    );
    labelLayer.appendChild(element);
    labels.push({ element, at, layer });
  };
  const clearLabels = () => {
    for (const l of labels) l.element.remove();
    labels = [];
  };

  let field: ViewField | null = null;
  let radius = 0.334;
  const legendInfo = { limit: 1, saturatedLow: false, saturatedHigh: false, nPerM: 1, side: 0, axial: 0 };

  // ---- rendering on demand ----
  let pending = 0;
  const placeLabels = () => {
    const w = canvas.clientWidth;
    const h = canvas.clientHeight;
    for (const l of labels) {
      const shown = l.layer === null || state[l.layer];
      toThree(l.at[0], l.at[1], l.at[2], scratch).project(camera);
      const visible = shown && scratch.z < 1 && Math.abs(scratch.x) <= 1.05 && Math.abs(scratch.y) <= 1.05;
      l.element.style.display = visible ? 'block' : 'none';
      if (visible) {
        const x = ((scratch.x + 1) / 2) * w;
        const y = ((1 - scratch.y) / 2) * h;
        l.element.style.transform = `translate(${x.toFixed(1)}px, ${y.toFixed(1)}px) translate(-50%, -120%)`;
      }
    }
  };
  const renderNow = () => {
    pending = 0;
    for (const key of Object.keys(groups) as (keyof ViewLayers)[]) groups[key].visible = state[key];
    renderer.render(scene, camera);
    placeLabels();
  };
  const requestRender = () => {
    if (pending === 0) pending = requestAnimationFrame(renderNow);
  };
  controls.addEventListener('change', requestRender);

  const resize = () => {
    const w = Math.max(1, container.clientWidth);
    const h = Math.max(1, container.clientHeight);
    renderer.setSize(w, h, false);
    camera.aspect = w / h;
    camera.updateProjectionMatrix();
    renderNow();
  };
  const observer = new ResizeObserver(resize);
  observer.observe(container);

  function resetCamera(): void {
    const R = radius;
    // Frame the wheel with its upstream seeds and its wake: a box about 5 R wide around x = -0.35 R.
    toThree(-0.3 * R, 0, -0.05 * R, controls.target);
    toThree(4.6 * R, -4.4 * R, 2.7 * R, camera.position);
    camera.near = 0.01 * R;
    camera.far = 100 * R;
    camera.updateProjectionMatrix();
    controls.update();
    requestRender();
  }

  function setLayers(partial: Partial<ViewLayers>): void {
    for (const key of Object.keys(partial) as (keyof ViewLayers)[]) {
      if (!(key in state)) continue;
      const v = Boolean(partial[key]);
      state[key] = v;
      boxes[key].checked = v;
    }
    requestRender();
  }

  // ---- building the scene from a field ----
  function buildWheel(f: ViewField): void {
    const g = groups.wheel;
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

  function buildLoading(f: ViewField): void {
    const g = groups.loading;
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
    legendInfo.limit = limit;
    legendInfo.saturatedLow = f.pressureJumpMin < -limit;
    legendInfo.saturatedHigh = f.pressureJumpMax > limit;
  }

  function buildWake(f: ViewField): void {
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
    groups.wake.add(new LineSegments(geo, new LineBasicMaterial({ vertexColors: true })));
  }

  function buildStreamlines(f: ViewField): void {
    const geo = polylineSegments(f.streamPointsM, f.streamOffsets, () => true);
    groups.streamlines.add(new LineSegments(geo, new LineBasicMaterial({ color: SCENE_COLOURS.streamline })));
  }

  function buildGround(f: ViewField): void {
    const R = f.radii.outerRadiusM;
    const size = 10 * R;
    const grid = new GridHelper(size, 20, SCENE_COLOURS.gridCentre, SCENE_COLOURS.grid);
    grid.position.set(-0.35 * R, -R - 0.0005, 0);
    groups.ground.add(grid);
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
    groups.ground.add(plane);
  }

  function arrow(
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

  function buildForces(f: ViewField): void {
    const R = f.radii.outerRadiusM;
    const biggest = Math.max(Math.abs(f.sideN), Math.abs(f.axialN));
    // The larger force draws up to R long at a round scale (N per m of arrow).
    const nPerM = niceCeil(biggest / R);
    legendInfo.nPerM = nPerM;
    legendInfo.side = f.sideN;
    legendInfo.axial = f.axialN;
    const o = f.forceOriginM;
    const tiny = 0.03 * R;
    const sideLen = Math.abs(f.sideN) / nPerM;
    if (sideLen >= tiny) {
      arrow(groups.forces, o, [0, Math.sign(f.sideN), 0], sideLen, SCENE_COLOURS.sideForce, R);
    }
    // Axial force acts along -x when positive (resisting motion).
    const axialLen = Math.abs(f.axialN) / nPerM;
    if (axialLen >= tiny) {
      arrow(groups.forces, o, [-Math.sign(f.axialN), 0, 0], axialLen, SCENE_COLOURS.axialForce, R);
    }
    // A small sphere marks the centre of pressure.
    const dot = new Mesh(
      new CylinderGeometry(0.018 * R, 0.018 * R, 0.004, 20),
      new MeshBasicMaterial({ color: SCENE_COLOURS.sideForce, depthTest: false }),
    );
    toThree(o[0], o[1], o[2], dot.position);
    dot.rotation.x = Math.PI / 2;
    dot.renderOrder = 6;
    groups.forces.add(dot);
    const cpText = Number.isFinite(f.cpXM) ? 'centre of pressure' : 'hub (no side force)';
    addLabel(
      `side ${formatNumber(f.sideN)} N`,
      [o[0], o[1] + Math.sign(f.sideN || 1) * Math.max(sideLen, tiny), o[2]],
      'forces',
      SCENE_COLOURS.sideForce,
    );
    addLabel(
      `axial ${formatNumber(f.axialN)} N`,
      [o[0] - Math.sign(f.axialN || 1) * Math.max(axialLen, tiny), o[1], o[2] - 0.06 * R],
      'forces',
      SCENE_COLOURS.axialForce,
    );
    addLabel(cpText, [o[0], o[1], o[2] - 0.22 * R], 'forces', '#444');
  }

  function buildSteering(f: ViewField): void {
    const a = f.steeringAxisM;
    const geo = new BufferGeometry();
    geo.setAttribute('position', new Float32BufferAttribute([a[0]!, a[2]!, -a[1]!, a[3]!, a[5]!, -a[4]!], 3));
    const line = new Line(
      geo,
      new LineDashedMaterial({ color: SCENE_COLOURS.steering, dashSize: 0.02, gapSize: 0.012 }),
    );
    line.computeLineDistances();
    groups.steeringAxis.add(line);
    addLabel(
      `steering axis (${((f.headAngleRad * 180) / Math.PI).toFixed(0)}°, ${(f.forkOffsetM * 1000).toFixed(0)} mm offset)`,
      [a[3]!, a[4]!, a[5]!],
      'steeringAxis',
      SCENE_COLOURS.steering,
    );
  }

  function buildCues(f: ViewField): void {
    const R = f.radii.outerRadiusM;
    // Direction of travel, on the ground in front of the wheel (rider's right side).
    arrow(cues, [0.75 * R, -0.55 * R, -R], [1, 0, 0], 0.6 * R, SCENE_COLOURS.travel, R);
    addLabel('travel (+x)', [1.1 * R, -0.55 * R, -R], null, SCENE_COLOURS.travel);
    // Relative wind, upstream.
    const [ux, uy] = f.freestreamMps;
    const speed = Math.hypot(ux, uy) || 1;
    const ex = ux / speed;
    const ey = uy / speed;
    const start: [number, number, number] = [0.9 * R - 1.3 * R * ex, -1.3 * R * ey, 0.8 * R];
    arrow(cues, start, [ex, ey, 0], 0.55 * R, SCENE_COLOURS.wind, R);
    addLabel(
      `wind ${(f.airspeedMps * 3.6).toFixed(1)} km/h, yaw ${((f.yawRad * 180) / Math.PI).toFixed(1)}°`,
      [start[0] + 0.55 * R * ex, start[1] + 0.55 * R * ey, start[2]],
      null,
      SCENE_COLOURS.wind,
    );
  }

  function fillLegend(f: ViewField): void {
    const L = legendInfo.limit;
    tickLo.textContent = `${legendInfo.saturatedLow ? '≤ ' : ''}${formatNumber(-L)}`;
    tickHi.textContent = `${legendInfo.saturatedHigh ? '≥ ' : ''}${formatNumber(L)}`;
    tickMid.textContent = '0';
    legendForces.replaceChildren();
    const line = (colour: string, text: string) => {
      const d = el('div', {}, text);
      const sw = el('span', {
        display: 'inline-block',
        width: '10px',
        height: '3px',
        background: colour,
        margin: '0 5px 3px 0',
        verticalAlign: 'middle',
      });
      d.prepend(sw);
      legendForces.appendChild(d);
    };
    line(SCENE_COLOURS.sideForce, `side force ${formatNumber(f.sideN)} N (+ to the left)`);
    line(SCENE_COLOURS.axialForce, `axial force ${formatNumber(f.axialN)} N (+ resists)`);
    line(SCENE_COLOURS.wakePositive, 'trailing vortices (+ / −)');
    line(SCENE_COLOURS.streamline, 'streamlines');
    const flags = f.flags.length ? ` · flags: ${f.flags.join(', ')}` : '';
    legendNote.textContent = `arrows: ${formatNumber(legendInfo.nPerM)} N per m · wake: a convected sketch${flags}`;
  }

  function update(f: ViewField): void {
    const first = field === null || Math.abs(f.radii.outerRadiusM - radius) > 1e-9;
    field = f;
    radius = f.radii.outerRadiusM;
    for (const g of Object.values(groups)) clearGroup(g);
    clearGroup(cues);
    clearLabels();
    buildWheel(f);
    buildLoading(f);
    buildWake(f);
    buildStreamlines(f);
    buildGround(f);
    buildForces(f);
    buildSteering(f);
    buildCues(f);
    fillLegend(f);
    if (first) resetCamera();
    requestRender();
  }

  async function toPngBlob(): Promise<Blob> {
    renderNow();
    const w = canvas.width;
    const h = canvas.height;
    const out = document.createElement('canvas');
    out.width = w;
    out.height = h;
    const ctx = out.getContext('2d');
    if (!ctx) throw new Error('toPngBlob: no 2D canvas context');
    ctx.drawImage(canvas, 0, 0);
    // The legend, drawn in device pixels.
    const s = w / Math.max(1, canvas.clientWidth);
    ctx.save();
    ctx.scale(s, s);
    ctx.fillStyle = 'rgba(255,255,255,0.88)';
    ctx.fillRect(8, 8, 236, 112);
    ctx.fillStyle = '#222';
    ctx.font = '600 12px system-ui, sans-serif';
    ctx.fillText('Pressure jump ΔCp (windward − leeward)/q', 14, 24);
    const grad = ctx.createLinearGradient(14, 0, 214, 0);
    LOADING_STOPS.forEach((c, i) => {
      grad.addColorStop(i / (LOADING_STOPS.length - 1), `rgb(${c[0]}, ${c[1]}, ${c[2]})`);
    });
    ctx.fillStyle = grad;
    ctx.fillRect(14, 32, 200, 10);
    ctx.strokeStyle = '#999';
    ctx.strokeRect(14, 32, 200, 10);
    ctx.fillStyle = '#222';
    ctx.font = '11px system-ui, sans-serif';
    ctx.textAlign = 'left';
    ctx.fillText(tickLo.textContent ?? '', 14, 55);
    ctx.textAlign = 'center';
    ctx.fillText('0', 114, 55);
    ctx.textAlign = 'right';
    ctx.fillText(tickHi.textContent ?? '', 214, 55);
    ctx.textAlign = 'left';
    ctx.font = '12px system-ui, sans-serif';
    if (field) {
      ctx.fillStyle = SCENE_COLOURS.sideForce;
      ctx.fillText(`side force ${formatNumber(field.sideN)} N`, 14, 74);
      ctx.fillStyle = SCENE_COLOURS.axialForce;
      ctx.fillText(`axial force ${formatNumber(field.axialN)} N`, 14, 90);
      ctx.fillStyle = '#444';
      ctx.fillText(
        `yaw ${((field.yawRad * 180) / Math.PI).toFixed(1)}°, ${(field.airspeedMps * 3.6).toFixed(1)} km/h · arrows ${formatNumber(legendInfo.nPerM)} N/m`,
        14,
        106,
      );
    }
    ctx.restore();
    return new Promise((resolve, reject) => {
      out.toBlob(
        (b) => (b ? resolve(b) : reject(new Error('toPngBlob: the canvas gave no PNG'))),
        'image/png',
      );
    });
  }

  function dispose(): void {
    if (pending) cancelAnimationFrame(pending);
    observer.disconnect();
    controls.removeEventListener('change', requestRender);
    controls.dispose();
    for (const g of Object.values(groups)) clearGroup(g);
    clearGroup(cues);
    disposeTree(scene);
    renderer.dispose();
    canvas.remove();
    labelLayer.remove();
    legend.remove();
    togglesBox.remove();
  }

  resize();
  return {
    canvas,
    update,
    setLayers,
    layers: () => ({ ...state }),
    resetCamera,
    render: renderNow,
    toPngBlob,
    dispose,
  };
}
