import { useMutation } from '@tanstack/react-query';
import { emailSentResponseSchema } from '@shared/schemas/fit-reports';
import { api } from '@/lib/api-client';

export const emailFitReport = ({ id, to }: { id: string; to: string }) =>
  api('POST', `/api/fit-reports/${encodeURIComponent(id)}/email`, { body: { to }, schema: emailSentResponseSchema });

/** Sends the report with its share link through the store's mail set-up. */
export const useEmailFitReport = () => useMutation({ mutationFn: emailFitReport });
