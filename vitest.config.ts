import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    environment: 'node',
    benchmark: { include: ['test/**/*.bench.ts'] },
    testTimeout: 60_000,
  },
});
