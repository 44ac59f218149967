/**
 * The "On the road" panel: rider, ride, air, wind, gust and course inputs (with the ride file's
 * messages beside the inputs they concern), and the ride's results in the trade's units: watts at a
 * speed, seconds over the distance, grams at the reference speed, the aerodynamic share of the power,
 * the yaw density at the wheel over the wheels' yaw curves, the steering moment with its sign changes
 * and jumps, the lean and impulse of a gust, the trail, and per-segment figures for a course. The
 * cautions (RIDE_CAUTIONS) stand next to the figures. All text goes in through textContent.
 */
import type { RideResponse } from '../compute/engine/pageJobs';
import { type PowerBreakdown, RIDE_CAUTIONS, type RideDocument } from '../compute/ride/index';
import { dragAreaToGramsForce } from '../compute/units';
import { type Cell, DataTable } from './dataTable';
import { fixed, fmt, speedFromMps, speedToMps, speedUnitText } from './displayUnits';
import { button, el, plotFigure } from './dom';
import { LinePlot, type PlotSeries, type PlotSpec } from './linePlot';
import { defaultRoad, type RoadSegment, type RoadState, rideMessageField } from './roadState';
import type { SpeedUnit } from './viewState';

export type RoadPlotName = 'roadYaw' | 'roadSteering' | 'roadSegments';
export type RoadPanelState = 'idle' | 'computing' | 'done' | 'error' | 'invalid';

interface NumberField {
  kind: 'number';
  key: string;
  label: string;
  unit: (u: SpeedUnit) => string;
  get(r: RoadState, u: SpeedUnit): number;
  set(r: RoadState, v: number, u: SpeedUnit): void;
  step: string;
  visible?(r: RoadState): boolean;
  help?: string;
}

interface SelectField {
  kind: 'select';
  key: string;
  label: string;
  options: Array<[string, string]>;
  get(r: RoadState): string;
  set(r: RoadState, v: string): void;
  visible?(r: RoadState): boolean;
}

type Field = NumberField | SelectField;

const clean = (x: number) => Number(x.toPrecision(10));
const same = () => '';

function num(
  key: string,
  label: string,
  unit: string | ((u: SpeedUnit) => string),
  get: NumberField['get'],
  set: NumberField['set'],
  step = 'any',
  visible?: (r: RoadState) => boolean,
): NumberField {
  return {
    kind: 'number',
    key,
    label,
    unit: typeof unit === 'string' ? () => unit : unit,
    get,
    set,
    step,
    ...(visible ? { visible } : {}),
  };
}

