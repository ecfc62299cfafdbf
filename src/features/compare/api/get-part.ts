import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { partDetailSchema, type PartDetail } from '@shared/schemas/parts';
import { api } from '@/lib/api-client';
import { compareKeys } from './keys';

/** What Compare shows of a part: who it is and its spec (coil or plug, null without one). */
export type PartWithSpec = Pick<PartDetail, 'part' | 'spec'>;

export const getPart = (id: string): Promise<PartDetail> =>
  api('GET', `/api/parts/${encodeURIComponent(id)}`, { schema: partDetailSchema });

export const partQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: compareKeys.part(id ?? ''), queryFn: id === null ? skipToken : () => getPart(id), staleTime: 60_000 });

export const usePart = (id: string | null) => useQuery(partQueryOptions(id));
