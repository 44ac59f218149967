/** The sweeps' tables: the covering-fraction family and the cover sweep (the map's grid: mapTable.ts). */
import type { Cell, TableColumn } from '../dataTable';
import { fmt, speedFromMps, toDisplay } from '../displayUnits';
import { axisOf, casePoints, type PageResults, pointAt } from './pageResults';
import type { Present } from './present';
import { type Tables, tableFormat } from './tableFormat';

export function renderSweepTables(tables: Tables, ctx: Present, r: PageResults): void {
  const { u, fu, fd, sp, yaws } = tableFormat(ctx);
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
}
