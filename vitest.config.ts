import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    setupFiles: ['tests/setup-fast-check.ts'],
    testTimeout: 60_000,
    // Hooks that build a package through the compiled command need the same room on a busy machine.
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
