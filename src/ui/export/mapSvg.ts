/**
 * The design map written as a standalone SVG document, as the page draws it (designMap.ts): the colour
 * field shaded bilinearly between grid points (small cells, so it stays vector), contour lines of the
 * second field (marching squares) with their levels, the current design and the baseline, axes, the
 * colour bar and the caption block. Rasterised, it is the map's PNG.
 */
import { colourScale, cssRgb } from '../colourScale';
import type { MapData } from '../designMap';
import { marchingSquares, niceLevels } from '../marchingSquares';
import { captionSvg, SVG_FONT } from './captionSvg';
import { escapeXml } from './escapeXml';
import type { SvgFigure } from './plotSvg';
import { svgCoord, svgTick } from './svgNumbers';

const WIDTH = 900;
const PLOT_H = 520;
const LEFT = 64;
const RIGHT = 110;
/** Most shading cells (sub-cells of the grid) in one SVG. */
const MAX_CELLS = 40_000;

const tick = svgTick;
const r2 = svgCoord;

export function mapSvg(d: MapData, caption: readonly string[]): SvgFigure {
  const nx = d.xs.length;
  const ny = d.ys.length;
  if (nx < 2 || ny < 2 || d.colour.length !== nx * ny || d.contour.length !== nx * ny) {
    throw new RangeError(
      'mapSvg: the map needs at least 2 x 2 grid points and one value per point in each field',
    );
  }
  const top = 18 + 18 * d.title.length;
  const pw = WIDTH - LEFT - RIGHT;
  const ph = PLOT_H;
  const x0 = d.xs[0]!;
  const x1 = d.xs[nx - 1]!;
  const y0 = d.ys[0]!;
  const y1 = d.ys[ny - 1]!;
  const px = (x: number) => LEFT + ((x - x0) / (x1 - x0)) * pw;
  const py = (y: number) => top + ph - ((y - y0) / (y1 - y0)) * ph;
  const out: string[] = [];
  d.title.forEach((line, k) => {
    out.push(
      `<text x="8" y="${20 + 18 * k}" font-size="${k === 0 ? 15 : 12}"${k === 0 ? ' font-weight="600"' : ''} fill="#1b2430">${escapeXml(line)}</text>`,
    );
  });
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const v of d.colour) {
    if (Number.isFinite(v)) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  }
  if (!(lo <= hi)) throw new RangeError('mapSvg: the map has no computed value yet');
  const scale = colourScale(lo, hi, d.diverging);
  // Colour field: each grid cell split into s x s sub-cells, each coloured by the bilinear value at its centre.
  const s = Math.max(1, Math.min(12, Math.floor(Math.sqrt(MAX_CELLS / ((nx - 1) * (ny - 1))))));
  const cw = pw / ((nx - 1) * s);
  const chh = ph / ((ny - 1) * s);
  out.push('<g class="field" shape-rendering="crispEdges">');
  for (let j = 0; j < ny - 1; j++) {
    for (let i = 0; i < nx - 1; i++) {
      const a = d.colour[j * nx + i]!;
      const b = d.colour[j * nx + i + 1]!;
      const c = d.colour[(j + 1) * nx + i + 1]!;
      const e = d.colour[(j + 1) * nx + i]!;
      for (let q = 0; q < s; q++) {
        const fy = (q + 0.5) / s;
        for (let p = 0; p < s; p++) {
          const fx = (p + 0.5) / s;
          const v = (a * (1 - fx) + b * fx) * (1 - fy) + (e * (1 - fx) + c * fx) * fy;
          const fill = Number.isFinite(v) ? cssRgb(scale.rgb(v)) : 'rgb(200,200,200)';
          const x = LEFT + (i * s + p) * cw;
          const y = top + ph - (j * s + q + 1) * chh;
          out.push(
            `<rect x="${r2(x)}" y="${r2(y)}" width="${r2(cw + 0.3)}" height="${r2(chh + 0.3)}" fill="${fill}"/>`,
          );
        }
      }
    }
  }
  out.push('</g>');
  // Contour lines with a label on each level's longest segment.
  let clo = Number.POSITIVE_INFINITY;
  let chi = Number.NEGATIVE_INFINITY;
  for (const v of d.contour) {
    if (Number.isFinite(v)) {
      clo = Math.min(clo, v);
      chi = Math.max(chi, v);
    }
  }
  const gx = (g: number) => px(x0 + (g / (nx - 1)) * (x1 - x0));
  const gy = (g: number) => py(y0 + (g / (ny - 1)) * (y1 - y0));
  out.push('<g class="contours" fill="none" stroke="rgba(12,16,24,0.85)" stroke-width="1.2">');
  const labels: string[] = [];
  for (const level of niceLevels(clo, chi, 6)) {
    const segs = marchingSquares(d.contour, nx, ny, level);
    if (segs.length === 0) continue;
    const path: string[] = [];
    let best = -1;
    let bestLen = 0;
    for (let k = 0; k < segs.length; k += 4) {
      const ax = gx(segs[k]!);
      const ay = gy(segs[k + 1]!);
      const bx = gx(segs[k + 2]!);
      const by = gy(segs[k + 3]!);
      path.push(`M${r2(ax)} ${r2(ay)}L${r2(bx)} ${r2(by)}`);
      const len = Math.hypot(bx - ax, by - ay);
      if (len > bestLen) {
        bestLen = len;
        best = k;
      }
    }
    out.push(`<path data-level="${tick(level)}" d="${path.join('')}"/>`);
    if (best >= 0) {
      const lx = (gx(segs[best]!) + gx(segs[best + 2]!)) / 2;
      const ly = (gy(segs[best + 1]!) + gy(segs[best + 3]!)) / 2;
      const text = tick(level);
      const w = text.length * 6.5 + 6;
      labels.push(
        `<rect x="${r2(lx - w / 2)}" y="${r2(ly - 8)}" width="${r2(w)}" height="15" fill="rgba(255,255,255,0.85)"/>`,
        `<text x="${r2(lx)}" y="${r2(ly + 4)}" text-anchor="middle">${escapeXml(text)}</text>`,
      );
    }
  }
  out.push('</g>', `<g class="contour-labels" font-size="11" fill="#111820">${labels.join('')}</g>`);
  // The baseline (square) and the current design (circle).
  const clampX = (x: number) => px(Math.min(x1, Math.max(x0, x)));
  const clampY = (y: number) => py(Math.min(y1, Math.max(y0, y)));
  if (d.baseline) {
    out.push(
      `<rect class="baseline" x="${r2(clampX(d.baseline.x) - 5)}" y="${r2(clampY(d.baseline.y) - 5)}" width="10" height="10" fill="#ffd23f" stroke="#000" stroke-width="2"/>`,
    );
  }
  if (d.current) {
    out.push(
      `<circle class="current" cx="${r2(clampX(d.current.x))}" cy="${r2(clampY(d.current.y))}" r="6" fill="#fff" stroke="#000" stroke-width="2"/>`,
    );
  }
  // Frame, axes and colour bar.
  out.push(`<rect x="${LEFT}" y="${top}" width="${pw}" height="${ph}" fill="none" stroke="#39424e"/>`);
  out.push('<g font-size="11" fill="#1b2430" stroke="#39424e">');
  for (const x of niceLevels(x0, x1, 5)) {
    out.push(
      `<line x1="${r2(px(x))}" y1="${top + ph}" x2="${r2(px(x))}" y2="${top + ph + 4}"/>`,
      `<text x="${r2(px(x))}" y="${top + ph + 16}" text-anchor="middle" stroke="none">${tick(x)}</text>`,
    );
  }
  for (const y of niceLevels(y0, y1, 5)) {
    out.push(
      `<line x1="${LEFT - 4}" y1="${r2(py(y))}" x2="${LEFT}" y2="${r2(py(y))}"/>`,
      `<text x="${LEFT - 6}" y="${r2(py(y) + 4)}" text-anchor="end" stroke="none">${tick(y)}</text>`,
    );
  }
  out.push('</g>');
  out.push(
    `<text x="${r2(LEFT + pw / 2)}" y="${top + ph + 36}" font-size="12" text-anchor="middle" fill="#1b2430">Covered fraction of the spoked area</text>`,
    `<text transform="translate(16 ${r2(top + ph / 2)}) rotate(-90)" font-size="12" text-anchor="middle" fill="#1b2430">Rim depth, mm</text>`,
  );
  const bx = LEFT + pw + 16;
  const stops: string[] = [];
  for (let k = 0; k <= 16; k++) {
    const v = scale.hi - (k / 16) * (scale.hi - scale.lo);
    stops.push(`<stop offset="${r2(k / 16)}" stop-color="${cssRgb(scale.rgb(v))}"/>`);
  }
  out.push(
    `<rect x="${bx}" y="${top}" width="14" height="${ph}" fill="url(#colour-bar)" stroke="#39424e"/>`,
    '<g font-size="11" fill="#1b2430">',
  );
  for (const v of niceLevels(scale.lo, scale.hi, 5)) {
    const y = top + ((scale.hi - v) / (scale.hi - scale.lo)) * ph;
    out.push(`<text x="${bx + 18}" y="${r2(y + 4)}">${tick(v)}</text>`);
  }
  out.push(
    '</g>',
    `<text transform="translate(${WIDTH - 10} ${r2(top + ph / 2)}) rotate(-90)" font-size="11" text-anchor="middle" fill="#1b2430">${escapeXml(d.colourLabel)}</text>`,
    `<text x="8" y="${top + ph + 58}" font-size="11" fill="#1b2430">${escapeXml(`Colour: ${d.colourLabel}; lines: ${d.contourLabel}; circle: the current design${d.baseline ? '; square: the baseline' : ''}`)}</text>`,
  );
  const cap = captionSvg(caption, top + ph + 64, WIDTH);
  out.push(cap.svg);
  const height = Math.ceil(top + ph + 64 + cap.height);
  const svg = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${height}" viewBox="0 0 ${WIDTH} ${height}" font-family="${SVG_FONT}">`,
    `<title>${escapeXml(d.title.join(' '))}</title>`,
    `<defs><linearGradient id="colour-bar" x1="0" y1="0" x2="0" y2="1">${stops.join('')}</linearGradient></defs>`,
    `<rect width="${WIDTH}" height="${height}" fill="#ffffff"/>`,
    ...out,
    '</svg>',
    '',
  ].join('\n');
  return { svg, width: WIDTH, height };
}
