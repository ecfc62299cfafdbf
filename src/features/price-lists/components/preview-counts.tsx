import type { PriceListCounts } from '@shared/schemas/price-lists';
import { formatCount } from '@shared/format';
import { FlagMark } from './flag-mark';

interface Tile {
  label: string;
  value: number;
  note?: string;
  tone?: 'nogo';
}

/** What committing the list would do, in numbers. */
export function PreviewCounts({
  counts,
  flagged,
  thresholdPct,
}: {
  counts: PriceListCounts;
  flagged: number;
  thresholdPct: number | null;
}) {
  const tiles: Tile[] = [
    { label: 'Rows in file', value: counts.total },
    { label: 'New parts', value: counts.new },
    {
      label: 'Price changes',
      value: counts.changed,
      ...(counts.firstPrices > 0 ? { note: `${formatCount(counts.firstPrices)} first from this supplier` } : {}),
    },
    { label: 'Supersessions', value: counts.supersessions },
    { label: 'Unchanged', value: counts.unchanged },
    { label: 'Rejected rows', value: counts.rejected, ...(counts.rejected > 0 ? { tone: 'nogo' as const } : {}) },
  ];
  const threshold = thresholdPct === null ? 'the store’s threshold' : `${thresholdPct}%`;
  return (
    <div className="flex flex-col gap-2">
      <dl aria-label="Preview counts" className="grid grid-cols-3 gap-2 sm:grid-cols-6">
        {tiles.map((t) => (
          <div
            key={t.label}
            className={`rounded-md border px-3 py-2 ${t.tone === 'nogo' ? 'border-nogo/30 bg-nogo-soft' : 'border-ink/10 bg-paper'}`}
          >
            <dt className="text-xs font-semibold uppercase tracking-wide text-ink-soft">{t.label}</dt>
            <dd className={`text-2xl font-semibold tabular-nums ${t.tone === 'nogo' ? 'text-nogo' : 'text-ink'}`}>
              {formatCount(t.value)}
            </dd>
            {t.note && <dd className="text-xs text-ink-soft">{t.note}</dd>}
          </div>
        ))}
      </dl>
      {flagged > 0 && (
        <p className="flex items-center gap-2 text-sm text-ink">
          <FlagMark />
          {flagged === 1 ? '1 price moves' : `${formatCount(flagged)} prices move`} by more than {threshold}. Check{' '}
          {flagged === 1 ? 'it' : 'them'} under Price changes before committing.
        </p>
      )}
    </div>
  );
}
