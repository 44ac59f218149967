/**
 * The 3D view's glue: its module and WebGL context load once the first numbers are on screen; its field
 * (viewFieldRequest) is a task on the pool's task workers (a TaskChannel: the latest request wins), so
 * it never waits behind a sweep; its layer switches are part of the state.
 */
import { TaskChannel } from '../compute/engine/taskChannel';
import { viewFieldRequest } from '../compute/study/viewFieldRequest';
import type { AppState } from './appState';
import { fmt } from './displayUnits';
import { pool } from './earlyPool';
import { view3dLoader, type WheelView } from './view3dSlot';
import type { ViewState } from './viewState';
import type { PageResults } from './views/pageResults';
import { byId, conditionsText, presentOf } from './views/present';

export interface View3dHost {
  readonly state: AppState;
  readonly results: PageResults | null;
  setView(patch: Partial<ViewState>): void;
}

/** Whether the view's container is not laid out (its tab hidden). */
function offScreen(): boolean {
  return byId('view3d').getClientRects().length === 0;
}

export class View3dGlue {
  private view: WheelView | null = null;
  private readonly channel = new TaskChannel(pool);
  private started = false;
  /** Numbers came while the view's tab was hidden: drawn when it is shown. */
  private waiting = false;
  /** The yaw of the field last asked for (null before the first draw). */
  private drawnYawDeg: number | null = null;

  constructor(private readonly host: View3dHost) {}

  /** The first numbers of a run are on screen: start the view, or redraw it; while its tab is hidden,
   * when the tab is shown (shown()). Its start-up (module, WebGL context, shader programs) and each
   * redraw (a field solved on a task worker, then drawn) cost 100-250 ms of the page's thread and as much
   * in the GPU process in software rendering; on a hidden tab they only slowed the next edit's run. */
  firstNumbersShown(): void {
    if (offScreen()) {
      this.waiting = true;
      return;
    }
    this.waiting = false;
    if (!this.started) {
      this.started = true;
      void this.setUp();
    } else {
      void this.update();
    }
  }

  /** Its tab is shown: draw what came while it was hidden. */
  shown(): void {
    if (this.waiting) this.firstNumbersShown();
  }

  /** Follow the state's layer switches and its view yaw (a yaw change redraws the field now). */
  applyLayers(next: AppState): void {
    if (this.view && this.drawnYawDeg !== null && next.view.view3dYawDeg !== this.drawnYawDeg)
      void this.update();
    if (this.view && Object.keys(next.view.layers3d).length > 0) {
      if (
        JSON.stringify(this.view.layers()) !==
        JSON.stringify({ ...this.view.layers(), ...next.view.layers3d })
      ) {
        this.view.setLayers(next.view.layers3d);
      }
    }
  }

  toPngBlob(minWidthPx?: number): Promise<Blob> {
    return this.view
      ? this.view.toPngBlob(minWidthPx)
      : Promise.reject(new Error('the 3D view is not available'));
  }

  private async setUp(): Promise<void> {
    const note = byId('view3d-note');
    const loader = view3dLoader();
    if (!loader) {
      note.textContent = 'The 3D view is not part of this build.';
      return;
    }
    try {
      const mod = await loader();
      this.view = mod.createWheelView(byId('view3d'));
      if (Object.keys(this.host.state.view.layers3d).length > 0)
        this.view.setLayers(this.host.state.view.layers3d);
      // The view's own layer switches become part of the state (link, autosave, project file).
      byId('view3d').addEventListener('change', () => {
        if (!this.view) return;
        const layers = { ...this.view.layers() };
        if (JSON.stringify(layers) !== JSON.stringify(this.host.state.view.layers3d))
          this.host.setView({ layers3d: layers });
      });
      note.textContent = '';
      void this.update();
    } catch (error) {
      note.textContent = `The 3D view could not start: ${(error as Error).message}`;
    }
  }

  /** Draw the current design's field (a task on the pool; the latest request wins). */
  async update(): Promise<void> {
    if (!this.view || !this.host.results?.current) return;
    if (offScreen()) {
      this.waiting = true;
      return;
    }
    const yawDeg = this.host.state.view.view3dYawDeg;
    this.drawnYawDeg = yawDeg;
    const request = viewFieldRequest(this.host.state.case, yawDeg);
    const p0 = request.input.points[0]!;
    const out = await this.channel.run({ kind: 'viewField', request });
    // Superseded: a later request draws; cancelled: nothing is wanted any more.
    if (out.status === 'superseded' || out.status === 'cancelled' || !this.view) return;
    if (out.status === 'failed') {
      byId('view3d-note').textContent = `The 3D view's flow field could not be computed: ${out.error}`;
      return;
    }
    this.view.update(out.value);
    byId('view3d-note').textContent =
      `Pressure jump on the wheel at ${fmt(yawDeg)}° yaw, ${conditionsText(presentOf(this.host.state, this.host.results), p0.airspeedMps, p0.rhoKgPerM3)}; drag to orbit.`;
  }
}
