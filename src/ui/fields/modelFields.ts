/** The steering axis and the model's options. */
import { clean, m, mm, num } from './fieldHelpers';
import type { Field } from './fieldTypes';

export const MODEL_FIELDS: readonly Field[] = [
  // Steering
  {
    key: 'headAngleDeg',
    group: 'steering',
    label: () => 'Head angle, deg',
    target: 'case',
    control: 'number',
    min: 60,
    max: 80,
    step: 0.25,
    get: (c) => c.case.steering.head_angle_deg,
    set: (raw, v) => {
      raw.steering.head_angle_deg = clean(num(v));
    },
  },
  {
    key: 'forkOffsetMm',
    group: 'steering',
    label: () => 'Fork offset (rake), mm',
    target: 'case',
    control: 'number',
    min: 0,
    max: 80,
    step: 0.5,
    get: (c) => mm(c.case.steering.fork_offset_m),
    set: (raw, v) => {
      raw.steering.fork_offset_m = m(num(v));
    },
  },
  // Model options
  {
    key: 'ground',
    group: 'model',
    label: () => 'Ground plane (mirror image)',
    target: 'case',
    control: 'bool',
    get: (c) => c.case.model.ground,
    set: (raw, v) => {
      raw.model.ground = Boolean(v);
    },
  },
  {
    key: 'latticeSpan',
    group: 'model',
    label: () => 'Lattice strips (fineness)',
    target: 'case',
    control: 'number',
    min: 4,
    max: 60,
    step: 1,
    get: (c) => c.case.model.lattice_span,
    set: (raw, v) => {
      raw.model.lattice_span = Math.round(num(v));
    },
  },
  {
    key: 'latticeChord',
    group: 'model',
    label: () => 'Lattice panels per strip',
    target: 'case',
    control: 'number',
    min: 2,
    max: 40,
    step: 1,
    get: (c) => c.case.model.lattice_chord,
    set: (raw, v) => {
      raw.model.lattice_chord = Math.round(num(v));
    },
  },
  {
    key: 'gridConvergence',
    group: 'model',
    label: () => 'Lattice uncertainty (GCI)',
    target: 'case',
    control: 'bool',
    get: (c) => c.case.model.grid_convergence,
    set: (raw, v) => {
      raw.model.grid_convergence = Boolean(v);
    },
  },
  {
    key: 'suctionRecovered',
    group: 'model',
    label: () => 'Tyre edge thrust, share of attainable',
    target: 'case',
    control: 'number',
    min: 0,
    max: 1,
    step: 0.05,
    get: (c) => c.case.model.suction_recovered,
    set: (raw, v) => {
      raw.model.suction_recovered = clean(num(v));
    },
  },
  {
    key: 'porosityScale',
    group: 'model',
    label: () => 'Spoke screen resistance ×',
    target: 'case',
    control: 'number',
    min: 0.1,
    max: 10,
    step: 0.05,
    get: (c) => c.case.model.porosity_scale,
    set: (raw, v) => {
      raw.model.porosity_scale = clean(num(v));
    },
  },
  {
    key: 'profileDragFactor',
    group: 'model',
    label: () => 'Section profile drag ×',
    target: 'case',
    control: 'number',
    min: 0.1,
    max: 5,
    step: 0.05,
    get: (c) => c.case.model.profile_drag_factor,
    set: (raw, v) => {
      raw.model.profile_drag_factor = clean(num(v));
    },
  },
  {
    key: 'oneSidedShare',
    group: 'model',
    label: () => 'Spoke drag kept behind 1-sided cover',
    target: 'case',
    control: 'number',
    min: 0,
    max: 1,
    step: 0.05,
    get: (c) => c.case.model.one_sided_cover_spoke_share,
    set: (raw, v) => {
      raw.model.one_sided_cover_spoke_share = clean(num(v));
    },
  },
];
