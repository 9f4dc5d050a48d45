/**
 * Nominal tyre dimensions (ISO 4000-1 / ETRTO nominal dimensions; REFERENCES.md, confidence H).
 *
 * Metric: sidewall H = section width × aspect / 100; overall diameter D = rim(in) × 25.4 + 2H.
 * Flotation: D = overall diameter (in) × 25.4; section width = section (in) × 25.4.
 * Circumference = π·D; revolutions per km = 1 000 000 / (π·D in mm).
 * Values are nominal (new tyre, no load); a loaded tyre rolls on a slightly smaller radius.
 */
import type { TyreSize } from './tyre-designation';

/** 1 in = 25.4 mm exactly. */
export const MM_PER_INCH = 25.4;

export interface TyreGeometry {
  sectionWidthMm: number;
  sidewallHeightMm: number;
  rimDiameterMm: number;
  overallDiameterMm: number;
  circumferenceMm: number;
  revolutionsPerKm: number;
  /** Sidewall height as a percentage of section width (the metric aspect ratio; derived for flotation sizes). */
  aspectRatioPercent: number;
}

export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

export function mmToInches(millimetres: number): number {
  return millimetres / MM_PER_INCH;
}

/** Nominal dimensions of a parsed tyre size. */
export function tyreGeometry(size: TyreSize): TyreGeometry {
  const rimDiameterMm = inchesToMm(size.rimDiameterIn);
  let sectionWidthMm: number;
  let sidewallHeightMm: number;
  let overallDiameterMm: number;
  if (size.kind === 'metric') {
    sectionWidthMm = size.sectionWidthMm;
    sidewallHeightMm = (size.sectionWidthMm * size.aspectRatioPercent) / 100;
    overallDiameterMm = rimDiameterMm + 2 * sidewallHeightMm;
  } else {
    sectionWidthMm = inchesToMm(size.sectionWidthIn);
    overallDiameterMm = inchesToMm(size.overallDiameterIn);
    sidewallHeightMm = (overallDiameterMm - rimDiameterMm) / 2;
  }
  const circumferenceMm = Math.PI * overallDiameterMm;
  return {
    sectionWidthMm,
    sidewallHeightMm,
    rimDiameterMm,
    overallDiameterMm,
    circumferenceMm,
    revolutionsPerKm: 1_000_000 / circumferenceMm,
    aspectRatioPercent: (sidewallHeightMm / sectionWidthMm) * 100,
  };
}