const GROUPS: Array<{ title: string; fields: Field[] }> = [
  {
    title: 'Wheel and ride',
    fields: [
      {
        kind: 'select',
        key: 'position',
        label: 'Wheel position',
        options: [
          ['front', 'front'],
          ['rear', 'rear'],
        ],
        get: (r) => r.position,
        set: (r, v) => {
          r.position = v as RoadState['position'];
        },
      },
      num(
        'rear_shield',
        'Rear wheel: share of its drag felt',
        '0..1',
        (r) => r.rear_shield,
        (r, v) => {
          r.rear_shield = v;
        },
        '0.05',
        (r) => r.position === 'rear',
      ),
      {
        kind: 'select',
        key: 'mode',
        label: 'Compare at',
        options: [
          ['power', 'constant power'],
          ['speed', 'constant speed'],
        ],
        get: (r) => r.mode,
        set: (r, v) => {
          r.mode = v as RoadState['mode'];
        },
      },
      num(
        'power_W',
        'Rider power',
        'W',
        (r) => r.power_W,
        (r, v) => {
          r.power_W = v;
        },
        '5',
        (r) => r.mode === 'power',
      ),
      num(
        'speed_mps',
        'Ground speed',
        (u) => speedUnitText(u),
        (r, u) => clean(speedFromMps(r.speed_mps, u)),
        (r, v, u) => {
          r.speed_mps = speedToMps(v, u);
        },
        '0.5',
        (r) => r.mode === 'speed',
      ),
      {
        kind: 'select',
        key: 'use_course',
        label: 'Route',
        options: [
          ['no', 'one distance'],
          ['yes', 'a course'],
        ],
        get: (r) => (r.use_course ? 'yes' : 'no'),
        set: (r, v) => {
          r.use_course = v === 'yes';
        },
      },
      num(
        'distance_m',
        'Distance',
        'km',
        (r) => clean(r.distance_m / 1000),
        (r, v) => {
          r.distance_m = v * 1000;
        },
        '1',
        (r) => !r.use_course,
      ),
      num(
        'gradient',
        'Gradient',
        '%',
        (r) => clean(r.gradient * 100),
        (r, v) => {
          r.gradient = v / 100;
        },
        '0.5',
        (r) => !r.use_course,
      ),
    ],
  },
  {
    title: 'Rider and bike',
    fields: [
      num(
        'rider.mass_kg',
        'Mass, rider and bike',
        'kg',
        (r) => r.rider.mass_kg,
        (r, v) => {
          r.rider.mass_kg = v;
        },
        '1',
      ),
      num(
        'rider.cda_m2',
        'Drag area without this wheel',
        'm²',
        (r) => r.rider.cda_m2,
        (r, v) => {
          r.rider.cda_m2 = v;
        },
        '0.005',
      ),
      num(
        'rider.crr',
        'Rolling resistance coefficient',
        same(),
        (r) => r.rider.crr,
        (r, v) => {
          r.rider.crr = v;
        },
        '0.0005',
      ),
      num(
        'rider.drivetrain_efficiency',
        'Drivetrain efficiency',
        '0..1',
        (r) => r.rider.drivetrain_efficiency,
        (r, v) => {
          r.rider.drivetrain_efficiency = v;
        },
        '0.001',
      ),
      num(
        'rider.com_height_m',
        'Centre of mass height',
        'm',
        (r) => r.rider.com_height_m,
        (r, v) => {
          r.rider.com_height_m = v;
        },
        '0.05',
      ),
    ],
  },
  {
    title: 'Weather',
    fields: [
      {
        kind: 'select',
        key: 'air',
        label: 'Air',
        options: [
          ['design', 'the design’s air'],
          ['own', 'this ride’s weather'],
        ],
        get: (r) => r.air,
        set: (r, v) => {
          r.air = v as RoadState['air'];
        },
      },
      num(
        'temperature_c',
        'Temperature',
        '°C',
        (r) => r.temperature_c,
        (r, v) => {
          r.temperature_c = v;
        },
        '1',
        (r) => r.air === 'own',
      ),
      num(
        'altitude_m',
        'Altitude',
        'm',
        (r) => r.altitude_m,
        (r, v) => {
          r.altitude_m = v;
        },
        '50',
        (r) => r.air === 'own',
      ),
      num(
        'relative_humidity',
        'Relative humidity',
        '%',
        (r) => clean(r.relative_humidity * 100),
        (r, v) => {
          r.relative_humidity = v / 100;
        },
        '5',
        (r) => r.air === 'own',
      ),
      {
        kind: 'select',
        key: 'wind.kind',
        label: 'Wind speed',
        options: [
          ['fixed', 'one speed'],
          ['rayleigh', 'Rayleigh (mean)'],
          ['weibull', 'Weibull (shape, scale)'],
        ],
        get: (r) => r.wind.kind,
        set: (r, v) => {
          r.wind.kind = v as RoadState['wind']['kind'];
        },
      },
      num(
        'wind.speed_mps',
        'Wind speed at the reference height',
        'm/s',
        (r) => r.wind.speed_mps,
        (r, v) => {
          r.wind.speed_mps = v;
        },
        '0.5',
        (r) => r.wind.kind === 'fixed',
      ),
      num(
        'wind.mean_mps',
        'Mean wind speed',
        'm/s',
        (r) => r.wind.mean_mps,
        (r, v) => {
          r.wind.mean_mps = v;
        },
        '0.5',
        (r) => r.wind.kind === 'rayleigh',
      ),
      num(
        'wind.shape',
        'Weibull shape',
        same(),
        (r) => r.wind.shape,
        (r, v) => {
          r.wind.shape = v;
        },
        '0.1',
        (r) => r.wind.kind === 'weibull',
      ),
      num(
        'wind.scale_mps',
        'Weibull scale',
        'm/s',
        (r) => r.wind.scale_mps,
        (r, v) => {
          r.wind.scale_mps = v;
        },
        '0.5',
        (r) => r.wind.kind === 'weibull',
      ),
      {
        kind: 'select',
        key: 'wind.direction',
        label: 'Wind direction',
        options: [
          ['uniform', 'any, equally likely'],
          ['fixed', 'one direction'],
        ],
        get: (r) => r.wind.direction,
        set: (r, v) => {
          r.wind.direction = v as RoadState['wind']['direction'];
        },
      },
      num(
        'wind.direction_deg',
        'Wind from',
        'deg',
        (r) => r.wind.direction_deg,
        (r, v) => {
          r.wind.direction_deg = v;
        },
        '5',
        (r) => r.wind.direction === 'fixed',
      ),
      num(
        'wind.reference_height_m',
        'Height of the wind figure',
        'm',
        (r) => r.wind.reference_height_m,
        (r, v) => {
          r.wind.reference_height_m = v;
        },
        '1',
      ),
      num(
        'wind.roughness_length_m',
        'Terrain roughness length',
        'm',
        (r) => r.wind.roughness_length_m,
        (r, v) => {
          r.wind.roughness_length_m = v;
        },
        '0.01',
      ),
      num(
        'handling.gust_factor',
        'Gust factor (gust / mean)',
        same(),
        (r) => r.handling.gust_factor,
        (r, v) => {
          r.handling.gust_factor = v;
        },
        '0.1',
      ),
      num(
        'handling.gust_duration_s',
        'Gust duration',
        's',
        (r) => r.handling.gust_duration_s,
        (r, v) => {
          r.handling.gust_duration_s = v;
        },
        '0.5',
      ),
    ],
  },
];

