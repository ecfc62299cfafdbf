import type { PriceListChangeType } from '@shared/schemas/price-lists';

export const priceListKeys = {
  all: ['price-lists'] as const,
  history: (supplierId: string) => ['price-lists', 'history', supplierId] as const,
  /** Everything about one list; invalidating it refreshes its changes and errors too. */
  list: (id: string) => ['price-lists', 'list', id] as const,
  detail: (id: string) => ['price-lists', 'list', id, 'detail'] as const,
  changes: (id: string, type: PriceListChangeType, offset: number, limit: number) =>
    ['price-lists', 'list', id, 'changes', type, offset, limit] as const,
  errors: (id: string, offset: number, limit: number) => ['price-lists', 'list', id, 'errors', offset, limit] as const,
  /** The server's progress on an upload still in flight, polled by the id the client chose. */
  uploadProgress: (uploadId: string) => ['price-lists', 'upload', uploadId] as const,
};
