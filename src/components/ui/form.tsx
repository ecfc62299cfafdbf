import { zodResolver } from '@hookform/resolvers/zod';
import {
  createContext,
  useCallback,
  useContext,
  useEffect,
  useMemo,
  useRef,
  useState,
  type FormHTMLAttributes,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
} from 'react';
import {
  FormProvider,
  get,
  useForm,
  useFormContext,
  useFormState,
  useWatch,
  type FieldValues,
  type Path,
  type RegisterOptions,
  type UseFormProps,
  type UseFormReturn,
} from 'react-hook-form';
import type { z } from 'zod';
import { WHOLE_BODY } from '@shared/validation/field-issues';
import { plainWords } from '@shared/validation/plain-words';
import { CheckboxField, controlClass, FieldFrame, type ControlIds } from './field';
import { apiFieldIssues, labelledMessage, specLabelOf } from './field-errors';
import { ErrorNote } from './panel';

/**
 * Forms on react-hook-form with the request's zod schema from shared/schemas. The schema checks
 * in the browser with the same words the API answers in (shared/validation/plain-words.ts);
 * each field shows its own message with its label; an API 400's `details` land on the fields
 * they name, and only what no field shows is written once, at the end of the form.
 */

type AnySchema = z.ZodType<FieldValues, FieldValues>;
export type SchemaForm<S extends AnySchema> = UseFormReturn<z.input<S>, unknown, z.output<S>>;

/** useForm on a shared schema: checked when a field is left, then on every change. */
export function useSchemaForm<S extends AnySchema>(
  schema: S,
  options: Omit<UseFormProps<z.input<S>, unknown, z.output<S>>, 'resolver'> = {},
): SchemaForm<S> {
  return useForm<z.input<S>, unknown, z.output<S>>({
    mode: 'onTouched',
    ...options,
    resolver: zodResolver(schema, { error: plainWords }),
  });
}

// The fields a form shows, by name, with their labels: a server message is placed on its field
// only when one shows it, and a field name inside a message reads as that field's label.
interface FieldRegistry {
  add(name: string, label: string): () => void;
}
const RegistryContext = createContext<FieldRegistry | null>(null);
const LabelsContext = createContext<(key: string) => string | undefined>(() => undefined);

export interface FormProps<TIn extends FieldValues, TOut> extends Omit<FormHTMLAttributes<HTMLFormElement>, 'onSubmit'> {
  form: UseFormReturn<TIn, unknown, TOut>;
  /** Called with the parsed values (the schema's output) once every field is valid. */
  onSubmit: (values: TOut) => unknown;
  /** The last failed request's error (a mutation's `error`): its field details go on the fields. */
  serverError?: unknown;
  /** The body path the form's fields sit under in the API's field names ("substitute.spec"). */
  serverFieldPrefix?: string;
  children: ReactNode;
}

export function Form<TIn extends FieldValues, TOut>({
  form,
  onSubmit,
  serverError,
  serverFieldPrefix = '',
  children,
  ...props
}: FormProps<TIn, TOut>) {
  const labels = useRef(new Map<string, string>());
  const [unplaced, setUnplaced] = useState<string[]>([]);

  const registry = useMemo<FieldRegistry>(
    () => ({
      add(name, label) {
        labels.current.set(name, label);
        return () => labels.current.delete(name);
      },
    }),
    [],
  );
  // A schema names a sibling by its own key ("primaryOhmMax"), the form by its path ("spec.primaryOhmMax").
  const labelOf = useCallback((key: string) => {
    const exact = labels.current.get(key);
    if (exact !== undefined) return exact;
    for (const [name, label] of labels.current) if (name.endsWith(`.${key}`)) return label;
    return specLabelOf(key);
  }, []);

  const { setError } = form;
  useEffect(() => {
    const issues = apiFieldIssues(serverError);
    if (!issues) {
      setUnplaced([]);
      return;
    }
    const left: string[] = [];
    for (const { field, message } of issues) {
      const name = serverFieldPrefix && field.startsWith(`${serverFieldPrefix}.`) ? field.slice(serverFieldPrefix.length + 1) : field;
      const label = labels.current.get(name);
      if (label !== undefined) setError(name as Path<TIn>, { type: 'server', message }, { shouldFocus: left.length === 0 });
      else left.push(name === WHOLE_BODY ? message : labelledMessage(name, message, labelOf));
    }
    setUnplaced(left);
  }, [serverError, serverFieldPrefix, setError, labelOf]);

  // A request error with no field details (a conflict, the network) is written once, here.
  const generalError = serverError && !apiFieldIssues(serverError) ? serverError : null;

  return (
    <FormProvider {...form}>
      <RegistryContext.Provider value={registry}>
        <LabelsContext.Provider value={labelOf}>
          <form noValidate {...props} onSubmit={form.handleSubmit(onSubmit)}>
            {children}
            {generalError ? <ErrorNote error={generalError} /> : null}
            {unplaced.length > 0 && <ErrorNote error={unplaced.join(' ')} />}
          </form>
        </LabelsContext.Provider>
      </RegistryContext.Provider>
    </FormProvider>
  );
}

