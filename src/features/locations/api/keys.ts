export const locationKeys = {
  all: ['locations'] as const,
};
