import type { CompatResult } from '@shared/schemas/compat';

export const LOAD_POINT_LABELS: Record<CompatResult['loadPoints'][number]['name'], string> = {
  idle: 'idle',
  cruise: 'cruise',
  full: 'full load',
  boost: 'boost',
};
