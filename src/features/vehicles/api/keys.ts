import type { PartKind } from '@shared/schemas/specs';

/** The one cache of vehicle lists and engines, shared by every page that picks a vehicle. */
export const vehicleKeys = {
  years: ['vehicles', 'years'] as const,
  makes: (year: number) => ['vehicles', 'makes', year] as const,
  models: (year: number, make: string) => ['vehicles', 'models', year, make] as const,
  engines: (year: number, make: string, model: string) => ['vehicles', 'engines', year, make, model] as const,
  engine: (id: string) => ['vehicles', 'engine', id] as const,
  alternates: (engineId: string, kind: PartKind, includeNoGo: boolean) =>
    ['vehicles', 'engine', engineId, 'alternates', kind, includeNoGo ? 'all' : 'fitting'] as const,
};
