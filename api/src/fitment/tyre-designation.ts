/**
 * Tyre size designations: parsing and canonical formatting.
 *
 * Metric sizes (ISO 4000-1 / ETRTO): optional P (passenger) or LT (light truck) prefix, section
 * width mm / aspect ratio %, construction R (radial; ZR tolerated) or D (diagonal), rim diameter
 * in inches, optional C (commercial) suffix, then an optional service description: load index
 * (single, or single/dual such as 121/118) and speed symbol. Examples: 265/70R17,
 * 265/70 R17 115T, LT285/75R16 126/123Q, P225/75R15 102S.
 *
 * Flotation sizes (inch sizes): overall diameter in x section width in, R (radial) or D / "-"
 * (diagonal, the trade's bias marking), rim in, optional LT suffix, then the service
 * description. Examples: 33x12.50R15LT 108Q, 35X12.50R17 121Q, 31x10.50R15.
 *
 * The parser never throws: any input gives either a size or an error naming the wrong part.
 */
import { HIGHEST_LOAD_INDEX, LOWEST_LOAD_INDEX, isKnownLoadIndex } from './load-index';
import { SPEED_SYMBOLS_ASCENDING, type SpeedSymbol, isSpeedSymbol } from './speed-symbols';

export type TyreConstruction = 'radial' | 'diagonal';

/** P → passenger, LT → light truck, C suffix → commercial, no mark → unmarked. */
export type MetricServiceType = 'passenger' | 'light-truck' | 'commercial' | 'unmarked';

interface ServiceDescription {
  /** First load index (single fitment); null when the designation carries none. */
  loadIndexSingle: number | null;
  /** Second load index of an LT dual mark (e.g. 118 in 121/118); null when not marked. */
  loadIndexDual: number | null;
  speedSymbol: SpeedSymbol | null;
}

export interface MetricTyreSize extends ServiceDescription {
  kind: 'metric';
  serviceType: MetricServiceType;
  sectionWidthMm: number;
  aspectRatioPercent: number;
  construction: TyreConstruction;
  /** The size was written with ZR (a radial with the old Z speed marking). Radial only. */
  zRatedMarking: boolean;
  rimDiameterIn: number;
}

export interface FlotationTyreSize extends ServiceDescription {
  kind: 'flotation';
  overallDiameterIn: number;
  sectionWidthIn: number;
  construction: TyreConstruction;
  rimDiameterIn: number;
  /** The size carries the LT suffix (e.g. 33x12.50R15LT). */
  lightTruck: boolean;
}

export type TyreSize = MetricTyreSize | FlotationTyreSize;

export type TyreDesignationPart =
  | 'width'
  | 'aspect'
  | 'overallDiameter'
  | 'construction'
  | 'rim'
  | 'loadIndex'
  | 'speedSymbol'
  | 'format';

export interface TyreDesignationError {
  part: TyreDesignationPart;
  message: string;
}

export type ParseTyreDesignationResult =
  { ok: true; size: TyreSize } | { ok: false; error: TyreDesignationError };

export const METRIC_SECTION_WIDTH_MIN_MM = 105;
export const METRIC_SECTION_WIDTH_MAX_MM = 455;
export const METRIC_ASPECT_MIN_PERCENT = 20;
export const METRIC_ASPECT_MAX_PERCENT = 95;
export const RIM_DIAMETER_MIN_IN = 10;
export const RIM_DIAMETER_MAX_IN = 30;
export const FLOTATION_DIAMETER_MIN_IN = 20;
export const FLOTATION_DIAMETER_MAX_IN = 60;
export const FLOTATION_SECTION_MIN_IN = 5;
export const FLOTATION_SECTION_MAX_IN = 20;

const NUMBER = /^\d+(?:\.\d+)?/;
const SPEED_SYMBOL_LIST = SPEED_SYMBOLS_ASCENDING.join(', ');

/** A position in the upper-cased designation, consumed left to right. */
class Cursor {
  private position = 0;

  constructor(private readonly text: string) {}

  skipSpaces(): void {
    const spaces = /^\s+/.exec(this.remaining());
    if (spaces) this.position += spaces[0].length;
  }

  take(pattern: RegExp): string | null {
    const match = pattern.exec(this.remaining());
    if (!match) return null;
    this.position += match[0].length;
    return match[0];
  }

  atEnd(): boolean {
    return this.position >= this.text.length;
  }

  /** The next few characters, for error messages. */
  next(): string {
    return Array.from(this.remaining().slice(0, 24)).slice(0, 12).join('');
  }

