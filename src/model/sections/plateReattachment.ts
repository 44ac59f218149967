/**
 * Fraction (0..1) of a round-nosed section's leading-edge thrust that can be realised, from whether the
 * flow separating off the round nose reattaches on the solid plate behind it. Leading-edge suction acts
 * as thrust only on a section whose flow stays, or becomes again, attached behind the nose (thin-aerofoil
 * theory's premise); a bluff section whose shear layers roll up into a wake carries a force along its
 * local flow, not a thrust (the crossflow principle; Hoerner, Fluid-Dynamic Drag ch. 3).
 *
 * Cylinder with a wake splitter plate (Apelt, West & Szewczyk 1973, J. Fluid Mech. 61:187; Apelt &
 * West 1975, J. Fluid Mech. 71:145; from memory): up to a plate length L/D of about 2 the shear layers
 * roll up beyond the plate's end (the plate only stretches the formation region); from L/D about 2 they
 * begin to close on the plate, and from L/D about 5 vortex shedding is suppressed and they reattach.
 * The model takes the realisable fraction 0 below L/D = 2, 1 above L/D = 5 and linear between (the
 * interpolation is the model's choice; the two thresholds are the published regimes).
 *
 * @param plateLengthRatio L / D (>= 0, may be +Infinity)
 * @throws RangeError when plateLengthRatio is NaN or negative.
 */
export const REATTACHMENT_ONSET_RATIO = 2;
export const REATTACHMENT_FULL_RATIO = 5;

export function plateReattachment(plateLengthRatio: number): number {
  if (!(plateLengthRatio >= 0)) throw new RangeError(`plateLengthRatio=${plateLengthRatio}: must be >= 0`);
  if (plateLengthRatio <= REATTACHMENT_ONSET_RATIO) return 0;
  if (plateLengthRatio >= REATTACHMENT_FULL_RATIO) return 1;
  return (plateLengthRatio - REATTACHMENT_ONSET_RATIO) / (REATTACHMENT_FULL_RATIO - REATTACHMENT_ONSET_RATIO);
}
