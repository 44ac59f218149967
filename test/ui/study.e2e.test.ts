import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { expect, it } from 'vitest';
import { designContext } from '../../src/compute/design/designContext';
import { applyDesign } from '../../src/compute/design/designVariables';
import { evaluateDesign } from '../../src/compute/design/evaluateDesign';
import type { StudyDocument } from '../../src/compute/design/index';
import type { RideFile } from '../../src/compute/ride/index';
import type { AppState } from '../../src/ui/appState';
import { describeInBrowser, E2E_OUT, servePage, settled } from './e2eServer';

interface Inspect {
  coversweep: { state(): AppState; study(): StudyDocument | null };
}

const OUT = E2E_OUT;

const state = (page: Page) => page.evaluate(() => (window as unknown as Inspect).coversweep.state());
const studyDoc = (page: Page) => page.evaluate(() => (window as unknown as Inspect).coversweep.study());

async function studyStatus(page: Page, states: string[]): Promise<string> {
  await page.waitForFunction(
    (states) => states.includes(document.getElementById('study-status')?.dataset.state ?? ''),
    states,
    { timeout: 240_000 },
  );
  return page.evaluate(() => document.getElementById('study-status')?.dataset.state ?? '');
}

describeInBrowser('design study tab in headless Chromium', () => {
  let browser: Browser;
  let base = '';
  const errors: string[] = [];
  servePage('ui-dist-study', (served) => {
    ({ base, browser } = served);
  });

  it('runs the 6 x 4 grid study; its optimum is the brute-force best cell; a row becomes the current design, with undo', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
    });
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(base);
    await settled(page);
    await page.click('#tab-study');
    await page.waitForSelector('#study-run');
    // The 6 x 4 grid is the default; state a steering-moment limit (an invented figure, as in the example).
    await page.locator('#study-limits-steering_gust_Nm').fill('2.5');
    await page.locator('#study-limits-steering_gust_Nm').blur();
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().study?.limits.steering_gust_Nm === 2.5,
    );
    const before = await state(page);
    expect(before.study!.coverFraction.points).toBe(6);
    expect(before.study!.rimDepthMm.points).toBe(4);
    expect(before.study!.method).toBe('grid');

    const started = Date.now();
    await page.click('#study-run');
    expect(await studyStatus(page, ['done', 'error'])).toBe('done');
    const seconds = (Date.now() - started) / 1000;
    process.stderr.write(`\n[study] 6 x 4 grid study: ${seconds.toFixed(1)} s from Run to the result\n`);
    expect(seconds, 'generous bound (the issue asks for under 10 s on this machine)').toBeLessThan(60);

    const doc = (await studyDoc(page))!;
    expect(doc.designs.length).toBe(24);
    expect(await page.locator('#study-results .design-table tbody tr').count()).toBe(24);
    expect(await page.locator('#study-results .optimum-summary').count()).toBe(1);
    expect(await page.locator('#study-results .plot-card canvas').count()).toBeGreaterThan(0);

    // The brute force, in Node, on the ride the page used and the same lattice.
    const ride = doc.ride as RideFile;
    const ctx = designContext(ride, { span: doc.search.lattice_span, chord: doc.search.lattice_chord });
    let best: { cf: number; rd: number; time: number; excess: number } | null = null;
    for (let i = 0; i < 6; i++) {
      for (let j = 0; j < 4; j++) {
        const values = { cover_fraction: i / 5, rim_depth_m: (30 + j * 20) / 1000 };
        const o = evaluateDesign(ctx, applyDesign(ride.design, values), values).objectives;
        const excess = Math.max(0, o.steering_gust_Nm! / 2.5 - 1);
        const better =
          best === null ||
          (excess === 0 && best.excess > 0) ||
          (excess === 0 && best.excess === 0 && o.time_s! < best.time) ||
          (excess > 0 && best.excess > 0 && excess < best.excess);
        if (better) best = { cf: values.cover_fraction, rd: values.rim_depth_m, time: o.time_s!, excess };
      }
    }
    const opt = doc.optimum;
    const got = `page optimum ${JSON.stringify(opt.design)} time ${opt.objectives.time_s} s`;
    expect(opt.design.cover_fraction as number, `${got}; brute force ${JSON.stringify(best)}`).toBeCloseTo(
      best!.cf,
      9,
    );
    expect(opt.design.rim_depth_m as number, got).toBeCloseTo(best!.rd, 9);
    expect(opt.objectives.time_s, got).toBe(best!.time);
    expect(doc.feasible).toBe(best!.excess === 0);

    // A row that is not the current design becomes the current design; Undo brings the earlier one back.
    const w0 = before.case.wheel;
    const pick = doc.designs.find(
      (d) =>
        Math.abs((d.design.cover_fraction as number) - w0.cover.fraction) > 1e-9 ||
        Math.abs((d.design.rim_depth_m as number) - w0.rim_depth_m) > 1e-9,
    )!;
    await page.click(`#study-results .design-table tbody tr[data-index="${pick.index}"]`);
    await page.waitForFunction(
      (f) =>
        Math.abs((window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction - f) < 1e-12,
      pick.design.cover_fraction as number,
    );
    const after = await state(page);
    expect(after.case.wheel.rim_depth_m).toBeCloseTo(pick.design.rim_depth_m as number, 12);
    expect(
      await page.getAttribute(
        `#study-results .design-table tbody tr[data-index="${pick.index}"]`,
        'aria-selected',
      ),
    ).toBe('true');
    expect(await page.locator('#study-current').textContent()).toContain(
      `rim depth ${Math.round((pick.design.rim_depth_m as number) * 1000)}`,
    );
    // Choosing one of the study's designs keeps the result current (only the inputs, ride or wheel matter).
    expect(await studyStatus(page, ['done', 'stale'])).toBe('done');
    await page.screenshot({ path: join(OUT, 'ui-study-1280x800.png') });
    await page.click('#study-undo');
    await page.waitForFunction(
      (f) =>
        Math.abs((window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction - f) < 1e-12,
      w0.cover.fraction,
    );
    expect((await state(page)).case.wheel.rim_depth_m).toBe(w0.rim_depth_m);

    await page.locator('#panel-study').screenshot({ path: join(OUT, 'ui-study-panel-1280.png') });

    // The design map coloured by a ride objective, computed in the background over the map's cells.
    await page.click('#tab-map');
    await page.selectOption('#map-ride select >> nth=0', 'time_s');
    const mapDone = await page
      .waitForFunction(
        () => (document.getElementById('map-ride-status')?.textContent ?? '').startsWith('Each cell'),
        null,
        { timeout: 240_000 },
      )
      .then(() => true)
      .catch(() => false);
    const mapStatus = await page.evaluate(() => ({
      text: document.getElementById('map-ride-status')?.textContent ?? '(none)',
      page: document.body.dataset.state ?? '',
    }));
    expect(
      mapDone,
      `map ride objectives never finished; status "${mapStatus.text}", page ${mapStatus.page}`,
    ).toBe(true);
    expect((await state(page)).study?.mapColour).toBe('time_s');
    await page.locator('#fig-map').screenshot({ path: join(OUT, 'ui-study-map.png') });

    // The study's inputs travel in the link; its result is recomputed, not stored.
    const url = page.url();
    const again = await context.newPage();
    await again.goto(url);
    await settled(again);
    expect((await state(again)).study).toEqual((await state(page)).study);
    expect(await studyDoc(again)).toBeNull();
    await context.close();
    expect(errors).toEqual([]);
  }, 600_000);
});
