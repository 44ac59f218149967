/**
 * Ratio of mean wind speeds at two heights by the neutral logarithmic profile,
 *   u(z) / u(z_ref) = ln(z / z0) / ln(z_ref / z0)
 * (Prandtl's log law of the atmospheric surface layer; e.g. Stull, An Introduction to Boundary Layer
 * Meteorology, 1988, sec. 9.7; roughness classes after Wieringa as tabulated in WMO-No. 8, Guide to
 * Instruments and Methods of Observation, annex on exposure: 0.03 m "open" terrain — from memory).
 * Neutral stratification; heights are above the ground (no displacement height).
 *
 * @throws RangeError when a height does not exceed the roughness length or the roughness length is not > 0.
 */
export function logWindProfileRatio(
  heightM: number,
  referenceHeightM: number,
  roughnessLengthM: number,
): number {
  if (!(roughnessLengthM > 0) || !Number.isFinite(roughnessLengthM)) {
    throw new RangeError(`roughnessLengthM=${roughnessLengthM}: must be finite and > 0`);
  }
  if (!(heightM > roughnessLengthM) || !Number.isFinite(heightM)) {
    throw new RangeError(
      `heightM=${heightM}: must be finite and greater than roughnessLengthM=${roughnessLengthM}`,
    );
  }
  if (!(referenceHeightM > roughnessLengthM) || !Number.isFinite(referenceHeightM)) {
    throw new RangeError(
      `referenceHeightM=${referenceHeightM}: must be finite and greater than roughnessLengthM=${roughnessLengthM}`,
    );
  }
  return Math.log(heightM / roughnessLengthM) / Math.log(referenceHeightM / roughnessLengthM);
}
