import type { RideSetup } from './types';

/**
 * Check a ride setup's ranges (mass and drag area >= 0, 0 <= crr, efficiency in (0, 1], density > 0,
 * finite gradient, shielding 0..1, gravity > 0). Returns the setup.
 *
 * @throws RangeError naming the field, the value and the rule.
 */
export function checkRideSetup(setup: RideSetup): RideSetup {
  const { massKg, riderCdaM2, crr, drivetrainEfficiency, rhoKgPerM3, gradient, wheelShield, gravityMps2 } =
    setup;
  if (!(massKg > 0) || !Number.isFinite(massKg))
    throw new RangeError(`setup.massKg=${massKg}: must be finite and > 0`);
  if (!(riderCdaM2 >= 0) || !Number.isFinite(riderCdaM2)) {
    throw new RangeError(`setup.riderCdaM2=${riderCdaM2}: must be finite and >= 0`);
  }
  if (!(crr >= 0) || !Number.isFinite(crr)) throw new RangeError(`setup.crr=${crr}: must be finite and >= 0`);
  if (!(drivetrainEfficiency > 0 && drivetrainEfficiency <= 1)) {
    throw new RangeError(`setup.drivetrainEfficiency=${drivetrainEfficiency}: must be within (0, 1]`);
  }
  if (!(rhoKgPerM3 > 0) || !Number.isFinite(rhoKgPerM3)) {
    throw new RangeError(`setup.rhoKgPerM3=${rhoKgPerM3}: must be finite and > 0`);
  }
  if (!Number.isFinite(gradient)) throw new RangeError(`setup.gradient=${gradient}: must be finite`);
  if (!(wheelShield >= 0 && wheelShield <= 1)) {
    throw new RangeError(`setup.wheelShield=${wheelShield}: must be within [0, 1]`);
  }
  if (!(gravityMps2 > 0) || !Number.isFinite(gravityMps2)) {
    throw new RangeError(`setup.gravityMps2=${gravityMps2}: must be finite and > 0`);
  }
  return setup;
}
