/**
 * The design variables a study may free: each reads and writes one key of the wheel. Continuous
 * variables are searched by the optimiser between bounds; discrete ones are enumerated.
 */
import type { DesignWheel } from './types';

export interface ContinuousVariable {
  id: string;
  kind: 'continuous';
  label: string;
  unit: string;
  /** Bounds every wheel allows (the case file's rules); a study's bounds lie within them. */
  limits(wheel: DesignWheel): { min: number; max: number };
  /** Why the upper bound is what it is, for messages (absent: the case file's range). */
  limitsRule?: string;
  get(wheel: DesignWheel): number;
  set(wheel: DesignWheel, value: number): DesignWheel;
}

export interface DiscreteVariable {
  id: string;
  kind: 'discrete';
  label: string;
  unit: string;
  /** The choices every wheel allows (null: any integer in [min, max]). */
  choices: readonly (number | string)[] | null;
  integerRange?: { min: number; max: number };
  get(wheel: DesignWheel): number | string;
  set(wheel: DesignWheel, value: number | string): DesignWheel;
}

export type DesignVariable = ContinuousVariable | DiscreteVariable;

/** Smallest radial clearance kept between the rim's inner edge and the hub flange (m). */
const HUB_CLEARANCE_M = 0.001;

export const DESIGN_VARIABLES: readonly DesignVariable[] = [
  {
    id: 'cover_fraction',
    kind: 'continuous',
    label: 'Cover fraction',
    unit: '1',
    limits: () => ({ min: 0, max: 1 }),
    get: (w) => w.cover.fraction,
    set: (w, v) => ({ ...w, cover: { ...w.cover, fraction: v } }),
  },
  {
    id: 'rim_depth_m',
    kind: 'continuous',
    label: 'Rim depth',
    unit: 'm',
    limitsRule:
      'outer radius - tyre width - hub flange radius - 1 mm, the tyre at its widest: the rim must clear the hub flange',
    limits: (w) => ({
      min: 0,
      max: w.outer_radius_m - w.tyre_width_m - w.hub_flange_radius_m - HUB_CLEARANCE_M,
    }),
    get: (w) => w.rim_depth_m,
    set: (w, v) => ({ ...w, rim_depth_m: v }),
  },
  {
    id: 'tyre_width_m',
    kind: 'continuous',
    label: 'Tyre width',
    unit: 'm',
    limitsRule: 'outer radius - rim depth - hub flange radius - 1 mm, the rim at its deepest, and 0.15 m',
    limits: (w) => ({
      min: 0.005,
      max: Math.min(0.15, w.outer_radius_m - w.rim_depth_m - w.hub_flange_radius_m - HUB_CLEARANCE_M),
    }),
    get: (w) => w.tyre_width_m,
    set: (w, v) => ({ ...w, tyre_width_m: v }),
  },
  {
    id: 'cover_sides',
    kind: 'discrete',
    label: 'Covered sides',
    unit: '1',
    choices: [1, 2],
    get: (w) => w.cover.sides,
    set: (w, v) => ({ ...w, cover: { ...w.cover, sides: v === 1 ? 1 : 2 } }),
  },
  {
    id: 'cover_placement',
    kind: 'discrete',
    label: 'Cover placement',
    unit: '',
    choices: ['rim', 'hub', 'centre'],
    get: (w) => w.cover.placement,
    set: (w, v) => ({ ...w, cover: { ...w.cover, placement: v as 'rim' | 'hub' | 'centre' } }),
  },
  {
    id: 'spoke_count',
    kind: 'discrete',
    label: 'Spoke count',
    unit: '1',
    choices: null,
    integerRange: { min: 0, max: 200 },
    get: (w) => w.spokes.count,
    set: (w, v) => ({ ...w, spokes: { ...w.spokes, count: Number(v) } }),
  },
  {
    id: 'spoke_section',
    kind: 'discrete',
    label: 'Spoke section',
    unit: '',
    choices: ['round', 'bladed'],
    get: (w) => w.spokes.section,
    set: (w, v) => ({ ...w, spokes: { ...w.spokes, section: v as 'round' | 'bladed' } }),
  },
];

/** The variable of an id, or undefined. */
export function designVariable(id: string): DesignVariable | undefined {
  return DESIGN_VARIABLES.find((v) => v.id === id);
}

/** The wheel with the given variables' values set (in the registry's order). */
export function applyDesign(wheel: DesignWheel, values: Record<string, number | string>): DesignWheel {
  let w = wheel;
  for (const v of DESIGN_VARIABLES) {
    const value = values[v.id];
    if (value === undefined) continue;
    w = v.kind === 'continuous' ? v.set(w, Number(value)) : v.set(w, value);
  }
  return w;
}
