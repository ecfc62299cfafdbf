export const partKeys = {
  part: (id: string, engineId: string | null = null) => ['parts', 'part', id, engineId ?? 'no-engine'] as const,
};
