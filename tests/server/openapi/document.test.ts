import { Validator } from '@seriousme/openapi-schema-validator';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorStatuses, openApiPath } from '../../../server/openapi/document';
import { ROUTE_ACCESS, type RouteKey } from '../../../server/routes/route-access';
import { SINGLE_LINE_PATTERN } from '../../../shared/schemas/text';
import { mountedRoutes } from '../../helpers/mounted-routes';
import { textInputs, type OpenApiDoc } from '../../helpers/openapi-inputs';
import { createTestApp, csrfAgent, type TestApp } from '../../helpers/test-app';

const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;

describe('the OpenAPI document', () => {
  let t: TestApp;
  let doc: OpenApiDoc & { openapi: string; components: { schemas: Record<string, unknown> } };
  let resolved: OpenApiDoc;

  beforeAll(async () => {
    t = await createTestApp();
    // Public: fetched without signing in.
    const res = await (await csrfAgent(t.app)).agent.get('/api/openapi.json').expect(200);
    doc = res.body as typeof doc;
    // Resolving the $refs works on the validator's own copy.
    const validator = new Validator();
    await validator.validate(structuredClone(doc));
    resolved = validator.resolveRefs() as OpenApiDoc;
  });
  afterAll(() => t.close());

  it('is an OpenAPI 3.1 document that the OpenAPI 3.1 JSON schema accepts', async () => {
    // The check is the OpenAPI Initiative's own schema for 3.1, through @seriousme/openapi-schema-validator.
    const result = await new Validator().validate(structuredClone(doc));
    expect(result.errors ?? []).toEqual([]);
    expect(result.valid).toBe(true);
    expect(doc.openapi).toBe('3.1.0');
  });

  it('documents every route the router mounts, and only those', () => {
    const mounted = mountedRoutes(t.app).sort();
    const documented = Object.entries(doc.paths)
      .flatMap(([path, ops]) => Object.keys(ops).map((m) => ({ m, path, id: ops[m]!.operationId })))
      .filter(({ m }) => (METHODS as readonly string[]).includes(m));
    // Each operation is the mounted route it names, at its path.
    for (const { m, path, id } of documented) {
      const [verb, expressPath] = id.split(' ') as [string, string];
      expect(verb.toLowerCase()).toBe(m);
      expect(openApiPath(expressPath)).toBe(path);
    }
    expect(documented.map((d) => d.id).sort()).toEqual(mounted);
    expect(mounted.length).toBe(Object.keys(ROUTE_ACCESS).length);
  });

  it('gives every operation its success answer and the error shape for each 4xx and 5xx it lists', () => {
    for (const [path, ops] of Object.entries(doc.paths)) {
      for (const op of Object.values(ops) as {
        operationId: RouteKey;
        responses: Record<string, { content?: Record<string, { schema: unknown }> }>;
      }[]) {
        const statuses = Object.keys(op.responses).map(Number);
        expect(
          statuses.some((s) => s < 300),
          `${path}: a success answer`,
        ).toBe(true);
        expect(statuses.filter((s) => s >= 400)).toEqual(errorStatuses(op.operationId));
        for (const s of statuses.filter((n) => n >= 400)) {
          expect(op.responses[s]!.content!['application/json']!.schema, `${op.operationId} ${s}`).toEqual({
            $ref: '#/components/schemas/ErrorBody',
          });
        }
      }
    }
    expect(doc.components.schemas.ErrorBody).toBeDefined();
  });

  it('checks every text a request can carry: a format, a list of values, or a pattern refusing control characters', () => {
    const inputs = textInputs(resolved);
    expect(inputs.length).toBeGreaterThan(100);
    const loose = inputs.filter((i) => !i.schema.format && !i.schema.enum && i.schema.const === undefined && !i.schema.pattern);
    expect(loose.map((i) => `${i.route} ${i.where} ${i.field.join('.')}`)).toEqual([]);
    // Free text in particular: the shared text schema's pattern, on the search box and on a name.
    const free = (route: string, field: string) => inputs.find((i) => i.route === route && i.field.join('.') === field)?.schema.pattern;
    expect(free('GET /api/search', 'q')).toBe(SINGLE_LINE_PATTERN.source);
    expect(free('POST /api/users/invite', 'name')).toBe(SINGLE_LINE_PATTERN.source);
  });
});

describe('the docs page', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('is Swagger UI served by the app itself, reading /api/openapi.json, with nothing fetched from elsewhere', async () => {
    const { agent } = await csrfAgent(t.app);
    await agent.get('/api/docs').expect(301).expect('location', '/api/docs/');
    const page = await agent.get('/api/docs/').expect(200).expect('content-type', /html/);
    const scripts = [...page.text.matchAll(/<script src=["']([^"']+)["']/g)].map((m) => m[1]!);
    const styles = [...page.text.matchAll(/<link[^>]+href=["']([^"']+)["']/g)].map((m) => m[1]!);
    expect(scripts).toEqual(['./swagger-ui-bundle.js', './swagger-ui-standalone-preset.js', './swagger-ui-init.js']);
    for (const url of [...scripts, ...styles]) {
      expect(url.startsWith('./'), url).toBe(true);
      await agent.get(`/api/docs/${url.slice(2)}`).expect(200);
    }
    const init = await agent.get('/api/docs/swagger-ui-init.js').expect(200);
    expect(init.text).toContain('"swaggerUrl": "/api/openapi.json"');
    // No badge from the public validator service.
    expect(init.text).toContain('"validatorUrl": null');
    // The app's CSP stands on this page: scripts from this origin only.
    expect(page.headers['content-security-policy']).toContain("script-src 'self'");
  });
});
