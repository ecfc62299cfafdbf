import { createColumnHelper } from '@tanstack/react-table';
import type { ApiKey } from '@shared/schemas/api-keys';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { ConfirmDialog } from '@/components/ui/dialog';
import { useRevokeApiKey } from '../api/revoke-api-key';
import { formatDateTime } from '@shared/format';

const when = (iso: string | null) => (iso ? formatDateTime(iso) : '—');

/** Revoking is final, so it asks first, saying what stops working. */
function RevokeButton({ apiKey }: { apiKey: ApiKey }) {
  const revoke = useRevokeApiKey();
  return (
    <ConfirmDialog
      title={`Revoke “${apiKey.name}” for good?`}
      confirmLabel="Revoke"
      tone="danger"
      trigger={
        <Button variant="danger" aria-label={`Revoke ${apiKey.name}`}>
          Revoke
        </Button>
      }
      onConfirm={() => revoke.mutateAsync(apiKey.id)}
    >
      <p>Every call with this key answers 401 from now on. A new key can be made at any time; this one cannot come back.</p>
    </ConfirmDialog>
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
