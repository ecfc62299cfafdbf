import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { MemoryRouter, Outlet, Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Role } from '@shared/roles';
import type { User } from '@shared/schemas/auth';
import type { PartSummary } from '@shared/schemas/parts';
import { CounterPage } from '@/app/routes/counter/counter';

// Ids as the API writes them (UUIDs).
const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
const [SUPPLIER, ENGINE_ID, C1, P1, P2, A1, A2] = [1, 2, 3, 4, 5, 6, 7].map(uuid) as [
  string,
  string,
  string,
  string,
  string,
  string,
  string,
];

// Fixtures shaped as the API answers (the client parses every answer with the shared schemas).
const part = (id: string, partNumber: string, kind: 'coil' | 'plug', hasSpec = true): PartSummary => ({
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
const price = (listCents: number) => ({
  supplierId: SUPPLIER,
  supplier: 'Pellworth Distribution',
  listCents,
  coreCents: 0,
  packQty: 1,
  effectiveDate: '2026-10-01',
});
const coilSpec = {
  architecture: 'coil-on-plug',
  driver: 'integrated',
  outputs: 1,
  connectorPins: 3,
  connectorKey: 'A',
  primaryOhmMin: 0.5,
  primaryOhmMax: 0.7,
  primaryInductanceMh: 3.4,
  secondaryKohmMin: null,
  secondaryKohmMax: null,
  turnsRatio: 90,
  availableKv: 36,
  peakCurrentA: 7.5,
};
const ENGINE = {
  engine: {
    id: ENGINE_ID,
    code: 'VK18',
    description: '1.8 L inline-4',
    displacementL: 1.8,
    cylinders: 4,
    compressionRatio: 10,
    aspiration: 'natural',
    peakBoostKpa: 0,
    rodRatio: 3.3,
    specGapMm: 1,
    dwellMs: 2.8,
    crankingDwellMs: 4.2,
    driverCurrentLimitA: null,
    systemVoltage: 12,
  },
  fitments: [
    {
      part: part(C1, 'QW-IC 3101', 'coil'),
      spec: coilSpec,
      position: 'ignition coil',
      quantity: 4,
      stock: { inStock: true, here: { locationId: '00000000-0000-4000-8000-0000000000a1', onHand: 14, bin: 'A-01-1' }, elsewhere: [] },
      price: price(4999),
    },
  ],
};
const searchHit = (id: string, partNumber: string, hasSpec = true) => ({
  partId: id,
  brand: 'Quaywell',
  partNumber,
  kind: 'plug',
  description: `plug ${partNumber}`,
  matchedBy: 'number',
  matchedNumber: partNumber.replace(/\W/g, ''),
  inStock: true,
  stock: { inStock: true, here: { locationId: '00000000-0000-4000-8000-0000000000a1', onHand: 3, bin: 'B-09-9' }, elsewhere: [] },
  hasSpec,
});
const partDetail = (p: PartSummary, spec: unknown, prices: unknown[]) => ({
  part: p,
  spec,
  interchange: [],
  supersession: { supersedes: [], supersededBy: null, current: { id: p.id, partNumber: p.partNumber } },
  stock: { inStock: true, here: { locationId: '00000000-0000-4000-8000-0000000000a1', onHand: 3, bin: 'B-09-9' }, elsewhere: [] },
  price: price(999),
  sellPriceBasis: null,
  prices,
});

interface Call {
  url: URL;
  at: number;
}

/** A stand-in for the API: answers by path, records every call with its time. */
function stubApi(extra: Record<string, unknown> = {}) {
  const calls: Call[] = [];
  const answers: Record<string, unknown> = {
    '/api/vehicles/years': { years: [2013, 2012] },
    '/api/vehicles/makes': { makes: ['Varrick'] },
    '/api/vehicles/models': { models: ['Halvard'] },
    '/api/vehicles/engines': { engines: [{ id: ENGINE_ID, code: 'VK18', label: '1.8 L 4-cyl (VK18) — Plus' }] },
    [`/api/engines/${ENGINE_ID}`]: ENGINE,
    '/api/search': { hits: [searchHit(P1, 'QW-SP 1406'), searchHit(P2, 'QW-SP 9999', false)], total: 2, facets: {} },
    [`/api/parts/${P2}`]: partDetail(part(P2, 'QW-SP 9999', 'plug', false), null, [price(999)]),
    ...extra,
  };
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string) => {
      const url = new URL(input, 'http://counter.test');
      calls.push({ url, at: performance.now() });
      const body = answers[url.pathname];
      if (body === undefined) {
        return new Response(JSON.stringify({ error: { code: 'not_found', message: `No API route for GET ${url.pathname}.` } }), {
          status: 404,
        });
      }
      return new Response(JSON.stringify(body), { status: 200, headers: { 'content-type': 'application/json' } });
    }),
  );
  return calls;
}

