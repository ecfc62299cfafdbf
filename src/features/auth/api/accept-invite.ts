import { useMutation, useQuery } from '@tanstack/react-query';
import { invitationResponseSchema, userResponseSchema, type AcceptInviteBody } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const getInvitation = (token: string) =>
  api('GET', `/api/auth/invite/${encodeURIComponent(token)}`, { schema: invitationResponseSchema, allowUnauthorized: true });

export const useInvitation = (token: string) =>
  useQuery({ queryKey: authKeys.invitation(token), queryFn: () => getInvitation(token), enabled: token.length > 0, retry: false });

export const acceptInvite = (body: AcceptInviteBody) => api('POST', '/api/auth/accept-invite', { body, schema: userResponseSchema });

export const useAcceptInvite = () => useMutation({ mutationFn: acceptInvite });
