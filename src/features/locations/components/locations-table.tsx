import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { Location } from '@shared/schemas/locations';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';

const col = createColumnHelper<Location>();

/** The chain's stores with how customers reach them; each row's Edit opens it in the store dialog. */
export function LocationsTable({ locations, onEdit }: { locations: Location[]; onEdit: (location: Location) => void }) {
  const columns = useMemo(
    () => [
      col.accessor('name', { header: 'Store', enableSorting: true, meta: { cellClassName: 'font-medium' } }),
      col.accessor('address', { header: 'Address', meta: { cellClassName: 'whitespace-pre-line text-ink-soft' } }),
      col.accessor('phone', { header: 'Phone', meta: { cellClassName: 'whitespace-nowrap' } }),
      col.accessor('openingHours', { header: 'Opening hours', meta: { cellClassName: 'whitespace-pre-line text-ink-soft' } }),
      col.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { align: 'right' },
        cell: ({ row: { original: l } }) => (
          <Button variant="secondary" onClick={() => onEdit(l)} aria-label={`Edit ${l.name}`}>
            Edit
          </Button>
        ),
      }),
    ],
    [onEdit],
  );
  return (
    <DataTable
      label="Stores"
      data={locations}
      columns={columns}
      getRowId={(l) => l.id}
      initialSorting={[{ id: 'name', desc: false }]}
      empty="No store yet: add the first."
    />
  );
}
