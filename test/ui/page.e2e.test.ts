/**
 * End-to-end tests of the web page in headless Chromium (playwright-core, the system's
 * /usr/bin/chromium; no browser is downloaded). The page is built once (vite build into
 * test-results/ui-dist) and served by `vite preview` on a free port for the whole file.
 * Tests wait for document.body.dataset.state === 'done', never for timers.
 * Screenshots go to test-results/ui-*.png.
 */
import { type ChildProcess, execFileSync, spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join, resolve } from 'node:path';
import { type Browser, type BrowserContext, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PlotName } from '../../src/ui/app';
import type { AppState } from '../../src/ui/appState';
import type { PlotSeries, PlotSpec } from '../../src/ui/linePlot';

/** The page's read-only inspection object (src/ui/app.ts). */
interface Inspect {
  coversweep: { plot(name: PlotName): PlotSpec | null; state(): AppState };
}

const ROOT = resolve(__dirname, '../..');
const CHROMIUM = '/usr/bin/chromium';
const OUT = join(ROOT, 'test-results');
const DIST = join(OUT, 'ui-dist');
const VITE = join(ROOT, 'node_modules/vite/bin/vite.js');
const haveBrowser = existsSync(CHROMIUM);
const requireBrowser = process.env.COVERSWEEP_REQUIRE_BROWSER === '1';

if (!haveBrowser && !requireBrowser) {
  process.stderr.write(
    `\n!!! test/ui/page.e2e.test.ts SKIPPED: ${CHROMIUM} is missing (apt-get install -y chromium). ` +
      'Set COVERSWEEP_REQUIRE_BROWSER=1 to make this a failure.\n\n',
  );
}

function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      srv.close(() => ok(port));
    });
  });
}

