/**
 * The printable report in headless Chromium: after a design change, "Print report" builds the report of
 * that design (first without a ride, then with the ride "On the road" evaluated), every section is
 * present and visible in print media while the controls, tabs, buttons and 3D view are not, its
 * numbers agree with the page (headline card, ride document, Help's validation table), its plots are
 * drawn at print resolution, and Chromium's PDF of it is one valid A4 page and one Letter page.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { expect, it } from 'vitest';
import type { RideDocument } from '../../src/compute/ride/index';
import { type AppState, stateToHash } from '../../src/ui/appState';
import { PRINTABLE_HEIGHT_MM } from '../../src/ui/report/fitToPage';
import { describeInBrowser, E2E_OUT, E2E_ROOT, servePage, settled } from './e2eServer';
import { pdfPageCount } from './pdfPageCount';

interface Inspect {
  coversweep: { state(): AppState; ride(): RideDocument | null };
  reportPrints?: number;
}

const ROOT = E2E_ROOT;
const OUT = E2E_OUT;
const VERSION = (JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string }).version;
const SECTIONS = ['header', 'design', 'headline', 'plots', 'cautions', 'calibration', 'ride', 'validation'];
const FIGURES = ['drag-yaw', 'side-yaw', 'handling', 'drag-cover', 'map'];

async function setNumberControl(page: Page, field: string, value: string): Promise<void> {
  const input = page.locator(`[data-field="${field}"] input`).first();
  await input.fill(value);
  await input.press('Enter');
}

/** Click "Print report" (the print dialog replaced by a counter) and wait for the report. */
async function printReport(page: Page): Promise<void> {
  await page.evaluate(() => {
    const w = window as unknown as Inspect & { print(): void };
    w.reportPrints ??= 0;
    w.print = () => {
      w.reportPrints = (w.reportPrints ?? 0) + 1;
    };
  });
  await page.click('#print-report');
  await page.waitForFunction(() => document.getElementById('report')?.dataset.state === 'ready', null, {
    timeout: 180_000,
  });
}

const sectionText = (page: Page, id: string) =>
  page
    .locator(`#report [data-section="${id}"]`)
    .textContent()
    .then((t) => t ?? '');

