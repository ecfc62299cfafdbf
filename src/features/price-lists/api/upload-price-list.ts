import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { Mapping } from '@shared/price-list/mapping';
import { csrfResponseSchema } from '@shared/schemas/auth';
import { errorBodySchema } from '@shared/schemas/error';
import { priceListSchema, type PriceList } from '@shared/schemas/price-lists';
import { ApiError } from '@/lib/api-client';
import { priceListKeys } from './keys';

export interface UploadPriceListInput {
  file: File;
  supplierId: string;
  /** The buyer's mapping, when a first try was refused for a column the guess missed. */
  mapping?: Mapping;
  /** Chosen here so the server's progress can be polled before the upload's answer arrives. */
  uploadId?: string;
}

export interface UploadProgress {
  loaded: number;
  total: number;
  /** Every byte is sent; the server is reading the rows. */
  sent: boolean;
}

/**
 * A random v4 UUID. crypto.randomUUID exists only in secure contexts, and a store's back-office
 * PC may reach the app over plain http on the shop's network.
 */
export function newUploadId(): string {
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = ((b[6] ?? 0) & 0x0f) | 0x40;
  b[8] = ((b[8] ?? 0) & 0x3f) | 0x80;
  const hex = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

async function getCsrfToken(): Promise<string> {
  const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
  if (!res.ok) throw new ApiError(res.status, 'internal', `The server answered ${res.status}.`);
  return csrfResponseSchema.parse(await res.json()).token;
}

function toApiError(status: number, text: string): ApiError {
  let json: unknown = null;
  try {
    json = JSON.parse(text);
  } catch {
    // Not JSON: a proxy's page or an empty body.
  }
  const parsed = errorBodySchema.safeParse(json);
  if (parsed.success) return new ApiError(status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.details);
  if (status === 413) return new ApiError(status, 'payload_too_large', 'The file is larger than the server accepts.');
  return new ApiError(status, 'internal', `The server answered ${status}.`);
}

/**
 * Sends the file as multipart form data. XMLHttpRequest rather than fetch, because only XHR
 * reports upload progress.
 */
export async function uploadPriceList(
  input: UploadPriceListInput,
  onProgress?: (p: UploadProgress) => void,
  signal?: AbortSignal,
): Promise<PriceList> {
  const token = await getCsrfToken();
  const form = new FormData();
  form.append('supplierId', input.supplierId);
  if (input.mapping) form.append('mapping', JSON.stringify(input.mapping));
  if (input.uploadId) form.append('uploadId', input.uploadId);
  // The file goes last so the server knows supplier and mapping before the first row.
  form.append('file', input.file, input.file.name);

  const { status, text } = await new Promise<{ status: number; text: string }>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', '/api/price-lists');
    xhr.withCredentials = true;
    xhr.setRequestHeader('accept', 'application/json');
    xhr.setRequestHeader('x-csrf-token', token);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress?.({ loaded: e.loaded, total: e.total, sent: false });
    };
    xhr.upload.onload = () => onProgress?.({ loaded: input.file.size, total: input.file.size, sent: true });
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () => reject(new ApiError(0, 'unavailable', 'The upload did not reach the server. Check the connection and try again.'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(form);
  });

  if (status < 200 || status >= 300) throw toApiError(status, text);
  return priceListSchema.parse(JSON.parse(text));
}

/** The upload as a mutation, with its byte progress beside it. */
export function useUploadPriceList() {
  const qc = useQueryClient();
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const mutation = useMutation({
    mutationFn: (input: UploadPriceListInput) => {
      setProgress({ loaded: 0, total: input.file.size, sent: false });
      return uploadPriceList(input, setProgress);
    },
    onSuccess: (list) => {
      qc.setQueryData(priceListKeys.detail(list.id), list);
      void qc.invalidateQueries({ queryKey: priceListKeys.history(list.supplierId) });
    },
    onSettled: () => setProgress(null),
  });
  return { ...mutation, progress };
}
