import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    // Two workers on the two-core machines we and CI run on: by default vitest kept one here, and
    // many files wait on child processes (the CLI, Chromium), so two overlap well (quiet machine:
    // 387 s with one, 196 s with two).
    maxWorkers: 2,
    testTimeout: 60_000,
    // Starting Chromium for the PDF tests can take a while on a loaded two-core machine.
    hookTimeout: 60_000,
  },
});
