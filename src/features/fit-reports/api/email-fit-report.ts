import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';

const emailResponseSchema = z.object({ sent: z.boolean() });

export const emailFitReport = ({ id, to }: { id: string; to: string }) =>
  api('POST', `/api/fit-reports/${encodeURIComponent(id)}/email`, { body: { to }, schema: emailResponseSchema });

/** Sends the report with its share link through the store's mail set-up. */
export const useEmailFitReport = () => useMutation({ mutationFn: emailFitReport });
