import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    testTimeout: 60_000,
    hookTimeout: 60_000,
    // Browser tests share one Chromium and a preview server; keep files serial there.
    fileParallelism: true,
    pool: 'forks',
  },
});
