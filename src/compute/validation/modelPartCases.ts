/**
 * Model-part rows of the reference set: the checks the model's tests make against published values
 * (test/model/**), with the same reference constants (referenceValues.ts). Each calls the model
 * function itself; no wheel is solved here.
 */
import { standardAtmosphere } from '../../model/air/standardAtmosphere';
import { sutherlandViscosity } from '../../model/air/sutherlandViscosity';
import { gridConvergenceIndex } from '../../model/convergence/gridConvergenceIndex';
import { laminarFlatPlateFriction } from '../../model/friction/laminarFlatPlateFriction';
import { prandtlSchlichtingFriction } from '../../model/friction/prandtlSchlichtingFriction';
import { rotatingDiscMomentCoefficient } from '../../model/friction/rotatingDiscMomentCoefficient';
import { turbulentFlatPlateFriction } from '../../model/friction/turbulentFlatPlateFriction';
import { buildDiscLattice } from '../../model/lattice/buildDiscLattice';
import { DEFAULT_CHORD_COUNT, DEFAULT_SPAN_COUNT } from '../../model/lattice/defaults';
import { rectangularLattice } from '../../model/lattice/rectangularLattice';
import { solveLattice } from '../../model/lattice/solveLattice';
import type { LatticeSolution } from '../../model/lattice/types';
import { martinPower } from '../../model/ride/martinPower';
import { cylinderDrag } from '../../model/sections/cylinderDrag';
import {
  BLASIUS_FRICTION,
  CELIK_TABLE_1,
  CIRCULAR_WING_ASPECT_RATIO,
  CIRCULAR_WING_INDUCED_DRAG_FACTOR,
  CYLINDER_DRAG_RE100,
  helmboldSlopePerRad,
  ISA_VISCOSITY,
  KINNER_SLOPE_PER_RAD,
  MARTIN_EXAMPLE,
  PRANDTL_SCHLICHTING_FRICTION,
  ROTATING_DISC_MOMENT,
  STANDARD_ATMOSPHERE_TABLE,
  STANDARD_ATMOSPHERE_TOL_REL,
  TURBULENT_FRICTION,
} from './referenceValues';
import { richardsonLimit } from './richardsonLimit';
import type { ReferenceBand, ReferenceCase } from './types';

/** A band of +-tol around a value. */
export function around(value: number, tol: number): ReferenceBand {
  return { low: value - tol, high: value + tol };
}

const DISC_RADIUS_M = 0.35;

/** The solid thin disc's lattice solution (no ground), solved once per lattice size. */
const discSolutions = new Map<string, LatticeSolution>();
function freeDisc(spanCount: number, chordCount: number): LatticeSolution {
  const key = `${spanCount}x${chordCount}`;
  let solution = discSolutions.get(key);
  if (!solution) {
    const lattice = buildDiscLattice({ radiusM: DISC_RADIUS_M, spanCount, chordCount, ground: false });
    solution = solveLattice(lattice, new Float64Array(lattice.panelCount));
    discSolutions.set(key, solution);
  }
  return solution;
}

const KINNER_SOURCE =
  'W. Kinner (1937), Ingenieur-Archiv 8, 47-80; P. F. Jordan (1973), exact solution of the circular wing (1.790 per rad, from memory)';
const FRICTION_DESCRIPTION = (re: number) => `flat plate, one side, Reynolds number ${re.toExponential(0)}`;