async function waitForServer(url: string, child: ChildProcess, log: () => string): Promise<void> {
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error(`vite preview exited early:\n${log()}`);
    try {
      const r = await fetch(url);
      if (r.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((ok) => setTimeout(ok, 100));
  }
  throw new Error(`vite preview did not answer at ${url}:\n${log()}`);
}

/** Wait until the page has finished computing (or failed); returns the final state. */
async function settled(page: Page): Promise<string> {
  await page.waitForFunction(
    () => document.body.dataset.state === 'done' || document.body.dataset.state === 'error',
    null,
    { timeout: 45_000 },
  );
  return page.evaluate(() => document.body.dataset.state ?? '');
}

/** Column values of a page table by header text (exact prefix match), as displayed. */
async function column(page: Page, tableId: string, headerPrefix: string): Promise<string[]> {
  return page.evaluate(
    ({ tableId, headerPrefix }) => {
      const table = document.getElementById(tableId) as HTMLTableElement;
      const headers = [...table.tHead!.rows[0]!.cells].map((c) => c.textContent ?? '');
      const k = headers.findIndex((h) => h.startsWith(headerPrefix));
      if (k < 0) throw new Error(`no column "${headerPrefix}" in ${tableId}: ${headers.join(' | ')}`);
      return [...table.tBodies[0]!.rows].map((r) => r.cells[k]!.textContent ?? '');
    },
    { tableId, headerPrefix },
  );
}

async function setNumberControl(page: Page, field: string, value: string): Promise<void> {
  const input = page.locator(`[data-field="${field}"] input`).first();
  await input.fill(value);
  await input.press('Enter');
}

describe.skipIf(!haveBrowser && !requireBrowser)('web page in headless Chromium', () => {
  let server: ChildProcess | null = null;
  let serverLog = '';
  let browser: Browser;
  let base = '';
  const consoleErrors: string[] = [];

  beforeAll(async () => {
    if (!haveBrowser) throw new Error(`${CHROMIUM} is missing and COVERSWEEP_REQUIRE_BROWSER=1`);
    mkdirSync(OUT, { recursive: true });
    execFileSync(process.execPath, [VITE, 'build', '--outDir', DIST, '--emptyOutDir', '--logLevel', 'warn'], {
      cwd: ROOT,
      stdio: 'pipe',
    });
    const port = await freePort();
    server = spawn(
      process.execPath,
      [VITE, 'preview', '--outDir', DIST, '--host', '127.0.0.1', '--port', String(port), '--strictPort'],
      { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] },
    );
    server.stdout?.on('data', (d) => {
      serverLog += String(d);
    });
    server.stderr?.on('data', (d) => {
      serverLog += String(d);
    });
    base = `http://127.0.0.1:${port}/`;
    await waitForServer(base, server, () => serverLog);
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--enable-unsafe-swiftshader',
      ],
    });
  });

  afterAll(async () => {
    await browser?.close();
    if (server && server.exitCode === null) server.kill('SIGTERM');
  });

  async function open(context: BrowserContext, url = base): Promise<Page> {
    const page = await context.newPage();
    page.on('console', (m) => {
      // Chromium's software WebGL reports GPU stalls on readPixels as warnings; only errors count.
      if (m.type() === 'error') consoleErrors.push(`${url}: ${m.text()}`);
    });
    page.on('pageerror', (e) => consoleErrors.push(`${url}: ${e.message}`));
    await page.goto(url);
    return page;
  }

  // The first three tests share one page (each page load computes every sweep).
  let shared: BrowserContext;
  let page: Page;

  it('loads without console errors and shows the default wheel and its results', async () => {
    shared = await browser.newContext({ viewport: { width: 1280, height: 800 }, acceptDownloads: true });
    page = await open(shared);
    expect(await settled(page)).toBe('done');
    const first = await page.evaluate(() => Number(document.body.dataset.firstResultMs));
    const timings = await page.evaluate(() => document.body.dataset.timings ?? '');
    // Reported, not asserted (timings depend on the machine's load).
    process.stderr.write(`\n[page] first results ${first} ms after navigation start; stages ${timings}\n`);
    const headline = await page.locator('#headline .value').allTextContents();
    expect(headline.length).toBe(6);
    expect(headline[0]).toMatch(/^\d+\.\d{3} N$/);
    const axial = await column(page, 'table-current', 'Axial drag, N');
    expect(axial.length).toBe(41); // yaw 0..20 deg in 0.5 deg steps
    const spec = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('dragYaw'));
    expect(spec!.yLabel).toContain('Axial drag (along travel), N');
    expect(spec!.xLabel).toMatch(/at 50 km\/h .*ρ 1\.225 kg\/m³/);
    await page.screenshot({ path: join(OUT, 'ui-1280x800.png') });
    await page.click('#tab-tables');
    await page.screenshot({ path: join(OUT, 'ui-1280x800-tables.png') });
    await page.click('#tab-help');
    await page.screenshot({ path: join(OUT, 'ui-1280x800-help.png'), fullPage: true });
    // Every control is labelled.
    const unlabelled = await page.evaluate(() =>
      [...document.querySelectorAll('#controls input, #controls select')]
        .filter((el) => {
          const by = el.getAttribute('aria-labelledby');
          return !(by && document.getElementById(by)?.textContent?.trim()) && !el.getAttribute('aria-label');
        })
        .map((el) => el.outerHTML.slice(0, 80)),
    );
    expect(unlabelled).toEqual([]);

    // A narrow screen: one column, nothing wider than the screen.
    await page.click('#tab-results');
    await page.setViewportSize({ width: 400, height: 800 });
    await page.evaluate(() => new Promise((ok) => requestAnimationFrame(() => requestAnimationFrame(ok))));
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow, `page wider than a 400 px screen by ${overflow} px`).toBeLessThanOrEqual(0);
    await page.screenshot({ path: join(OUT, 'ui-400x800.png') });
    await page.screenshot({ path: join(OUT, 'ui-400x800-full.png'), fullPage: true });
    await page.setViewportSize({ width: 1280, height: 800 });
    expect(consoleErrors).toEqual([]);
  });

  it('recomputes when the covering fraction changes, and the plotted numbers equal the command line', async () => {
    expect(await settled(page)).toBe('done');
    const before = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('dragYaw'));
    await setNumberControl(page, 'coverFraction', '0.6');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === 0.6,
    );
    expect(await settled(page)).toBe('done');
    const after = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('dragYaw'));
    const current = (spec: PlotSpec | null) =>
      spec!.series.find((s: PlotSeries) => s.label.startsWith('this design'))!;
    expect(current(after).label).toContain('cover 0.6');
    const b = current(before).values as number[];
    const a = current(after).values as number[];
    expect(a.length).toBe(b.length);
    expect(
      a.some((v, i) => Math.abs(v - b[i]!) > 1e-6),
      'the plotted axial drag did not change',
    ).toBe(true);

    // The page's case file, solved by the command line.
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#export-case')]);
    const casePath = join(OUT, 'ui-exported.case.json');
    await download.saveAs(casePath);
    const cli = JSON.parse(
      execFileSync(process.execPath, [join(ROOT, 'bin/coversweep.mjs'), 'solve', casePath], {
        cwd: ROOT,
        encoding: 'utf8',
      }),
    );
    const rows = cli.results as Array<Record<string, number | null>>;
    const yaws = after!.xs;
    expect(rows.length).toBe(yaws.length);
    const tableAxial = await column(page, 'table-current', 'Axial drag, N');
    const tableSide = await column(page, 'table-current', 'Side force, N');
    const tableSteer = await column(page, 'table-current', 'Steering moment, N m');
    for (const i of [0, 10, 20, 30, 40]) {
      const row = rows[i]!;
      expect(row.yaw_deg).toBe(yaws[i]);
      // The plotted value: the same float the command line prints (tolerance 1e-12 relative).
      const tol = 1e-12 * Math.max(1, Math.abs(row.axial_N!));
      expect(
        Math.abs(a[i]! - row.axial_N!),
        `yaw=${yaws[i]} plotted=${a[i]} cli=${row.axial_N} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
      // The table, to its display precision.
      expect(tableAxial[i], `yaw=${yaws[i]} axial`).toBe(row.axial_N!.toFixed(4));
      expect(tableSide[i], `yaw=${yaws[i]} side`).toBe(row.side_N!.toFixed(4));
      expect(tableSteer[i], `yaw=${yaws[i]} steering`).toBe(row.steering_moment_Nm!.toFixed(4));
    }
    expect(consoleErrors).toEqual([]);
  });

  it('draws the 3D view (the WebGL canvas is not blank)', async () => {
    expect(await settled(page)).toBe('done');
    await page.click('#tab-map');
    await page.waitForFunction(
      () => /Pressure jump/.test(document.getElementById('view3d-note')?.textContent ?? ''),
      null,
      {
        timeout: 30_000,
      },
    );
    // Let the view draw its frame, then read its pixels back (preserveDrawingBuffer).
    await page.evaluate(() => new Promise((ok) => requestAnimationFrame(() => requestAnimationFrame(ok))));
    const stats = await page.evaluate(() => {
      const canvas = document.querySelector('#view3d canvas') as HTMLCanvasElement;
      const copy = document.createElement('canvas');
      copy.width = canvas.width;
      copy.height = canvas.height;
      const ctx = copy.getContext('2d')!;
      ctx.drawImage(canvas, 0, 0);
      const data = ctx.getImageData(0, 0, copy.width, copy.height).data;
      const colours = new Set<number>();
      const [r0, g0, b0] = [data[0], data[1], data[2]];
      let differ = 0;
      for (let i = 0; i < data.length; i += 4) {
        colours.add((data[i]! << 16) | (data[i + 1]! << 8) | data[i + 2]!);
        if (Math.abs(data[i]! - r0!) + Math.abs(data[i + 1]! - g0!) + Math.abs(data[i + 2]! - b0!) > 30)
          differ++;
      }
      return {
        width: copy.width,
        height: copy.height,
        colours: colours.size,
        differ,
        total: data.length / 4,
      };
    });
    expect(stats.width).toBeGreaterThan(100);
    expect(stats.colours, JSON.stringify(stats)).toBeGreaterThan(20);
    expect(stats.differ / stats.total, JSON.stringify(stats)).toBeGreaterThan(0.02);
    await page.screenshot({ path: join(OUT, 'ui-1280x800-map.png') });
    await shared.close();
    expect(consoleErrors).toEqual([]);
  });

  it('round-trips the state through the URL and reopens a saved project file identically', async () => {
    const context = await browser.newContext({
      viewport: { width: 1280, height: 800 },
      acceptDownloads: true,
    });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    await setNumberControl(page, 'coverFraction', '0.35');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === 0.35,
    );
    await page.click('#pin-baseline');
    await setNumberControl(page, 'rimDepthMm', '80');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.rim_depth_m === 0.08,
    );
    await page.locator('.lil-gui .lil-title', { hasText: 'Units' }).click();
    await page.locator('[data-field="speedUnit"] select').selectOption('mph');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().view.speedUnit === 'mph',
    );
    expect(await settled(page)).toBe('done');
    const url = page.url();
    const state = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    const axial = await column(page, 'table-current', 'Axial drag, N');
    const baseline = await column(page, 'table-baseline', 'Baseline axial drag, N');
    expect(state.baseline!.wheel.cover.fraction).toBe(0.35);
    expect(state.baseline!.wheel.rim_depth_m).toBe(0.05);

    // The link in a fresh browser (no autosave).
    const other = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page2 = await open(other, url);
    expect(await settled(page2)).toBe('done');
    expect(await page2.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(state);
    expect(page2.url()).toBe(url);
    expect(await column(page2, 'table-current', 'Axial drag, N')).toEqual(axial);
    expect(await column(page2, 'table-baseline', 'Baseline axial drag, N')).toEqual(baseline);
    expect(await page2.locator('[data-field="airspeed"] input').inputValue()).toBe('31.069');

    // The project file, opened in a fresh browser showing the default design.
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#save-project')]);
    const projectPath = join(OUT, 'ui-saved.coversweep-project.json');
    await download.saveAs(projectPath);
    const project = JSON.parse(readFileSync(projectPath, 'utf8'));
    expect(project.format).toBe('coversweep-project');
    expect(project.version).toBe(1);
    // Opened over the demo wheel (Reset) in the second browser.
    const page3 = page2;
    await page3.click('#reset');
    await page3.waitForFunction(() => (window as unknown as Inspect).coversweep.state().baseline === null);
    await page3.setInputFiles('#open-project', projectPath);
    await page3.waitForFunction(() => (window as unknown as Inspect).coversweep.state().baseline !== null);
    expect(await settled(page3)).toBe('done');
    expect(await page3.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(state);
    expect(page3.url()).toBe(url);
    expect(await column(page3, 'table-current', 'Axial drag, N')).toEqual(axial);

    // Autosave: a reload without the link brings the same design back.
    await page3.goto(base);
    expect(await settled(page3)).toBe('done');
    expect(await page3.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(state);
    await other.close();
    await context.close();
    expect(consoleErrors).toEqual([]);
  });

  it('rejects a malformed project file or link with a clear message and keeps the current design', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    await setNumberControl(page, 'coverFraction', '0.45');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === 0.45,
    );
    expect(await settled(page)).toBe('done');
    const state = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    const url = page.url();
    const axial = await column(page, 'table-current', 'Axial drag, N');

    const broken = join(OUT, 'ui-broken.json');
    writeFileSync(broken, '{"format": "coversweep-project", "version": 1, "case": {,}');
    await page.setInputFiles('#open-project', broken);
    const message = page.locator('.message.error').filter({ hasText: 'ui-broken.json' });
    await message.waitFor();
    expect(await message.textContent()).toMatch(/invalid JSON at line 1, column \d+/);
    expect(await page.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(state);
    expect(page.url()).toBe(url);

    const invalid = join(OUT, 'ui-invalid.json');
    writeFileSync(
      invalid,
      JSON.stringify({
        format: 'coversweep-project',
        version: 1,
        case: {
          ...state.case,
          wheel: { ...state.case.wheel, cover: { ...state.case.wheel.cover, fraction: 2 } },
        },
        view: state.view,
        baseline: null,
      }),
    );
    await page.setInputFiles('#open-project', invalid);
    const message2 = page.locator('.message.error').filter({ hasText: 'ui-invalid.json' });
    await message2.waitFor();
    expect(await message2.textContent()).toContain(
      'case.wheel.cover.fraction: must be a number between 0 and 1, got 2',
    );
    expect(await page.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(state);
    expect(await column(page, 'table-current', 'Axial drag, N')).toEqual(axial);

    // A broken link: the message names the problem; the autosaved design stays.
    await page.goto(`${base}#s=eyJ2IjoxLCJjYXNlIjp7fX0`); // {"v":1,"case":{}}
    expect(await settled(page)).toBe('done');
    const linkMessage = page.locator('.message.error').filter({ hasText: "link's design" });
    await linkMessage.waitFor();
    expect(await linkMessage.textContent()).toContain('link: case.conditions: is required');
    expect(await page.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(state);
    await page.goto(`${base}#s=%%%not-base64`);
    expect(await settled(page)).toBe('done');
    await page.locator('.message.error').filter({ hasText: 'not base64url' }).waitFor();
    expect(await page.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(state);
    // An out-of-range value typed into a control is refused with the rule, and the design is unchanged.
    await setNumberControl(page, 'rimDepthMm', '200');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.rim_depth_m === 0.2,
    );
    const deep = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    await setNumberControl(page, 'outerRadiusMm', '150');
    await page.locator('.message.error').filter({ hasText: 'Not applied' }).waitFor();
    expect(await page.locator('.message.error').filter({ hasText: 'Not applied' }).textContent()).toContain(
      'wheel.rim_depth_m: rim depth 0.2 m + tyre width 0.025 m must be less than outer radius 0.15 m',
    );
    expect(await page.evaluate(() => (window as unknown as Inspect).coversweep.state())).toEqual(deep);
    await context.close();
    expect(consoleErrors).toEqual([]);
  });
});
