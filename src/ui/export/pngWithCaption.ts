/**
 * A raster figure (the 3D view's PNG) with the caption block drawn under it: the image at its own
 * resolution, a thin rule, and the caption lines wrapped to the width, in a font scaled with the image
 * (`scale` device pixels per CSS pixel, as the SVG figures' PNGs, so the captions read alike).
 */
import { CAPTION_FONT_PX, CAPTION_LINE_PX } from './captionSvg';
import { EXPORT_SCALE } from './svgToPng';
import { wrapText } from './wrapText';

export async function pngWithCaption(
  png: Blob,
  lines: readonly string[],
  scale = EXPORT_SCALE,
): Promise<Blob> {
  if (!(scale > 0)) throw new RangeError(`pngWithCaption: scale must be positive (got ${scale})`);
  const image = await createImageBitmap(png);
  const { width, height } = image;
  const k = scale;
  const cssWidth = width / k;
  const maxChars = Math.max(40, Math.floor((cssWidth - 16) / (CAPTION_FONT_PX * 0.56)));
  const wrapped = lines.flatMap((line) =>
    wrapText(line, maxChars).map((text) => ({ text, bold: line.startsWith('CALIBRATED') })),
  );
  const captionH = (8 + CAPTION_LINE_PX * wrapped.length + 8) * k;
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = Math.ceil(height + captionH);
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('no 2D canvas for the PNG');
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, canvas.width, canvas.height);
  ctx.drawImage(image, 0, 0);
  image.close(); // its width and height read 0 from here on
  ctx.strokeStyle = '#b8bec6';
  ctx.lineWidth = k;
  ctx.beginPath();
  ctx.moveTo(8 * k, height + 4 * k);
  ctx.lineTo(width - 8 * k, height + 4 * k);
  ctx.stroke();
  wrapped.forEach((line, i) => {
    ctx.font = `${line.bold ? '700 ' : ''}${CAPTION_FONT_PX * k}px system-ui, sans-serif`;
    ctx.fillStyle = line.bold ? '#8a1c1c' : '#36404d';
    ctx.fillText(line.text, 8 * k, height + (4 + CAPTION_LINE_PX * (i + 1)) * k);
  });
  return new Promise((resolve, reject) =>
    canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('the canvas gave no PNG'))), 'image/png'),
  );
}
