import type { SearchQuery } from '../../shared/schemas/search';

/** A value inside a Meilisearch filter string: quoted, with quotes and backslashes escaped. */
export const quote = (v: string): string => `"${v.replace(/["\\]/g, (c) => `\\${c}`)}"`;

// Spec numbers come from decimal fields: match within half a hundredth, not by float equality.
const near = (field: string, v: number): string => `${field} ${v - 0.005} TO ${v + 0.005}`;

/** The filter expressions (ANDed) for a search's kind and facets; superseded parts never show. */
export function buildFilters(q: SearchQuery): string[] {
  const f: string[] = ['current = true'];
  if (q.kind) f.push(`kind = ${quote(q.kind)}`);
  if (q.brand) f.push(`brand = ${quote(q.brand)}`);
  if (q.architecture) f.push(`architecture = ${quote(q.architecture)}`);
  if (q.driver) f.push(`driver = ${quote(q.driver)}`);
  if (q.connectorPins !== undefined) f.push(`connectorPins = ${q.connectorPins}`);
  if (q.connectorKey) f.push(`connectorKey = ${quote(q.connectorKey)}`);
  if (q.primaryOhm !== undefined) f.push(`primaryOhmMin <= ${q.primaryOhm}`, `primaryOhmMax >= ${q.primaryOhm}`);
  if (q.threadMm !== undefined) f.push(near('threadMm', q.threadMm));
  if (q.reachMm !== undefined) f.push(near('reachMm', q.reachMm));
  if (q.seat) f.push(`seat = ${quote(q.seat)}`);
  if (q.hexMm !== undefined) f.push(near('hexMm', q.hexMm));
  if (q.heatStep !== undefined) f.push(`heatStep = ${q.heatStep}`);
  if (q.resistor !== undefined) f.push(`resistor = ${q.resistor}`);
  if (q.gapMm !== undefined) f.push(near('gapMm', q.gapMm));
  return f;
}
