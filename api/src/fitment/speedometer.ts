/**
 * Speedometer accuracy (UN ECE Regulation No. 39 §5.3; Australian Design Rule 18/03;
 * REFERENCES.md, confidence H): 0 ≤ V1 − V2 ≤ 0.1·V2 + 4 km/h, V1 indicated, V2 true.
 *
 * After a tyre change, true speed / indicated speed = D_new / D_old. Liftwright assumes the
 * speedometer read exactly true on the stock tyre (the best a calibration can be; a real one
 * usually reads a little high), so the reading on the new tyre is V1 = V2 × D_old / D_new.
 */

export interface SpeedRangeKmh {
  minKmh: number;
  maxKmh: number;
}

/** True when an indicated speed is allowed for a true speed: 0 ≤ V1 − V2 ≤ 0.1·V2 + 4. */
export function speedometerReadingAllowed(indicatedKmh: number, trueKmh: number): boolean {
  const errorKmh = indicatedKmh - trueKmh;
  return errorKmh >= 0 && errorKmh <= 0.1 * trueKmh + 4;
}

/** Indicated speeds allowed at a true speed: V2 .. V2 + (0.1·V2 + 4). */
export function allowedIndicatedRangeKmh(trueKmh: number): SpeedRangeKmh {
  return { minKmh: trueKmh, maxKmh: trueKmh + (0.1 * trueKmh + 4) };
}

/** True speeds consistent with an indicated speed: (V1 − 4) / 1.1 .. V1. */
export function allowedTrueRangeKmh(indicatedKmh: number): SpeedRangeKmh {
  return { minKmh: (indicatedKmh - 4) / 1.1, maxKmh: indicatedKmh };
}

/**
 * Indicated speed on the new tyre at a true speed, for a speedometer that read exactly true on
 * the stock tyre: V1 = V2 × D_old / D_new (a larger tyre turns fewer times per km, so it reads low).
 */
export function indicatedSpeedAfterTyreChangeKmh(
  trueKmh: number,
  stockDiameterMm: number,
  newDiameterMm: number,
): number {
  return (trueKmh * stockDiameterMm) / newDiameterMm;
}
