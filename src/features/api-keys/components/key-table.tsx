import { useState } from 'react';
import type { ApiKey } from '@shared/schemas/api-keys';
import { Button } from '@/components/ui/button';
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

export function KeyTable({ apiKeys }: { apiKeys: ApiKey[] }) {
  if (apiKeys.length === 0) return <p className="text-sm text-ink-soft">No API keys yet.</p>;
  return (
    <table className="w-full text-left text-[15px]">
      <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
        <tr>
          <th className="py-2 pr-3">Name</th>
          <th className="py-2 pr-3">Scope</th>
          <th className="py-2 pr-3">Key</th>
          <th className="py-2 pr-3">Created</th>
          <th className="py-2 pr-3">Last used</th>
          <th className="py-2" />
        </tr>
      </thead>
      <tbody>
        {apiKeys.map((k) => (
          <tr key={k.id} className="border-b border-ink/5">
            <td className="py-2 pr-3 font-medium">{k.name}</td>
            <td className="py-2 pr-3">{k.scope}</td>
            <td className="py-2 pr-3 font-mono text-sm text-ink-soft">{k.prefix}…</td>
            <td className="py-2 pr-3 text-ink-soft">
              {when(k.createdAt)}
              {k.createdBy && ` by ${k.createdBy.name}`}
            </td>
            <td className="py-2 pr-3 text-ink-soft">{when(k.lastUsedAt)}</td>
            <td className="py-2 text-right">
              {k.revokedAt ? <span className="text-nogo">revoked {when(k.revokedAt)}</span> : <RevokeButton apiKey={k} />}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
