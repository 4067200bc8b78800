import { defineConfig } from 'vitest/config';

// Decorator metadata for Nest injection comes from ./tsconfig.json (STACK gotcha 3).
export default defineConfig({
  test: {
    include: ['src/**/*.spec.ts', 'test/**/*.e2e-spec.ts'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // Each whole-app test boots a server and a compute worker; keep the 2-core machine responsive.
    maxWorkers: 2,
  },
});
