import { onlineManager } from '@tanstack/react-query';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { api } from './api-client';
import { PROBE_INTERVAL_MS, serverReached } from './connectivity';

afterEach(() => {
  serverReached();
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('knowing whether the server can be reached', () => {
  it('when a request cannot reach the server, then the app counts as offline until a probe gets an answer', async () => {
    vi.useFakeTimers();
    const fetchMock = vi.fn().mockRejectedValue(new TypeError('Failed to fetch'));
    vi.stubGlobal('fetch', fetchMock);
    expect(onlineManager.isOnline()).toBe(true);

    await expect(api.get('/sugarbushes/3/round')).rejects.toMatchObject({ code: 'network' });
    expect(onlineManager.isOnline()).toBe(false);

    // Still unreachable at the first probe.
    await vi.advanceTimersByTimeAsync(PROBE_INTERVAL_MS);
    expect(onlineManager.isOnline()).toBe(false);
    expect(fetchMock).toHaveBeenCalledTimes(2);
    expect(String(fetchMock.mock.calls[1]?.[0])).toMatch(/\/auth\/me$/);

    // Any answer, even a refusal, means the network carries again.
    fetchMock.mockResolvedValue(new Response('{}', { status: 401 }));
    await vi.advanceTimersByTimeAsync(PROBE_INTERVAL_MS);
    expect(onlineManager.isOnline()).toBe(true);
    await vi.advanceTimersByTimeAsync(PROBE_INTERVAL_MS * 3);
    expect(fetchMock).toHaveBeenCalledTimes(3);
  });

  it('when a request is aborted by the app, then nothing changes', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn().mockRejectedValue(new DOMException('The request was aborted', 'AbortError')),
    );
    await expect(api.get('/sugarbushes/3/round')).rejects.toMatchObject({ name: 'AbortError' });
    expect(onlineManager.isOnline()).toBe(true);
  });
});
