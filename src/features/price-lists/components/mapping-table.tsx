import {
  BASE_FIELDS,
  COIL_SPEC_FIELDS,
  FIELD_LABELS,
  PLUG_SPEC_FIELDS,
  PRICE_LIST_FIELDS,
  REQUIRED_FIELDS,
  type PriceListField,
} from '@shared/price-list/fields';
import { validateMapping, type Mapping, type MappingProblem } from '@shared/price-list/mapping';

/** A mapping key is the header as printed, or the column's index when the header is empty. */
export const columnKey = (header: string, index: number): string => (header.trim() === '' ? String(index) : header);

/** The mapping's problems against the file's columns; empty when it can be applied. */
export function mappingProblems(columns: readonly string[], mapping: Mapping): MappingProblem[] {
  const check = validateMapping(columns, mapping);
  return check.ok ? [] : check.problems;
}

const FIELD_GROUPS: { label: string; fields: readonly PriceListField[] }[] = [
  { label: 'Part and price', fields: BASE_FIELDS },
  { label: 'Coil spec', fields: COIL_SPEC_FIELDS },
  { label: 'Plug spec', fields: PLUG_SPEC_FIELDS },
];

const isField = (v: string): v is PriceListField => (PRICE_LIST_FIELDS as readonly string[]).includes(v);

function CheckIcon({ ok }: { ok: boolean }) {
  return ok ? (
    <svg aria-hidden viewBox="0 0 16 16" className="h-4 w-4 text-go">
      <path d="m3.5 8.5 3 3 6-7" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  ) : (
    <svg aria-hidden viewBox="0 0 16 16" className="h-4 w-4 text-nogo">
      <path d="m4 4 8 8M12 4l-8 8" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
    </svg>
  );
}

/**
 * The file's columns against Arcwise's fields, one select per column. Required fields are
 * listed above the table with whether a column fills them, and each problem is spelled out.
 */
export function MappingTable({
  columns,
  mapping,
  onChange,
  disabled = false,
}: {
  columns: readonly string[];
  mapping: Mapping;
  onChange: (next: Mapping) => void;
  disabled?: boolean;
}) {
  const problems = mappingProblems(columns, mapping);
  const mapped = new Set(Object.values(mapping).filter((f): f is PriceListField => f !== null));
  const twice = new Set(problems.flatMap((p) => (p.code === 'mapped-twice' ? [p.field] : [])));

  const set = (key: string, value: string) => onChange({ ...mapping, [key]: isField(value) ? value : null });

  return (
    <div className="flex flex-col gap-3">
      <ul aria-label="Required fields" className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        {REQUIRED_FIELDS.map((f) => (
          <li key={f} className="flex items-center gap-1">
            <CheckIcon ok={mapped.has(f)} />
            <span className={mapped.has(f) ? 'text-ink' : 'font-medium text-nogo'}>{FIELD_LABELS[f]}</span>
            <span className="sr-only">{mapped.has(f) ? 'mapped' : 'not mapped'}</span>
          </li>
        ))}
      </ul>
      <table className="w-full text-left text-[15px]">
        <thead className="border-b border-ink/10 text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="whitespace-nowrap py-1.5 pr-3">In the file</th>
            <th className="py-1.5">Arcwise field</th>
          </tr>
        </thead>
        <tbody>
          {columns.map((header, i) => {
            const key = columnKey(header, i);
            const field = mapping[key] ?? null;
            const id = `map-col-${i}`;
            return (
              <tr key={key} className="border-b border-ink/5">
                <td className="py-1 pr-3 align-middle">
                  <label htmlFor={id} className="font-mono text-sm text-ink">
                    {header.trim() === '' ? <span className="italic text-ink-soft">column {i + 1}, no header</span> : header}
                  </label>
                </td>
                <td className="py-1">
                  <div className="flex items-center gap-2">
                    <select
                      id={id}
                      value={field ?? ''}
                      disabled={disabled}
                      onChange={(e) => set(key, e.target.value)}
                      className={`w-full rounded border bg-paper-raised px-2 py-1 text-[15px] ${
                        field !== null && twice.has(field)
                          ? 'border-nogo'
                          : field === null
                            ? 'border-ink/15 text-ink-soft'
                            : 'border-ink/25'
                      }`}
                    >
                      <option value="">— not used —</option>
                      {FIELD_GROUPS.map((g) => (
                        <optgroup key={g.label} label={g.label}>
                          {g.fields.map((f) => (
                            <option key={f} value={f}>
                              {FIELD_LABELS[f]}
                              {REQUIRED_FIELDS.includes(f) ? ' (required)' : ''}
                            </option>
                          ))}
                        </optgroup>
                      ))}
                    </select>
                    {field !== null && twice.has(field) && (
                      <span className="whitespace-nowrap text-xs font-semibold text-nogo">used twice</span>
                    )}
                  </div>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {problems.length > 0 && (
        <ul
          role="alert"
          aria-label="Mapping problems"
          className="flex flex-col gap-1 rounded-md border border-nogo/30 bg-nogo-soft px-3 py-2 text-sm text-nogo"
        >
          {problems.map((p) => (
            <li key={`${p.code}-${p.code === 'unknown-column' ? p.key : p.field}`}>
              {p.message.charAt(0).toUpperCase() + p.message.slice(1)}.
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
