import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['src/**/*.test.ts'],
    // Property tests and the reference-file runs are heavy; a slow machine must not fail them.
    testTimeout: 60_000,
  },
});
