/**
 * Exports in headless Chromium: after the design is renamed, a yaw plot's PNG (at least 1600 px wide, from
 * the PNG header) and SVG, the road panel's CSV and the data panel's CSV carry the design's name and the
 * caption or header block (the version from package.json, today's date); CALIBRATED appears only once the
 * calibrated model is in use.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { expect, it } from 'vitest';
import type { AppState } from '../../src/ui/appState';
import { describeInBrowser, E2E_OUT, E2E_ROOT, servePage, settled } from './e2eServer';

interface Inspect {
  coversweep: { state(): AppState; comparison(): { calibration?: unknown } | null };
}

const ROOT = E2E_ROOT;
const OUT = E2E_OUT;
const VERSION = (JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string }).version;
const NAME = 'Export trial wheel';
const STEM = 'Export-trial-wheel';

async function panelState(page: Page, id: string, states: string[], timeout = 90_000): Promise<string> {
  await page.waitForFunction(
    ({ id, states }) => states.includes(document.getElementById(id)?.dataset.state ?? ''),
    { id, states },
    { timeout },
  );
  return page.evaluate((id) => document.getElementById(id)?.dataset.state ?? '', id);
}

/** Click an export button and return the download's file name and bytes. */
async function download(
  page: Page,
  selector: string,
  text: string,
): Promise<{ name: string; bytes: Buffer }> {
  const [d] = await Promise.all([
    page.waitForEvent('download', { timeout: 60_000 }),
    page
      .locator(selector)
      .getByRole('button', { name: new RegExp(`^Save as ${text}`) })
      .first()
      .click(),
  ]);
  return { name: d.suggestedFilename(), bytes: readFileSync((await d.path())!) };
}

