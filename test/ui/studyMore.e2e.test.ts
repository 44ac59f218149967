import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { expect, it } from 'vitest';
import type { StudyDocument } from '../../src/compute/design/index';
import type { AppState } from '../../src/ui/appState';
import { describeInBrowser, E2E_OUT, servePage, settled } from './e2eServer';

interface Inspect {
  coversweep: { state(): AppState; study(): StudyDocument | null };
}

const OUT = E2E_OUT;

describeInBrowser('more design variables in the study tab', () => {
  let browser: Browser;
  let base = '';
  servePage('ui-dist-study-more', (served) => {
    ({ base, browser } = served);
  });

  it('varies the covered sides too, refuses a bad spoke count beside it, and a chosen row takes its sides', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    const state = () => page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    await page.goto(base);
    await settled(page);
    await page.click('#tab-study');
    await page.waitForSelector('#study-run');

    // A spoke count the study file refuses: the rule beside the input; the state keeps the last valid
    // list (the starting 16, 20, 24 the tick applied).
    await page.check('#study-free-spokeCount');
    await page.fill('#study-spokeCount', '16, 300');
    await page.locator('#study-spokeCount').blur();
    await page.waitForFunction(
      () => (document.getElementById('study-free-spokeCount-error')?.textContent ?? '') !== '',
    );
    expect(await page.textContent('#study-free-spokeCount-error')).toContain(
      'variables.spoke_count[1]: must be an integer from 0 to 200, got 300',
    );
    expect((await state()).study?.spokeCount).toEqual([16, 20, 24]);
    await page.uncheck('#study-free-spokeCount');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().study?.spokeCount === undefined,
    );

    // Both covered sides: twice the default grid's 24 designs. (The tyre width is ticked only for a look.)
    await page.check('#study-free-tyreWidthMm');
    await page.check('#study-free-coverSides');
    await page.locator('.study-more').screenshot({ path: join(OUT, 'ui-study-more.png') });
    await page.uncheck('#study-free-tyreWidthMm');
    await page.waitForFunction(
      () => JSON.stringify((window as unknown as Inspect).coversweep.state().study?.coverSides) === '[1,2]',
    );
    await page.click('#study-run');
    await page.waitForFunction(
      () => ['done', 'error'].includes(document.getElementById('study-status')?.dataset.state ?? ''),
      null,
      { timeout: 240_000 },
    );
    expect(await page.getAttribute('#study-status', 'data-state')).toBe('done');
    const doc = (await page.evaluate(() => (window as unknown as Inspect).coversweep.study()))!;
    expect(doc.designs.length).toBe(48);
    const sides = (await state()).case.wheel.cover.sides;
    const other = doc.designs.find((d) => d.design.cover_sides !== sides)!;
    await page.click(`#study-results .design-table tbody tr[data-index="${other.index}"]`);
    await page.waitForFunction(
      (s) => (window as unknown as Inspect).coversweep.state().case.wheel.cover.sides === s,
      other.design.cover_sides,
    );
    const after = (await state()).case.wheel;
    expect(after.cover.fraction).toBeCloseTo(other.design.cover_fraction as number, 12);
    expect(after.rim_depth_m).toBeCloseTo(other.design.rim_depth_m as number, 12);
    // Choosing one of its designs keeps the result current.
    expect(await page.getAttribute('#study-status', 'data-state')).toBe('done');
    await context.close();
    expect(errors).toEqual([]);
  }, 600_000);
});
