/** The road form's group for the air, the wind and the design gust. */
import type { RoadState } from '../roadState';
import { hubWindNote } from './hubWindNote';
import { clean, type FieldGroup, num, same } from './roadField';

export const WEATHER_FIELD_GROUPS: FieldGroup[] = [
  {
    title: 'Weather',
    fields: [
      {
        kind: 'select',
        key: 'air',
        label: 'Air',
        options: [
          ['design', 'the design’s air'],
          ['own', 'this ride’s weather'],
        ],
        get: (r) => r.air,
        set: (r, v) => {
          r.air = v as RoadState['air'];
        },
      },
      num(
        'temperature_c',
        'Temperature',
        '°C',
        (r) => r.temperature_c,
        (r, v) => {
          r.temperature_c = v;
        },
        '1',
        (r) => r.air === 'own',
      ),
      num(
        'altitude_m',
        'Altitude',
        'm',
        (r) => r.altitude_m,
        (r, v) => {
          r.altitude_m = v;
        },
        '50',
        (r) => r.air === 'own',
      ),
      num(
        'relative_humidity',
        'Relative humidity',
        '%',
        (r) => clean(r.relative_humidity * 100),
        (r, v) => {
          r.relative_humidity = v / 100;
        },
        '5',
        (r) => r.air === 'own',
      ),
      {
        kind: 'select',
        key: 'wind.kind',
        label: 'Wind speed',
        options: [
          ['fixed', 'one speed'],
          ['rayleigh', 'Rayleigh (mean)'],
          ['weibull', 'Weibull (shape, scale)'],
        ],
        get: (r) => r.wind.kind,
        set: (r, v) => {
          r.wind.kind = v as RoadState['wind']['kind'];
        },
      },
      {
        ...num(
          'wind.speed_mps',
          'Wind speed at the station height',
          'm/s',
          (r) => r.wind.speed_mps,
          (r, v) => {
            r.wind.speed_mps = v;
          },
          '0.5',
          (r) => r.wind.kind === 'fixed',
        ),
        note: hubWindNote((r) => r.wind.speed_mps, 'a wind of'),
      },
      {
        ...num(
          'wind.mean_mps',
          'Mean wind speed at the station height',
          'm/s',
          (r) => r.wind.mean_mps,
          (r, v) => {
            r.wind.mean_mps = v;
          },
          '0.5',
          (r) => r.wind.kind === 'rayleigh',
        ),
        note: hubWindNote((r) => r.wind.mean_mps, 'a mean of'),
      },
      num(
        'wind.shape',
        'Weibull shape',
        same(),
        (r) => r.wind.shape,
        (r, v) => {
          r.wind.shape = v;
        },
        '0.1',
        (r) => r.wind.kind === 'weibull',
      ),
      {
        ...num(
          'wind.scale_mps',
          'Weibull scale at the station height',
          'm/s',
          (r) => r.wind.scale_mps,
          (r, v) => {
            r.wind.scale_mps = v;
          },
          '0.5',
          (r) => r.wind.kind === 'weibull',
        ),
        note: hubWindNote((r) => r.wind.scale_mps, 'a scale of'),
      },
      {
        kind: 'select',
        key: 'wind.direction',
        label: 'Wind direction',
        options: [
          ['uniform', 'any, equally likely'],
          ['fixed', 'one direction'],
        ],
        get: (r) => r.wind.direction,
        set: (r, v) => {
          r.wind.direction = v as RoadState['wind']['direction'];
        },
      },
      num(
        'wind.direction_deg',
        'Wind from',
        'deg',
        (r) => r.wind.direction_deg,
        (r, v) => {
          r.wind.direction_deg = v;
        },
        '5',
        (r) => r.wind.direction === 'fixed',
      ),
      num(
        'wind.reference_height_m',
        'Station height of the wind figures',
        'm',
        (r) => r.wind.reference_height_m,
        (r, v) => {
          r.wind.reference_height_m = v;
        },
        '1',
      ),
      num(
        'wind.roughness_length_m',
        'Terrain roughness length',
        'm',
        (r) => r.wind.roughness_length_m,
        (r, v) => {
          r.wind.roughness_length_m = v;
        },
        '0.01',
      ),
      num(
        'handling.gust_factor',
        'Gust factor (gust / mean)',
        same(),
        (r) => r.handling.gust_factor,
        (r, v) => {
          r.handling.gust_factor = v;
        },
        '0.1',
      ),
      num(
        'handling.gust_duration_s',
        'Gust duration',
        's',
        (r) => r.handling.gust_duration_s,
        (r, v) => {
          r.handling.gust_duration_s = v;
        },
        '0.5',
      ),
    ],
  },
];
