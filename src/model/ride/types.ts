/**
 * A wheel's loads along one yaw curve, tabulated at one airspeed, and what the ride model reads from it.
 * Forces in N, moments in N m, angles in rad (see src/model/wheel/types.ts for the frame and signs).
 */
export interface WheelYawCurve {
  /** Yaw angles (rad), strictly ascending from 0 to pi/2. */
  yawRad: Float64Array;
  /** Axial force (resisting motion, > 0 backwards) at each yaw. */
  axialN: Float64Array;
  /** Side force (+y, to the rider's left) at each yaw; odd in yaw. */
  sideN: Float64Array;
  /** Moment about the x axis through the ground contact point; odd in yaw. */
  rollMomentNm: Float64Array;
  /** Moment about the steering axis (front wheel); odd in yaw. */
  steeringMomentNm: Float64Array;
  /** Aerodynamic torque resisting the wheel's rotation (> 0 resists). */
  axleTorqueNm: Float64Array;
  /** Airspeed at which the table was solved (m/s); loads scale with (V / V_ref)^2 from it. */
  referenceAirspeedMps: number;
  /** Tyre outer radius (m): rolling rate omega = ground speed / radius. */
  outerRadiusM: number;
}

/** The wheel's loads at one apparent wind, read from a yaw curve. */
export interface WheelLoads {
  axialN: number;
  sideN: number;
  rollMomentNm: number;
  steeringMomentNm: number;
  axleTorqueNm: number;
  /** True when |yaw| > pi/2 (air from behind): loads mirrored from 180 deg - |yaw|, outside the model. */
  mirrored: boolean;
}

/** The rider, bike and road for the power model (Martin et al. 1998), without the modelled wheel. */
export interface RideSetup {
  /** Rider and bike mass (kg). */
  massKg: number;
  /** Drag area of rider and bike without the modelled wheel (m^2), yaw-independent, wind-axis. */
  riderCdaM2: number;
  /** Rolling resistance coefficient. */
  crr: number;
  /** Drivetrain efficiency 0..1 (Martin et al.: 0.976). */
  drivetrainEfficiency: number;
  rhoKgPerM3: number;
  /** Road gradient, rise over run (0.05 = 5 %). */
  gradient: number;
  /** Share of the wheel's axial force that acts on the bike (1 front; < 1 for a rear wheel behind the frame). */
  wheelShield: number;
  /** Acceleration of gravity (m/s^2). */
  gravityMps2: number;
}

/** Power terms at one steady state (W); netW = sum of the terms, pedalW = netW / drivetrain efficiency. */
export interface RidePower {
  riderAeroW: number;
  wheelAxialW: number;
  wheelRotationW: number;
  rollingW: number;
  bearingW: number;
  gravityW: number;
  netW: number;
  pedalW: number;
  /** Apparent wind at the hub. */
  hubAirspeedMps: number;
  hubYawRad: number;
  mirrored: boolean;
}
