import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter, Outlet, Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { User } from '@shared/schemas/auth';
import type { TeamMember } from '@shared/schemas/users';
import { TeamPage } from '@/app/routes/team/team';
import { description, typeInto } from '../helpers/form-events';

const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
const ME: User = { id: uuid(1), email: 'admin@x.test', name: 'Avery Admin', role: 'admin', shopId: null, homeLocationId: null };
const SHOP = { id: uuid(9), name: 'Northgate Garage' };
// Invented stores of an invented chain.
const STORES = [
  { id: uuid(21), name: 'Fenwick Row', address: '1 Fenwick Row', phone: '555-0101', openingHours: '' },
  { id: uuid(22), name: 'Saltmarsh', address: '9 Dyke Lane', phone: '555-0102', openingHours: '' },
];
const member = (n: number, name: string, role: TeamMember['role'], over: Partial<TeamMember> = {}): TeamMember => ({
  id: uuid(n),
  email: `${name.split(' ')[0]!.toLowerCase()}@x.test`,
  name,
  role,
  shopId: null,
  homeLocationId: null,
  disabled: false,
  shopName: null,
  invitePending: false,
  createdAt: '2026-11-02T09:00:00.000Z',
  ...over,
});
const USERS = [
  member(1, 'Avery Admin', 'admin'),
  member(2, 'Blair Clerk', 'clerk', { homeLocationId: uuid(21) }),
  member(3, 'Casey Buyer', 'buyer'),
];

type Sent = { method: string; path: string; body: unknown };
let sent: Sent[];
/** What the next POST or PATCH answers: status and body. */
let nextWrite: { status: number; body: unknown };

beforeEach(() => {
  sent = [];
  nextWrite = { status: 200, body: null };
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init: RequestInit = {}) => {
      const path = new URL(input, 'http://team.test').pathname;
      const method = init.method ?? 'GET';
      const json = (status: number, body: unknown) =>
        new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
      if (path === '/api/auth/csrf') return json(200, { token: 't' });
      if (method === 'GET' && path === '/api/users') return json(200, { users: USERS });
      if (method === 'GET' && path === '/api/shops') return json(200, { shops: [SHOP] });
      if (method === 'GET' && path === '/api/locations') return json(200, { locations: STORES });
      sent.push({ method, path, body: JSON.parse(String(init.body ?? 'null')) });
      return json(nextWrite.status, nextWrite.body);
    }),
  );
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderTeam() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={['/team']}>
        <Routes>
          <Route element={<Outlet context={ME} />}>
            <Route path="/team" element={<TeamPage />} />
          </Route>
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return screen.findByRole('form', { name: 'Invite a user' });
}