/** The message of one field of the enclosing Form, in words, with its label; undefined when it is valid. */
export function useFieldError(name: string, label: string, unit?: string): string | undefined {
  const { control } = useFormContext();
  const { errors } = useFormState({ control, name });
  const labelOf = useContext(LabelsContext);
  const message = (get(errors, name) as { message?: unknown } | undefined)?.message;
  return typeof message === 'string' && message !== '' ? labelledMessage(label, message, labelOf, unit) : undefined;
}

function useRegisteredLabel(name: string, label: string) {
  const registry = useContext(RegistryContext);
  useEffect(() => registry?.add(name, label), [registry, name, label]);
}

export interface FormFieldFrameProps {
  name: string;
  label: string;
  unit?: string | undefined;
  hint?: ReactNode;
  className?: string;
  children: (ids: ControlIds) => ReactNode;
}

/** FieldFrame for a control of your own inside a Form (a Controller, a combobox): the error comes from the form. */
export function FormFieldFrame({ name, label, unit, children, ...rest }: FormFieldFrameProps) {
  useRegisteredLabel(name, label);
  const error = useFieldError(name, label, unit);
  return (
    <FieldFrame label={label} unit={unit} error={error} {...rest}>
      {children}
    </FieldFrame>
  );
}

/**
 * How an empty control reaches the schema: 'keep' sends '' (text), 'absent' leaves the field out
 * (a number or an optional field: "is required" when the schema needs it), 'null' sends null
 * (a nullable field, a select's "none").
 */
export type Blank = 'keep' | 'absent' | 'null';

function valueAs(blank: Blank, number: boolean): RegisterOptions['setValueAs'] {
  return (v: unknown) => {
    if (typeof v !== 'string') return v;
    const text = v.trim();
    if (text === '' && blank !== 'keep') return blank === 'null' ? null : undefined;
    // A comma is the decimal point on many keyboards.
    return number ? (text === '' ? undefined : Number(text.replace(',', '.'))) : v;
  };
}

type Bound = { name: string; label: string; unit?: string | undefined; hint?: ReactNode; blank?: Blank };

/**
 * A text or number input bound to a Form's field by name. `number` sends a number ("abc" is then
 * "must be a number"); a unit is shown beside the label and asks a phone for its decimal keypad.
 */
export function Field({
  name,
  label,
  unit,
  hint,
  number = false,
  blank = number ? 'absent' : 'keep',
  className,
  ...props
}: Bound & { number?: boolean } & Omit<InputHTMLAttributes<HTMLInputElement>, 'name'>) {
  const { register } = useFormContext();
  return (
    <FormFieldFrame name={name} label={label} unit={unit} hint={hint}>
      {(ids) => (
        <input
          inputMode={number ? 'decimal' : undefined}
          {...props}
          {...register(name, { setValueAs: valueAs(blank, number) })}
          {...ids}
          className={controlClass(ids['aria-invalid'] && 'invalid', `${number ? 'tabular-nums' : ''} ${className ?? ''}`)}
        />
      )}
    </FormFieldFrame>
  );
}

export interface Option {
  value: string;
  label: string;
}

/** A select bound to a Form's field; with `blank: 'null'` its empty option sends null. */
export function FieldSelect({
  name,
  label,
  unit,
  hint,
  blank = 'keep',
  options,
  className,
  ...props
}: Bound & { options: readonly (Option | string)[] } & Omit<SelectHTMLAttributes<HTMLSelectElement>, 'name' | 'children'> & {
    /** An empty first option ("Choose a shop"). */
    placeholder?: string;
  }) {
  const { register } = useFormContext();
  const { placeholder, ...selectProps } = props;
  return (
    <FormFieldFrame name={name} label={label} unit={unit} hint={hint}>
      {(ids) => (
        <select
          {...selectProps}
          {...register(name, { setValueAs: valueAs(blank, false) })}
          {...ids}
          className={controlClass(ids['aria-invalid'] && 'invalid', className)}
        >
          {placeholder !== undefined && <option value="">{placeholder}</option>}
          {options.map((o) => {
            const { value, label: text } = typeof o === 'string' ? { value: o, label: o } : o;
            return (
              <option key={value} value={value}>
                {text}
              </option>
            );
          })}
        </select>
      )}
    </FormFieldFrame>
  );
}

/** A tick box bound to a Form's boolean field. */
export function FieldCheckbox({
  name,
  label,
  hint,
  ...props
}: Omit<Bound, 'unit' | 'blank'> & Omit<InputHTMLAttributes<HTMLInputElement>, 'name' | 'type'>) {
  const { register } = useFormContext();
  useRegisteredLabel(name, label);
  const error = useFieldError(name, label);
  return <CheckboxField {...props} {...register(name)} label={label} hint={hint} error={error} />;
}

/**
 * Whether a result on screen still belongs to the inputs shown. Call `shown()` when a result
 * for the current values arrives (in onSubmit); `isCurrent` turns false the moment any input
 * changes, including to something invalid, so the page can clear the result or mark it out of date.
 */
export function useResultIsCurrent<TIn extends FieldValues>(
  form: UseFormReturn<TIn, unknown, unknown>,
): { isCurrent: boolean; shown: () => void } {
  const values: unknown = useWatch({ control: form.control });
  const [shownFor, setShownFor] = useState<string | null>(null);
  const { getValues } = form;
  const shown = useCallback(() => setShownFor(JSON.stringify(getValues())), [getValues]);
  return { isCurrent: shownFor !== null && shownFor === JSON.stringify(values), shown };
}
