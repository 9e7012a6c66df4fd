/** Progress reporting and cancellation of long transient computations (worker-friendly, pure). */

/** Optional hooks of a long computation. */
export interface LongRunHooks {
  /** Called now and then with the fraction done (0–1). */
  onProgress?: (fraction: number) => void;
  /** Polled in long loops; returning true stops the work with TransientCancelledError. */
  shouldCancel?: () => boolean;
}

/** Thrown when shouldCancel() asked a computation to stop. */
export class TransientCancelledError extends Error {
  readonly code = 'ENGINE_CANCELLED';
  constructor() {
    super('The computation was cancelled.');
    this.name = 'TransientCancelledError';
  }
}

/** Report progress and throw TransientCancelledError if cancellation was asked for. */
export function checkCancelled(hooks: LongRunHooks, fraction: number): void {
  hooks.onProgress?.(fraction);
  if (hooks.shouldCancel?.()) throw new TransientCancelledError();
}
