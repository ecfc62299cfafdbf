import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError, forgetCsrfToken, setUnauthorizedHandler } from '@/lib/api-client';
import { navFor } from '@/app/nav';
import { login } from '@/features/auth/api/login';
import { logout } from '@/features/auth/api/logout';

function respond(status: number, body: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

describe('api client', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('throws a typed ApiError built from the error shape', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => respond(409, { error: { code: 'conflict', message: 'Already there.', details: { field: 'email' } } })),
    );
    const err = await api('GET', '/api/anything').catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect(err).toMatchObject({ status: 409, code: 'conflict', message: 'Already there.', details: { field: 'email' } });
  });

  it('sends the CSRF token on a state change, fetching it first', async () => {
    const calls: { url: string; headers: Record<string, string> }[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        calls.push({ url, headers: (init?.headers ?? {}) as Record<string, string> });
        return url === '/api/auth/csrf' ? respond(200, { token: 'tok-123' }) : respond(200, { ok: true });
      }),
    );
    await api('POST', '/api/things', { body: { a: 1 } });
    expect(calls.map((c) => c.url)).toEqual(['/api/auth/csrf', '/api/things']);
    expect(calls[1]?.headers['x-csrf-token']).toBe('tok-123');
  });

  it('fetches a new CSRF token after sign-in and after sign-out, since the token is bound to the session', async () => {
    const calls: { url: string; token?: string }[] = [];
    let issued = 0;
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        calls.push({ url, token: (init?.headers as Record<string, string> | undefined)?.['x-csrf-token'] });
        if (url === '/api/auth/csrf') return respond(200, { token: `tok-${++issued}` });
        if (url === '/api/auth/login')
          return respond(200, {
            user: {
              id: '00000000-0000-4000-8000-000000000001',
              email: 'c@example.test',
              name: 'C',
              role: 'clerk',
              shopId: null,
              homeLocationId: null,
            },
          });
        if (url === '/api/auth/logout') return new Response(null, { status: 204 });
        return respond(200, { ok: true });
      }),
    );
    forgetCsrfToken();
    await login({ email: 'c@example.test', password: 'whatever-1234' });
    await api('POST', '/api/things', { body: {} });
    await logout();
    await api('POST', '/api/things', { body: {} });
    const sent = calls.filter((c) => c.url !== '/api/auth/csrf').map((c) => `${c.url} ${c.token}`);
    expect(sent).toEqual(['/api/auth/login tok-1', '/api/things tok-2', '/api/auth/logout tok-2', '/api/things tok-3']);
  });

  it('calls the unauthorized handler on a 401 unless told not to', async () => {
    const handler = vi.fn();
    setUnauthorizedHandler(handler);
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => respond(401, { error: { code: 'unauthorized', message: 'Sign in.' } })),
    );
    await expect(api('GET', '/api/x')).rejects.toBeInstanceOf(ApiError);
    expect(handler).toHaveBeenCalledTimes(1);
    await expect(api('GET', '/api/x', { allowUnauthorized: true })).rejects.toBeInstanceOf(ApiError);
    expect(handler).toHaveBeenCalledTimes(1);
  });

  it('a non-JSON failure still becomes an ApiError', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response('<html>bad gateway</html>', { status: 502 })),
    );
    await expect(api('GET', '/api/x')).rejects.toMatchObject({ status: 502, code: 'internal' });
  });
});

describe('role-aware navigation', () => {
  it('shows Team and Outbox to admins only', () => {
    expect(navFor('admin').map((i) => i.label)).toEqual(expect.arrayContaining(['Team', 'Outbox', 'Counter']));
    for (const role of ['clerk', 'technician', 'buyer'] as const) {
      expect(navFor(role).map((i) => i.label)).not.toContain('Team');
      expect(navFor(role).map((i) => i.label)).toContain('Counter');
    }
  });
});