describeInBrowser('printable report in headless Chromium', () => {
  let browser: Browser;
  let base = '';
  servePage('ui-dist-report', (served) => {
    ({ base, browser } = served);
  });

  it('prints the current design, its figures, ride, calibration and validation on one page', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
    });
    await page.goto(base);
    await settled(page);
    // The page printed without the report (Ctrl+P) leaves out the controls, tabs, buttons and 3D view.
    await page.emulateMedia({ media: 'print' });
    for (const selector of ['#controls', '.tabs', '#print-report', '#pin-baseline', '#fig-3d']) {
      expect(
        await page.locator(selector).first().isVisible(),
        `${selector} hidden when the page prints`,
      ).toBe(false);
    }
    expect(await page.locator('#fig-drag-yaw').isVisible()).toBe(true);
    await page.emulateMedia({ media: 'screen' });

    // Change the design: rim depth 80 mm.
    await setNumberControl(page, 'rimDepthMm', '80');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.rim_depth_m === 0.08,
    );
    await settled(page);

    // First report: no ride evaluated yet.
    await printReport(page);
    expect(await page.evaluate(() => (window as unknown as Inspect).reportPrints)).toBe(1);
    expect(await sectionText(page, 'ride')).toMatch(/No ride was evaluated for this design/);
    expect(await page.locator('#report [data-section="ride"] table').count()).toBe(0);
    await page.click('#report-close');
    expect(await page.locator('#report').isHidden()).toBe(true);
    expect(await page.locator('#controls').isVisible()).toBe(true);

    // Evaluate the ride, then print again.
    await page.click('#tab-road');
    await page.waitForFunction(() => document.getElementById('panel-road')?.dataset.state === 'done', null, {
      timeout: 120_000,
    });
    const ride = (await page.evaluate(() => (window as unknown as Inspect).coversweep.ride()))!;
    expect(ride.ride.design.rim_depth_m).toBe(0.08);
    await printReport(page);
    expect(await page.evaluate(() => (window as unknown as Inspect).reportPrints)).toBe(2);

    await page.emulateMedia({ media: 'print' });
    for (const id of SECTIONS) {
      const section = page.locator(`#report [data-section="${id}"]`);
      expect(await section.count(), `section ${id}`).toBe(1);
      expect(await section.isVisible(), `section ${id} visible in print`).toBe(true);
    }
    for (const id of FIGURES) {
      const img = page.locator(`#report [data-figure="${id}"] img`);
      expect(await img.isVisible(), `figure ${id} visible`).toBe(true);
      const { natural, shown } = await img.evaluate((i: HTMLImageElement) => ({
        natural: i.naturalWidth,
        shown: i.getBoundingClientRect().width,
      }));
      // Print resolution: image pixels per inch as laid out in print (96 CSS px per inch); 300 dpi is
      // the usual floor for printed line art (common practice, no source).
      const dpi = natural / (shown / 96);
      expect(dpi, `figure ${id}: ${natural} px shown ${shown.toFixed(1)} CSS px`).toBeGreaterThanOrEqual(300);
    }
    for (const selector of [
      '#controls',
      '.tabs',
      '.topbar',
      '#print-report',
      '#view3d',
      '.report-toolbar',
      '#headline',
    ]) {
      expect(await page.locator(selector).first().isVisible(), `${selector} hidden in print`).toBe(false);
    }

    // The numbers are the page's: design, headline, ride, calibration, validation, version.
    const design = await sectionText(page, 'design');
    expect(design).toMatch(/Rim depth\s*80\.0 mm/);
    const header = await sectionText(page, 'header');
    expect(header).toContain(`CoverSweep ${VERSION}`);
    expect(header).toMatch(/\d{4}-\d\d-\d\d \d\d:\d\d UTC/);
    await page.emulateMedia({ media: 'screen' });
    await page.click('#report-close');
    const card = (await page.locator('#headline .figure-card .value').first().textContent())!;
    await printReport(page);
    await page.emulateMedia({ media: 'print' });
    // The headline's first row is yaw 0 deg; its first value the axial drag in N, as on the page's card.
    const axialCell = await page
      .locator('#report .report-headline-table tbody tr')
      .first()
      .locator('td')
      .first()
      .textContent();
    expect(`${axialCell} N`, 'report axial drag at 0 deg vs the headline card').toBe(card);
    const powerRow = await page
      .locator('#report .report-ride-table tbody tr')
      .first()
      .locator('td')
      .allTextContents();
    expect(powerRow[0]).toBe(`${ride.power_W.design!.toFixed(1)} W`);
    expect(powerRow[1]).toBe(`${ride.power_W.baseline!.toFixed(1)} W`);
    const cautions = await sectionText(page, 'cautions');
    for (const c of ride.cautions) expect(cautions).toContain(c);
    expect(await sectionText(page, 'calibration')).toMatch(/Not calibrated/);

    const rows = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLElement>('#validation-table tbody tr')].map((tr) => ({
        id: tr.dataset.id ?? '',
        pass: tr.dataset.pass === 'true',
      })),
    );
    expect(rows.length).toBeGreaterThan(0);
    const validation = await sectionText(page, 'validation');
    expect(validation).toContain(
      `${rows.filter((r) => r.pass).length} of ${rows.length} reference cases pass`,
    );
    for (const r of rows.filter((x) => !x.pass)) expect(validation).toContain(r.id);

    // The demo design fits the page as laid out (no scaling down), and Chromium's PDF is one A4 page
    // and one Letter page.
    const fit = await page.locator('#report .report-page').evaluate((e: HTMLElement) => ({ ...e.dataset }));
    console.log(`report height ${fit.heightMm} mm at 190 mm wide, fit ${fit.fit}`);
    expect(fit.fit).toBe('1');
    for (const format of ['A4', 'Letter'] as const) {
      const pdf = await page.pdf({ format, printBackground: true });
      writeFileSync(join(OUT, `report-${format}.pdf`), pdf);
      expect(pdfPageCount(pdf), `${format} pages`).toBe(1);
    }
    expect(errors).toEqual([]);
    await context.close();
  }, 400_000);

  it('stays on one page with three pinned baselines in the legends and a ride (scaled to fit when taller)', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    await page.goto(base);
    await settled(page);
    for (const [k, fraction] of ['0.5', '1', '0.25'].entries()) {
      await page.click('#pin-baseline');
      await page.waitForFunction((n) => {
        const s = (window as unknown as Inspect).coversweep.state();
        return (s.baselines?.length ?? (s.baseline ? 1 : 0)) === n;
      }, k + 1);
      await setNumberControl(page, 'coverFraction', fraction);
      await page.waitForFunction(
        (f) => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === f,
        Number(fraction),
      );
      await settled(page);
    }
    await page.click('#tab-road');
    await page.waitForFunction(() => document.getElementById('panel-road')?.dataset.state === 'done', null, {
      timeout: 120_000,
    });
    await printReport(page);
    await page.emulateMedia({ media: 'print' });
    const legend = await page.locator('#report [data-figure="drag-yaw"] .report-legend li').allTextContents();
    expect(legend.filter((t) => t.startsWith('baseline ')).length).toBe(3);
    const fit = await page.locator('#report .report-page').evaluate((e: HTMLElement) => ({ ...e.dataset }));
    console.log(`report height with 3 baselines ${fit.heightMm} mm at 190 mm wide, fit ${fit.fit}`);
    // The factor brings the height to the printable height (Letter less margins and a spare), or is 1.
    expect(Number(fit.fit)).toBe(
      Math.min(1, Math.floor((1000 * PRINTABLE_HEIGHT_MM) / Number(fit.heightMm)) / 1000),
    );
    for (const format of ['A4', 'Letter'] as const) {
      expect(pdfPageCount(await page.pdf({ format, printBackground: true })), `${format} pages`).toBe(1);
    }
    await context.close();
  }, 300_000);

  it('marks a calibrated model CALIBRATED in the header and the calibration section', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    await page.goto(base);
    await settled(page);
    const s = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    // A link carrying a calibrated model (as "Use the calibrated model" leaves it): invented values.
    const calibrated: AppState = {
      ...s,
      case: { ...s.case, model: { ...s.case.model, porosity_scale: 1.7 } },
      calibration: {
        data: 'invented-tunnel.csv',
        points: 8,
        values: { porosity_scale: 1.7 },
        original: { porosity_scale: 1 },
      },
    };
    const other = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const cal = await other.newPage();
    await cal.goto(`${base}${stateToHash(calibrated)}`);
    await settled(cal);
    expect(
      await cal.evaluate(() => (window as unknown as Inspect).coversweep.state().calibration?.data),
    ).toBe('invented-tunnel.csv');
    await printReport(cal);
    await cal.emulateMedia({ media: 'print' });
    expect(await cal.locator('#report .report-calibrated').textContent()).toBe('CALIBRATED');
    expect(await sectionText(cal, 'calibration')).toContain(
      'CALIBRATED: model fitted to invented-tunnel.csv (8 points): porosity_scale 1.7 (was 1).',
    );
    expect(await sectionText(cal, 'design')).toMatch(/Porosity scale\s*1\.700/);
    const pdf = await cal.pdf({ format: 'A4', printBackground: true });
    expect(pdfPageCount(pdf)).toBe(1);
    await other.close();
    await context.close();
  }, 300_000);
});
