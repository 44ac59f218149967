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
  Color,
  DirectionalLight,
  Group,
  HemisphereLight,
  type Object3D,
  PerspectiveCamera,
  Scene,
  WebGLRenderer,
} from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import type { ViewField } from '../../compute/engine/protocol';
import { SCENE_COLOURS } from './colours';
import { buildCues } from './cuesLayer';
import { buildForces } from './forcesLayer';
import { buildGround } from './groundLayer';
import { buildLoading } from './loadingLayer';
import { createOverlay } from './overlay';
import { viewToPng } from './pngExport';
import { buildSteering } from './steeringLayer';
import { buildStreamlines } from './streamlinesLayer';
import { clearGroup, disposeTree, toThree } from './threeUtil';
import { DEFAULT_LAYERS, type LayerBuilder, type LayerScene, type ViewLayers, type WheelView } from './types';
import { buildWake } from './wakeLayer';
import { buildWheel } from './wheelLayer';

export { DEFAULT_LAYERS, type ViewLayers, type WheelView } from './types';

/** The layers in drawing order: each file builds one (the cues are always shown). */
const BUILDERS: readonly LayerBuilder[] = [
  buildWheel,
  buildLoading,
  buildWake,
  buildStreamlines,
  buildGround,
  buildForces,
  buildSteering,
  buildCues,
];

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

  const overlay = createOverlay(
    container,
    canvas,
    state,
    (key, on) => setLayers({ [key]: on }),
    () => resetCamera(),
  );

  let field: ViewField | null = null;
  let radius = 0.334;
  const legendInfo = { limit: 1, saturatedLow: false, saturatedHigh: false, nPerM: 1, side: 0, axial: 0 };
  const layerScene: LayerScene = { groups, cues, addLabel: overlay.addLabel, legend: legendInfo };

  // The last design's objects, out of the scene and disposed only after the next render: three.js keeps
  // a shader program while a material uses it, so the new layers' materials (the same kinds) find their
  // programs compiled instead of linking them again (measured: linking took about 90 ms of the page's
  // thread per redraw in software WebGL, and as long again in the GPU process).
  let retired: Object3D[] = [];
  const disposeRetired = () => {
    for (const o of retired) disposeTree(o);
    retired = [];
  };
  const retire = (g: Group) => {
    for (const child of [...g.children]) {
      g.remove(child);
      retired.push(child);
    }
  };

  // ---- rendering on demand ----
  let pending = 0;
  // A new design's materials are compiled before it is drawn (compileAsync: with the browser's
  // KHR_parallel_shader_compile the page's thread polls the programs instead of waiting for them; the
  // view's first drawing waited 240 ms in one task in software rendering). Frames wait meanwhile.
  let compiling: Promise<void> | null = null;
  const showLayers = () => {
    for (const key of Object.keys(groups) as (keyof ViewLayers)[]) groups[key].visible = state[key];
  };
  const renderNow = () => {
    pending = 0;
    if (compiling) return;
    showLayers();
    renderer.render(scene, camera);
    disposeRetired();
    overlay.placeLabels(camera);
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
      overlay.boxes[key].checked = v;
    }
    requestRender();
  }

  function update(f: ViewField): void {
    const first = field === null || Math.abs(f.radii.outerRadiusM - radius) > 1e-9;
    field = f;
    radius = f.radii.outerRadiusM;
    for (const g of Object.values(groups)) retire(g);
    retire(cues);
    overlay.clearLabels();
    for (const build of BUILDERS) build(f, layerScene);
    overlay.fillLegend(f, legendInfo);
    if (first) resetCamera();
    showLayers(); // compileAsync compiles the visible objects' materials
    const done = renderer
      .compileAsync(scene, camera)
      .catch(() => undefined)
      .then(() => {
        if (compiling !== done) return; // a later design's compile draws
        compiling = null;
        requestRender();
      });
    compiling = done;
  }

  /** The view as a PNG at least `minWidthPx` device pixels wide (rendered again at a higher pixel ratio). */
  async function toPngBlob(minWidthPx = 0): Promise<Blob> {
    while (compiling) await compiling;
    const ratio = renderer.getPixelRatio();
    const cssWidth = Math.max(1, container.clientWidth);
    const wanted = Math.min(4, Math.max(ratio, minWidthPx / cssWidth));
    if (wanted !== ratio) renderer.setPixelRatio(wanted);
    renderNow();
    // viewToPng copies the canvas before it returns, so the screen's pixel ratio can come back at once.
    const png = viewToPng(canvas, overlay, field, legendInfo);
    if (wanted !== ratio) {
      renderer.setPixelRatio(ratio);
      renderNow();
    }
    return png;
  }

  function dispose(): void {
    if (pending) cancelAnimationFrame(pending);
    observer.disconnect();
    controls.removeEventListener('change', requestRender);
    controls.dispose();
    disposeRetired();
    for (const g of Object.values(groups)) clearGroup(g);
    clearGroup(cues);
    disposeTree(scene);
    renderer.dispose();
    canvas.remove();
    overlay.remove();
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
