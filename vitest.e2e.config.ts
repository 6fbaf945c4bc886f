// End-to-end tests: the built renderer served on localhost and driven in Debian's Chromium
// (headless, through playwright-core). One file at a time in one fork; browser steps are slow.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/e2e/**/*.e2e.ts'],
    testTimeout: 180_000,
    hookTimeout: 120_000,
    pool: 'forks',
    fileParallelism: false,
    sequence: { concurrent: false },
  },
});
