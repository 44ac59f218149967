/**
 * Ride objectives on the design map: every ride objective is a map source ("ride:<id>"), one number per
 * map cell (cover fraction x rim depth): that cell's design evaluated on the ride "On the road" defines,
 * computed as a task on the pool's task workers ('mapObjectives': evaluateDesign per cell, as the design
 * study does) on the study's lattice, through a TaskChannel (the latest request wins; see there why a
 * late progress message can no longer overwrite the finished status). The choice of objectives lives in the study inputs (mapColour,
 * mapContour); "model output" keeps the map's own choice under "Plots and design map".
 */
import type { Parsed } from '../../compute/caseFile';
import { OBJECTIVES } from '../../compute/design/index';
import { TaskChannel } from '../../compute/engine/taskChannel';
import type { RideFile } from '../../compute/ride/index';
import type { AppState } from '../appState';
import { el, uniqueId } from '../dom';
import { pool } from '../earlyPool';
import type { PageHost } from '../pageHost';
import { headerText } from '../study/studyRows';
import { defaultStudyInputs } from '../study/studyState';
import { type MapCell, mapCells, registerMapSource } from './mapSources';
import type { PageResults } from './pageResults';
import { byId } from './present';

/** Objectives by cell ("rim depth m|cover fraction"), for the cells of the last computed map. */
const values = new Map<string, Record<string, number>>();
const cellKey = (rimDepthM: number, coverFraction: number) => `${rimDepthM}|${coverFraction}`;

for (const o of OBJECTIVES) {
  registerMapSource({
    key: `ride:${o.id}`,
    label: () => `${headerText(o.label, o.unit)}, over the ride`,
    value: (_ctx, cell: MapCell) =>
      values.get(cellKey(cell.rimDepthM, cell.coverFraction))?.[o.id] ?? Number.NaN,
  });
}

/** The map source keys the state asks for: ride objectives when chosen, else the view's outputs. */
export function mapSourceKeys(s: AppState): { colour: string; contour: string } {
  const st = s.study;
  return {
    colour: st?.mapColour ? `ride:${st.mapColour}` : s.view.mapColour,
    contour: st?.mapContour ? `ride:${st.mapContour}` : s.view.mapContour,
  };
}

export interface MapRideHost extends PageHost {
  readonly results: PageResults | null;
  rideFor(s: AppState): Parsed<RideFile>;
  /** Redraw the views (the map) after the objectives arrived. */
  renderAll(): void;
}

export class MapRide {
  private readonly tasks = new TaskChannel(pool);
  private key = '';
  private colour: HTMLSelectElement | null = null;
  private contour: HTMLSelectElement | null = null;
  private status: HTMLElement | null = null;

  constructor(private readonly host: MapRideHost) {}

  /** Two pickers under the map: colour and lines by a ride objective, or by the model output. */
  mount(): void {
    const select = (label: string, onChange: (id: string | null) => void) => {
      const id = uniqueId('map-ride');
      const s = el('select', { attrs: { id } }, [
        el('option', { text: 'model output (Plots and design map)', attrs: { value: '' } }),
        ...OBJECTIVES.map((o) => el('option', { text: headerText(o.label, o.unit), attrs: { value: o.id } })),
      ]);
      s.addEventListener('change', () => onChange(s.value === '' ? null : s.value));
      return { s, row: el('label', { text: `${label} `, attrs: { for: id } }) };
    };
    const c = select('Colour by', (id) => this.set({ mapColour: id }));
    const l = select('Lines by', (id) => this.set({ mapContour: id }));
    this.colour = c.s;
    this.contour = l.s;
    this.status = el('span', { className: 'small', attrs: { id: 'map-ride-status', 'aria-live': 'polite' } });
    byId('fig-map').append(
      el('p', { className: 'small map-ride button-row', attrs: { id: 'map-ride' } }, [
        el('strong', { text: 'Ride objectives: ' }),
        c.row,
        c.s,
        l.row,
        l.s,
        this.status,
      ]),
    );
  }

  private set(patch: { mapColour?: string | null; mapContour?: string | null }): void {
    const s = this.host.state;
    this.host.apply({ ...s, study: { ...(s.study ?? defaultStudyInputs()), ...patch } });
  }

  /** Show the state's choice, and compute the ride objectives over the map when one is chosen. */
  update(s: AppState): void {
    if (this.colour) this.colour.value = s.study?.mapColour ?? '';
    if (this.contour) this.contour.value = s.study?.mapContour ?? '';
    const r = this.host.results;
    if (!(s.study?.mapColour || s.study?.mapContour) || !r) return;
    const ride = this.host.rideFor(s);
    if (!ride.ok) {
      this.say(`The ride (set in “On the road”) is not valid: ${ride.errors[0]}`);
      return;
    }
    const cells = mapCells(r).map((c) => ({ coverFraction: c.coverFraction, rimDepthM: c.rimDepthM }));
    const lattice = (s.study ?? defaultStudyInputs()).lattice;
    // The cells set the design's cover fraction and rim depth: the wheel's own values do not matter.
    const { rim_depth_m: _d, ...wheel } = ride.value.design;
    const key = JSON.stringify([
      { ...ride.value, design: { ...wheel, cover: { ...wheel.cover, fraction: 0 } } },
      cells,
      lattice,
    ]);
    if (key === this.key) return;
    this.key = key;
    values.clear();
    void this.compute(key, { ride: ride.value, cells, lattice });
  }

  private say(text: string): void {
    if (this.status) this.status.textContent = text;
  }

  private async compute(
    key: string,
    request: {
      ride: RideFile;
      cells: { coverFraction: number; rimDepthM: number }[];
      lattice: { span: number; chord: number };
    },
  ): Promise<void> {
    this.say(`Evaluating the ${request.cells.length} designs on the ride…`);
    const out = await this.tasks.run(
      { kind: 'mapObjectives', request },
      {
        onProgress: (done, n) => {
          if (key === this.key) this.say(`Evaluating the designs on the ride: ${done} of ${n}…`);
        },
      },
    );
    // Superseded: a later request (a later key) answers. A newer key: its own run answers.
    if (out.status === 'superseded' || key !== this.key) return;
    if (out.status === 'cancelled') {
      // Nothing cancels this channel; should anything, ask again rather than stay "Evaluating".
      this.key = '';
      this.update(this.host.state);
      return;
    }
    if (out.status === 'failed') {
      this.key = '';
      this.say(`The ride objectives could not be computed: ${out.error}`);
      return;
    }
    request.cells.forEach((c, k) => {
      values.set(cellKey(c.rimDepthM, c.coverFraction), out.value[k]!);
    });
    this.say(
      `Each cell's design on the ride, ${request.lattice.span} x ${request.lattice.chord} lattice (the study's).`,
    );
    this.host.renderAll();
  }
}
