import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { plugSpecFields } from '@shared/schemas/specs';
import { specField } from '@shared/spec-fields';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { Field, Form, useResultIsCurrent, useSchemaForm } from '@/components/ui/form';
import { useServerSorting } from '@/components/ui/server-sorting';
import { Sheet } from '@/components/ui/sheet';
import { Tabs } from '@/components/ui/tabs';

afterEach(cleanup);

// One field of the shared plug schema, labelled from the shared spec-field table.
const reachSchema = z.object({ reachMm: plugSpecFields.reachMm });
const reach = specField('reachMm')!;

function ReachCheck({ onCheck }: { onCheck: (mm: number) => void }) {
  const form = useSchemaForm(reachSchema, { defaultValues: { reachMm: undefined } });
  const result = useResultIsCurrent(form);
  const [checked, setChecked] = useState<number | null>(null);
  return (
    <Form
      form={form}
      aria-label="Reach check"
      onSubmit={(v) => {
        onCheck(v.reachMm);
        setChecked(v.reachMm);
        result.shown();
      }}
    >
      <Field name="reachMm" label={reach.label} unit={reach.unit} number />
      <Button type="submit">Check</Button>
      {checked !== null && <p data-testid="result">{result.isCurrent ? `fits at ${checked} mm` : 'out of date: check again'}</p>}
    </Form>
  );
}

describe('Form and Field on a shared schema', () => {
  const input = () => screen.getByLabelText('Reach (mm)') as HTMLInputElement;
  const error = () => document.getElementById(input().getAttribute('aria-describedby') ?? '')?.textContent;

  it('sends a number, then marks the result out of date the moment the input changes or becomes invalid', async () => {
    const onCheck = vi.fn();
    render(<ReachCheck onCheck={onCheck} />);
    fireEvent.change(input(), { target: { value: '12,7' } });
    fireEvent.click(screen.getByRole('button', { name: 'Check' }));
    await waitFor(() => expect(screen.getByTestId('result').textContent).toBe('fits at 12.7 mm'));
    expect(onCheck).toHaveBeenCalledWith(12.7);

    fireEvent.change(input(), { target: { value: 'abc' } });
    fireEvent.blur(input());
    await waitFor(() => expect(error()).toBe('Reach must be a number'));
    expect(input().getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByTestId('result').textContent).toBe('out of date: check again');
    fireEvent.click(screen.getByRole('button', { name: 'Check' }));
    // plugSpecFields.reachMm is at most 40 mm: the message says so with the field's label and unit.
    fireEvent.change(input(), { target: { value: '41' } });
    await waitFor(() => expect(error()).toBe('Reach must be at most 40\u00a0mm'));
    fireEvent.change(input(), { target: { value: '' } });
    await waitFor(() => expect(error()).toBe('Reach is required'));
    expect(onCheck).toHaveBeenCalledTimes(1);
  });
});

type Row = { id: string; number: string; onHand: number };
const col = createColumnHelper<Row>();
const ROWS: Row[] = [
  { id: 'a', number: 'QW-SP 1406', onHand: 7 },
  { id: 'b', number: 'QW-SP 1407', onHand: 0 },
  { id: 'c', number: 'QW-SP 1435', onHand: 3 },
];
const COLUMNS = [
  col.accessor('number', { header: 'Number' }),
  col.accessor('onHand', { header: 'On hand', enableSorting: true, meta: { align: 'right' } }),
];
const SORTABLE = [
  col.accessor('number', { header: 'Number', enableSorting: true }),
  col.accessor('onHand', { header: 'On hand', enableSorting: true, meta: { align: 'right' } }),
];

