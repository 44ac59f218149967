/** The data panel's tables: residuals and their summary, the fit, the convergence study, the input band. */
import {
  type CalibrationResult,
  type CompareReport,
  OUTPUT_LABEL,
  PARAMETER_BOUNDS,
} from '../../compute/compare/index';
import type { PackedComparison } from '../../compute/engine/dataTaskTypes';
import { residualRowAt } from '../../compute/engine/packComparison';
import type { Cell } from '../dataTable';
import { fixed, speedFromMps, speedUnitText } from '../displayUnits';
import type { SpeedUnit } from '../viewState';
import type { DataPanelDom } from './dataPanelTypes';

export function renderResiduals(
  dom: DataPanelDom,
  report: CompareReport,
  res: PackedComparison['residuals'],
  speedUnit: SpeedUnit,
): void {
  const su = speedUnitText(speedUnit);
  const cell = (i: number, k: number): Cell => {
    const r = residualRowAt(res, i);
    switch (k) {
      case 0:
        return r.line;
      case 1:
        return r.yaw_deg;
      case 2:
        return speedFromMps(r.airspeed_mps, speedUnit);
      case 3:
        return `${OUTPUT_LABEL[r.output]} (${r.output.endsWith('_Nm') ? 'N m' : 'N'})`;
      case 4:
        return r.data;
      case 5:
        return r.model;
      case 6:
        return r.residual;
      case 7:
        return r.model_uncertainty;
      default:
        return r.within_band === null ? '—' : r.within_band ? 'yes' : 'no';
    }
  };
  dom.residuals.setRows(
    [
      { header: 'Line', decimals: 0 },
      { header: 'Yaw, deg', decimals: 2 },
      { header: `Airspeed, ${su}`, decimals: 2 },
      { header: 'Quantity' },
      { header: 'Data, SI', decimals: 4 },
      { header: 'Model, SI', decimals: 4 },
      { header: 'Data − model, SI', decimals: 4 },
      { header: 'Model ±, SI', decimals: 4 },
      { header: 'Within band' },
    ],
    { count: res.count, cell },
  );
  dom.residualSummary.setData(
    [
      { header: 'Quantity' },
      { header: 'Points', decimals: 0 },
      { header: 'Mean data − model (bias), SI', decimals: 4 },
      { header: 'RMS residual, SI', decimals: 4 },
      { header: 'RMS / RMS of the data, %', decimals: 1 },
    ],
    report.residual_summary.map((s) => [
      OUTPUT_LABEL[s.output],
      s.points,
      s.bias,
      s.rms,
      100 * s.relative_rms,
    ]),
  );
}

export function renderFit(dom: DataPanelDom, c: CalibrationResult | null): void {
  dom.fitBlock.hidden = !c;
  dom.useCalibrated.disabled = !c;
  if (!c) return;
  const rows: Cell[][] = c.parameters.map((p) => [
    p.name,
    p.meaning,
    p.initial,
    p.value,
    p.interval ? p.interval[0] : null,
    p.interval ? p.interval[1] : null,
    p.at_bound ? `at its bound (${PARAMETER_BOUNDS[p.name].join('..')})` : '',
  ]);
  dom.fitTable.setCaption(
    `Fitted to ${c.fitted_to.data} (${c.fitted_to.points} points): values with ${Math.round(100 * c.confidence)} % intervals`,
  );
  dom.fitTable.setData(
    [
      { header: 'Parameter' },
      { header: 'Meaning' },
      { header: 'Before', decimals: 4 },
      { header: 'Fitted', decimals: 4 },
      { header: `${Math.round(100 * c.confidence)} % interval, low`, decimals: 4 },
      { header: `${Math.round(100 * c.confidence)} % interval, high`, decimals: 4 },
      { header: 'Note' },
    ],
    rows,
  );
  const before = c.residuals_before.map((s) => `${OUTPUT_LABEL[s.output]} ${fixed(s.rms, 4)}`).join(', ');
  const after = c.residuals_after.map((s) => `${OUTPUT_LABEL[s.output]} ${fixed(s.rms, 4)}`).join(', ');
  dom.fitText.textContent =
    `RMS residuals before: ${before}; after: ${after}. ${c.converged ? 'Converged' : 'Did not converge'} (${c.reason}) in ${c.iterations} iterations; ` +
    `residual SD ${fixed(c.residual_sd, 4)} N, ${c.degrees_of_freedom} degrees of freedom. ${c.lattice.note}` +
    (c.warnings.length > 0 ? ` Warnings: ${c.warnings.join(' ')}` : '');
}

export function renderConvergence(dom: DataPanelDom, report: CompareReport, speedUnit: SpeedUnit): void {
  const s = report.convergence!;
  const su = speedUnitText(speedUnit);
  dom.convergenceTable.setCaption(
    `Lattice convergence study: ${s.lattices.map((l) => `${l.span}×${l.chord}`).join(', ')} panels (GCI, Celik et al. 2008)`,
  );
  dom.convergenceTable.setData(
    [
      { header: 'Yaw, deg', decimals: 2 },
      { header: `Airspeed, ${su}`, decimals: 2 },
      { header: 'Quantity' },
      { header: 'Fine, SI', decimals: 5 },
      { header: 'Medium, SI', decimals: 5 },
      { header: 'Coarse, SI', decimals: 5 },
      { header: 'Observed order', decimals: 2 },
      { header: 'Extrapolated, SI', decimals: 5 },
      { header: 'GCI, %', decimals: 2 },
      { header: 'GCI (±), SI', decimals: 5 },
      { header: 'Status' },
    ],
    s.rows.map((r) => [
      r.yaw_deg,
      speedFromMps(r.airspeed_mps, speedUnit),
      OUTPUT_LABEL[r.output],
      r.values[0],
      r.values[1],
      r.values[2],
      r.observed_order,
      r.extrapolated,
      r.gci_relative === null ? null : 100 * r.gci_relative,
      r.gci_absolute,
      r.status,
    ]),
  );
}

export function renderUncertainty(dom: DataPanelDom, report: CompareReport, speedUnit: SpeedUnit): void {
  const u = report.uncertainty!;
  const su = speedUnitText(speedUnit);
  dom.uncertaintyTable.setCaption(
    `Input-uncertainty band: ${u.samples} Monte Carlo samples (seed ${u.seed}), ${u.percentiles[0]}–${u.percentiles[1]} percentiles; inputs ${u.ranges.map((r) => `${r.name} ${r.min}..${r.max}`).join(', ')}`,
  );
  dom.uncertaintyTable.setData(
    [
      { header: 'Yaw, deg', decimals: 2 },
      { header: `Airspeed, ${su}`, decimals: 2 },
      { header: 'Quantity' },
      { header: 'Nominal, SI', decimals: 4 },
      { header: 'Lower, SI', decimals: 4 },
      { header: 'Median, SI', decimals: 4 },
      { header: 'Upper, SI', decimals: 4 },
      { header: 'SD, SI', decimals: 4 },
    ],
    u.rows.map((r) => [
      r.yaw_deg,
      speedFromMps(r.airspeed_mps, speedUnit),
      OUTPUT_LABEL[r.output],
      r.nominal,
      r.lower,
      r.median,
      r.upper,
      r.sd,
    ]),
  );
}
