import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/roles';
import { API_KEY_SCOPES, scopeCovers, type ApiKeyScope } from '../../../shared/schemas/api-keys';
import { keyScopeOf, peopleAccess, ROUTE_ACCESS, type Access, type RouteKey, type RouteRule } from '../../../server/routes/route-access';
import { createApiKey, revokeApiKey } from '../../../server/services/api-keys.service';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { mountedRoutes } from '../../helpers/mounted-routes';
import { createTestApp, csrfAgent, signIn, type Agent, type TestApp } from '../../helpers/test-app';

function expected(access: Access, who: Role | 'anonymous'): 'allowed' | 401 | 403 {
  if (access === 'public') return 'allowed';
  if (who === 'anonymous') return 401;
  if (access === 'signed-in' || access.includes(who)) return 'allowed';
  return 403;
}

/** A key reaches only routes that name a key scope its own covers; the role table does not apply to it. */
function expectedForKey(rule: RouteRule, scope: ApiKeyScope): 'allowed' | 403 {
  const needed = keyScopeOf(rule);
  return needed !== null && scopeCovers(scope, needed) ? 'allowed' : 403;
}

const SAMPLE_PARAMS: Record<string, string> = { id: '00000000-0000-4000-8000-000000000000', token: 'no-such-token-0000000000000' };
const concrete = (path: string) => path.replace(/:(\w+)/g, (_m, name: string) => SAMPLE_PARAMS[name] ?? 'sample');

// Sign-out would end the agent's session mid-matrix: it runs last.
const keys = (Object.keys(ROUTE_ACCESS) as RouteKey[]).sort((a, b) => Number(a.includes('logout')) - Number(b.includes('logout')));

describe('role matrix', () => {
  let t: TestApp;
  const agents = new Map<Role | 'anonymous', { agent: Agent; token: string }>();
  const apiKeys = new Map<ApiKeyScope | 'revoked', string>();
  beforeAll(async () => {
    t = await createTestApp();
    agents.set('anonymous', await csrfAgent(t.app));
    for (const role of ROLES) {
      const u = await makeUser(t.deps.dataSource, role);
      agents.set(role, await signIn(t.app, u.email, TEST_PASSWORD));
    }
    const admin = await makeUser(t.deps.dataSource, 'admin');
    for (const scope of API_KEY_SCOPES) {
      apiKeys.set(scope, (await createApiKey(t.deps.dataSource, admin.id, { name: `matrix ${scope} ${admin.id}`, scope })).key);
    }
    const revoked = await createApiKey(t.deps.dataSource, admin.id, { name: `matrix revoked ${admin.id}`, scope: 'write' });
    await revokeApiKey(t.deps.dataSource, admin.id, revoked.entity.id);
    apiKeys.set('revoked', revoked.key);
  });
  afterAll(() => t.close());

  it('every mounted API route is declared in ROUTE_ACCESS, and every declared route is mounted', () => {
    const mounted = mountedRoutes(t.app);
    const declared = Object.keys(ROUTE_ACCESS);
    expect(mounted.filter((r) => !declared.includes(r))).toEqual([]);
    expect(declared.filter((r) => !mounted.includes(r))).toEqual([]);
  });

  for (const key of keys) {
    const [method, path] = key.split(' ') as [string, string];
    const rule: RouteRule = ROUTE_ACCESS[key];
    const access: Access = peopleAccess(rule);
    for (const who of ['anonymous', ...ROLES] as const) {
      const want = expected(access, who);
      it(`${key} as ${who} → ${want === 'allowed' ? 'passes the gate' : want}`, async () => {
        const { agent, token } = agents.get(who)!;
        const m = method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
        let req = agent[m](concrete(path)).set('x-csrf-token', token);
        if (m !== 'get') req = req.send({});
        const res: request.Response = await req;
        if (want === 'allowed') {
          expect([401, 403], `${key} ${who}: ${JSON.stringify(res.body)}`).not.toContain(res.status);
          expect(res.status).toBeLessThan(500);
        } else {
          expect(res.status).toBe(want);
          expect(res.body.error.code).toBe(want === 401 ? 'unauthorized' : 'forbidden');
        }
      });
    }
    for (const scope of [...API_KEY_SCOPES, 'revoked'] as const) {
      const want = scope === 'revoked' ? 401 : expectedForKey(rule, scope);
      it(`${key} with a ${scope} API key and no cookie or CSRF token → ${want === 'allowed' ? 'passes the gate' : want}`, async () => {
        const m = method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
        const client = request(t.app);
        let req = client[m](concrete(path)).set('Authorization', `Bearer ${apiKeys.get(scope)!}`);
        if (m !== 'get') req = req.send({});
        const res: request.Response = await req;
        if (want === 'allowed') {
          expect([401, 403], `${key} ${scope} key: ${JSON.stringify(res.body)}`).not.toContain(res.status);
          expect(res.status).toBeLessThan(500);
          expect(res.headers['set-cookie'], 'a key call makes no session').toBeUndefined();
        } else {
          expect(res.status).toBe(want);
          expect(res.body.error.code).toBe(want === 401 ? 'unauthorized' : 'forbidden');
        }
      });
    }
  }
});
