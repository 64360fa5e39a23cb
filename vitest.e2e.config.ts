import { defineConfig } from 'vitest/config';

// Browser end-to-end tests: the real API and built dashboard on a free loopback port, a demo
// database of their own, Debian's Chromium driven by playwright-core. One file at a time.
export default defineConfig({
  test: {
    name: 'e2e',
    include: ['test/e2e/**/*.e2e.ts'],
    globalSetup: ['test/e2e/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
