/**
 * Speed symbols of the tyre service description and the speed each one stands for.
 * Values: ISO 4000-1 / ETRTO speed symbol table (REFERENCES.md, confidence H).
 */

/** Speed symbols in ascending order of speed. H sits between U and V: the order is not alphabetical. */
export const SPEED_SYMBOLS_ASCENDING = [
  'L',
  'M',
  'N',
  'P',
  'Q',
  'R',
  'S',
  'T',
  'U',
  'H',
  'V',
  'W',
  'Y',
] as const;

export type SpeedSymbol = (typeof SPEED_SYMBOLS_ASCENDING)[number];

/** Maximum speed, km/h, for each speed symbol (ISO 4000-1 / ETRTO). */
export const SPEED_SYMBOL_KMH: Readonly<Record<SpeedSymbol, number>> = {
  L: 120,
  M: 130,
  N: 140,
  P: 150,
  Q: 160,
  R: 170,
  S: 180,
  T: 190,
  U: 200,
  H: 210,
  V: 240,
  W: 270,
  Y: 300,
};

export function isSpeedSymbol(value: string): value is SpeedSymbol {
  return Object.prototype.hasOwnProperty.call(SPEED_SYMBOL_KMH, value);
}

/** Maximum speed in km/h for a speed symbol. */
export function speedSymbolKmh(symbol: SpeedSymbol): number {
  return SPEED_SYMBOL_KMH[symbol];
}

/** The lowest speed symbol whose speed is at least `speedKmh`, or null when none is fast enough. */
export function lowestSpeedSymbolFor(speedKmh: number): SpeedSymbol | null {
  return SPEED_SYMBOLS_ASCENDING.find((symbol) => SPEED_SYMBOL_KMH[symbol] >= speedKmh) ?? null;
}
