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
// Bench testing is the shop technician's job (product.md, Roles); an admin may do everything.
const BENCH = ['technician', 'admin'] as const;

export const ROUTE_ACCESS = {
  'GET /api/health': 'public',
  'GET /api/openapi.json': 'public',
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
  'GET /api/jobs': ADMIN,
  'POST /api/jobs/:id/retry': ADMIN,
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
  'POST /api/compat/coil': COMPARE,
  'POST /api/compat/plug': COMPARE,
  'GET /api/engines/:id/alternates': COUNTER,
  'POST /api/bench/coil': BENCH,
  'GET /api/fit-reports': COMPARE,
  'POST /api/fit-reports': COMPARE,
  'GET /api/fit-reports/:id': COMPARE,
  'POST /api/fit-reports/:id/email': COMPARE,
  'GET /api/shared/fit-reports/:token': 'public',
  'GET /api/settings': ADMIN,
  'PUT /api/settings': ADMIN,
  'GET /api/suppliers': BUYERS,
  'POST /api/suppliers': BUYERS,
  'PATCH /api/suppliers/:id': BUYERS,
  'GET /api/price-lists': BUYERS,
  'POST /api/price-lists': BUYERS,
  'GET /api/price-lists/:id': BUYERS,
  'GET /api/price-lists/:id/errors': BUYERS,
  'GET /api/price-lists/:id/errors.csv': BUYERS,
  'GET /api/price-lists/:id/changes': BUYERS,
  'POST /api/price-lists/:id/preview': BUYERS,
  'POST /api/price-lists/:id/commit': BUYERS,
  'POST /api/price-lists/:id/discard': BUYERS,
} as const satisfies Record<string, Access>;

export type RouteKey = keyof typeof ROUTE_ACCESS;
