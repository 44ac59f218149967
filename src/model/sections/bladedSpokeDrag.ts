import { flatPlateFriction } from '../friction/flatPlateFriction';
import { cylinderDrag } from './cylinderDrag';

/**
 * Frontal (thickness-based) drag coefficient of a flattened, elliptic-like spoke section with the flow
 * along its width (chord), at subcritical Reynolds number.
 *
 * Separated-flow part: the ratio of elliptic-cylinder to circular-cylinder drag at subcritical Re from
 * Hoerner's data (S. F. Hoerner, Fluid-Dynamic Drag, ch. 3, as tabulated in F. M. White, Fluid Mechanics,
 * Table 7.2, "laminar" column, thickness-based; from memory): t/c = 1, 1/2, 1/4, 1/8 -> C_d = 1.2, 0.6,
 * 0.35, 0.25, i.e. ratios 1, 0.5, 0.2917, 0.2083, interpolated linearly in log-log and extrapolated below
 * t/c = 1/8 with the last segment's slope. The ratio multiplies cylinderDrag(Re), which carries the
 * Reynolds-number trend (an assumption: the table itself holds for Re >= 1e4).
 * Viscous floor: the skin-friction and supervelocity terms of Hoerner's streamline formula, 2 C_f (1 + 2 t/c),
 * with the flat-plate C_f (flatPlateFriction) at the chord Reynolds number, converted to the thickness basis
 * (x c/t). Its separation term 60 (t/c)^4 is left out: separation is what the data part already carries.
 * The floor dominates for thin sections at low Re, where friction outweighs the wake.
 * Result: max(separated, floor), capped by the circular cylinder's value at the same Re.
 */

const LOG_TC = Float64Array.of(Math.log(0.125), Math.log(0.25), Math.log(0.5), 0);
const LOG_RATIO = Float64Array.of(Math.log(0.25 / 1.2), Math.log(0.35 / 1.2), Math.log(0.6 / 1.2), 0);

/** The last section's t/c and its ratio: a wheel's spokes keep one section over a whole sweep, so the
 * table lookup (a logarithm and an exponential) runs once per section, not at every evaluation. */
let lastThicknessToWidth = Number.NaN;
let lastRatio = Number.NaN;

function ellipseToCircleRatio(thicknessToWidth: number): number {
  if (thicknessToWidth === lastThicknessToWidth) return lastRatio;
  lastRatio = interpolatedRatio(thicknessToWidth);
  lastThicknessToWidth = thicknessToWidth;
  return lastRatio;
}

function interpolatedRatio(thicknessToWidth: number): number {
  const x = Math.log(thicknessToWidth);
  let i = 0;
  while (i < LOG_TC.length - 2 && x > LOG_TC[i + 1]!) i++;
  const x0 = LOG_TC[i]!;
  const x1 = LOG_TC[i + 1]!;
  const y0 = LOG_RATIO[i]!;
  const y1 = LOG_RATIO[i + 1]!;
  return Math.exp(y0 + ((y1 - y0) * (x - x0)) / (x1 - x0));
}

/**
 * @param reynolds V t / nu on the section thickness (the frontal dimension), > 0
 * @param thicknessToWidth section thickness / width (chord along the flow), in (0, 1]
 * @throws RangeError when an argument breaks its rule.
 */
export function bladedSpokeDrag(reynolds: number, thicknessToWidth: number): number {
  if (!Number.isFinite(reynolds) || reynolds <= 0) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and > 0`);
  }
  if (!Number.isFinite(thicknessToWidth) || thicknessToWidth <= 0 || thicknessToWidth > 1) {
    throw new RangeError(`thicknessToWidth=${thicknessToWidth}: must be finite and within (0, 1]`);
  }
  const cylinder = cylinderDrag(reynolds);
  const separated = ellipseToCircleRatio(thicknessToWidth) * cylinder;
  const chordReynolds = reynolds / thicknessToWidth;
  const floor = (2 * flatPlateFriction(chordReynolds) * (1 + 2 * thicknessToWidth)) / thicknessToWidth;
  return Math.min(Math.max(separated, floor), cylinder);
}
