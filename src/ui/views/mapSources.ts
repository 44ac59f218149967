/**
 * What the design map can be coloured and contoured by: a registry of sources, each giving one number
 * per design cell (rim depth x covering fraction) of the map study. The model's outputs at the map's
 * yaw angle are registered here; a new objective (a ride figure per design, say) is one more
 * registerMapSource call with its own label and cell function.
 */
import type { PointResult } from '../../compute/study/modelResults';
import { MAP_OUTPUT_KEYS, OUTPUTS, type OutputSpec } from '../outputs';
import type { DifferenceMode } from '../viewState';
import { axisOf, type PageResults, pointAt } from './pageResults';
import { compared, comparedLabel, type Present } from './present';

/** One design of the map as a source sees it. */
export interface MapCell {
  rimDepthIndex: number;
  coverFractionIndex: number;
  rimDepthM: number;
  coverFraction: number;
  /** The design's solved point at the map's airspeed and yaw, or null while it is not solved. */
  point: PointResult | null;
  /** The pinned baseline's point at the same conditions, if any. */
  baseline: PointResult | undefined;
}

export interface MapSource {
  key: string;
  /** The colour bar's or the contour lines' title, with its unit. */
  label(ctx: Present, mode: DifferenceMode): string;
  /** The number drawn for one design (NaN: not available). */
  value(ctx: Present, cell: MapCell, mode: DifferenceMode): number;
}

const SOURCES = new Map<string, MapSource>();

export function registerMapSource(source: MapSource): void {
  SOURCES.set(source.key, source);
}

export function mapSource(key: string): MapSource {
  const s = SOURCES.get(key);
  if (!s)
    throw new RangeError(
      `map source "${key}" is not registered (sources: ${[...SOURCES.keys()].join(', ')})`,
    );
  return s;
}

function outputSource(spec: OutputSpec): MapSource {
  return {
    key: spec.key,
    label: (ctx, mode) => comparedLabel(ctx, spec, mode),
    value: (ctx, cell, mode) =>
      cell.point ? compared(ctx, spec, cell.point, cell.baseline, mode) : Number.NaN,
  };
}

for (const key of MAP_OUTPUT_KEYS) registerMapSource(outputSource(OUTPUTS[key]));

/** The map's cells, rim depth outer and covering fraction inner (the map study's case axes). */
export function mapCells(r: PageResults): MapCell[] {
  const depths = axisOf(r.studies.map, 'rimDepth');
  const fractions = axisOf(r.studies.map, 'coverFraction');
  const baseline = r.baseline ? (pointAt(r.baseline.map, { airspeed: 0, yaw: 0 }) ?? undefined) : undefined;
  const cells: MapCell[] = [];
  depths.forEach((rimDepthM, rimDepthIndex) => {
    fractions.forEach((coverFraction, coverFractionIndex) => {
      const at = { rimDepth: rimDepthIndex, coverFraction: coverFractionIndex, airspeed: 0, yaw: 0 };
      cells.push({
        rimDepthIndex,
        coverFractionIndex,
        rimDepthM,
        coverFraction,
        point: pointAt(r.map, at),
        baseline,
      });
    });
  });
  return cells;
}

/** A source's values over the map, row-major (row = rim depth), as the map draws them. */
export function mapGrid(
  ctx: Present,
  cells: readonly MapCell[],
  source: MapSource,
  mode: DifferenceMode,
): Float64Array {
  return Float64Array.from(cells, (cell) => source.value(ctx, cell, mode));
}
