import { Button } from '@/components/ui/button';
import { formatCount } from '@shared/format';

export function Pager({ offset, limit, total, onOffset }: { offset: number; limit: number; total: number; onOffset: (o: number) => void }) {
  if (total <= limit) return null;
  const last = Math.min(offset + limit, total);
  return (
    <div className="flex items-center justify-end gap-2 pt-2 text-sm text-ink-soft">
      <span className="tabular-nums">
        Rows {formatCount(offset + 1)}–{formatCount(last)} of {formatCount(total)}
      </span>
      <Button variant="secondary" disabled={offset === 0} onClick={() => onOffset(Math.max(0, offset - limit))}>
        Previous
      </Button>
      <Button variant="secondary" disabled={last >= total} onClick={() => onOffset(offset + limit)}>
        Next
      </Button>
    </div>
  );
}
