/** The road panel's elements: the form (fields and course editor), the cautions, cards, plots and tables. */
import { RIDE_CAUTIONS } from '../../compute/ride/index';
import { DataTable } from '../dataTable';
import { button, el, plotFigure } from '../dom';
import { addPlotExports } from '../export/addPlotExports';
import { exportableTable } from '../export/exportableTable';
import { LinePlot } from '../linePlot';
import { RIDE_FIELD_GROUPS } from './rideFieldGroups';
import type { Field, FieldView } from './roadField';
import { WEATHER_FIELD_GROUPS } from './weatherFieldGroup';

/** Every field of the road form, in the form's order. */
export const ROAD_FIELD_GROUPS = [...RIDE_FIELD_GROUPS, ...WEATHER_FIELD_GROUPS];

export type RoadPlotName = 'roadYaw' | 'roadSteering' | 'roadSegments';

/** What the panel's controls ask for (the panel's own methods). */
export interface RoadPanelActions {
  pin(): void;
  saveRide(): void;
  addSegment(): void;
  /** A course cell changed. */
  courseChanged(): void;
  /** Any other input of the form changed. */
  formChanged(): void;
}

export interface RoadPanelDom {
  formErrors: HTMLElement;
  courseBody: HTMLTableSectionElement;
  courseBlock: HTMLElement;
  courseError: HTMLElement;
  statusEl: HTMLElement;
  contextEl: HTMLElement;
  pinButton: HTMLButtonElement;
  cards: HTMLElement;
  flagsEl: HTMLElement;
  notesEl: HTMLElement;
  handlingText: HTMLElement;
  plots: Record<RoadPlotName, LinePlot>;
  segmentFigure: HTMLElement;
  steeringFigure: HTMLElement;
  breakdown: DataTable;
  segments: DataTable;
  segmentsBlock: HTMLElement;
  results: HTMLElement;
  fields: FieldView[];
}

