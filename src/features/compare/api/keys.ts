import type { PartKind } from '@shared/schemas/specs';
import type { CoilCompareBody, PlugCompareBody } from '@shared/schemas/compat';

export const compareKeys = {
  coil: (body: CoilCompareBody) => ['compare', 'coil', body] as const,
  plug: (body: PlugCompareBody) => ['compare', 'plug', body] as const,
  search: (kind: PartKind, q: string) => ['compare', 'search', kind, q] as const,
};
