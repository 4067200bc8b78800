import { defineConfig } from 'vitest/config';

// Cross-package and browser end-to-end tests against the built product (`npm run build` first).
export default defineConfig({
  test: {
    include: ['**/*.e2e.test.ts'],
    exclude: ['node_modules/**'],
    globalSetup: ['./support/start-product.ts'],
    testTimeout: 60_000,
    hookTimeout: 180_000,
    fileParallelism: false,
  },
});
