import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { updateSupplierBodySchema, type Supplier } from '@shared/schemas/suppliers';
import { formatDate } from '@shared/format';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ConfirmDialog, Dialog } from '@/components/ui/dialog';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { useUpdateSupplier } from '../api/update-supplier';

const lastList = (iso: string | null): string => (iso === null ? 'none yet' : formatDate(iso));

/** A supplier's name, key and contact, edited in a dialog on the API's own schema. */
function EditSupplierForm({ supplier, onDone }: { supplier: Supplier; onDone: () => void }) {
  const form = useSchemaForm(updateSupplierBodySchema, {
    defaultValues: { name: supplier.name, key: supplier.key, contactEmail: supplier.contactEmail, phone: supplier.phone },
  });
  const update = useUpdateSupplier();
  return (
    <Form
      form={form}
      onSubmit={(body) => update.mutate({ id: supplier.id, ...body }, { onSuccess: onDone })}
      serverError={update.error}
      aria-label={`Edit ${supplier.name}`}
      className="flex flex-col gap-3"
    >
      <Field name="name" label="Name" required maxLength={120} autoFocus />
      <Field name="key" label="Key" required maxLength={40} hint="Lower-case letters, digits and dashes" />
      <Field name="contactEmail" label="Contact e-mail" type="email" blank="null" />
      <Field name="phone" label="Phone" type="tel" blank="null" maxLength={40} />
      <div className="mt-2 flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save'}
        </Button>
      </div>
    </Form>
  );
}

function EditButton({ supplier }: { supplier: Supplier }) {
  const [open, setOpen] = useState(false);
  return (
    <Dialog
      title={`Edit ${supplier.name}`}
      open={open}
      onOpenChange={setOpen}
      trigger={
        <Button variant="secondary" aria-label={`Edit ${supplier.name}`}>
          Edit
        </Button>
      }
    >
      {/* Mounted afresh each time it opens: it starts from the supplier as listed now. */}
      {open && <EditSupplierForm supplier={supplier} onDone={() => setOpen(false)} />}
    </Dialog>
  );
}

/** Archive (hidden from pickers and lists; its price lists stay in the history) or restore, after a confirmation. */
function ArchiveButton({ supplier }: { supplier: Supplier }) {
  const update = useUpdateSupplier();
  const archived = supplier.archivedAt !== null;
  return (
    <ConfirmDialog
      title={archived ? `Restore ${supplier.name}?` : `Archive ${supplier.name}?`}
      confirmLabel={archived ? 'Restore' : 'Archive'}
      tone={archived ? 'primary' : 'danger'}
      trigger={
        <Button variant="ghost" aria-label={`${archived ? 'Restore' : 'Archive'} ${supplier.name}`}>
          {archived ? 'Restore' : 'Archive'}
        </Button>
      }
      onConfirm={() => update.mutateAsync({ id: supplier.id, archived: !archived })}
    >
      {archived ? (
        <p>{supplier.name} comes back to the supplier pickers and its prices count again for the Counter’s sell price.</p>
      ) : (
        <p>
          {supplier.name} leaves the supplier pickers and lists, and the Counter no longer sells at its prices. Its price lists stay in the
          history; nothing is deleted, and it can be restored.
        </p>
      )}
    </ConfirmDialog>
  );
}

const col = createColumnHelper<Supplier>();

/** The store's suppliers: sorted by name or by their last price list; each edited in a dialog. */
export function SuppliersTable({ suppliers }: { suppliers: Supplier[] }) {
  const columns = useMemo(
    () => [
      col.accessor('name', {
        header: 'Name',
        enableSorting: true,
        meta: { cellClassName: 'font-medium' },
        cell: ({ row: { original: s } }) => (
          <>
            {s.name}
            {s.archivedAt && <span className="ml-2 text-sm font-normal text-ink-soft">archived {formatDate(s.archivedAt)}</span>}
          </>
        ),
      }),
      col.accessor('key', { header: 'Key', meta: { cellClassName: 'whitespace-nowrap font-mono text-sm text-ink-soft' } }),
      col.accessor((s) => s.contactEmail ?? '—', {
        id: 'contactEmail',
        header: 'Contact e-mail',
        meta: { cellClassName: 'text-ink-soft' },
      }),
      col.accessor((s) => s.phone ?? '—', { id: 'phone', header: 'Phone', meta: { cellClassName: 'whitespace-nowrap text-ink-soft' } }),
      col.accessor('lastPriceListAt', {
        header: 'Last price list',
        enableSorting: true,
        sortingFn: (a, b) => (a.original.lastPriceListAt ?? '').localeCompare(b.original.lastPriceListAt ?? ''),
        cell: ({ getValue }) => lastList(getValue()),
        meta: { cellClassName: 'whitespace-nowrap text-ink-soft' },
      }),
      col.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { cellClassName: 'whitespace-nowrap text-right' },
        cell: ({ row: { original: s } }) => (
          <div className="flex justify-end gap-1">
            {s.archivedAt === null && <EditButton supplier={s} />}
            <ArchiveButton supplier={s} />
          </div>
        ),
      }),
    ],
    [],
  );
  return (
    <DataTable
      label="Suppliers"
      data={suppliers}
      columns={columns}
      getRowId={(s) => s.id}
      initialSorting={[{ id: 'name', desc: false }]}
      empty="No suppliers yet. Add the first one above."
    />
  );
}
