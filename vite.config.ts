/// <reference types="vitest/config" />
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import { initialJs, INITIAL_JS_GOAL_KB } from './e2e/measure/initialJs.ts';

/**
 * Warn when one chunk alone could pass the first-load budget: 200 kB of JavaScript after gzip, about
 * 650 kB before (Vite compares the size before compression; our bundles shrink about 3.3× under gzip).
 */
const CHUNK_WARNING_KB = 650;

/** Warns when the first load (entry + its static imports, gzip) passes the budget; see e2e/measure/initialJs.ts. */
function initialJsBudget(): Plugin {
  return {
    name: 'matloom-initial-js-budget',
    apply: 'build',
    writeBundle(options) {
      if (!options.dir) return;
      const kB = initialJs(options.dir).gzip / 1000;
      if (kB > INITIAL_JS_GOAL_KB) {
        this.warn(
          `initial JS is ${kB.toFixed(1)} kB gzip, over the ${INITIAL_JS_GOAL_KB} kB budget (npm run bench:size)`,
        );
      }
    },
  };
}

// The app's HTML entry lives in src/ so that the top level holds only the project's own files;
// public/ and dist/ stay at the top.
export default defineConfig({
  root: 'src',
  publicDir: '../public',
  plugins: [react(), initialJsBudget()],
  server: { host: '127.0.0.1', port: 5173, strictPort: true },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  build: {
    outDir: '../dist',
    emptyOutDir: true,
    chunkSizeWarningLimit: CHUNK_WARNING_KB,
    // Everything the entry imports statically goes into one chunk: one request for the first load
    // instead of the entry and half a dozen small shared chunks.
    rolldownOptions: { output: { codeSplitting: { groups: [{ name: 'start', tags: ['$initial'] }] } } },
  },
  test: {
    root: '.',
    environment: 'node',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
    // The store's edit check loads on demand in the app; tests have it from the start.
    setupFiles: ['test/support/loadChecks.ts'],
  },
});
