/**
 * The road panel's inputs in one line for the captions of its figures and tables: the wheel's position,
 * what is held constant (power or speed), the course or distance and gradient, the wind (kind, speed,
 * direction and the station height it is given at), the rider and the air.
 */
import { speedFromMps, speedUnitText } from '../displayUnits';
import type { RoadState } from '../roadState';
import type { SpeedUnit } from '../viewState';

const num = (x: number, digits = 4): string => String(Number(x.toPrecision(digits)));

export function rideSummary(road: RoadState, speedUnit: SpeedUnit): string {
  const su = speedUnitText(speedUnit);
  const speed = (mps: number) => `${num(speedFromMps(mps, speedUnit))} ${su}`;
  const held =
    road.mode === 'power'
      ? `constant power ${num(road.power_W)} W`
      : `constant speed ${speed(road.speed_mps)}`;
  const route = road.use_course
    ? `course of ${road.course.length} segment${road.course.length === 1 ? '' : 's'}`
    : `${num(road.distance_m / 1000)} km at ${num(road.gradient * 100)} % gradient`;
  const w = road.wind;
  const strength =
    w.kind === 'fixed'
      ? `${speed(w.speed_mps)}`
      : w.kind === 'rayleigh'
        ? `Rayleigh, mean ${speed(w.mean_mps)}`
        : `Weibull, shape ${num(w.shape)}, scale ${speed(w.scale_mps)}`;
  const from = w.direction === 'uniform' ? 'from every direction' : `from ${num(w.direction_deg)}°`;
  const air =
    road.air === 'design'
      ? "the design's air"
      : `air ${num(road.temperature_c)} °C, altitude ${num(road.altitude_m)} m, RH ${num(road.relative_humidity * 100)} %`;
  return `Ride: ${road.position} wheel, ${held}, ${route}; wind ${strength} ${from} at ${num(w.reference_height_m)} m height; rider ${num(road.rider.mass_kg)} kg, CdA ${num(road.rider.cda_m2)} m², Crr ${num(road.rider.crr)}; ${air}`;
}
