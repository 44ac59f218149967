/**
 * End-to-end tests of the web page in headless Chromium (playwright-core, the system's
 * /usr/bin/chromium; no browser is downloaded). The page is built once (vite build --mode e2e, which keeps
 * the test hooks, into
 * test-results/ui-dist) and served by `vite preview` on a free port for the whole file.
 * Tests wait for document.body.dataset.state === 'done', never for timers.
 * Screenshots go to test-results/ui-*.png.
 */
import { type ChildProcess, execFile, execFileSync, spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { type Browser, type BrowserContext, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CompareReport } from '../../src/compute/compare/index';
import type { RideDocument } from '../../src/compute/ride/index';
import { formatNumber } from '../../src/compute/validation/bandText';
import { runValidation } from '../../src/compute/validation/runValidation';
import type { PlotName } from '../../src/ui/app';
import type { AppState } from '../../src/ui/appState';
import { textToBase64Url } from '../../src/ui/base64url';
import type { PlotSeries, PlotSpec } from '../../src/ui/linePlot';
import { freePort, waitForServer } from './e2eServer';

/** The page's inspection object (src/ui/app.ts). */
interface Inspect {
  coversweep: {
    plot(name: PlotName): PlotSpec | null;
    state(): AppState;
    ride(): RideDocument | null;
    comparison(): CompareReport | null;
    crashWorker(): boolean;
    crashTaskWorkers(): number;
  };
  __csp?: string[];
  __xss?: number;
}

/**
 * In the page, the moment its body's data-stage is the sweeps or the design map while it computes (a
 * mutation observer: polling can miss a short stage on a loaded machine), press Cancel. Resolves with
 * true once pressed, or with the state and stage the run ended in first. Armed before the edit that
 * starts the run (call it, then edit, then await it): a whole run can take less than one round trip of
 * the test driver.
 */
function cancelAtSweepsOrMap(page: Page): Promise<boolean | string> {
  return page.evaluate(
    () =>
      new Promise<boolean | string>((resolve) => {
        const body = document.body;
        let computing = false;
        const check = () => {
          const stage = body.dataset.stage ?? '';
          if (body.dataset.state === 'computing') computing = true;
          if (body.dataset.state === 'computing' && (stage === 'sweeps' || stage === 'map')) {
            observer.disconnect();
            document.getElementById('cancel')!.click();
            resolve(true);
          } else if (computing && (body.dataset.state === 'done' || body.dataset.state === 'error')) {
            observer.disconnect();
            resolve(`${body.dataset.state} ${stage}`);
          }
        };
        const observer = new MutationObserver(check);
        observer.observe(body, { attributes: true, attributeFilter: ['data-state', 'data-stage'] });
        check();
      }),
  );
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

/** Wait until a panel (#panel-road, #panel-data) has one of the given states. */
async function panelState(page: Page, id: string, states: string[], timeout = 60_000): Promise<string> {
  await page.waitForFunction(
    ({ id, states }) => states.includes(document.getElementById(id)?.dataset.state ?? ''),
    { id, states },
    { timeout },
  );
  return page.evaluate((id) => document.getElementById(id)?.dataset.state ?? '', id);
}

/** Type into a panel input and leave it (the panels apply on "change"). */
async function typeAndLeave(page: Page, selector: string, value: string): Promise<void> {
  const input = page.locator(selector);
  await input.fill(value);
  await input.blur();
}

/** Screenshots of a panel at 1280 x 800 and 400 x 800 (the panel as a whole, and the 400 px screen). */
async function panelShots(page: Page, panelId: string, name: string): Promise<number> {
  await page.locator(`#${panelId}`).screenshot({ path: join(OUT, `ui-${name}-1280.png`) });
  await page.setViewportSize({ width: 400, height: 800 });
  await page.evaluate(() => new Promise((ok) => requestAnimationFrame(() => requestAnimationFrame(ok))));
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  await page.locator(`#${panelId}`).evaluate((el) => el.scrollIntoView({ block: 'start' }));
  await page.screenshot({ path: join(OUT, `ui-${name}-400x800.png`) });
  await page.locator(`#${panelId}`).screenshot({ path: join(OUT, `ui-${name}-400-full.png`) });
  await page.setViewportSize({ width: 1280, height: 800 });
  return overflow;
}

/** Relative difference |a - b| / max(1, |b|) (for numbers computed twice by the same code). */
function relDiff(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(1, Math.abs(b));
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
    execFileSync(
      process.execPath,
      [VITE, 'build', '--mode', 'e2e', '--outDir', DIST, '--emptyOutDir', '--logLevel', 'warn'],
      {
        cwd: ROOT,
        stdio: 'pipe',
      },
    );
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
    // Every Content-Security-Policy violation (even one the page catches) is recorded.
    await page.addInitScript(() => {
      const w = window as unknown as Inspect;
      w.__csp = [];
      document.addEventListener('securitypolicyviolation', (e) =>
        w.__csp!.push(`${e.violatedDirective} ${e.blockedURI} ${e.sourceFile}:${e.lineNumber}`),
      );
    });
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
  /** The default design's map column as computed without disturbance (first test). */
  let undisturbedMap: string[] = [];

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
    undisturbedMap = await column(page, 'table-map', 'Axial drag');
    expect(undisturbedMap.length).toBe(66);
    // The built page carries the strict policy, and nothing broke it.
    const html = await (await fetch(base)).text();
    expect(html).toContain(
      "default-src 'self'; script-src 'self'; worker-src 'self' blob:; style-src 'self';",
    );
    expect(await page.evaluate(() => (window as unknown as Inspect).__csp)).toEqual([]);
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
    expect(project.version).toBe(2);
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

  it('finishes the design map with the same numbers when a worker crashes mid-sweep; Cancel keeps finished results', async () => {
    expect(undisturbedMap.length).toBe(66);
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    // A sweep worker dies while the sweeps and the design map run (the page's test hook, as a real crash
    // would). The map's jobs follow the sweeps' in one run, so the crash lands on the map's jobs or on
    // jobs before them. A mutation observer set before the page loads makes the crash the moment the
    // sweeps start: polling could miss the stages on a loaded machine (once the map stage alone was long
    // enough to poll for), and on a quiet one the first load may be done before the page's load event.
    await context.addInitScript(() => {
      const w = window as unknown as Inspect & { __crashed?: boolean };
      const watch = () => {
        const observer = new MutationObserver(() => {
          const stage = document.body.dataset.stage ?? '';
          if (document.body.dataset.state !== 'computing' || !(stage === 'sweeps' || stage === 'map')) return;
          observer.disconnect();
          w.__crashed = w.coversweep.crashWorker();
        });
        observer.observe(document.body, { attributes: true, attributeFilter: ['data-state', 'data-stage'] });
      };
      if (document.body) watch();
      else document.addEventListener('DOMContentLoaded', watch);
    });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    const crashed = await page.evaluate(() => (window as unknown as { __crashed?: boolean }).__crashed);
    expect(crashed, 'the sweeps and the map ended before a worker could be crashed').toBe(true);
    expect(await page.locator('#status-text').textContent()).toMatch(/^Done in/);
    expect(await column(page, 'table-map', 'Axial drag')).toEqual(undisturbedMap);

    // Cancel during the next sweeps or design map: what finished stays, the page stays usable. (The tyre
    // width changes every design of the map; a cover-fraction edit would find the map kept from this run.)
    const cancelling = cancelAtSweepsOrMap(page);
    await setNumberControl(page, 'tyreWidthMm', '26');
    expect(
      await page.evaluate(() => (window as unknown as Inspect).coversweep.state().case.wheel.tyre_width_m),
    ).toBe(0.026);
    const cancelled = await cancelling;
    expect(cancelled, 'the sweeps and the map ended before Cancel could be pressed').toBe(true);
    expect(await settled(page)).toBe('done');
    expect(await page.locator('#status-text').textContent()).toContain('Cancelled');
    expect(await page.locator('#headline .value').count()).toBe(6);
    expect((await column(page, 'table-current', 'Axial drag, N')).length).toBe(41);
    expect((await column(page, 'table-map', 'Axial drag')).length).toBeLessThan(66);
    await setNumberControl(page, 'tyreWidthMm', '27');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.tyre_width_m === 0.027,
    );
    expect(await settled(page)).toBe('done');
    expect(await page.locator('#status-text').textContent()).toMatch(/^Done in/);
    expect((await column(page, 'table-map', 'Axial drag')).length).toBe(66);
    // Back to the first tyre width: every study is kept from the first run, so nothing is solved
    // again, and the map has the same numbers.
    await setNumberControl(page, 'tyreWidthMm', '25');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.tyre_width_m === 0.025,
    );
    expect(await settled(page)).toBe('done');
    expect(await column(page, 'table-map', 'Axial drag')).toEqual(undisturbedMap);
    expect(await page.evaluate(() => (window as unknown as Inspect).__csp)).toEqual([]);
    await context.close();
    expect(consoleErrors).toEqual([]);
  });

  it('computes a ride on the "On the road" panel exactly as the command line does', async () => {
    const context = await browser.newContext({
      viewport: { width: 1280, height: 800 },
      acceptDownloads: true,
    });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    // Baseline: the demo wheel pinned; design: the same wheel fully covered.
    await page.click('#pin-baseline');
    await setNumberControl(page, 'coverFraction', '1');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === 1,
    );
    await page.click('#tab-road');
    expect(await panelState(page, 'panel-road', ['done', 'error', 'invalid'])).toBe('done');
    const doc = (await page.evaluate(() => (window as unknown as Inspect).coversweep.ride()))!;
    expect(doc.ride.design.cover.fraction).toBe(1);
    expect(doc.ride.baseline.cover.fraction).toBe(0);
    // The trade's units on the cards; the cautions beside them.
    expect(await page.locator('[data-card="power"] .value').textContent()).toMatch(/^[+-]?\d+\.\d W$/);
    expect(await page.locator('[data-card="time"] .value').textContent()).toMatch(/^[+-]?\d+\.\d s$/);
    expect(await page.locator('[data-card="grams"] .value').textContent()).toMatch(/^[+-]?\d+ g$/);
    expect(await page.locator('[data-card="aero"] .value').textContent()).toMatch(/^\d+\.\d %$/);
    expect(await page.locator('#road-cautions li').count()).toBe(3);
    const yawSpec = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('roadYaw'));
    expect(yawSpec!.series.map((x) => x.label)).toEqual([
      'design axial drag, N',
      'baseline axial drag, N',
      'time at this yaw, % per deg',
    ]);
    const steer = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('roadSteering'));
    expect(steer!.series.length).toBe(2);

    // The page's ride file, solved by the command line: the same figures.
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#road-save')]);
    const ridePath = join(OUT, 'ui-page.ride.json');
    await download.saveAs(ridePath);
    const cli = JSON.parse(
      execFileSync(process.execPath, [join(ROOT, 'bin/coversweep.mjs'), 'ride', ridePath], {
        cwd: ROOT,
        encoding: 'utf8',
      }),
    ) as RideDocument;
    const pairs: Array<[string, number | null, number | null]> = [
      ['delta_power_W', doc.delta_power_W, cli.delta_power_W],
      ['delta_time_s', doc.delta_time_s, cli.delta_time_s],
      ['wind_averaged_axial_N.design', doc.wind_averaged_axial_N.design, cli.wind_averaged_axial_N.design],
      ['yaw_p90_deg', doc.yaw_p90_deg, cli.yaw_p90_deg],
      ['lean_deg.design', doc.lean_deg.design, cli.lean_deg.design],
      ['aero_share.design', doc.aero_share.design, cli.aero_share.design],
    ];
    for (const [name, got, expected] of pairs) {
      // Same code on the same inputs: equal to rounding (1e-12 relative).
      const tol = 1e-12;
      expect(relDiff(got!, expected!), `${name}: page=${got} cli=${expected} tol=${tol}`).toBeLessThanOrEqual(
        tol,
      );
    }
    expect(doc.delta_power_W).not.toBe(0);

    // An out-of-range input: the rule beside the input, the state unchanged.
    await typeAndLeave(page, '#road-rider-mass_kg', '5');
    await expect
      .poll(() => page.locator('#road-rider-mass_kg-error').textContent())
      .toContain('must be a number at least 20 and at most 300 kg');
    expect(await page.locator('#road-rider-mass_kg').getAttribute('aria-invalid')).toBe('true');
    const road = await page.evaluate(() => (window as unknown as Inspect).coversweep.state().road);
    expect(road?.rider.mass_kg ?? 80).toBe(80);
    await typeAndLeave(page, '#road-rider-mass_kg', '70');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.ride()?.ride.rider.mass_kg === 70,
      null,
      { timeout: 60_000 },
    );
    expect(await page.locator('#road-rider-mass_kg-error').textContent()).toBe('');

    // A course: per-segment figures.
    await page.locator('#road-use_course').selectOption('yes');
    await page.waitForFunction(
      () => ((window as unknown as Inspect).coversweep.ride()?.segments?.length ?? 0) === 4,
      null,
      { timeout: 60_000 },
    );
    expect(await panelState(page, 'panel-road', ['done'])).toBe('done');
    const segSpec = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('roadSegments'));
    expect(segSpec!.xs).toEqual([1, 2, 3, 4]);
    expect(await page.locator('#table-road-segments tbody tr').count()).toBe(4);
    const state = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    expect(state.road!.use_course).toBe(true);
    expect(state.road!.rider.mass_kg).toBe(70);
    // The road inputs travel with the link.
    expect(page.url()).toContain('#s=');
    const overflow = await panelShots(page, 'panel-road', 'road');
    expect(overflow, `page wider than a 400 px screen by ${overflow} px`).toBeLessThanOrEqual(0);
    expect(await page.evaluate(() => (window as unknown as Inspect).__csp)).toEqual([]);
    await context.close();
    expect(consoleErrors).toEqual([]);
  });

  let dataContext: BrowserContext;
  let dataPage: Page;

  it('compares the demo data with the model, fits it and uses the calibrated model, as the command line does', async () => {
    // The command line's comparison of the same files, meanwhile.
    const cliRun = new Promise<CompareReport>((ok, fail) => {
      execFile(
        process.execPath,
        [
          join(ROOT, 'bin/coversweep.mjs'),
          'compare',
          join(ROOT, 'public/demo/demo-case.json'),
          join(ROOT, 'public/demo/demo-tunnel.csv'),
          '--map',
          join(ROOT, 'public/demo/demo-map.json'),
          '--calibrate',
        ],
        { cwd: ROOT, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 },
        (error, stdout) => (error ? fail(error) : ok(JSON.parse(stdout) as CompareReport)),
      );
    });
    dataContext = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    dataPage = await open(dataContext);
    const page = dataPage;
    expect(await settled(page)).toBe('done');
    await page.click('#tab-data');
    await page.click('#data-demo');
    expect(await panelState(page, 'panel-data', ['mapping', 'error'])).toBe('mapping');
    expect((await page.evaluate(() => (window as unknown as Inspect).coversweep.state())).case.name).toBe(
      'Demo 50 mm half-cover',
    );
    const headers = await page.locator('#data-map-table tbody th').allTextContents();
    expect(headers).toEqual([
      'Yaw [deg]',
      'Speed [km/h]',
      'Drag [g]',
      'Side force [lbf]',
      'Yaw moment [N m]',
    ]);
    await page.click('#data-apply');
    expect(await panelState(page, 'panel-data', ['done', 'error'])).toBe('done');
    const report = (await page.evaluate(() => (window as unknown as Inspect).coversweep.comparison()))!;
    expect(report.converted.length).toBe(30);
    const force = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('dataForce'));
    expect(force!.series.filter((x) => x.pointsOnly).map((x) => x.label)).toEqual([
      'data 30 km/h',
      'data 40 km/h',
      'data 50 km/h',
    ]);
    expect(await page.locator('#table-data-residuals tbody tr').count()).toBe(report.residuals.length);
    await page.screenshot({ path: join(OUT, 'ui-data-compare-1280x800.png') });

    // The task workers crash (the one holding the parsed table with them): comparing again reads the
    // table afresh from the text the panel keeps, on a fresh worker, and gives the same report.
    // (At least the one that read the table is live; the other is started only when a task needs it.)
    const crashed = await page.evaluate(() => (window as unknown as Inspect).coversweep.crashTaskWorkers());
    expect(crashed).toBeGreaterThanOrEqual(1);
    await page.evaluate(() => {
      const panel = document.getElementById('panel-data')!;
      const seen: string[] = [];
      (window as unknown as { __dataStates: string[] }).__dataStates = seen;
      new MutationObserver(() => seen.push(panel.dataset.state ?? '')).observe(panel, {
        attributeFilter: ['data-state'],
      });
    });
    await page.click('#data-apply');
    await page.waitForFunction(
      () => {
        const seen = (window as unknown as { __dataStates: string[] }).__dataStates;
        return seen.includes('computing') && ['done', 'error'].includes(seen.at(-1)!);
      },
      null,
      { timeout: 60_000 },
    );
    expect(await panelState(page, 'panel-data', ['done', 'error'])).toBe('done');
    const again = await page.evaluate(() => (window as unknown as Inspect).coversweep.comparison());
    expect(again).toEqual(report);

    // Fit, and use the calibrated model.
    await page.click('#data-fit-run');
    await page.waitForFunction(
      () => Boolean((window as unknown as Inspect).coversweep.comparison()?.calibration),
      null,
      { timeout: 90_000 },
    );
    expect(await panelState(page, 'panel-data', ['done', 'error'])).toBe('done');
    const fitted = (await page.evaluate(() => (window as unknown as Inspect).coversweep.comparison()))!;
    const cli = await cliRun;
    // The page's guessed map equals demo-map.json here, so every number equals the command line's.
    expect(fitted.residuals.length).toBe(cli.residuals.length);
    fitted.residuals.forEach((r, i) => {
      const c = cli.residuals[i]!;
      const tol = 1e-12;
      expect(
        relDiff(r.model, c.model),
        `line=${r.line} ${r.output} page=${r.model} cli=${c.model} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
      expect(r.data, `line=${r.line} ${r.output}`).toBe(c.data);
    });
    fitted.calibration!.parameters.forEach((p, i) => {
      const c = cli.calibration!.parameters[i]!;
      // The fit stops once a step is below 1e-7 relative (calibrate.ts); browser and Node may differ in
      // the last bits of Math functions, so the two fits agree to about that, not to rounding.
      const tol = 1e-6;
      expect(
        relDiff(p.value, c.value),
        `${p.name} page=${p.value} cli=${c.value} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    });
    expect(await page.locator('#table-data-fit tbody tr').count()).toBe(3);
    const badge = page.locator('#calibrated-badge');
    expect(await badge.isVisible()).toBe(false);
    await page.click('#data-use-calibrated');
    await badge.waitFor({ state: 'visible' });
    expect(await badge.textContent()).toMatch(/^CALIBRATED model: fitted to demo-tunnel\.csv \(30 points\)/);
    const calibrated = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    const porosity = fitted.calibration!.parameters.find((p) => p.name === 'porosity_scale')!.value;
    expect(calibrated.case.model.porosity_scale).toBe(porosity);
    expect(calibrated.calibration!.data).toBe('demo-tunnel.csv');
    expect(await settled(page)).toBe('done');
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: join(OUT, 'ui-data-calibrated-1280x800.png') });
    await page.click('#data-use-calibrated');
    await badge.waitFor({ state: 'hidden' });
    const restored = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    expect(restored.case.model.porosity_scale).toBe(1);
    expect(restored.calibration ?? null).toBeNull();

    // Convergence study and input-uncertainty band on demand.
    await page.click('#data-convergence-run');
    await page.waitForFunction(
      () => Boolean((window as unknown as Inspect).coversweep.comparison()?.convergence),
      null,
      { timeout: 90_000 },
    );
    expect(await page.locator('#table-data-convergence tbody tr').count()).toBeGreaterThan(0);
    await page.locator('#data-results details summary').filter({ hasText: 'Ranges' }).click();
    await page.click('#data-uncertainty-run');
    await page.waitForFunction(
      () => Boolean((window as unknown as Inspect).coversweep.comparison()?.uncertainty),
      null,
      { timeout: 90_000 },
    );
    expect(await page.locator('#table-data-uncertainty tbody tr').count()).toBeGreaterThan(0);
    const withBand = await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('dataForce'));
    expect(withBand!.series.some((x) => x.label.startsWith('inputs 2.5–97.5 %'))).toBe(true);
    const overflow = await panelShots(page, 'panel-data', 'data');
    expect(overflow, `page wider than a 400 px screen by ${overflow} px`).toBeLessThanOrEqual(0);
    expect(await page.evaluate(() => (window as unknown as Inspect).__csp)).toEqual([]);
    expect(consoleErrors).toEqual([]);
  });

  it('shows HTML in a data file name, header and cells as text and runs none of it; refuses a too large file', async () => {
    const page = dataPage;
    const csv = [
      'Yaw [deg],<img src=x onerror="window.__xss=1">,Drag <script>window.__xss=2</script> [N]',
      '0,"<img src=y onerror=""window.__xss=3"">",0.5',
      '5,"<script>window.__xss=4</script>",0.4',
      '10,x,0.2',
    ].join('\n');
    const hostile = join(OUT, '<img src=z onerror="window.__xss=5">.csv');
    writeFileSync(hostile, csv);
    await page.setInputFiles('#data-file', hostile);
    await page.waitForFunction(() =>
      /Read <img src=z/.test(document.getElementById('data-status')?.textContent ?? ''),
    );
    const heads = await page.locator('#data-map-table tbody th').allTextContents();
    expect(heads).toEqual([
      'Yaw [deg]',
      '<img src=x onerror="window.__xss=1">',
      'Drag <script>window.__xss=2</script> [N]',
    ]);
    await page.locator('#data-preview-details summary').click();
    expect(await page.locator('#data-preview tbody td').nth(1).textContent()).toBe(
      '<img src=y onerror="window.__xss=3">',
    );
    await page.click('#data-apply');
    expect(await panelState(page, 'panel-data', ['done', 'error'])).toBe('done');
    expect(await page.locator('#data-summary').textContent()).toContain(
      '<img src=z onerror="window.__xss=5">.csv',
    );
    // Pasted, the same.
    await page.fill('#data-paste', csv);
    await page.click('#data-paste-read');
    await page.waitForFunction(() =>
      /Read pasted table/.test(document.getElementById('data-status')?.textContent ?? ''),
    );
    const found = await page.evaluate(() => ({
      xss: (window as unknown as Inspect).__xss ?? null,
      images: document.querySelectorAll('#panel-data img, #messages img').length,
      scripts: document.querySelectorAll('#panel-data script, #messages script').length,
    }));
    expect(found).toEqual({ xss: null, images: 0, scripts: 0 });

    // Too large: refused before reading, with the limit named; the table read before stays.
    const big = join(OUT, 'ui-too-large.csv');
    writeFileSync(big, Buffer.alloc(33 * 1024 * 1024, 0x30));
    await page.setInputFiles('#data-file', big);
    await page
      .locator('#data-read-errors')
      .filter({ hasText: 'ui-too-large.csv could not be read' })
      .waitFor();
    expect(await page.locator('#data-read-errors').textContent()).toContain('more than the 32.0 MB limit');
    rmSync(big, { force: true });
    expect(await page.locator('#data-map-table tbody th').count()).toBe(3);
    expect(await page.evaluate(() => (window as unknown as Inspect).__csp)).toEqual([]);
    await dataContext.close();
    expect(consoleErrors).toEqual([]);
  });

  it('makes a clicked design-map cell the current design, and Undo brings the design back', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    await page.click('#tab-map');
    const inspect = () => page.evaluate(() => (window as unknown as Inspect).coversweep.state().case.wheel);
    const before = await inspect();
    // The map's plot area (designMap.ts): 58 px from the left, 96 px from the right, 14 + 16 px per
    // title line (two) from the top, 44 px from the bottom. Cell i = 3 (fraction 0.3), j = 4 of 0..5.
    const box = (await page.locator('#fig-map canvas').boundingBox())!;
    const pw = box.width - 58 - 96;
    const ph = box.height - 46 - 44;
    await page.mouse.click(box.x + 58 + pw * 0.3, box.y + 46 + ph * (1 - 4 / 5));
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === 0.3,
    );
    const picked = await inspect();
    expect(picked.rim_depth_m).not.toBe(before.rim_depth_m);
    expect(await settled(page)).toBe('done');
    // The map's rim depths (its table) hold the picked depth.
    const depthsMm = await column(page, 'table-map', 'Rim depth, mm');
    expect(depthsMm.map(Number)).toContain(Number((picked.rim_depth_m * 1000).toFixed(1)));
    await page.click('#undo-pick');
    await page.waitForFunction(
      (f) => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === f,
      before.cover.fraction,
    );
    expect(await inspect()).toEqual(before);
    expect(await page.locator('#undo-pick').isHidden()).toBe(true);
    await context.close();
    expect(consoleErrors).toEqual([]);
  });

  it('computes the reference table on Help only when Help opens, with every case, its source and strength, as `validate` does', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    // Nothing is computed before Help opens.
    expect(await page.locator('#validation-table').count()).toBe(0);
    await page.click('#tab-help');
    expect(await panelState(page, 'validation', ['done', 'failed'])).toBe('done');
    const headers = await page.locator('#validation-table thead th').allTextContents();
    expect(headers).toEqual(['Case', 'Source', 'Strength', 'Reference and band', 'Model', 'Result']);
    const shown = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLTableRowElement>('#validation-table tbody tr')].map((tr) => ({
        id: tr.dataset.id ?? '',
        pass: tr.dataset.pass === 'true',
        cells: [...tr.cells].map((c) => c.textContent ?? ''),
      })),
    );
    // The same rows, verdicts and values as the command line's reference set computed here in Node.
    const report = runValidation();
    expect(shown.map((r) => r.id)).toEqual(report.rows.map((r) => r.id));
    for (const [i, row] of report.rows.entries()) {
      const got = shown[i]!;
      expect(got.pass, row.id).toBe(row.pass);
      expect(got.cells[1], row.id).toBe(row.source);
      expect(got.cells[2], row.id).toBe(row.strength);
      expect(got.cells[3], row.id).toContain(`band ${row.band_text}`);
      if (row.model !== null)
        expect(got.cells[4], row.id).toMatch(
          new RegExp(`^${formatNumber(row.model, 6).replace(/[.+]/g, '\\$&')}( |$)`),
        );
      const verdict = row.pass
        ? 'pass'
        : row.known_disagreement !== null
          ? `FAIL (known)${row.known_disagreement}`
          : 'FAIL';
      expect(got.cells[5], row.id).toBe(verdict);
    }
    expect(await page.locator('#validation-table caption').textContent()).toBe(
      `${report.passed} of ${report.rows.length} reference cases pass; ${report.failed} fail (${report.known} of them known, documented disagreements)`,
    );
    await page.locator('#validation').screenshot({ path: join(OUT, 'ui-validation.png') });
    await context.close();
    expect(consoleErrors).toEqual([]);
  });

  it('refuses an out-of-range or model-refused entry beside its control, keeps the design and shows its value again', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    const state = () => page.evaluate(() => (window as unknown as Inspect).coversweep.state());
    const rule = (field: string) => page.locator(`#rule-${field}`);
    const shown = (field: string) => page.locator(`[data-field="${field}"] input`).first().inputValue();
    const before = await state();
    const rimMm = Math.round(before.case.wheel.rim_depth_m * 1000);
    // Typing shows the rule before anything is applied.
    await page.locator('[data-field="rimDepthMm"] input').first().fill('400');
    expect(await rule('rimDepthMm').getAttribute('data-kind')).toBe('typing');
    expect(await rule('rimDepthMm').textContent()).toBe('Rim depth: at most 200 mm, got 400');
    await page.locator('[data-field="rimDepthMm"] input').first().press('Enter');
    // Out of the control's range: the rule beside it, the design unchanged, the control back to the design.
    const refusals: Array<[string, string, string, string]> = [
      ['rimDepthMm', '400', 'Rim depth: at most 200 mm, got 400', `${rimMm}`],
      ['airspeed', '-10', 'Airspeed: at least 5 km/h, got -10', '50'],
      ['yawStepDeg', '0', 'Yaw step: at least 0.25 deg, got 0', '0.5'],
      ['spokeCount', '20.5', 'Spoke count: a whole number, got 20.5', `${before.case.wheel.spokes.count}`],
      ['tyreWidthMm', 'abc', 'Tyre width: a number is needed, got "abc"', '25'],
    ];
    for (const [field, typed, ruleText, value] of refusals) {
      if (field !== 'rimDepthMm') await setNumberControl(page, field, typed);
      const note = (await rule(field).textContent()) ?? '';
      expect(note, `${field} <- ${typed}`).toContain(`Not applied: ${ruleText}.`);
      expect(await rule(field).getAttribute('data-kind')).toBe('refused');
      expect(await shown(field), `${field} shows the design's value again`).toBe(value);
      expect(await state(), `${field} <- ${typed} left the design unchanged`).toEqual(before);
    }
    expect(await rule('rimDepthMm').textContent()).toBe(
      `Not applied: Rim depth: at most 200 mm, got 400. The design keeps ${rimMm} mm.`,
    );
    // A value inside the control's range but refused by the case rules (a rim deeper than the wheel).
    await setNumberControl(page, 'outerRadiusMm', '200');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.outer_radius_m === 0.2,
    );
    const small = await state();
    await setNumberControl(page, 'rimDepthMm', '160');
    const refused = (await rule('rimDepthMm').textContent()) ?? '';
    expect(refused).toContain(
      'Not applied: rim depth: rim depth 0.16 m + tyre width 0.025 m must be less than',
    );
    expect(refused).toContain(`The design keeps ${rimMm} mm.`);
    expect(await shown('rimDepthMm')).toBe(`${rimMm}`);
    expect(await state()).toEqual(small);
    await page.locator('#controls').screenshot({ path: join(OUT, 'ui-theme-refused.png') });
    // A value inside the rules is applied exactly as typed (not snapped to the slider's 0.5 mm step),
    // and the note goes.
    await setNumberControl(page, 'rimWidthMm', '27.3');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.rim_width_m === 0.0273,
    );
    await setNumberControl(page, 'rimDepthMm', '60');
    await page.waitForFunction(
      () => (window as unknown as Inspect).coversweep.state().case.wheel.rim_depth_m === 0.06,
    );
    expect(await rule('rimDepthMm').isHidden()).toBe(true);
    // The model's terms carry help, and every number control names its unit.
    expect(await page.locator('[data-field="porosityScale"]').getAttribute('title')).toContain(
      'porous screen',
    );
    expect(await page.locator('[data-field="suctionRecovered"] .cs-hint').textContent()).toContain(
      'attainable',
    );
    const unitless = await page.evaluate(() =>
      [...document.querySelectorAll('#controls .lil-number .lil-name')]
        .map((n) => n.textContent ?? '')
        .filter((t) => !t.includes(', ')),
    );
    expect(unitless).toEqual([]);
    await context.close();
    expect(consoleErrors).toEqual([]);
  });

  it('shades the yaw range beyond the trusted yaw on every yaw plot and says why on hover', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await open(context);
    expect(await settled(page)).toBe('done');
    // Within the trusted range nothing is shaded.
    expect(await page.locator('#fig-drag-yaw .uplot').getAttribute('data-beyond-yaw')).toBe('none');
    await setNumberControl(page, 'yawMaxDeg', '40');
    await page.waitForFunction(
      () => Math.max(...(window as unknown as Inspect).coversweep.state().case.conditions.yaw_deg) === 40,
    );
    expect(await settled(page)).toBe('done');
    for (const fig of ['fig-drag-yaw', 'fig-side-yaw', 'fig-handling']) {
      expect(await page.locator(`#${fig} .uplot`).getAttribute('data-beyond-yaw'), fig).toBe('shaded');
      const note = page.locator(`#${fig} .plot-beyond-note`);
      expect(await note.textContent(), fig).toContain('30 to 40°');
      expect(await note.getAttribute('title'), fig).toContain('outside its trusted range');
      // The band is drawn: the plot area is darker beyond 30 deg than before it (the band's fill darkens
      // the white by about 20 levels).
      const shade = await page.evaluate((fig) => {
        const over = document.querySelector(`#${fig} .u-over`)!.getBoundingClientRect();
        const canvas = document.querySelector<HTMLCanvasElement>(`#${fig} canvas`)!;
        const box = canvas.getBoundingClientRect();
        const k = canvas.width / box.width;
        const g = canvas.getContext('2d')!;
        // The median over the plot area's height: a curve or a grid line covers only a few pixels.
        const median = (fx: number) => {
          const levels: number[] = [];
          for (let py = 2; py < over.height - 2; py += 2) {
            const x = Math.round((over.left - box.left + over.width * fx) * k);
            const y = Math.round((over.top - box.top + py) * k);
            const d = g.getImageData(x, y, 1, 1).data;
            // Over the card's white (the canvas is transparent where nothing is drawn).
            const a = d[3]! / 255;
            levels.push(((d[0]! + d[1]! + d[2]!) / 3) * a + 255 * (1 - a));
          }
          levels.sort((p, q) => p - q);
          return levels[Math.floor(levels.length / 2)]!;
        };
        return { inside: median(0.93), outside: median(0.4) };
      }, fig);
      expect(shade.outside - shade.inside, `${fig}: ${JSON.stringify(shade)}`).toBeGreaterThan(10);
      // Hovering the band says why; hovering the trusted range does not.
      const over = (await page.locator(`#${fig} .u-over`).boundingBox())!;
      await page.mouse.move(over.x + over.width * 0.93, over.y + over.height / 2);
      expect(await page.locator(`#${fig} .u-over`).getAttribute('title'), fig).toContain('trusted range');
      await page.mouse.move(over.x + over.width * 0.3, over.y + over.height / 2);
      expect(await page.locator(`#${fig} .u-over`).getAttribute('title'), fig).toBeNull();
    }
    // The road form says the wind is taken at a station height and what it is at the hub.
    await page.click('#tab-road');
    const windNote = page.locator('#road-wind-speed_mps-note');
    await windNote.waitFor();
    expect(await windNote.textContent()).toMatch(
      /^Taken at the station height, 10 m\. At the hub, 0\.\d+ m up, it is × 0\.\d+ \(log wind profile, roughness 0\.03 m\): a wind of \d+(\.\d+)? m\/s is \d+(\.\d+)? m\/s at the wheel\.$/,
    );
    await page.locator('#road-form').screenshot({ path: join(OUT, 'ui-theme-road-form.png') });
    await page.click('#tab-results');
    // The themed page, looked at in the report.
    await page.locator('.lil-gui .lil-title', { hasText: 'Model options' }).click();
    await page.locator('[data-field="porosityScale"]').scrollIntoViewIfNeeded();
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: join(OUT, 'ui-theme-1280x800.png') });
    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.evaluate(() => new Promise((ok) => requestAnimationFrame(() => requestAnimationFrame(ok))));
    await page.screenshot({ path: join(OUT, 'ui-theme-1920x1080.png') });
    await context.close();
    expect(consoleErrors).toEqual([]);
  });

  // Several baselines, imported data on the yaw plots and the percent difference (issue 11 item 6).
  describe('pinned baselines and imported data on the yaw plots', () => {
    const spec = (page: Page, name: PlotName) =>
      page.evaluate((n) => (window as unknown as Inspect).coversweep.plot(n), name) as Promise<PlotSpec>;
    const baselineSeries = (s: PlotSpec) => s.series.filter((x) => x.label.startsWith('baseline '));
    /** Choose an option of a select control, opening its folder of controls first if it is closed. */
    async function choose(page: Page, field: string, folder: string, option: string | { label: string }) {
      const select = page.locator(`[data-field="${field}"] select`);
      if (!(await select.isVisible()))
        await page
          .locator('#controls .lil-title')
          .filter({ hasText: new RegExp(`^${folder}$`) })
          .click();
      await select.selectOption(option);
    }
    /** Set the covering fraction and wait for its results. */
    async function coverTo(page: Page, fraction: number): Promise<void> {
      await setNumberControl(page, 'coverFraction', String(fraction));
      await page.waitForFunction(
        (f) => (window as unknown as Inspect).coversweep.state().case.wheel.cover.fraction === f,
        fraction,
      );
      expect(await settled(page)).toBe('done');
    }

    it('draws two pinned baselines as two more series, keeps them over a reload, and the percent plot stays finite', async () => {
      const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
      const page = await open(context);
      expect(await settled(page)).toBe('done');
      await page.click('#pin-baseline');
      await coverTo(page, 1);
      await page.click('#pin-baseline');
      await coverTo(page, 0.5);
      expect(await page.locator('#baseline-list li').count()).toBe(2);
      for (const name of ['dragYaw', 'sideYaw'] as const) {
        const lines = baselineSeries(await spec(page, name));
        expect(lines.map((x) => x.label)).toEqual([
          'baseline 1 (reference): Demo wheel (invented) — cover 0 at the rim',
          'baseline 2: Demo wheel (invented) — cover 1 at the rim',
        ]);
        for (const line of lines)
          expect(line.values.every((v) => typeof v === 'number' && Number.isFinite(v))).toBe(true);
        expect(lines[0]!.stroke).not.toBe(lines[1]!.stroke);
      }
      // Over a reload (the autosave and the link both carry the list).
      await page.reload();
      expect(await settled(page)).toBe('done');
      const state = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
      expect(state.baselines?.map((b) => b.wheel.cover.fraction)).toEqual([0, 1]);
      expect(baselineSeries(await spec(page, 'dragYaw'))).toHaveLength(2);

      // The fully covered wheel as the reference: its axial drag crosses zero at yaw; percent stays finite.
      await page.locator('#baseline-list li[data-baseline="1"] input[type="radio"]').check();
      await choose(page, 'difference', 'Plots and design map', { label: 'drag difference, %' });
      await page.waitForFunction(
        () => (window as unknown as Inspect).coversweep.state().view.difference === 'percent',
      );
      expect(await settled(page)).toBe('done');
      const percent = await spec(page, 'dragYaw');
      expect(percent.yLabel).toBe('Axial drag vs reference, %');
      const values = percent.series.flatMap((x) => x.values);
      for (const v of values) expect(v === null || Number.isFinite(v), `percent value ${v}`).toBe(true);
      const reference = (
        await page.evaluate(() => (window as unknown as Inspect).coversweep.plot('sideYaw'))
      )?.series.find((x) => x.label.startsWith('baseline 2 (reference)'));
      expect(reference).toBeDefined();
      const drag = await page.evaluate(() => {
        const s = (window as unknown as Inspect).coversweep.state();
        return s.baseline?.wheel.cover.fraction;
      });
      expect(drag).toBe(1);
      await page.locator('#fig-drag-yaw').scrollIntoViewIfNeeded();
      await page.screenshot({ path: join(OUT, 'ui-baselines-percent-1280x800.png') });
      const notes = (await page.locator('#plot-notes').textContent()) ?? '';
      if (values.some((v) => v === null))
        expect(notes).toMatch(/Percent differences are left empty at \d+ yaw angles?, where/);
      for (const v of values) if (v !== null) expect(Math.abs(v), `percent ${v}`).toBeLessThan(5000);
      // Removing one leaves the other (now the reference).
      await page.locator('#baseline-list li[data-baseline="1"] .baseline-remove').click();
      expect(await settled(page)).toBe('done');
      expect(await page.locator('#baseline-list li').count()).toBe(1);
      await context.close();
    });

    it('opens an old link with one baseline (no "baselines" key)', async () => {
      const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
      const first = await open(context);
      expect(await settled(first)).toBe('done');
      const now = await first.evaluate(() => (window as unknown as Inspect).coversweep.state());
      const old = {
        v: 1,
        case: {
          ...now.case,
          wheel: { ...now.case.wheel, cover: { ...now.case.wheel.cover, fraction: 0.75 } },
        },
        view: now.view,
        baseline: now.case,
      };
      const page = await open(context, `${base}#s=${textToBase64Url(JSON.stringify(old))}`);
      expect(await settled(page)).toBe('done');
      const state = await page.evaluate(() => (window as unknown as Inspect).coversweep.state());
      expect(state.case.wheel.cover.fraction).toBe(0.75);
      expect(state.baseline?.wheel.cover.fraction).toBe(now.case.wheel.cover.fraction);
      expect(baselineSeries(await spec(page, 'dragYaw')).map((x) => x.label)).toEqual([
        'baseline 1 (reference): Demo wheel (invented) — cover 0 at the rim',
      ]);
      expect(await page.locator('#baseline-list li').count()).toBe(1);
      await context.close();
    });

    it('draws the demo data as markers on the matching demo case, in the plots’ units, and says when it does not match', async () => {
      const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
      const page = await open(context);
      expect(await settled(page)).toBe('done');
      await page.click('#tab-data');
      await page.click('#data-demo');
      expect(await panelState(page, 'panel-data', ['mapping', 'error'])).toBe('mapping');
      await page.click('#data-apply');
      expect(await panelState(page, 'panel-data', ['done', 'error'])).toBe('done');
      const report = (await page.evaluate(() => (window as unknown as Inspect).coversweep.comparison()))!;
      // Two baselines of the same wheel (no cover, full cover), then back to the demo design.
      await coverTo(page, 0);
      await page.click('#pin-baseline');
      await coverTo(page, 1);
      await page.click('#pin-baseline');
      await coverTo(page, 0.5);
      await page.click('#tab-results');
      const c = await page.evaluate(() => (window as unknown as Inspect).coversweep.state().case);
      const v0 = c.conditions.airspeed_mps[0]!;
      // The data points at the plots' airspeed (30 km/h) and inside their yaw range.
      const expected = report.converted.filter(
        (r) => Math.abs(r.airspeed_mps - v0) <= 0.01 * v0 && r.yaw_deg >= 0 && r.yaw_deg <= 20,
      );
      expect(expected.length).toBeGreaterThan(3);
      const drag = await spec(page, 'dragYaw');
      const markers = drag.series.filter((x) => x.pointsOnly);
      expect(markers[0]!.label).toBe('your data');
      for (const r of expected) {
        const k = drag.xs.indexOf(r.yaw_deg);
        const got = markers.map((m) => m.values[k]).filter((x) => x !== null);
        expect(got, `data at yaw ${r.yaw_deg}`).toContain(r.axial_N);
      }
      const side = await spec(page, 'sideYaw');
      expect(side.series.filter((x) => x.pointsOnly)[0]!.label).toBe('your data');
      expect(baselineSeries(drag)).toHaveLength(2);
      expect(await page.locator('#plot-notes').textContent()).toMatch(
        new RegExp(`Your data \\(demo-tunnel\\.csv\\): ${expected.length} of 30 points drawn as markers`),
      );
      // In grams-force the markers follow the plots' unit (scaled to the reference speed like the lines).
      await choose(page, 'forceUnit', 'Units', { label: 'grams-force at the reference speed' });
      await page.waitForFunction(
        () => (window as unknown as Inspect).coversweep.state().view.forceUnit === 'gf',
      );
      const grams = (await spec(page, 'dragYaw')).series.find((x) => x.pointsOnly)!;
      const r0 = expected.find((r) => r.yaw_deg === 0)!;
      const ref = c.conditions.reference_speed_kmh / 3.6;
      const g = (r0.axial_N! * (ref * ref)) / (r0.airspeed_mps * r0.airspeed_mps) / 9.80665e-3;
      const k0 = (await spec(page, 'dragYaw')).xs.indexOf(0);
      expect(
        Math.abs(grams.values[k0]! - g),
        `grams at yaw 0: got ${grams.values[k0]}, expected ${g} +- 1e-6`,
      ).toBeLessThan(1e-6);
      await page.locator('#fig-drag-yaw').scrollIntoViewIfNeeded();
      await page.screenshot({ path: join(OUT, 'ui-baselines-data-1280x800.png') });
      // Another rim: the data no longer matches; the note says why and nothing is drawn.
      await setNumberControl(page, 'rimDepthMm', '60');
      await page.waitForFunction(
        () => (window as unknown as Inspect).coversweep.state().case.wheel.rim_depth_m === 0.06,
      );
      expect(await settled(page)).toBe('done');
      expect((await spec(page, 'dragYaw')).series.some((x) => x.pointsOnly)).toBe(false);
      expect(await page.locator('#plot-notes').textContent()).toMatch(
        /Your data \(demo-tunnel\.csv\) is not drawn: it was compared with another wheel \(that wheel: rim 50 mm\)/,
      );
      await context.close();
    });
  });
});