interface FieldView {
  field: Field;
  row: HTMLElement;
  input: HTMLInputElement | HTMLSelectElement;
  unit: HTMLElement | null;
  error: HTMLElement;
}

export interface RoadContext {
  speedUnit: SpeedUnit;
  /** Reference speed of "grams at" (m/s) and its text. */
  referenceSpeedMps: number;
  designLabel: string;
  baselineLabel: string;
  baselinePinned: boolean;
}

const DESIGN_COLOUR = '#c2412d';
const BASELINE_COLOUR = '#111111';
const DENSITY_COLOUR = '#1c6876';

export class RoadPanel {
  private road: RoadState = defaultRoad();
  private ctx: RoadContext | null = null;
  private readonly fields: FieldView[] = [];
  private readonly formErrors: HTMLElement;
  private readonly courseBody: HTMLTableSectionElement;
  private readonly courseBlock: HTMLElement;
  private readonly courseError: HTMLElement;
  private readonly statusEl: HTMLElement;
  private readonly contextEl: HTMLElement;
  private readonly pinButton: HTMLButtonElement;
  private readonly cards: HTMLElement;
  private readonly flagsEl: HTMLElement;
  private readonly notesEl: HTMLElement;
  private readonly handlingText: HTMLElement;
  private readonly plots: Record<RoadPlotName, LinePlot>;
  private readonly segmentFigure: HTMLElement;
  private readonly steeringFigure: HTMLElement;
  private readonly breakdown: DataTable;
  private readonly segments: DataTable;
  private readonly segmentsBlock: HTMLElement;
  private readonly results: HTMLElement;
  private last: RideResponse | null = null;

