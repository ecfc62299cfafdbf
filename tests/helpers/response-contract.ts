import { afterEach, expect } from 'vitest';
import { takeResponseMismatches } from '../../server/openapi/response-check';

// Every API test: each answer the app gave matched the OpenAPI document (server/openapi/route-docs.ts).
afterEach(() => {
  expect(takeResponseMismatches(), 'answers that do not match the API document').toEqual([]);
});
