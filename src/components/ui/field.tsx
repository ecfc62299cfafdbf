import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';

/** What a control needs to be tied to its label, hint and error. */
export interface ControlIds {
  id: string;
  'aria-invalid'?: true;
  'aria-describedby'?: string;
}

export const CONTROL_CLASS =
  'w-full rounded-md border bg-paper-raised px-2.5 py-1.5 text-[15px] text-ink placeholder:text-ink-faint focus:border-accent disabled:bg-paper-sunk disabled:text-ink-faint';

export const controlClass = (error: string | undefined, extra = ''): string =>
  `${CONTROL_CLASS} ${error ? 'border-nogo' : 'border-ink/20'} ${extra}`;

export interface FieldFrameProps {
  label: ReactNode;
  /** Shown beside the label in its own case: "mH" must not read "MH" (a megahenry). */
  unit?: string | undefined;
  hint?: ReactNode;
  error?: string | undefined;
  className?: string;
  /** The control, given the id and ARIA attributes that tie it to the label, hint and error. */
  children: (ids: ControlIds) => ReactNode;
}

/**
 * The label, hint and error around one control, wired for assistive technology: the label names
 * the control, the hint and the error describe it, and an error marks it invalid.
 */
export function FieldFrame({ label, unit, hint, error, className = '', children }: FieldFrameProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-xs font-semibold text-ink-soft">
        <span className="uppercase tracking-wide">{label}</span>
        {unit && <span className="font-normal"> ({unit})</span>}
      </label>
      {children({ id, ...(error ? { 'aria-invalid': true as const } : {}), ...(describedBy ? { 'aria-describedby': describedBy } : {}) })}
      {hint && (
        <p id={hintId} className="text-xs text-ink-faint">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="text-xs font-medium text-nogo">
          {error}
        </p>
      )}
    </div>
  );
}

type FrameProps = { label: string; unit?: string | undefined; hint?: ReactNode; error?: string | undefined };

/** A text or number input with its label; with a unit it takes decimals (a decimal keypad on a phone). */
export function TextField({
  label,
  unit,
  hint,
  error,
  className,
  ...props
}: InputHTMLAttributes<HTMLInputElement> & FrameProps & { ref?: Ref<HTMLInputElement> }) {
  return (
    <FieldFrame label={label} unit={unit} hint={hint} error={error}>
      {(ids) => (
        <input
          inputMode={unit ? 'decimal' : undefined}
          {...props}
          {...ids}
          className={controlClass(error, `${unit ? 'tabular-nums' : ''} ${className ?? ''}`)}
        />
      )}
    </FieldFrame>
  );
}

export function SelectField({
  label,
  unit,
  hint,
  error,
  className,
  children,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & FrameProps & { children: ReactNode; ref?: Ref<HTMLSelectElement> }) {
  return (
    <FieldFrame label={label} unit={unit} hint={hint} error={error}>
      {(ids) => (
        <select {...props} {...ids} className={controlClass(error, className)}>
          {children}
        </select>
      )}
    </FieldFrame>
  );
}

/** A checkbox with its label to the right, as people expect a tick box to read. */
export function CheckboxField({
  label,
  hint,
  error,
  className = '',
  ...props
}: Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> & Omit<FrameProps, 'unit'> & { ref?: Ref<HTMLInputElement> }) {
  const id = useId();
  const describedBy = [error && `${id}-error`, hint && `${id}-hint`].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-0.5 ${className}`}>
      <div className="flex items-center gap-2">
        <input
          {...props}
          id={id}
          type="checkbox"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className="h-4 w-4 accent-accent"
        />
        <label htmlFor={id} className="text-[15px] text-ink">
          {label}
        </label>
      </div>
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-xs font-medium text-nogo">
          {error}
        </p>
      )}
    </div>
  );
}
