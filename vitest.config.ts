import { defineConfig } from 'vitest/config';

// Three projects, one run: `npm test` prints a single summary at the end.
//  - unit:        pure code in shared/ (and small client logic), no database, no browser
//  - integration: the Express app against the real PostgreSQL started by tests/setup/database.ts
//  - e2e:         Debian's Chromium, driven by playwright-core, against the built app
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts', 'tests/unit/**/*.test.tsx'],
          environment: 'node',
          // A guard against hangs, not a speed target: the property tests run thousands of
          // cases and the CSG tests cut real solids on a 2-core machine.
          testTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/database.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
          // One PostgreSQL database is shared; files run one after another.
          fileParallelism: false,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/database.ts'],
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
