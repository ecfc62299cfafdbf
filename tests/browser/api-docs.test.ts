import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openBrowser, type BrowserSession } from './browser';

describe('the API docs page', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
  });
  afterEach(async () => {
    await s.close();
  });

  it('lists the operations of /api/openapi.json, from this server alone, under its CSP', async () => {
    const elsewhere: string[] = [];
    const refused: string[] = [];
    s.page.on('request', (r) => {
      if (!r.url().startsWith(s.baseUrl) && !r.url().startsWith('data:')) elsewhere.push(r.url());
    });
    s.page.on('console', (m) => {
      if (m.type() === 'error') refused.push(m.text());
    });
    await s.page.goto(`${s.baseUrl}/api/docs`);
    // Swagger UI renders each operation as a block with its method and path.
    const search = s.page.locator('.opblock', { hasText: '/api/search' }).first();
    await search.waitFor();
    expect(await search.locator('.opblock-summary-method').textContent()).toBe('GET');
    await s.page.getByRole('heading', { name: /Arcwise API/ }).waitFor();
    const doc = (await (await s.page.request.get(`${s.baseUrl}/api/openapi.json`)).json()) as { paths: Record<string, object> };
    const operations = Object.values(doc.paths).reduce((n, ops) => n + Object.keys(ops).length, 0);
    expect(await s.page.locator('.opblock').count()).toBe(operations);
    for (const path of ['/api/parts/{id}', '/api/price-lists', '/api/fit-reports/{id}/email'])
      expect(await s.page.locator('.opblock-summary-path', { hasText: path }).count(), path).toBeGreaterThan(0);
    await s.shot('api-docs');
    expect(elsewhere).toEqual([]);
    expect(refused.filter((t) => /Content Security Policy|Refused/i.test(t))).toEqual([]);
  });
});
