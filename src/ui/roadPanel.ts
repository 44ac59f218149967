/**
 * The "On the road" panel: rider, ride, air, wind, gust and course inputs (with the ride file's
 * messages beside the inputs they concern), and the ride's results in the trade's units: watts at a
 * speed, seconds over the distance, grams at the reference speed, the aerodynamic share of the power,
 * the yaw density at the wheel over the wheels' yaw curves, the steering moment with its sign changes
 * and jumps, the lean and impulse of a gust, the trail, and per-segment figures for a course. The
 * cautions (RIDE_CAUTIONS) stand next to the figures. All text goes in through textContent.
 */
import type { RideResponse } from '../compute/engine/pageJobs';
import type { RideDocument } from '../compute/ride/index';
import { button, el } from './dom';
import type { PlotSpec } from './linePlot';
import {
  buildRoadPanelDom,
  ROAD_FIELD_GROUPS,
  type RoadPanelDom,
  type RoadPlotName,
} from './road/buildRoadPanelDom';
import { labelRideMessage } from './road/labelRideMessage';
import { renderRoadCards } from './road/renderRoadCards';
import { renderSegmentPlot, renderSteering, renderYawPlot } from './road/renderRoadPlots';
import { renderBreakdown, renderSegmentTable } from './road/renderRoadTables';
import type { RoadContext } from './road/roadContext';
import { clean } from './road/roadField';
import { defaultRoad, type RoadSegment, type RoadState, rideMessageField } from './roadState';
import type { SpeedUnit } from './viewState';

export type { RoadPlotName } from './road/buildRoadPanelDom';
export type { RoadContext } from './road/roadContext';
export type RoadPanelState = 'idle' | 'computing' | 'done' | 'error' | 'invalid';

export class RoadPanel {
  private road: RoadState = defaultRoad();
  private ctx: RoadContext | null = null;
  private readonly dom: RoadPanelDom;
  private last: RideResponse | null = null;

  constructor(
    private readonly host: HTMLElement,
    private readonly handlers: {
      onChange(road: RoadState): void;
      onPin(): void;
      onSaveRide(): void;
    },
  ) {
    this.dom = buildRoadPanelDom(host, {
      pin: () => this.handlers.onPin(),
      saveRide: () => this.handlers.onSaveRide(),
      addSegment: () => {
        const next = structuredClone(this.road);
        const lastSeg = next.course[next.course.length - 1];
        next.course.push(lastSeg ? { ...lastSeg } : { length_m: 10_000, heading_deg: 0, gradient: 0 });
        this.emit(next);
      },
      courseChanged: () => this.emit(this.readCourse(structuredClone(this.road))),
      formChanged: () => this.emit(this.readForm()),
    });
    this.refreshForm();
  }

  private speedUnit(): SpeedUnit {
    return this.ctx?.speedUnit ?? 'kmh';
  }

  /** The form's values as road inputs (unparseable numbers become NaN and are refused by the rules). */
  private readForm(): RoadState {
    const next = structuredClone(this.road);
    for (const { field, input } of this.dom.fields) {
      if (field.kind === 'select') field.set(next, input.value);
      else if (field.visible ? field.visible(next) : true) {
        const text = input.value.trim();
        field.set(next, text === '' ? Number.NaN : Number(text), this.speedUnit());
      }
    }
    return this.readCourse(next);
  }

  private readCourse(next: RoadState): RoadState {
    const rows = [...this.dom.courseBody.rows];
    next.course = rows.map((tr, i) => {
      const v = (k: string) => {
        const input = tr.querySelector<HTMLInputElement>(`input[data-col="${k}"]`);
        const text = input?.value.trim() ?? '';
        return text === '' ? Number.NaN : Number(text);
      };
      const old = this.road.course[i];
      return {
        length_m: v('length') * 1000,
        heading_deg: v('heading'),
        gradient: v('gradient') / 100,
        ...(old ? {} : {}),
      } satisfies RoadSegment;
    });
    return next;
  }

  private emit(next: RoadState): void {
    this.handlers.onChange(next);
  }

  /** Show road inputs (from the state) in the form. */
  setRoad(road: RoadState, ctx: RoadContext, refresh = true): void {
    this.road = structuredClone(road);
    this.ctx = ctx;
    if (refresh) this.refreshForm();
    this.dom.contextEl.textContent = `Design: ${ctx.designLabel}. Baseline: ${ctx.baselineLabel}.`;
    this.dom.pinButton.hidden = ctx.baselinePinned;
  }

