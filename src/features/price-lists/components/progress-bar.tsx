/** A labelled bar; without a value it shows that work goes on without saying how far. */
export function ProgressBar({ label, value, detail }: { label: string; value: number | null; detail?: string }) {
  const pct = value === null ? null : Math.max(0, Math.min(100, Math.round(value * 100)));
  return (
    <div className="flex flex-col gap-1">
      <div className="flex items-baseline justify-between gap-2 text-sm">
        <span className="font-medium text-ink">{label}</span>
        <span className="tabular-nums text-ink-soft">{detail ?? (pct === null ? '' : `${pct}%`)}</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct ?? undefined}
        aria-valuetext={detail}
        className="h-2.5 overflow-hidden rounded-full bg-paper-sunk"
      >
        {pct === null ? (
          <div className="h-full w-1/3 animate-pulse rounded-full bg-accent/60" />
        ) : (
          <div className="h-full rounded-full bg-accent transition-[width] duration-200" style={{ width: `${pct}%` }} />
        )}
      </div>
    </div>
  );
}
