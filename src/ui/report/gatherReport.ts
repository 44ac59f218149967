/**
 * Everything the printable report shows, read from the page at one moment: the design and the page's
 * results for it (the caller waits until the page has finished computing), the four plots and the map
 * drawn again for print, the road panel's last ride if it is this design's, the calibration mark, and
 * the validation table (computed once and shared with Help). Nothing here is typed in or invented:
 * every number comes from the state, the results or the model.
 */
import { RIDE_CAUTIONS } from '../../compute/ride/index';
import { kmhToMps } from '../../compute/units';
import { mainPoints } from '../views/pageResults';
import { presentOf } from '../views/present';
import { calibrationText } from './calibrationText';
import { geometryGroups } from './geometryGroups';
import { headlineTable } from './headlineTable';
import { hoistSharedNotes } from './hoistSharedNotes';
import { printXLabel } from './printXLabel';
import { renderPrintMap } from './renderPrintMap';
import { renderPrintPlot } from './renderPrintPlot';
import type { ReportFigure } from './reportFigureDom';
import type { ReportGroup, ReportHost, ReportPlotName, ReportTable } from './reportTypes';
import { rideStatus } from './rideStatus';
import { rideTable } from './rideTable';
import { specFigure } from './specFigure';
import { type ValidationSummary, validationSummary } from './validationSummary';

export interface ReportData {
  designName: string;
  calibration: { calibrated: boolean; text: string };
  geometry: ReportGroup[];
  headline: ReportTable;
  figures: ReportFigure[];
  /** Notes shared by several figures, printed once under the plots' heading. */
  plotNotes: string[];
  ride: { table: ReportTable | null; text: string };
  cautions: readonly string[];
  validation: ValidationSummary | { error: string };
}

/** Print size of one plot (CSS px of the printed image) and its pixel density. */
export const PLOT_PRINT = { widthCssPx: 330, heightCssPx: 190, scale: 3 } as const;
export const MAP_PRINT = { widthCssPx: 340, scale: 3 } as const;

const PLOTS: Array<[ReportPlotName, string]> = [
  ['dragYaw', 'drag-yaw'],
  ['sideYaw', 'side-yaw'],
  ['handling', 'handling'],
  ['dragCover', 'drag-cover'],
];

export async function gatherReport(host: ReportHost): Promise<ReportData> {
  const state = host.state;
  const r = host.results;
  if (host.computePhase() !== 'ready' || !r?.current) {
    throw new Error(
      'the page has no complete results for this design (its computation was cancelled or stopped); change a control or press Reset to compute again',
    );
  }
  const points = mainPoints(r);
  const referenceSpeedMps = kmhToMps(state.case.conditions.reference_speed_kmh);
  const speedUnit = state.view.speedUnit;
  const validation = host.validationReport().then(
    (report) => validationSummary(report),
    (error: unknown) => ({ error: error instanceof Error ? error.message : String(error) }),
  );
  const figures: ReportFigure[] = [];
  for (const [name, id] of PLOTS) {
    const spec = host.reportPlotSpec(name);
    if (!spec) throw new Error(`the plot "${name}" has not been drawn yet`);
    const xTitle = printXLabel(spec, PLOT_PRINT);
    figures.push(specFigure(id, spec, await renderPrintPlot(spec, PLOT_PRINT, xTitle), xTitle));
  }
  const ctx = presentOf(state, r);
  const mapImage = renderPrintMap(ctx, r, MAP_PRINT.widthCssPx, MAP_PRINT.scale);
  figures.push({
    id: 'map',
    title: 'Design map: covered fraction × rim depth',
    alt: 'Design map of the covered fraction and rim depth, with the current design marked',
    image: mapImage,
    legend: [],
    notes: ['White circle: the current design; yellow square: the pinned baseline (when one is pinned).'],
  });
  const plots = hoistSharedNotes(figures);
  const ride = rideStatus(host.lastRide()?.document ?? null, host.rideFor(state));
  return {
    designName: state.case.name ?? 'unnamed design',
    calibration: calibrationText(state.calibration),
    geometry: geometryGroups(state.case, r.rhoKgPerM3, speedUnit),
    headline: headlineTable(points, referenceSpeedMps, speedUnit),
    figures: plots.figures,
    plotNotes: plots.shared.map((n) => (n.startsWith('x: ') ? `Yaw plots, x: ${n.slice(3)}` : n)),
    ride:
      ride.kind === 'current'
        ? {
            table: rideTable(ride.document, speedUnit, referenceSpeedMps),
            text: `The ride of "On the road" (${ride.document.position} wheel) against ${
              state.baseline
                ? `the pinned baseline (${state.baseline.name ?? 'unnamed'})`
                : 'the same wheel without covers (no baseline pinned)'
            }.`,
          }
        : { table: null, text: ride.reason },
    cautions: ride.kind === 'current' ? ride.document.cautions : RIDE_CAUTIONS,
    validation: await validation,
  };
}
