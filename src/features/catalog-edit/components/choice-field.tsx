import { useId, type ReactNode, type SelectHTMLAttributes } from 'react';

/**
 * A labelled select with its hint or its error in the same block, as the text fields have them:
 * the shared SelectField has no error to show.
 */
export function ChoiceField({
  label,
  hint,
  error,
  children,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & { label: string; hint?: ReactNode; error?: string | undefined; children: ReactNode }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-semibold tracking-wide text-ink-soft uppercase">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        {...props}
        className={`w-full rounded-md border bg-paper-raised px-2.5 py-1.5 text-[15px] text-ink focus:border-accent disabled:bg-paper-sunk disabled:text-ink-faint ${error ? 'border-nogo' : 'border-ink/20'} ${props.className ?? ''}`}
      >
        {children}
      </select>
      {hint && !error && <p className="text-xs text-ink-faint">{hint}</p>}
      {error && <p className="text-xs text-nogo">{error}</p>}
    </div>
  );
}
