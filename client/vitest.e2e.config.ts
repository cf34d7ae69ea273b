import { defineConfig } from 'vitest/config';

// Browser journeys: real product, real chromium. One file at a time (each starts its own
// server and browser), generous timeouts for start-up on a two-core machine.
export default defineConfig({
  test: {
    environment: 'node',
    include: ['e2e/**/*.journey.test.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
    reporters: ['default'],
  },
});
