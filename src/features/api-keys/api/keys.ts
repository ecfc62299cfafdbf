export const apiKeyKeys = {
  list: ['api-keys'] as const,
};
