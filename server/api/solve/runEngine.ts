/** Runs an engine call: bad-input errors pass through (400); anything else becomes a 422 the user can act on, never a 500. */
import { EngineInputError } from '@shared/engine/errors';
import { AppError } from '../../lib/errors';

/** Call `fn`; unexpected engine failures become 422 `engine_failed` with the engine's message. */
export function runEngine<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof EngineInputError || err instanceof AppError) throw err;
    const message = err instanceof Error ? err.message : String(err);
    throw new AppError(422, 'engine_failed', `The solver could not solve this model: ${message}. Check the stack-up and the cooling for missing or extreme values.`);
  }
}