  private remaining(): string {
    return this.text.slice(this.position);
  }
}

class DesignationError extends Error {
  constructor(readonly detail: TyreDesignationError) {
    super(detail.message);
  }
}

function fail(part: TyreDesignationPart, message: string): never {
  throw new DesignationError({ part, message });
}

function found(cursor: Cursor): string {
  return cursor.atEnd() ? 'the end of the size' : `"${cursor.next()}"`;
}

function isWholeOrHalf(value: number): boolean {
  return Number.isInteger(value * 2);
}

/**
 * Parse a tyre size designation. Never throws: returns `{ ok: true, size }` or
 * `{ ok: false, error: { part, message } }` with a message a customer can act on.
 */
export function parseTyreDesignation(designation: string): ParseTyreDesignationResult {
  try {
    return { ok: true, size: parseOrFail(designation) };
  } catch (error) {
    // Only our own DesignationError is turned into a result; anything else is a defect and surfaces.
    if (error instanceof DesignationError) return { ok: false, error: error.detail };
    throw error;
  }
}

function parseOrFail(designation: unknown): TyreSize {
  if (typeof designation !== 'string') {
    fail('format', 'Enter the tyre size as text, for example 265/70R17.');
  }
  const text = designation.trim().toUpperCase();
  if (text === '') {
    fail('format', 'Enter a tyre size, for example 265/70R17 or 33x12.50R15LT.');
  }
  const cursor = new Cursor(text);
  const prefix = cursor.take(/^(?:LT|P)(?=\s*[\d/])/);
  cursor.skipSpaces();
  const first = cursor.take(NUMBER);
  if (first === null) {
    if (prefix !== null) {
      fail('width', `Expected the section width in millimetres after ${prefix}, e.g. LT285/75R16.`);
    }
    fail(
      'format',
      'A tyre size starts with the section width (e.g. 265/70R17) or the overall diameter (e.g. 33x12.50R15).',
    );
  }
  cursor.skipSpaces();
  const separator = cursor.take(/^[/X×]/);
  if (separator === '/') return parseMetric(prefix, first, cursor);
  if (separator !== null) {
    if (prefix !== null) {
      fail(
        'format',
        'P and LT go in front of metric sizes only; a flotation size carries LT at the end, e.g. 33x12.50R15LT.',
      );
    }
    return parseFlotation(first, cursor);
  }
  return fail(
    'format',
    `Expected "/" after the section width (as in 265/70R17) or "x" after the overall diameter (as in 33x12.50R15); found ${found(cursor)}.`,
  );
}

function parseMetric(prefix: string | null, widthText: string, cursor: Cursor): MetricTyreSize {
  const sectionWidthMm = Number(widthText);
  if (
    !/^\d{3}$/.test(widthText) ||
    sectionWidthMm < METRIC_SECTION_WIDTH_MIN_MM ||
    sectionWidthMm > METRIC_SECTION_WIDTH_MAX_MM ||
    sectionWidthMm % 10 !== 5
  ) {
    fail(
      'width',
      `The section width of a metric size is in millimetres, three digits ending in 5 between ${METRIC_SECTION_WIDTH_MIN_MM} and ${METRIC_SECTION_WIDTH_MAX_MM} (e.g. 265); found ${widthText}.`,
    );
  }

  cursor.skipSpaces();
  const aspectText = cursor.take(NUMBER);
  if (aspectText === null) {
    fail(
      'aspect',
      `Expected the aspect ratio after "/", e.g. the 70 in 265/70R17; found ${found(cursor)}.`,
    );
  }
  const aspectRatioPercent = Number(aspectText);
  if (
    !/^\d{2}$/.test(aspectText) ||
    aspectRatioPercent < METRIC_ASPECT_MIN_PERCENT ||
    aspectRatioPercent > METRIC_ASPECT_MAX_PERCENT ||
    aspectRatioPercent % 5 !== 0
  ) {
    fail(
      'aspect',
      `The aspect ratio is a percentage in steps of 5 between ${METRIC_ASPECT_MIN_PERCENT} and ${METRIC_ASPECT_MAX_PERCENT} (e.g. 70); found ${aspectText}.`,
    );
  }

  cursor.skipSpaces();
  const constructionText = cursor.take(/^(?:ZR|R|D)/);
  if (constructionText === null) {
    fail(
      'construction',
      `Expected R (radial), ZR or D (diagonal) after the aspect ratio; found ${found(cursor)}. Metric sizes are written like 265/70R17.`,
    );
  }

  cursor.skipSpaces();
  const rimDiameterIn = parseRim(cursor, `after ${constructionText}, e.g. the 17 in 265/70R17`);

  let serviceType: MetricServiceType =
    prefix === 'P' ? 'passenger' : prefix === 'LT' ? 'light-truck' : 'unmarked';
  cursor.skipSpaces();
  if (cursor.take(/^C(?![A-Z])/) !== null) {
    if (serviceType !== 'unmarked') {
      fail('format', `A size with ${prefix} in front cannot also carry the C (commercial) suffix.`);
    }
    serviceType = 'commercial';
  }
  cursor.skipSpaces();
  if (cursor.take(/^LT(?![A-Z])/) !== null) {
    fail('format', 'On metric sizes LT goes in front, e.g. LT285/75R16, not at the end.');
  }

  return {
    kind: 'metric',
    serviceType,
    sectionWidthMm,
    aspectRatioPercent,
    construction: constructionText === 'D' ? 'diagonal' : 'radial',
    zRatedMarking: constructionText === 'ZR',
    rimDiameterIn,
    ...parseServiceDescription(cursor),
  };
}

