/**
 * The caption block as SVG: a thin rule, then the caption lines (wrapped to the figure's width) in a
 * small font, the CALIBRATED line in bold. Returns the markup and its height.
 */
import { escapeXml } from './escapeXml';
import { wrapText } from './wrapText';

export const CAPTION_FONT_PX = 11;
export const CAPTION_LINE_PX = 15;
export const SVG_FONT = 'system-ui, -apple-system, Segoe UI, Helvetica, Arial, sans-serif';

export function captionSvg(
  lines: readonly string[],
  top: number,
  width: number,
): { svg: string; height: number } {
  const maxChars = Math.max(40, Math.floor((width - 16) / (CAPTION_FONT_PX * 0.56)));
  const parts: string[] = [
    `<g class="caption" font-family="${SVG_FONT}" font-size="${CAPTION_FONT_PX}" fill="#36404d">`,
    `<line x1="8" y1="${top + 4}" x2="${width - 8}" y2="${top + 4}" stroke="#b8bec6" stroke-width="1"/>`,
  ];
  let y = top + 4 + CAPTION_LINE_PX;
  for (const line of lines) {
    const bold = line.startsWith('CALIBRATED');
    for (const piece of wrapText(line, maxChars)) {
      parts.push(
        `<text x="8" y="${y}"${bold ? ' font-weight="700" fill="#8a1c1c"' : ''}>${escapeXml(piece)}</text>`,
      );
      y += CAPTION_LINE_PX;
    }
  }
  parts.push('</g>');
  return { svg: parts.join('\n'), height: y - top + 4 };
}
