// Dev page for the 3D view (not the product page): ?yaw=deg&cover=0..1&v=m/s&layers=a,b,... .
import { viewField } from '../../src/compute/engine/viewField';
import { DEFAULT_MODEL_OPTIONS, DEFAULT_STEERING, DEMO_WHEEL } from '../../src/model/wheel';
import { createWheelView, type ViewLayers } from '../../src/ui/view3d';

const q = new URLSearchParams(location.search);
const yawDeg = Number(q.get('yaw') ?? 10);
const cover = Number(q.get('cover') ?? 0.5);
const v = Number(q.get('v') ?? 13.9);
const t0 = performance.now();
const field = viewField({
  input: {
    wheel: { ...DEMO_WHEEL, coverFraction: cover, coverPlacement: 'rim' },
    options: { ...DEFAULT_MODEL_OPTIONS },
    steering: { ...DEFAULT_STEERING },
    points: [
      {
        airspeedMps: v,
        yawRad: (yawDeg * Math.PI) / 180,
        groundSpeedMps: v,
        rhoKgPerM3: 1.225,
        muPaS: 1.8e-5,
      },
    ],
  },
});
const t1 = performance.now();
const view = createWheelView(document.getElementById('view')!);
view.update(field);
const only = q.get('layers');
if (only !== null) {
  const on = new Set(only.split(','));
  const all = view.layers();
  for (const k of Object.keys(all) as (keyof ViewLayers)[]) all[k] = on.has(k);
  view.setLayers(all);
}
view.render();
const t2 = performance.now();
Object.assign(globalThis, { view, field, timings: { viewFieldMs: t1 - t0, firstRenderMs: t2 - t1 } });
document.title = 'ready';
