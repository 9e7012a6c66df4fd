/** The one float matcher of the test suite: relative tolerance with an absolute floor. */
import { expect } from 'vitest';

/** Assert |actual − expected| ≤ rel·|expected| + abs, with a message naming both values. */
export function expectClose(actual: number, expected: number, rel = 1e-9, abs = 0, what = 'value'): void {
  const tol = rel * Math.abs(expected) + abs;
  const diff = Math.abs(actual - expected);
  expect(diff, `${what}: got ${actual}, expected ${expected} (±${tol.toExponential(2)})`).toBeLessThanOrEqual(tol);
}
