/** Engine failures map to client errors: bad input stays EngineInputError (400), anything else 422. */
import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../shared/engine/errors';
import { runEngine } from '../../../server/api/solve/runEngine';
import { AppError } from '../../../server/lib/errors';

describe('runEngine', () => {
  it('passes results and EngineInputError through, wraps other errors as 422', () => {
    expect(runEngine(() => 42)).toBe(42);
    expect(() => runEngine(() => { throw new EngineInputError('a.b', 'bad'); })).toThrow(EngineInputError);
    try {
      runEngine(() => { throw new Error('luFactor: singular matrix at column 3'); });
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(AppError);
      expect((err as AppError).status).toBe(422);
      expect((err as AppError).message).toContain('singular matrix');
    }
  });
});
