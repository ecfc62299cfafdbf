import { FIELD_LABELS } from '@shared/price-list/fields';
import type { Mapping } from '@shared/price-list/mapping';
import { Button } from '@/components/ui/button';
import type { PriceList } from '@shared/schemas/price-lists';
import { formatCount, formatDateTime } from '@shared/format';
import { shortHash } from '../format';

const STATUS_TEXT: Record<PriceList['status'], string> = {
  processing: 'reading',
  staged: 'staged',
  committed: 'committed',
  discarded: 'discarded',
  failed: 'failed',
};

const STATUS_TONE: Record<PriceList['status'], string> = {
  processing: 'text-ink-soft',
  staged: 'text-review',
  committed: 'text-go',
  discarded: 'text-ink-faint',
  failed: 'text-nogo',
};

function MappingSummary({ mapping }: { mapping: Mapping }) {
  const entries = Object.entries(mapping);
  const used = entries.filter(([, f]) => f !== null);
  return (
    <details>
      <summary className="cursor-pointer whitespace-nowrap text-ink-soft">
        {used.length} of {entries.length} columns
      </summary>
      <ul className="mt-1 text-xs">
        {used.map(([column, field]) => (
          <li key={column} className="whitespace-nowrap">
            <span className="font-mono">{column}</span> → {field === null ? '' : FIELD_LABELS[field]}
          </li>
        ))}
      </ul>
    </details>
  );
}

/** Every file uploaded for the supplier: who, when, which file, how it was read and what it did. */
export function HistoryTable({ lists, openId, onOpen }: { lists: PriceList[]; openId: string | null; onOpen: (id: string) => void }) {
  if (lists.length === 0) return <p className="text-ink-soft">No price lists from this supplier yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-[15px]">
        <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="py-1.5 pr-3">When</th>
            <th className="py-1.5 pr-3">By</th>
            <th className="py-1.5 pr-3">File</th>
            <th className="py-1.5 pr-3">SHA-256</th>
            <th className="py-1.5 pr-3">Mapping</th>
            <th className="py-1.5 pr-3 text-right">Rows</th>
            <th className="py-1.5 pr-3 text-right">New</th>
            <th className="py-1.5 pr-3 text-right">Changed</th>
            <th className="py-1.5 pr-3 text-right">Unchanged</th>
            <th className="py-1.5 pr-3 text-right">Rejected</th>
            <th className="py-1.5 pr-3">Status</th>
            <th className="py-1.5" />
          </tr>
        </thead>
        <tbody>
          {lists.map((l) => (
            <tr key={l.id} className={`border-b border-ink/5 align-top ${l.id === openId ? 'bg-accent-soft/50' : ''}`}>
              <td className="whitespace-nowrap py-1.5 pr-3">{formatDateTime(l.committedAt ?? l.discardedAt ?? l.createdAt)}</td>
              <td className="whitespace-nowrap py-1.5 pr-3">{(l.committedBy ?? l.createdBy)?.name ?? '—'}</td>
              <td className="max-w-56 truncate py-1.5 pr-3" title={l.fileName}>
                {l.fileName}
              </td>
              <td className="py-1.5 pr-3 font-mono text-sm text-ink-soft" title={l.sha256}>
                {shortHash(l.sha256)}
              </td>
              <td className="py-1.5 pr-3 text-sm">
                <MappingSummary mapping={l.mapping} />
              </td>
              <td className="py-1.5 pr-3 text-right tabular-nums">{l.counts ? formatCount(l.counts.total) : '—'}</td>
              <td className="py-1.5 pr-3 text-right tabular-nums">{l.counts ? formatCount(l.counts.new) : '—'}</td>
              <td className="py-1.5 pr-3 text-right tabular-nums">{l.counts ? formatCount(l.counts.changed) : '—'}</td>
              <td className="py-1.5 pr-3 text-right tabular-nums">{l.counts ? formatCount(l.counts.unchanged) : '—'}</td>
              <td className="py-1.5 pr-3 text-right tabular-nums">{l.counts ? formatCount(l.counts.rejected) : '—'}</td>
              <td className={`whitespace-nowrap py-1.5 pr-3 font-medium ${STATUS_TONE[l.status]}`}>
                {STATUS_TEXT[l.status]}
                {l.status === 'staged' && l.stale && <span className="font-normal text-ink-soft">, stale</span>}
              </td>
              <td className="py-1.5 text-right">
                {l.status === 'staged' && l.id !== openId && (
                  <Button variant="secondary" className="!py-1" aria-label={`Open ${l.fileName}`} onClick={() => onOpen(l.id)}>
                    Open
                  </Button>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
