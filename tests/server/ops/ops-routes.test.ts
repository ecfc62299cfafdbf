import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOCS_ACCESS } from '../../../server/openapi/docs.routes';
import { OPS_ACCESS } from '../../../server/routes/ops.routes';
import { ROUTE_ACCESS } from '../../../server/routes/route-access';
import { allRoutes } from '../../helpers/mounted-routes';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// The role matrix covers the /api routes (ROUTE_ACCESS); this covers everything the app mounts.
describe('the routes outside /api', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ STATIC_DIR: 'public' });
  });
  afterAll(() => t.close());

  it('are the operations routes declared in OPS_ACCESS (and the docs page and the client shell), and none of them is under /api', () => {
    const routes = allRoutes(t.app);
    const undeclared = routes.filter((r) => !(r in ROUTE_ACCESS) && !(r in OPS_ACCESS) && !(r in DOCS_ACCESS) && r !== 'GET /{*page}');
    expect(undeclared).toEqual([]);
    for (const key of Object.keys(OPS_ACCESS)) {
      expect(routes).toContain(key);
      expect(key).not.toMatch(/ \/api\//);
    }
    // And the API router, which the role matrix walks, holds none of them.
    expect(Object.keys(ROUTE_ACCESS).filter((k) => k in OPS_ACCESS)).toEqual([]);
  });
});
