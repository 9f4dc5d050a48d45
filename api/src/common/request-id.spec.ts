import type { IncomingMessage, ServerResponse } from 'node:http';
import { describe, expect, it } from 'vitest';
import { requestIdFor } from './request-id';

function idFor(incoming: string | string[] | undefined): { id: string; header: unknown } {
  let header: unknown;
  const response = {
    setHeader: (_name: string, value: unknown) => (header = value),
  } as unknown as ServerResponse;
  const id = requestIdFor(
    { headers: { 'x-request-id': incoming } } as unknown as IncomingMessage,
    response,
  );
  return { id, header };
}

describe('requestIdFor', () => {
  it('keeps a sane incoming id and echoes it', () => {
    expect(idFor('lb-7f3a.42:9')).toEqual({ id: 'lb-7f3a.42:9', header: 'lb-7f3a.42:9' });
  });

  it.each([[undefined], [''], ['has space'], ['x'.repeat(129)], [['a', 'b']], ['line\nbreak']])(
    'replaces %j with a UUID',
    (incoming) => {
      const { id, header } = idFor(incoming);
      expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
      expect(header).toBe(id);
    },
  );
});
