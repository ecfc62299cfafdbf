import type { Role } from '../../shared/roles';
import type { ApiKeyScope } from '../../shared/schemas/api-keys';

/**
 * Who may call each API route: the one table the router mounts from and the role-matrix test
 * reads. `public` needs no sign-in; `signed-in` is any role; otherwise the roles listed.
 * A route missing here cannot be mounted (the key is typed) and fails the matrix test.
 *
 * API keys reach only the routes whose entry names a key scope ({ people, key }): the least
 * scope that may call it, `write` including `read`. Every other route refuses a key with 403.
 */
export type Access = 'public' | 'signed-in' | readonly Role[];
export interface KeyedAccess {
  people: Access;
  key: ApiKeyScope;
}
export type RouteRule = Access | KeyedAccess;

export const peopleAccess = (rule: RouteRule): Access => (typeof rule === 'object' && 'people' in rule ? rule.people : rule);
export const keyScopeOf = (rule: RouteRule): ApiKeyScope | null => (typeof rule === 'object' && 'key' in rule ? rule.key : null);

const ADMIN = ['admin'] as const;
const BUYERS = ['buyer', 'admin'] as const;
const COUNTER = ['clerk', 'technician', 'buyer', 'admin'] as const;
const COMPARE = ['clerk', 'technician', 'buyer', 'admin'] as const;
// The store's staff: they work at a store of the chain and move its stock.
const STAFF = ['clerk', 'buyer', 'admin'] as const;
// Bench testing is the shop technician's job (product.md, Roles); an admin may do everything.
const BENCH = ['technician', 'admin'] as const;
// The store's other systems: read keys look things up, write keys also keep the catalog and price lists.
const COUNTER_OR_READ_KEY = { people: COUNTER, key: 'read' } as const;
const COMPARE_OR_READ_KEY = { people: COMPARE, key: 'read' } as const;
const BUYERS_OR_WRITE_KEY = { people: BUYERS, key: 'write' } as const;

export const ROUTE_ACCESS = {
  'GET /api/health': { people: 'public', key: 'read' },
  'GET /api/openapi.json': { people: 'public', key: 'read' },
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
  'GET /api/vehicles/years': COUNTER_OR_READ_KEY,
  'GET /api/vehicles/makes': COUNTER_OR_READ_KEY,
  'GET /api/vehicles/models': COUNTER_OR_READ_KEY,
  'GET /api/vehicles/engines': COUNTER_OR_READ_KEY,
  'GET /api/engines/:id': COUNTER_OR_READ_KEY,
  'GET /api/search': COUNTER_OR_READ_KEY,
  'GET /api/parts/:id': COUNTER_OR_READ_KEY,
  'GET /api/brands': COUNTER_OR_READ_KEY,
  'POST /api/brands': BUYERS_OR_WRITE_KEY,
  'POST /api/parts': BUYERS_OR_WRITE_KEY,
  'PATCH /api/parts/:id': BUYERS_OR_WRITE_KEY,
  'POST /api/interchange': BUYERS_OR_WRITE_KEY,
  'POST /api/compat/coil': COMPARE_OR_READ_KEY,
  'POST /api/compat/plug': COMPARE_OR_READ_KEY,
  'GET /api/engines/:id/alternates': COUNTER_OR_READ_KEY,
  'POST /api/bench/coil': BENCH,
  'GET /api/fit-reports': COMPARE,
  'POST /api/fit-reports': COMPARE,
  'GET /api/fit-reports/:id': COMPARE,
  'PATCH /api/fit-reports/:id': COMPARE,
  'POST /api/fit-reports/:id/email': COMPARE,
  'GET /api/shared/fit-reports/:token': 'public',
  'GET /api/settings': ADMIN,
  'PUT /api/settings': ADMIN,
  'GET /api/suppliers': BUYERS_OR_WRITE_KEY,
  'POST /api/suppliers': BUYERS,
  'PATCH /api/suppliers/:id': BUYERS,
  // Everyone who sees a sell price may see the rule that chose it; buyers set it.
  'GET /api/sell-price-rules': COUNTER,
  'PUT /api/sell-price-rules/:id': BUYERS,
  'GET /api/price-lists': BUYERS_OR_WRITE_KEY,
  'POST /api/price-lists': BUYERS_OR_WRITE_KEY,
  'GET /api/price-lists/:id': BUYERS_OR_WRITE_KEY,
  'GET /api/price-lists/:id/errors': BUYERS_OR_WRITE_KEY,
  'GET /api/price-lists/:id/errors.csv': BUYERS_OR_WRITE_KEY,
  'GET /api/price-lists/:id/changes': BUYERS_OR_WRITE_KEY,
  'POST /api/price-lists/:id/preview': BUYERS_OR_WRITE_KEY,
  'POST /api/price-lists/:id/commit': BUYERS_OR_WRITE_KEY,
  'POST /api/price-lists/:id/discard': BUYERS_OR_WRITE_KEY,
  'GET /api/locations': { people: STAFF, key: 'read' },
  'POST /api/locations': ADMIN,
  'PATCH /api/locations/:id': ADMIN,
  'GET /api/transfers': STAFF,
  'POST /api/transfers': STAFF,
  'POST /api/transfers/:id/steps': STAFF,
  'GET /api/api-keys': ADMIN,
  'POST /api/api-keys': ADMIN,
  'DELETE /api/api-keys/:id': ADMIN,
} as const satisfies Record<string, RouteRule>;

export type RouteKey = keyof typeof ROUTE_ACCESS;
