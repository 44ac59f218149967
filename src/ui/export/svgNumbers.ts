/** Numbers as SVG text: an axis tick to 4 significant digits, a coordinate to 0.01 px. */
export const svgTick = (v: number): string => String(Number(v.toPrecision(4)));
export const svgCoord = (v: number): string => String(Math.round(v * 100) / 100);
