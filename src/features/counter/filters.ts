import { COIL_ARCHITECTURES, COIL_DRIVERS, PLUG_SEATS, type PartKind } from '@shared/schemas/specs';
import type { FacetField } from './api/search-parts';

/**
 * The spec filters of each kind. `facet` controls list the values the catalog holds, with how
 * many parts have each; `number` controls take a figure (a gap, a measured resistance) because
 * the server matches those against a window or has no facet for them.
 */
export interface FilterControl {
  field: FacetField;
  label: string;
  control: 'facet' | 'number';
  /** Values that always exist, shown even when no part of the current answer has them. */
  fixed?: readonly string[];
  /** How a value reads in the list; the raw value is what the server gets. */
  display?: (value: string) => string;
  step?: string;
  hint?: string;
}

const BRAND: FilterControl = { field: 'brand', label: 'Brand', control: 'facet' };

const DRIVER_WORDS: Record<string, string> = { integrated: 'integrated igniter', external: 'external driver' };
const yesNo = (v: string): string => (v === 'true' ? 'yes' : v === 'false' ? 'no' : v);

export const PLUG_FILTERS: FilterControl[] = [
  { field: 'threadMm', label: 'Thread (mm)', control: 'facet' },
  { field: 'reachMm', label: 'Reach (mm)', control: 'facet' },
  { field: 'seat', label: 'Seat', control: 'facet', fixed: PLUG_SEATS },
  { field: 'hexMm', label: 'Hex (mm)', control: 'facet' },
  { field: 'heatStep', label: 'Heat step', control: 'facet', hint: '1 is the hottest, 15 the coldest' },
  { field: 'resistor', label: 'Resistor', control: 'facet', fixed: ['true', 'false'], display: yesNo },
  { field: 'gapMm', label: 'Gap (mm)', control: 'number', step: '0.05' },
  BRAND,
];

export const COIL_FILTERS: FilterControl[] = [
  { field: 'architecture', label: 'Architecture', control: 'facet', fixed: COIL_ARCHITECTURES },
  { field: 'driver', label: 'Driver', control: 'facet', fixed: COIL_DRIVERS, display: (v) => DRIVER_WORDS[v] ?? v },
  { field: 'connectorPins', label: 'Connector pins', control: 'number', step: '1' },
  { field: 'connectorKey', label: 'Connector key', control: 'facet' },
  {
    field: 'primaryOhm',
    label: 'Primary (Ω)',
    control: 'number',
    step: '0.01',
    hint: 'a measured value; finds the coils whose window holds it',
  },
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
