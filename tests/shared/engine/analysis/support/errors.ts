import { EngineError } from '../../../../../shared/engine/errors';

/** The EngineError a call throws (fails the test when it throws nothing or something else). */
export function engineErrorOf(f: () => unknown): EngineError {
  try {
    f();
  } catch (e) {
    if (e instanceof EngineError) return e;
    throw e;
  }
  throw new Error('expected an EngineError');
}
