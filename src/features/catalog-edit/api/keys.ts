import type { PartKind } from '@shared/schemas/specs';

export const catalogEditKeys = {
  all: ['catalog-edit'] as const,
  brands: ['catalog-edit', 'brands'] as const,
  part: (id: string) => ['catalog-edit', 'part', id] as const,
  search: (q: string, kind: PartKind | null) => ['catalog-edit', 'search', kind ?? 'any', q] as const,
};
