import { useState } from 'react';
import { ErrorNote } from '@/components/ui/panel';
import { priceListErrorsCsvUrl, usePriceListErrors } from '../api/get-price-list-errors';
import { Pager } from '@/components/ui/pager';

const PAGE = 50;

/** The rows the server refused, with where and why, and the whole list as a CSV download. */
export function RejectedRows({ listId }: { listId: string }) {
  const [offset, setOffset] = useState(0);
  const errors = usePriceListErrors({ id: listId, offset, limit: PAGE });
  if (errors.error) return <ErrorNote error={errors.error} />;
  if (!errors.data) return <p className="py-3 text-ink-soft">Loading…</p>;
  if (errors.data.total === 0) return <p className="py-3 text-ink-soft">No rows were rejected.</p>;
  return (
    <>
      <div className="mb-2 flex items-center justify-between gap-2">
        <p className="text-sm text-ink-soft">
          These rows stay out of the commit; the other rows go in. Fix them in the file and upload it again.
        </p>
        <a
          href={priceListErrorsCsvUrl(listId)}
          download
          className="whitespace-nowrap rounded-md border border-ink/20 bg-paper-raised px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-sunk"
        >
          Download rejected rows (CSV)
        </a>
      </div>
      <table className="w-full text-left text-[15px]">
        <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="w-16 py-1.5 pr-3">Line</th>
            <th className="w-48 py-1.5 pr-3">Column</th>
            <th className="py-1.5">Reason</th>
          </tr>
        </thead>
        <tbody className={errors.isPlaceholderData ? 'opacity-60' : ''}>
          {errors.data.errors.map((e, i) => (
            <tr key={`${e.line}-${e.column ?? ''}-${i}`} className="border-b border-ink/5">
              <td className="py-1.5 pr-3 tabular-nums">{e.line}</td>
              <td className="py-1.5 pr-3 font-mono text-sm">{e.column ?? '—'}</td>
              <td className="py-1.5">{e.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <Pager offset={offset} limit={PAGE} total={errors.data.total} onOffset={setOffset} />
    </>
  );
}