function parseFlotation(diameterText: string, cursor: Cursor): FlotationTyreSize {
  const overallDiameterIn = Number(diameterText);
  if (
    !isWholeOrHalf(overallDiameterIn) ||
    overallDiameterIn < FLOTATION_DIAMETER_MIN_IN ||
    overallDiameterIn > FLOTATION_DIAMETER_MAX_IN
  ) {
    fail(
      'overallDiameter',
      `The overall diameter of a flotation size is in whole or half inches between ${FLOTATION_DIAMETER_MIN_IN} and ${FLOTATION_DIAMETER_MAX_IN} (e.g. 33); found ${diameterText}.`,
    );
  }

  cursor.skipSpaces();
  const widthText = cursor.take(NUMBER);
  if (widthText === null) {
    fail(
      'width',
      `Expected the section width in inches after "x", e.g. the 12.50 in 33x12.50R15; found ${found(cursor)}.`,
    );
  }
  const sectionWidthIn = Number(widthText);
  if (
    !/^\d{1,2}(?:\.\d{1,2})?$/.test(widthText) ||
    sectionWidthIn < FLOTATION_SECTION_MIN_IN ||
    sectionWidthIn > FLOTATION_SECTION_MAX_IN ||
    sectionWidthIn >= overallDiameterIn
  ) {
    fail(
      'width',
      `The section width of a flotation size is in inches with at most two decimals, between ${FLOTATION_SECTION_MIN_IN} and ${FLOTATION_SECTION_MAX_IN} (e.g. 12.50); found ${widthText}.`,
    );
  }

  cursor.skipSpaces();
  const constructionText = cursor.take(/^[RD-]/);
  if (constructionText === null) {
    fail(
      'construction',
      `Expected R (radial) or D or "-" (diagonal) after the section width, e.g. 33x12.50R15; found ${found(cursor)}.`,
    );
  }

  cursor.skipSpaces();
  const rimDiameterIn = parseRim(cursor, 'after the construction, e.g. the 15 in 33x12.50R15');
  if (rimDiameterIn >= overallDiameterIn) {
    fail(
      'rim',
      `The rim diameter (${rimDiameterIn} in) must be smaller than the overall diameter (${overallDiameterIn} in).`,
    );
  }

  cursor.skipSpaces();
  const lightTruck = cursor.take(/^LT/) !== null;

  return {
    kind: 'flotation',
    overallDiameterIn,
    sectionWidthIn,
    construction: constructionText === 'R' ? 'radial' : 'diagonal',
    rimDiameterIn,
    lightTruck,
    ...parseServiceDescription(cursor),
  };
}

function parseRim(cursor: Cursor, where: string): number {
  const rimText = cursor.take(NUMBER);
  if (rimText === null) {
    fail('rim', `Expected the rim diameter in inches ${where}; found ${found(cursor)}.`);
  }
  const rimDiameterIn = Number(rimText);
  if (
    !isWholeOrHalf(rimDiameterIn) ||
    rimDiameterIn < RIM_DIAMETER_MIN_IN ||
    rimDiameterIn > RIM_DIAMETER_MAX_IN
  ) {
    fail(
      'rim',
      `The rim diameter is in whole or half inches between ${RIM_DIAMETER_MIN_IN} and ${RIM_DIAMETER_MAX_IN} (e.g. 17); found ${rimText}.`,
    );
  }
  return rimDiameterIn;
}

