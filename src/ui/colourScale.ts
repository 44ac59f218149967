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

/** Where the last located `t` fell: the lower stop's index and the fraction towards the next stop. */
let stopIndex = 0;
let stopFraction = 0;

/** Locate `t` (0..1, clamped; NaN: the middle) between the stops (into stopIndex, stopFraction). */
function locate(stops: Rgb[], t: number): void {
  const x = (Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0.5) * (stops.length - 1);
  stopIndex = Math.min(stops.length - 2, Math.floor(x));
  stopFraction = x - stopIndex;
}

function ramp(stops: Rgb[], t: number): Rgb {
  locate(stops, t);
  const a = stops[stopIndex]!;
  const b = stops[stopIndex + 1]!;
  const f = stopFraction;
  return [a[0] + (b[0] - a[0]) * f, a[1] + (b[1] - a[1]) * f, a[2] + (b[2] - a[2]) * f];
}

/** ramp() written into out[o..o+2] (the same arithmetic, without an array per call). */
function rampInto(stops: Rgb[], t: number, out: Uint8ClampedArray, o: number): void {
  locate(stops, t);
  const a = stops[stopIndex]!;
  const b = stops[stopIndex + 1]!;
  const f = stopFraction;
  out[o] = a[0] + (b[0] - a[0]) * f;
  out[o + 1] = a[1] + (b[1] - a[1]) * f;
  out[o + 2] = a[2] + (b[2] - a[2]) * f;
}

export interface ColourScale {
  lo: number;
  hi: number;
  diverging: boolean;
  rgb(value: number): Rgb;
  /** rgb(value) written into a pixel buffer at `offset` (the map's image: no array per pixel). */
  rgbInto(value: number, out: Uint8ClampedArray, offset: number): void;
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
    rgbInto: (v, out, o) => rampInto(diverging ? DIVERGING : SEQUENTIAL, (v - lo) / (hi - lo), out, o),
  };
}

export function cssRgb(c: Rgb): string {
  return `rgb(${Math.round(c[0])}, ${Math.round(c[1])}, ${Math.round(c[2])})`;
}
