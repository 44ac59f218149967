/**
 * A line plot (the page's PlotSpec) written as a standalone SVG document: title, axes with ticks and
 * labels (a right axis when a series asks for it), the yaw range beyond the model's trusted range shaded
 * (as on the page), bands, every series (lines, dashes, markers), vertical marker lines, the full legend
 * and the caption block. The same document, rasterised, is the figure's PNG.
 */
import type { PlotSpec } from '../linePlot';
import { niceLevels } from '../marchingSquares';
import { beyondYawIntervals } from '../yawTrust';
import { captionSvg, SVG_FONT } from './captionSvg';
import { escapeXml } from './escapeXml';
import { svgCoord, svgTick } from './svgNumbers';

export interface SvgFigure {
  svg: string;
  /** Size in CSS pixels (the SVG's width and height). */
  width: number;
  height: number;
}

const WIDTH = 900;
const PLOT_H = 360;
const TOP = 40;
const LEFT = 70;
const LEGEND_ROW = 18;
const PER_ROW = 3;

const tick = svgTick;
const r2 = svgCoord;

function range(values: Iterable<number | null>): [number, number] {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const v of values) {
    if (v === null || !Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (!(lo <= hi)) return [0, 1];
  if (lo === hi) return [lo - (Math.abs(lo) || 1) * 0.05, hi + (Math.abs(hi) || 1) * 0.05];
  const pad = (hi - lo) * 0.04;
  return [lo - pad, hi + pad];
}

export function plotSvg(spec: PlotSpec, caption: readonly string[]): SvgFigure {
  if (spec.series.some((s) => s.values.length !== spec.xs.length)) {
    throw new RangeError('plotSvg: every series must have one value per x');
  }
  const hasY2 = spec.series.some((s) => s.scale === 'y2');
  const pw = WIDTH - LEFT - (hasY2 ? 74 : 24);
  const ph = PLOT_H;
  const [x0, x1] = range(spec.xs);
  const yr = range(spec.series.filter((s) => s.scale !== 'y2').flatMap((s) => s.values));
  const y2r = range(spec.series.filter((s) => s.scale === 'y2').flatMap((s) => s.values));
  const px = (x: number) => LEFT + ((x - x0) / (x1 - x0)) * pw;
  const py = (y: number, scale?: 'y' | 'y2') => {
    const [a, b] = scale === 'y2' ? y2r : yr;
    return TOP + ph - ((y - a) / (b - a)) * ph;
  };
  const out: string[] = [];
  out.push(
    `<text x="8" y="24" font-size="15" font-weight="600" fill="#1b2430">${escapeXml(spec.title)}</text>`,
  );
  // Shaded yaw beyond the trusted range (under everything else).
  const finiteXs = spec.xs.filter(Number.isFinite);
  const beyond =
    spec.xIsYawDeg && finiteXs.length > 0
      ? beyondYawIntervals(Math.min(...finiteXs), Math.max(...finiteXs))
      : [];
  for (const [a, b] of beyond) {
    const left = Math.min(px(a), px(b));
    out.push(
      `<rect class="beyond-yaw" x="${r2(left)}" y="${TOP}" width="${r2(Math.abs(px(b) - px(a)))}" height="${ph}" fill="url(#beyond)"/>`,
    );
  }
  // Grid and ticks.
  const axisText = (x: number, y: number, text: string, anchor: string) =>
    `<text x="${r2(x)}" y="${r2(y)}" text-anchor="${anchor}">${escapeXml(text)}</text>`;
  out.push(`<g font-size="11" fill="#1b2430" stroke-width="1">`);
  for (const x of niceLevels(x0, x1, 6)) {
    out.push(`<line x1="${r2(px(x))}" y1="${TOP}" x2="${r2(px(x))}" y2="${TOP + ph}" stroke="#e4e6ea"/>`);
    out.push(axisText(px(x), TOP + ph + 15, tick(x), 'middle'));
  }
  for (const y of niceLevels(yr[0], yr[1], 6)) {
    out.push(`<line x1="${LEFT}" y1="${r2(py(y))}" x2="${LEFT + pw}" y2="${r2(py(y))}" stroke="#e4e6ea"/>`);
    out.push(axisText(LEFT - 6, py(y) + 4, tick(y), 'end'));
  }
  if (hasY2) {
    for (const y of niceLevels(y2r[0], y2r[1], 6))
      out.push(axisText(LEFT + pw + 6, py(y, 'y2') + 4, tick(y), 'start'));
  }
  out.push('</g>');
  out.push(
    `<text x="${r2(LEFT + pw / 2)}" y="${TOP + ph + 36}" font-size="12" text-anchor="middle" fill="#1b2430">${escapeXml(spec.xLabel)}</text>`,
    `<text transform="translate(16 ${r2(TOP + ph / 2)}) rotate(-90)" font-size="12" text-anchor="middle" fill="#1b2430">${escapeXml(spec.yLabel)}</text>`,
  );
  if (hasY2) {
    out.push(
      `<text transform="translate(${WIDTH - 10} ${r2(TOP + ph / 2)}) rotate(90)" font-size="12" text-anchor="middle" fill="#1b2430">${escapeXml(spec.y2Label ?? '')}</text>`,
    );
  }
  // Bands, series and markers, clipped to the plot area.
  out.push('<g clip-path="url(#plot-area)">');
  for (const band of spec.bands ?? []) {
    const up = spec.series[band.upper];
    const low = spec.series[band.lower];
    if (!up || !low) continue;
    const pts: string[] = [];
    const back: string[] = [];
    spec.xs.forEach((x, i) => {
      const a = up.values[i];
      const b = low.values[i];
      if (!Number.isFinite(x) || a === null || b === null || a === undefined || b === undefined) return;
      if (!Number.isFinite(a) || !Number.isFinite(b)) return;
      pts.push(`${r2(px(x))},${r2(py(a, up.scale))}`);
      back.unshift(`${r2(px(x))},${r2(py(b, low.scale))}`);
    });
    if (pts.length > 1)
      out.push(
        `<polygon class="band" points="${[...pts, ...back].join(' ')}" fill="${escapeXml(band.fill)}"/>`,
      );
  }
  spec.series.forEach((s, k) => {
    const stroke = escapeXml(s.stroke);
    const runs: string[][] = [];
    let run: string[] = [];
    const dots: string[] = [];
    spec.xs.forEach((x, i) => {
      const v = s.values[i];
      if (v === null || v === undefined || !Number.isFinite(v) || !Number.isFinite(x)) {
        if (!s.spanGaps && run.length > 0) {
          runs.push(run);
          run = [];
        }
        return;
      }
      const p = `${r2(px(x))},${r2(py(v, s.scale))}`;
      run.push(p);
      dots.push(p);
    });
    if (run.length > 0) runs.push(run);
    const label = escapeXml(s.label);
    out.push(`<g class="series" data-series="${k}" data-label="${label}">`);
    if (!s.pointsOnly) {
      const dash = s.dash ? ` stroke-dasharray="${s.dash.join(' ')}"` : '';
      for (const r of runs) {
        if (r.length > 1)
          out.push(
            `<polyline points="${r.join(' ')}" fill="none" stroke="${stroke}" stroke-width="${s.width ?? 1.5}"${dash} stroke-linejoin="round"/>`,
          );
      }
    }
    const showDots = s.pointsOnly || (!s.noPoints && spec.xs.length <= 16);
    if (showDots) {
      const radius = s.pointsOnly ? 3 : 2;
      for (const d of dots) {
        const [cx, cy] = d.split(',');
        out.push(
          `<circle cx="${cx}" cy="${cy}" r="${radius}" fill="${s.pointsOnly ? stroke : '#fff'}" stroke="${stroke}"/>`,
        );
      }
    }
    out.push('</g>');
  });
  const vlines: Array<[number, string, string]> = [];
  if (spec.markerX !== undefined && spec.markerX !== null)
    vlines.push([spec.markerX, 'rgba(20,20,20,0.55)', '4 4']);
  for (const x of spec.markersX?.xs ?? []) vlines.push([x, spec.markersX!.colour, '2 3']);
  for (const [x, colour, dash] of vlines) {
    out.push(
      `<line x1="${r2(px(x))}" y1="${TOP}" x2="${r2(px(x))}" y2="${TOP + ph}" stroke="${escapeXml(colour)}" stroke-dasharray="${dash}"/>`,
    );
  }
  out.push('</g>');
  out.push(`<rect x="${LEFT}" y="${TOP}" width="${pw}" height="${ph}" fill="none" stroke="#8b939e"/>`);
  // Legend: every series the page's legend shows, three to a row.
  const shown = spec.series.filter((s) => !s.noLegend);
  const legendTop = TOP + ph + 52;
  const colW = (WIDTH - 16) / PER_ROW;
  out.push(`<g class="legend" font-size="11" fill="#1b2430">`);
  shown.forEach((s, k) => {
    const x = 8 + (k % PER_ROW) * colW;
    const y = legendTop + Math.floor(k / PER_ROW) * LEGEND_ROW;
    const dash = s.dash ? ` stroke-dasharray="${s.dash.join(' ')}"` : '';
    out.push(
      s.pointsOnly
        ? `<circle cx="${r2(x + 9)}" cy="${y - 4}" r="3" fill="${escapeXml(s.stroke)}"/>`
        : `<line x1="${r2(x)}" y1="${y - 4}" x2="${r2(x + 18)}" y2="${y - 4}" stroke="${escapeXml(s.stroke)}" stroke-width="${s.width ?? 1.5}"${dash}/>`,
      `<text x="${r2(x + 24)}" y="${y}">${escapeXml(s.label)}</text>`,
    );
  });
  out.push('</g>');
  let y = legendTop + Math.ceil(shown.length / PER_ROW) * LEGEND_ROW;
  if (beyond.length > 0) {
    const note = `Shaded: yaw beyond the model's trusted range (${beyond.map(([a, b]) => `${tick(a)} to ${tick(b)}°`).join(', ')}); points there are computed and flagged, read them as a trend.`;
    out.push(`<text x="8" y="${y}" font-size="11" fill="#5b6776">${escapeXml(note)}</text>`);
    y += LEGEND_ROW;
  }
  const cap = captionSvg(caption, y - 8, WIDTH);
  out.push(cap.svg);
  const height = Math.ceil(y - 8 + cap.height);
  const defs = [
    '<defs>',
    `<clipPath id="plot-area"><rect x="${LEFT}" y="${TOP}" width="${pw}" height="${ph}"/></clipPath>`,
    '<pattern id="beyond" width="9" height="9" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">',
    '<rect width="9" height="9" fill="rgba(120,120,120,0.13)"/><line x1="0" y1="0" x2="0" y2="9" stroke="rgba(90,90,90,0.22)"/>',
    '</pattern>',
    '</defs>',
  ];
  const svg = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${height}" viewBox="0 0 ${WIDTH} ${height}" font-family="${SVG_FONT}">`,
    `<title>${escapeXml(spec.title)}</title>`,
    ...defs,
    `<rect width="${WIDTH}" height="${height}" fill="#ffffff"/>`,
    ...out,
    '</svg>',
    '',
  ].join('\n');
  return { svg, width: WIDTH, height };
}
