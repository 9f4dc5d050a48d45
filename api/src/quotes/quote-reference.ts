/** 123 → "Q-000123": the number the customer and the desk quote. */
export function quoteReference(number: number): string {
  return `Q-${String(number).padStart(6, '0')}`;
}

/** "Q-000123" → 123; a bare number too; null for anything else. */
export function quoteNumberFromSearch(text: string): number | null {
  const match = /^(?:q-?)?0*(\d{1,9})$/i.exec(text.trim());
  return match ? Number(match[1]) : null;
}

/** quote-Q-000123-v1.pdf */
export function quotePdfFileName(number: number, versionNumber: number): string {
  return `quote-${quoteReference(number)}-v${versionNumber}.pdf`;
}

export function quotePdfUrl(quoteId: string, versionNumber: number): string {
  return `/api/quotes/${quoteId}/versions/${versionNumber}/pdf`;
}
