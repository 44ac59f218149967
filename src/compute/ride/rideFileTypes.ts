/** The ride file's format, documented defaults and limits, and the normalised ride (every default filled). */
import type { CaseFile, CaseModel, CaseSteering, CaseWheel } from '../caseFile';

export const RIDE_FORMAT = 'coversweep-ride';
export const RIDE_VERSION = 1;

/** Documented defaults of the ride file (README "Ride"). */
export const RIDE_DEFAULTS = {
  /** Martin et al. 1998 measured chain efficiency. */
  drivetrain_efficiency: 0.976,
  /** Height of the rider-and-bike centre of mass (m), a road rider (common practice, no source). */
  com_height_m: 1.0,
  /** Share of a rear wheel's axial force acting with the frame in front of it (common practice, no source). */
  rear_shield: 0.75,
  /** Wind figures are usually 10 m station values (WMO-No. 8 standard exposure; from memory). */
  reference_height_m: 10,
  /** Open flat terrain, grass with isolated obstacles (Wieringa's class, as tabulated in WMO-No. 8; from memory). */
  roughness_length_m: 0.03,
  /** Height at which the rider's own drag meets the wind (m): about the middle of a rider's frontal area (common practice, no source). */
  rider_height_m: 1.0,
  /** Gust speed / mean speed near the ground, open terrain (common practice, no source). */
  gust_factor: 1.5,
  /** A gust's duration: the WMO gust is a 3 s mean (WMO-No. 8; from memory). */
  gust_duration_s: 3,
  gradient: 0,
} as const;

/** Bounds of the ride file's numbers. */
export const RIDE_LIMITS = {
  maxGroundSpeedMps: 30,
  maxPowerW: 2500,
  maxDistanceM: 1e6,
  maxGradient: 0.3,
  maxWindMps: 30,
  maxSegments: 1000,
  maxSectors: 72,
} as const;

export type WindSpeedSpec =
  | { kind: 'fixed'; speed_mps: number }
  | { kind: 'rayleigh'; mean_mps: number }
  | { kind: 'weibull'; shape: number; scale_mps: number };

export interface RideWind {
  /** One speed (at the reference height) ... */
  speed_mps?: number;
  /** ... or a distribution of speeds (at the reference height). */
  distribution?:
    | { type: 'rayleigh'; mean_mps: number }
    | { type: 'weibull'; shape: number; scale_mps: number };
  /** Direction the wind comes FROM: relative to the heading (compass when a course is given), or "uniform". */
  direction_deg: number | 'uniform';
  /** Wind-rose weights of equal sectors, the first centred on direction 0 (instead of direction_deg). */
  direction_weights?: number[];
  reference_height_m: number;
  roughness_length_m: number;
  /** null: the design wheel's outer radius. */
  hub_height_m: number | null;
  rider_height_m: number;
}

export interface RideRider {
  mass_kg: number;
  cda_m2: number;
  crr: number;
  drivetrain_efficiency: number;
  com_height_m: number;
}

export interface RideRide {
  power_W?: number;
  speed_mps?: number;
  /** Distance (m); with a course, the course's length. */
  distance_m: number;
  gradient: number;
}

export interface RideSegment {
  length_m: number;
  /** Compass heading of travel (deg). */
  heading_deg: number;
  gradient: number;
}

export interface RideHandling {
  gust_factor: number;
  gust_duration_s: number;
}

export interface RideFile {
  format: typeof RIDE_FORMAT;
  version: typeof RIDE_VERSION;
  name?: string;
  design: CaseWheel;
  baseline: CaseWheel;
  position: 'front' | 'rear';
  rear_shield: number;
  rider: RideRider;
  ride: RideRide;
  /** The air, in a case file's keys (one of: density; temperature + pressure/altitude + humidity). */
  air: {
    air_density_kgpm3?: number;
    temperature_c: number;
    pressure_pa?: number;
    altitude_m?: number;
    relative_humidity?: number;
  };
  wind: RideWind;
  course?: RideSegment[];
  handling: RideHandling;
  steering: CaseSteering;
  model: CaseModel;
}

/** Everything a ride needs from the case-file side: the design and baseline as normalised case files. */
export interface RideCases {
  design: CaseFile;
  baseline: CaseFile;
  rhoKgPerM3: number;
}
