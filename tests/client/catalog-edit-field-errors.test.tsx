import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter, Outlet, Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { User } from '@shared/schemas/auth';
import type { PartSummary } from '@shared/schemas/parts';
import { CatalogPage } from '@/app/routes/catalog/catalog';

// Fixtures shaped as the API answers them; the page parses every answer with its schemas.
const PLUG_ID = '11111111-1111-4111-8111-111111111111';
const COIL_ID = '22222222-2222-4222-8222-222222222222';
const NEXT_ID = '33333333-3333-4333-8333-333333333333';
const BRAND_ID = '44444444-4444-4444-8444-444444444444';

const summary = (id: string, partNumber: string, kind: 'coil' | 'plug', hasSpec: boolean): PartSummary => ({
  id,
  brand: 'Quaywell',
  ours: true,
  partNumber,
  kind,
  description: `${kind} ${partNumber}`,
  gtin: null,
  status: 'active',
  supersededById: null,
  hasSpec,
});
const PLUG_SPEC = {
  threadMm: 14,
  threadPitchMm: 1.25,
  reachMm: 19,
  seat: 'flat',
  hexMm: 16,
  heatCode: '6',
  heatStep: 5,
  gapMm: 0.8,
  regappable: false,
  resistor: true,
  resistorKohm: 5,
  projectedTip: true,
  electrode: 'iridium',
};
const detail = (part: PartSummary, spec: unknown) => ({
  part,
  spec,
  interchange: [],
  supersession: { supersedes: [], supersededBy: null, current: { id: part.id, partNumber: part.partNumber } },
  stock: { inStock: true, here: { locationId: '00000000-0000-4000-8000-0000000000a1', onHand: 2, bin: 'B-01-1' }, elsewhere: [] },
  price: null,
  sellPriceBasis: null,
  prices: [],
});
const BRANDS = {
  brands: [
    {
      id: BRAND_ID,
      name: 'Quaywell',
      ours: true,
      heatCodeNote: 'Numbered 4–12; a higher number is a colder plug.',
      heatCodes: [4, 5, 6, 7].map((n) => ({ code: String(n), heatStep: n - 1 })),
    },
  ],
};
const hit = (id: string, partNumber: string) => ({
  partId: id,
  brand: 'Quaywell',
  partNumber,
  kind: 'coil',
  description: `coil ${partNumber}`,
  matchedBy: 'number',
  matchedNumber: partNumber,
  inStock: true,
  onHand: 1,
  hasSpec: true,
});

type Reply = { status: number; body: unknown };
const error = (status: number, code: string, message: string, details?: unknown): Reply => ({
  status,
  body: { error: details === undefined ? { code, message } : { code, message, details } },
});

interface Sent {
  method: string;
  path: string;
  query: URLSearchParams;
  body: unknown;
}

/** A stand-in for the API: answers by "METHOD /path", records what was sent. */
function stubApi(answers: Record<string, Reply>) {
  const sent: Sent[] = [];
  const base: Record<string, Reply> = {
    'GET /api/auth/csrf': { status: 200, body: { token: 'tok-1' } },
    'GET /api/brands': { status: 200, body: BRANDS },
    [`GET /api/parts/${PLUG_ID}`]: { status: 200, body: detail(summary(PLUG_ID, 'QW-SP 1406', 'plug', true), PLUG_SPEC) },
    [`GET /api/parts/${COIL_ID}`]: { status: 200, body: detail(summary(COIL_ID, 'QW-IC 3190', 'coil', false), null) },
    'GET /api/search': { status: 200, body: { hits: [hit(NEXT_ID, 'QW-IC 3191')], total: 1, facets: {} } },
  };
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init?: RequestInit) => {
      const method = init?.method ?? 'GET';
      const url = new URL(input, 'http://catalog.test');
      const path = url.pathname;
      sent.push({ method, path, query: url.searchParams, body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined });
      const reply =
        answers[`${method} ${path}`] ?? base[`${method} ${path}`] ?? error(404, 'not_found', `No API route for ${method} ${path}.`);
      return new Response(JSON.stringify(reply.body), { status: reply.status, headers: { 'content-type': 'application/json' } });
    }),
  );
  return sent;
}

