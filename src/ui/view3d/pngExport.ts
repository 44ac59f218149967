/** The 3D view as a PNG: the image with the colour legend and the force values drawn onto it. */
import type { ViewField } from '../../compute/engine/protocol';
import { LOADING_STOPS, SCENE_COLOURS } from './colours';
import type { Overlay } from './overlay';
import { formatNumber } from './threeUtil';
import type { LegendInfo } from './types';

/** Call right after a render (the canvas keeps its drawing buffer). */
export async function viewToPng(
  canvas: HTMLCanvasElement,
  overlay: Pick<Overlay, 'tickLo' | 'tickHi'>,
  field: ViewField | null,
  info: LegendInfo,
): Promise<Blob> {
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
  ctx.fillText(overlay.tickLo.textContent ?? '', 14, 55);
  ctx.textAlign = 'center';
  ctx.fillText('0', 114, 55);
  ctx.textAlign = 'right';
  ctx.fillText(overlay.tickHi.textContent ?? '', 214, 55);
  ctx.textAlign = 'left';
  ctx.font = '12px system-ui, sans-serif';
  if (field) {
    ctx.fillStyle = SCENE_COLOURS.sideForce;
    ctx.fillText(`side force ${formatNumber(field.sideN)} N`, 14, 74);
    ctx.fillStyle = SCENE_COLOURS.axialForce;
    ctx.fillText(`axial force ${formatNumber(field.axialN)} N`, 14, 90);
    ctx.fillStyle = '#444';
    ctx.fillText(
      `yaw ${((field.yawRad * 180) / Math.PI).toFixed(1)}°, ${(field.airspeedMps * 3.6).toFixed(1)} km/h · arrows ${formatNumber(info.nPerM)} N/m`,
      14,
      106,
    );
  }
  ctx.restore();
  return new Promise((resolve, reject) => {
    out.toBlob((b) => (b ? resolve(b) : reject(new Error('toPngBlob: the canvas gave no PNG'))), 'image/png');
  });
}
