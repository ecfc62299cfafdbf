import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { JobSummary } from '@shared/schemas/jobs';
import { JobsPage } from '@/app/routes/jobs/jobs';

// Shaped as GET /api/jobs answers (the client parses every answer with the shared schemas).
const FAILED: JobSummary = {
  id: '11111111-1111-4111-8111-111111111111',
  name: 'mail.send',
  state: 'failed',
  summary: 'Fit report e-mail to shop@example.test',
  attempts: 7,
  maxAttempts: 7,
  lastError: 'connect ECONNREFUSED 127.0.0.1:2525',
  createdAt: '2026-11-02T09:00:00.000Z',
  lastAttemptAt: '2026-11-02T09:20:00.000Z',
  nextAttemptAt: null,
  failedAt: '2026-11-02T09:20:01.000Z',
};
const RETRYING: JobSummary = {
  ...FAILED,
  id: '22222222-2222-4222-8222-222222222222',
  name: 'search.refresh',
  state: 'retry',
  summary: '3 parts',
  attempts: 2,
  lastError: 'Request to the search service has failed',
  nextAttemptAt: '2026-11-02T09:21:00.000Z',
  failedAt: null,
};

/** A stand-in for the API: the jobs list, the CSRF token and the retry, each call recorded. */
function stubApi() {
  const calls: { method: string; path: string; csrf: string | null }[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init: RequestInit = {}) => {
      const path = new URL(input, 'http://jobs.test').pathname;
      const method = init.method ?? 'GET';
      calls.push({ method, path, csrf: new Headers(init.headers).get('x-csrf-token') });
      const json = (body: unknown) => new Response(JSON.stringify(body), { status: 200, headers: { 'content-type': 'application/json' } });
      if (path === '/api/auth/csrf') return json({ token: 'csrf-token-1' });
      if (path === '/api/jobs') return json({ jobs: [FAILED, RETRYING] });
      if (method === 'POST' && path === `/api/jobs/${FAILED.id}/retry`) return json({ job: { ...FAILED, state: 'retry', maxAttempts: 8 } });
      return new Response(JSON.stringify({ error: { code: 'not_found', message: 'no route' } }), { status: 404 });
    }),
  );
  return calls;
}

describe('Jobs page', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('lists failed and retrying jobs; only a failed one has Retry, which posts with the CSRF token and reloads the list', async () => {
    const calls = stubApi();
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <JobsPage />
      </QueryClientProvider>,
    );
    const table = await screen.findByRole('table', { name: 'Jobs' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[0]!.textContent).toContain('E-mail');
    expect(rows[0]!.textContent).toContain('Fit report e-mail to shop@example.test');
    expect(rows[0]!.textContent).toContain('failed');
    expect(rows[0]!.textContent).toContain('7 of 7');
    expect(rows[0]!.textContent).toContain('ECONNREFUSED');
    expect(rows[1]!.textContent).toContain('Search index refresh');
    expect(rows[1]!.textContent).toContain('retrying at');
    expect(within(rows[1]!).queryByRole('button')).toBeNull();

    const listLoads = () => calls.filter((c) => c.method === 'GET' && c.path === '/api/jobs').length;
    const before = listLoads();
    fireEvent.click(within(rows[0]!).getByRole('button', { name: /Retry E-mail/ }));
    await vi.waitFor(() => expect(listLoads()).toBeGreaterThan(before));
    expect(calls.find((c) => c.method === 'POST')).toEqual({ method: 'POST', path: `/api/jobs/${FAILED.id}/retry`, csrf: 'csrf-token-1' });
  });
});
