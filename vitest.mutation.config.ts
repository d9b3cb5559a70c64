import { defineConfig } from 'vitest/config';

/**
 * Vitest for mutation testing (`npm run mutate`): the engine's unit tests only, one project, no
 * browser plugins. The CalculiX tests are left out (they spawn the solver per test and would make
 * each mutant run take seconds); they still run in `npm test`. `MUTATION_TESTS` (comma-separated
 * globs) narrows the tests further for a run over one folder, so the first full run fits a busy
 * machine; the README says which tests each recorded score used.
 */
const only = process.env.MUTATION_TESTS?.split(',').filter(Boolean);

export default defineConfig({
  test: {
    include: only?.length ? only : ['tests/shared/engine/**/*.test.ts'],
    exclude: ['tests/shared/engine/**/calculix*.test.ts', 'node_modules/**'],
    setupFiles: ['tests/support/matchers.ts'],
  },
});
