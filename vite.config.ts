/// <reference types="vitest/config" />
import { readFileSync } from 'node:fs';
import { defineConfig } from 'vite';

/** The tool's version (package.json), put into the page at build time: exports carry it in their captions. */
const TOOL_VERSION = (
  JSON.parse(readFileSync(new URL('./package.json', import.meta.url), 'utf8')) as { version: string }
).version;

/**
 * Headers the dev and preview servers send with every response. The page's own Content-Security-Policy
 * is a meta tag in index.html, but `frame-ancestors` works only as a header: together with the older
 * X-Frame-Options it stops another site framing the page (clickjacking). A static host must send the
 * same two headers (README, "Serving the page").
 */
export const SECURITY_HEADERS: Record<string, string> = {
  'Content-Security-Policy': "frame-ancestors 'none'",
  'X-Frame-Options': 'DENY',
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
};

// One config serves the page (build/preview) and the tests (vitest reads the `test` key).
// `vite build --mode e2e` (browser tests only) keeps the page's test hooks; the default production build
// drops them (src/ui/testHooks.ts is loaded only when import.meta.env.MODE is 'e2e').
export default defineConfig({
  root: '.',
  publicDir: 'public',
  define: { __COVERSWEEP_VERSION__: JSON.stringify(TOOL_VERSION) },
  worker: { format: 'es' },
  server: { headers: SECURITY_HEADERS },
  preview: { headers: SECURITY_HEADERS },
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