  private refreshForm(): void {
    const u = this.speedUnit();
    for (const { field, row, input, unit, note } of this.dom.fields) {
      const visible = field.visible ? field.visible(this.road) : true;
      row.hidden = !visible;
      if (note && field.kind === 'number' && field.note) note.textContent = field.note(this.road, this.ctx);
      if (document.activeElement === input) continue;
      if (field.kind === 'select') input.value = field.get(this.road);
      else {
        const v = field.get(this.road, u);
        input.value = Number.isFinite(v) ? String(v) : '';
        if (unit) unit.textContent = field.unit(u);
      }
    }
    const label = this.dom.fields.find((f) => f.field.key === 'wind.direction_deg');
    if (label) {
      label.row.querySelector('label')!.textContent = this.road.use_course
        ? 'Wind from (compass, deg)'
        : 'Wind from, relative to the heading (0 = head wind)';
    }
    this.dom.courseBlock.hidden = !this.road.use_course;
    const body = document.createDocumentFragment();
    this.road.course.forEach((s, i) => {
      const cell = (col: string, value: number, label: string, step: string) => {
        const input = el('input', {
          attrs: {
            type: 'number',
            step,
            inputmode: 'decimal',
            'aria-label': `Segment ${i + 1}: ${label}`,
            'data-col': col,
          },
        });
        input.value = Number.isFinite(value) ? String(value) : '';
        return el('td', {}, [input]);
      };
      const remove = button(
        'Remove',
        () => {
          const next = structuredClone(this.road);
          next.course.splice(i, 1);
          this.emit(next);
        },
        { 'aria-label': `Remove segment ${i + 1}` },
      );
      remove.disabled = this.road.course.length <= 1;
      body.append(
        el('tr', {}, [
          el('th', { text: String(i + 1), attrs: { scope: 'row' } }),
          cell('length', clean(s.length_m / 1000), 'length, km', '0.5'),
          cell('heading', s.heading_deg, 'heading, deg', '5'),
          cell('gradient', clean(s.gradient * 100), 'gradient, %', '0.5'),
          el('td', {}, [remove]),
        ]),
      );
    });
    this.dom.courseBody.replaceChildren(body);
  }

  /** Show the ride file's messages beside the inputs they concern (the rest above the form). */
  showErrors(messages: readonly string[], candidate: RoadState): void {
    for (const f of this.dom.fields) {
      f.error.textContent = '';
      f.input.removeAttribute('aria-invalid');
    }
    this.dom.courseError.textContent = '';
    const general: string[] = [];
    const course: string[] = [];
    for (const message of messages) {
      const key = rideMessageField(message, candidate);
      const m = labelRideMessage(message, candidate, ROAD_FIELD_GROUPS);
      const f = key === null ? undefined : this.dom.fields.find((x) => x.field.key === key);
      if (f && !f.row.hidden) {
        f.error.textContent = f.error.textContent ? `${f.error.textContent} ${m}` : m;
        f.input.setAttribute('aria-invalid', 'true');
      } else if (key?.startsWith('course')) course.push(this.courseText(message));
      else general.push(m);
    }
    this.dom.courseError.textContent = course.join(' ');
    this.dom.formErrors.textContent = general.length > 0 ? `Not applied: ${general.join(' ')}` : '';
    if (messages.length > 0) {
      this.host.dataset.state = 'invalid';
      this.dom.statusEl.textContent =
        'Some inputs break the ride rules (see the messages beside them); the figures below are for the last valid inputs.';
    }
  }

  /** "course[2].length_m: ..." as "Segment 3: length_m: ..." */
  private courseText(message: string): string {
    return message.replace(/^course\[(\d+)\]\.?/, (_, i: string) => `Segment ${Number(i) + 1}: `);
  }

  clearErrors(): void {
    this.showErrors([], this.road);
  }

  setStatus(state: RoadPanelState, text: string): void {
    this.host.dataset.state = state;
    this.dom.statusEl.textContent = text;
  }

  plotSpec(name: RoadPlotName): PlotSpec | null {
    return this.dom.plots[name].currentSpec();
  }

  lastResult(): RideResponse | null {
    return this.last;
  }

  // -------------------------------------------------------------------------------------------
  // Results

  showResult(res: RideResponse, ctx: RoadContext): void {
    this.last = res;
    this.ctx = ctx;
    const d = res.document;
    renderRoadCards(this.dom.cards, d, ctx);
    renderYawPlot(this.dom.plots.roadYaw, res, ctx);
    renderSteering(this.dom.plots.roadSteering, this.dom.steeringFigure, this.dom.handlingText, d);
    this.renderSegments(d);
    renderBreakdown(this.dom.breakdown, d, this.speedUnit());
    this.dom.flagsEl.replaceChildren(
      ...(d.flags.length > 0
        ? d.flags.map((f) => el('li', { text: f }))
        : [el('li', { text: 'None: every wind state is within the model’s trusted yaw range.' })]),
    );
    this.dom.notesEl.replaceChildren(...d.notes.map((n) => el('li', { text: n })));
  }

  private renderSegments(d: RideDocument): void {
    const segs = d.segments;
    this.dom.segmentFigure.hidden = !segs;
    this.dom.segmentsBlock.hidden = !segs;
    if (!segs) return;
    renderSegmentPlot(this.dom.plots.roadSegments, segs);
    renderSegmentTable(this.dom.segments, segs, this.speedUnit());
  }
}
