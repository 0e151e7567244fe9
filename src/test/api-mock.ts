import { vi } from 'vitest';

export interface RecordedRequest {
  method: string;
  url: URL;
  headers: Headers;
  body: unknown;
}

type Reply = Response | { status: number; body?: unknown };
export type Handler = (request: RecordedRequest) => Reply | Promise<Reply>;

/** A route that always answers with this status and JSON body. */
export const json =
  (status: number, body?: unknown): Handler =>
  () => ({ status, body });

/**
 * Stands in for the API: routes are "METHOD /api/path" (query string ignored), answered by a
 * value (200 JSON) or a handler. Every request is recorded; an unknown route answers 404.
 */
export function mockApi(routes: Record<string, unknown>) {
  const requests: RecordedRequest[] = [];
  const table: Record<string, unknown> = {
    'GET /api/auth/csrf': { token: 'token-1' },
    ...routes,
  };

  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    const request: RecordedRequest = {
      method,
      url,
      headers: new Headers(init?.headers),
      body: typeof init?.body === 'string' ? JSON.parse(init.body) : (init?.body ?? undefined),
    };
    requests.push(request);
    const route = table[`${method} ${url.pathname}`];
    if (route === undefined) {
      return new Response(JSON.stringify({ error: { code: 'not-found', message: 'Not found' } }), {
        status: 404,
        headers: { 'Content-Type': 'application/json' },
      });
    }
    const reply: Reply =
      typeof route === 'function'
        ? await (route as Handler)(request)
        : { status: 200, body: route };
    if (reply instanceof Response) return reply;
    return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), {
      status: reply.status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);

  return {
    requests,
    /** Requests to one "METHOD /api/path". */
    to: (key: string) => requests.filter((r) => `${r.method} ${r.url.pathname}` === key),
  };
}
