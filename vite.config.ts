/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// The app's HTML entry lives in src/ so that the top level holds only the project's own files;
// public/ and dist/ stay at the top.
export default defineConfig({
  root: 'src',
  publicDir: '../public',
  plugins: [react()],
  server: { host: '127.0.0.1', port: 5173, strictPort: true },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  build: { outDir: '../dist', emptyOutDir: true, chunkSizeWarningLimit: 1500 },
  test: {
    root: '.',
    environment: 'node',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
  },
});
