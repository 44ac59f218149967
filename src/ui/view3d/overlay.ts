/**
 * The 3D view's overlay: the colour legend and force values (bottom left), the layer switches (top
 * right) and the labels that follow the scene.
 */
import type { Camera } from 'three';
import type { ViewField } from '../../compute/engine/protocol';
import { loadingGradientCss, SCENE_COLOURS } from './colours';
import { el, formatNumber, scratch, toThree } from './threeUtil';
import { LAYER_LABELS, type LegendInfo, type ViewLayers } from './types';

interface Label {
  element: HTMLDivElement;
  /** Model-space anchor. */
  at: [number, number, number];
  layer: keyof ViewLayers | null;
}

export function createOverlay(
  container: HTMLElement,
  canvas: HTMLCanvasElement,
  state: ViewLayers,
  onToggle: (key: keyof ViewLayers, on: boolean) => void,
  onReset: () => void,
) {
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
    box.addEventListener('change', () => onToggle(key, box.checked));
    boxes[key] = box;
    label.append(box, document.createTextNode(` ${LAYER_LABELS[key]}`));
    toggles.appendChild(label);
  }
  const resetButton = el('button', { marginTop: '4px', font, cursor: 'pointer' }, 'Reset view');
  resetButton.type = 'button';
  resetButton.addEventListener('click', () => onReset());
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

  const placeLabels = (camera: Camera): void => {
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

  const fillLegend = (f: ViewField, info: LegendInfo): void => {
    const L = info.limit;
    tickLo.textContent = `${info.saturatedLow ? '≤ ' : ''}${formatNumber(-L)}`;
    tickHi.textContent = `${info.saturatedHigh ? '≥ ' : ''}${formatNumber(L)}`;
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
    legendNote.textContent = `arrows: ${formatNumber(info.nPerM)} N per m · wake: a convected sketch${flags}`;
  };

  return {
    boxes,
    tickLo,
    tickHi,
    addLabel,
    clearLabels,
    placeLabels,
    fillLegend,
    remove: () => {
      labelLayer.remove();
      legend.remove();
      togglesBox.remove();
    },
  };
}

export type Overlay = ReturnType<typeof createOverlay>;
