import type { CsrfResponse } from '../../shared/schemas/auth';
import type { HealthResponse } from '../../shared/schemas/system';

export const presentHealth = (): HealthResponse => ({ ok: true });

export const presentCsrfToken = (token: string): CsrfResponse => ({ token });
