/**
 * "Print report": build the report of the current design in #report, show it in place of the page (a
 * toolbar offers "Print" again and "Back to the page", as does Escape), then open the browser's print dialog. The
 * print stylesheet (report.css) prints the report alone on one A4 or Letter page. #report's
 * data-state says building, ready or failed.
 */

import { button, el } from '../dom';
import { TOOL_VERSION } from '../export/toolVersion';
import { byId } from '../views/present';
import { buildReport } from './buildReport';
import { fitToPage } from './fitToPage';
import { gatherReport } from './gatherReport';
import { reportDateText } from './reportDateText';
import type { ReportHost } from './reportTypes';
import { waitForPage } from './waitForPage';

function closeReport(root: HTMLElement): void {
  document.body.classList.remove('report-open');
  root.hidden = true;
  root.replaceChildren();
  delete root.dataset.state;
  byId('print-report').focus();
}

function toolbar(root: HTMLElement, print: () => void): HTMLElement {
  root.onkeydown = (e) => {
    if (e.key === 'Escape') closeReport(root);
  };
  return el('div', { className: 'report-toolbar', attrs: { role: 'toolbar', 'aria-label': 'Report' } }, [
    button('Print', print, { id: 'report-print' }),
    button('Back to the page', () => closeReport(root), { id: 'report-close' }),
    el('span', { className: 'small', attrs: { id: 'report-status', role: 'status' } }),
  ]);
}

export async function openReport(host: ReportHost, print: () => void): Promise<void> {
  const root = byId('report');
  if (root.dataset.state === 'building') return;
  const bar = toolbar(root, print);
  const status = bar.querySelector<HTMLElement>('#report-status')!;
  root.replaceChildren(bar);
  root.dataset.state = 'building';
  root.hidden = false;
  document.body.classList.add('report-open');
  status.textContent =
    host.computePhase() === 'computing'
      ? 'Waiting for the page to finish computing this design…'
      : 'Building the report (the validation cases are computed once)…';
  try {
    await waitForPage(() => host.computePhase() === 'computing');
    status.textContent = 'Building the report (the validation cases are computed once)…';
    const data = await gatherReport(host);
    const page = buildReport(data, { version: TOOL_VERSION, date: reportDateText(new Date()) });
    root.replaceChildren(bar, page);
    await Promise.all([...page.querySelectorAll('img')].map((img) => img.decode()));
    fitToPage(page);
    status.textContent = 'The report of the current design, as it prints (one A4 or Letter page).';
    root.dataset.state = 'ready';
    bar.querySelector<HTMLElement>('#report-print')?.focus();
    print();
  } catch (error) {
    status.textContent = `The report could not be built: ${error instanceof Error ? error.message : String(error)}`;
    root.dataset.state = 'failed';
  }
}
