import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError, apiGet, apiPatch, apiPost, onUnauthorized } from '../../../src/api/client';

function respond(status: number, body?: unknown, headers: Record<string, string> = {}) {
  const text = body === undefined ? '' : typeof body === 'string' ? body : JSON.stringify(body);
  const fetchMock = vi.fn(async () => new Response(status === 204 ? null : text, { status, headers }));
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

afterEach(() => {
  vi.unstubAllGlobals();
  onUnauthorized(null);
});

describe('api client', () => {
  it('returns the data of a success body', async () => {
    respond(200, { data: [{ id: 1 }] });
    await expect(apiGet('/api/tubes')).resolves.toEqual([{ id: 1 }]);
  });

  it('sends JSON with the session cookie', async () => {
    const fetchMock = respond(201, { data: { id: 7 } });
    await apiPost('/api/tubes', { name: 'A' });
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/tubes');
    expect(init.method).toBe('POST');
    expect(init.credentials).toBe('same-origin');
    expect(init.body).toBe('{"name":"A"}');
    expect((init.headers as Record<string, string>)['Content-Type']).toBe('application/json');
  });

  it('returns undefined for 204 No Content', async () => {
    respond(204);
    await expect(apiPost('/api/auth/sign-out')).resolves.toBeUndefined();
  });

  it('throws an ApiError carrying code, message and issues of the error body', async () => {
    const issues = [{ path: 'maxTempC', message: 'The lowest temperature must be below the highest' }];
    respond(400, { error: { code: 'validation', message: 'Check the fields', issues } });
    const error = await apiPatch('/api/tubes/3', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'validation', message: 'Check the fields', issues });
  });

  it('turns a non-JSON failure (proxy error page) into a readable ApiError', async () => {
    respond(502, '<html>Bad gateway</html>');
    await expect(apiGet('/api/tubes')).rejects.toMatchObject({ status: 502, code: 'server_error' });
  });

  it('reads Retry-After on 429', async () => {
    respond(429, { error: { code: 'rate_limited', message: 'Too many attempts' } }, { 'Retry-After': '120' });
    await expect(apiPost('/api/auth/sign-in', {})).rejects.toMatchObject({ status: 429, retryAfterSeconds: 120 });
  });

  it('reports an unreachable server as status 0', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('fetch failed'))));
    await expect(apiGet('/api/me')).rejects.toMatchObject({ status: 0, code: 'network_error' });
  });

  it('tells the unauthorized listener about a 401, unless the call expects one', async () => {
    const listener = vi.fn();
    onUnauthorized(listener);
    respond(401, { error: { code: 'unauthenticated', message: 'Sign in' } });
    await apiGet('/api/tubes').catch(() => undefined);
    expect(listener).toHaveBeenCalledTimes(1);
    await apiGet('/api/me', { notifyUnauthorized: false }).catch(() => undefined);
    expect(listener).toHaveBeenCalledTimes(1);
  });

  it('rejects a success body without data', async () => {
    respond(200, { tubes: [] });
    await expect(apiGet('/api/tubes')).rejects.toMatchObject({ code: 'bad_response' });
  });
});
