import fc from 'fast-check';
import { expect } from 'vitest';

/** Relative-or-absolute tolerance matcher: |a − b| ≤ max(abs, rel·|b|). */
expect.extend({
  toBeWithin(received: number, expected: number, opts: { rel?: number; abs?: number } = {}) {
    const rel = opts.rel ?? 1e-6;
    const abs = opts.abs ?? 1e-9;
    const diff = Math.abs(received - expected);
    const allowed = Math.max(abs, rel * Math.abs(expected));
    const pass = Number.isFinite(received) && diff <= allowed;
    return {
      pass,
      message: () =>
        `expected ${received} ${pass ? 'not ' : ''}to be within ${allowed} of ${expected} (off by ${diff})`,
    };
  },
});

interface ToleranceMatchers<R = unknown> {
  /** |received − expected| ≤ max(abs, rel·|expected|); defaults rel 1e-6, abs 1e-9. */
  toBeWithin(expected: number, opts?: { rel?: number; abs?: number }): R;
}

declare module 'vitest' {
  // eslint-disable-next-line @typescript-eslint/no-empty-object-type, @typescript-eslint/no-explicit-any
  interface Matchers<T = any> extends ToleranceMatchers<T> {}
}

// Property tests explore new random cases on every local run; CI replays one fixed seed so a run
// is repeatable (a failure prints its seed and counterexample either way).
if (process.env.CI) fc.configureGlobal({ seed: 20261201 });
