import { describe, expect, it } from 'vitest';
import { innerEdgeChangePerSideMm, outerEdgeChangePerSideMm, trackChangeMm } from './wheel-track';

describe('wheel track from offset and width', () => {
  it('widens the track 60 mm and moves the outer edge 42.7 mm going from 7J ET+30 to 8J ET0', () => {
    // Source: the definition of wheel offset (ET, Einpresstiefe: mounting face to rim centreline, positive outboard); track formula derived from it: 7J ET+30 → 8J ET0:
    // track +60 mm, outer edge +42.7 mm per side.
    const stock = { widthIn: 7, offsetMm: 30 };
    const fitted = { widthIn: 8, offsetMm: 0 };
    expect(trackChangeMm(stock, fitted)).toBe(60);
    expect(outerEdgeChangePerSideMm(stock, fitted)).toBeCloseTo(42.7, 6);
    // Worked by hand: (203.2 − 177.8) / 2 − 30 = −17.3 mm: the inner edge moves 17.3 mm outboard.
    expect(innerEdgeChangePerSideMm(stock, fitted)).toBeCloseTo(-17.3, 6);
  });

  it('changes the track by twice the offset change at equal width', () => {
    // Source: the definition of wheel offset (ET, Einpresstiefe: mounting face to rim centreline, positive outboard); track formula derived from it: track change = 2 × (ET_old − ET_new) at equal width.
    const stock = { widthIn: 8, offsetMm: 35 };
    expect(trackChangeMm(stock, { widthIn: 8, offsetMm: 20 })).toBe(30);
    expect(outerEdgeChangePerSideMm(stock, { widthIn: 8, offsetMm: 20 })).toBe(15);
    expect(trackChangeMm(stock, { widthIn: 8, offsetMm: 45 })).toBe(-20);
  });
});
