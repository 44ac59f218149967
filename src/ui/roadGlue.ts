/**
 * The "On the road" panel's glue: the ride built from the state (its baseline wheel: the pinned one or
 * this wheel without covers), computed as a task on the pool's task workers (a TaskChannel: the latest ride wins) when the road tab shows,
 * and the ride file saved for `coversweep ride`.
 */
import type { CaseWheel, Parsed } from '../compute/caseFile';
import { TaskChannel } from '../compute/engine/taskChannel';
import type { RideFile } from '../compute/ride/index';
import { kmhToMps } from '../compute/units';
import type { AppState } from './appState';
import { designFileStem } from './designFileStem';
import { fmt } from './displayUnits';
import { downloadText } from './download';
import { pool } from './earlyPool';
import type { PageHost } from './pageHost';
import type { RoadContext, RoadPanel, RoadPlotName } from './roadPanel';
import { defaultRoad, type RoadState, roadToRideRaw, validateRoadFor } from './roadState';
import { byId } from './views/present';

export class RoadGlue {
  private road: RoadPanel | null = null;
  private roadLoading: Promise<RoadPanel> | null = null;
  private readonly rideTasks = new TaskChannel(pool);
  private rideTimer: ReturnType<typeof setTimeout> | null = null;
  private lastRideKey = '';
  private roadShown: { road: string; unit: string } = { road: '', unit: '' };

  constructor(private readonly host: PageHost) {}

  plotSpec(name: RoadPlotName) {
    return this.road?.plotSpec(name) ?? null;
  }

  lastResult() {
    return this.road?.lastResult() ?? null;
  }

  /** The panel, built (and its code loaded) when first opened. */
  panel(): Promise<RoadPanel> {
    this.roadLoading ??= import('./roadPanel').then(({ RoadPanel }) => {
      const panel = new RoadPanel(byId('panel-road'), {
        onChange: (road) => this.onRoadChange(road),
        onPin: () => this.host.pinBaseline(),
        onSaveRide: () => this.saveRideFile(),
      });
      this.road = panel;
      this.roadShown = { road: '', unit: '' };
      this.showInputs(this.host.state);
      return panel;
    });
    return this.roadLoading;
  }

  /** The ride the road inputs define for a state (as the panel computes it), validated. */
  rideFor(s: AppState): Parsed<RideFile> {
    return validateRoadFor(s.road ?? defaultRoad(), s.case, this.rideBaseline(s).wheel);
  }

  /** The ride's baseline wheel: the pinned baseline's, or this wheel without covers. */
  private rideBaseline(s: AppState): { wheel: CaseWheel; label: string; pinned: boolean } {
    if (s.baseline) {
      return {
        wheel: s.baseline.wheel,
        label: `the pinned baseline (${s.baseline.name ?? 'unnamed'})`,
        pinned: true,
      };
    }
    const w = s.case.wheel;
    const uncovered = w.cover.fraction === 0 && w.cover.placement !== 'explicit';
    return {
      wheel: { ...w, cover: { fraction: 0, placement: 'rim', sides: w.cover.sides } },
      label: uncovered
        ? 'no baseline is pinned, so this same wheel without covers (identical to the design: pin a baseline, then change the design)'
        : 'no baseline is pinned, so this same wheel without covers (fully spoked)',
      pinned: false,
    };
  }

  private roadContext(s: AppState): RoadContext {
    const b = this.rideBaseline(s);
    return {
      speedUnit: s.view.speedUnit,
      referenceSpeedMps: kmhToMps(s.case.conditions.reference_speed_kmh),
      designLabel: `${s.case.name ?? 'this design'}${s.calibration ? ' (CALIBRATED model)' : ''}`,
      baselineLabel: b.label,
      baselinePinned: b.pinned,
      hubHeightM: s.case.wheel.outer_radius_m,
    };
  }

  /** Show the state's road inputs (refreshing the fields when the road or the speed unit changed). */
  showInputs(s: AppState): void {
    const road = s.road ?? defaultRoad();
    const key = JSON.stringify(road);
    const ctx = this.roadContext(s);
    const refresh = key !== this.roadShown.road || s.view.speedUnit !== this.roadShown.unit;
    if (!this.road) return;
    this.road.setRoad(road, ctx, refresh);
    if (refresh) this.road.clearErrors();
    this.roadShown = { road: key, unit: s.view.speedUnit };
  }

  /** The ride as a ride file (what `coversweep ride` reads), as far as it is valid. */
  private saveRideFile(): void {
    const s = this.host.state;
    const b = this.rideBaseline(s);
    const raw = roadToRideRaw(
      s.road ?? defaultRoad(),
      s.case,
      b.wheel,
      `${s.case.name ?? 'design'} against ${b.pinned ? (s.baseline?.name ?? 'the baseline') : 'the same wheel without covers'}`,
    );
    downloadText(
      `${designFileStem(s.case)}.ride.json`,
      `${JSON.stringify(raw, null, 2)}\n`,
      'application/json',
    );
  }

  private onRoadChange(candidate: RoadState): void {
    const b = this.rideBaseline(this.host.state);
    const r = validateRoadFor(candidate, this.host.state.case, b.wheel);
    if (!r.ok) {
      this.road?.showErrors(r.errors, candidate);
      return;
    }
    this.road?.clearErrors();
    this.host.apply({ ...this.host.state, road: candidate });
  }

  schedule(delayMs: number): void {
    if (this.rideTimer) clearTimeout(this.rideTimer);
    this.rideTimer = setTimeout(() => {
      this.rideTimer = null;
      void this.computeRide();
    }, delayMs);
  }

  private async computeRide(): Promise<void> {
    const panel = await this.panel();
    const s = this.host.state;
    const road = s.road ?? defaultRoad();
    const b = this.rideBaseline(s);
    const r = validateRoadFor(road, s.case, b.wheel);
    if (!r.ok) {
      panel.showErrors(r.errors, road);
      panel.setStatus('invalid', 'This ride cannot be computed: see the messages above the inputs.');
      this.lastRideKey = '';
      return;
    }
    const key = JSON.stringify(r.value);
    if (key === this.lastRideKey) return;
    this.lastRideKey = key;
    panel.setStatus(
      'computing',
      "Solving both wheels' yaw curves (0–90°) and the ride's wind states in the background…",
    );
    const started = performance.now();
    const out = await this.rideTasks.run({ kind: 'ride', request: { ride: r.value } });
    if (out.status === 'superseded' || out.status === 'cancelled') return;
    if (key !== this.lastRideKey) return;
    if (out.status === 'failed') {
      this.lastRideKey = '';
      panel.setStatus('error', `The ride could not be computed: ${out.error}`);
      return;
    }
    const ctx = this.roadContext(this.host.state);
    panel.showResult(out.value, ctx);
    const seconds = fmt((performance.now() - started) / 1000, 2);
    panel.setStatus(
      'done',
      `Computed in ${seconds} s${out.value.curvesReused ? ' (the yaw curves were reused)' : ''}: ${ctx.designLabel} against ${b.pinned ? 'the pinned baseline' : 'this wheel without covers'}.`,
    );
  }
}
