import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';

const CONTROL =
  'w-full rounded-md border border-ink/20 bg-paper-raised px-2.5 py-1.5 text-[15px] text-ink placeholder:text-ink-faint focus:border-accent';

export function TextField({
  label,
  hint,
  error,
  ...props
}: InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: ReactNode; error?: string | undefined; ref?: Ref<HTMLInputElement> }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
        {label}
      </label>
      <input id={id} aria-invalid={error ? true : undefined} {...props} className={`${CONTROL} ${props.className ?? ''}`} />
      {hint && !error && <p className="text-xs text-ink-faint">{hint}</p>}
      {error && <p className="text-xs text-nogo">{error}</p>}
    </div>
  );
}

export function SelectField({
  label,
  hint,
  children,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & { label: string; hint?: ReactNode; children: ReactNode }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
        {label}
      </label>
      <select id={id} {...props} className={`${CONTROL} ${props.className ?? ''}`}>
        {children}
      </select>
      {hint && <p className="text-xs text-ink-faint">{hint}</p>}
    </div>
  );
}
