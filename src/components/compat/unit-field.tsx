import { useId, type InputHTMLAttributes, type ReactNode } from 'react';

/**
 * A number field whose unit keeps its case: the label is set in capitals like the other fields,
 * but "mH", "kΩ" and "kV" must not turn into "MH", "KΩ" and "KV" (a megahenry is not a millihenry).
 */
export function UnitField({
  label,
  unit,
  hint,
  error,
  ...props
}: InputHTMLAttributes<HTMLInputElement> & { label: string; unit?: string | undefined; hint?: ReactNode; error?: string | undefined }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-semibold text-ink-soft">
        <span className="uppercase tracking-wide">{label}</span>
        {unit && <span className="font-normal"> ({unit})</span>}
      </label>
      <input
        id={id}
        inputMode="decimal"
        aria-invalid={error ? true : undefined}
        {...props}
        className={`w-full rounded-md border bg-paper-raised px-2.5 py-1.5 text-[15px] tabular-nums text-ink placeholder:text-ink-faint focus:border-accent disabled:bg-paper-sunk disabled:text-ink-faint ${error ? 'border-nogo' : 'border-ink/20'} ${props.className ?? ''}`}
      />
      {hint && !error && <p className="text-xs text-ink-faint">{hint}</p>}
      {error && <p className="text-xs text-nogo">{error}</p>}
    </div>
  );
}
