/** The wheel's controls: geometry, spokes and covering. */
import { clean, m, mm, num } from './fieldHelpers';
import type { Field } from './fieldTypes';

export const WHEEL_FIELDS: readonly Field[] = [
  // Wheel geometry
  {
    key: 'name',
    path: 'name',
    group: 'wheel',
    label: () => 'Design name',
    target: 'case',
    control: 'text',
    get: (c) => c.case.name ?? '',
    set: (raw, v) => {
      const s = String(v).trim();
      if (s === '') delete raw.name;
      else raw.name = s.slice(0, 120);
    },
  },
  {
    key: 'outerRadiusMm',
    path: 'wheel.outer_radius_m',
    group: 'wheel',
    label: () => 'Outer radius (tyre), mm',
    help: 'Radius to the outside of the tyre, from the hub centre.',
    target: 'case',
    control: 'number',
    min: 150,
    max: 400,
    step: 1,
    get: (c) => mm(c.case.wheel.outer_radius_m),
    set: (raw, v) => {
      raw.wheel.outer_radius_m = m(num(v));
    },
  },
  {
    key: 'tyreWidthMm',
    path: 'wheel.tyre_width_m',
    group: 'wheel',
    label: () => 'Tyre width, mm',
    target: 'case',
    control: 'number',
    min: 15,
    max: 80,
    step: 0.5,
    get: (c) => mm(c.case.wheel.tyre_width_m),
    set: (raw, v) => {
      raw.wheel.tyre_width_m = m(num(v));
    },
  },
  {
    key: 'rimDepthMm',
    path: 'wheel.rim_depth_m',
    group: 'wheel',
    label: () => 'Rim depth, mm',
    help: 'Radial depth of the rim section, from the tyre bead to the spoke bed. Rim depth + tyre width must stay below outer radius - hub flange radius.',
    target: 'case',
    control: 'number',
    min: 0,
    max: 200,
    step: 1,
    get: (c) => mm(c.case.wheel.rim_depth_m),
    set: (raw, v) => {
      raw.wheel.rim_depth_m = m(num(v));
    },
  },
  {
    key: 'rimWidthMm',
    path: 'wheel.rim_width_m',
    group: 'wheel',
    label: () => 'Rim width, mm',
    target: 'case',
    control: 'number',
    min: 15,
    max: 60,
    step: 0.5,
    get: (c) => mm(c.case.wheel.rim_width_m),
    set: (raw, v) => {
      raw.wheel.rim_width_m = m(num(v));
    },
  },
  {
    key: 'hubFlangeRadiusMm',
    path: 'wheel.hub_flange_radius_m',
    group: 'wheel',
    label: () => 'Hub flange radius, mm',
    help: 'Radius at which the spokes leave the hub: the inner edge of the spoked annulus.',
    target: 'case',
    control: 'number',
    min: 10,
    max: 80,
    step: 0.5,
    get: (c) => mm(c.case.wheel.hub_flange_radius_m),
    set: (raw, v) => {
      raw.wheel.hub_flange_radius_m = m(num(v));
    },
  },
  {
    key: 'hubShellDiameterMm',
    path: 'wheel.hub_shell_diameter_m',
    group: 'wheel',
    label: () => 'Hub shell diameter, mm',
    target: 'case',
    control: 'number',
    min: 10,
    max: 160,
    step: 0.5,
    get: (c) => mm(c.case.wheel.hub_shell_diameter_m),
    set: (raw, v) => {
      raw.wheel.hub_shell_diameter_m = m(num(v));
    },
  },
  {
    key: 'hubShellWidthMm',
    path: 'wheel.hub_shell_width_m',
    group: 'wheel',
    label: () => 'Hub shell width (exposed), mm',
    target: 'case',
    control: 'number',
    min: 10,
    max: 200,
    step: 1,
    get: (c) => mm(c.case.wheel.hub_shell_width_m),
    set: (raw, v) => {
      raw.wheel.hub_shell_width_m = m(num(v));
    },
  },
  // Spokes
  {
    key: 'spokeCount',
    path: 'wheel.spokes.count',
    integer: true,
    group: 'spokes',
    label: () => 'Spoke count, spokes',
    target: 'case',
    control: 'number',
    min: 0,
    max: 48,
    step: 1,
    get: (c) => c.case.wheel.spokes.count,
    set: (raw, v) => {
      raw.wheel.spokes.count = Math.round(num(v));
    },
  },
  {
    key: 'spokeSection',
    path: 'wheel.spokes.section',
    group: 'spokes',
    label: () => 'Section',
    target: 'case',
    control: 'select',
    options: { round: 'round', 'bladed (flat)': 'bladed' },
    get: (c) => c.case.wheel.spokes.section,
    set: (raw, v) => {
      raw.wheel.spokes.section = v;
    },
  },
  {
    key: 'spokeDiameterMm',
    path: 'wheel.spokes.diameter_m',
    group: 'spokes',
    label: () => 'Round spoke diameter, mm',
    target: 'case',
    control: 'number',
    min: 1,
    max: 5,
    step: 0.05,
    get: (c) => mm(c.case.wheel.spokes.diameter_m),
    set: (raw, v) => {
      raw.wheel.spokes.diameter_m = m(num(v));
    },
    visible: (c) => c.case.wheel.spokes.section === 'round',
  },
  {
    key: 'spokeWidthMm',
    path: 'wheel.spokes.width_m',
    group: 'spokes',
    label: () => 'Blade width (chord), mm',
    target: 'case',
    control: 'number',
    min: 1,
    max: 10,
    step: 0.05,
    get: (c) => mm(c.case.wheel.spokes.width_m),
    set: (raw, v) => {
      raw.wheel.spokes.width_m = m(num(v));
    },
    visible: (c) => c.case.wheel.spokes.section === 'bladed',
  },
  {
    key: 'spokeThicknessMm',
    path: 'wheel.spokes.thickness_m',
    group: 'spokes',
    label: () => 'Blade thickness, mm',
    target: 'case',
    control: 'number',
    min: 0.5,
    max: 5,
    step: 0.05,
    get: (c) => mm(c.case.wheel.spokes.thickness_m),
    set: (raw, v) => {
      raw.wheel.spokes.thickness_m = m(num(v));
    },
    visible: (c) => c.case.wheel.spokes.section === 'bladed',
  },
  // Covering
  {
    key: 'coverFraction',
    path: 'wheel.cover.fraction',
    group: 'cover',
    label: () => 'Covered fraction of spoked area, 0–1',
    help: 'Share of the spoked annulus (hub flange to rim bed) closed by a cover, placed as chosen below. 0 is an open spoked wheel, 1 a full disc.',
    target: 'case',
    control: 'number',
    min: 0,
    max: 1,
    step: 0.01,
    get: (c) => c.case.wheel.cover.fraction,
    set: (raw, v) => {
      raw.wheel.cover.fraction = clean(num(v));
    },
    visible: (c) => c.case.wheel.cover.placement !== 'explicit',
  },
  {
    key: 'coverPlacement',
    path: 'wheel.cover.placement',
    group: 'cover',
    label: () => 'Placement',
    target: 'case',
    control: 'select',
    options: {
      'next to the rim': 'rim',
      'next to the hub': 'hub',
      'centred in the spokes': 'centre',
      'explicit radii': 'explicit',
    },
    get: (c) => c.case.wheel.cover.placement,
    set: (raw, v, ctx) => {
      const cover = raw.wheel.cover;
      cover.placement = v;
      if (v === 'explicit') {
        // An explicit cover is set by its radii; the case file refuses a fraction beside them.
        delete (cover as { fraction?: number }).fraction;
        const w = ctx.case.wheel;
        const rimInner = w.outer_radius_m - w.tyre_width_m - w.rim_depth_m;
        cover.inner_radius_m = cover.inner_radius_m ?? clean(w.hub_flange_radius_m);
        cover.outer_radius_m = cover.outer_radius_m ?? clean(rimInner);
      } else {
        delete cover.inner_radius_m;
        delete cover.outer_radius_m;
      }
    },
  },
  {
    key: 'coverInnerMm',
    path: 'wheel.cover.inner_radius_m',
    group: 'cover',
    label: () => 'Cover inner radius, mm',
    target: 'case',
    control: 'number',
    min: 0,
    max: 400,
    step: 1,
    get: (c) => mm(c.case.wheel.cover.inner_radius_m ?? c.case.wheel.hub_flange_radius_m),
    set: (raw, v) => {
      raw.wheel.cover.inner_radius_m = m(num(v));
    },
    visible: (c) => c.case.wheel.cover.placement === 'explicit',
  },
  {
    key: 'coverOuterMm',
    path: 'wheel.cover.outer_radius_m',
    group: 'cover',
    label: () => 'Cover outer radius, mm',
    target: 'case',
    control: 'number',
    min: 0,
    max: 400,
    step: 1,
    get: (c) => mm(c.case.wheel.cover.outer_radius_m ?? c.case.wheel.outer_radius_m / 2),
    set: (raw, v) => {
      raw.wheel.cover.outer_radius_m = m(num(v));
    },
    visible: (c) => c.case.wheel.cover.placement === 'explicit',
  },
  {
    key: 'coverSides',
    path: 'wheel.cover.sides',
    group: 'cover',
    label: () => 'Covered sides',
    target: 'case',
    control: 'select',
    options: { 'both sides': 2, 'one side': 1 },
    get: (c) => c.case.wheel.cover.sides,
    set: (raw, v) => {
      raw.wheel.cover.sides = Number(v);
    },
  },
];
