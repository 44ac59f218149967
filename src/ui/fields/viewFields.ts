/** The view's controls: units, plots and the design map. */

import { speedFromMps, speedToMps } from '../displayUnits';
import { MAP_OUTPUT_KEYS, OUTPUTS } from '../outputs';
import { clean, listText, m, mm, num, parseNumberList, sp } from './fieldHelpers';
import type { Field, FieldValue } from './fieldTypes';

const mapOptions: Record<string, FieldValue> = Object.fromEntries(
  MAP_OUTPUT_KEYS.map((k) => [OUTPUTS[k].label, k]),
);

export const VIEW_FIELDS: readonly Field[] = [
  // Units (view)
  {
    key: 'speedUnit',
    group: 'units',
    label: () => 'Speeds in',
    target: 'view',
    control: 'select',
    options: { 'km/h': 'kmh', mph: 'mph' },
    get: (c) => c.view.speedUnit,
    set: (raw, v) => {
      raw.speedUnit = v;
    },
  },
  {
    key: 'forceUnit',
    group: 'units',
    label: () => 'Forces in',
    target: 'view',
    control: 'select',
    options: { 'newtons (at the airspeed)': 'N', 'grams-force at the reference speed': 'gf' },
    get: (c) => c.view.forceUnit,
    set: (raw, v) => {
      raw.forceUnit = v;
    },
  },
  {
    key: 'areaUnit',
    group: 'units',
    label: () => 'Drag area in',
    target: 'view',
    control: 'select',
    options: { 'cm²': 'cm2', 'm²': 'm2' },
    get: (c) => c.view.areaUnit,
    set: (raw, v) => {
      raw.areaUnit = v;
    },
  },
  // Plots (view)
  {
    key: 'familyFractions',
    path: 'familyFractions',
    group: 'plots',
    label: () => 'Cover fractions on yaw plots, 0–1',
    help: 'Covering fractions drawn as a family of thin lines on the yaw plots, e.g. 0, 0.5, 1.',
    target: 'view',
    control: 'text',
    get: (c) => listText(c.view.familyFractions),
    set: (raw, v) => {
      raw.familyFractions = parseNumberList(String(v), 'cover fractions');
    },
  },
  {
    key: 'coverPlotYaws',
    path: 'coverPlotYawsDeg',
    group: 'plots',
    label: () => 'Yaws for drag vs cover, deg',
    target: 'view',
    control: 'text',
    get: (c) => listText(c.view.coverPlotYawsDeg),
    set: (raw, v) => {
      raw.coverPlotYawsDeg = parseNumberList(String(v), 'yaw angles');
    },
  },
  {
    key: 'coverPlotSpeeds',
    path: 'coverPlotSpeedsMps',
    group: 'plots',
    label: (c) => `Extra speeds for drag vs cover, ${sp(c)}`,
    target: 'view',
    control: 'text',
    get: (c) =>
      listText(c.view.coverPlotSpeedsMps.map((s) => Number(speedFromMps(s, c.view.speedUnit).toFixed(3)))),
    set: (raw, v, c) => {
      raw.coverPlotSpeedsMps = parseNumberList(String(v), 'speeds').map((s) =>
        clean(speedToMps(s, c.view.speedUnit)),
      );
    },
  },
  {
    key: 'mapYawDeg',
    path: 'mapYawDeg',
    group: 'plots',
    label: () => 'Design map yaw, deg',
    target: 'view',
    control: 'number',
    min: 0,
    max: 30,
    step: 0.5,
    get: (c) => c.view.mapYawDeg,
    set: (raw, v) => {
      raw.mapYawDeg = clean(num(v));
    },
  },
  {
    key: 'mapColour',
    group: 'plots',
    label: () => 'Map colour',
    target: 'view',
    control: 'select',
    options: mapOptions,
    get: (c) => c.view.mapColour,
    set: (raw, v) => {
      raw.mapColour = v;
    },
  },
  {
    key: 'mapContour',
    group: 'plots',
    label: () => 'Map contour lines',
    target: 'view',
    control: 'select',
    options: mapOptions,
    get: (c) => c.view.mapContour,
    set: (raw, v) => {
      raw.mapContour = v;
    },
  },
  {
    key: 'mapMaxRimDepthMm',
    path: 'mapMaxRimDepthM',
    group: 'plots',
    label: () => 'Map deepest rim, mm',
    target: 'view',
    control: 'number',
    min: 20,
    max: 300,
    step: 5,
    get: (c) => mm(c.view.mapMaxRimDepthM),
    set: (raw, v) => {
      raw.mapMaxRimDepthM = m(num(v));
    },
  },
  {
    key: 'view3dYawDeg',
    path: 'view3dYawDeg',
    group: 'plots',
    label: () => '3D view yaw, deg',
    target: 'view',
    control: 'number',
    min: 0,
    max: 30,
    step: 0.5,
    get: (c) => c.view.view3dYawDeg,
    set: (raw, v) => {
      raw.view3dYawDeg = clean(num(v));
    },
  },
  {
    key: 'difference',
    group: 'plots',
    label: () => 'Against the baseline show',
    target: 'view',
    control: 'select',
    options: {
      'values (baseline dashed)': 'none',
      'drag difference (force unit)': 'force',
      'power difference, W': 'power',
      'drag difference, %': 'percent',
    },
    get: (c) => c.view.difference,
    set: (raw, v) => {
      raw.difference = v;
    },
  },
];
