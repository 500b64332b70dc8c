import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

const apiUrl = process.env.JIGWRIGHT_API_URL ?? 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react()],
  resolve: {
    // The core package is used from its TypeScript sources: one copy, hot reload, no build step.
    alias: { '@jigwright/core': fileURLToPath(new URL('../core/src/index.ts', import.meta.url)) },
  },
  server: {
    proxy: { '/api': { target: apiUrl, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    sourcemap: true,
    // dist/.vite/manifest.json: the benchmark follows it to weigh what the library page loads.
    manifest: true,
    chunkSizeWarningLimit: 700,
  },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./vitest.setup.ts'],
    // Route tests render the whole app in jsdom; on a busy 2-core machine that can take seconds.
    testTimeout: 30_000,
  },
});
