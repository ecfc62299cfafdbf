import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen, within } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { PriceList, PriceListCounts } from '@shared/schemas/price-lists';
import { PriceMove } from '@/features/price-lists/components/change-table';
import { PriceListIntake } from '@/features/price-lists/components/intake';
import { PreviewCounts } from '@/features/price-lists/components/preview-counts';
import { formatMoney, formatPercentChange } from '@shared/format';
import { percentChange } from '@/features/price-lists/format';

// The clean sample's preview as seed/csv/README.md states it.
const CLEAN_COUNTS: PriceListCounts = { total: 40, new: 4, changed: 5, unchanged: 31, rejected: 0, firstPrices: 0, supersessions: 1 };

function countOf(label: string): string {
  const dl = screen.getByLabelText('Preview counts');
  const term = within(dl).getByText(label, { selector: 'dt' });
  return term.parentElement?.querySelector('dd')?.textContent ?? '';
}

describe('preview counts', () => {
  afterEach(cleanup);

  it('shows each count under its name', () => {
    render(<PreviewCounts counts={CLEAN_COUNTS} flagged={1} thresholdPct={15} />);
    expect(countOf('Rows in file')).toBe('40');
    expect(countOf('New parts')).toBe('4');
    expect(countOf('Price changes')).toBe('5');
    expect(countOf('Supersessions')).toBe('1');
    expect(countOf('Unchanged')).toBe('31');
    expect(countOf('Rejected rows')).toBe('0');
    expect(screen.queryByText(/first from this supplier/)).toBeNull();
  });

  it('names flagged moves in words with the threshold, and leaves the note out when there are none', () => {
    render(<PreviewCounts counts={CLEAN_COUNTS} flagged={1} thresholdPct={15} />);
    expect(screen.getByText('Flagged')).toBeTruthy();
    expect(screen.getByText(/1 price moves by more than 15%/)).toBeTruthy();
    cleanup();
    render(<PreviewCounts counts={CLEAN_COUNTS} flagged={0} thresholdPct={15} />);
    expect(screen.queryByText('Flagged')).toBeNull();
  });

  it('says how many price changes are a first price from this supplier', () => {
    render(<PreviewCounts counts={{ ...CLEAN_COUNTS, changed: 41, firstPrices: 36 }} flagged={0} thresholdPct={null} />);
    expect(countOf('Price changes')).toBe('41');
    expect(screen.getByText('36 first from this supplier')).toBeTruthy();
  });

  it('groups large counts', () => {
    const big = { total: 100000, new: 1200, changed: 98000, unchanged: 0, rejected: 800, firstPrices: 0, supersessions: 0 };
    render(<PreviewCounts counts={big} flagged={0} thresholdPct={15} />);
    expect(countOf('Rows in file')).toBe('100,000');
    expect(countOf('Rejected rows')).toBe('800');
  });
});

describe('price moves', () => {
  afterEach(cleanup);

  it('prints old → new with the percent of the old price', () => {
    // NR/IR 2208 in the clean sample: cost 6.40 → 7.60, +18.8 %.
    render(<PriceMove from={640} to={760} />);
    expect(document.body.textContent).toBe('$6.40→$7.60+18.8%');
    expect(formatPercentChange(percentChange(3480, 3390) ?? 0)).toBe('\u22122.6%');
    expect(formatMoney(123450)).toBe('$1,234.50');
    expect(percentChange(null, 500)).toBeNull();
  });

  it('prefers the percent the server computed', () => {
    render(<PriceMove from={640} to={760} pct={18.75} />);
    expect(document.body.textContent).toContain('+18.8%');
    cleanup();
    render(<PriceMove from={1499} to={1499} />);
    expect(document.body.textContent).toBe('$14.99same');
  });
});

const ID = '6f1d2c3b-4a59-4e68-9a7b-8c9d0e1f2a3b';
const SUPPLIER = '0b7e9a3c-1d2f-4e5a-8b6c-7d8e9f0a1b2c';

const STAGED: PriceList = {
  id: ID,
  supplierId: SUPPLIER,
  supplierName: 'Pellworth Distribution',
  fileName: 'supplier-a-clean.csv',
  sha256: 'ab'.repeat(32),
  sizeBytes: 4200,
  encoding: 'utf-8',
  delimiter: ',',
  columns: ['Part Number', 'Brand', 'Cost', 'List'],
  mapping: { 'Part Number': 'partNumber', Brand: 'brand', Cost: 'cost', List: 'list' },
  mappingSource: 'guessed',
  status: 'staged',
  stale: false,
  counts: CLEAN_COUNTS,
  flagged: 1,
  flagThresholdPct: 15,
  progress: { phase: 'done', rowsDone: 40, bytesRead: 4200, bytesTotal: 4200 },
  applied: null,
  createdBy: { id: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f', name: 'Bea Buyer' },
  createdAt: '2026-12-01T10:00:00Z',
  committedBy: null,
  committedAt: null,
  discardedAt: null,
};

function withClient(children: ReactNode) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return <QueryClientProvider client={qc}>{children}</QueryClientProvider>;
}

function stubApi(list: PriceList) {
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string) => {
      const body = url.includes('/changes') ? { changes: [], total: 0 } : url.includes('/errors') ? { errors: [], total: 0 } : list;
      return new Response(JSON.stringify(body), { status: 200, headers: { 'content-type': 'application/json' } });
    }),
  );
}

describe('the staged list', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('shows the counts and offers to commit the valid rows', async () => {
    stubApi(STAGED);
    render(withClient(<PriceListIntake supplierId={SUPPLIER} listId={ID} onListChange={() => {}} />));
    const commit = (await screen.findByRole('button', { name: 'Commit 40 rows' })) as HTMLButtonElement;
    expect(commit.disabled).toBe(false);
    expect(countOf('Price changes')).toBe('5');
    expect(screen.getByText(/Guessed from the headers/)).toBeTruthy();
  });

  it('keeps Commit disabled while the list is stale, and says to preview again', async () => {
    stubApi({ ...STAGED, stale: true, counts: { ...CLEAN_COUNTS, rejected: 2 } });
    render(withClient(<PriceListIntake supplierId={SUPPLIER} listId={ID} onListChange={() => {}} />));
    const commit = (await screen.findByRole('button', { name: 'Commit 38 rows' })) as HTMLButtonElement;
    expect(commit.disabled).toBe(true);
    expect(screen.getByText(/Preview again against today’s prices/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Preview again' })).toBeTruthy();
  });

  it('after commit, names what went in', async () => {
    stubApi({
      ...STAGED,
      status: 'committed',
      applied: { partsCreated: 4, specsStored: 0, pricesWritten: 40, supersessionsLinked: 1 },
    });
    render(withClient(<PriceListIntake supplierId={SUPPLIER} listId={ID} onListChange={() => {}} />));
    const status = await screen.findByRole('status');
    expect(status.textContent).toContain('Committed supplier-a-clean.csv');
    expect(status.textContent).toContain('4 new parts, 5 price changes, 1 supersession, 31 unchanged, 0 rows rejected');
    expect(status.textContent).toContain('40 prices');
  });
});
