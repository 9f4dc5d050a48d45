import { describe, expect, it } from 'vitest';
import {
  SPEED_SYMBOLS_ASCENDING,
  isSpeedSymbol,
  lowestSpeedSymbolFor,
  speedSymbolKmh,
} from './speed-symbols';

describe('speed symbols', () => {
  it('maps every speed symbol L..Y to its speed', () => {
    // Source: ISO 4000-1 / ETRTO speed symbol table (REFERENCES.md, H), copied verbatim.
    const published =
      'L 120 · M 130 · N 140 · P 150 · Q 160 · R 170 · S 180 · T 190 · U 200 · H 210 · V 240 · W 270 · Y 300';
    const expected = published.split(' · ').map((pair) => {
      const [symbol, kmh] = pair.split(' ');
      return [symbol, Number(kmh)] as const;
    });
    expect(expected).toHaveLength(13);
    for (const [symbol, kmh] of expected) {
      expect(isSpeedSymbol(symbol), symbol).toBe(true);
      if (isSpeedSymbol(symbol)) expect(speedSymbolKmh(symbol), symbol).toBe(kmh);
    }
    expect(SPEED_SYMBOLS_ASCENDING).toEqual(expected.map(([symbol]) => symbol));
  });

  it('orders H between U and V, not alphabetically', () => {
    // Source: ISO 4000-1 / ETRTO speed symbol table: U 200, H 210, V 240 (REFERENCES.md, H).
    const order = [...SPEED_SYMBOLS_ASCENDING];
    expect(order.indexOf('H')).toBe(order.indexOf('U') + 1);
    expect(order.indexOf('V')).toBe(order.indexOf('H') + 1);
    const speeds = order.map(speedSymbolKmh);
    expect(speeds).toEqual([...speeds].sort((a, b) => a - b));
  });

  it('rejects letters that are not speed symbols here', () => {
    for (const letter of ['Z', 'K', 'X', 'h', '', 'HH'])
      expect(isSpeedSymbol(letter), letter).toBe(false);
  });

  it('finds the lowest symbol fast enough for a speed', () => {
    // Source: ISO 4000-1 / ETRTO speed symbol table (REFERENCES.md, H): N 140, S 180, H 210, Y 300.
    expect(lowestSpeedSymbolFor(140)).toBe('N');
    expect(lowestSpeedSymbolFor(175)).toBe('S');
    expect(lowestSpeedSymbolFor(201)).toBe('H');
    expect(lowestSpeedSymbolFor(300)).toBe('Y');
    expect(lowestSpeedSymbolFor(301)).toBeNull();
  });
});
