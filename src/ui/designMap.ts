/**
 * The design map: a small canvas renderer of a field over covering fraction (x) and rim depth (y):
 * bilinearly shaded colour, contour lines of a second field (marching squares) with labels, axes with
 * ticks and titles, a colour bar, and markers for the current design and the baseline.
 */
import { colourScale, cssRgb } from './colourScale';
import { marchingSquares, niceLevels } from './marchingSquares';

export interface MapData {
  /** Grid coordinates (uniformly spaced): covering fractions and rim depths (mm). */
  xs: readonly number[];
  ys: readonly number[];
  /** Row-major values[j * nx + i] (row j = depth ys[j]) in display units; NaN where not computed. */
  colour: Float64Array;
  colourLabel: string;
  diverging: boolean;
  contour: Float64Array;
  contourLabel: string;
  /** Title lines (drawn above the map). */
  title: string[];
  current: { x: number; y: number } | null;
  baseline: { x: number; y: number } | null;
}

const FONT = '12px system-ui, -apple-system, "Segoe UI", sans-serif';
const SMALL = '11px system-ui, -apple-system, "Segoe UI", sans-serif';

function finiteRange(values: Float64Array): [number, number] {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const v of values) {
    if (Number.isFinite(v)) {
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  return [lo, hi];
}

function tickText(v: number): string {
  return String(Number(v.toPrecision(4)));
}

export class DesignMap {
  readonly canvas: HTMLCanvasElement;
  private data: MapData | null = null;
  private readonly observer: ResizeObserver;
  /** The plot area of the last drawing (CSS pixels), for turning a click into a grid cell. */
  private box: { left: number; top: number; pw: number; ph: number } | null = null;
  /** The container's width (CSS pixels) when the resize observer last looked; null before it has. */
  private observedWidth: number | null = null;

  /** `pixelRatio`: canvas pixels per CSS pixel (default: the screen's; the printable report asks for more). */
  constructor(
    private readonly container: HTMLElement,
    private readonly pixelRatio: number | null = null,
  ) {
    this.canvas = document.createElement('canvas');
    this.canvas.setAttribute('role', 'img');
    this.canvas.className = 'map-canvas';
    container.append(this.canvas);
    // The container's width is read here, where the layout is fresh, and kept: a drawing for new numbers
    // then forces no layout of the page (reading it in draw did, each time the page had just changed).
    this.observer = new ResizeObserver(() => {
      this.observedWidth = this.container.clientWidth;
      this.draw();
    });
    this.observer.observe(container);
  }

  render(data: MapData): void {
    this.data = data;
    this.canvas.setAttribute(
      'aria-label',
      `${data.title.join(' ')} Colour: ${data.colourLabel}; contour lines: ${data.contourLabel}. The numbers are in the design map table.`,
    );
    this.draw();
  }

  /** What the map shows now (null before the first results). */
  currentData(): MapData | null {
    return this.data;
  }

  draw(): void {
    const width = Math.max(320, Math.floor(this.observedWidth ?? this.container.clientWidth));
    const height = Math.max(260, Math.min(480, Math.round(width * 0.8)));
    const dpr = this.pixelRatio ?? (window.devicePixelRatio || 1);
    this.canvas.width = Math.round(width * dpr);
    this.canvas.height = Math.round(height * dpr);
    this.canvas.style.width = `${width}px`;
    this.canvas.style.height = `${height}px`;
    const ctx = this.canvas.getContext('2d');
    if (!ctx) return;
    ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, width, height);
    const d = this.data;
    if (!d) return;
    const left = 58;
    const right = 96;
    const top = 14 + 16 * d.title.length;
    const bottom = 44;
    const pw = width - left - right;
    const ph = height - top - bottom;
    this.box = { left, top, pw, ph };
    const nx = d.xs.length;
    const ny = d.ys.length;
    const x0 = d.xs[0]!;
    const x1 = d.xs[nx - 1]!;
    const y0 = d.ys[0]!;
    const y1 = d.ys[ny - 1]!;
    const px = (x: number) => left + ((x - x0) / (x1 - x0)) * pw;
    const py = (y: number) => top + ph - ((y - y0) / (y1 - y0)) * ph;

    ctx.font = FONT;
    ctx.fillStyle = '#1b2430';
    ctx.textBaseline = 'alphabetic';
    d.title.forEach((line, k) => {
      ctx.fillText(line, 8, 16 + 16 * k, width - 16);
    });

    // Colour field, bilinear between grid points.
    const [lo, hi] = finiteRange(d.colour);
    if (!(lo <= hi)) {
      ctx.fillStyle = '#eceae4';
      ctx.fillRect(left, top, pw, ph);
      ctx.fillStyle = '#5b6776';
      ctx.fillText('Computing the design map…', left + 12, top + 24);
      return;
    }
    const scale = colourScale(lo, hi, d.diverging);
    const iw = Math.max(1, Math.round(pw * dpr));
    const ih = Math.max(1, Math.round(ph * dpr));
    const image = ctx.createImageData(iw, ih);
    // Each column's grid cell and fraction, found once for every row.
    const cellOf = new Int32Array(iw);
    const fxOf = new Float64Array(iw);
    for (let c = 0; c < iw; c++) {
      const gx = ((c + 0.5) / iw) * (nx - 1);
      cellOf[c] = Math.min(nx - 2, Math.floor(gx));
      fxOf[c] = gx - cellOf[c]!;
    }
    const pixels = image.data;
    for (let r = 0; r < ih; r++) {
      const gy = (1 - (r + 0.5) / ih) * (ny - 1);
      const j = Math.min(ny - 2, Math.floor(gy));
      const fy = gy - j;
      for (let c = 0; c < iw; c++) {
        const i = cellOf[c]!;
        const fx = fxOf[c]!;
        const a = d.colour[j * nx + i]!;
        const b = d.colour[j * nx + i + 1]!;
        const cc = d.colour[(j + 1) * nx + i + 1]!;
        const dd = d.colour[(j + 1) * nx + i]!;
        const v = (a * (1 - fx) + b * fx) * (1 - fy) + (dd * (1 - fx) + cc * fx) * fy;
        const o = (r * iw + c) * 4;
        if (Number.isFinite(v)) scale.rgbInto(v, pixels, o);
        else pixels[o] = pixels[o + 1] = pixels[o + 2] = 200;
        pixels[o + 3] = 255;
      }
    }
    ctx.putImageData(image, Math.round(left * dpr), Math.round(top * dpr));

    // Contour lines of the second field, with a label on each level.
    const [clo, chi] = finiteRange(d.contour);
    const levels = niceLevels(clo, chi, 6);
    const gx = (g: number) => px(x0 + (g / (nx - 1)) * (x1 - x0));
    const gy = (g: number) => py(y0 + (g / (ny - 1)) * (y1 - y0));
    ctx.lineWidth = 1.2;
    ctx.strokeStyle = 'rgba(12, 16, 24, 0.85)';
    ctx.font = SMALL;
    const labels: Array<{ x: number; y: number; text: string }> = [];
    for (const level of levels) {
      const segs = marchingSquares(d.contour, nx, ny, level);
      if (segs.length === 0) continue;
      ctx.beginPath();
      let best = -1;
      let bestLen = 0;
      for (let s = 0; s < segs.length; s += 4) {
        const ax = gx(segs[s]!);
        const ay = gy(segs[s + 1]!);
        const bx = gx(segs[s + 2]!);
        const by = gy(segs[s + 3]!);
        ctx.moveTo(ax, ay);
        ctx.lineTo(bx, by);
        const len = Math.hypot(bx - ax, by - ay);
        if (len > bestLen) {
          bestLen = len;
          best = s;
        }
      }
      ctx.stroke();
      if (best >= 0) {
        labels.push({
          x: (gx(segs[best]!) + gx(segs[best + 2]!)) / 2,
          y: (gy(segs[best + 1]!) + gy(segs[best + 3]!)) / 2,
          text: tickText(level),
        });
      }
    }
    for (const l of labels) {
      const w = ctx.measureText(l.text).width + 6;
      ctx.fillStyle = 'rgba(255, 255, 255, 0.85)';
      ctx.fillRect(l.x - w / 2, l.y - 8, w, 15);
      ctx.fillStyle = '#111820';
      ctx.textAlign = 'center';
      ctx.fillText(l.text, l.x, l.y + 4);
    }
    ctx.textAlign = 'left';

    // Markers.
    const marker = (p: { x: number; y: number } | null, kind: 'current' | 'baseline') => {
      if (!p) return;
      const mx = px(Math.min(x1, Math.max(x0, p.x)));
      const my = py(Math.min(y1, Math.max(y0, p.y)));
      ctx.lineWidth = 2;
      ctx.strokeStyle = '#000';
      ctx.fillStyle = kind === 'current' ? '#ffffff' : '#ffd23f';
      ctx.beginPath();
      if (kind === 'current') ctx.arc(mx, my, 6, 0, 2 * Math.PI);
      else ctx.rect(mx - 5, my - 5, 10, 10);
      ctx.fill();
      ctx.stroke();
    };
    marker(d.baseline, 'baseline');
    marker(d.current, 'current');

    // Frame and axes.
    ctx.strokeStyle = '#39424e';
    ctx.lineWidth = 1;
    ctx.strokeRect(left, top, pw, ph);
    ctx.fillStyle = '#1b2430';
    ctx.font = SMALL;
    ctx.textAlign = 'center';
    for (const x of niceLevels(x0, x1, 5)) {
      ctx.fillText(tickText(x), px(x), top + ph + 14);
      ctx.beginPath();
      ctx.moveTo(px(x), top + ph);
      ctx.lineTo(px(x), top + ph + 4);
      ctx.stroke();
    }
    ctx.font = FONT;
    ctx.fillText('Covered fraction of the spoked area', left + pw / 2, top + ph + 34);
    ctx.font = SMALL;
    ctx.textAlign = 'right';
    for (const y of niceLevels(y0, y1, 5)) {
      ctx.fillText(tickText(y), left - 6, py(y) + 4);
      ctx.beginPath();
      ctx.moveTo(left - 4, py(y));
      ctx.lineTo(left, py(y));
      ctx.stroke();
    }
    ctx.save();
    ctx.translate(16, top + ph / 2);
    ctx.rotate(-Math.PI / 2);
    ctx.textAlign = 'center';
    ctx.font = FONT;
    ctx.fillText('Rim depth, mm', 0, 0);
    ctx.restore();

    // Colour bar.
    const bx = left + pw + 16;
    const bw = 14;
    for (let r = 0; r < ph; r++) {
      const v = scale.hi - ((r + 0.5) / ph) * (scale.hi - scale.lo);
      ctx.fillStyle = cssRgb(scale.rgb(v));
      ctx.fillRect(bx, top + r, bw, 1.5);
    }
    ctx.strokeRect(bx, top, bw, ph);
    ctx.textAlign = 'left';
    ctx.fillStyle = '#1b2430';
    for (const v of niceLevels(scale.lo, scale.hi, 5)) {
      const y = top + ((scale.hi - v) / (scale.hi - scale.lo)) * ph;
      ctx.fillText(tickText(v), bx + bw + 4, y + 4);
    }
    ctx.save();
    ctx.translate(width - 8, top + ph / 2);
    ctx.rotate(-Math.PI / 2);
    ctx.textAlign = 'center';
    ctx.font = SMALL;
    ctx.fillText(d.colourLabel, 0, 0);
    ctx.restore();
  }

  /**
   * Call `pick(i, j)` with the grid cell nearest a click or Enter/Space press (i along xs, j along ys);
   * clicks outside the plot area are ignored.
   */
  onPick(pick: (i: number, j: number) => void): void {
    this.canvas.addEventListener('click', (event) => {
      const d = this.data;
      const b = this.box;
      if (!d || !b) return;
      const rect = this.canvas.getBoundingClientRect();
      const fx = (event.clientX - rect.left - b.left) / b.pw;
      const fy = 1 - (event.clientY - rect.top - b.top) / b.ph;
      if (fx < 0 || fx > 1 || fy < 0 || fy > 1) return;
      pick(Math.round(fx * (d.xs.length - 1)), Math.round(fy * (d.ys.length - 1)));
    });
  }

  dispose(): void {
    this.observer.disconnect();
    this.canvas.remove();
  }
}