  constructor(
    private readonly host: HTMLElement,
    private readonly handlers: {
      onChange(road: RoadState): void;
      onPin(): void;
      onSaveRide(): void;
    },
  ) {
    host.replaceChildren();
    host.dataset.state = 'idle';
    const heading = el('h2', { text: 'On the road: this design against a baseline' });
    this.contextEl = el('p', { className: 'small road-context' });
    this.pinButton = button('Pin the current design as baseline', () => this.handlers.onPin(), {
      id: 'road-pin',
    });
    const save = button('Save ride file', () => this.handlers.onSaveRide(), {
      id: 'road-save',
      title: 'These inputs as a ride file: coversweep ride ride.json computes the same figures',
    });
    const form = el('form', { className: 'road-form', attrs: { id: 'road-form', novalidate: '' } });
    form.addEventListener('submit', (e) => e.preventDefault());
    this.formErrors = el('div', { className: 'field-error form-errors', attrs: { 'aria-live': 'polite' } });
    form.append(this.formErrors);
    for (const group of GROUPS) {
      const fs = el('fieldset', {}, [el('legend', { text: group.title })]);
      for (const field of group.fields) fs.append(this.buildField(field));
      form.append(fs);
    }
    // The course editor.
    this.courseBody = document.createElement('tbody');
    this.courseError = el('div', { className: 'field-error', attrs: { 'aria-live': 'polite' } });
    const courseTable = el('table', { className: 'course-table', attrs: { id: 'road-course' } }, [
      el('caption', { text: 'Course segments, ridden in order' }),
      el('thead', {}, [
        el('tr', {}, [
          el('th', { text: '#', attrs: { scope: 'col' } }),
          el('th', { text: 'Length, km', attrs: { scope: 'col' } }),
          el('th', { text: 'Heading, deg (compass)', attrs: { scope: 'col' } }),
          el('th', { text: 'Gradient, %', attrs: { scope: 'col' } }),
          el('th', { text: '', attrs: { scope: 'col' } }),
        ]),
      ]),
      this.courseBody,
    ]);
    this.courseBlock = el('fieldset', { className: 'course' }, [
      el('legend', { text: 'Course' }),
      el('div', { className: 'table-scroll course-scroll' }, [courseTable]),
      button('Add a segment', () => {
        const next = structuredClone(this.road);
        const lastSeg = next.course[next.course.length - 1];
        next.course.push(lastSeg ? { ...lastSeg } : { length_m: 10_000, heading_deg: 0, gradient: 0 });
        this.emit(next);
      }),
      this.courseError,
    ]);
    form.append(this.courseBlock);
    form.addEventListener('change', (event) => {
      const target = event.target as HTMLElement;
      if (target.closest('.course-table')) this.emit(this.readCourse(structuredClone(this.road)));
      else this.emit(this.readForm());
    });

    this.statusEl = el('p', { className: 'road-status', attrs: { role: 'status', 'aria-live': 'polite' } });
    const cautions = el('div', { className: 'caution small', attrs: { id: 'road-cautions' } }, [
      el('strong', { text: 'Cautions: ' }),
      el(
        'ul',
        {},
        RIDE_CAUTIONS.map((c) => el('li', { text: c })),
      ),
    ]);
    this.cards = el('div', { className: 'headline road-cards', attrs: { id: 'road-cards' } });
    const yaw = plotFigure('fig-road-yaw', 'Yaw at the wheel over the yaw curves');
    const steer = plotFigure('fig-road-steering', 'Steering moment vs yaw');
    const seg = plotFigure('fig-road-segments', 'Per segment: design − baseline');
    this.steeringFigure = steer.figure;
    this.segmentFigure = seg.figure;
    this.handlingText = el('p', { className: 'small', attrs: { id: 'road-handling' } });
    steer.figure.append(
      this.handlingText,
      el('p', {
        className: 'caution small',
        text: 'Handling caution: a gust can turn and lean a covered or deep front wheel hard. These are model estimates; allow margin for stronger gusts and lighter riders, follow your competition’s rules and rely on qualified testing before anyone rides a design.',
      }),
    );
    this.plots = {
      roadYaw: new LinePlot(yaw.plot, 240),
      roadSteering: new LinePlot(steer.plot, 220),
      roadSegments: new LinePlot(seg.plot, 220),
    };
    const breakdownScroll = el('div', { className: 'table-scroll' });
    this.breakdown = new DataTable(
      breakdownScroll,
      'table-road-power',
      'Power at the constant speed, by term (W)',
    );
    const segScroll = el('div', { className: 'table-scroll' });
    this.segments = new DataTable(segScroll, 'table-road-segments', 'Course segments');
    this.segmentsBlock = el('div', { className: 'table-block' }, [segScroll]);
    this.flagsEl = el('ul', { className: 'road-flags', attrs: { id: 'road-flags' } });
    this.notesEl = el('ul', { className: 'small' });
    this.results = el('div', { className: 'road-results' }, [
      this.statusEl,
      this.cards,
      cautions,
      el('div', { className: 'plot-grid road-plots' }, [yaw.figure, steer.figure, seg.figure]),
      el('h3', { text: 'Flags' }),
      this.flagsEl,
      el('div', { className: 'table-block' }, [breakdownScroll]),
      this.segmentsBlock,
      el('details', {}, [el('summary', { text: 'How these figures are computed' }), this.notesEl]),
    ]);
    host.append(
      heading,
      el('div', { className: 'road-context-row' }, [this.contextEl, this.pinButton, save]),
      el('div', { className: 'road-layout' }, [form, this.results]),
    );
    this.refreshForm();
  }

