/** A price move above the store's threshold: an icon and the word, never colour alone. */
export function FlagMark({ label = 'Flagged' }: { label?: string }) {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded bg-review-soft px-1.5 py-0.5 text-xs font-semibold text-review">
      <svg aria-hidden viewBox="0 0 16 16" className="h-3.5 w-3.5">
        <path d="M8 1.5 15 14H1z" fill="currentColor" />
        <path d="M8 6v3.6M8 11.4v.1" stroke="#fff" strokeWidth="1.6" strokeLinecap="round" />
      </svg>
      {label}
    </span>
  );
}