export const MODEL_PART_CASES: readonly ReferenceCase[] = [
  {
    id: 'lattice-kinner-limit',
    group: 'model part',
    quantity: 'lattice lift slope of the thin circular wing, refined to its limit (per rad)',
    description: `solid thin disc without ground; lattices 12x6, 24x12, 48x24 (cosine strips), Richardson limit (Roache 1994)`,
    source: KINNER_SOURCE,
    strength: 'theory (exact)',
    reference: KINNER_SLOPE_PER_RAD,
    band: around(KINNER_SLOPE_PER_RAD, 0.001 * KINNER_SLOPE_PER_RAD),
    unit: '1/rad',
    compute: () => {
      const f = [freeDisc(12, 6), freeDisc(24, 12), freeDisc(48, 24)].map((s) => s.normalSlope);
      const { limit, order } = richardsonLimit(f[0]!, f[1]!, f[2]!, 48);
      return { value: limit, note: `observed order ${order.toFixed(2)}; 48x24 gives ${f[2]!.toFixed(5)}` };
    },
  },
  {
    id: 'lattice-helmbold-bound',
    group: 'model part',
    quantity: 'lattice lift slope of the thin circular wing at the default lattice (per rad)',
    description: `solid thin disc without ground, ${DEFAULT_SPAN_COUNT}x${DEFAULT_CHORD_COUNT} lattice; must lie below Helmbold's approximate value (which lies below Jones' slender-wing 2.0)`,
    source:
      'H. B. Helmbold (1942), low-aspect-ratio formula 2 pi A / (2 + sqrt(A^2 + 4)) with A = 4/pi; R. T. Jones (1946), NACA Report 835 (from memory)',
    strength: 'theory (exact)',
    reference: helmboldSlopePerRad(CIRCULAR_WING_ASPECT_RATIO),
    band: { low: 0, high: helmboldSlopePerRad(CIRCULAR_WING_ASPECT_RATIO), lowOpen: true, highOpen: true },
    unit: '1/rad',
    compute: () => ({ value: freeDisc(DEFAULT_SPAN_COUNT, DEFAULT_CHORD_COUNT).normalSlope }),
  },
  {
    id: 'lattice-induced-drag-factor',
    group: 'model part',
    quantity: 'induced-drag factor Ki = C_Di / C_L^2 of the circular wing (Trefftz plane)',
    description: `solid thin disc without ground, ${DEFAULT_SPAN_COUNT}x${DEFAULT_CHORD_COUNT} lattice; the elliptic minimum 1/(pi A) is a lower bound`,
    source:
      'Munk (1921) elliptic minimum 1/(pi A); nearly elliptic loading of the circular wing (within 0.5 %, from memory)',
    strength: 'theory (exact)',
    reference: CIRCULAR_WING_INDUCED_DRAG_FACTOR.value,
    band: {
      low: CIRCULAR_WING_INDUCED_DRAG_FACTOR.value,
      high: CIRCULAR_WING_INDUCED_DRAG_FACTOR.value * (1 + CIRCULAR_WING_INDUCED_DRAG_FACTOR.tolRel),
    },
    unit: '-',
    compute: () => ({ value: freeDisc(DEFAULT_SPAN_COUNT, DEFAULT_CHORD_COUNT).inducedDragFactor }),
  },
  {
    id: 'lattice-flat-plate-2pi',
    group: 'model part',
    quantity: '2-D flat plate lift slope (per rad)',
    description:
      'a rectangular wing of span 1e6 chords, one strip, 4 chordwise panels (quarter/three-quarter-chord rule)',
    source: 'thin-aerofoil theory, 2 pi (J. D. Anderson, Fundamentals of Aerodynamics, sec. 4.7)',
    strength: 'theory (exact)',
    reference: 2 * Math.PI,
    band: around(2 * Math.PI, 1e-4 * 2 * Math.PI),
    unit: '1/rad',
    compute: () => {
      const lattice = rectangularLattice(1e6, 1, 1, 4, -5e5, Number.NaN);
      return { value: solveLattice(lattice, new Float64Array(lattice.panelCount)).normalSlope };
    },
  },
  {
    id: 'friction-blasius',
    group: 'model part',
    quantity: 'laminar skin-friction coefficient C_f',
    description: FRICTION_DESCRIPTION(BLASIUS_FRICTION.reynolds),
    source: 'H. Blasius (1908), C_f = 1.328 / sqrt(Re); H. Schlichting, Boundary-Layer Theory, ch. 7',
    strength: 'theory (exact)',
    reference: BLASIUS_FRICTION.cf,
    band: around(BLASIUS_FRICTION.cf, BLASIUS_FRICTION.tolAbs),
    unit: '-',
    compute: () => ({ value: laminarFlatPlateFriction(BLASIUS_FRICTION.reynolds) }),
  },
  {
    id: 'friction-turbulent-one-fifth',
    group: 'model part',
    quantity: 'turbulent skin-friction coefficient C_f (one-fifth law)',
    description: FRICTION_DESCRIPTION(TURBULENT_FRICTION.reynolds),
    source: "Prandtl's one-fifth law C_f = 0.074 Re^-0.2; H. Schlichting, Boundary-Layer Theory, ch. 21",
    strength: 'handbook data',
    reference: TURBULENT_FRICTION.cf,
    band: around(TURBULENT_FRICTION.cf, TURBULENT_FRICTION.tolAbs),
    unit: '-',
    compute: () => ({ value: turbulentFlatPlateFriction(TURBULENT_FRICTION.reynolds) }),
  },
  {
    id: 'friction-prandtl-schlichting',
    group: 'model part',
    quantity: 'turbulent skin-friction coefficient C_f (Prandtl-Schlichting)',
    description: FRICTION_DESCRIPTION(PRANDTL_SCHLICHTING_FRICTION.reynolds),
    source: 'C_f = 0.455 / (log10 Re)^2.58; H. Schlichting, Boundary-Layer Theory, ch. 21',
    strength: 'handbook data',
    reference: PRANDTL_SCHLICHTING_FRICTION.cf,
    band: around(PRANDTL_SCHLICHTING_FRICTION.cf, PRANDTL_SCHLICHTING_FRICTION.tolAbs),
    unit: '-',
    compute: () => ({ value: prandtlSchlichtingFriction(PRANDTL_SCHLICHTING_FRICTION.reynolds) }),
  },
  ...(
    [
      [
        'laminar',
        'von Karman (1921), C_M = 3.87 / sqrt(Re); H. Schlichting, Boundary-Layer Theory, ch. 5',
        'theory (exact)',
      ],
      ['turbulent', 'C_M = 0.146 Re^-0.2; H. Schlichting, Boundary-Layer Theory, ch. 21', 'handbook data'],
    ] as const
  ).map(([regime, source, strength]): ReferenceCase => {
    const { reynolds, cm } = ROTATING_DISC_MOMENT[regime];
    return {
      id: `rotating-disc-${regime}`,
      group: 'model part',
      quantity: `rotating-disc moment coefficient C_M (both sides), ${regime}`,
      description: `free disc spinning in still air, Re = omega R^2 / nu = ${reynolds.toExponential(0)}`,
      source,
      strength,
      reference: cm,
      band: around(cm, ROTATING_DISC_MOMENT.tolRel * cm),
      unit: '-',
      compute: () => ({ value: rotatingDiscMomentCoefficient(reynolds) }),
    };
  }),
  {
    id: 'cylinder-drag-re100',
    group: 'model part',
    quantity: 'circular cylinder drag coefficient C_d (spoke section)',
    description: `smooth circular cylinder in crossflow, Re ${CYLINDER_DRAG_RE100.reynolds}`,
    source:
      'Wieselsberger (1921) and Tritton (1959) as plotted in S. F. Hoerner, Fluid-Dynamic Drag (1965) ch. 3 and F. M. White, Fluid Mechanics, Fig. 7.16 (read from memory)',
    strength: 'measured',
    reference: CYLINDER_DRAG_RE100.cd,
    band: around(CYLINDER_DRAG_RE100.cd, CYLINDER_DRAG_RE100.tolRel * CYLINDER_DRAG_RE100.cd),
    unit: '-',
    compute: () => ({ value: cylinderDrag(CYLINDER_DRAG_RE100.reynolds) }),
  },
  ...[STANDARD_ATMOSPHERE_TABLE[3], STANDARD_ATMOSPHERE_TABLE[4]].map(
    (row): ReferenceCase => ({
      id: `isa-density-${row.altitudeM / 1000}km`,
      group: 'model part',
      quantity: 'air density of the standard atmosphere (kg/m^3)',
      description: `ISA, dry, ${row.altitudeM} m geopotential altitude`,
      source: 'U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), tables (values from memory of the tables)',
      strength: 'standard table',
      reference: row.densityKgPerM3,
      band: around(row.densityKgPerM3, STANDARD_ATMOSPHERE_TOL_REL * row.densityKgPerM3),
      unit: 'kg/m^3',
      compute: () => ({ value: standardAtmosphere(row.altitudeM).densityKgPerM3 }),
    }),
  ),
  {
    id: 'sutherland-isa-viscosity',
    group: 'model part',
    quantity: 'dynamic viscosity of air (Pa s)',
    description: `Sutherland's law at ${ISA_VISCOSITY.temperatureK} K`,
    source: 'ICAO Standard Atmosphere (1993), mu(288.15 K) = 1.7894e-5 Pa s',
    strength: 'standard table',
    reference: ISA_VISCOSITY.muPaS,
    band: around(ISA_VISCOSITY.muPaS, ISA_VISCOSITY.tolRel * ISA_VISCOSITY.muPaS),
    unit: 'Pa s',
    compute: () => ({ value: sutherlandViscosity(ISA_VISCOSITY.temperatureK) }),
  },
  ...(
    [
      ['gci-celik-order', 'observed order of convergence p', CELIK_TABLE_1.observedOrder, 'p'],
      ['gci-celik-index', 'grid-convergence index GCI21 (fraction)', CELIK_TABLE_1.gci21, 'gci'],
    ] as const
  ).map(
    ([id, quantity, ref, key]): ReferenceCase => ({
      id,
      group: 'model part',
      quantity,
      description: `worked example: 2-D grids of ${CELIK_TABLE_1.cells.join(', ')} cells, solutions ${CELIK_TABLE_1.phi.join(', ')}`,
      source:
        'I. B. Celik, U. Ghia, P. J. Roache, C. J. Freitas, H. Coleman, P. E. Raad (2008), J. Fluids Eng. 130, 078001, Table 1 (from memory)',
      strength: 'hand calculation',
      reference: ref.value,
      band: around(ref.value, ref.tolAbs),
      unit: '-',
      compute: () => {
        const h = CELIK_TABLE_1.cells.map((n) => Math.sqrt(1 / n));
        const r = gridConvergenceIndex({
          h1: h[0]!,
          h2: h[1]!,
          h3: h[2]!,
          phi1: CELIK_TABLE_1.phi[0],
          phi2: CELIK_TABLE_1.phi[1],
          phi3: CELIK_TABLE_1.phi[2],
        });
        return { value: key === 'p' ? r.observedOrder : r.gciRelative };
      },
    }),
  ),
  {
    id: 'martin-power-example',
    group: 'model part',
    quantity: 'total riding power of the Martin et al. power model (W)',
    description:
      '10 m/s in still air, rho 1.2, CdA 0.25 m^2, F_W 0.0044 m^2, Crr 0.004, 80 kg, 2 % gradient, 9.9 -> 10.1 m/s in 20 s, drivetrain 0.976',
    source:
      'J. C. Martin, D. L. Milliken, J. E. Cobb, K. L. McFadden, A. R. Coggan (1998), J. Appl. Biomech. 14, 276-291 (model evaluated by hand)',
    strength: 'hand calculation',
    reference: MARTIN_EXAMPLE.expected.totalW,
    band: around(MARTIN_EXAMPLE.expected.totalW, MARTIN_EXAMPLE.tolRel * MARTIN_EXAMPLE.expected.totalW),
    unit: 'W',
    compute: () => ({ value: martinPower(MARTIN_EXAMPLE.input).totalW }),
  },
];