  private buildField(field: Field): HTMLElement {
    const id = `road-${field.key.replace(/[^\w]+/g, '-')}`;
    const label = el('label', { text: field.label, attrs: { for: id } });
    const error = el('div', {
      className: 'field-error',
      attrs: { id: `${id}-error`, 'aria-live': 'polite' },
    });
    let input: HTMLInputElement | HTMLSelectElement;
    let unit: HTMLElement | null = null;
    if (field.kind === 'select') {
      const select = el('select', { attrs: { id, name: field.key } });
      for (const [value, text] of field.options) select.append(el('option', { text, attrs: { value } }));
      input = select;
    } else {
      input = el('input', {
        attrs: { id, name: field.key, type: 'number', step: field.step, inputmode: 'decimal' },
      });
      unit = el('span', { className: 'unit' });
    }
    input.setAttribute('aria-describedby', error.id);
    input.dataset.road = field.key;
    const row = el('div', { className: 'field' }, [
      label,
      el('div', { className: 'input' }, [input, unit]),
      error,
    ]);
    this.fields.push({ field, row, input, unit, error });
    return row;
  }

  private speedUnit(): SpeedUnit {
    return this.ctx?.speedUnit ?? 'kmh';
  }

  /** The form's values as road inputs (unparseable numbers become NaN and are refused by the rules). */
  private readForm(): RoadState {
    const next = structuredClone(this.road);
    for (const { field, input } of this.fields) {
      if (field.kind === 'select') field.set(next, input.value);
      else if (field.visible ? field.visible(next) : true) {
        const text = input.value.trim();
        field.set(next, text === '' ? Number.NaN : Number(text), this.speedUnit());
      }
    }
    return this.readCourse(next);
  }

  private readCourse(next: RoadState): RoadState {
    const rows = [...this.courseBody.rows];
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
    this.contextEl.textContent = `Design: ${ctx.designLabel}. Baseline: ${ctx.baselineLabel}.`;
    this.pinButton.hidden = ctx.baselinePinned;
  }

  private refreshForm(): void {
    const u = this.speedUnit();
    for (const { field, row, input, unit } of this.fields) {
      const visible = field.visible ? field.visible(this.road) : true;
      row.hidden = !visible;
      if (document.activeElement === input) continue;
      if (field.kind === 'select') input.value = field.get(this.road);
      else {
        const v = field.get(this.road, u);
        input.value = Number.isFinite(v) ? String(v) : '';
        if (unit) unit.textContent = field.unit(u);
      }
    }
    const label = this.fields.find((f) => f.field.key === 'wind.direction_deg');
    if (label) {
      label.row.querySelector('label')!.textContent = this.road.use_course
        ? 'Wind from (compass, deg)'
        : 'Wind from, relative to the heading (0 = head wind)';
    }
    this.courseBlock.hidden = !this.road.use_course;
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
    this.courseBody.replaceChildren(body);
  }

