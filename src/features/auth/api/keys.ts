export const authKeys = {
  me: ['auth', 'me'] as const,
  invitation: (token: string) => ['auth', 'invitation', token] as const,
};
