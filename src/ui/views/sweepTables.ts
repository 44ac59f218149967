/** The sweeps' tables: the covering-fraction family, the cover sweep and the design map grid. */
import type { Cell, TableColumn } from '../dataTable';
import { fmt, speedFromMps, toDisplay, unitShort } from '../displayUnits';
import { OUTPUTS, type OutputKey } from '../outputs';
import { mapCells } from './mapSources';
import { axisOf, casePoints, type PageResults, pointAt } from './pageResults';
import { conditionsText, display, type Present } from './present';
import { type Tables, tableFormat } from './tableFormat';

export function renderSweepTables(tables: Tables, ctx: Present, r: PageResults): void {
  const { u, fu, fd, ad, sp, c, yaws } = tableFormat(ctx);
  // Family.
  const fr = axisOf(r.studies.family, 'coverFraction');
  const famColumns: TableColumn[] = [
    { header: 'Yaw, deg', decimals: 2 },
    ...fr.map((f) => ({ header: `Axial drag at cover ${fmt(f, 3)}, ${fu}`, decimals: fd })),
    ...fr.map((f) => ({ header: `Side force at cover ${fmt(f, 3)}, ${fu}`, decimals: fd })),
  ];
  const famRows: Cell[][] = yaws.map((yaw, i) => [
    yaw,
    ...fr.map((_, k) => {
      const p = pointAt(r.family, { coverFraction: k, airspeed: 0, yaw: i });
      return p ? toDisplay(p.axialN, 'force', u, p) : null;
    }),
    ...fr.map((_, k) => {
      const p = pointAt(r.family, { coverFraction: k, airspeed: 0, yaw: i });
      return p ? toDisplay(p.sideN, 'force', u, p) : null;
    }),
  ]);
  tables.get('table-family')!.setData(famColumns, famRows);
  // Cover.
  const coverPlan = r.studies.cover;
  const coverFractions = axisOf(coverPlan, 'coverFraction');
  const speedsMps = axisOf(coverPlan, 'airspeed');
  const yawsDeg = axisOf(coverPlan, 'yaw');
  const coverBase = r.baseline ? casePoints(r.baseline.cover) : null;
  const coverColumns: TableColumn[] = [
    { header: 'Covered fraction', decimals: 2 },
    { header: `Airspeed, ${sp}`, decimals: 2 },
    { header: 'Yaw, deg', decimals: 2 },
    { header: `Axial drag, ${fu}`, decimals: fd },
    { header: `Side force, ${fu}`, decimals: fd },
    { header: 'Steering moment, N m', decimals: 4 },
    { header: 'Power, W', decimals: 3 },
    ...(coverBase
      ? [
          { header: `Axial drag − baseline, ${fu}`, decimals: fd },
          { header: 'Power − baseline, W', decimals: 3 },
          { header: 'Axial drag vs baseline, %', decimals: 1 },
        ]
      : []),
  ];
  const coverRows: Cell[][] = [];
  coverFractions.forEach((fraction, fi) => {
    speedsMps.forEach((v, si) => {
      yawsDeg.forEach((yaw, yi) => {
        const p = pointAt(r.cover, { coverFraction: fi, airspeed: si, yaw: yi });
        if (!p) return;
        const b = coverBase
          ? (pointAt(r.baseline!.cover, { airspeed: si, yaw: yi }) ?? undefined)
          : undefined;
        coverRows.push([
          fraction,
          speedFromMps(v, u.speed),
          yaw,
          toDisplay(p.axialN, 'force', u, p),
          toDisplay(p.sideN, 'force', u, p),
          p.steeringMomentNm,
          p.powerW,
          ...(b
            ? [
                toDisplay(p.axialN, 'force', u, p) - toDisplay(b.axialN, 'force', u, b),
                p.powerW - b.powerW,
                (100 * (p.axialN - b.axialN)) / Math.abs(b.axialN),
              ]
            : []),
        ]);
      });
    });
  });
  tables.get('table-cover')!.setData(coverColumns, coverRows);
  // Map.
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
