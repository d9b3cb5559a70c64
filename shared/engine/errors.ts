/** Stable codes for everything the engine refuses; the API and CLI pass them through unchanged. */
export type EngineErrorCode =
  | 'invalid'
  | 'unstable'
  | 'indeterminate'
  | 'geometry'
  | 'no_lumber_passes'
  | 'no_plate_fits'
  | 'piece_too_long'
  | 'not_enough_stock';

/** The one error the engine throws. `details` carries machine-readable context (e.g. joint ids). */
export class EngineError extends Error {
  constructor(
    readonly code: EngineErrorCode,
    message: string,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'EngineError';
  }
}

export const isEngineError = (e: unknown): e is EngineError => e instanceof EngineError;