describe('the invite form (react-hook-form on the shared invite schema)', () => {
  it('sends nothing while a field is wrong, and names each wrong field by its label in plain words', async () => {
    const form = await renderTeam();
    typeInto(within(form).getByLabelText('E-mail'), 'not-an-address');
    fireEvent.click(within(form).getByRole('button', { name: 'Send invitation' }));
    const name = within(form).getByLabelText('Name');
    // Messages from shared/validation/plain-words.ts, led by the field's label.
    await waitFor(() => expect(description(name)).toBe('Name must not be blank'));
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(description(within(form).getByLabelText('E-mail'))).toBe('E-mail must be an e-mail address');
    expect(sent).toEqual([]);
  });

  it('asks for a shop when the role is technician, under the Shop field', async () => {
    const form = await renderTeam();
    typeInto(within(form).getByLabelText('Name'), 'Robin Tech');
    typeInto(within(form).getByLabelText('E-mail'), 'robin@x.test');
    fireEvent.change(within(form).getByLabelText('Role'), { target: { value: 'technician' } });
    const shop = within(form).getByLabelText('Shop') as HTMLSelectElement;
    expect(shop.disabled).toBe(false);
    fireEvent.click(within(form).getByRole('button', { name: 'Send invitation' }));
    await waitFor(() => expect(description(shop)).toBe('A technician belongs to a shop: choose one'));
    expect(sent).toEqual([]);

    await screen.findByRole('option', { name: SHOP.name });
    fireEvent.change(shop, { target: { value: SHOP.id } });
    nextWrite = { status: 201, body: { user: member(7, 'Robin Tech', 'technician'), expiresAt: '2026-12-04T15:04:00.000Z' } };
    fireEvent.click(within(form).getByRole('button', { name: 'Send invitation' }));
    await screen.findByText(/Invitation sent/);
    expect(sent).toEqual([
      {
        method: 'POST',
        path: '/api/users/invite',
        body: { name: 'Robin Tech', email: 'robin@x.test', role: 'technician', shopId: SHOP.id },
      },
    ]);
    expect((within(form).getByLabelText('Name') as HTMLInputElement).value).toBe('');
  });

  it("sends the home store chosen for the store's staff, and none for a technician", async () => {
    const form = await renderTeam();
    typeInto(within(form).getByLabelText('Name'), 'Robin Clerk');
    typeInto(within(form).getByLabelText('E-mail'), 'robin@x.test');
    const home = within(form).getByLabelText('Home store') as HTMLSelectElement;
    expect(
      within(home)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['The chain’s first store', 'Fenwick Row', 'Saltmarsh']);
    fireEvent.change(home, { target: { value: uuid(22) } });
    nextWrite = { status: 201, body: { user: member(8, 'Robin Clerk', 'clerk'), expiresAt: '2026-12-04T15:04:00.000Z' } };
    fireEvent.click(within(form).getByRole('button', { name: 'Send invitation' }));
    await screen.findByText(/Invitation sent/);
    expect(sent).toEqual([
      {
        method: 'POST',
        path: '/api/users/invite',
        body: { name: 'Robin Clerk', email: 'robin@x.test', role: 'clerk', shopId: null, homeLocationId: uuid(22) },
      },
    ]);
    // A technician works at a shop: the home store is not theirs to have.
    fireEvent.change(within(form).getByLabelText('Role'), { target: { value: 'technician' } });
    expect(home.disabled).toBe(true);
  });

  it("puts the API's field details on their fields, once, and what no field shows above the button", async () => {
    const form = await renderTeam();
    typeInto(within(form).getByLabelText('Name'), 'Robin');
    typeInto(within(form).getByLabelText('E-mail'), 'robin@x.test');
    nextWrite = {
      status: 400,
      body: {
        error: {
          code: 'validation_failed',
          message: 'email is already on the team',
          details: [
            { field: 'email', message: 'is already on the team' },
            { field: '(body)', message: 'One invitation at a time.' },
          ],
        },
      },
    };
    fireEvent.click(within(form).getByRole('button', { name: 'Send invitation' }));
    const email = within(form).getByLabelText('E-mail');
    await waitFor(() => expect(description(email)).toBe('E-mail is already on the team'));
    expect(within(form).getAllByText(/already on the team/)).toHaveLength(1);
    expect(within(form).getByRole('alert').textContent).toBe('One invitation at a time.');
    // Typing again clears the server's message: it was about the old value.
    typeInto(email, 'robin2@x.test');
    await waitFor(() => expect(description(email)).toBe(''));
  });
});

