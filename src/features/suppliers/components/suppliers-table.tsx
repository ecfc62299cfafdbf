import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/dialog';
import { ErrorNote } from '@/components/ui/panel';
import { useUpdateSupplier } from '../api/update-supplier';
import type { Supplier } from '@shared/schemas/suppliers';
import { formatDate } from '@shared/format';

const CELL_INPUT = 'w-full rounded border border-ink/20 bg-paper-raised px-2 py-1 text-[15px] focus:border-accent';

const lastList = (iso: string | null): string => (iso === null ? 'none yet' : formatDate(iso));

const blankToNull = (s: string): string | null => (s.trim() === '' ? null : s.trim());

function EditRow({ supplier, onDone }: { supplier: Supplier; onDone: () => void }) {
  const [name, setName] = useState(supplier.name);
  const [key, setKey] = useState(supplier.key);
  const [contactEmail, setContactEmail] = useState(supplier.contactEmail ?? '');
  const [phone, setPhone] = useState(supplier.phone ?? '');
  const update = useUpdateSupplier();
  const formId = `edit-supplier-${supplier.id}`;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    update.mutate(
      { id: supplier.id, name: name.trim(), key: key.trim(), contactEmail: blankToNull(contactEmail), phone: blankToNull(phone) },
      { onSuccess: onDone },
    );
  };

  return (
    <tr className="border-b border-ink/5 bg-accent-soft/40 align-top">
      <td className="py-2 pr-3">
        {/* The form lives in the first cell; the other inputs join it through form=. */}
        <form id={formId} onSubmit={submit} aria-label={`Edit ${supplier.name}`} />
        <input
          form={formId}
          aria-label="Name"
          required
          maxLength={120}
          className={CELL_INPUT}
          value={name}
          onChange={(e) => setName(e.target.value)}
          autoFocus
        />
        <ErrorNote error={update.error} />
      </td>
      <td className="py-2 pr-3">
        <input
          form={formId}
          aria-label="Key"
          required
          maxLength={40}
          className={CELL_INPUT}
          value={key}
          onChange={(e) => setKey(e.target.value)}
        />
      </td>
      <td className="py-2 pr-3">
        <input
          form={formId}
          aria-label="Contact e-mail"
          type="email"
          className={CELL_INPUT}
          value={contactEmail}
          onChange={(e) => setContactEmail(e.target.value)}
        />
      </td>
      <td className="py-2 pr-3">
        <input
          form={formId}
          aria-label="Phone"
          type="tel"
          maxLength={40}
          className={CELL_INPUT}
          value={phone}
          onChange={(e) => setPhone(e.target.value)}
        />
      </td>
      <td className="whitespace-nowrap py-2 pr-3 text-ink-soft">{lastList(supplier.lastPriceListAt)}</td>
      <td className="whitespace-nowrap py-2 text-right">
        <Button type="submit" form={formId} disabled={update.isPending}>
          Save
        </Button>{' '}
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </td>
    </tr>
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

/** The store's suppliers, each row editable in place. */
export function SuppliersTable({ suppliers }: { suppliers: Supplier[] }) {
  const [editing, setEditing] = useState<string | null>(null);
  if (suppliers.length === 0) return <p className="text-ink-soft">No suppliers yet. Add the first one above.</p>;
  return (
    <table className="w-full text-left text-[15px]">
      <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
        <tr>
          <th className="w-[24%] py-2 pr-3">Name</th>
          <th className="w-[14%] py-2 pr-3">Key</th>
          <th className="w-[24%] py-2 pr-3">Contact e-mail</th>
          <th className="w-[16%] py-2 pr-3">Phone</th>
          <th className="py-2 pr-3">Last price list</th>
          <th className="py-2" />
        </tr>
      </thead>
      <tbody>
        {suppliers.map((s) =>
          editing === s.id ? (
            <EditRow key={s.id} supplier={s} onDone={() => setEditing(null)} />
          ) : (
            <tr key={s.id} className="border-b border-ink/5">
              <td className="py-2 pr-3 font-medium">
                {s.name}
                {s.archivedAt && <span className="ml-2 text-sm font-normal text-ink-soft">archived {formatDate(s.archivedAt)}</span>}
              </td>
              <td className="whitespace-nowrap py-2 pr-3 font-mono text-sm text-ink-soft">{s.key}</td>
              <td className="py-2 pr-3 text-ink-soft">{s.contactEmail ?? '—'}</td>
              <td className="py-2 pr-3 text-ink-soft">{s.phone ?? '—'}</td>
              <td className="whitespace-nowrap py-2 pr-3 text-ink-soft">{lastList(s.lastPriceListAt)}</td>
              <td className="whitespace-nowrap py-2 text-right">
                {s.archivedAt === null && (
                  <Button variant="secondary" aria-label={`Edit ${s.name}`} onClick={() => setEditing(s.id)}>
                    Edit
                  </Button>
                )}{' '}
                <ArchiveButton supplier={s} />
              </td>
            </tr>
          ),
        )}
      </tbody>
    </table>
  );
}
