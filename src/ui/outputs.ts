/**
 * The outputs the page can plot, map and tabulate, read from the model's PointResult. Each says what
 * kind of quantity it is, so the display units (newtons or grams-force, m^2 or cm^2) apply correctly.
 */
import type { PointResult } from '../compute/study/modelResults';

export type OutputKind = 'force' | 'moment' | 'power' | 'length' | 'area';

export interface OutputSpec {
  key: OutputKey;
  /** Plain name for axis titles and headers. */
  label: string;
  /** A shorter name for tight places (difference axes). */
  short?: string;
  kind: OutputKind;
  get(p: PointResult): number;
}

export const OUTPUT_KEYS = [
  'axial',
  'side',
  'vertical',
  'windDrag',
  'windLift',
  'cpX',
  'cpZ',
  'yawMoment',
  'rollMoment',
  'steering',
  'axleTorque',
  'power',
  'cda',
] as const;
export type OutputKey = (typeof OUTPUT_KEYS)[number];

export const OUTPUTS: Record<OutputKey, OutputSpec> = {
  axial: {
    key: 'axial',
    label: 'Axial drag (along travel)',
    short: 'Axial drag',
    kind: 'force',
    get: (p) => p.axialN,
  },
  side: { key: 'side', label: 'Side force', kind: 'force', get: (p) => p.sideN },
  vertical: { key: 'vertical', label: 'Vertical force', kind: 'force', get: (p) => p.verticalN },
  windDrag: { key: 'windDrag', label: 'Wind-axis drag', kind: 'force', get: (p) => p.windDragN },
  windLift: { key: 'windLift', label: 'Wind-axis lift', kind: 'force', get: (p) => p.windLiftN },
  cpX: {
    key: 'cpX',
    label: 'Centre of pressure ahead of hub',
    short: 'CP ahead of hub',
    kind: 'length',
    get: (p) => p.cpXM,
  },
  cpZ: { key: 'cpZ', label: 'Centre of pressure above hub', kind: 'length', get: (p) => p.cpZM },
  yawMoment: { key: 'yawMoment', label: 'Yaw moment about hub', kind: 'moment', get: (p) => p.yawMomentNm },
  rollMoment: {
    key: 'rollMoment',
    label: 'Roll moment about contact',
    kind: 'moment',
    get: (p) => p.rollMomentNm,
  },
  steering: { key: 'steering', label: 'Steering moment', kind: 'moment', get: (p) => p.steeringMomentNm },
  axleTorque: { key: 'axleTorque', label: 'Axle torque', kind: 'moment', get: (p) => p.axleTorqueNm },
  power: { key: 'power', label: 'Aerodynamic power', kind: 'power', get: (p) => p.powerW },
  cda: { key: 'cda', label: 'Axial drag area', kind: 'area', get: (p) => p.cdaAxialM2 },
};

/** Outputs offered as the design map's colour and contour quantities. */
export const MAP_OUTPUT_KEYS: readonly OutputKey[] = [
  'axial',
  'side',
  'windDrag',
  'steering',
  'yawMoment',
  'rollMoment',
  'power',
  'cda',
  'cpX',
];
