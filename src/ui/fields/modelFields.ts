/** The steering axis and the model's options. */
import { clean, m, mm, num } from './fieldHelpers';
import type { Field } from './fieldTypes';

export const MODEL_FIELDS: readonly Field[] = [
  // Steering
  {
    key: 'headAngleDeg',
    path: 'steering.head_angle_deg',
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
    path: 'steering.fork_offset_m',
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
    path: 'model.ground',
    group: 'model',
    label: () => 'Ground plane (mirror image)',
    help: "Adds the mirror image of the wheel under the road, where the tyre touches it, so the road's effect on the flow is included.",
    target: 'case',
    control: 'bool',
    get: (c) => c.case.model.ground,
    set: (raw, v) => {
      raw.model.ground = Boolean(v);
    },
  },
  {
    key: 'latticeSpan',
    path: 'model.lattice_span',
    integer: true,
    group: 'model',
    label: () => 'Lattice fineness, strips',
    help: "The wheel's surface is solved as a vortex lattice: strips across the wheel times panels along each strip. More strips: a finer, slower solve with a smaller discretisation error.",
    hint: 'more strips: finer and slower',
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
    path: 'model.lattice_chord',
    integer: true,
    group: 'model',
    label: () => 'Lattice panels per strip, panels',
    help: 'Panels along each lattice strip (in the direction of travel). More panels: finer and slower.',
    hint: 'more panels: finer and slower',
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
    path: 'model.grid_convergence',
    group: 'model',
    label: () => 'Lattice uncertainty (GCI)',
    help: 'Also solves on coarser lattices and reports the grid-convergence index (Roache 1994), an error band from the lattice fineness. Costs the extra solves.',
    target: 'case',
    control: 'bool',
    get: (c) => c.case.model.grid_convergence,
    set: (raw, v) => {
      raw.model.grid_convergence = Boolean(v);
    },
  },
  {
    key: 'suctionRecovered',
    path: 'model.suction_recovered',
    group: 'model',
    label: () => 'Suction recovered at tyre edge, 0–1',
    help: 'Leading-edge suction is the forward pull of flow turning round a rounded edge. Only the tyre leading the wheel can turn it into thrust, up to an attainable limit set by its edge radius and Reynolds number. 1 keeps that whole limit, 0 none. Porous or sharp edges never get any.',
    hint: 'share of the attainable tyre-edge thrust kept',
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
    path: 'model.porosity_scale',
    group: 'model',
    label: () => 'Spoke screen resistance, × rule',
    help: "The open spoked annulus acts as a porous screen: the pressure jump across it per unit through-flow follows from spoke solidity by the model's rule. This multiplies that resistance: above 1 the spokes act more like a solid disc, below 1 more open. Fit it to data in the data panel.",
    hint: '× the solidity rule; above 1 acts more solid',
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
    path: 'model.profile_drag_factor',
    group: 'model',
    label: () => 'Section profile drag, × data',
    help: 'Multiplies the rim and tyre section drag taken from handbook section data.',
    hint: '× handbook section drag of rim and tyre',
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
    path: 'model.one_sided_cover_spoke_share',
    group: 'model',
    label: () => 'Spoke drag behind a 1-sided cover, 0–1',
    help: "With a cover on one side only, the open side's spokes still meet the air: the share of their drag kept.",
    hint: 'share of the spoke drag kept',
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
