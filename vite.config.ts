import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // Each text asset is written beside itself as .br and .gz once, at build; the server sends the one the browser accepts.
    compression({
      include: /\.(js|css|html|svg|json)$/,
      threshold: 1024,
      algorithms: [defineAlgorithm('brotliCompress'), defineAlgorithm('gzip', { level: 9 })],
    }),
  ],
  resolve: {
    alias: {
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
      '@': fileURLToPath(new URL('./src', import.meta.url)),
    },
  },
  server: {
    port: 5173,
    proxy: { '/api': 'http://localhost:3000' },
  },
  // No source maps in the build: the shipped code is all anyone outside can read.
  // The manifest lists each chunk and its static imports, for the bench's first-load figure.
  build: { outDir: 'dist', sourcemap: false, manifest: true },
});
