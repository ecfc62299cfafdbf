import { useMutation, useQueryClient } from '@tanstack/react-query';
import { transferResponseSchema, type TransferStepBody } from '@shared/schemas/locations';
import { api } from '@/lib/api-client';
import { transferKeys } from './keys';

export const stepTransfer = async ({ id, body }: { id: string; body: TransferStepBody }) =>
  (await api('POST', `/api/transfers/${encodeURIComponent(id)}/steps`, { body, schema: transferResponseSchema })).transfer;

/** Settled either way, the list is read again: after a 409 it shows what the other person did. */
export function useStepTransfer() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: stepTransfer, onSettled: () => qc.invalidateQueries({ queryKey: transferKeys.all }) });
}
