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

  const answer = async (request: RecordedRequest): Promise<Response> => {
    const { method, url } = request;
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
  };
  const recorded = (
    input: string,
    method: string,
    headers: HeadersInit | undefined,
    body: unknown,
  ) => ({
    method: method.toUpperCase(),
    url: new URL(input, 'http://localhost'),
    headers: new Headers(headers),
    body: typeof body === 'string' ? JSON.parse(body) : (body ?? undefined),
  });

  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) =>
    answer(recorded(String(input), init?.method ?? 'GET', init?.headers, init?.body)),
  );
  vi.stubGlobal('fetch', fetchMock);
  vi.stubGlobal('XMLHttpRequest', fakeXhr(answer, recorded));

  return {
    requests,
    /** Answer (or answer differently) a route from now on. */
    route: (key: string, value: unknown) => {
      table[key] = value;
    },
    /** Requests to one "METHOD /api/path". */
    to: (key: string) => requests.filter((r) => `${r.method} ${r.url.pathname}` === key),
  };
}

/** Bytes a body would take on the wire, near enough for upload events: a form's files and fields. */
function sizeOf(body: unknown): number {
  if (body instanceof FormData) {
    let n = 0;
    for (const [, v] of body.entries()) n += typeof v === 'string' ? v.length : v.size;
    return n;
  }
  return typeof body === 'string' ? body.length : 0;
}

/**
 * An XMLHttpRequest that asks the same table: the upload reports half its bytes, then all, and
 * then the answer comes. What the API client needs of it, no more.
 */
function fakeXhr(
  answer: (r: RecordedRequest) => Promise<Response>,
  recorded: (url: string, method: string, headers: HeadersInit, body: unknown) => RecordedRequest,
) {
  return class FakeXhr extends EventTarget {
    readonly upload = new EventTarget();
    status = 0;
    responseText = '';
    private method = 'GET';
    private url = '';
    private headers: Record<string, string> = {};
    private responseHeaders = new Headers();
    private aborted = false;

    open(method: string, url: string) {
      this.method = method;
      this.url = url;
    }
    setRequestHeader(name: string, value: string) {
      this.headers[name] = value;
    }
    getResponseHeader(name: string) {
      return this.responseHeaders.get(name);
    }
    abort() {
      this.aborted = true;
      this.dispatchEvent(new Event('abort'));
      this.dispatchEvent(new Event('loadend'));
    }
    send(body: unknown) {
      const total = sizeOf(body);
      const progress = (loaded: number) =>
        this.upload.dispatchEvent(
          Object.assign(new Event('progress'), { lengthComputable: true, loaded, total }),
        );
      void (async () => {
        progress(Math.floor(total / 2));
        await Promise.resolve();
        progress(total);
        const response = await answer(recorded(this.url, this.method, this.headers, body));
        if (this.aborted) return;
        this.status = response.status;
        this.responseHeaders = response.headers;
        this.responseText = await response.text();
        this.dispatchEvent(new Event('load'));
        this.dispatchEvent(new Event('loadend'));
      })();
    }
  };
}
