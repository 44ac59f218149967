// Imported data kept with the page (issue 12, "Lost work"), in headless Chromium: a CSV file imported,
// one column's mapping changed by hand, a fit made and the calibrated model used; then the project file
// saved and opened in a fresh browser brings back the data, the mapping, the fit and the CALIBRATED mark;
// a reload brings them back from the autosave; the link, opened where the data is not, says the data
// must be imported again and, once the same file is, restores its mapping and fit.
// Waits on the page's own state marks (data-state), never on timers.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, expect, it } from 'vitest';
import type { CompareReport } from '../../src/compute/compare/index';
import { type AppState, stateToProjectText } from '../../src/ui/appState';
import { describeInBrowser, E2E_OUT, E2E_ROOT, servePage, settled } from './e2eServer';

interface Inspect {
  coversweep: { state(): AppState; comparison(): CompareReport | null };
}

const ROOT = E2E_ROOT;
const OUT = E2E_OUT;
const CSV = join(ROOT, 'public/demo/demo-tunnel.csv');

const state = (page: Page) => page.evaluate(() => (window as unknown as Inspect).coversweep.state());

/** Wait until the data panel shows one of `states`; returns the one it shows. */
async function dataPanel(page: Page, states: string[]): Promise<string> {
  await page.waitForFunction(
    (states) => states.includes(document.getElementById('panel-data')?.dataset.state ?? ''),
    states,
    { timeout: 120_000 },
  );
  return page.evaluate(() => document.getElementById('panel-data')?.dataset.state ?? '');
}

/** What the mapping form shows: per column, its header, what it holds and its unit; and the side-force sign. */
function mappingShown(page: Page) {
  return page.evaluate(() => {
    const rows = [...document.querySelectorAll<HTMLTableRowElement>('#data-map-table tbody tr')];
    return {
      columns: rows.map((r) => {
        const [quantity, unit] = [...r.querySelectorAll('select')].map((s) => s.value);
        return `${r.querySelector('th')?.textContent}: ${quantity} ${unit}`;
      }),
      sign: document.querySelector<HTMLSelectElement>('#data-side-sign')?.value,
    };
  });
}

const fitTable = (page: Page) => page.locator('#table-data-fit tbody').textContent();