  /** Show the ride file's messages beside the inputs they concern (the rest above the form). */
  showErrors(messages: readonly string[], candidate: RoadState): void {
    for (const f of this.fields) {
      f.error.textContent = '';
      f.input.removeAttribute('aria-invalid');
    }
    this.courseError.textContent = '';
    const general: string[] = [];
    const course: string[] = [];
    for (const m of messages) {
      const key = rideMessageField(m, candidate);
      const f = key === null ? undefined : this.fields.find((x) => x.field.key === key);
      if (f && !f.row.hidden) {
        f.error.textContent = f.error.textContent ? `${f.error.textContent} ${m}` : m;
        f.input.setAttribute('aria-invalid', 'true');
      } else if (key?.startsWith('course')) course.push(this.courseText(m));
      else general.push(m);
    }
    this.courseError.textContent = course.join(' ');
    this.formErrors.textContent = general.length > 0 ? `Not applied: ${general.join(' ')}` : '';
    if (messages.length > 0) {
      this.host.dataset.state = 'invalid';
      this.statusEl.textContent =
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
    this.statusEl.textContent = text;
  }

  plotSpec(name: RoadPlotName): PlotSpec | null {
    return this.plots[name].currentSpec();
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
    this.renderCards(d, ctx);
    this.renderYawPlot(res, ctx);
    this.renderSteering(d);
    this.renderSegments(d);
    this.renderBreakdown(d);
    this.flagsEl.replaceChildren(
      ...(d.flags.length > 0
        ? d.flags.map((f) => el('li', { text: f }))
        : [el('li', { text: 'None: every wind state is within the model’s trusted yaw range.' })]),
    );
    this.notesEl.replaceChildren(...d.notes.map((n) => el('li', { text: n })));
  }

  private renderCards(d: RideDocument, ctx: RoadContext): void {
    const u = ctx.speedUnit;
    const su = speedUnitText(u);
    const sign = (x: number, decimals: number) => `${x > 0 ? '+' : ''}${fixed(x, decimals)}`;
    const rho = d.air_density_kgpm3 ?? Number.NaN;
    const grams = (cda: number | null) =>
      cda === null ? Number.NaN : dragAreaToGramsForce(cda, ctx.referenceSpeedMps, rho);
    const gD = grams(d.wind_averaged_cda_m2.design);
    const gB = grams(d.wind_averaged_cda_m2.baseline);
    const refText = `${fmt(speedFromMps(ctx.referenceSpeedMps, u), 3)} ${su}`;
    const speedText = `${fixed(speedFromMps(d.constant_speed_mps ?? Number.NaN, u), 1)} ${su}`;
    const dist = `${fmt(d.distance_m / 1000, 4)} km`;
    const share = (x: number | null) => (x === null ? Number.NaN : 100 * x);
    const cards: Array<{ id: string; label: string; value: string; sub: string[] }> = [
      {
        id: 'power',
        label: `Power at ${speedText} (constant speed)`,
        value: `${sign(d.delta_power_W ?? Number.NaN, 1)} W`,
        sub: [
          `design ${fixed(d.power_W.design ?? Number.NaN, 1)} W, baseline ${fixed(d.power_W.baseline ?? Number.NaN, 1)} W`,
        ],
      },
      {
        id: 'time',
        label: `Time over ${dist} at ${fixed(d.constant_power_W ?? Number.NaN, 0)} W`,
        value: `${sign(d.delta_time_s ?? Number.NaN, 1)} s`,
        sub: [
          `design ${clock(d.time_s.design)}, baseline ${clock(d.time_s.baseline)}`,
          `mean speed ${sign(speedFromMps(d.delta_speed_mps ?? Number.NaN, u), 2)} ${su}`,
        ],
      },
      {
        id: 'grams',
        label: `Wind-averaged axial drag, grams at ${refText}`,
        value: `${sign(gD - gB, 0)} g`,
        sub: [
          `design ${fixed(gD, 0)} g, baseline ${fixed(gB, 0)} g`,
          `${fixed(d.wind_averaged_axial_N.design ?? Number.NaN, 3)} N vs ${fixed(d.wind_averaged_axial_N.baseline ?? Number.NaN, 3)} N at ${speedText}`,
        ],
      },
      {
        id: 'aero',
        label: 'Aerodynamic share of the power',
        value: `${fixed(share(d.aero_share.design), 1)} %`,
        sub: [`baseline ${fixed(share(d.aero_share.baseline), 1)} % (rider, bike and wheel)`],
      },
      {
        id: 'yaw',
        label: 'Yaw at the wheel',
        value: `90 % below ${fixed(d.yaw_p90_deg ?? Number.NaN, 1)}°`,
        sub: [`mean ${fixed(d.yaw_mean_deg ?? Number.NaN, 1)}°`],
      },
      {
        id: 'lean',
        label: `Lean to hold a ${fmt(d.gust.factor, 3)}× gust`,
        value: `${fixed(d.lean_deg.design ?? Number.NaN, 2)}°`,
        sub: [
          `baseline ${fixed(d.lean_deg.baseline ?? Number.NaN, 2)}°; gust ${fixed(d.gust.hub_speed_mps ?? Number.NaN, 1)} m/s at the hub`,
        ],
      },
      {
        id: 'impulse',
        label: `Gust impulse (${fmt(d.gust.duration_s, 3)} s)`,
        value: `${fixed(d.gust_impulse_Ns.design ?? Number.NaN, 2)} N s`,
        sub: [
          `baseline ${fixed(d.gust_impulse_Ns.baseline ?? Number.NaN, 2)} N s; sideways ${fixed(d.gust_lateral_speed_change_mps.design ?? Number.NaN, 3)} m/s`,
        ],
      },
      {
        id: 'trail',
        label: 'Trail (head angle, offset, radius)',
        value: `${fixed((d.trail_m.design ?? Number.NaN) * 1000, 1)} mm`,
        sub: [`baseline ${fixed((d.trail_m.baseline ?? Number.NaN) * 1000, 1)} mm`],
      },
    ];
    this.cards.replaceChildren(
      ...cards.map((c) =>
        el('div', { className: 'figure-card', attrs: { 'data-card': c.id } }, [
          el('div', { className: 'label', text: c.label }),
          el('div', { className: 'value', text: c.value }),
          ...c.sub.map((s) => el('div', { className: 'sub', text: s })),
        ]),
      ),
    );
  }

  /** Largest yaw worth plotting: where 99.5 % of the riding time is below, at least 30 deg. */
  private yawLimit(d: RideDocument): number {
    let cum = 0;
    let limit = 90;
    for (const b of d.yaw_density) {
      cum += b.density_per_deg;
      if (cum >= 0.995) {
        limit = Math.ceil(b.yaw_deg + 2);
        break;
      }
    }
    return Math.min(90, Math.max(30, limit));
  }

  private renderYawPlot(res: RideResponse, ctx: RoadContext): void {
    const d = res.document;
    const c = res.curves;
    const limit = this.yawLimit(d);
    const curveYaw = Array.from(c.design.yawRad, (y) => Math.round(((y * 180) / Math.PI) * 1e9) / 1e9);
    const xs: number[] = [];
    const dragD: Array<number | null> = [];
    const dragB: Array<number | null> = [];
    const density: Array<number | null> = [];
    const binAt = new Map(d.yaw_density.map((b) => [b.yaw_deg, b.density_per_deg]));
    for (let k = 0; k <= 2 * limit; k++) {
      const x = k / 2;
      xs.push(x);
      const i = curveYaw.indexOf(x);
      dragD.push(i >= 0 ? finite(c.design.axialN[i]!) : null);
      dragB.push(i >= 0 ? finite(c.baseline.axialN[i]!) : null);
      const dens = binAt.get(x);
      density.push(dens === undefined ? null : 100 * dens);
    }
    const su = speedUnitText(ctx.speedUnit);
    const v = `${fmt(speedFromMps(c.referenceSpeedMps, ctx.speedUnit), 3)} ${su}`;
    const series: PlotSeries[] = [
      {
        label: 'design axial drag, N',
        stroke: DESIGN_COLOUR,
        width: 2.4,
        spanGaps: true,
        noPoints: true,
        values: dragD,
      },
      {
        label: 'baseline axial drag, N',
        stroke: BASELINE_COLOUR,
        width: 1.6,
        dash: [6, 4],
        spanGaps: true,
        noPoints: true,
        values: dragB,
      },
      {
        label: 'time at this yaw, % per deg',
        stroke: DENSITY_COLOUR,
        width: 1.6,
        scale: 'y2',
        spanGaps: true,
        noPoints: true,
        values: density,
      },
    ];
    this.plots.roadYaw.render({
      title: `Yaw at the wheel (density of riding time) over the axial drag vs yaw at ${v}`,
      xLabel: `|Yaw| at the hub, deg — drag at ${v} (airspeed = ground speed), ρ ${fixed(c.rhoKgPerM3, 3)} kg/m³`,
      xLabelShort: `|Yaw|, deg — drag at ${v}`,
      yLabel: 'Axial drag, N',
      y2Label: 'Riding time, % per deg',
      xs,
      series,
      markerX: d.yaw_p90_deg,
    });
  }

  private renderSteering(d: RideDocument): void {
    const s = d.steering;
    this.steeringFigure.hidden = s === null;
    if (s === null) {
      this.handlingText.textContent = '';
      return;
    }
    const limit = this.yawLimit(d);
    const rows = s.curve.filter((r) => r.yaw_deg <= limit);
    const marks = [...s.design.sign_changes_deg, ...s.design.jumps_deg].filter((x) => x <= limit);
    this.plots.roadSteering.render({
      title: 'Steering moment vs yaw (front wheel)',
      xLabel: `Yaw, deg — at ${fmt(s.airspeed_mps ?? Number.NaN, 3)} m/s; dotted: the design's sign changes and jumps`,
      xLabelShort: 'Yaw, deg',
      yLabel: 'Steering moment, N m',
      xs: rows.map((r) => r.yaw_deg),
      series: [
        {
          label: 'design',
          stroke: DESIGN_COLOUR,
          width: 2.4,
          noPoints: true,
          values: rows.map((r) => r.design_Nm),
        },
        {
          label: 'baseline',
          stroke: BASELINE_COLOUR,
          width: 1.6,
          dash: [6, 4],
          noPoints: true,
          values: rows.map((r) => r.baseline_Nm),
        },
      ],
      markersX: { xs: marks, colour: '#b3261e' },
    });
    const list = (xs: number[]) => (xs.length > 0 ? `${xs.map((x) => fixed(x, 1)).join(', ')}°` : 'none');
    const slope = (x: number | null) => (x === null ? '—' : `${fixed(x * 1000, 2)} N mm per degree`);
    this.handlingText.textContent =
      `Slope at small yaw: design ${slope(s.design.slope_Nm_per_deg)}, baseline ${slope(s.baseline.slope_Nm_per_deg)}. ` +
      `Sign changes: design ${list(s.design.sign_changes_deg)}, baseline ${list(s.baseline.sign_changes_deg)}. ` +
      `Jumps: design ${list(s.design.jumps_deg)}, baseline ${list(s.baseline.jumps_deg)}. ` +
      `Trail ${fixed((d.trail_m.design ?? Number.NaN) * 1000, 1)} mm (from the head angle, fork offset and wheel radius).`;
  }

  private renderSegments(d: RideDocument): void {
    const segs = d.segments;
    this.segmentFigure.hidden = !segs;
    this.segmentsBlock.hidden = !segs;
    if (!segs) return;
    const diff = (p: { design: number | null; baseline: number | null }) =>
      p.design === null || p.baseline === null ? null : p.design - p.baseline;
    this.plots.roadSegments.render({
      title: 'Per segment: design − baseline',
      xLabel: 'Segment (in the order ridden); power at the constant speed, time at the constant power',
      xLabelShort: 'Segment',
      yLabel: 'Power, W',
      y2Label: 'Time, s',
      xTickStep: 1,
      xs: segs.map((s) => s.index + 1),
      series: [
        {
          label: 'power − baseline, W',
          stroke: DESIGN_COLOUR,
          width: 2,
          values: segs.map((s) => diff(s.power_W)),
        },
        {
          label: 'time − baseline, s',
          stroke: DENSITY_COLOUR,
          width: 2,
          dash: [6, 4],
          scale: 'y2',
          values: segs.map((s) => diff(s.time_s)),
        },
      ],
    });
    const u = this.speedUnit();
    const su = speedUnitText(u);
    const rows: Cell[][] = segs.map((s) => [
      s.index + 1,
      s.length_m / 1000,
      s.heading_deg,
      s.gradient * 100,
      s.wind_from_relative_deg,
      s.mean_abs_yaw_deg,
      s.axial_N.design,
      s.axial_N.baseline,
      diff(s.power_W),
      diff(s.time_s),
      s.speed_mps.design === null ? null : speedFromMps(s.speed_mps.design, u),
    ]);
    this.segments.setData(
      [
        { header: 'Segment', decimals: 0 },
        { header: 'Length, km', decimals: 3 },
        { header: 'Heading, deg', decimals: 0 },
        { header: 'Gradient, %', decimals: 2 },
        { header: 'Wind from (relative), deg', decimals: 0 },
        { header: 'Mean |yaw|, deg', decimals: 2 },
        { header: 'Design axial drag, N', decimals: 3 },
        { header: 'Baseline axial drag, N', decimals: 3 },
        { header: 'Power − baseline, W', decimals: 2 },
        { header: 'Time − baseline, s', decimals: 2 },
        { header: `Design speed, ${su}`, decimals: 2 },
      ],
      rows,
    );
  }

  private renderBreakdown(d: RideDocument): void {
    const terms: Array<[keyof PowerBreakdown, string]> = [
      ['rider_aero_W', 'Rider and bike drag'],
      ['wheel_axial_W', 'This wheel’s axial drag'],
      ['wheel_rotation_W', 'This wheel’s rotation'],
      ['rolling_W', 'Rolling resistance'],
      ['bearing_W', 'Wheel bearings'],
      ['gravity_W', 'Climbing'],
      ['net_W', 'Net at the wheels'],
      ['pedal_W', 'At the pedals'],
    ];
    const b = d.power_breakdown_W;
    this.breakdown.setCaption(
      `Power at ${fixed(speedFromMps(d.constant_speed_mps ?? Number.NaN, this.speedUnit()), 1)} ${speedUnitText(this.speedUnit())}, by term (mean over the ride)`,
    );
    this.breakdown.setData(
      [
        { header: 'Term' },
        { header: 'Design, W', decimals: 2 },
        { header: 'Baseline, W', decimals: 2 },
        { header: 'Difference, W', decimals: 2 },
      ],
      terms.map(([k, label]) => {
        const x = b.design[k];
        const y = b.baseline[k];
        return [label, x, y, x === null || y === null ? null : x - y];
      }),
    );
  }
}

function finite(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

/** Seconds as h:mm:ss. */
function clock(s: number | null): string {
  if (s === null || !Number.isFinite(s)) return '—';
  const t = Math.round(s);
  const h = Math.floor(t / 3600);
  const m = Math.floor((t % 3600) / 60);
  const sec = t % 60;
  return `${h}:${String(m).padStart(2, '0')}:${String(sec).padStart(2, '0')}`;
}
