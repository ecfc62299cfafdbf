import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { partDetailSchema, type PartDetail } from '@shared/schemas/parts';
import { api } from '@/lib/api-client';
import { catalogEditKeys } from './keys';

export const getPart = (id: string): Promise<PartDetail> =>
  api('GET', `/api/parts/${encodeURIComponent(id)}`, { schema: partDetailSchema });

export const partQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: catalogEditKeys.part(id ?? ''), queryFn: id === null ? skipToken : () => getPart(id) });

export const usePart = (id: string | null) => useQuery(partQueryOptions(id));
