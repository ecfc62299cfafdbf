import type { PartKind } from '@shared/schemas/specs';
import type { SearchResponse } from '@shared/schemas/search';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import type { SpecFilters as Filters } from '../api/search-parts';
import { facetValues, filtersFor, type FilterControl } from '../filters';

function FacetSelect({
  control,
  value,
  counts,
  onChange,
}: {
  control: FilterControl;
  value: string;
  counts: Record<string, number> | undefined;
  onChange: (value: string) => void;
}) {
  const values = facetValues(control, counts);
  // A chosen value stays in the list even when the catalog's counts no longer name it.
  if (value && !values.includes(value)) values.unshift(value);
  return (
    <SelectField label={control.label} unit={control.unit} value={value} onChange={(e) => onChange(e.target.value)}>
      <option value="">any</option>
      {values.map((v) => (
        <option key={v} value={v}>
          {control.display ? control.display(v) : v}
          {counts ? ` (${counts[v] ?? 0})` : ''}
        </option>
      ))}
    </SelectField>
  );
}

/**
 * The spec filters of the chosen kind. The counts beside each value come from the same words and
 * kind without the spec filters, so every value stays choosable while others are set.
 */
export function SpecFilters({
  kind,
  filters,
  facets,
  onChange,
}: {
  kind: PartKind;
  filters: Filters;
  facets: SearchResponse['facets'] | undefined;
  onChange: (filters: Filters) => void;
}) {
  const controls = filtersFor(kind);
  const set = (field: FilterControl['field'], value: string) => onChange({ ...filters, [field]: value });
  const anySet = controls.some((c) => filters[c.field]);
  const notes = controls.flatMap((c) => (c.hint ? [`${c.label}: ${c.hint}.`] : []));
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="sr-only">{kind === 'plug' ? 'Spark plug spec' : 'Ignition coil spec'}</legend>
      <div className="grid grid-cols-2 gap-x-3 gap-y-2 sm:grid-cols-4">
        {controls.map((c) =>
          c.control === 'facet' ? (
            <FacetSelect
              key={c.field}
              control={c}
              value={filters[c.field] ?? ''}
              counts={facets?.[c.field]}
              onChange={(v) => set(c.field, v)}
            />
          ) : (
            <TextField
              key={c.field}
              label={c.label}
              unit={c.unit}
              type="number"
              inputMode="decimal"
              min="0"
              step={c.step}
              value={filters[c.field] ?? ''}
              onChange={(e) => set(c.field, e.target.value)}
            />
          ),
        )}
      </div>
      {/* Notes under the grid, not under each control, so the controls stay in line. */}
      {notes.length > 0 && <p className="text-sm text-ink-soft">{notes.join(' ')}</p>}
      {anySet && (
        <div>
          <Button variant="ghost" onClick={() => onChange({})}>
            Clear spec filters
          </Button>
        </div>
      )}
    </fieldset>
  );
}
