import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { HeatTableEditor } from '@/features/catalog-edit/components/heat-table-editor';
import { newHeatRow, type HeatRow, type RowErrors } from '@/features/catalog-edit/heat-table';

function Harness({ errors = () => ({}) }: { errors?: (rows: readonly HeatRow[]) => Record<number, RowErrors> }) {
  const [rows, setRows] = useState<HeatRow[]>(() => [newHeatRow('5', '4'), newHeatRow('6', '5')]);
  return <HeatTableEditor rows={rows} errors={errors(rows)} tableError={null} onChange={setRows} />;
}

const code = (n: number) => screen.getByLabelText(`Heat code, row ${n}`) as HTMLInputElement;

describe('the heat-table editor as a table of the kit', () => {
  afterEach(cleanup);

  it('keeps the input being typed in, and the focus, from keystroke to keystroke', () => {
    render(<Harness />);
    const first = code(1);
    first.focus();
    fireEvent.change(first, { target: { value: '5A' } });
    fireEvent.change(first, { target: { value: '5AB' } });
    expect(code(1)).toBe(first);
    expect(document.activeElement).toBe(first);
    expect(first.value).toBe('5AB');
    expect(screen.getByRole('table', { name: 'Heat codes' })).toBeTruthy();
  });

  it("shows a row's message in that row, and Remove takes that row out", () => {
    // The second row's code is wrong for this test's sake: the message belongs to it alone.
    render(<Harness errors={(rows) => (rows[1] ? { [rows[1].key]: { code: 'this code is in the table twice' } } : {})} />);
    expect(code(2).closest('tr')!.textContent).toContain('this code is in the table twice');
    expect(code(1).closest('tr')!.textContent).not.toContain('twice');
    expect(code(2).getAttribute('aria-invalid')).toBe('true');
    fireEvent.click(screen.getByRole('button', { name: 'Remove row 1' }));
    expect(screen.queryByLabelText('Heat code, row 2')).toBeNull();
    expect(code(1).value).toBe('6');
  });
});
