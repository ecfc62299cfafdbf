import path from 'node:path';
import { buildClient, ROOT } from '../helpers/build-client';
import { initialJs } from '../helpers/initial-js';

// `npm run bench`: the first load's JavaScript, in KB gzip, of a fresh production build.
async function main(): Promise<void> {
  // `tsx tests/bench/bundle-size.ts DIR` reads an existing build; with no argument it builds one.
  let distDir = process.argv[2];
  if (!distDir) {
    distDir = path.join(ROOT, '.data', 'bench-dist');
    console.log('\n== first load (building the client)');
    await buildClient(distDir);
  }
  const size = initialJs(path.resolve(distDir));
  const kb = (bytes: number) => (bytes / 1024).toFixed(1);
  console.log(
    `initial JS: ${kb(size.gzipBytes)} KB gzip (entry + preloaded) · ${kb(size.brotliBytes)} KB brotli · ${kb(size.rawBytes)} KB raw`,
  );
  console.log(`  files: ${size.files.join(', ')}`);
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
