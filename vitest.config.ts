import { defineConfig } from 'vitest/config';

// One config, three projects, so `npm test` runs them all. Integration and e2e suites need the
// services that scripts/test.mjs starts (private MariaDB, S3 and SMTP fakes, the app for e2e).
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['shared/**/*.test.ts', 'web/**/*.test.{ts,tsx}', 'api/**/*.unit.test.ts', 'fakes/**/*.test.ts', 'templates/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        test: {
          name: 'integration',
          include: ['api/**/*.test.ts', 'tests/integration/**/*.test.ts'],
          exclude: ['api/**/*.unit.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
