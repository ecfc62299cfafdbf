import { CAUTIONS } from '@shared/schemas/compat';

/** The product's cautions, always shown in full (never folded away) beside a verdict or a bench reading. */
export function Cautions({ cautions = CAUTIONS, className = '' }: { cautions?: readonly string[]; className?: string }) {
  return (
    <aside aria-label="Cautions" className={`print-block rounded-lg border border-ink/25 bg-paper-sunk px-4 py-3 ${className}`}>
      <h2 className="mb-1.5 flex items-center gap-2 text-sm font-semibold uppercase tracking-wide text-ink">
        <svg aria-hidden viewBox="0 0 20 20" className="h-5 w-5" fill="none" stroke="currentColor" strokeWidth="1.7" strokeLinejoin="round">
          <path d="M10 1.8 18.6 17.4H1.4z" />
          <path d="M10.9 6.4 8 11.2h2.6l-1.5 3.6" strokeLinecap="round" />
        </svg>
        Cautions
      </h2>
      <ul className="flex list-disc flex-col gap-1 pl-5 text-[14px] leading-snug text-ink">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
