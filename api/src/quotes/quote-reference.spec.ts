import { describe, expect, it } from 'vitest';
import {
  quoteNumberFromSearch,
  quotePdfFileName,
  quotePdfUrl,
  quoteReference,
} from './quote-reference';

describe('quote references', () => {
  it('writes the number with six digits', () => {
    expect(quoteReference(123)).toBe('Q-000123');
    expect(quoteReference(1234567)).toBe('Q-1234567');
    expect(quotePdfFileName(123, 2)).toBe('quote-Q-000123-v2.pdf');
    expect(quotePdfUrl('abc', 1)).toBe('/api/quotes/abc/versions/1/pdf');
  });

  it('reads a searched reference or number, and nothing else', () => {
    expect(quoteNumberFromSearch('Q-000123')).toBe(123);
    expect(quoteNumberFromSearch('q000123')).toBe(123);
    expect(quoteNumberFromSearch(' 123 ')).toBe(123);
    expect(quoteNumberFromSearch('Robin')).toBeNull();
    expect(quoteNumberFromSearch('ABC123')).toBeNull();
  });
});
