import { queryOptions, useQuery } from '@tanstack/react-query';
import { transfersResponseSchema } from '@shared/schemas/locations';
import { api } from '@/lib/api-client';
import { transferKeys } from './keys';

export const getTransfers = async () => api('GET', '/api/transfers', { schema: transfersResponseSchema });

// The other store moves a transfer on in its own time: the list follows without a reload.
export const transfersQueryOptions = () => queryOptions({ queryKey: transferKeys.all, queryFn: getTransfers, refetchInterval: 10_000 });

export const useTransfers = () => useQuery(transfersQueryOptions());