function parseLoadIndex(text: string, which: string): number {
  const loadIndex = Number(text);
  if (!isKnownLoadIndex(loadIndex)) {
    fail(
      'loadIndex',
      `The ${which} load index must be between ${LOWEST_LOAD_INDEX} and ${HIGHEST_LOAD_INDEX} (the table Liftwright holds); found ${text}.`,
    );
  }
  return loadIndex;
}

function parseServiceDescription(cursor: Cursor): ServiceDescription {
  cursor.skipSpaces();
  let loadIndexSingle: number | null = null;
  let loadIndexDual: number | null = null;
  const singleText = cursor.take(/^\d+/);
  if (singleText !== null) {
    loadIndexSingle = parseLoadIndex(singleText, 'single-fitment');
    cursor.skipSpaces();
    if (cursor.take(/^\//) !== null) {
      cursor.skipSpaces();
      const dualText = cursor.take(/^\d+/);
      if (dualText === null) {
        fail(
          'loadIndex',
          `Expected the dual-fitment load index after "/", e.g. 121/118; found ${found(cursor)}.`,
        );
      }
      loadIndexDual = parseLoadIndex(dualText, 'dual-fitment');
      if (loadIndexDual >= loadIndexSingle) {
        fail(
          'loadIndex',
          `The dual-fitment load index (${loadIndexDual}) must be lower than the single-fitment one (${loadIndexSingle}), e.g. 121/118.`,
        );
      }
    }
  }

  cursor.skipSpaces();
  let speedSymbol: SpeedSymbol | null = null;
  const speedText = cursor.take(/^[A-Z]+/);
  if (speedText !== null) {
    if (!isSpeedSymbol(speedText)) {
      fail(
        'speedSymbol',
        `"${speedText}" is not a speed symbol Liftwright knows; use one of ${SPEED_SYMBOL_LIST}.`,
      );
    }
    speedSymbol = speedText;
  }

  cursor.skipSpaces();
  if (!cursor.atEnd()) {
    fail(
      'format',
      `Unexpected ${found(cursor)} after the size. Give the size and service description only, e.g. 265/70R17 115T.`,
    );
  }
  return { loadIndexSingle, loadIndexDual, speedSymbol };
}

/** The canonical designation: parseTyreDesignation(formatTyreDesignation(size)) gives `size` back. */
export function formatTyreDesignation(size: TyreSize): string {
  return size.kind === 'metric' ? formatMetric(size) : formatFlotation(size);
}

function formatMetric(size: MetricTyreSize): string {
  const prefix =
    size.serviceType === 'passenger' ? 'P' : size.serviceType === 'light-truck' ? 'LT' : '';
  const construction = size.construction === 'diagonal' ? 'D' : size.zRatedMarking ? 'ZR' : 'R';
  const suffix = size.serviceType === 'commercial' ? 'C' : '';
  return `${prefix}${size.sectionWidthMm}/${size.aspectRatioPercent}${construction}${size.rimDiameterIn}${suffix}${formatServiceDescription(size)}`;
}

function formatFlotation(size: FlotationTyreSize): string {
  const construction = size.construction === 'diagonal' ? '-' : 'R';
  const suffix = size.lightTruck ? 'LT' : '';
  return `${size.overallDiameterIn}x${size.sectionWidthIn.toFixed(2)}${construction}${size.rimDiameterIn}${suffix}${formatServiceDescription(size)}`;
}

function formatServiceDescription(size: ServiceDescription): string {
  const speed = size.speedSymbol ?? '';
  if (size.loadIndexSingle === null) return speed === '' ? '' : ` ${speed}`;
  const dual = size.loadIndexDual === null ? '' : `/${size.loadIndexDual}`;
  return ` ${size.loadIndexSingle}${dual}${speed}`;
}

/** True for tyres built for light trucks: LT metric, LT-suffixed flotation, or C (commercial) metric. */
export function isLightTruckConstruction(size: TyreSize): boolean {
  return size.kind === 'metric'
    ? size.serviceType === 'light-truck' || size.serviceType === 'commercial'
    : size.lightTruck;
}

/** True for P-metric (passenger) tyres, the ones derated when fitted to a light truck. */
export function isPassengerMetric(size: TyreSize): boolean {
  return size.kind === 'metric' && size.serviceType === 'passenger';
}
