import { useMutation, useQueryClient } from '@tanstack/react-query';
import { transferResponseSchema, type TransferRequestBody } from '@shared/schemas/locations';
import { api } from '@/lib/api-client';
import { transferKeys } from './keys';

export const requestTransfer = async (body: TransferRequestBody) =>
  (await api('POST', '/api/transfers', { body, schema: transferResponseSchema })).transfer;

export function useRequestTransfer() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: requestTransfer, onSuccess: () => qc.invalidateQueries({ queryKey: transferKeys.all }) });
}
