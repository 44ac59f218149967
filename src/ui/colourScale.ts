/**
 * Colour ramps for the design map (our own stops, interpolated in sRGB): a sequential ramp from deep
 * blue-green through sand to brick red, and a diverging ramp (blue - paper - red) for differences,
 * centred on zero.
 */
type Rgb = [number, number, number];

const SEQUENTIAL: Rgb[] = [
  [22, 52, 84],
  [28, 104, 118],
  [86, 156, 124],
  [205, 196, 120],
  [226, 134, 72],
  [160, 48, 44],
];
const DIVERGING: Rgb[] = [
  [36, 84, 140],
  [128, 170, 204],
  [244, 240, 230],
  [220, 140, 110],
  [168, 44, 40],
];

function ramp(stops: Rgb[], t: number): Rgb {
  const x = (Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0.5) * (stops.length - 1);
  const k = Math.min(stops.length - 2, Math.floor(x));
  const f = x - k;
  const a = stops[k]!;
  const b = stops[k + 1]!;
  return [a[0] + (b[0] - a[0]) * f, a[1] + (b[1] - a[1]) * f, a[2] + (b[2] - a[2]) * f];
}

export interface ColourScale {
  lo: number;
  hi: number;
  diverging: boolean;
  rgb(value: number): Rgb;
}

/** A scale over [lo, hi]; a diverging scale is made symmetric about zero. */
export function colourScale(lo: number, hi: number, diverging: boolean): ColourScale {
  if (diverging) {
    const m = Math.max(Math.abs(lo), Math.abs(hi)) || 1;
    lo = -m;
    hi = m;
  } else if (!(hi > lo)) {
    const pad = Math.abs(lo) * 0.01 || 1;
    lo -= pad;
    hi += pad;
  }
  return {
    lo,
    hi,
    diverging,
    rgb: (v) => ramp(diverging ? DIVERGING : SEQUENTIAL, (v - lo) / (hi - lo)),
  };
}

export function cssRgb(c: Rgb): string {
  return `rgb(${Math.round(c[0])}, ${Math.round(c[1])}, ${Math.round(c[2])})`;
}