function renderCatalog(search: string) {
  const user: User = {
    id: '00000000-0000-4000-8000-000000000002',
    email: 'b@x.test',
    name: 'Blake Buyer',
    role: 'buyer',
    shopId: null,
    homeLocationId: null,
  };
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={[`/catalog${search}`]}>
        <Routes>
          <Route element={<Outlet context={user} />}>
            <Route path="/catalog" element={<CatalogPage />} />
          </Route>
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

/** The block a field sits in: its label, its control and its message. */
const besideField = (control: HTMLElement) => within(control.closest('div')!);
const changes = (sent: Sent[]) => sent.filter((s) => s.method !== 'GET');

describe('Catalog page: messages by their fields', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('checks a GTIN on the client first, beside the field, and sends nothing', async () => {
    const sent = stubApi({});
    renderCatalog(`?part=${PLUG_ID}`);
    const form = await screen.findByRole('form', { name: 'Part details' });
    const gtin = within(form).getByLabelText('GTIN');
    // 4006381333932 with its last digit changed: the check digit no longer fits.
    fireEvent.change(gtin, { target: { value: '4006381333933' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save details' }));
    expect(await besideField(gtin).findByText('The GTIN check digit is wrong')).toBeTruthy();
    expect(gtin.getAttribute('aria-invalid')).toBe('true');
    expect(changes(sent)).toEqual([]);
  });

  it("puts each of the API's spec messages beside its own field", async () => {
    const sent = stubApi({
      [`PATCH /api/parts/${PLUG_ID}`]: error(400, 'validation_failed', 'plug.reachMm: Too big: expected number to be <=40', [
        { field: 'plug.reachMm', message: 'Too big: expected number to be <=40' },
        { field: 'plug.heatCode', message: 'unknown heat code' },
      ]),
    });
    renderCatalog(`?part=${PLUG_ID}`);
    const form = await screen.findByRole('form', { name: 'Plug spec' });
    // Every field carries its unit; the heat code shows the step it stands for.
    expect(within(form).getByLabelText('Reach (mm)')).toBeTruthy();
    expect(within(form).getByLabelText('Resistor value (kΩ)')).toBeTruthy();
    const heatCode = within(form).getByLabelText('Heat code') as HTMLSelectElement;
    expect(heatCode.selectedOptions[0]?.textContent).toBe('6 — heat step 5');
    fireEvent.change(within(form).getByLabelText('Gap (mm)'), { target: { value: '0,9' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save spec' }));

    const reach = within(form).getByLabelText('Reach (mm)');
    await waitFor(() => expect(besideField(reach).getByText('Too big: expected number to be <=40')).toBeTruthy());
    expect(besideField(heatCode).getByText('Unknown heat code')).toBeTruthy();
    expect(besideField(within(form).getByLabelText('Hex (mm)')).queryByText(/./, { selector: 'p.text-nogo' })).toBeNull();
    // The decimal comma was read as a point.
    const patch = changes(sent)[0]!;
    expect(patch.body).toMatchObject({ plug: { gapMm: 0.9, heatCode: '6', reachMm: 19 } });
  });

  it('shows why the server refused a supersession, by the picker', async () => {
    const sent = stubApi({
      [`PATCH /api/parts/${COIL_ID}`]: error(400, 'bad_request', 'supersededById: that would make a supersession loop'),
    });
    renderCatalog(`?part=${COIL_ID}`);
    const section = await screen.findByRole('region', { name: 'Supersession' });
    const box = within(section).getByLabelText('Set superseded by');
    fireEvent.change(box, { target: { value: 'QW-IC 3191' } });
    fireEvent.click(await within(section).findByRole('button', { name: /QW-IC 3191/ }));
    fireEvent.click(within(section).getByRole('button', { name: 'Save supersession' }));
    const alert = await within(section).findByRole('alert');
    expect(alert.textContent).toBe('Not saved: that would make a supersession loop.');
    expect(changes(sent)[0]).toMatchObject({ method: 'PATCH', body: { supersededById: NEXT_ID } });
    // The search asked for coils only: a coil is superseded by a coil.
    const asked = sent.find((s) => s.path === '/api/search');
    expect(asked?.query.get('kind')).toBe('coil');
    expect(asked?.query.get('q')).toBe('QW-IC 3191');
  });

  it('says a part without spec has no verdict, and offers to add one', async () => {
    stubApi({});
    renderCatalog(`?part=${COIL_ID}`);
    const section = await screen.findByRole('region', { name: 'Coil spec' });
    expect(within(section).getByText('no spec — no verdict')).toBeTruthy();
    fireEvent.click(within(section).getByRole('button', { name: 'Add a spec' }));
    const form = within(section).getByRole('form', { name: 'Coil spec' });
    const fill = (label: string, value: string) => fireEvent.change(within(form).getByLabelText(label), { target: { value } });
    const save = () => fireEvent.click(within(form).getByRole('button', { name: 'Save spec' }));
    fill('Primary resistance, min (Ω)', '0.9');
    fill('Primary resistance, max (Ω)', '0.6');
    save();
    expect(
      await besideField(within(form).getByLabelText('Primary inductance (mH)')).findByText('Primary inductance is required'),
    ).toBeTruthy();
    expect(besideField(within(form).getByLabelText('Outputs')).getByText('Outputs is required')).toBeTruthy();
    // With every field given, the window itself is checked, in the form's own words.
    fill('Outputs', '1');
    fill('Connector pins', '3');
    fill('Connector key', 'A');
    fill('Primary inductance (mH)', '3.4');
    fill('Turns ratio (:1)', '90');
    fill('Peak primary current (A)', '7.5');
    save();
    const min = within(form).getByLabelText('Primary resistance, min (Ω)');
    expect(await besideField(min).findByText("Primary resistance, min must not be above the window's max")).toBeTruthy();
    expect(besideField(within(form).getByLabelText('Primary inductance (mH)')).queryByText(/required/)).toBeNull();
  });

  it('on a new part, shows a number already on file and a refused spec field beside their fields', async () => {
    stubApi({
      'POST /api/parts': error(409, 'conflict', 'That already exists.', { constraint: 'part_brand_number_uq' }),
    });
    renderCatalog('?view=new');
    const form = await screen.findByRole('form', { name: 'Add a part' });
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    // Nothing chosen or typed yet: the client names both fields.
    expect(await besideField(within(form).getByLabelText('Brand')).findByText('Brand is required')).toBeTruthy();
    expect(besideField(within(form).getByLabelText('Part number')).getByText('Part number must not be blank')).toBeTruthy();

    await within(form).findByRole('option', { name: 'Quaywell' });
    fireEvent.change(within(form).getByLabelText('Brand'), { target: { value: 'Quaywell' } });
    fireEvent.change(within(form).getByLabelText('Part number'), { target: { value: 'QW-SP 1406' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    const number = within(form).getByLabelText('Part number');
    await waitFor(() => expect(besideField(number).getByText('This brand already has a part with this number')).toBeTruthy());
  });

  it("on a new part, places the API's message on a spec field", async () => {
    const sent = stubApi({
      'POST /api/parts': error(400, 'bad_request', 'plug.heatCode: "7" is not in this brand\'s heat table', [
        { field: 'plug.heatCode', message: 'unknown heat code' },
      ]),
    });
    renderCatalog('?view=new');
    const form = await screen.findByRole('form', { name: 'Add a part' });
    await within(form).findByRole('option', { name: 'Quaywell' });
    fireEvent.change(within(form).getByLabelText('Brand'), { target: { value: 'Quaywell' } });
    fireEvent.change(within(form).getByLabelText('Part number'), { target: { value: 'QW-SP 1999' } });
    fireEvent.click(within(form).getByLabelText('Add its plug spec now'));
    const fill = (label: string, value: string) => fireEvent.change(within(form).getByLabelText(label), { target: { value } });
    fill('Thread (mm)', '14');
    fill('Thread pitch (mm)', '1.25');
    fill('Reach (mm)', '19');
    fill('Hex (mm)', '16');
    fill('Heat code', '7');
    fill('Gap (mm)', '0.8');
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    const heatCode = within(form).getByLabelText('Heat code');
    await waitFor(() => expect(besideField(heatCode).getByText('Unknown heat code')).toBeTruthy());
    expect(changes(sent)[0]?.body).toMatchObject({
      brand: 'Quaywell',
      partNumber: 'QW-SP 1999',
      kind: 'plug',
      plug: { heatCode: '7', reachMm: 19 },
    });
  });
});
