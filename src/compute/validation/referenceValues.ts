/**
 * Published reference values shared by the model-part tests (test/model/**) and the built-in reference
 * set (`coversweep validate`): one source of truth for each number, its tolerance and its source.
 */

/** Thin circular wing, exact linear lift slope per rad on the disc area (Kinner 1937; Jordan 1973) - from memory. */
export const KINNER_SLOPE_PER_RAD = 1.79;

/** Aspect ratio of the circular wing, A = span^2 / area = 4 / pi. */
export const CIRCULAR_WING_ASPECT_RATIO = 4 / Math.PI;

/** Helmbold's (1942) low-aspect-ratio lift slope 2 pi A / (2 + sqrt(A^2 + 4)) (from memory). */
export function helmboldSlopePerRad(aspectRatio: number): number {
  return (2 * Math.PI * aspectRatio) / (2 + Math.sqrt(aspectRatio * aspectRatio + 4));
}

/** R. T. Jones' (1946) slender-wing lift slope pi A / 2. */
export function jonesSlopePerRad(aspectRatio: number): number {
  return (Math.PI * aspectRatio) / 2;
}

/** Elliptic (Munk) minimum of the induced-drag factor, 1 / (pi A) = 1/4 for the circular wing; the
 * nearly elliptic loading of the circular wing comes within 0.5 % of it (from memory). */
export const CIRCULAR_WING_INDUCED_DRAG_FACTOR = { value: 0.25, tolRel: 0.005 } as const;

/** Blasius (1908) laminar flat plate, C_f = 1.328 / sqrt(Re) (Schlichting, Boundary-Layer Theory ch. 7). */
export const BLASIUS_FRICTION = { reynolds: 1e5, cf: 0.0041995, tolAbs: 1e-7 } as const;

/** Prandtl's one-fifth law C_f = 0.074 Re^-0.2 (Schlichting ch. 21): 0.074 / 10^1.4. */
export const TURBULENT_FRICTION = { reynolds: 1e7, cf: 0.002946, tolAbs: 1e-8 } as const;

/** Prandtl-Schlichting C_f = 0.455 / (log10 Re)^2.58 (Schlichting ch. 21), evaluated by hand. */
export const PRANDTL_SCHLICHTING_FRICTION = { reynolds: 1e7, cf: 0.0030037, tolAbs: 1e-7 } as const;

/** Rotating disc (both sides) moment coefficient: laminar 3.87 / sqrt(Re), turbulent 0.146 Re^-0.2
 * (Schlichting chs. 5 and 21); 1e-3 relative. */
export const ROTATING_DISC_MOMENT = {
  laminar: { reynolds: 1e5, cm: 3.87 / Math.sqrt(1e5) },
  turbulent: { reynolds: 1e9, cm: 0.146 * 1e9 ** -0.2 },
  tolRel: 1e-3,
} as const;

/** U.S. Standard Atmosphere 1976 tables (= ICAO ISA below 32 km), from memory of the tables; T to 1e-9 K,
 * p and rho to 2e-4 relative. */
export const STANDARD_ATMOSPHERE_TABLE = [
  { altitudeM: 0, temperatureK: 288.15, pressurePa: 101325, densityKgPerM3: 1.225 },
  { altitudeM: 1000, temperatureK: 281.65, pressurePa: 89874.6, densityKgPerM3: 1.11164 },
  { altitudeM: 2000, temperatureK: 275.15, pressurePa: 79495.2, densityKgPerM3: 1.00649 },
  { altitudeM: 5000, temperatureK: 255.65, pressurePa: 54019.9, densityKgPerM3: 0.736116 },
  { altitudeM: 11000, temperatureK: 216.65, pressurePa: 22632.1, densityKgPerM3: 0.363918 },
] as const;
export const STANDARD_ATMOSPHERE_TOL_REL = 2e-4;

/** ICAO 1993 ISA sea-level viscosity at 288.15 K; 2e-4 relative (an equivalent Sutherland form). */
export const ISA_VISCOSITY = { temperatureK: 288.15, muPaS: 1.7894e-5, tolRel: 2e-4 } as const;

/** Celik et al. (2008), J. Fluids Eng. 130, 078001, Table 1, first column (from memory): three 2-D grids
 * and their solutions, and the published results to the paper's rounding (half a unit in the last digit). */
export const CELIK_TABLE_1 = {
  cells: [18000, 8000, 4500],
  phi: [6.063, 5.972, 5.863],
  observedOrder: { value: 1.53, tolAbs: 5e-3 },
  extrapolated21: { value: 6.1685, tolAbs: 5e-5 },
  approximateRelativeError21: { value: 0.015, tolAbs: 5e-4 },
  extrapolatedRelativeError21: { value: 0.017, tolAbs: 5e-4 },
  gci21: { value: 0.022, tolAbs: 5e-4 },
} as const;

/**
 * A hand-worked example of the Martin, Milliken, Cobb, McFadden & Coggan (1998) power model (J. Appl.
 * Biomech. 14, 276-291): inputs and the hand results (8-9 significant digits; 2e-7 relative).
 */
export const MARTIN_EXAMPLE = {
  input: {
    groundSpeedMps: 10,
    airVelocityAlongMps: 10,
    rhoKgPerM3: 1.2,
    cdaM2: 0.25,
    wheelRotationAreaM2: 0.0044,
    crr: 0.004,
    massKg: 80,
    gradient: 0.02,
    gravityMps2: 9.81,
    wheelInertiaKgM2: 0.14,
    wheelRadiusM: 0.311,
    initialSpeedMps: 9.9,
    finalSpeedMps: 10.1,
    intervalS: 20,
    drivetrainEfficiency: 0.976,
  },
  expected: {
    aeroW: 152.64,
    rollingW: 31.385724,
    bearingW: 1.78,
    gravityW: 156.928616,
    kineticW: 8.144746,
    netW: 350.879086,
    totalW: 359.50726,
  },
  tolRel: 2e-7,
} as const;

/** Incremental drag area of wheel rotation, F_W, for a pair of 32-spoke wheels (Martin et al. 1998; from
 * memory): 0.0044 m^2, with the acceptance band of this tool. */
export const MARTIN_WHEEL_ROTATION_AREA = { valueM2: 0.0044, lowM2: 0.0029, highM2: 0.0059 } as const;

/** Smooth circular cylinder C_d at Re 100 (Wieselsberger 1921 and Tritton 1959 as plotted in Hoerner,
 * Fluid-Dynamic Drag ch. 3, and White Fig. 7.16; read from memory), within White's fit quality. */
export const CYLINDER_DRAG_RE100 = { reynolds: 100, cd: 1.45, tolRel: 0.05 } as const;
