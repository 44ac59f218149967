/** The ride result document: its format, the quadrature sizes, its fields and notes. */
import type { RideFile } from './rideFile';

export const RIDE_RESULT_FORMAT = 'coversweep-ride-result';
export const RIDE_RESULT_VERSION = 1;

/** Quadrature sizes (documented in README "Ride"). */
export const RIDE_QUADRATURE = {
  /** Wind-speed nodes (equal probability) and wind directions for power, time and wind-averaged loads. */
  speedNodes: 24,
  directionNodes: 72,
  /** The same for each segment of a course. */
  courseSpeedNodes: 8,
  courseDirectionNodes: 24,
  /** Finer sets for the yaw distribution (density and 90 % quantile). */
  yawSpeedNodes: 64,
  yawDirectionNodes: 720,
  courseYawDirectionNodes: 72,
  /** Yaw-density bins (deg) from 0 to 90. */
  yawBinDeg: 1,
  /** Gust directions scanned when the wind direction is not one fixed value (deg). */
  gustScanStepDeg: 1,
} as const;

export interface Pair {
  design: number | null;
  baseline: number | null;
}

export interface PowerBreakdown {
  rider_aero_W: number | null;
  wheel_axial_W: number | null;
  wheel_rotation_W: number | null;
  rolling_W: number | null;
  bearing_W: number | null;
  gravity_W: number | null;
  net_W: number | null;
  pedal_W: number | null;
}

export interface SteeringSummary {
  slope_Nm_per_deg: number | null;
  sign_changes_deg: number[];
  jumps_deg: number[];
}

export interface RideSegmentResult {
  index: number;
  length_m: number;
  heading_deg: number;
  gradient: number;
  /** Wind direction relative to the heading (deg, FROM; 0 head wind), null when not one direction. */
  wind_from_relative_deg: number | null;
  /** Hub-height apparent yaw and airspeed at the constant speed (one wind state only; else null). */
  yaw_deg: number | null;
  airspeed_mps: number | null;
  /** Mean |yaw| at the hub over the segment's wind states (deg). */
  mean_abs_yaw_deg: number | null;
  axial_N: Pair;
  side_abs_N: Pair;
  power_W: Pair;
  speed_mps: Pair;
  time_s: Pair;
}

export interface RideDocument {
  format: typeof RIDE_RESULT_FORMAT;
  version: typeof RIDE_RESULT_VERSION;
  ride: RideFile;
  position: 'front' | 'rear';
  /** Share of the wheel's axial force acting on the bike (1 front; rear_shield for a rear wheel). */
  shield: number;
  air_density_kgpm3: number | null;
  /** Speed of the yaw curves (airspeed = ground speed, m/s). */
  curve_speed_mps: number | null;
  /** Ground speed of the constant-speed comparison (m/s): the given speed, or the baseline's mean speed at the given power. */
  constant_speed_mps: number | null;
  /** Pedal power of the constant-power comparison (W): the given power, or the baseline's mean power at the given speed. */
  constant_power_W: number | null;
  distance_m: number;
  wind: {
    hub_height_m: number;
    hub_speed_factor: number | null;
    rider_speed_factor: number | null;
    /** Mean wind speed at the reference height and at the hub (m/s). */
    mean_speed_mps: number | null;
    hub_mean_speed_mps: number | null;
  };
  /** Pedal power at constant speed (W), and design - baseline. */
  power_W: Pair;
  delta_power_W: number | null;
  /** Time over the distance or course at constant power (s), mean speed, and design - baseline. */
  time_s: Pair;
  delta_time_s: number | null;
  speed_mps: Pair;
  delta_speed_mps: number | null;
  /** delta_time_s / baseline time, and the change of aerodynamic power over baseline aerodynamic power at constant speed. */
  delta_time_fraction: number | null;
  delta_aero_power_fraction: number | null;
  /** Aerodynamic share of the net power at constant speed (rider + wheel, rotation included). */
  aero_share: Pair;
  power_breakdown_W: { design: PowerBreakdown; baseline: PowerBreakdown };
  /** Wind-averaged wheel figures at the constant speed, over every wind state (and course segment). */
  wind_averaged_axial_N: Pair;
  wind_averaged_cda_m2: Pair;
  /** Mean magnitude of the side force (N) (the signed mean cancels for symmetric winds). */
  wind_averaged_side_N: Pair;
  wind_averaged_wheel_power_W: Pair;
  /** 90 % of riding time is spent below this hub-height |yaw| (deg). */
  yaw_p90_deg: number | null;
  yaw_mean_deg: number | null;
  /** Probability density of |yaw| at the hub (per deg), 1-deg bins from 0 to 90. */
  yaw_density: { yaw_deg: number; density_per_deg: number }[];
  /** Share of riding time beyond the model's trusted yaw and with the air from behind (> 90 deg). */
  yaw_beyond_validity_fraction: number | null;
  yaw_beyond_90_fraction: number | null;
  /** Lean angle to balance the wheel's roll moment in the worst gust (deg). */
  lean_deg: Pair;
  /** Side-force increment of the gust over the mean wind x its duration (N s) and the lateral speed change it gives. */
  gust_impulse_Ns: Pair;
  gust_lateral_speed_change_mps: Pair;
  gust: {
    factor: number;
    duration_s: number;
    hub_speed_mps: number | null;
    /** Relative wind direction (FROM, deg) of the worst gust for each wheel. */
    direction_deg: Pair;
    yaw_deg: Pair;
    side_N: Pair;
    side_increment_N: Pair;
    roll_moment_Nm: Pair;
  };
  /** Ground trail from the head angle, fork offset and each wheel's radius (m). */
  trail_m: Pair;
  /** Front wheel: steering moment features at the curve speed (null for a rear wheel). */
  steering: {
    airspeed_mps: number | null;
    design: SteeringSummary;
    baseline: SteeringSummary;
    curve: { yaw_deg: number; design_Nm: number | null; baseline_Nm: number | null }[];
  } | null;
  segments?: RideSegmentResult[];
  flags: string[];
  notes: string[];
  cautions: string[];
}

export const RIDE_NOTES: readonly string[] = [
  "power and time include the wheel's axial force (times the shielding share for a rear wheel) times ground speed and its axle torque times rotation rate (ground speed / outer radius); the rider's drag area excludes the wheel and Martin et al.'s wheel-rotation term F_W is not added",
  'the rider and the rest of the bike: Martin et al. 1998 (rolling, wheel-bearing, gravity, drivetrain efficiency); their drag area is a yaw-independent wind-axis drag area in the apparent wind at rider_height_m',
  'wheel loads come from one yaw curve solved at curve_speed_mps and are scaled with dynamic pressure to other airspeeds (Reynolds-number effects neglected within the ride)',
  'wind speed is corrected from reference_height_m to the hub and rider heights by the neutral logarithmic profile with roughness_length_m',
  'wind-averaged figures weight every wind speed and direction by riding time at constant_speed_mps; the drag area is referred to the ground-speed dynamic pressure (SAE J1252)',
  'at constant power each wind state (and segment) covers its share of the distance at its own steady speed; speed changes between states and segments are neglected (no kinetic-energy term)',
  "lean: static balance of the wheel's aerodynamic roll moment in the gust by gravity (rider and bike rigid, thin tyres); the rider's own side force is not included",
  'gust: the hub-height mean wind times the gust factor, from the direction (or, for a variable or unknown direction, the worst relative direction) giving the largest roll moment; the impulse is the side-force increment over the mean wind held for the gust duration',
  'loads with the air from behind (|yaw| > 90 deg) are mirrored from 180 deg - |yaw| with the axial force reversed: outside the model',
];
