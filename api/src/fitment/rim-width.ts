/**
 * Rim width for a tyre section.
 *
 * Measuring rim ≈ K × section width (inches), rounded to the nearest 0.5 in, with K by aspect
 * band: 0.70 (75 series and taller), 0.75 (70–60), 0.80 (55–50), 0.85 (45), 0.90 (40).
 * Source: Tire and Rim Association measuring rims (K × section width rule), which matches the Tire and
 * Rim Association measuring rims (P225/75R15 → 6.0 in, P225/55R15 → 7.0, P225/45R17 → 7.5,
 * P225/40R18 → 8.0).
 *
 * The tyre maker's approved rim-width range, when the catalogue holds it, always wins. Without it
 * Liftwright derives a range around the measuring rim (see DERIVED_RANGE_HALF_WIDTH_IN) and says
 * so in `basis: 'derived'`.
 */
import { mmToInches, tyreGeometry } from './tyre-geometry';
import type { TyreSize } from './tyre-designation';

/**
 * K for flotation sizes. From memory: Tire and Rim Association measuring rims for flotation LT
 * sizes (31x10.50R15 → 8.5 in, 33x12.50R15 → 10.0 in, 35x12.50R17 → 10.0 in) sit near
 * 0.80 × section width; the metric aspect bands do not fit them (their measuring rims are wider).
 */
export const FLOTATION_RIM_WIDTH_FACTOR_K = 0.8;

/**
 * Half-width of the derived range around the measuring rim, inches. Liftwright's own allowance
 * (no published source): ±1.0 in reproduces the recalled 7.0–9.0 in range for 265/70R17 and
 * stays inside the recalled 8.5–11.0 in for 33x12.50R15LT (both from memory, REFERENCES.md MEM).
 */
export const DERIVED_RANGE_HALF_WIDTH_IN = 1.0;

/** K for a metric aspect ratio; null below the 40 series, for which no band is published here. */
export function metricRimWidthFactorK(aspectRatioPercent: number): number | null {
  if (aspectRatioPercent >= 75) return 0.7;
  if (aspectRatioPercent >= 60) return 0.75;
  if (aspectRatioPercent >= 50) return 0.8;
  if (aspectRatioPercent >= 45) return 0.85;
  if (aspectRatioPercent >= 40) return 0.9;
  return null;
}

export function roundToNearestHalfInch(inches: number): number {
  return Math.round(inches * 2) / 2;
}

/** Measuring rim width, inches (nearest 0.5 in); null when no K applies (below the 40 series). */
export function measuringRimWidthIn(size: TyreSize): number | null {
  const sectionWidthIn = mmToInches(tyreGeometry(size).sectionWidthMm);
  const factorK =
    size.kind === 'metric'
      ? metricRimWidthFactorK(size.aspectRatioPercent)
      : FLOTATION_RIM_WIDTH_FACTOR_K;
  return factorK === null ? null : roundToNearestHalfInch(factorK * sectionWidthIn);
}

export interface ApprovedRimWidthData {
  minIn: number;
  maxIn: number;
}

export interface RimWidthRange {
  minIn: number;
  maxIn: number;
  /** The measuring rim, inches, when one can be derived. */
  measuringRimIn: number | null;
  /** 'tyre-maker': the catalogue's approved range; 'derived': Liftwright's estimate around the measuring rim. */
  basis: 'tyre-maker' | 'derived';
}

/**
 * The rim-width range a tyre may be fitted to: the tyre maker's approved range when given,
 * otherwise the derived range measuring rim ± DERIVED_RANGE_HALF_WIDTH_IN (clearly marked as
 * derived). Null when neither is available (no data and no K for the aspect ratio).
 */
export function approvedRimWidthRangeIn(
  size: TyreSize,
  makerData?: ApprovedRimWidthData,
): RimWidthRange | null {
  const measuringRimIn = measuringRimWidthIn(size);
  if (makerData) {
    return { minIn: makerData.minIn, maxIn: makerData.maxIn, measuringRimIn, basis: 'tyre-maker' };
  }
  if (measuringRimIn === null) return null;
  return {
    minIn: measuringRimIn - DERIVED_RANGE_HALF_WIDTH_IN,
    maxIn: measuringRimIn + DERIVED_RANGE_HALF_WIDTH_IN,
    measuringRimIn,
    basis: 'derived',
  };
}