describe('DataTable', () => {
  it('says so when there are no rows', () => {
    render(<DataTable label="Parts" data={[]} columns={COLUMNS} getRowId={(r) => r.id} empty="No parts match." />);
    expect(screen.getByText('No parts match.')).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('sits in a labelled region the keyboard can scroll, so a narrow screen scrolls the table, not the page', () => {
    render(<DataTable label="Parts" data={ROWS} columns={COLUMNS} getRowId={(r) => r.id} />);
    const region = screen.getByRole('region', { name: 'Parts' });
    expect(region.tabIndex).toBe(0);
    expect(region.className).toContain('overflow-x-auto');
    expect(within(region).getByRole('table', { name: 'Parts' })).toBeTruthy();
  });

  it('with onRowOpen, is a keyboard grid: one tab stop, arrows move, Enter opens, ↑ on the first row leaves', () => {
    const onOpen = vi.fn();
    const onLeaveTop = vi.fn();
    render(<DataTable label="Parts" data={ROWS} columns={COLUMNS} getRowId={(r) => r.id} onRowOpen={onOpen} onLeaveTop={onLeaveTop} />);
    const rows = within(screen.getByRole('grid', { name: 'Parts' }))
      .getAllByRole('row')
      .slice(1);
    expect(rows.map((r) => r.tabIndex)).toEqual([0, -1, -1]);
    rows[0]!.focus();
    fireEvent.keyDown(rows[0]!, { key: 'ArrowDown' });
    expect(document.activeElement).toBe(rows[1]);
    fireEvent.keyDown(rows[1]!, { key: 'End' });
    expect(document.activeElement).toBe(rows[2]);
    fireEvent.keyDown(rows[2]!, { key: 'Enter' });
    expect(onOpen).toHaveBeenLastCalledWith(ROWS[2]);
    fireEvent.keyDown(rows[2]!, { key: 'Home' });
    fireEvent.keyDown(rows[0]!, { key: 'ArrowUp' });
    expect(onLeaveTop).toHaveBeenCalledTimes(1);
  });
});

describe('DataTable: pages, row headers, server sorting', () => {
  // 60 rows numbered 1…60, stock falling as the number rises.
  const MANY: Row[] = Array.from({ length: 60 }, (_, i) => ({ id: `r${i + 1}`, number: `N-${i + 1}`, onHand: 60 - i }));
  const bodyRows = () =>
    within(screen.getByRole('table', { name: 'Parts' }))
      .getAllByRole('row')
      .slice(1);
  const firstCells = () => bodyRows().map((r) => within(r).getAllByRole('cell')[0]!.textContent);

  it('with pageSize, shows one page and the one Pager; a new sort order starts from the first page and sorts every row', () => {
    render(<DataTable label="Parts" data={MANY} columns={COLUMNS} getRowId={(r) => r.id} pageSize={25} />);
    expect(bodyRows()).toHaveLength(25);
    expect(screen.getByText('Rows 1–25 of 60')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    expect(firstCells()).toEqual(MANY.slice(50).map((r) => r.number));
    expect(screen.getByText('Rows 51–60 of 60')).toBeTruthy();
    // On hand ascending: the last-numbered rows have the least, and they fill page one.
    const onHand = () => screen.getByRole('columnheader', { name: /On hand/ });
    for (let i = 0; i < 3 && onHand().getAttribute('aria-sort') !== 'ascending'; i++) fireEvent.click(within(onHand()).getByRole('button'));
    expect(onHand().getAttribute('aria-sort')).toBe('ascending');
    expect(screen.getByText('Rows 1–25 of 60')).toBeTruthy();
    expect(firstCells()).toEqual(
      MANY.slice(35)
        .reverse()
        .map((r) => r.number),
    );
  });

  it('keeps the page when the rows are reloaded, and goes to the last page when the list shrank below it', () => {
    const { rerender } = render(<DataTable label="Parts" data={MANY} columns={COLUMNS} getRowId={(r) => r.id} pageSize={25} />);
    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    rerender(<DataTable label="Parts" data={[...MANY]} columns={COLUMNS} getRowId={(r) => r.id} pageSize={25} />);
    expect(firstCells()[0]).toBe('N-26');
    rerender(<DataTable label="Parts" data={MANY.slice(0, 20)} columns={COLUMNS} getRowId={(r) => r.id} pageSize={25} />);
    expect(firstCells()[0]).toBe('N-1');
    expect(screen.queryByRole('button', { name: 'Next' })).toBeNull();
  });

  it('makes a column of row headers, and keeps hidden column names for screen readers', () => {
    const headed = [col.accessor('number', { header: 'Number', meta: { rowHeader: true } }), col.accessor('onHand', { header: 'On hand' })];
    render(<DataTable label="Parts" data={ROWS} columns={headed} getRowId={(r) => r.id} hideHeader />);
    const header = screen.getByRole('rowheader', { name: 'QW-SP 1406' });
    expect(header.getAttribute('scope')).toBe('row');
    expect(screen.getByRole('columnheader', { name: 'On hand' }).closest('thead')?.className).toContain('sr-only');
  });

  it('useServerSorting turns the header clicks into sort and dir, and a third click goes back to the fallback', () => {
    const asked: string[] = [];
    function ServerSorted() {
      const s = useServerSorting(['number', 'onHand'] as const, { id: 'number', desc: false });
      asked.push(`${s.sort} ${s.dir}`);
      // The rows arrive as the server sorted them; here they stay as given.
      return (
        <DataTable
          label="Parts"
          data={ROWS}
          columns={SORTABLE}
          getRowId={(r) => r.id}
          sorting={s.sorting}
          onSortingChange={s.onSortingChange}
        />
      );
    }
    render(<ServerSorted />);
    expect(asked.at(-1)).toBe('number asc');
    expect(firstCells()).toEqual(ROWS.map((r) => r.number));
    fireEvent.click(screen.getByRole('button', { name: /On hand/ }));
    const first = asked.at(-1);
    expect(first === 'onHand desc' || first === 'onHand asc').toBe(true);
    fireEvent.click(screen.getByRole('button', { name: /On hand/ }));
    expect(asked.at(-1)).toBe(first === 'onHand desc' ? 'onHand asc' : 'onHand desc');
    fireEvent.click(screen.getByRole('button', { name: /On hand/ }));
    expect(asked.at(-1)).toBe('number asc');
    expect(screen.getByRole('columnheader', { name: /Number/ }).getAttribute('aria-sort')).toBe('ascending');
  });

  it('useServerSorting turns a fallback on a number column (which TanStack starts descending) both ways', () => {
    const asked: string[] = [];
    function ByStock() {
      const s = useServerSorting(['number', 'onHand'] as const, { id: 'onHand', desc: false });
      asked.push(`${s.sort} ${s.dir}`);
      return (
        <DataTable
          label="Parts"
          data={ROWS}
          columns={SORTABLE}
          getRowId={(r) => r.id}
          sorting={s.sorting}
          onSortingChange={s.onSortingChange}
        />
      );
    }
    render(<ByStock />);
    const onHand = () => within(screen.getByRole('columnheader', { name: /On hand/ })).getByRole('button');
    expect(asked.at(-1)).toBe('onHand asc');
    fireEvent.click(onHand());
    expect(asked.at(-1)).toBe('onHand desc');
    fireEvent.click(onHand());
    expect(asked.at(-1)).toBe('onHand asc');
  });
});

describe('Tabs and Sheet', () => {
  function Two() {
    const [tab, setTab] = useState<'changed' | 'rejected'>('changed');
    return (
      <Tabs
        label="Preview"
        value={tab}
        onValueChange={setTab}
        items={[
          { value: 'changed', label: 'Price changes', count: 1204 },
          { value: 'rejected', label: 'Rejected rows', count: 3, alert: true },
        ]}
      >
        {tab === 'changed' ? 'the changes' : 'the rejected rows'}
      </Tabs>
    );
  }

  it('moves between tabs with the arrow keys and shows only the chosen one', async () => {
    render(<Two />);
    const list = screen.getByRole('tablist', { name: 'Preview' });
    const [first, second] = within(list).getAllByRole('tab');
    expect(first!.textContent).toBe('Price changes1,204');
    expect(screen.getByRole('tabpanel').textContent).toBe('the changes');
    first!.focus();
    fireEvent.keyDown(first!, { key: 'ArrowRight' });
    await waitFor(() => expect(second!.getAttribute('aria-selected')).toBe('true'));
    expect(screen.getByRole('tabpanel').textContent).toBe('the rejected rows');
  });

  it('opens a sheet as a named dialog holding the focus, and closes it with its Close button', async () => {
    const onOpenChange = vi.fn();
    render(
      <Sheet open onOpenChange={onOpenChange} title="QW-SP 1406">
        <button type="button">Add to fit report</button>
      </Sheet>,
    );
    const sheet = screen.getByRole('dialog', { name: 'QW-SP 1406' });
    await waitFor(() => expect(sheet.contains(document.activeElement)).toBe(true));
    fireEvent.click(within(sheet).getByRole('button', { name: /Close/ }));
    expect(onOpenChange).toHaveBeenCalledWith(false);
  });
});
