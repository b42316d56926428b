import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  resolve: { alias: { '@': path.resolve(__dirname) } },
  test: {
    include: ['tests/**/*.test.ts'],
    environment: 'node',
    // Browser flows share two cores with the app, the worker and PostgreSQL during `npm test`.
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
