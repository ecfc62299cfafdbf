import { useId, useRef, useState, type KeyboardEvent } from 'react';
import type { PriceListChangeType, PriceListCounts } from '@shared/schemas/price-lists';
import { formatCount } from '@shared/format';
import { ChangeTable } from './change-table';
import { RejectedRows } from './rejected-rows';

type Tab = PriceListChangeType | 'rejected';

const TABS: { id: Tab; label: string; count: (c: PriceListCounts) => number | undefined }[] = [
  { id: 'changed', label: 'Price changes', count: (c) => c.changed },
  { id: 'new', label: 'New parts', count: (c) => c.new },
  { id: 'supersession', label: 'Supersessions', count: (c) => c.supersessions },
  { id: 'unchanged', label: 'Unchanged', count: (c) => c.unchanged },
  { id: 'rejected', label: 'Rejected rows', count: (c) => c.rejected },
];

function firstWithRows(counts: PriceListCounts): Tab {
  return TABS.find((t) => (t.count(counts) ?? 0) > 0)?.id ?? 'changed';
}

/** The staged list's rows by what committing would do to them; arrow keys move between tabs. */
export function PreviewTabs({ listId, counts }: { listId: string; counts: PriceListCounts }) {
  const [tab, setTab] = useState<Tab>(() => firstWithRows(counts));
  const base = useId();
  const refs = useRef<(HTMLButtonElement | null)[]>([]);

  const onKey = (e: KeyboardEvent, index: number) => {
    const step = e.key === 'ArrowRight' ? 1 : e.key === 'ArrowLeft' ? -1 : 0;
    let next = step === 0 ? -1 : (index + step + TABS.length) % TABS.length;
    if (e.key === 'Home') next = 0;
    if (e.key === 'End') next = TABS.length - 1;
    const t = TABS[next];
    if (!t) return;
    e.preventDefault();
    setTab(t.id);
    refs.current[next]?.focus();
  };

  return (
    <div>
      <div role="tablist" aria-label="Preview" className="flex flex-wrap gap-1 border-b border-ink/10">
        {TABS.map((t, i) => {
          const n = t.count(counts);
          const selected = t.id === tab;
          return (
            <button
              key={t.id}
              ref={(el) => {
                refs.current[i] = el;
              }}
              type="button"
              role="tab"
              id={`${base}-tab-${t.id}`}
              aria-selected={selected}
              aria-controls={`${base}-panel-${t.id}`}
              tabIndex={selected ? 0 : -1}
              onClick={() => setTab(t.id)}
              onKeyDown={(e) => onKey(e, i)}
              className={`-mb-px border-b-2 px-3 py-2 text-[15px] font-medium ${
                selected ? 'border-accent text-accent-strong' : 'border-transparent text-ink-soft hover:text-ink'
              }`}
            >
              {t.label}
              {n !== undefined && (
                <span
                  className={`ml-1.5 rounded px-1.5 py-0.5 text-xs tabular-nums ${
                    t.id === 'rejected' && n > 0 ? 'bg-nogo-soft text-nogo' : 'bg-paper-sunk text-ink-soft'
                  }`}
                >
                  {formatCount(n)}
                </span>
              )}
            </button>
          );
        })}
      </div>
      <div role="tabpanel" id={`${base}-panel-${tab}`} aria-labelledby={`${base}-tab-${tab}`} className="pt-2">
        {tab === 'rejected' ? (
          <RejectedRows key={listId} listId={listId} />
        ) : (
          <ChangeTable key={`${listId}-${tab}`} listId={listId} type={tab} />
        )}
      </div>
    </div>
  );
}
