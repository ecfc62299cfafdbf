import type { CompatResult } from '@shared/schemas/compat';

export type Verdict = CompatResult['verdict'];

const BOX: Record<Verdict, string> = {
  go: 'border-go/40 bg-go-soft text-go',
  review: 'border-review/50 bg-review-soft text-review',
  'no-go': 'border-nogo/40 bg-nogo-soft text-nogo',
};

const SIZE = {
  sm: { box: 'gap-1 px-1.5 py-0.5 text-sm', icon: 'h-4 w-4' },
  lg: { box: 'gap-2 px-3 py-1.5 text-2xl', icon: 'h-7 w-7' },
} as const;

/**
 * Each verdict has its own outline — a round seal for go, a triangle for review, an octagon for
 * no-go — so the three differ in shape as well as in word and colour.
 */
export function VerdictIcon({ verdict, className = 'h-4 w-4' }: { verdict: Verdict; className?: string }) {
  return (
    <svg
      aria-hidden
      data-verdict-icon={verdict}
      viewBox="0 0 20 20"
      className={`shrink-0 ${className}`}
      fill="none"
      stroke="currentColor"
      strokeWidth="1.8"
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      {verdict === 'go' && (
        <>
          <circle cx="10" cy="10" r="8.2" />
          <path d="M6 10.3l2.7 2.7L14.2 7.4" strokeWidth="2.3" />
        </>
      )}
      {verdict === 'review' && (
        <>
          <path d="M10 1.8 18.6 17.4H1.4z" />
          <path d="M10 7.2v4.6M10 14.5v.1" strokeWidth="2.3" />
        </>
      )}
      {verdict === 'no-go' && (
        <>
          <path d="M6.6 1.8h6.8l4.8 4.8v6.8l-4.8 4.8H6.6l-4.8-4.8V6.6z" />
          <path d="M7.2 7.2l5.6 5.6M12.8 7.2l-5.6 5.6" strokeWidth="2.3" />
        </>
      )}
    </svg>
  );
}

/** A tone (one of the three verdicts' looks) with its own word: for bench readings, whose words differ. */
export function StatusBadge({ tone, label, size = 'sm' }: { tone: Verdict; label: string; size?: keyof typeof SIZE }) {
  return (
    <span
      className={`inline-flex items-center rounded-md border font-semibold whitespace-nowrap print:border-current print:bg-transparent ${BOX[tone]} ${SIZE[size].box}`}
    >
      <VerdictIcon verdict={tone} className={SIZE[size].icon} />
      {label}
    </span>
  );
}

/** A verdict as word and icon together: the colour only repeats what they say. */
export function VerdictBadge({ verdict, size = 'sm' }: { verdict: Verdict; size?: keyof typeof SIZE }) {
  return <StatusBadge tone={verdict} label={verdict} size={size} />;
}
