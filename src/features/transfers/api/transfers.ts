import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { transferResponseSchema, transfersResponseSchema, type TransferStepBody } from '@shared/schemas/locations';
import { api } from '@/lib/api-client';

const transfersKey = ['transfers'] as const;

export const getTransfers = async () => api('GET', '/api/transfers', { schema: transfersResponseSchema });

export const transfersQueryOptions = () => queryOptions({ queryKey: transfersKey, queryFn: getTransfers, refetchInterval: 10_000 });
export const useTransfers = () => useQuery(transfersQueryOptions());

export const stepTransfer = async ({ id, body }: { id: string; body: TransferStepBody }) =>
  (await api('POST', `/api/transfers/${id}/steps`, { body, schema: transferResponseSchema })).transfer;

export function useStepTransfer() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: stepTransfer, onSettled: () => qc.invalidateQueries({ queryKey: transfersKey }) });
}
