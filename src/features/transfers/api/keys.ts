export const transferKeys = {
  all: ['transfers'] as const,
};
