import type { ApiKeyScope } from '../../shared/schemas/api-keys';
import type { User as ArcwiseUser } from '../../shared/schemas/auth';

declare global {
  namespace Express {
    // passport's req.user is the signed-in user as the API presents it.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends ArcwiseUser {}

    interface Request {
      /** Set only for a call made with an API key (Authorization: Bearer); such a call has no session. */
      apiKey?: { id: string; name: string; scope: ApiKeyScope };
    }
  }
}

export {};
