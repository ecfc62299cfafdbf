import { Validator } from '@seriousme/openapi-schema-validator';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildOpenApiDocument } from '../../../server/openapi/document';
import type { FieldIssue } from '../../../shared/schemas/error';
import { MULTI_LINE_PATTERN, SINGLE_LINE_PATTERN } from '../../../shared/schemas/text';
import { makeUser, TEST_PASSWORD } from '../../helpers/factories';
import { bodyWith, textInputs, type OpenApiDoc, type TextInput } from '../../helpers/openapi-inputs';
import { createTestApp, signIn, type Agent, type TestApp } from '../../helpers/test-app';

// Every text input of every documented route, read from the document itself: a route added to it
// is walked here without a new line of test.
const validator = new Validator();
// The document as a client receives it: JSON.
const served: Record<string, unknown> = JSON.parse(JSON.stringify(buildOpenApiDocument())) as Record<string, unknown>;
await validator.validate(served);
const INPUTS = textInputs(validator.resolveRefs() as OpenApiDoc);

const NUL = 'ab\u0000cd';
const SAMPLE_PARAMS: Record<string, string> = { id: '00000000-0000-4000-8000-000000000000', token: 'a'.repeat(32) };

function send(agent: Agent, token: string, input: TextInput) {
  const url = input.path.replace(/\{(\w+)\}/g, (_m, name: string) =>
    input.where === 'path' && input.field[0] === name ? encodeURIComponent(NUL) : (SAMPLE_PARAMS[name] ?? 'sample'),
  );
  const method = input.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req = agent[method](url).set('x-csrf-token', token);
  if (input.where === 'query') req = req.query({ [String(input.field[0])]: NUL });
  if (input.where === 'json') req = req.send(bodyWith(input, NUL) as object);
  if (input.where === 'form') req = req.field(String(input.field[0]), NUL);
  return req;
}

describe('a NUL byte in any text of any route', () => {
  let t: TestApp;
  let admin: { agent: Agent; token: string };
  beforeAll(async () => {
    t = await createTestApp();
    const u = await makeUser(t.deps.dataSource, 'admin');
    admin = await signIn(t.app, u.email, TEST_PASSWORD);
  });
  afterAll(() => t.close());

  it('walks enough of the API to mean something', () => {
    const routes = new Set(INPUTS.map((i) => i.route));
    // The routes that answered a NUL with a 500 before the shared text schema.
    for (const r of [
      'GET /api/vehicles/models',
      'GET /api/vehicles/engines',
      'POST /api/brands',
      'POST /api/suppliers',
      'POST /api/parts',
      'PATCH /api/parts/:id',
      'POST /api/fit-reports',
      'POST /api/interchange',
      'POST /api/users/invite',
    ])
      expect(routes, r).toContain(r);
    expect(INPUTS.length).toBeGreaterThan(100);
  });

  for (const input of INPUTS) {
    const where = input.isKey ? `a key of ${input.field.join('.')}` : `${input.where} ${input.field.join('.')}`;
    it(`${input.route}: ${where} → 400 naming the field`, async () => {
      const res = await send(admin.agent, admin.token, input);
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      const details = (res.body as { error: { details: FieldIssue[] } }).error.details;
      const field = input.field.join('.');
      const named = details.filter((d) => (input.isKey ? d.field.startsWith(`${field}.`) : d.field === field));
      expect(named, JSON.stringify(details)).not.toEqual([]);
      // Free text is refused for what it holds, in words.
      if (input.schema.pattern === SINGLE_LINE_PATTERN.source || input.schema.pattern === MULTI_LINE_PATTERN.source)
        expect(named.map((d) => d.message).join(' ')).toMatch(/control characters/);
    });
  }
});
