/** The "Print report" button: the report's code is loaded when first asked for (src/ui/report/openReport). */
import { byId } from '../views/present';
import type { ReportHost } from './reportTypes';

export function wireReport(host: ReportHost): void {
  byId('print-report').addEventListener('click', () => {
    void import('./openReport').then(({ openReport }) => openReport(host, () => window.print()));
  });
}
