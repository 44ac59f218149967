/** The wheel's controls: geometry, spokes and covering. */
import { clean, m, mm, num } from './fieldHelpers';
import type { Field } from './fieldTypes';

export const WHEEL_FIELDS: readonly Field[] = [
  // Wheel geometry
  {
    key: 'name',
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
    group: 'wheel',
    label: () => 'Outer radius (tyre), mm',
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
    group: 'wheel',
    label: () => 'Rim depth, mm',
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
    group: 'wheel',
    label: () => 'Hub flange radius, mm',
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
    group: 'spokes',
    label: () => 'Spoke count',
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
    group: 'cover',
    label: () => 'Covered fraction of spoked area',
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
