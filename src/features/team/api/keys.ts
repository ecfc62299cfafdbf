export const teamKeys = {
  users: ['team', 'users'] as const,
  shops: ['team', 'shops'] as const,
};
