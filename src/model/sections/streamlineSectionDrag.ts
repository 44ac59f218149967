/**
 * Profile drag of a 2-D streamline section at zero lift, on the chord (S. F. Hoerner, Fluid-Dynamic Drag,
 * 1965, ch. 6, eq. for 2-D sections; from memory): C_d = 2 C_f (1 + 2 (t/c) + 60 (t/c)^4), where C_f is the
 * flat-plate skin-friction coefficient of one side at the chord Reynolds number (both sides wetted, the
 * factor 2), 2 t/c the supervelocity term and 60 (t/c)^4 the pressure (separation) term. Hoerner states it
 * for attached flow, t/c up to ~0.3-0.4.
 */

/**
 * @param thicknessToChord t/c, 0..1 (trustworthy to ~0.4)
 * @param skinFrictionCoefficient mean one-side C_f at the chord Reynolds number (> 0)
 * @throws RangeError when an argument breaks its rule.
 */
export function streamlineSectionDrag(thicknessToChord: number, skinFrictionCoefficient: number): number {
  if (!Number.isFinite(thicknessToChord) || thicknessToChord < 0 || thicknessToChord > 1) {
    throw new RangeError(`thicknessToChord=${thicknessToChord}: must be finite and within 0..1`);
  }
  if (!Number.isFinite(skinFrictionCoefficient) || skinFrictionCoefficient <= 0) {
    throw new RangeError(`skinFrictionCoefficient=${skinFrictionCoefficient}: must be finite and > 0`);
  }
  const t = thicknessToChord;
  return 2 * skinFrictionCoefficient * (1 + 2 * t + 60 * t ** 4);
}
