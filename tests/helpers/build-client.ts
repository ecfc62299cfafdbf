import path from 'node:path';
import { build } from 'vite';

export const ROOT = path.resolve(import.meta.dirname, '../..');

/** Builds the client as `npm start` does, into `outDir`: production React, the project's vite.config.ts. */
export async function buildClient(outDir: string): Promise<void> {
  // Vite takes NODE_ENV from the environment; a test run's "test" would give React's dev build.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({
      root: ROOT,
      mode: 'production',
      configFile: path.join(ROOT, 'vite.config.ts'),
      logLevel: 'warn',
      build: { outDir, emptyOutDir: true },
    });
  } finally {
    if (nodeEnv === undefined) delete process.env.NODE_ENV;
    else process.env.NODE_ENV = nodeEnv;
  }
}
