import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { initialJs, readManifest, staticJsFiles } from '../helpers/initial-js';
import { openBrowser, type BrowserSession } from './browser';

// Issue 10 "must show": initial JS (entry + what it preloads) at most 180 KB gzip, sent with a Content-Encoding; no public source map.
const INITIAL_JS_LIMIT_KB = 180;

describe('the first load', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
  });
  afterEach(async () => {
    await s.close();
  });

  it('sign-in fetches the entry, what it preloads and the sign-in page alone, each compressed and cached for good', async () => {
    const distDir = inject('distDir');
    const manifest = readManifest(distDir);
    const initial = initialJs(distDir);
    expect(initial.gzipBytes / 1024).toBeLessThanOrEqual(INITIAL_JS_LIMIT_KB);

    const scripts = new Map<string, { encoding?: string; cache?: string }>();
    s.page.on('response', (r) => {
      const url = new URL(r.url());
      if (url.pathname.endsWith('.js')) {
        const headers = r.headers();
        scripts.set(url.pathname.slice(1), { encoding: headers['content-encoding'], cache: headers['cache-control'] });
      }
    });
    await s.page.goto(`${s.baseUrl}/sign-in`);
    await s.page.getByRole('button', { name: 'Sign in' }).waitFor();

    const expected = staticJsFiles(manifest, [
      ...Object.keys(manifest).filter((k) => manifest[k]!.isEntry),
      'src/app/routes/auth/sign-in.tsx',
    ]);
    expect([...scripts.keys()].sort()).toEqual([...new Set(expected)].sort());
    for (const file of initial.files) {
      // Chromium asks for br and gzip (Accept-Encoding); the server sends the precompressed copy.
      expect(scripts.get(file)?.encoding, file).toMatch(/^(br|gzip)$/);
      expect(scripts.get(file)?.cache, file).toContain('immutable');
    }
    // A gzip-only client gets gzip.
    const entry = initial.files[0]!;
    const gz = await s.page.request.get(`${s.baseUrl}/${entry}`, { headers: { 'Accept-Encoding': 'gzip' } });
    expect(gz.headers()['content-encoding']).toBe('gzip');
    expect(gz.headers()['content-type']).toMatch(/javascript/);
  });

  it('answers 404 for source maps and for missing assets, and the app shell is revalidated', async () => {
    const entry = initialJs(inject('distDir')).files[0]!;
    for (const url of [`/${entry}.map`, '/assets/index.js.map', '/assets/no-such-chunk.js']) {
      const res = await s.page.request.get(`${s.baseUrl}${url}`);
      expect(res.status(), url).toBe(404);
    }
    const shell = await s.page.request.get(`${s.baseUrl}/counter`);
    expect(shell.status()).toBe(200);
    expect(shell.headers()['cache-control']).toBe('no-cache');
    expect(await shell.text()).not.toContain('sourceMappingURL');
  });
});
