import { env } from '@/config/env';

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
}

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

async function request<T>(path: string, options: RequestOptions = {}, retried = false): Promise<T> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  // A form (a file upload) sets its own multipart type and boundary.
  const form = options.body instanceof FormData ? options.body : undefined;
  if (options.body !== undefined && !form) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['x-csrf-token'] = await getCsrfToken();

  let response: Response;
  try {
    response = await fetch(buildUrl(path, options.query), {
      method,
      headers,
      body: form ?? (options.body === undefined ? undefined : JSON.stringify(options.body)),
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (error) {
    if ((error as { name?: string }).name === 'AbortError') throw error;
    throw new ApiError(
      0,
      'network',
      "Couldn't reach Clearwood. Check your connection and try again.",
    );
  }

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
  /** A multipart form, such as a photo in the field `file`. */
  postForm: <T>(path: string, form: FormData) => request<T>(path, { method: 'POST', body: form }),
  delete: <T>(path: string) => request<T>(path, { method: 'DELETE' }),
};
