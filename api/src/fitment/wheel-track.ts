/**
 * Wheel offset and track (REFERENCES.md "Wheel offset and track": definitions H, formulas derived).
 *
 * Offset (ET) is the mounting face's distance from the rim centreline, positive outboard; a
 * smaller offset moves the wheel out and widens the track.
 *   track change (both sides)   = 2 × (ET_old − ET_new)
 *   outer rim edge, per side    = (W_new − W_old) / 2 + (ET_old − ET_new), widths in mm (in × 25.4)
 *   inner rim edge, per side    = (W_new − W_old) / 2 − (ET_old − ET_new)  (positive: moves inboard)
 */
import { inchesToMm } from './tyre-geometry';

export interface WheelPosition {
  widthIn: number;
  offsetMm: number;
}

/** Change of track (both sides together), mm; positive is wider. */
export function trackChangeMm(stock: WheelPosition, fitted: WheelPosition): number {
  return 2 * (stock.offsetMm - fitted.offsetMm);
}

/** How far the outer rim edge moves out on each side, mm. */
export function outerEdgeChangePerSideMm(stock: WheelPosition, fitted: WheelPosition): number {
  return (
    (inchesToMm(fitted.widthIn) - inchesToMm(stock.widthIn)) / 2 +
    (stock.offsetMm - fitted.offsetMm)
  );
}

/** How far the inner rim edge moves in (towards the suspension) on each side, mm. */
export function innerEdgeChangePerSideMm(stock: WheelPosition, fitted: WheelPosition): number {
  return (
    (inchesToMm(fitted.widthIn) - inchesToMm(stock.widthIn)) / 2 -
    (stock.offsetMm - fitted.offsetMm)
  );
}
