export const supplierKeys = {
  all: ['suppliers'] as const,
  list: (includeArchived: boolean) => ['suppliers', includeArchived ? 'with-archived' : 'active'] as const,
};
