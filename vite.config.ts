/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

/**
 * Warn when a chunk passes the first-load budget: 200 kB of JavaScript after gzip, about 650 kB before
 * (Vite compares the size before compression; our bundles shrink about 3.3× under gzip).
 */
const CHUNK_WARNING_KB = 650;

// The app's HTML entry lives in src/ so that the top level holds only the project's own files;
// public/ and dist/ stay at the top.
export default defineConfig({
  root: 'src',
  publicDir: '../public',
  plugins: [react()],
  server: { host: '127.0.0.1', port: 5173, strictPort: true },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  build: { outDir: '../dist', emptyOutDir: true, chunkSizeWarningLimit: CHUNK_WARNING_KB },
  test: {
    root: '.',
    environment: 'node',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
  },
});