function renderCounter(role: Role = 'clerk') {
  const user: User = {
    id: '00000000-0000-4000-8000-000000000001',
    email: 'c@x.test',
    name: 'Casey Clerk',
    role,
    shopId: null,
    homeLocationId: null,
  };
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={['/counter']}>
        <Routes>
          <Route element={<Outlet context={user} />}>
            <Route path="/counter" element={<CounterPage />} />
          </Route>
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

const searches = (calls: Call[]) => calls.filter((c) => c.url.pathname === '/api/search' && c.url.searchParams.get('limit') !== '1');

describe('Counter page', () => {
  beforeEach(() => {
    cleanup();
  });
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('greets the user and puts the keyboard in the search box', async () => {
    stubApi();
    renderCounter();
    expect(screen.getByRole('heading', { level: 1, name: 'Counter' })).toBeTruthy();
    expect(screen.getByText('Good to see you, Casey.')).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByLabelText('Number, words or barcode'));
  });

  it('searches after a pause in typing, not on every keystroke', async () => {
    const calls = stubApi();
    renderCounter();
    const box = screen.getByLabelText('Number, words or barcode');
    fireEvent.change(box, { target: { value: 'Q' } });
    fireEvent.change(box, { target: { value: 'QW' } });
    fireEvent.change(box, { target: { value: 'QW-SP 1406' } });
    await vi.waitFor(() => expect(searches(calls).length).toBe(1), { timeout: 1000 });
    expect(searches(calls)[0]!.url.searchParams.get('q')).toBe('QW-SP 1406');
    await screen.findByRole('gridcell', { name: 'QW-SP 1406' });
  });

  it('runs the search at once on Enter, as a barcode scanner sends it', async () => {
    const calls = stubApi();
    renderCounter();
    const box = screen.getByLabelText('Number, words or barcode');
    fireEvent.change(box, { target: { value: '2091450031018' } });
    const pressed = performance.now();
    fireEvent.keyDown(box, { key: 'Enter' });
    // Well inside the 150 ms typing pause: the call came from Enter, not from the pause.
    await vi.waitFor(() => expect(searches(calls).length).toBe(1), { timeout: 100, interval: 5 });
    expect(searches(calls)[0]!.at - pressed).toBeLessThan(100);
    expect(searches(calls)[0]!.url.searchParams.get('q')).toBe('2091450031018');
  });

  it('opens a part without spec as "no spec — no verdict", and shows a clerk no cost', async () => {
    stubApi();
    renderCounter();
    fireEvent.change(screen.getByLabelText('Number, words or barcode'), { target: { value: 'QW-SP' } });
    fireEvent.click(await screen.findByRole('gridcell', { name: 'QW-SP 9999' }));
    const panel = await screen.findByRole('region', { name: 'Part QW-SP 9999' });
    await within(panel).findByText('no spec — no verdict');
    expect(within(panel).getByText('$9.99', { selector: 'span.text-xl' })).toBeTruthy();
    expect(within(panel).queryByRole('columnheader', { name: 'Cost' })).toBeNull();
  });

  it('shows cost and margin per supplier when the server sends them (buyer)', async () => {
    stubApi({
      [`/api/parts/${P2}`]: partDetail(part(P2, 'QW-SP 9999', 'plug', false), null, [{ ...price(999), costCents: 400, marginPct: 60 }]),
    });
    renderCounter('buyer');
    fireEvent.change(screen.getByLabelText('Number, words or barcode'), { target: { value: 'QW-SP' } });
    fireEvent.click(await screen.findByRole('gridcell', { name: 'QW-SP 9999' }));
    const panel = await screen.findByRole('region', { name: 'Part QW-SP 9999' });
    await within(panel).findByRole('columnheader', { name: 'Cost' });
    expect(within(panel).getByText('$4.00')).toBeTruthy();
    expect(within(panel).getByText('60%')).toBeTruthy();
  });

  it('walks year → make → model → engine, each list fetched after the one before, and copes with no alternates route', async () => {
    const calls = stubApi();
    renderCounter();
    const year = screen.getByLabelText('Year');
    await within(year).findByRole('option', { name: '2012' });
    expect(calls.some((c) => c.url.pathname === '/api/vehicles/makes')).toBe(false);
    fireEvent.change(year, { target: { value: '2012' } });
    const make = screen.getByLabelText('Make');
    await within(make).findByRole('option', { name: 'Varrick' });
    expect(calls.find((c) => c.url.pathname === '/api/vehicles/makes')!.url.searchParams.get('year')).toBe('2012');
    fireEvent.change(make, { target: { value: 'Varrick' } });
    const model = screen.getByLabelText('Model');
    await within(model).findByRole('option', { name: 'Halvard' });
    fireEvent.change(model, { target: { value: 'Halvard' } });
    const engine = screen.getByLabelText('Engine');
    await within(engine).findByRole('option', { name: /VK18/ });
    fireEvent.change(engine, { target: { value: ENGINE_ID } });

    const coil = await screen.findByRole('region', { name: 'Fitted ignition coil' });
    await within(coil).findByRole('button', { name: 'QW-IC 3101' });
    expect(coil.textContent).toContain('14 here · bin A-01-1');
    expect(coil.textContent).toContain('$49.99');
    // The alternates route answers 404 here: the slot says so instead of failing the page.
    await within(coil).findByText('Ranked alternates are not available yet.');
    expect(calls.find((c) => c.url.pathname === `/api/engines/${ENGINE_ID}/alternates`)!.url.searchParams.get('kind')).toBe('coil');

    // Changing the year clears what follows it.
    fireEvent.change(year, { target: { value: '2013' } });
    expect((screen.getByLabelText('Make') as HTMLSelectElement).value).toBe('');
    expect(screen.queryByRole('region', { name: 'Fitted ignition coil' })).toBeNull();
  });

  it('lists ranked alternates with verdict words and Compare links, and asks for no-go ones when told', async () => {
    const alternate = (id: string, partNumber: string, verdict: 'go' | 'review' | 'no-go') => ({
      part: part(id, partNumber, 'coil'),
      verdict,
      deviation: 0,
      checks: [{ id: 'connector', verdict, original: 'A', substitute: 'C', unit: '', reason: `Connector ${verdict}.` }],
      stock: { inStock: true, here: { locationId: '00000000-0000-4000-8000-0000000000a1', onHand: 5, bin: 'C-02-1' }, elsewhere: [] },
      price: price(5299),
    });
    const calls = stubApi({
      [`/api/engines/${ENGINE_ID}/alternates`]: {
        original: part(C1, 'QW-IC 3101', 'coil'),
        alternates: [alternate(A1, 'QW-IC 3102', 'go'), alternate(A2, 'QW-IC 3104', 'review')],
      },
    });
    renderCounter();
    await within(screen.getByLabelText('Year')).findByRole('option', { name: '2012' });
    fireEvent.change(screen.getByLabelText('Year'), { target: { value: '2012' } });
    await within(screen.getByLabelText('Make')).findByRole('option', { name: 'Varrick' });
    fireEvent.change(screen.getByLabelText('Make'), { target: { value: 'Varrick' } });
    await within(screen.getByLabelText('Model')).findByRole('option', { name: 'Halvard' });
    fireEvent.change(screen.getByLabelText('Model'), { target: { value: 'Halvard' } });
    await within(screen.getByLabelText('Engine')).findByRole('option', { name: /VK18/ });
    fireEvent.change(screen.getByLabelText('Engine'), { target: { value: ENGINE_ID } });

    const list = await screen.findByRole('list', { name: 'coil alternates' });
    const items = within(list).getAllByRole('listitem');
    expect(items.map((li) => within(li).getAllByRole('button')[0]!.textContent)).toEqual(['QW-IC 3102', 'QW-IC 3104']);
    expect(within(items[0]!).getByText('go')).toBeTruthy();
    expect(within(items[1]!).getByText('review')).toBeTruthy();
    expect(within(items[1]!).getByText('Connector review.')).toBeTruthy();
    // Stock reads as it does for the fitted part (shared/format.ts formatStock), not "in stock: yes".
    expect(items[0]!.textContent).toContain('5 here · bin C-02-1');
    expect(within(items[0]!).getByRole('link', { name: 'Compare' }).getAttribute('href')).toBe(
      `/compare?original=${C1}&substitute=${A1}&engine=${ENGINE_ID}`,
    );

    fireEvent.click(screen.getByLabelText('show no-go too'));
    await vi.waitFor(() =>
      expect(calls.some((c) => c.url.pathname === `/api/engines/${ENGINE_ID}/alternates` && c.url.searchParams.get('all') === '1')).toBe(
        true,
      ),
    );
  });
});
