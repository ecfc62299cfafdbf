import type { SortDirection } from '@shared/schemas/common';
import type { PriceListChangeSort, PriceListChangeType, PriceListErrorSort } from '@shared/schemas/price-lists';

export const priceListKeys = {
  all: ['price-lists'] as const,
  history: (supplierId: string) => ['price-lists', 'history', supplierId] as const,
  /** Everything about one list; invalidating it refreshes its changes and errors too. */
  list: (id: string) => ['price-lists', 'list', id] as const,
  detail: (id: string) => ['price-lists', 'list', id, 'detail'] as const,
  changes: (id: string, type: PriceListChangeType, sort: PriceListChangeSort, dir: SortDirection, offset: number, limit: number) =>
    ['price-lists', 'list', id, 'changes', type, sort, dir, offset, limit] as const,
  errors: (id: string, sort: PriceListErrorSort, dir: SortDirection, offset: number, limit: number) =>
    ['price-lists', 'list', id, 'errors', sort, dir, offset, limit] as const,
  /** The server's progress on an upload still in flight, polled by the id the client chose. */
  uploadProgress: (uploadId: string) => ['price-lists', 'upload', uploadId] as const,
};
