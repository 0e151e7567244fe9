import { mockApi, type Handler } from '@/test/api-mock';
import { api, ApiError } from './api-client';

describe('the API client', () => {
  it('when a change is refused for an expired CSRF token, then it fetches a new token and retries once', async () => {
    let token = 0;
    let posts = 0;
    const server = mockApi({
      'GET /api/auth/csrf': (() => ({
        status: 200,
        body: { token: `token-${++token}` },
      })) satisfies Handler,
      'POST /api/things': (() =>
        ++posts === 1
          ? { status: 403, body: { error: { code: 'csrf-invalid', message: 'The form expired' } } }
          : { status: 201, body: { id: 1 } }) satisfies Handler,
    });

    await expect(api.post('/things', { a: 1 })).resolves.toEqual({ id: 1 });
    const sent = server.to('POST /api/things').map((r) => r.headers.get('x-csrf-token'));
    expect(sent).toEqual(['token-1', 'token-2']);
  });

  it('when the retry is refused too, then the error reaches the caller', async () => {
    mockApi({
      'POST /api/things': (() => ({
        status: 403,
        body: { error: { code: 'csrf-invalid', message: 'The form expired' } },
      })) satisfies Handler,
    });
    await expect(api.post('/things')).rejects.toMatchObject({ status: 403, code: 'csrf-invalid' });
  });

  it('turns an error answer into an ApiError with its code, message and fields', async () => {
    mockApi({
      'GET /api/things': (() => ({
        status: 400,
        body: {
          error: { code: 'invalid-input', message: 'Check the fields', fields: { tag: 'Taken' } },
        },
      })) satisfies Handler,
    });
    const error = await api.get('/things').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'invalid-input', fields: { tag: 'Taken' } });
  });

  it('sends no CSRF token with reads, and the session cookie with everything', async () => {
    const server = mockApi({ 'GET /api/things': [] });
    await api.get('/things', { query: { page: 2, q: undefined } });
    const [read] = server.requests;
    expect(read.headers.has('x-csrf-token')).toBe(false);
    expect(read.url.search).toBe('?page=2');
    expect(vi.mocked(fetch).mock.calls[0][1]?.credentials).toBe('same-origin');
  });
});
