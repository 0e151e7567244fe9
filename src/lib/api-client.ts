import { env } from '@/config/env';
import { serverReached, serverUnreachable } from './connectivity';

/** An error answer from the API: `{ error: { code, message, fields? } }`, or a network failure (status 0). */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

type Method = 'GET' | 'POST' | 'PATCH' | 'DELETE';
type QueryValue = string | number | boolean | undefined | null;

export interface RequestOptions {
  method?: Method;
  body?: unknown;
  query?: Record<string, QueryValue>;
  signal?: AbortSignal;
  /** More request headers (an import's id). */
  headers?: Record<string, string>;
  /**
   * Bytes of the body sent so far, of all. `fetch` cannot tell, so such a request goes by
   * XMLHttpRequest; everything else about it (CSRF, errors, the retry) is the same.
   */
  onUploadProgress?: (sent: number, total: number) => void;
}

/** What `send` needs of a request, whichever way it goes. */
interface Outgoing {
  method: Method;
  url: string;
  headers: Record<string, string>;
  body: BodyInit | undefined;
  signal?: AbortSignal;
  onUploadProgress?: RequestOptions['onUploadProgress'];
}

const abortError = () => new DOMException('The request was aborted', 'AbortError');

/** A request by XMLHttpRequest, for its upload events, answered as a fetch `Response`. */
function sendByXhr(out: Outgoing): Promise<Response> {
  return new Promise((resolve, reject) => {
    if (out.signal?.aborted) return reject(abortError());
    const xhr = new XMLHttpRequest();
    xhr.open(out.method, out.url);
    for (const [name, value] of Object.entries(out.headers)) xhr.setRequestHeader(name, value);
    xhr.upload.addEventListener('progress', (e) => {
      if (e.lengthComputable) out.onUploadProgress?.(e.loaded, e.total);
    });
    const onAbort = () => xhr.abort();
    out.signal?.addEventListener('abort', onAbort, { once: true });
    xhr.addEventListener('loadend', () => out.signal?.removeEventListener('abort', onAbort));
    xhr.addEventListener('load', () => {
      const headers = new Headers();
      const type = xhr.getResponseHeader('Content-Type');
      if (type) headers.set('Content-Type', type);
      const empty = xhr.status === 204 || xhr.status === 205 || xhr.status === 304;
      resolve(new Response(empty ? null : xhr.responseText, { status: xhr.status, headers }));
    });
    xhr.addEventListener('error', () => reject(new TypeError('Network request failed')));
    xhr.addEventListener('timeout', () => reject(new TypeError('Network request timed out')));
    xhr.addEventListener('abort', () => reject(abortError()));
    xhr.send((out.body ?? null) as XMLHttpRequestBodyInit | null);
  });
}

const send = (out: Outgoing): Promise<Response> =>
  out.onUploadProgress
    ? sendByXhr(out)
    : fetch(out.url, {
        method: out.method,
        headers: out.headers,
        body: out.body,
        credentials: 'same-origin',
        signal: out.signal,
      });

// The CSRF token belongs to the session. Login regenerates the session and logout ends it,
// so both call `resetCsrfToken()`; the next state-changing request fetches a fresh one.
let csrfToken: Promise<string> | null = null;

export function resetCsrfToken(): void {
  csrfToken = null;
}

function getCsrfToken(): Promise<string> {
  if (!csrfToken) {
    csrfToken = request<{ token: string }>('/auth/csrf').then(
      ({ token }) => token,
      (error: unknown) => {
        csrfToken = null;
        throw error;
      },
    );
  }
  return csrfToken;
}

function buildUrl(path: string, query?: RequestOptions['query']): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `${env.apiBaseUrl}${path}${search ? `?${search}` : ''}`;
}

async function toApiError(response: Response): Promise<ApiError> {
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // Not JSON (a proxy page, an empty body): fall back to the status line.
  }
  const error = (body as { error?: { code?: unknown; message?: unknown; fields?: unknown } } | null)
    ?.error;
  const fields =
    error?.fields && typeof error.fields === 'object'
      ? (error.fields as Record<string, string>)
      : undefined;
  return new ApiError(
    response.status,
    typeof error?.code === 'string' ? error.code : `http-${response.status}`,
    typeof error?.message === 'string'
      ? error.message
      : `The server answered ${response.status} ${response.statusText}`.trim(),
    fields,
  );
}

/** The lightest read there is, to learn whether the server can be reached again. */
const probeServer = () =>
  fetch(`${env.apiBaseUrl}/auth/me`, { credentials: 'same-origin', cache: 'no-store' });

async function request<T>(path: string, options: RequestOptions = {}, retried = false): Promise<T> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { ...options.headers, Accept: 'application/json' };
  // A form (a file upload) sets its own multipart type and boundary.
  const form = options.body instanceof FormData ? options.body : undefined;
  if (options.body !== undefined && !form) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['x-csrf-token'] = await getCsrfToken();

  let response: Response;
  try {
    response = await send({
      method,
      url: buildUrl(path, options.query),
      headers,
      body: form ?? (options.body === undefined ? undefined : JSON.stringify(options.body)),
      signal: options.signal,
      onUploadProgress: options.onUploadProgress,
    });
  } catch (error) {
    if ((error as { name?: string }).name === 'AbortError') throw error;
    serverUnreachable(probeServer);
    throw new ApiError(
      0,
      'network',
      "Couldn't reach Clearwood. Check your connection and try again.",
    );
  }

  serverReached();
  if (!response.ok) {
    const error = await toApiError(response);
    if (method !== 'GET' && error.status === 403 && error.code === 'csrf-invalid' && !retried) {
      resetCsrfToken();
      return request<T>(path, options, true);
    }
    throw error;
  }
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(path, { ...options, method: 'GET' }),
  post: <T>(path: string, body?: unknown) => request<T>(path, { method: 'POST', body }),
  patch: <T>(path: string, body?: unknown) => request<T>(path, { method: 'PATCH', body }),
  /** A multipart form, such as a photo in the field `file`; `upload` follows its bytes. */
  postForm: <T>(
    path: string,
    form: FormData,
    upload?: Pick<RequestOptions, 'headers' | 'onUploadProgress' | 'signal'>,
  ) => request<T>(path, { ...upload, method: 'POST', body: form }),
  delete: <T>(path: string) => request<T>(path, { method: 'DELETE' }),
};
