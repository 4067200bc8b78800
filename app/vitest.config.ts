import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Unit tests of pure client utilities: no DOM needed.
export default defineConfig({
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  test: {
    environment: 'node',
    include: ['src/**/*.test.ts'],
  },
});
