/// <reference types="vitest/config" />
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { VitePWA } from 'vite-plugin-pwa';
import { readFileSync } from 'node:fs';
import { manifest } from './src/pwa/manifest.ts';
import { optionalChunkName, precacheGlobs, precacheIgnores } from './src/pwa/precache-rule.ts';
import { EAGER_COMPILE_HINT, wantsEagerCompile } from './src/pwa/eager-compile.ts';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));
const pkg = JSON.parse(readFileSync(here('./package.json'), 'utf8')) as { version: string };

/**
 * Layout: the Vite root is src/ (index.html lives there), static files come from static/,
 * the build goes to dist/ at the top level, and tests live in test/ at the top level.
 */
export default defineConfig({
  root: here('./src'),
  publicDir: here('./static'),
  base: './',
  define: {
    __APP_VERSION__: JSON.stringify(pkg.version),
  },
  build: {
    outDir: here('./dist'),
    emptyOutDir: true,
    sourcemap: false,
    // All styles in one file with the entry (5 kB gzip): a screen's chunk then waits for no
    // style sheets of its own, which would queue behind its scripts on the phone's few connections.
    cssCodeSplit: false,
    rollupOptions: {
      output: {
        // jspdf's optional chunks carry their package's name, so the precache ignore rule sees them.
        chunkFileNames: (chunk) => `assets/${optionalChunkName(chunk.facadeModuleId ? [chunk.facadeModuleId] : chunk.moduleIds) ?? '[name]'}-[hash].js`,
      },
    },
  },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  server: { host: '127.0.0.1' },
  plugins: [
    svelte({ configFile: here('./svelte.config.js') }),
    {
      // After minifying (which would drop it): the hint that has a chunk compiled as it streams in.
      name: 'eager-compile-hint',
      apply: 'build',
      enforce: 'post',
      generateBundle: {
        order: 'post',
        handler(_options, bundle) {
          for (const chunk of Object.values(bundle)) {
            if (chunk.type === 'chunk' && wantsEagerCompile(chunk.fileName)) chunk.code = EAGER_COMPILE_HINT + chunk.code;
          }
        },
      },
    },
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      manifest,
      includeAssets: ['favicon.svg', 'favicon.ico'],
      workbox: {
        globPatterns: precacheGlobs,
        globIgnores: precacheIgnores,
        cleanupOutdatedCaches: true,
        navigateFallback: 'index.html',
      },
    }),
  ],
  test: {
    root: here('.'),
    dir: here('./test'),
    reporters: ['default', here('./test/support/closing-line-reporter.ts')],
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['**/*.test.ts'],
          exclude: ['e2e/**', '**/node_modules/**'],
          environment: 'node',
          // Whole-file work (every demo PDF, fuzzed imports) takes seconds on a busy 2-core
          // machine; speed is measured by `npm run bench`, so the limit only catches a hang.
          testTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['e2e/**/*.test.ts'],
          globalSetup: [here('./test/e2e/global-setup.ts')],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
