// Unit and integration tests live in test/, mirroring the source folders. End-to-end browser tests
// (test/e2e) need a built renderer and Chromium; they run in their own project after the unit tests.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    testTimeout: 60_000,
    pool: 'forks',
  },
});
