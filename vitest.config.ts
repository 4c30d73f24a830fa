import { defineConfig } from 'vitest/config';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { svelteTesting } from '@testing-library/svelte/vite';

export default defineConfig({
  // Compiles .svelte components and .svelte.ts state modules for the interface tests. A test
  // file that needs a DOM says so with `// @vitest-environment jsdom` and cleans up its own
  // rendered components (no automatic cleanup file, which would slow every other test file).
  plugins: [svelte(), svelteTesting({ autoCleanup: false })],
  test: {
    include: ['test/**/*.test.ts'],
    environment: 'node',
    benchmark: { include: ['test/**/*.bench.ts'] },
    testTimeout: 60_000,
  },
});
