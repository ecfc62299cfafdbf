import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Transfer } from '@shared/schemas/locations';
import { TransfersPage } from '@/app/routes/transfers/transfers';
import { AskForPart } from '@/features/transfers/components/ask-for-part';
import { description, typeInto } from '../helpers/form-events';

const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
// Invented stores and an invented part.
const FENWICK = { id: uuid(21), name: 'Fenwick Row' };
const SALTMARSH = { id: uuid(22), name: 'Saltmarsh' };
const PART = { id: uuid(5), brand: 'Tessaly', partNumber: 'TS-88' };

const transfer = (over: Partial<Transfer> = {}): Transfer => ({
  id: uuid(40),
  partId: PART.id,
  partNumber: PART.partNumber,
  brand: PART.brand,
  from: SALTMARSH,
  to: FENWICK,
  quantity: 2,
  state: 'requested',
  refusalReason: null,
  requestedBy: 'Robin Clerk',
  createdAt: '2026-12-05T09:00:00.000Z',
  updatedAt: '2026-12-05T09:00:00.000Z',
  steps: ['pick', 'refuse'],
  ...over,
});

type Sent = { method: string; path: string; body: unknown };
let sent: Sent[];
let listed: Transfer[];
let transferGets: number;
/** What the next POST answers; `after` changes the list the server would show next. */
let nextWrite: { status: number; body: unknown; after?: Transfer[] };

beforeEach(() => {
  sent = [];
  listed = [transfer()];
  transferGets = 0;
  nextWrite = { status: 200, body: null };
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init: RequestInit = {}) => {
      const path = new URL(input, 'http://transfers.test').pathname;
      const method = init.method ?? 'GET';
      const json = (status: number, body: unknown) =>
        new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
      if (path === '/api/auth/csrf') return json(200, { token: 't' });
      if (method === 'GET' && path === '/api/transfers') {
        transferGets++;
        return json(200, { transfers: listed, total: listed.length });
      }
      sent.push({ method, path, body: JSON.parse(String(init.body ?? 'null')) });
      if (nextWrite.after) listed = nextWrite.after;
      return json(nextWrite.status, nextWrite.body);
    }),
  );
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderAt(path: string, element: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={[path]}>
        <Routes>
          <Route path={path} element={element} />
          <Route path="/transfers" element={<h1>Transfers page</h1>} />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('asking another store for a part (the part panel)', () => {
  const open = async () => {
    renderAt('/counter', <AskForPart part={PART} elsewhere={[{ locationId: SALTMARSH.id, name: SALTMARSH.name, onHand: 3 }]} />);
    fireEvent.click(screen.getByRole('button', { name: 'Ask Saltmarsh…' }));
    return screen.findByRole('dialog', { name: 'Ask Saltmarsh for TS-88' });
  };

  it('offers no store that holds none', () => {
    renderAt('/counter', <AskForPart part={PART} elsewhere={[{ locationId: SALTMARSH.id, name: SALTMARSH.name, onHand: 0 }]} />);
    expect(screen.queryByRole('button')).toBeNull();
  });

  it('holds the quantity to 1 up to what the other store has, and sends nothing until it is', async () => {
    const dialog = await open();
    const qty = within(dialog).getByLabelText('Quantity');
    typeInto(qty, '4');
    fireEvent.click(within(dialog).getByRole('button', { name: 'Ask Saltmarsh' }));
    await waitFor(() => expect(description(qty)).toContain('Quantity must be at most 3'));
    typeInto(qty, '0');
    await waitFor(() => expect(description(qty)).toContain('Quantity must be at least 1'));
    expect(sent).toEqual([]);
  });

  it('posts the transfer, says so and links to Transfers', async () => {
    const dialog = await open();
    typeInto(within(dialog).getByLabelText('Quantity'), '2');
    nextWrite = { status: 201, body: { transfer: transfer() } };
    fireEvent.click(within(dialog).getByRole('button', { name: 'Ask for 2 from Saltmarsh' }));
    expect((await within(dialog).findByRole('status')).textContent).toContain('Asked Saltmarsh for 2 × Tessaly TS-88.');
    expect(sent).toEqual([
      { method: 'POST', path: '/api/transfers', body: { partId: PART.id, fromLocationId: SALTMARSH.id, quantity: 2 } },
    ]);
    fireEvent.click(within(dialog).getByRole('link', { name: 'Follow it on Transfers' }));
    await screen.findByRole('heading', { name: 'Transfers page' });
  });
});

describe('the Transfers page', () => {
  const row = async () => (await screen.findByRole('cell', { name: 'Tessaly TS-88' })).closest('tr') as HTMLElement;

  it('refuses only with a reason, given in a dialog', async () => {
    renderAt('/transfers-list', <TransfersPage />);
    fireEvent.click(within(await row()).getByRole('button', { name: 'Refuse…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Refuse 2 × Tessaly TS-88?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Refuse the request' }));
    const reason = within(dialog).getByLabelText('Reason');
    await waitFor(() => expect(description(reason)).toContain('Reason must not be blank'));
    expect(sent).toEqual([]);

    typeInto(reason, 'Set aside for a customer.');
    nextWrite = {
      status: 200,
      body: { transfer: transfer({ state: 'refused', refusalReason: 'Set aside for a customer.', steps: [] }) },
      after: [transfer({ state: 'refused', refusalReason: 'Set aside for a customer.', steps: [] })],
    };
    fireEvent.click(within(dialog).getByRole('button', { name: 'Refuse the request' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(sent).toEqual([
      { method: 'POST', path: `/api/transfers/${uuid(40)}/steps`, body: { step: 'refuse', reason: 'Set aside for a customer.' } },
    ]);
    await within(await row()).findByText('Set aside for a customer.');
  });

  it('says in plain words that someone else acted first, and reads the list again', async () => {
    renderAt('/transfers-list', <TransfersPage />);
    const before = await row();
    await waitFor(() => expect(transferGets).toBe(1));
    nextWrite = {
      status: 409,
      body: {
        error: {
          code: 'conflict',
          message: 'This transfer is no longer requested: someone else acted on it first.',
          details: { state: 'cancelled' },
        },
      },
      after: [transfer({ state: 'cancelled', steps: [] })],
    };
    fireEvent.click(within(before).getByRole('button', { name: 'Mark picked' }));
    expect((await screen.findByRole('alert')).textContent).toBe(
      'Someone else acted on this transfer first, so “Mark picked” was not done. The list now shows where it stands.',
    );
    await waitFor(() => expect(transferGets).toBe(2));
    await within(await row()).findByText('Cancelled');
    expect(within(await row()).queryByRole('button')).toBeNull();
  });
});
