/** `coversweep compare --format table`: the comparison as a readable summary (JSON stays the default). */
import type { CompareReport } from '../compute/compare/index';
import { OUTPUT_LABEL } from '../compute/compare/quantities';
import { bullets, num, table } from './formatTable';

export function formatCompareTable(r: CompareReport): string {
  const unit = (o: string) => (o.endsWith('_Nm') ? 'N m' : 'N');
  let out =
    `${r.data} against ${r.case_name ?? 'the case'}: ${r.converted.length} point(s); airspeed from ${r.conversion.airspeed}, density from ${r.conversion.density}\n\n` +
    (r.flags.length === 0
      ? 'Flags: none (no unit, axis, sign or scaling slip found)\n'
      : `Flags (likely slips):\n${bullets(r.flags.map((f) => `${f.code}: ${f.message}`))}`) +
    '\nResiduals, data - model:\n' +
    table(
      ['output', 'points', 'bias', 'rms', 'relative rms', 'unit'],
      r.residual_summary.map((s) => [
        OUTPUT_LABEL[s.output],
        String(s.points),
        num(s.bias, 3),
        num(s.rms, 3),
        `${num(100 * s.relative_rms, 3)}%`,
        unit(s.output),
      ]),
    );
  const cal = r.calibration;
  if (cal) {
    out +=
      `\nCalibration (${cal.label}; ${cal.converged ? 'converged' : `not converged: ${cal.reason}`}):\n` +
      table(
        ['parameter', 'value', `${Math.round(100 * cal.confidence)}% interval`, 'at a bound'],
        cal.parameters.map((p) => [
          p.name,
          num(p.value, 4),
          p.interval ? `${num(p.interval[0], 3)} .. ${num(p.interval[1], 3)}` : 'not determined',
          p.at_bound ? 'yes' : '',
        ]),
      ) +
      table(
        ['output', 'rms before', 'rms after', 'unit'],
        cal.residuals_after.map((a) => {
          const b = cal.residuals_before.find((x) => x.output === a.output);
          return [OUTPUT_LABEL[a.output], num(b?.rms ?? null, 3), num(a.rms, 3), unit(a.output)];
        }),
      ) +
      (cal.warnings.length > 0 ? `Warnings:\n${bullets(cal.warnings)}` : '');
  }
  if (r.convergence) out += '\nConvergence study: in the JSON report (--format json).\n';
  if (r.uncertainty) out += 'Input-uncertainty band: in the JSON report (--format json).\n';
  return `${out}\nNotes:\n${bullets(r.notes)}`;
}
