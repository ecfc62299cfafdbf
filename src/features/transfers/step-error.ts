import { transferConflictDetailsSchema } from '@shared/schemas/locations';
import { ApiError } from '@/lib/api-client';

export const isConflict = (error: unknown): error is ApiError => error instanceof ApiError && error.status === 409;

/**
 * A failed step in plain words. The 409 of two people acting at once says that someone else was
 * first and that the list (read again on every settled step) now shows where the transfer stands;
 * any other failure is the server's own message.
 */
export function stepErrorMessage(error: unknown, stepLabel: string): string | null {
  if (!error) return null;
  if (isConflict(error)) {
    const someoneElse = transferConflictDetailsSchema.safeParse(error.details).success;
    const what = someoneElse ? `Someone else acted on this transfer first, so “${stepLabel}” was not done.` : error.message;
    return `${what} The list now shows where it stands.`;
  }
  return error instanceof Error ? error.message : String(error);
}
