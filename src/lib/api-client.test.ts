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

describe('a form sent with its upload followed', () => {
  it('when a file is posted with upload progress, then the bytes sent are told, and the token, headers and answer are as for any request', async () => {
    const server = mockApi({
      'POST /api/uploads': (() => ({ status: 201, body: { id: 7 } })) satisfies Handler,
    });
    const form = new FormData();
    form.append('file', new File(['x'.repeat(1000)], 'a.csv'));
    const told: [number, number][] = [];
    const answer = await api.postForm('/uploads', form, {
      headers: { 'x-import-id': 'id-1' },
      onUploadProgress: (sent, total) => told.push([sent, total]),
    });
    expect(answer).toEqual({ id: 7 });
    expect(told).toEqual([
      [500, 1000],
      [1000, 1000],
    ]);
    const [sent] = server.to('POST /api/uploads');
    expect(sent.headers.get('x-csrf-token')).toBe('token-1');
    expect(sent.headers.get('x-import-id')).toBe('id-1');
    // The upload went by XMLHttpRequest, not fetch (which cannot tell its bytes).
    expect(vi.mocked(fetch).mock.calls.map((c) => String(c[0]))).toEqual(['/api/auth/csrf']);
  });

  it('when the answer is an error, then it is the same ApiError as by fetch', async () => {
    mockApi({
      'POST /api/uploads': (() => ({
        status: 422,
        body: { error: { code: 'rows-rejected', message: '2 rows need attention' } },
      })) satisfies Handler,
    });
    const error = await api
      .postForm('/uploads', new FormData(), { onUploadProgress: () => undefined })
      .catch((e: unknown) => e);
    expect(error).toMatchObject({
      status: 422,
      code: 'rows-rejected',
      message: '2 rows need attention',
    });
  });
});
