import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    setupFiles: ['test/setup.ts'],
    // The ngspice comparison runs the simulator once per file; give it room on a busy machine.
    testTimeout: 60_000,
  },
});
