import { useState } from 'react';
import type { PriceListChangeType, PriceListCounts } from '@shared/schemas/price-lists';
import { Tabs } from '@/components/ui/tabs';
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
  const items = TABS.map((t) => ({ value: t.id, label: t.label, count: t.count(counts), alert: t.id === 'rejected' }));
  return (
    <Tabs label="Preview" items={items} value={tab} onValueChange={setTab}>
      {tab === 'rejected' ? (
        <RejectedRows key={listId} listId={listId} />
      ) : (
        <ChangeTable key={`${listId}-${tab}`} listId={listId} type={tab} />
      )}
    </Tabs>
  );
}
