import { useMutation, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { userResponseSchema, type AcceptInviteBody } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

const invitationSchema = z.object({ invitation: z.object({ email: z.string(), name: z.string() }) });

export const getInvitation = (token: string) =>
  api('GET', `/api/auth/invite/${encodeURIComponent(token)}`, { schema: invitationSchema, allowUnauthorized: true });

export const useInvitation = (token: string) =>
  useQuery({ queryKey: authKeys.invitation(token), queryFn: () => getInvitation(token), enabled: token.length > 0, retry: false });

export const acceptInvite = (body: AcceptInviteBody) => api('POST', '/api/auth/accept-invite', { body, schema: userResponseSchema });

export const useAcceptInvite = () => useMutation({ mutationFn: acceptInvite });
