import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    testTimeout: 60_000,
    // Starting Chromium for the PDF tests can take a while on a loaded two-core machine.
    hookTimeout: 60_000,
  },
});
