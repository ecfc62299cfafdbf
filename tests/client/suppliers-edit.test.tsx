import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Supplier } from '@shared/schemas/suppliers';
import { SuppliersTable } from '@/features/suppliers/components/suppliers-table';

// Invented suppliers, shaped as GET /api/suppliers answers them.
const supplier = (id: string, name: string, key: string, lastPriceListAt: string | null): Supplier => ({
  id,
  key,
  name,
  contactEmail: null,
  phone: null,
  mapping: null,
  lastPriceListAt,
  lastPriceListId: null,
  createdAt: '2026-11-02T09:00:00.000Z',
  archivedAt: null,
});
const TARNLEY = supplier('11111111-1111-4111-8111-111111111111', 'Tarnley Wholesale', 'tarnley', '2026-12-01T10:00:00.000Z');
const ASHCOMBE = supplier('22222222-2222-4222-8222-222222222222', 'Ashcombe Motor Factors', 'ashcombe', null);

interface Sent {
  method: string;
  path: string;
  body: unknown;
}

function stubApi() {
  const sent: Sent[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init?: RequestInit) => {
      const method = init?.method ?? 'GET';
      const path = new URL(input, 'http://suppliers.test').pathname;
      const body: unknown = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
      sent.push({ method, path, body });
      const reply =
        path === '/api/auth/csrf'
          ? { token: 'tok-1' }
          : { supplier: { ...TARNLEY, ...(body as object), contactEmail: 'orders@tarnley.test' } };
      return new Response(JSON.stringify(reply), { status: 200, headers: { 'content-type': 'application/json' } });
    }),
  );
  return sent;
}

function renderTable() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <SuppliersTable suppliers={[TARNLEY, ASHCOMBE]} />
    </QueryClientProvider>,
  );
}

describe('the suppliers table', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('lists suppliers by name, and sorts by the last price list on request', () => {
    renderTable();
    const names = () =>
      screen
        .getAllByRole('row')
        .slice(1)
        .map((r) => within(r).getAllByRole('cell')[0]!.textContent);
    expect(names()).toEqual(['Ashcombe Motor Factors', 'Tarnley Wholesale']);
    expect(within(screen.getAllByRole('row')[1]!).getByText('none yet')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: /Last price list/ }));
    fireEvent.click(screen.getByRole('button', { name: /Last price list/ }));
    expect(names()).toEqual(['Tarnley Wholesale', 'Ashcombe Motor Factors']);
  });

  it('edits a supplier in a dialog: a bad address is said by its field and nothing is sent; a good one is saved', async () => {
    const sent = stubApi();
    renderTable();
    fireEvent.click(screen.getByRole('button', { name: 'Edit Tarnley Wholesale' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Tarnley Wholesale' });
    const form = within(dialog).getByRole('form', { name: 'Edit Tarnley Wholesale' });
    expect((within(form).getByLabelText('Key') as HTMLInputElement).value).toBe('tarnley');
    const email = within(form).getByLabelText('Contact e-mail');
    fireEvent.change(email, { target: { value: 'orders at tarnley' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    expect(await within(email.closest('div')!).findByText('Contact e-mail must be an e-mail address')).toBeTruthy();
    expect(email.getAttribute('aria-invalid')).toBe('true');
    expect(sent.filter((s) => s.method !== 'GET')).toEqual([]);

    fireEvent.change(email, { target: { value: ' Orders@Tarnley.test ' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    const patch = sent.find((s) => s.method === 'PATCH');
    expect(patch?.path).toBe(`/api/suppliers/${TARNLEY.id}`);
    // The shared e-mail schema trims and lower-cases; an empty phone is sent as none.
    expect(patch?.body).toEqual({ name: 'Tarnley Wholesale', key: 'tarnley', contactEmail: 'orders@tarnley.test', phone: null });
  });
});
