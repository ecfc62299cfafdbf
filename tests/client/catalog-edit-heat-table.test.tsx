import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { BrandForm } from '@/features/catalog-edit/components/brand-form';
import { heatDirection } from '@/features/catalog-edit/heat-table';

interface Sent {
  method: string;
  path: string;
  headers: Record<string, string>;
  body: unknown;
}

/** The API as far as the brand form talks to it: the CSRF token, then POST /api/brands answered by `answer`. */
function stubApi(answer: (body: unknown) => { status: number; body: unknown }) {
  const sent: Sent[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init?: RequestInit) => {
      const method = init?.method ?? 'GET';
      const path = new URL(input, 'http://catalog.test').pathname;
      const body: unknown = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
      sent.push({ method, path, headers: (init?.headers ?? {}) as Record<string, string>, body });
      const reply =
        path === '/api/auth/csrf'
          ? { status: 200, body: { token: 'tok-1' } }
          : method === 'POST' && path === '/api/brands'
            ? answer(body)
            : { status: 200, body: { brands: [] } };
      return new Response(JSON.stringify(reply.body), { status: reply.status, headers: { 'content-type': 'application/json' } });
    }),
  );
  return sent;
}

function renderForm() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <BrandForm />
    </QueryClientProvider>,
  );
  return screen.getByRole('form', { name: 'Add a brand' });
}

const input = (form: HTMLElement, label: string) => within(form).getByLabelText(label) as HTMLInputElement | HTMLSelectElement;
const set = (form: HTMLElement, label: string, value: string) => fireEvent.change(input(form, label), { target: { value } });

function fillRun(form: HTMLElement, from: string, to: string, firstStep: string, nextIs: 'colder' | 'hotter') {
  set(form, 'Run from code', from);
  set(form, 'Run to code', to);
  set(form, 'Heat step of the first code', firstStep);
  set(form, 'Each next code is', nextIs);
  fireEvent.click(within(form).getByRole('button', { name: 'Fill' }));
}

const scale = (form: HTMLElement) => within(form).getByRole('list', { name: 'Heat codes on the heat-step scale' });

