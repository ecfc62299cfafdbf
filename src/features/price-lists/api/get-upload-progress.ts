import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { priceListSchema, type PriceList } from '@shared/schemas/price-lists';
import { api, ApiError } from '@/lib/api-client';
import { priceListKeys } from './keys';

/**
 * The list an upload is turning into, while the upload request is still open. Until the server
 * has read the form's first fields there is nothing to show: that 404 is "not yet", not an error.
 */
export async function getUploadProgress(uploadId: string): Promise<PriceList | null> {
  try {
    return await api('GET', `/api/price-lists/${encodeURIComponent(uploadId)}`, { schema: priceListSchema });
  } catch (e) {
    if (e instanceof ApiError && e.status === 404) return null;
    throw e;
  }
}

export const uploadProgressQueryOptions = (uploadId: string | null) =>
  queryOptions({
    queryKey: priceListKeys.uploadProgress(uploadId ?? ''),
    queryFn: uploadId === null ? skipToken : () => getUploadProgress(uploadId),
    refetchInterval: 400,
    retry: false,
    gcTime: 0,
  });

export const useUploadProgress = (uploadId: string | null) => useQuery(uploadProgressQueryOptions(uploadId));
