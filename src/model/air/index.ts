export type { AirState } from './airDensity';
export { airDensity } from './airDensity';
export { dynamicPressure } from './dynamicPressure';
export { saturationVapourPressure } from './saturationVapourPressure';
export type { StandardAtmosphereState } from './standardAtmosphere';
export {
  STANDARD_ATMOSPHERE_MAX_ALTITUDE_M,
  STANDARD_ATMOSPHERE_MIN_ALTITUDE_M,
  standardAtmosphere,
} from './standardAtmosphere';
export { sutherlandViscosity } from './sutherlandViscosity';