describe('the heat-table editor', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('fills a run whose codes run hotter, draws it on the scale and reads the direction back', () => {
    stubApi(() => ({ status: 201, body: {} }));
    const form = renderForm();
    // A brand that numbers hotter plugs higher: code 2 is step 9, code 5 step 6.
    fillRun(form, '2', '5', '9', 'hotter');
    expect(['2', '3', '4', '5'].map((_, i) => input(form, `Heat code, row ${i + 1}`).value)).toEqual(['2', '3', '4', '5']);
    expect(['9', '8', '7', '6'].map((_, i) => input(form, `Heat step, row ${i + 1}`).value)).toEqual(['9', '8', '7', '6']);
    expect(within(scale(form)).getByRole('listitem', { name: 'step 9: code 2' })).toBeTruthy();
    expect(within(scale(form)).getByRole('listitem', { name: 'step 6: code 5' })).toBeTruthy();
    expect(within(scale(form)).getByRole('listitem', { name: 'step 1: no code' })).toBeTruthy();
    expect(form.textContent).toContain('By this table, a higher number is a hotter plug.');
  });

  it('refuses a run that falls off the 1–15 scale and leaves the table as it was', () => {
    stubApi(() => ({ status: 201, body: {} }));
    const form = renderForm();
    fillRun(form, '2', '9', '12', 'colder');
    expect(within(form).getByRole('alert').textContent).toBe('8 codes from step 12 would end at step 19, off the 1–15 scale');
    expect(within(form).queryByLabelText('Heat code, row 1')).toBeNull();
  });

  it('adds a row one step colder than the last, and Enter in the last code adds the next', () => {
    stubApi(() => ({ status: 201, body: {} }));
    const form = renderForm();
    fillRun(form, 'R', 'T', '4', 'colder');
    fireEvent.click(within(form).getByRole('button', { name: 'Add a heat code' }));
    expect(input(form, 'Heat step, row 4').value).toBe('7');
    set(form, 'Heat code, row 4', 'U');
    fireEvent.keyDown(input(form, 'Heat code, row 4'), { key: 'Enter' });
    expect(input(form, 'Heat step, row 5').value).toBe('8');
    fireEvent.click(within(form).getByRole('button', { name: 'Remove row 5' }));
    expect(within(form).queryByLabelText('Heat code, row 5')).toBeNull();
    expect(form.textContent).toContain('By this table, a later letter is a colder plug.');
  });

  it('marks a repeated code and a missing step on their rows and sends nothing', async () => {
    const sent = stubApi(() => ({ status: 201, body: {} }));
    const form = renderForm();
    set(form, 'Brand name', 'Tamsin Plugs');
    fireEvent.click(within(form).getByRole('button', { name: 'Add a heat code' }));
    fireEvent.click(within(form).getByRole('button', { name: 'Add a heat code' }));
    fireEvent.click(within(form).getByRole('button', { name: 'Add a heat code' }));
    set(form, 'Heat code, row 1', '5');
    set(form, 'Heat step, row 1', '4');
    set(form, 'Heat code, row 2', '5');
    set(form, 'Heat step, row 2', '5');
    set(form, 'Heat code, row 3', '6');
    set(form, 'Heat step, row 3', '');
    fireEvent.click(within(form).getByRole('button', { name: 'Add brand' }));
    const row = (n: number) => input(form, `Heat code, row ${n}`).closest('tr')!;
    expect(await within(row(1)).findByText('this code is in the table twice')).toBeTruthy();
    expect(within(row(2)).getByText('this code is in the table twice')).toBeTruthy();
    expect(within(row(3)).getByText('choose a heat step')).toBeTruthy();
    expect(within(row(3)).queryByText('this code is in the table twice')).toBeNull();
    expect(input(form, 'Heat step, row 3').getAttribute('aria-invalid')).toBe('true');
    expect(sent.filter((s) => s.method === 'POST')).toEqual([]);
  });

  it('sends the brand with its table through the API, with the CSRF token, and says what was added', async () => {
    const brand = {
      id: '44444444-4444-4444-8444-444444444444',
      name: 'Tamsin Plugs',
      ours: true,
      heatCodeNote: 'Numbered 5–7; a higher number is a colder plug.',
      heatCodes: [5, 6, 7].map((n) => ({ code: String(n), heatStep: n + 1 })),
    };
    const sent = stubApi(() => ({ status: 201, body: { brand } }));
    const form = renderForm();
    set(form, 'Brand name', 'Tamsin Plugs');
    fireEvent.click(within(form).getByLabelText(/One of our lines/));
    set(form, 'Which way the codes run', 'Numbered 5–7; a higher number is a colder plug.');
    fillRun(form, '5', '7', '6', 'colder');
    fireEvent.click(within(form).getByRole('button', { name: 'Add brand' }));
    const note = await within(form).findByRole('status');
    expect(note.textContent).toContain('Brand added');
    expect(note.textContent).toContain('5 → 6, 6 → 7, 7 → 8');
    const post = sent.find((s) => s.method === 'POST')!;
    expect(post.path).toBe('/api/brands');
    expect(post.headers['x-csrf-token']).toBe('tok-1');
    expect(post.body).toEqual({
      name: 'Tamsin Plugs',
      ours: true,
      heatCodeNote: 'Numbered 5–7; a higher number is a colder plug.',
      heatCodes: [
        { code: '5', heatStep: 6 },
        { code: '6', heatStep: 7 },
        { code: '7', heatStep: 8 },
      ],
    });
    // The form starts over for the next brand.
    await waitFor(() => expect(input(form, 'Brand name').value).toBe(''));
    expect(within(form).queryByLabelText('Heat code, row 1')).toBeNull();
  });

  it('shows a name already on file beside the name', async () => {
    stubApi(() => ({
      status: 409,
      body: { error: { code: 'conflict', message: 'That already exists.', details: { constraint: 'brand_name_norm_key' } } },
    }));
    const form = renderForm();
    set(form, 'Brand name', 'Quaywell');
    fireEvent.click(within(form).getByRole('button', { name: 'Add brand' }));
    const name = input(form, 'Brand name');
    await waitFor(() => expect(within(name.closest('div')!).getByText('A brand by this name is already on file')).toBeTruthy());
    expect(name.getAttribute('aria-invalid')).toBe('true');
  });
});

describe('which way a heat table runs', () => {
  it('reads numbers by value, not as text, and says when a table runs both ways', () => {
    // "10" sorts before "9" as text; by value it is the coldest here.
    expect(heatDirection([9, 10, 11].map((n, i) => ({ code: String(n), heatStep: 3 + i })))).toEqual({ unit: 'number', nextIs: 'colder' });
    expect(
      heatDirection([
        { code: 'R', heatStep: 6 },
        { code: 'S', heatStep: 5 },
      ]),
    ).toEqual({ unit: 'letter', nextIs: 'hotter' });
    expect(
      heatDirection([
        { code: '4', heatStep: 3 },
        { code: '5', heatStep: 5 },
        { code: '6', heatStep: 4 },
      ]),
    ).toEqual({ unit: 'number', nextIs: 'mixed' });
    expect(
      heatDirection([
        { code: '6-9', heatStep: 3 },
        { code: '7-9', heatStep: 4 },
      ]),
    ).toBeNull();
  });
});
