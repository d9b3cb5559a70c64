/**
 * The solver runs as generators that yield between steps (a column-generation round, a dive
 * step), so a caller may report progress and let other work run inside one solve; `drain` runs
 * one to its end synchronously.
 */

/** Runs a step generator to its end, telling `onStep` of each step; returns its result. */
export function drain<S, R>(steps: Generator<S, R>, onStep?: (step: S) => void): R {
  for (;;) {
    const next = steps.next();
    if (next.done) return next.value;
    onStep?.(next.value);
  }
}

/** The same steps with each yielded value mapped by `f`, and the same result. */
export function* mapSteps<A, B, R>(steps: Generator<A, R>, f: (step: A) => B): Generator<B, R> {
  for (;;) {
    const next = steps.next();
    if (next.done) return next.value;
    yield f(next.value);
  }
}
