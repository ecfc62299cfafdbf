import { yesNo } from '@shared/format';
import { COIL_ARCHITECTURES, COIL_DRIVERS, PLUG_SEATS, type PartKind } from '@shared/schemas/specs';
import { specField } from '@shared/spec-fields';
import type { FacetField } from './api/search-parts';

/**
 * The spec filters of each kind. `facet` controls list the values the catalog holds, with how
 * many parts have each; `number` controls take a figure (a gap, a measured resistance) because
 * the server matches those against a window or has no facet for them. Labels, units, hints and
 * value words come from the one spec-field table (shared/spec-fields.ts).
 */
export interface FilterControl {
  field: FacetField;
  label: string;
  unit?: string | undefined;
  control: 'facet' | 'number';
  /** Values that always exist, shown even when no part of the current answer has them. */
  fixed?: readonly string[];
  /** How a value reads in the list; the raw value is what the server gets. */
  display?: (value: string) => string;
  step?: string;
  hint?: string | undefined;
}

type Extra = Omit<FilterControl, 'field' | 'label' | 'unit' | 'control'>;

/** A filter on a spec field, named as the spec-field table names it (a window's end by its quantity). */
function specFilter(field: FacetField, specName: string, control: FilterControl['control'], extra: Extra = {}): FilterControl {
  const def = specField(specName);
  const words = def?.words;
  return {
    field,
    label: def?.quantity ?? def?.label ?? specName,
    unit: def?.unit,
    control,
    ...(words ? { display: (v: string) => words[v] ?? v } : {}),
    ...(def?.input === 'checkbox' ? { fixed: ['true', 'false'], display: (v: string) => yesNo(v === 'true') } : {}),
    ...extra,
  };
}

// Brand is the part's, not a spec field.
const BRAND: FilterControl = { field: 'brand', label: 'Brand', control: 'facet' };

export const PLUG_FILTERS: FilterControl[] = [
  specFilter('threadMm', 'threadMm', 'facet'),
  specFilter('reachMm', 'reachMm', 'facet'),
  specFilter('seat', 'seat', 'facet', { fixed: PLUG_SEATS }),
  specFilter('hexMm', 'hexMm', 'facet'),
  specFilter('heatStep', 'heatStep', 'facet', { hint: specField('heatStep')?.hint }),
  specFilter('resistor', 'resistor', 'facet'),
  specFilter('gapMm', 'gapMm', 'number', { step: '0.05' }),
  BRAND,
];

export const COIL_FILTERS: FilterControl[] = [
  specFilter('architecture', 'architecture', 'facet', { fixed: COIL_ARCHITECTURES }),
  specFilter('driver', 'driver', 'facet', { fixed: COIL_DRIVERS }),
  specFilter('connectorPins', 'connectorPins', 'number', { step: '1' }),
  specFilter('connectorKey', 'connectorKey', 'facet'),
  specFilter('primaryOhm', 'primaryOhmMin', 'number', {
    step: '0.01',
    hint: 'a measured value; finds the coils whose window holds it',
  }),
  BRAND,
];

export const filtersFor = (kind: PartKind): FilterControl[] => (kind === 'plug' ? PLUG_FILTERS : COIL_FILTERS);

const byNumberThenText = (a: string, b: string): number => {
  const na = Number(a);
  const nb = Number(b);
  return Number.isFinite(na) && Number.isFinite(nb) ? na - nb : a.localeCompare(b);
};

/** A facet control's values: the fixed ones and those the catalog reports, each once, in order. */
export function facetValues(control: FilterControl, counts: Record<string, number> | undefined): string[] {
  const values = new Set([...(control.fixed ?? []), ...Object.keys(counts ?? {})]);
  return [...values].sort(control.fixed ? () => 0 : byNumberThenText);
}
