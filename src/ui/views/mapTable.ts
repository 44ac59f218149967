/** The design map's grid table: every solved design of the map with the map's outputs and conditions. */
import type { Cell, TableColumn } from '../dataTable';
import { fmt, unitShort } from '../displayUnits';
import { OUTPUTS, type OutputKey } from '../outputs';
import { mapCells } from './mapSources';
import { axisOf, type PageResults } from './pageResults';
import { conditionsText, display, type Present } from './present';
import { type Tables, tableFormat } from './tableFormat';

export function renderMapTable(tables: Tables, ctx: Present, r: PageResults): void {
  const { u, fd, ad, c } = tableFormat(ctx);
  const v = ctx.state.view;
  const mapKeys: OutputKey[] = [
    ...new Set<OutputKey>([v.mapColour, v.mapContour, 'axial', 'side', 'steering', 'power']),
  ];
  const mapColumns: TableColumn[] = [
    { header: 'Covered fraction', decimals: 2 },
    { header: 'Rim depth, mm', decimals: 1 },
    ...mapKeys.map((k) => ({
      header: `${OUTPUTS[k].label}, ${unitShort(OUTPUTS[k].kind, u)}`,
      decimals:
        OUTPUTS[k].kind === 'force'
          ? fd
          : OUTPUTS[k].kind === 'moment'
            ? 4
            : OUTPUTS[k].kind === 'area'
              ? ad
              : 2,
    })),
    // The conditions the grid was computed at, on every row, so an exported CSV says them itself.
    { header: 'Yaw, deg', decimals: 2 },
    { header: 'Airspeed, m/s', decimals: 3 },
    { header: 'Air density, kg/m³', decimals: 4 },
  ];
  const mapYawDeg = axisOf(r.studies.map, 'yaw')[0]!;
  const mapSpeedMps = c.conditions.airspeed_mps[0]!;
  const mapRows: Cell[][] = [];
  for (const cell of mapCells(r)) {
    const p = cell.point;
    if (!p) continue;
    mapRows.push([
      cell.coverFraction,
      cell.rimDepthM * 1000,
      ...mapKeys.map((key) => display(ctx, OUTPUTS[key], p)),
      mapYawDeg,
      mapSpeedMps,
      r.rhoKgPerM3,
    ]);
  }
  const mapTable = tables.get('table-map')!;
  mapTable.setCaption(
    `Design map grid at ${fmt(mapYawDeg)}° yaw, ${conditionsText(ctx, mapSpeedMps, r.rhoKgPerM3)}`,
  );
  mapTable.setData(mapColumns, mapRows);
}