describeInBrowser('imported data kept, in headless Chromium', () => {
  let browser: Browser;
  let base = '';
  const contexts: BrowserContext[] = [];
  servePage('ui-dist-persist', (served) => {
    ({ base, browser } = served);
  });

  afterAll(async () => {
    for (const c of contexts) await c.close();
  });

  async function freshPage(url = base): Promise<Page> {
    const context = await browser.newContext({
      viewport: { width: 1280, height: 800 },
      acceptDownloads: true,
    });
    contexts.push(context);
    const page = await context.newPage();
    await page.goto(url);
    await settled(page, 120_000);
    return page;
  }

  it('a project file, a reload and a link bring back the data, its mapping and its fit', async () => {
    // Import, map (the yaw moment column ignored by hand, against the guess), fit, use the calibrated model.
    const page = await freshPage();
    await page.click('#tab-data');
    await page.setInputFiles('#data-file', CSV);
    expect(await dataPanel(page, ['mapping', 'error'])).toBe('mapping');
    await page
      .locator('#data-map-table tbody tr')
      .filter({ has: page.locator('th', { hasText: 'Yaw moment' }) })
      .locator('select')
      .first()
      .selectOption('ignore');
    await page.click('#data-apply');
    expect(await dataPanel(page, ['done', 'error'])).toBe('done');
    await page.click('#data-fit-run');
    await page.waitForFunction(
      () => Boolean((window as unknown as Inspect).coversweep.comparison()?.calibration),
      null,
      {
        timeout: 120_000,
      },
    );
    await page.click('#data-use-calibrated');
    const badge = page.locator('#calibrated-badge');
    await badge.waitFor({ state: 'visible' });
    expect(await dataPanel(page, ['done', 'error'])).toBe('done');
    await settled(page, 120_000);
    const before = await state(page);
    const mapping = await mappingShown(page);
    expect(mapping.columns).toContain('Yaw moment [N m]: ignore 1');
    const fit = await fitTable(page);
    expect(fit).toMatch(/porosity_scale.*suction_recovered.*profile_drag_factor/);
    const badgeText = await badge.textContent();
    expect(badgeText).toMatch(/^CALIBRATED model: fitted to demo-tunnel\.csv/);
    expect(before.data?.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(before.data?.map?.columns['Yaw moment [N m]']?.quantity).toBe('ignore');
    expect(before.data?.fit?.parameters.length).toBe(3);

    // The project file holds the CSV as read, its hash, the mapping and the fit.
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#save-project')]);
    const saved = (await download.path())!;
    const doc = JSON.parse(readFileSync(saved, 'utf8'));
    expect(doc.version).toBe(2);
    expect(doc.data.csv).toBe(readFileSync(CSV, 'utf8'));
    expect(doc.data.hash).toBe(before.data!.hash);

    // A fresh browser (no autosave) opens the file: data, mapping, fit and CALIBRATED mark are back.
    const other = await freshPage();
    await other.setInputFiles('#open-project', saved);
    await other.locator('#calibrated-badge').waitFor({ state: 'visible' });
    expect(await other.locator('#calibrated-badge').textContent()).toBe(badgeText);
    await other.click('#tab-data');
    expect(await dataPanel(other, ['done', 'error'])).toBe('done');
    expect(await mappingShown(other)).toEqual(mapping);
    expect(await fitTable(other)).toBe(fit);
    expect(await other.locator('#data-fit-text').textContent()).toContain(
      'shown as it was saved, not made again',
    );
    expect(await other.locator('#data-use-calibrated').isChecked()).toBe(true);
    const opened = await state(other);
    expect(opened.data).toEqual(before.data);
    expect(opened.case.model).toEqual(before.case.model);
    // The comparison itself is recomputed with the design.
    const recomputed = await other.evaluate(() => (window as unknown as Inspect).coversweep.comparison());
    expect(recomputed?.converted.length).toBe(30);

    // A reload of the first page: the autosave brings everything back.
    await page.reload();
    await settled(page, 120_000);
    await page.click('#tab-data');
    expect(await dataPanel(page, ['done', 'error'])).toBe('done');
    expect(await mappingShown(page)).toEqual(mapping);
    expect(await fitTable(page)).toBe(fit);
    expect(await badge.textContent()).toBe(badgeText);
    expect((await state(page)).data).toEqual(before.data);

    // The link, opened where the data is not: a note says to import it again; the same file restores all.
    const url = page.url();
    expect(url).toContain('#s=');
    const linked = await freshPage(url);
    const note = linked.locator('.message[data-id="data-ref"]');
    await note.waitFor();
    expect(await note.textContent()).toMatch(
      /refers to data “demo-tunnel\.csv” \(30 rows, SHA-256 [0-9a-f]{12}…\).*Import the same file again/,
    );
    await linked.click('#tab-data');
    expect(await linked.evaluate(() => document.getElementById('panel-data')?.dataset.pending)).toBe(
      before.data!.hash,
    );
    expect(await linked.locator('#data-status').textContent()).toMatch(/Import the same file again/);
    await linked.setInputFiles('#data-file', CSV);
    expect(await dataPanel(linked, ['done', 'error'])).toBe('done');
    expect(await mappingShown(linked)).toEqual(mapping);
    expect(await fitTable(linked)).toBe(fit);
    await note.waitFor({ state: 'detached' });
    expect((await state(linked)).data).toEqual(before.data);
  }, 600_000);

  it('data too large for the browser storage: the page says so, and after a reload asks for the file again; a malformed data entry in a project file changes nothing', async () => {
    const page = await freshPage();
    await page.click('#tab-data');
    // 60,000 invented rows, about 2.4 million characters: more than the autosave keeps.
    let csv = 'Yaw [deg],Speed [km/h],Drag [g],Side force [lbf]\n';
    for (let i = 0; i < 60_000; i++) {
      const yaw = -10 + (i % 41) * 0.5;
      csv += `${yaw.toFixed(6)},${(30 + (i % 3) * 10).toFixed(6)},${(75 + i * 1e-4).toFixed(6)},${(yaw * 0.12).toFixed(6)}\n`;
    }
    await page.setInputFiles('#data-file', {
      name: 'big.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(csv),
    });
    expect(await dataPanel(page, ['mapping', 'error'])).toBe('mapping');
    const warning = page.locator('.message[data-id="autosave-data"]');
    await warning.waitFor();
    expect(await warning.textContent()).toMatch(
      /your data “big\.csv” \(60000 rows\) is not in the autosave: 2\.\d million characters, more than the 2 million/,
    );
    const before = await state(page);
    expect(before.data?.rows).toBe(60_000);
    // Its rows stay in the task worker that read them (not handed to the page), and a project file still gets them.
    expect(before.data?.csv).toBeUndefined();
    expect(before.data?.chars).toBe(csv.length);
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#save-project')]);
    const doc = JSON.parse(readFileSync((await download.path())!, 'utf8'));
    expect(doc.data.csv === csv, `project file's data.csv: ${String(doc.data.csv).length} characters`).toBe(
      true,
    );
    expect(doc.data.hash).toBe(before.data!.hash);
    await page.reload();
    await settled(page, 120_000);
    const note = page.locator('.message[data-id="data-ref"]');
    await note.waitFor();
    expect(await note.textContent()).toMatch(
      /refers to data “big\.csv” \(60000 rows, SHA-256 [0-9a-f]{12}…\) whose rows are not in this browser/,
    );

    // A project file whose data hash is malformed: named with its rule; the design and data stay.
    const shown = await state(page);
    const badDoc = JSON.parse(
      stateToProjectText({ ...shown, case: { ...shown.case, name: 'Other design' } }),
    );
    badDoc.data.hash = 'not-a-hash';
    const bad = join(OUT, 'persist-bad-hash.coversweep-project.json');
    writeFileSync(bad, JSON.stringify(badDoc));
    await page.setInputFiles('#open-project', bad);
    const error = page.locator('.message.error[data-id="file"]');
    await error.waitFor();
    expect(await error.textContent()).toContain(
      'persist-bad-hash.coversweep-project.json: data.hash: must be the data\'s SHA-256 as 64 lower-case hex digits, got "not-a-hash"',
    );
    expect(await state(page)).toEqual(shown);
  }, 600_000);
});
