/** The design map: covered fraction x rim depth, coloured and contoured by map sources (mapSources.ts). */
import type { DesignMap } from '../designMap';
import { fmt } from '../displayUnits';
import { mapSourceKeys } from './mapRide';
import { mapCells, mapGrid, mapSource } from './mapSources';
import { axisOf, type PageResults } from './pageResults';
import { conditionsText, type Present, setFigTitle } from './present';

export function renderMap(map: DesignMap, ctx: Present, r: PageResults): void {
  const c = ctx.state.case;
  const mode = ctx.mode;
  const plan = r.studies.map;
  const fractions = axisOf(plan, 'coverFraction');
  const depthsM = axisOf(plan, 'rimDepth');
  const yawDeg = axisOf(plan, 'yaw')[0]!;
  const keys = mapSourceKeys(ctx.state);
  const colour = mapSource(keys.colour);
  const contour = mapSource(keys.contour);
  const rideColour = keys.colour.startsWith('ride:');
  const colourLabel = colour.label(ctx, keys.colour.startsWith('ride:') ? 'none' : mode);
  const contourLabel = contour.label(ctx, 'none');
  const rideOnly = rideColour && keys.contour.startsWith('ride:');
  const title = [
    `Colour: ${colourLabel}.  Lines: ${contourLabel}.`,
    rideOnly
      ? 'Each design on the ride “On the road” defines (its speeds, wind and gusts).'
      : `${rideColour || keys.contour.startsWith('ride:') ? 'Model output a' : 'A'}t ${fmt(yawDeg)}° yaw, ${conditionsText(ctx, c.conditions.airspeed_mps[0]!, r.rhoKgPerM3)}.`,
  ];
  setFigTitle(
    'fig-map',
    `Design map: covered fraction × rim depth${rideOnly ? ', ride objectives' : ` at ${fmt(yawDeg)}° yaw`}`,
  );
  const explicit = c.wheel.cover.placement === 'explicit';
  const b = ctx.state.baseline;
  const cells = mapCells(r);
  map.render({
    xs: fractions,
    ys: depthsM.map((d) => d * 1000),
    colour: mapGrid(ctx, cells, colour, rideColour ? 'none' : mode),
    colourLabel,
    diverging: mode !== 'none' && !rideColour,
    contour: mapGrid(ctx, cells, contour, 'none'),
    contourLabel,
    title,
    current: explicit ? null : { x: c.wheel.cover.fraction, y: c.wheel.rim_depth_m * 1000 },
    baseline:
      b && b.wheel.cover.placement !== 'explicit'
        ? { x: b.wheel.cover.fraction, y: b.wheel.rim_depth_m * 1000 }
        : null,
  });
}