/** Width and height from a PNG's IHDR chunk (bytes 16-23, big-endian, after the 8-byte signature). */
function pngSize(bytes: Buffer): { width: number; height: number } {
  expect(bytes.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
  expect(bytes.subarray(12, 16).toString('latin1')).toBe('IHDR');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describeInBrowser('exports in headless Chromium', () => {
  let browser: Browser;
  let base = '';
  servePage('ui-dist-exports', (served) => {
    ({ base, browser } = served);
  });

  it('PNG (>= 1600 px) and SVG of a yaw plot, the road and data CSVs: the design as it is now, version, date, CALIBRATED only when calibrated', async () => {
    const context = await browser.newContext({
      viewport: { width: 1280, height: 800 },
      acceptDownloads: true,
    });
    const page = await context.newPage();
    await page.goto(base);
    await settled(page);

    // The demo data loads the demo design with it: load it first, then rename the design.
    await page.click('#tab-data');
    await page.click('#data-demo');
    expect(await panelState(page, 'panel-data', ['mapping', 'error'])).toBe('mapping');
    await page.click('#data-apply');
    expect(await panelState(page, 'panel-data', ['done', 'error'])).toBe('done');
    // Rename the design.
    const nameInput = page.locator('[data-field="name"] input').first();
    await nameInput.fill(NAME);
    await nameInput.press('Enter');
    await page.waitForFunction(
      (n) => (window as unknown as Inspect).coversweep.state().case.name === n,
      NAME,
    );
    await settled(page);
    const today = new Date().toISOString().slice(0, 10);

    await page.click('#tab-data');
    expect(await panelState(page, 'panel-data', ['done', 'error'])).toBe('done');
    // The data panel's residuals as CSV, before and after the calibrated model is used.
    const data = await download(page, '#table-data-residuals-block', 'CSV');
    expect(data.name).toBe(`${STEM}-data-residuals.csv`);
    const dataText = data.bytes.toString('utf8');
    expect(dataText).toContain(`# design: ${NAME} — `);
    expect(dataText).toContain('# calibrated: no\r\n');
    expect(dataText).toMatch(/# note: \d+ data points from demo-tunnel\.csv/);
    const dataRows = dataText.split('\r\n').filter((l) => l !== '' && !l.startsWith('#'));
    expect(dataRows[0]).toMatch(/^Line,"Yaw, deg",/);
    expect(dataRows.length).toBeGreaterThan(1);

    // A yaw plot as PNG: high resolution, named after the design.
    await page.click('#tab-results');
    const png = await download(page, '#fig-drag-yaw', 'PNG');
    expect(png.name).toBe(`${STEM}-drag-yaw.png`);
    writeFileSync(join(OUT, 'export-drag-yaw.png'), png.bytes);
    const size = pngSize(png.bytes);
    expect(size.width, `PNG ${size.width} x ${size.height}`).toBeGreaterThanOrEqual(1600);

    // The same plot as SVG: the caption block and the legend's series.
    const svg = await download(page, '#fig-drag-yaw', 'SVG');
    expect(svg.name).toBe(`${STEM}-drag-yaw.svg`);
    const svgText = svg.bytes.toString('utf8');
    writeFileSync(join(OUT, 'export-drag-yaw.svg'), svgText);
    expect(svgText).toMatch(
      /^<\?xml version="1.0" encoding="UTF-8"\?>\n<svg xmlns="http:\/\/www.w3.org\/2000\/svg"/,
    );
    expect(svgText).toContain(`Design: ${NAME} — `);
    expect(svgText).toContain(`CoverSweep ${VERSION} · exported ${today}`);
    expect(svgText).not.toContain('CALIBRATED');
    const spec = await page.evaluate(() =>
      (
        window as unknown as {
          coversweep: { plot(n: string): { series: { label: string; noLegend?: boolean }[] } | null };
        }
      ).coversweep.plot('dragYaw'),
    );
    for (const s of spec!.series.filter((x) => !x.noLegend)) {
      expect(svgText, s.label).toContain(
        `data-label="${s.label.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/'/g, '&apos;')}"`,
      );
    }

    // Every figure of the page has its buttons: PNG and SVG, or PNG only for the 3D view.
    for (const id of ['fig-drag-yaw', 'fig-side-yaw', 'fig-drag-cover', 'fig-handling', 'fig-map']) {
      const names = await page.locator(`#${id} .fig-actions button`).allTextContents();
      expect(names, id).toEqual(expect.arrayContaining(['PNG', 'SVG']));
    }
    expect(await page.locator('#fig-3d .fig-actions button').allTextContents()).toContain('PNG');
    await page.click('#tab-map');
    await page.waitForFunction(
      () => (document.getElementById('view3d-note')?.textContent ?? '') !== '',
      null,
      {
        timeout: 60_000,
      },
    );
    const map = await download(page, '#fig-map', 'SVG');
    writeFileSync(join(OUT, 'export-map.svg'), map.bytes);
    expect(map.bytes.toString('utf8')).toContain(`Design: ${NAME} — `);
    const mapPng = await download(page, '#fig-map', 'PNG');
    writeFileSync(join(OUT, 'export-map.png'), mapPng.bytes);
    expect(pngSize(mapPng.bytes).width).toBeGreaterThanOrEqual(1600);
    const view3d = await download(page, '#fig-3d', 'PNG');
    writeFileSync(join(OUT, 'export-3d.png'), view3d.bytes);
    expect(view3d.name).toBe(`${STEM}-3d.png`);
    expect(pngSize(view3d.bytes).width).toBeGreaterThanOrEqual(1600);

    // The road panel's power table as CSV.
    await page.click('#tab-road');
    expect(await panelState(page, 'panel-road', ['done', 'error', 'invalid'])).toBe('done');
    const road = await download(page, '#table-road-power-block', 'CSV');
    expect(road.name).toBe(`${STEM}-road-power.csv`);
    const roadText = road.bytes.toString('utf8');
    const roadYaw = await download(page, '#fig-road-yaw', 'PNG');
    writeFileSync(join(OUT, 'export-road-yaw.png'), roadYaw.bytes);
    expect(pngSize(roadYaw.bytes).width).toBeGreaterThanOrEqual(1600);
    expect(roadText).toContain(`# design: ${NAME} — `);
    expect(roadText).toContain('# calibrated: no\r\n');
    expect(roadText).toContain(`# tool: CoverSweep ${VERSION}\r\n`);
    expect(roadText).toContain(`# date: ${today}T`);
    expect(roadText).toMatch(/# note: Ride: front wheel, constant power/);
    expect(roadText).toMatch(/\r\nTerm,"Design, W","Baseline, W","Difference, W"\r\n/);

    await page.click('#tab-data');
    await page.click('#data-fit-run');
    await page.waitForFunction(
      () => Boolean((window as unknown as Inspect).coversweep.comparison()?.calibration),
      null,
      {
        timeout: 90_000,
      },
    );
    await page.click('#data-use-calibrated');
    await page.waitForFunction(() => Boolean((window as unknown as Inspect).coversweep.state().calibration));
    await settled(page);
    const calibrated = (await download(page, '#table-data-residuals-block', 'CSV')).bytes.toString('utf8');
    expect(calibrated).toMatch(
      /# calibrated: CALIBRATED — model options fitted to demo-tunnel\.csv \(\d+ points\)/,
    );
    await page.click('#tab-results');
    const svgCalibrated = (await download(page, '#fig-drag-yaw', 'SVG')).bytes.toString('utf8');
    expect(svgCalibrated).toMatch(
      /font-weight="700" fill="#8a1c1c">CALIBRATED: model options fitted to demo-tunnel\.csv/,
    );
    expect(svgCalibrated).toContain(`Design: ${NAME} — `);
    await context.close();
  });
});
