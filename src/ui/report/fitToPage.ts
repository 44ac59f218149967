/**
 * Keep the report on one page: the report is laid out on screen at its printed width (190 mm), so its
 * height there is its printed height; when it is taller than the printable height (PRINTABLE_HEIGHT_MM:
 * Letter, the shorter of A4 and Letter, less its margins and a spare), the print stylesheet scales it down by the factor
 * set here (CSS zoom through the --report-fit property, set through CSSOM: no inline style, so the
 * CSP's style-src 'self' holds). Returns the factor (1 when it fits), also kept in data-fit.
 */
const PX_PER_MM = 96 / 25.4;
/** Letter's height less its 8 mm margins (263.4 mm), less 6 mm kept spare: Chromium breaks the page at
 * a scaled height of 263.3 mm (measured), so the print layout's rounding needs room. */
export const PRINTABLE_HEIGHT_MM = 279.4 - 2 * 8 - 6;

export function fitToPage(page: HTMLElement): number {
  const style = getComputedStyle(page);
  const padding = Number.parseFloat(style.paddingTop) + Number.parseFloat(style.paddingBottom);
  const heightMm = (page.getBoundingClientRect().height - padding) / PX_PER_MM;
  const fit = heightMm > PRINTABLE_HEIGHT_MM ? Math.floor((1000 * PRINTABLE_HEIGHT_MM) / heightMm) / 1000 : 1;
  page.style.setProperty('--report-fit', String(fit));
  page.dataset.fit = String(fit);
  page.dataset.heightMm = heightMm.toFixed(1);
  return fit;
}