describe('the team table (DataTable)', () => {
  const names = () =>
    within(screen.getByRole('table', { name: 'People' }))
      .getAllByRole('row')
      .slice(1)
      .map((r) => r.firstElementChild?.textContent);

  it('sorts by name, then by role, saying which way in aria-sort', async () => {
    await renderTeam();
    await screen.findByRole('table', { name: 'People' });
    expect(names()).toEqual(['Avery Admin', 'Blair Clerk', 'Casey Buyer']);
    const nameHeader = screen.getByRole('columnheader', { name: /Name/ });
    expect(nameHeader.getAttribute('aria-sort')).toBe('ascending');
    fireEvent.click(within(nameHeader).getByRole('button'));
    expect(nameHeader.getAttribute('aria-sort')).toBe('descending');
    expect(names()).toEqual(['Casey Buyer', 'Blair Clerk', 'Avery Admin']);

    const roleHeader = screen.getByRole('columnheader', { name: /Role/ });
    fireEvent.click(within(roleHeader).getByRole('button'));
    expect(roleHeader.getAttribute('aria-sort')).toBe('ascending');
    expect(nameHeader.getAttribute('aria-sort')).toBe('none');
    expect(names()).toEqual(['Avery Admin', 'Casey Buyer', 'Blair Clerk']);
    // Columns a person would not sort by have no sort button.
    expect(within(screen.getByRole('columnheader', { name: 'E-mail' })).queryByRole('button')).toBeNull();
  });

  it("shows each person's home store and moves them to another at once (no sign-out, so no question)", async () => {
    await renderTeam();
    const home = (await screen.findByLabelText('Home store of Blair Clerk')) as HTMLSelectElement;
    await waitFor(() => expect(home.value).toBe(uuid(21)));
    expect(home.selectedOptions[0]?.textContent).toBe('Fenwick Row');
    nextWrite = { status: 200, body: { user: member(2, 'Blair Clerk', 'clerk', { homeLocationId: uuid(22) }) } };
    fireEvent.change(home, { target: { value: uuid(22) } });
    await waitFor(() => expect(sent).toEqual([{ method: 'PATCH', path: `/api/users/${uuid(2)}`, body: { homeLocationId: uuid(22) } }]));
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('asks before a role change: Cancel changes nothing, confirming sends it', async () => {
    await renderTeam();
    const select = (await screen.findByLabelText('Role of Blair Clerk')) as HTMLSelectElement;
    fireEvent.change(select, { target: { value: 'buyer' } });
    let dialog = await screen.findByRole('dialog', { name: 'Make Blair Clerk a buyer?' });
    expect(dialog.textContent).toContain('signed out at once');
    // Cancel has the focus first, so Enter never confirms by accident.
    expect(document.activeElement).toBe(within(dialog).getByRole('button', { name: 'Cancel' }));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(sent).toEqual([]);
    expect(select.value).toBe('clerk');

    fireEvent.change(select, { target: { value: 'buyer' } });
    dialog = await screen.findByRole('dialog', { name: 'Make Blair Clerk a buyer?' });
    nextWrite = { status: 200, body: { user: member(2, 'Blair Clerk', 'buyer') } };
    fireEvent.click(within(dialog).getByRole('button', { name: 'Make buyer' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(sent).toEqual([{ method: 'PATCH', path: `/api/users/${uuid(2)}`, body: { role: 'buyer' } }]);
  });

  it('asks before disabling someone, keeps the dialog open with the reason when it fails, and never offers to disable oneself', async () => {
    await renderTeam();
    await screen.findByRole('table', { name: 'People' });
    const rowOf = (name: string) => screen.getByRole('cell', { name }).closest('tr') as HTMLElement;
    expect(within(rowOf('Avery Admin')).queryByRole('button', { name: 'Disable' })).toBeNull();
    fireEvent.click(within(rowOf('Casey Buyer')).getByRole('button', { name: 'Disable' }));
    const dialog = await screen.findByRole('dialog', { name: 'Disable Casey Buyer?' });
    nextWrite = { status: 409, body: { error: { code: 'conflict', message: 'Casey Buyer is the last buyer.' } } };
    fireEvent.click(within(dialog).getByRole('button', { name: 'Disable Casey Buyer' }));
    expect((await within(dialog).findByRole('alert')).textContent).toBe('Casey Buyer is the last buyer.');
    expect(sent).toEqual([{ method: 'PATCH', path: `/api/users/${uuid(3)}`, body: { disabled: true } }]);
    expect(screen.getAllByText('Casey Buyer is the last buyer.')).toHaveLength(1);
  });
});
