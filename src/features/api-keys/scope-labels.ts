import type { ApiKeyScope } from '@shared/schemas/api-keys';

/** What each scope lets the other system do, as the admin reads it when choosing. */
export const SCOPE_LABELS: Record<ApiKeyScope, string> = {
  read: 'read — search, vehicles, engines, parts, compatibility; never cost or margin',
  write: 'write — also catalog edits and price lists; sees cost and margin',
};
