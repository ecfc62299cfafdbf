import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { SearchHit } from '@shared/schemas/search';
import { ResultsTable } from '@/features/counter/components/results-table';

const hit = (partNumber: string, over: Partial<SearchHit> = {}): SearchHit => ({
  partId: `id-${partNumber}`,
  brand: 'Quaywell',
  partNumber,
  kind: 'plug',
  description: `Spark plug ${partNumber}`,
  matchedBy: 'number',
  matchedNumber: partNumber.replace(/\W/g, ''),
  inStock: true,
  stock: { inStock: true, here: { locationId: '00000000-0000-4000-8000-0000000000a1', onHand: 7, bin: 'B-01-1' }, elsewhere: [] },
  hasSpec: true,
  ...over,
});

const HITS = [
  hit('QW-SP 1406'),
  hit('QW-SP 1407'),
  hit('QW-SP 1435', { inStock: false, stock: { inStock: false, here: null, elsewhere: [] } }),
];

function renderTable(props: Partial<Parameters<typeof ResultsTable>[0]> = {}) {
  const onOpen = vi.fn();
  const onLeaveTop = vi.fn();
  render(<ResultsTable hits={HITS} query="qw sp" openPartId={null} onOpen={onOpen} onLeaveTop={onLeaveTop} {...props} />);
  const rows = within(screen.getByRole('grid', { name: 'Search results' }))
    .getAllByRole('row')
    .slice(1);
  return { rows, onOpen, onLeaveTop };
}

const selected = (rows: HTMLElement[]) => rows.map((r) => r.getAttribute('aria-selected'));

describe('results table keyboard', () => {
  afterEach(cleanup);

  it('is one tab stop: the selected row, the first at the start', () => {
    const { rows } = renderTable();
    expect(selected(rows)).toEqual(['true', 'false', 'false']);
    expect(rows.map((r) => r.tabIndex)).toEqual([0, -1, -1]);
  });

  it('moves the selection and the focus with the arrow keys, Home and End, and stops at the ends', () => {
    const { rows } = renderTable();
    rows[0]!.focus();
    fireEvent.keyDown(rows[0]!, { key: 'ArrowDown' });
    expect(selected(rows)).toEqual(['false', 'true', 'false']);
    expect(document.activeElement).toBe(rows[1]);
    expect(rows.map((r) => r.tabIndex)).toEqual([-1, 0, -1]);

    fireEvent.keyDown(rows[1]!, { key: 'End' });
    expect(document.activeElement).toBe(rows[2]);
    fireEvent.keyDown(rows[2]!, { key: 'ArrowDown' });
    expect(document.activeElement).toBe(rows[2]);
    expect(selected(rows)).toEqual(['false', 'false', 'true']);

    fireEvent.keyDown(rows[2]!, { key: 'Home' });
    expect(document.activeElement).toBe(rows[0]);
    expect(selected(rows)).toEqual(['true', 'false', 'false']);
  });

  it('opens the selected part on Enter, and a clicked row on click', () => {
    const { rows, onOpen } = renderTable();
    fireEvent.keyDown(rows[0]!, { key: 'ArrowDown' });
    fireEvent.keyDown(rows[1]!, { key: 'Enter' });
    expect(onOpen).toHaveBeenLastCalledWith('id-QW-SP 1407');
    fireEvent.click(rows[2]!);
    expect(onOpen).toHaveBeenLastCalledWith('id-QW-SP 1435');
    expect(selected(rows)).toEqual(['false', 'false', 'true']);
  });

  it('hands the keyboard back to the search box on ↑ from the first row', () => {
    const { rows, onLeaveTop, onOpen } = renderTable();
    fireEvent.keyDown(rows[0]!, { key: 'ArrowUp' });
    expect(onLeaveTop).toHaveBeenCalledTimes(1);
    expect(onOpen).not.toHaveBeenCalled();
  });

  it('shows stock as the rest of the app does: on hand to the store, in stock or not to a technician', () => {
    const store = renderTable();
    expect(store.rows.map((r) => r.lastElementChild?.textContent)).toEqual(['7 here · bin B-01-1', '7 here · bin B-01-1', '0 here']);
    cleanup();
    // The server leaves the count out for a technician (search.presenter.ts).
    const tech = renderTable({ hits: HITS.map(({ stock: _stock, ...h }) => h) });
    expect(tech.rows.map((r) => r.lastElementChild?.textContent)).toEqual(['in stock', 'in stock', 'not in stock']);
  });

  it('marks an interchange claim with its verdict word and the check that decided it', () => {
    const wrong = hit('QW-SP 1406', {
      matchedBy: 'interchange',
      matchedNumber: 'SPF52135',
      check: { verdict: 'no-go', engine: 'KM13', concerns: [{ id: 'reach', verdict: 'no-go', reason: 'Reach too long.' }] },
    });
    const { rows } = renderTable({ hits: [wrong], query: 'SPF 52.135' });
    expect(rows[0]!.textContent).toContain('via interchange SPF 52.135');
    expect(within(rows[0]!).getByText('no-go')).toBeTruthy();
    expect(rows[0]!.textContent).toContain('Reach');
  });

  it('leaves the Matched column out when only spec filters found the parts', () => {
    renderTable({ query: '' });
    expect(screen.queryByRole('columnheader', { name: 'Matched' })).toBeNull();
    expect(screen.getByRole('columnheader', { name: 'Stock' })).toBeTruthy();
  });
});
