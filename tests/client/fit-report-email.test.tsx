import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { EmailForm } from '@/features/fit-reports/components/email-form';

const REPORT_ID = '33333333-3333-4333-8333-333333333333';

function stubApi() {
  const sent: { method: string; path: string; body: unknown }[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init?: RequestInit) => {
      const method = init?.method ?? 'GET';
      const path = new URL(input, 'http://reports.test').pathname;
      sent.push({ method, path, body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined });
      const reply = path === '/api/auth/csrf' ? { token: 'tok-1' } : { sent: true };
      return new Response(JSON.stringify(reply), { status: 200, headers: { 'content-type': 'application/json' } });
    }),
  );
  return sent;
}

function renderForm() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <EmailForm reportId={REPORT_ID} />
    </QueryClientProvider>,
  );
  return screen.getByRole('form', { name: 'E-mail the fit report' });
}

describe('e-mailing a fit report', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('says a bad address by its field and sends nothing', async () => {
    const sent = stubApi();
    const form = renderForm();
    fireEvent.change(within(form).getByLabelText('E-mail to'), { target: { value: 'customer at home' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send' }));
    expect(await within(form).findByText('E-mail to must be an e-mail address')).toBeTruthy();
    expect(sent.filter((s) => s.method === 'POST')).toEqual([]);
  });

  it('says where it was sent only while that address is the one in the box', async () => {
    const sent = stubApi();
    const form = renderForm();
    const to = within(form).getByLabelText('E-mail to');
    fireEvent.change(to, { target: { value: 'wren.customer@example.test' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send' }));
    await waitFor(() => expect(within(form).getByRole('status').textContent).toBe('Sent to wren.customer@example.test.'));
    expect(sent.find((s) => s.method === 'POST')).toMatchObject({
      path: `/api/fit-reports/${REPORT_ID}/email`,
      body: { to: 'wren.customer@example.test' },
    });
    // Another address typed: the confirmation no longer speaks of what is shown.
    fireEvent.change(to, { target: { value: 'someone.else@example.test' } });
    await waitFor(() => expect(within(form).getByRole('status').textContent).toBe(''));
  });
});
