/**
 * Front drive-shaft (half-shaft) angle after a lift on independent front suspension
 * (REFERENCES.md "Drive-shaft joint angle and diff drop", derived geometry).
 *
 * A lift Δh at the wheel adds about atan(Δh / L) to the half-shaft angle, L the half-shaft
 * length; lowering the differential by d reduces it to about atan((Δh − d) / L).
 * 50 mm on a 450 mm shaft ≈ +6.3°; a 25 mm drop roughly halves it.
 */

const DEGREES_PER_RADIAN = 180 / Math.PI;

/** Added half-shaft angle, degrees, for a lift at the wheel and an optional diff drop. */
export function addedHalfShaftAngleDeg(
  liftAtWheelMm: number,
  halfShaftLengthMm: number,
  diffDropMm = 0,
): number {
  return Math.atan((liftAtWheelMm - diffDropMm) / halfShaftLengthMm) * DEGREES_PER_RADIAN;
}

/**
 * The smallest diff drop, mm, that brings the added angle down to `thresholdDeg`
 * (Δh − L·tan(threshold)); 0 when the lift is already within it.
 */
export function diffDropNeededMm(
  liftAtWheelMm: number,
  halfShaftLengthMm: number,
  thresholdDeg: number,
): number {
  const allowedRiseMm = halfShaftLengthMm * Math.tan(thresholdDeg / DEGREES_PER_RADIAN);
  return Math.max(0, liftAtWheelMm - allowedRiseMm);
}
