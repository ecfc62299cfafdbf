export const supplierKeys = {
  all: ['suppliers'] as const,
};
