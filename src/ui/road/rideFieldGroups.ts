/** The road form's groups for the wheel, the ride and the rider and bike. */
import { speedFromMps, speedToMps, speedUnitText } from '../displayUnits';
import type { RoadState } from '../roadState';
import { clean, type FieldGroup, num, same } from './roadField';

export const RIDE_FIELD_GROUPS: FieldGroup[] = [
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
];
