import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const alias = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

// Three projects: pure shared code, the server against real PostgreSQL, and client components.
export default defineConfig({
  resolve: { alias },
  oxc: { decorator: { legacy: true, emitDecoratorMetadata: true } },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: 'shared', include: ['tests/shared/**/*.test.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        oxc: { decorator: { legacy: true, emitDecoratorMetadata: true } },
        test: {
          name: 'server',
          include: ['tests/server/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/helpers/global-setup.ts'],
          setupFiles: ['tests/helpers/response-contract.ts'],
          fileParallelism: false,
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'client',
          include: ['tests/client/**/*.test.tsx'],
          environment: 'jsdom',
        },
      },
    ],
  },
});
