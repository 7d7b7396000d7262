import { describe, expect, it, vi } from 'vitest';
import { createApiClient } from './api-client';
import { callRoute, routePath } from './api-routes';

// What goes on the wire for a route of the contracts' table: its method, its path with the parameters encoded
// (RFC 3986 §2.1 percent-encoding, as encodeURIComponent does), its query and its JSON body.
function recordingClient(answer: unknown, status = 200) {
  const seen: { method: string; url: string; body: string | null }[] = [];
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    seen.push({ method: init?.method ?? 'GET', url: String(input), body: typeof init?.body === 'string' ? init.body : null });
    return status === 204 ? new Response(null, { status }) : new Response(JSON.stringify(answer), { status, headers: { 'Content-Type': 'application/json' } });
  });
  return { client: createApiClient({ basePath: '/api', fetch }), seen };
}

const piece = {
  id: '00000000-0000-4000-8000-000000000001',
  name: 'Table',
  wood: 'walnut',
  notes: '',
  stage: 'planning',
  createdBy: null,
  createdAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-01T10:00:00.000Z',
};

describe('callRoute', () => {
  it('fills the path from the params and sends the body with the route’s method', async () => {
    const { client, seen } = recordingClient(piece);
    const answer = await callRoute('updatePiece', { params: { id: piece.id }, body: { notes: 'oiled' } }, {}, client);
    expect(seen).toEqual([{ method: 'PATCH', url: `/api/pieces/${piece.id}`, body: '{"notes":"oiled"}' }]);
    expect(answer.name).toBe('Table');
  });

  it('puts the query in the URL and leaves out what is not set', async () => {
    const { client, seen } = recordingClient({ items: [], total: 0 });
    await callRoute('listPieces', { query: { limit: 20, offset: 40, q: undefined } }, {}, client);
    expect(seen[0]!.url).toBe('/api/pieces?limit=20&offset=40');
  });

  it('answers nothing for a route without a response (204)', async () => {
    const { client, seen } = recordingClient(null, 204);
    await expect(callRoute('deletePiece', { params: { id: piece.id } }, {}, client)).resolves.toBeUndefined();
    expect(seen[0]!.method).toBe('DELETE');
  });

  it('refuses an answer that does not match the route’s response schema', async () => {
    const { client } = recordingClient({ id: 'not a piece' });
    await expect(callRoute('getPiece', { params: { id: piece.id } }, {}, client)).rejects.toBeTruthy();
  });
});

describe('routePath', () => {
  it('encodes each parameter so a value cannot change the path', () => {
    expect(routePath('/invitations/:token/accept', { token: 'a/b?c' })).toBe('/invitations/a%2Fb%3Fc/accept');
  });

  it('says which parameter is missing', () => {
    expect(() => routePath('/pours/:id/readings/:readingId', { id: 'p' })).toThrow('readingId');
  });
});
