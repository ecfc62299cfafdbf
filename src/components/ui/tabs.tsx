import * as T from '@radix-ui/react-tabs';
import type { ReactNode } from 'react';
import { formatCount } from '@shared/format';

/**
 * Tabs on Radix UI's Tabs: ← → Home End move between them and show each at once. Only the
 * selected tab's content is rendered (children), so a tab's data is fetched when it is opened.
 */
export interface TabItem<V extends string> {
  value: V;
  label: ReactNode;
  /** A count beside the label ("Rejected rows 3"); `alert` colours it as a problem when above 0. */
  count?: number | undefined;
  alert?: boolean;
}

export function Tabs<V extends string>({
  label,
  items,
  value,
  onValueChange,
  children,
}: {
  /** Names the tab list for a screen reader ("Catalog", "Preview"). */
  label: string;
  items: readonly TabItem<V>[];
  value: V;
  onValueChange: (value: V) => void;
  children: ReactNode;
}) {
  return (
    <T.Root
      value={value}
      onValueChange={(v) => {
        const item = items.find((i) => i.value === v);
        if (item) onValueChange(item.value);
      }}
      className="flex flex-col gap-3"
    >
      <T.List aria-label={label} className="flex flex-wrap gap-1 border-b border-ink/15">
        {items.map((t) => (
          <T.Trigger
            key={t.value}
            value={t.value}
            className="-mb-px border-b-2 border-transparent px-3 py-2 text-[15px] font-medium text-ink-soft hover:text-ink data-[state=active]:border-accent data-[state=active]:text-accent-strong"
          >
            {t.label}
            {t.count !== undefined && (
              <span
                className={`ml-1.5 rounded px-1.5 py-0.5 text-xs tabular-nums ${
                  t.alert && t.count > 0 ? 'bg-nogo-soft text-nogo' : 'bg-paper-sunk text-ink-soft'
                }`}
              >
                {formatCount(t.count)}
              </span>
            )}
          </T.Trigger>
        ))}
      </T.List>
      <T.Content value={value}>{children}</T.Content>
    </T.Root>
  );
}
