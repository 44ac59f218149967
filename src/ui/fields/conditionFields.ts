/** The flow's controls: speeds, yaw angles and the air. */

import { speedToMps } from '../displayUnits';
import { airMode, clean, num, shownSpeed, sp, speedFromShown, yawRange, yawStep } from './fieldHelpers';
import type { Field } from './fieldTypes';

export const CONDITION_FIELDS: readonly Field[] = [
  // Speed and yaw
  {
    key: 'airspeed',
    path: 'conditions.airspeed_mps',
    group: 'conditions',
    label: (c) => `Airspeed, ${sp(c)}`,
    help: "Speed of the air relative to the wheel (the wind tunnel's speed).",
    target: 'case',
    control: 'number',
    min: 5,
    max: 120,
    step: 0.1,
    get: (c) => shownSpeed(c.case.conditions.airspeed_mps[0]!, c),
    set: (raw, v, c) => {
      raw.conditions.airspeed_mps = [speedFromShown(v, c.case.conditions.airspeed_mps[0]!, c)];
    },
  },
  {
    key: 'groundMode',
    group: 'conditions',
    label: () => 'Wheel rotation',
    target: 'case',
    control: 'select',
    options: { 'tunnel: ground speed = airspeed': 'tunnel', 'given ground speed': 'given' },
    get: (c) => (c.case.conditions.ground_speed_mps === null ? 'tunnel' : 'given'),
    set: (raw, v, c) => {
      raw.conditions.ground_speed_mps = v === 'tunnel' ? null : c.case.conditions.airspeed_mps[0];
    },
  },
  {
    key: 'groundSpeed',
    path: 'conditions.ground_speed_mps',
    group: 'conditions',
    label: (c) => `Ground speed, ${sp(c)}`,
    target: 'case',
    control: 'number',
    min: 0,
    max: 120,
    step: 0.1,
    get: (c) => shownSpeed(c.case.conditions.ground_speed_mps ?? c.case.conditions.airspeed_mps[0]!, c),
    set: (raw, v, c) => {
      raw.conditions.ground_speed_mps = speedFromShown(
        v,
        c.case.conditions.ground_speed_mps ?? c.case.conditions.airspeed_mps[0]!,
        c,
      );
    },
    visible: (c) => c.case.conditions.ground_speed_mps !== null,
  },
  {
    key: 'yawMaxDeg',
    path: 'conditions.yaw_deg',
    group: 'conditions',
    label: () => 'Largest yaw, deg',
    help: "Yaw angles are computed from 0 to this, in the step below. Beyond the model's trusted yaw the plots shade the range.",
    target: 'case',
    control: 'number',
    min: 0,
    max: 45,
    step: 0.5,
    get: (c) => clean(Math.max(...c.case.conditions.yaw_deg)),
    set: (raw, v, c) => {
      raw.conditions.yaw_deg = yawRange(num(v), yawStep(c.case.conditions.yaw_deg));
    },
  },
  {
    key: 'yawStepDeg',
    group: 'conditions',
    label: () => 'Yaw step, deg',
    target: 'case',
    control: 'number',
    min: 0.25,
    max: 5,
    step: 0.25,
    get: (c) => yawStep(c.case.conditions.yaw_deg),
    set: (raw, v, c) => {
      raw.conditions.yaw_deg = yawRange(Math.max(...c.case.conditions.yaw_deg), num(v));
    },
  },
  {
    key: 'referenceSpeed',
    path: 'conditions.reference_speed_kmh',
    group: 'units',
    label: (c) => `Reference speed for gf, ${sp(c)}`,
    help: 'Forces shown in grams-force are the force at this speed divided by standard gravity.',
    target: 'case',
    control: 'number',
    min: 10,
    max: 100,
    step: 0.5,
    get: (c) => shownSpeed(c.case.conditions.reference_speed_kmh / 3.6, c),
    set: (raw, v, c) => {
      const kmh = c.case.conditions.reference_speed_kmh;
      raw.conditions.reference_speed_kmh =
        Number(v) === shownSpeed(kmh / 3.6, c) ? kmh : clean(speedToMps(num(v), c.view.speedUnit) * 3.6);
    },
  },
  // Air
  {
    key: 'airMode',
    group: 'air',
    label: () => 'Air given by',
    target: 'case',
    control: 'select',
    options: {
      'temperature, pressure, humidity': 'pressure',
      'temperature, altitude, humidity': 'altitude',
      'density (and temperature)': 'density',
    },
    get: (c) => airMode(c.case),
    set: (raw, v, c) => {
      const cond = raw.conditions;
      const rho = cond.air_density_kgpm3;
      delete cond.air_density_kgpm3;
      delete cond.pressure_pa;
      delete cond.altitude_m;
      if (v === 'pressure') {
        cond.pressure_pa = 101325;
        cond.relative_humidity = cond.relative_humidity ?? 0;
      } else if (v === 'altitude') {
        cond.altitude_m = 0;
        cond.relative_humidity = cond.relative_humidity ?? 0;
      } else {
        delete cond.relative_humidity;
        cond.air_density_kgpm3 = rho ?? 1.225;
      }
      void c;
    },
  },
  {
    key: 'temperatureC',
    path: 'conditions.temperature_c',
    group: 'air',
    label: () => 'Temperature, °C',
    target: 'case',
    control: 'number',
    min: -40,
    max: 50,
    step: 0.5,
    get: (c) => c.case.conditions.temperature_c,
    set: (raw, v) => {
      raw.conditions.temperature_c = clean(num(v));
    },
  },
  {
    key: 'pressureHpa',
    path: 'conditions.pressure_pa',
    group: 'air',
    label: () => 'Pressure, hPa',
    target: 'case',
    control: 'number',
    min: 300,
    max: 1100,
    step: 0.25,
    get: (c) => clean((c.case.conditions.pressure_pa ?? 101325) / 100),
    set: (raw, v) => {
      raw.conditions.pressure_pa = clean(num(v) * 100);
    },
    visible: (c) => airMode(c.case) === 'pressure',
  },
  {
    key: 'altitudeM',
    path: 'conditions.altitude_m',
    group: 'air',
    label: () => 'Altitude, m',
    target: 'case',
    control: 'number',
    min: 0,
    max: 5000,
    step: 10,
    get: (c) => c.case.conditions.altitude_m ?? 0,
    set: (raw, v) => {
      raw.conditions.altitude_m = clean(num(v));
    },
    visible: (c) => airMode(c.case) === 'altitude',
  },
  {
    key: 'humidityPct',
    path: 'conditions.relative_humidity',
    group: 'air',
    label: () => 'Relative humidity, %',
    target: 'case',
    control: 'number',
    min: 0,
    max: 100,
    step: 1,
    get: (c) => clean((c.case.conditions.relative_humidity ?? 0) * 100),
    set: (raw, v) => {
      raw.conditions.relative_humidity = clean(num(v) / 100);
    },
    visible: (c) => airMode(c.case) !== 'density',
  },
  {
    key: 'densityKgPerM3',
    path: 'conditions.air_density_kgpm3',
    group: 'air',
    label: () => 'Air density, kg/m³',
    target: 'case',
    control: 'number',
    min: 0.3,
    max: 1.6,
    step: 0.001,
    get: (c) => c.case.conditions.air_density_kgpm3 ?? 1.225,
    set: (raw, v) => {
      raw.conditions.air_density_kgpm3 = clean(num(v));
    },
    visible: (c) => airMode(c.case) === 'density',
  },
];
