export const benchKeys = {
  search: (q: string) => ['bench', 'search', q] as const,
  coil: (id: string) => ['bench', 'coil', id] as const,
};
