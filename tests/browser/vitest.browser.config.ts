import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser journeys: Debian's Chromium driven by playwright-core against the built app.
export default defineConfig({
  root: fileURLToPath(new URL('../..', import.meta.url)),
  resolve: {
    alias: {
      '@shared': fileURLToPath(new URL('../../shared', import.meta.url)),
      '@': fileURLToPath(new URL('../../src', import.meta.url)),
    },
  },
  oxc: { decorator: { legacy: true, emitDecoratorMetadata: true } },
  test: {
    name: 'browser',
    include: ['tests/browser/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['tests/browser/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60000,
    hookTimeout: 120000,
  },
});
