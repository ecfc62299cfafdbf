import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { partDetailSchema, type PartDetail } from '@shared/schemas/parts';
import { api } from '@/lib/api-client';
import { benchKeys } from './keys';

/** What the bench test reads of a coil: who it is and its spec, for its resistance windows. */
export type CoilPart = Pick<PartDetail, 'part' | 'spec'>;

export const getCoil = (id: string): Promise<PartDetail> =>
  api('GET', `/api/parts/${encodeURIComponent(id)}`, { schema: partDetailSchema });

export const coilQueryOptions = (id: string | null) =>
  queryOptions({ queryKey: benchKeys.coil(id ?? ''), queryFn: id === null ? skipToken : () => getCoil(id), staleTime: 60_000 });

/** The chosen coil with its spec, for its resistance windows. */
export const useCoil = (id: string | null) => useQuery(coilQueryOptions(id));
