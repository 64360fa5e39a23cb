import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const alias = { '@shared': fileURLToPath(new URL('./shared', import.meta.url)) };

// Node-side tests. `unit`: pure code, in parallel. `db`: API integration tests against the
// throwaway MariaDB that `npm test` starts (DATABASE_URL), one file at a time since they share
// it. The dashboard's component tests run through Angular's own runner (`ng test`), and the
// browser tests through vitest.e2e.config.ts.
export default defineConfig({
  resolve: { alias },
  test: {
    testTimeout: 30_000,
    hookTimeout: 120_000,
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          environment: 'node',
          include: ['analytics-api/src/**/*.spec.ts', 'shared/**/*.spec.ts', 'sample-data/**/*.spec.ts'],
          exclude: ['**/*.db.spec.ts', '**/node_modules/**'],
          testTimeout: 30_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'db',
          environment: 'node',
          include: ['test/api/**/*.spec.ts', 'analytics-api/src/**/*.db.spec.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
