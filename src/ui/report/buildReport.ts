/**
 * The printable report's DOM from its data: a header (design name, the tool's version, the date, the
 * calibration mark), the design, its headline figures, the plots and the map, the ride and handling
 * figures with their cautions, the calibration and the validation status. Text goes in through
 * textContent only (design and data file names are user text).
 */
import { el } from '../dom';
import type { ReportData } from './gatherReport';
import { reportFigureDom } from './reportFigureDom';
import { reportGroupsDom } from './reportGroupsDom';
import { reportSection } from './reportSection';
import { reportTableDom } from './reportTableDom';

export interface ReportStamp {
  version: string;
  date: string;
}

export function buildReport(d: ReportData, stamp: ReportStamp): HTMLElement {
  const v = d.validation;
  return el('article', { className: 'report-page' }, [
    el('header', { className: 'report-header', attrs: { 'data-section': 'header' } }, [
      el('h1', { text: `CoverSweep report: ${d.designName}` }),
      el('p', {
        className: 'report-stamp',
        text: `CoverSweep ${stamp.version} · ${stamp.date} · one wheel; estimates from a reduced-order model`,
      }),
      d.calibration.calibrated ? el('p', { className: 'report-calibrated', text: 'CALIBRATED' }) : null,
    ]),
    reportSection('design', 'Design', [reportGroupsDom(d.geometry)]),
    reportSection('headline', 'Headline figures', [reportTableDom(d.headline, 'report-headline-table')]),
    reportSection('plots', 'Plots', [
      ...d.plotNotes.map((n) => el('p', { className: 'report-note', text: n })),
      el('div', { className: 'report-figures' }, [
        ...d.figures.map(reportFigureDom),
        el('div', { className: 'report-aside' }, [
          el('div', { className: 'report-caution', attrs: { 'data-section': 'cautions' } }, [
            el('h2', { text: 'Handling and safety caution' }),
            el(
              'ul',
              { className: 'report-cautions' },
              d.cautions.map((c) => el('li', { text: c })),
            ),
          ]),
          reportSection('calibration', 'Calibration', [
            el('p', {
              className: d.calibration.calibrated ? 'report-calibrated-text' : '',
              text: d.calibration.text,
            }),
          ]),
        ]),
      ]),
    ]),
    el('div', { className: 'report-bottom' }, [
      reportSection('ride', 'Ride and handling', [
        el('p', { className: 'report-note', text: d.ride.text }),
        d.ride.table ? reportTableDom(d.ride.table, 'report-ride-table') : null,
      ]),
      reportSection('validation', 'Validation', [
        'error' in v
          ? el('p', { text: `The reference cases could not be computed: ${v.error}` })
          : el('div', {}, [
              el('p', { text: `${v.headline} (the Help tab's table; coversweep validate).` }),
              ...v.failures.map((f) => el('p', { className: 'report-note', text: f })),
            ]),
      ]),
    ]),
  ]);
}
