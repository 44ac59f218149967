/// <reference types="vitest/config" />
import { defineConfig } from 'vite';

// One config serves the page (build/preview) and the tests (vitest reads the `test` key).
export default defineConfig({
  root: '.',
  publicDir: 'public',
  worker: { format: 'es' },
  build: {
    outDir: 'dist',
    target: 'es2022',
    chunkSizeWarningLimit: 900,
  },
  test: {
    include: ['test/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: 'forks',
  },
});
