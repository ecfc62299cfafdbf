import { readFileSync } from 'node:fs';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import type { Manifest } from 'vite';

/** Vite's build manifest (`build.manifest`): each chunk with its static and dynamic imports. */
export const readManifest = (distDir: string): Manifest =>
  JSON.parse(readFileSync(path.join(distDir, '.vite', 'manifest.json'), 'utf8')) as Manifest;

/** The JS files of the given manifest keys and of every chunk they import statically (what loading them fetches at once). */
export function staticJsFiles(manifest: Manifest, keys: string[]): string[] {
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    for (const imported of manifest[key]!.imports ?? []) visit(imported);
  };
  keys.forEach(visit);
  return [...seen].map((key) => manifest[key]!.file).filter((file) => file.endsWith('.js'));
}

/**
 * The first load's JavaScript: the entry chunk and every chunk it imports statically (the ones the
 * built index.html preloads with modulepreload); pages loaded on demand are not in it. Sizes are
 * those of the files the server sends: gzip level 9 and brotli.
 */
export function initialJs(distDir: string): { files: string[]; rawBytes: number; gzipBytes: number; brotliBytes: number } {
  const manifest = readManifest(distDir);
  const files = staticJsFiles(
    manifest,
    Object.keys(manifest).filter((key) => manifest[key]!.isEntry),
  );
  let rawBytes = 0;
  let gzipBytes = 0;
  let brotliBytes = 0;
  for (const file of files) {
    const bytes = readFileSync(path.join(distDir, file));
    rawBytes += bytes.length;
    gzipBytes += gzipSync(bytes, { level: 9 }).length;
    brotliBytes += brotliCompressSync(bytes).length;
  }
  return { files, rawBytes, gzipBytes, brotliBytes };
}
