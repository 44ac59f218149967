/** The current design's tables: every point, the components, and the comparison with the baseline. */
import { COMPONENT_NAMES } from '../../compute/caseFile';
import type { Cell, TableColumn } from '../dataTable';
import { speedFromMps, toDisplay } from '../displayUnits';
import { allPoints, casePoints, mainPoints, type PageResults } from './pageResults';
import type { Present } from './present';
import { byId } from './present';
import { type Tables, tableFormat } from './tableFormat';

export function renderCurrentTables(tables: Tables, ctx: Present, r: PageResults): void {
  const { u, fu, au, fd, ad, refText, sp, yaws } = tableFormat(ctx);
  // Current design.
  const curColumns: TableColumn[] = [
    { header: 'Yaw, deg', decimals: 2 },
    { header: `Airspeed, ${sp}`, decimals: 2 },
    { header: `Axial drag, ${fu}`, decimals: fd },
    { header: `Axial drag, gf at ${refText}`, decimals: 1 },
    { header: `Axial lattice ±, ${fu}`, decimals: fd },
    { header: `Side force, ${fu}`, decimals: fd },
    { header: `Side lattice ±, ${fu}`, decimals: fd },
    { header: `Vertical force, ${fu}`, decimals: fd },
    { header: `Wind-axis drag, ${fu}`, decimals: fd },
    { header: `Wind-axis lift, ${fu}`, decimals: fd },
    { header: 'CP ahead of hub, mm', decimals: 1 },
    { header: 'CP above hub, mm', decimals: 1 },
    { header: 'Yaw moment, N m', decimals: 4 },
    { header: 'Roll moment, N m', decimals: 4 },
    { header: 'Steering moment, N m', decimals: 4 },
    { header: 'Axle torque, N m', decimals: 5 },
    { header: 'Power, W', decimals: 3 },
    { header: `Drag area, ${au}`, decimals: ad },
    { header: 'Flags' },
  ];
  const curRows: Cell[][] = allPoints(r).map((p, i) => [
    yaws[i % yaws.length]!,
    speedFromMps(p.airspeedMps, u.speed),
    toDisplay(p.axialN, 'force', u, p),
    toDisplay(p.axialN, 'force', { ...u, force: 'gf' }, p),
    toDisplay(p.uncertaintyAxialN, 'force', u, p),
    toDisplay(p.sideN, 'force', u, p),
    toDisplay(p.uncertaintySideN, 'force', u, p),
    toDisplay(p.verticalN, 'force', u, p),
    toDisplay(p.windDragN, 'force', u, p),
    toDisplay(p.windLiftN, 'force', u, p),
    p.cpXM * 1000,
    p.cpZM * 1000,
    p.yawMomentNm,
    p.rollMomentNm,
    p.steeringMomentNm,
    p.axleTorqueNm,
    p.powerW,
    toDisplay(p.cdaAxialM2, 'area', u, p),
    p.flags.join(' '),
  ]);
  tables.get('table-current')!.setData(curColumns, curRows);
  // Components.
  const names = COMPONENT_NAMES;
  const compColumns: TableColumn[] = [
    { header: 'Yaw, deg', decimals: 2 },
    ...names.map((n) => ({ header: `${n.replace('_', ' & ')} axial, ${fu}`, decimals: fd })),
    ...names.map((n) => ({ header: `${n.replace('_', ' & ')} axle torque, N m`, decimals: 5 })),
    { header: `Total axial, ${fu}`, decimals: fd },
  ];
  const compRows: Cell[][] = mainPoints(r).map((p, i) => [
    yaws[i]!,
    ...names.map((n) => toDisplay(-p.components[n].fxN, 'force', u, p)),
    ...names.map((n) => p.components[n].axleTorqueNm),
    toDisplay(p.axialN, 'force', u, p),
  ]);
  tables.get('table-components')!.setData(compColumns, compRows);
  // Baseline.
  const block = byId('table-baseline-block');
  const bpts = r.baseline ? casePoints(r.baseline.curve) : null;
  block.hidden = !bpts;
  if (bpts) {
    const pts = mainPoints(r);
    tables.get('table-baseline')!.setData(
      [
        { header: 'Yaw, deg', decimals: 2 },
        { header: `Baseline axial drag, ${fu}`, decimals: fd },
        { header: `This design's axial drag, ${fu}`, decimals: fd },
        { header: `Difference, ${fu}`, decimals: fd },
        { header: 'Difference, gf at reference speed', decimals: 1 },
        { header: 'Power difference, W', decimals: 3 },
        { header: 'Axial drag difference, %', decimals: 1 },
        { header: `Baseline side force, ${fu}`, decimals: fd },
        { header: `This design's side force, ${fu}`, decimals: fd },
        { header: 'Baseline steering moment, N m', decimals: 4 },
        { header: "This design's steering moment, N m", decimals: 4 },
      ],
      pts.map((p, i) => {
        const b = bpts[i]!;
        const gf = { ...u, force: 'gf' as const };
        return [
          yaws[i]!,
          toDisplay(b.axialN, 'force', u, b),
          toDisplay(p.axialN, 'force', u, p),
          toDisplay(p.axialN, 'force', u, p) - toDisplay(b.axialN, 'force', u, b),
          toDisplay(p.axialN, 'force', gf, p) - toDisplay(b.axialN, 'force', gf, b),
          p.powerW - b.powerW,
          (100 * (p.axialN - b.axialN)) / Math.abs(b.axialN),
          toDisplay(b.sideN, 'force', u, b),
          toDisplay(p.sideN, 'force', u, p),
          b.steeringMomentNm,
          p.steeringMomentNm,
        ];
      }),
    );
  }
}
