import { defineConfig } from 'vitest/config';

/**
 * Vitest for mutation testing (`npm run mutate`): the engine's unit tests only, one project, no
 * browser plugins. The CalculiX tests are left out (they spawn the solver per test and would make
 * each mutant run take seconds); they still run in `npm test`.
 */
export default defineConfig({
  test: {
    include: ['tests/shared/engine/**/*.test.ts'],
    exclude: ['tests/shared/engine/**/calculix*.test.ts', 'node_modules/**'],
    setupFiles: ['tests/support/matchers.ts'],
  },
});
