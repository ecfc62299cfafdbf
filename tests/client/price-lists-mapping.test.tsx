import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { guessMapping, type Mapping } from '@shared/price-list/mapping';
import { MappingTable, mappingProblems } from '@/features/price-lists/components/mapping-table';

// Headers of seed/csv/supplier-b-other-layout.csv (see seed/csv/README.md).
const OTHER_LAYOUT = ['Mfr', 'Item No', 'Barcode', 'Desc', 'Qty/Pack', 'Net', 'Retail', 'Core Chg'];

function Harness({ columns, initial, onChange }: { columns: string[]; initial: Mapping; onChange?: (m: Mapping) => void }) {
  const [mapping, setMapping] = useState(initial);
  return (
    <MappingTable
      columns={columns}
      mapping={mapping}
      onChange={(m) => {
        setMapping(m);
        onChange?.(m);
      }}
    />
  );
}

const select = (header: string) => screen.getByLabelText(header) as HTMLSelectElement;
const requiredItem = (label: string) =>
  within(screen.getByRole('list', { name: 'Required fields' }))
    .getByText(label)
    .closest('li') as HTMLElement;

describe('mapping table', () => {
  afterEach(cleanup);

  it('shows each column of the file with the guessed field selected', () => {
    render(<Harness columns={OTHER_LAYOUT} initial={guessMapping(OTHER_LAYOUT)} />);
    expect(select('Item No').value).toBe('partNumber');
    expect(select('Mfr').value).toBe('brand');
    expect(select('Net').value).toBe('cost');
    expect(select('Retail').value).toBe('list');
    expect(select('Core Chg').value).toBe('core');
    expect(select('Barcode').value).toBe('gtin');
    expect(screen.queryByRole('alert')).toBeNull();
    for (const label of ['Part number', 'Brand', 'Cost', 'List price']) {
      expect(requiredItem(label).textContent).toContain('mapped');
      expect(requiredItem(label).textContent).not.toContain('not mapped');
    }
  });

  it('marks required fields in the choices and names a missing one', () => {
    const mapping: Mapping = { ...guessMapping(OTHER_LAYOUT), Net: null };
    render(<Harness columns={OTHER_LAYOUT} initial={mapping} />);
    const costOption = within(select('Net')).getByRole('option', { name: 'Cost (required)' });
    expect(costOption).toBeTruthy();
    expect(requiredItem('Cost').textContent).toContain('not mapped');
    expect(screen.getByRole('alert').textContent).toMatch(/No column is mapped to Cost, which is required/);
  });

  it('reports the new mapping when a field is chosen, and a field mapped twice', () => {
    const onChange = vi.fn();
    render(<Harness columns={OTHER_LAYOUT} initial={guessMapping(OTHER_LAYOUT)} onChange={onChange} />);
    fireEvent.change(select('Retail'), { target: { value: 'cost' } });
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ Retail: 'cost', Net: 'cost' }));
    expect(screen.getByRole('alert').textContent).toMatch(/Cost is mapped to more than one column: Net, Retail/);
    expect(screen.getAllByText('used twice')).toHaveLength(2);
    expect(requiredItem('List price').textContent).toContain('not mapped');

    fireEvent.change(select('Retail'), { target: { value: 'list' } });
    fireEvent.change(select('Desc'), { target: { value: '' } });
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ Retail: 'list', Desc: null }));
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('keeps a select, and the keyboard in it, when a field is chosen', () => {
    render(<Harness columns={OTHER_LAYOUT} initial={guessMapping(OTHER_LAYOUT)} />);
    const retail = select('Retail');
    retail.focus();
    fireEvent.change(retail, { target: { value: 'core' } });
    expect(select('Retail')).toBe(retail);
    expect(document.activeElement).toBe(retail);
    expect(retail.value).toBe('core');
  });

  it('keys a column without a header by its index', () => {
    const columns = ['Part Number', 'Brand', '', 'Cost', 'List'];
    const onChange = vi.fn();
    render(<Harness columns={columns} initial={guessMapping(columns)} onChange={onChange} />);
    const unnamed = screen.getByLabelText('column 3, no header') as HTMLSelectElement;
    expect(unnamed.value).toBe('');
    fireEvent.change(unnamed, { target: { value: 'description' } });
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ '2': 'description' }));
  });

  it('the clean sample file needs no change to its guessed mapping', () => {
    const clean = ['Part Number', 'Brand', 'Description', 'Cost', 'List', 'Core', 'Pack Qty', 'GTIN', 'Supersedes', 'Kind'];
    expect(mappingProblems(clean, guessMapping(clean))).toEqual([]);
  });
});
