/**
 * The 3D view's diverging colour scale for the pressure jump: our own stops, deep blue through a warm
 * paper white to burnt orange, interpolated in sRGB. Blue and orange ends stay apart for the common
 * colour-vision deficiencies (red-green confusions); the middle is light so the sign reads at a glance.
 */
type Rgb = readonly [number, number, number];

export const LOADING_STOPS: readonly Rgb[] = [
  [33, 76, 140],
  [118, 160, 205],
  [245, 242, 233],
  [236, 164, 92],
  [158, 72, 14],
];

/** Colour of t in [-1, 1] (clamped) as 0..1 floats into out[offset..offset+2]. */
export function loadingColour(t: number, out: Float32Array, offset: number): void {
  const u = (Math.min(1, Math.max(-1, t)) + 1) / 2;
  const x = u * (LOADING_STOPS.length - 1);
  const k = Math.min(LOADING_STOPS.length - 2, Math.floor(x));
  const f = x - k;
  const a = LOADING_STOPS[k]!;
  const b = LOADING_STOPS[k + 1]!;
  out[offset] = (a[0] + (b[0] - a[0]) * f) / 255;
  out[offset + 1] = (a[1] + (b[1] - a[1]) * f) / 255;
  out[offset + 2] = (a[2] + (b[2] - a[2]) * f) / 255;
}

/** CSS linear-gradient of the scale, left (-limit) to right (+limit). */
export function loadingGradientCss(): string {
  const stops = LOADING_STOPS.map(
    (c, i) => `rgb(${c[0]}, ${c[1]}, ${c[2]}) ${((100 * i) / (LOADING_STOPS.length - 1)).toFixed(0)}%`,
  );
  return `linear-gradient(to right, ${stops.join(', ')})`;
}

/** Other colours of the scene (CSS hex). */
export const SCENE_COLOURS = {
  background: '#f4f3ef',
  tyre: '#2a2a2c',
  rim: '#8d949b',
  cover: '#9fb6c8',
  spoke: '#4a4d52',
  streamline: '#5b6f80',
  wakePositive: '#6a3d9a',
  wakeNegative: '#1b7f79',
  sideForce: '#c2185b',
  axialForce: '#2e7d32',
  steering: '#333333',
  grid: '#c9c6bd',
  gridCentre: '#a9a59a',
  ground: '#e6e3da',
  travel: '#555555',
  wind: '#3f6fa0',
} as const;
