import type { Role } from '../../shared/roles';

/**
 * Who may call each API route: the one table the router mounts from and the role-matrix test
 * reads. `public` needs no sign-in; `signed-in` is any role; otherwise the roles listed.
 * A route missing here cannot be mounted (the key is typed) and fails the matrix test.
 */
export type Access = 'public' | 'signed-in' | readonly Role[];

const ADMIN = ['admin'] as const;
const BUYERS = ['buyer', 'admin'] as const;
const COUNTER = ['clerk', 'technician', 'buyer', 'admin'] as const;
const COMPARE = ['clerk', 'technician', 'buyer', 'admin'] as const;
const BENCH = ['technician', 'buyer', 'admin', 'clerk'] as const;

export const ROUTE_ACCESS = {
  'GET /api/health': 'public',
  'GET /api/auth/csrf': 'public',
  'POST /api/auth/login': 'public',
  'POST /api/auth/logout': 'public',
  'GET /api/auth/me': 'signed-in',
  'POST /api/auth/accept-invite': 'public',
  'GET /api/auth/invite/:token': 'public',
  'GET /api/users': ADMIN,
  'POST /api/users/invite': ADMIN,
  'PATCH /api/users/:id': ADMIN,
  'GET /api/shops': ADMIN,
  'GET /api/outbox': ADMIN,
  'GET /api/vehicles/years': COUNTER,
  'GET /api/vehicles/makes': COUNTER,
  'GET /api/vehicles/models': COUNTER,
  'GET /api/vehicles/engines': COUNTER,
  'GET /api/engines/:id': COUNTER,
  'GET /api/search': COUNTER,
  'GET /api/parts/:id': COUNTER,
  'GET /api/brands': COUNTER,
  'POST /api/brands': BUYERS,
  'POST /api/parts': BUYERS,
  'PATCH /api/parts/:id': BUYERS,
  'POST /api/interchange': BUYERS,
} as const satisfies Record<string, Access>;

export type RouteKey = keyof typeof ROUTE_ACCESS;

// Kept for later route groups that share the same role sets.
export const ACCESS_GROUPS = { ADMIN, BUYERS, COUNTER, COMPARE, BENCH };
