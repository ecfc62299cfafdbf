import type { PartKind } from '@shared/schemas/specs';
import type { CoilCompareBody, PlugCompareBody } from '@shared/schemas/compat';

export const compareKeys = {
  coil: (body: CoilCompareBody) => ['compare', 'coil', body] as const,
  plug: (body: PlugCompareBody) => ['compare', 'plug', body] as const,
  search: (kind: PartKind, q: string) => ['compare', 'search', kind, q] as const,
  part: (id: string) => ['compare', 'part', id] as const,
  engine: (id: string) => ['compare', 'engine', id] as const,
  years: ['compare', 'vehicles', 'years'] as const,
  makes: (year: number) => ['compare', 'vehicles', 'makes', year] as const,
  models: (year: number, make: string) => ['compare', 'vehicles', 'models', year, make] as const,
  engines: (year: number, make: string, model: string) => ['compare', 'vehicles', 'engines', year, make, model] as const,
};