/** Build the panel into `host` (emptied first) and return its elements. */
export function buildRoadPanelDom(host: HTMLElement, actions: RoadPanelActions): RoadPanelDom {
  host.replaceChildren();
  const fields: FieldView[] = [];
  host.dataset.state = 'idle';
  const heading = el('h2', { text: 'On the road: this design against a baseline' });
  const contextEl = el('p', { className: 'small road-context' });
  const pinButton = button('Pin the current design as baseline', () => actions.pin(), {
    id: 'road-pin',
  });
  const save = button('Save ride file', () => actions.saveRide(), {
    id: 'road-save',
    title: 'These inputs as a ride file: coversweep ride ride.json computes the same figures',
  });
  const form = el('form', { className: 'road-form', attrs: { id: 'road-form', novalidate: '' } });
  form.addEventListener('submit', (e) => e.preventDefault());
  const formErrors = el('div', { className: 'field-error form-errors', attrs: { 'aria-live': 'polite' } });
  form.append(formErrors);
  for (const group of ROAD_FIELD_GROUPS) {
    const fs = el('fieldset', {}, [el('legend', { text: group.title })]);
    for (const field of group.fields) fs.append(buildField(field, fields));
    form.append(fs);
  }
  // The course editor.
  const courseBody = document.createElement('tbody');
  const courseError = el('div', { className: 'field-error', attrs: { 'aria-live': 'polite' } });
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
    courseBody,
  ]);
  const courseBlock = el('fieldset', { className: 'course' }, [
    el('legend', { text: 'Course' }),
    el('div', { className: 'table-scroll course-scroll' }, [courseTable]),
    button('Add a segment', () => actions.addSegment()),
    courseError,
  ]);
  form.append(courseBlock);
  form.addEventListener('change', (event) => {
    const target = event.target as HTMLElement;
    if (target.closest('.course-table')) actions.courseChanged();
    else actions.formChanged();
  });

  const statusEl = el('p', { className: 'road-status', attrs: { role: 'status', 'aria-live': 'polite' } });
  const cautions = el('div', { className: 'caution small', attrs: { id: 'road-cautions' } }, [
    el('strong', { text: 'Cautions: ' }),
    el(
      'ul',
      {},
      RIDE_CAUTIONS.map((c) => el('li', { text: c })),
    ),
  ]);
  const cards = el('div', { className: 'headline road-cards', attrs: { id: 'road-cards' } });
  const yaw = plotFigure('fig-road-yaw', 'Yaw at the wheel over the yaw curves');
  const steer = plotFigure('fig-road-steering', 'Steering moment vs yaw');
  const seg = plotFigure('fig-road-segments', 'Per segment: design − baseline');
  const steeringFigure = steer.figure;
  const segmentFigure = seg.figure;
  const handlingText = el('p', { className: 'small', attrs: { id: 'road-handling' } });
  steer.figure.append(
    handlingText,
    el('p', {
      className: 'caution small',
      text: 'Handling caution: a gust can turn and lean a covered or deep front wheel hard. These are model estimates; allow margin for stronger gusts and lighter riders, follow your competition’s rules and rely on qualified testing before anyone rides a design.',
    }),
  );
  const plots = {
    roadYaw: new LinePlot(yaw.plot, 240),
    roadSteering: new LinePlot(steer.plot, 220),
    roadSegments: new LinePlot(seg.plot, 220),
  };
  // Exports carry the design-against-baseline line and the ride's inputs in their captions.
  const rideLines = (meta: { ride: string }) => [contextEl.textContent ?? '', meta.ride];
  addPlotExports(yaw.figure, plots.roadYaw, 'road-yaw', rideLines);
  addPlotExports(steer.figure, plots.roadSteering, 'road-steering', rideLines);
  addPlotExports(seg.figure, plots.roadSegments, 'road-segments', rideLines);
  const breakdownScroll = el('div', { className: 'table-scroll' });
  const breakdown = new DataTable(
    breakdownScroll,
    'table-road-power',
    'Power at the constant speed, by term (W)',
  );
  const segScroll = el('div', { className: 'table-scroll' });
  const segments = new DataTable(segScroll, 'table-road-segments', 'Course segments');
  const segmentsBlock = exportableTable(segScroll, segments, 'road-segments', rideLines);
  const flagsEl = el('ul', { className: 'road-flags', attrs: { id: 'road-flags' } });
  const notesEl = el('ul', { className: 'small' });
  const results = el('div', { className: 'road-results' }, [
    statusEl,
    cards,
    cautions,
    el('div', { className: 'plot-grid road-plots' }, [yaw.figure, steer.figure, seg.figure]),
    el('h3', { text: 'Flags' }),
    flagsEl,
    exportableTable(breakdownScroll, breakdown, 'road-power', rideLines),
    segmentsBlock,
    el('details', {}, [el('summary', { text: 'How these figures are computed' }), notesEl]),
  ]);
  host.append(
    heading,
    el('div', { className: 'road-context-row' }, [contextEl, pinButton, save]),
    el('div', { className: 'road-layout' }, [form, results]),
  );
  return {
    formErrors,
    courseBody,
    courseBlock,
    courseError,
    statusEl,
    contextEl,
    pinButton,
    cards,
    flagsEl,
    notesEl,
    handlingText,
    plots,
    segmentFigure,
    steeringFigure,
    breakdown,
    segments,
    segmentsBlock,
    results,
    fields,
  };
}

function buildField(field: Field, fields: FieldView[]): HTMLElement {
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
  const note =
    field.kind === 'number' && field.note
      ? el('div', { className: 'field-note small', attrs: { id: `${id}-note` } })
      : null;
  input.setAttribute('aria-describedby', note ? `${error.id} ${note.id}` : error.id);
  input.dataset.road = field.key;
  const row = el('div', { className: 'field' }, [
    label,
    el('div', { className: 'input' }, [input, unit]),
    note,
    error,
  ]);
  fields.push({ field, row, input, unit, error, note });
  return row;
}
