import { createColumnHelper } from '@tanstack/react-table';
import { createContext, useContext } from 'react';
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
import { DataTable } from '@/components/ui/data-table';

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

/** One column of the file and the field it fills. */
interface FileColumn {
  key: string;
  header: string;
  index: number;
  field: PriceListField | null;
  /** The field is mapped from another column too. */
  twice: boolean;
}

// The cells' handler changes with every mapping; a context hands it over so that the columns
// (and the selects in them) keep their identity and their focus.
const MappingContext = createContext<{ choose: (key: string, value: string) => void; disabled: boolean }>({
  choose: () => {},
  disabled: true,
});

const selectId = (c: FileColumn) => `map-col-${c.index}`;

function FileColumnName({ column: c }: { column: FileColumn }) {
  return (
    <label htmlFor={selectId(c)} className="font-mono text-sm font-normal text-ink">
      {c.header.trim() === '' ? <span className="italic text-ink-soft">column {c.index + 1}, no header</span> : c.header}
    </label>
  );
}

function FieldChoice({ column: c }: { column: FileColumn }) {
  const { choose, disabled } = useContext(MappingContext);
  return (
    <div className="flex items-center gap-2">
      <select
        id={selectId(c)}
        value={c.field ?? ''}
        disabled={disabled}
        onChange={(e) => choose(c.key, e.target.value)}
        className={`w-full min-w-40 rounded border bg-paper-raised px-2 py-1 text-[15px] ${
          c.twice ? 'border-nogo' : c.field === null ? 'border-ink/15 text-ink-soft' : 'border-ink/25'
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
      {c.twice && <span className="whitespace-nowrap text-xs font-semibold text-nogo">used twice</span>}
    </div>
  );
}

const col = createColumnHelper<FileColumn>();
const COLUMNS = [
  col.accessor('header', {
    header: 'In the file',
    cell: (c) => <FileColumnName column={c.row.original} />,
    meta: { rowHeader: true, cellClassName: 'align-middle' },
  }),
  col.display({ id: 'field', header: 'Arcwise field', cell: (c) => <FieldChoice column={c.row.original} /> }),
];

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
  const rows: FileColumn[] = columns.map((header, index) => {
    const key = columnKey(header, index);
    const field = mapping[key] ?? null;
    return { key, header, index, field, twice: field !== null && twice.has(field) };
  });

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
      <MappingContext.Provider value={{ choose: set, disabled }}>
        <DataTable label="Column mapping" data={rows} columns={COLUMNS} getRowId={(r) => r.key} />
      </MappingContext.Provider>
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
