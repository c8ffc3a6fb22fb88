import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    environment: 'node',
    pool: 'threads',
    testTimeout: 20000,
    setupFiles: ['tests/support/contract-setup.ts'],
  },
});
