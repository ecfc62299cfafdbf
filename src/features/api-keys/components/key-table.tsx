import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import type { ApiKey } from '@shared/schemas/api-keys';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ErrorNote } from '@/components/ui/panel';
import { useRevokeApiKey } from '../api/revoke-api-key';
import { formatDateTime } from '@shared/format';

const when = (iso: string | null) => (iso ? formatDateTime(iso) : '—');

/** Revoking is final, so it asks once more in the row itself. */
function RevokeButton({ apiKey }: { apiKey: ApiKey }) {
  const [asking, setAsking] = useState(false);
  const revoke = useRevokeApiKey();
  if (!asking) {
    return (
      <Button variant="danger" onClick={() => setAsking(true)}>
        Revoke
      </Button>
    );
  }
  return (
    <span className="inline-flex items-center gap-2">
      <span className="text-sm">Revoke “{apiKey.name}” for good?</span>
      <Button variant="danger" disabled={revoke.isPending} onClick={() => revoke.mutate(apiKey.id)}>
        Yes, revoke
      </Button>
      <Button variant="ghost" onClick={() => setAsking(false)}>
        Keep
      </Button>
      <ErrorNote error={revoke.error} />
    </span>
  );
}

const col = createColumnHelper<ApiKey>();
// A moment as a number to sort by; a key never used sorts last either way.
const time = (key: 'createdAt' | 'lastUsedAt', header: string) =>
  col.accessor((k) => (k[key] ? Date.parse(k[key]) : undefined), {
    id: key,
    header,
    enableSorting: true,
    sortUndefined: 'last',
    cell: ({ row: { original: k } }) => (
      <>
        {when(k[key])}
        {key === 'createdAt' && k.createdBy && ` by ${k.createdBy.name}`}
      </>
    ),
    meta: { cellClassName: 'text-ink-soft' },
  });

// The cells keep no handlers of the table's, so the columns stay at module level; the revoke
// button holds its own question and mutation.
const COLUMNS = [
  col.accessor('name', { header: 'Name', enableSorting: true, meta: { cellClassName: 'font-medium' } }),
  col.accessor('scope', { header: 'Scope', enableSorting: true }),
  col.accessor('prefix', { header: 'Key', cell: (c) => `${c.getValue()}…`, meta: { cellClassName: 'font-mono text-sm text-ink-soft' } }),
  time('createdAt', 'Created'),
  time('lastUsedAt', 'Last used'),
  col.display({
    id: 'revoke',
    header: () => <span className="sr-only">Status</span>,
    meta: { align: 'right' },
    cell: ({ row: { original: k } }) =>
      k.revokedAt ? <span className="text-nogo">revoked {when(k.revokedAt)}</span> : <RevokeButton apiKey={k} />,
  }),
];

/** Revoked keys stay listed with the day they stopped working; newest first, so a new key is on the first page. */
export function KeyTable({ apiKeys }: { apiKeys: ApiKey[] }) {
  return (
    <DataTable
      label="API keys"
      data={apiKeys}
      columns={COLUMNS}
      getRowId={(k) => k.id}
      initialSorting={[{ id: 'createdAt', desc: true }]}
      pageSize={25}
      empty="No API keys yet."
    />
  );
}
