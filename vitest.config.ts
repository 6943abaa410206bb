import { defineConfig } from 'vitest/config';

// Unit and property tests run in parallel; the Chromium end-to-end tests run after
// them, one file at a time, so two cores are not shared by several browsers at once.
export default defineConfig({
  test: {
    testTimeout: 60_000,
    hookTimeout: 180_000,
    pool: 'forks',
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/**/*.test.ts'],
          exclude: ['tests/e2e/**'],
          sequence: { groupOrder: 0 },
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          // The app is built once for all of them.
          globalSetup: ['tests/e2e/global-setup.ts'],
          fileParallelism: false,
          // A loaded two-core CI machine can stall a headless browser once; a second try
          // must still pass every assertion.
          retry: 1,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
