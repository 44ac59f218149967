/**
 * Rasterise an SVG figure to a PNG at `scale` device pixels per CSS pixel (2 by default: the 900 px
 * figures become 1800 px wide). The SVG is loaded as an image from a blob URL (the page's
 * Content-Security-Policy allows blob: images); an SVG image without foreign objects leaves the canvas
 * readable.
 */
import type { SvgFigure } from './plotSvg';

export const EXPORT_SCALE = 2;

export async function svgToPng(figure: SvgFigure, scale = EXPORT_SCALE): Promise<Blob> {
  if (!(Number.isFinite(scale) && scale > 0 && scale <= 8)) {
    throw new RangeError(`svgToPng: scale must be in (0, 8] (got ${scale})`);
  }
  const url = URL.createObjectURL(new Blob([figure.svg], { type: 'image/svg+xml' }));
  try {
    const img = new Image();
    img.src = url;
    await img.decode();
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(figure.width * scale);
    canvas.height = Math.round(figure.height * scale);
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('no 2D canvas for the PNG');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('the canvas gave no PNG'))), 'image/png'),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}
