import type { PartKind } from '@shared/schemas/specs';

export const catalogKeys = {
  years: ['catalog', 'vehicles', 'years'] as const,
  makes: (year: number) => ['catalog', 'vehicles', 'makes', year] as const,
  models: (year: number, make: string) => ['catalog', 'vehicles', 'models', year, make] as const,
  engines: (year: number, make: string, model: string) => ['catalog', 'vehicles', 'engines', year, make, model] as const,
  engine: (id: string) => ['catalog', 'engine', id] as const,
  alternates: (engineId: string, kind: PartKind, includeNoGo: boolean) =>
    ['catalog', 'engine', engineId, 'alternates', kind, includeNoGo ? 'all' : 'fitting'] as const,
  part: (id: string, engineId: string | null = null) => ['catalog', 'part', id, engineId ?? 'no-engine'] as const,
};
