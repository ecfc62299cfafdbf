import type { User as ArcwiseUser } from '../../shared/schemas/auth';

declare global {
  namespace Express {
    // passport's req.user is the signed-in user as the API presents it.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends ArcwiseUser {}
  }
}

export {};
