import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { expect, it } from 'vitest';
import type { AppState } from '../../src/ui/appState';
import { describeInBrowser, servePage, settled } from './e2eServer';

interface Inspect {
  coversweep: { state(): AppState };
}

const state = (page: Page) => page.evaluate(() => (window as unknown as Inspect).coversweep.state());

/** A number control of the control panel (its folder opened first), typed and confirmed. */
async function setNumberControl(page: Page, field: string, value: string): Promise<void> {
  const input = page.locator(`[data-field="${field}"] input`).first();
  if (!(await input.isVisible())) {
    await page.evaluate((field) => {
      const folder = document.querySelector(`[data-field="${field}"]`)?.closest('[data-group]');
      const title = folder?.querySelector<HTMLElement>(':scope > .lil-title');
      if (title?.getAttribute('aria-expanded') === 'false') title.click();
    }, field);
  }
  await input.fill(value);
  await input.press('Enter');
}

describeInBrowser('page fixes in headless Chromium', () => {
  let browser: Browser;
  let base = '';
  servePage('ui-dist-fixes12', (served) => {
    ({ base, browser } = served);
  });

  it('the 3D yaw control redraws the view; exports follow the edited design; the map CSV names its conditions; a damaged link keeps the design', async () => {
    const context = await browser.newContext({
      viewport: { width: 1280, height: 800 },
      acceptDownloads: true,
    });
    const page = await context.newPage();
    await page.goto(base);
    await settled(page);

    // 3D view: drawn at the default yaw, then the yaw control alone redraws it.
    await page.click('#tab-map');
    const note = () => page.locator('#view3d-note').textContent();
    await expect.poll(note, { timeout: 60_000 }).toMatch(/Pressure jump on the wheel at 10° yaw/);
    await setNumberControl(page, 'view3dYawDeg', '25');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().view.view3dYawDeg === 25,
    );
    await expect.poll(note, { timeout: 60_000 }).toMatch(/Pressure jump on the wheel at 25° yaw/);

    // Edit the demo (rim depth 80 mm): the PNG of a plot is named after the design it now is.
    await setNumberControl(page, 'rimDepthMm', '80');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.rim_depth_m === 0.08,
    );
    await settled(page);
    const s = await state(page);
    const coverPct = Number((s.case.wheel.cover.fraction * 100).toPrecision(6));
    await page.click('#tab-results');
    const [png] = await Promise.all([
      page.waitForEvent('download'),
      page.locator('#fig-drag-yaw .fig-actions button', { hasText: 'PNG' }).click(),
    ]);
    expect(png.suggestedFilename()).toBe(`design-rim-80mm-cover-${coverPct}pct-drag-yaw.png`);

    // The map CSV: named after the design, and every row says at which yaw, airspeed and density.
    await page.click('#tab-tables');
    const [csvDownload] = await Promise.all([
      page.waitForEvent('download'),
      page.locator('#table-map-block button', { hasText: 'CSV' }).click(),
    ]);
    expect(csvDownload.suggestedFilename()).toBe(`design-rim-80mm-cover-${coverPct}pct-map.csv`);
    // The header block's '# key: value' lines come first (every export describes itself).
    const lines = readFileSync((await csvDownload.path())!, 'utf8')
      .trim()
      .split(/\r\n/)
      .filter((l) => !l.startsWith('#'));
    // RFC 4180 fields: split at commas outside quotes, then unquote.
    const fields = (line: string) =>
      line.split(/,(?=(?:[^"]*"[^"]*")*[^"]*$)/).map((f) => f.replace(/^"|"$/g, '').replace(/""/g, '"'));
    const header = fields(lines[0]!);
    const at = (name: string) => {
      const k = header.indexOf(name);
      expect(k, `column "${name}" in ${lines[0]}`).toBeGreaterThanOrEqual(0);
      return new Set(lines.slice(1).map((l) => Number(fields(l)[k])));
    };
    expect(lines.length).toBeGreaterThan(2);
    expect([...at('Yaw, deg')]).toEqual([s.view.mapYawDeg]);
    expect([...at('Airspeed, m/s')]).toEqual([s.case.conditions.airspeed_mps[0]]);
    const rho = [...at('Air density, kg/m³')];
    expect(rho.length).toBe(1);
    expect(rho[0]! > 0.5 && rho[0]! < 1.5, `density ${rho[0]}`).toBe(true);

    // A damaged link (bytes that are no UTF-8 text): the rule is named, the design stays.
    const before = await state(page);
    await page.goto(`${base}#s=__--`);
    await settled(page);
    const message = page.locator('.message.error').filter({ hasText: "link's design" });
    await message.waitFor();
    const text = (await message.textContent()) ?? '';
    expect(text).toContain('must be base64url-encoded UTF-8 JSON');
    expect(text).toContain('does not decode to UTF-8 text');
    expect(text).not.toMatch(/encoded data was not valid/);
    expect((await state(page)).case).toEqual(before.case);
    await context.close();
  }, 300_000);
});
