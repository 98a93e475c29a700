/** Test helper: relative closeness with a readable failure message. */
import { expect } from 'vitest';

export function expectRel(actual: number | undefined, expected: number, tol = 1e-9): void {
  expect(actual, 'result is a number').toBeTypeOf('number');
  const a = actual as number;
  const err = expected === 0 ? Math.abs(a) : Math.abs(a - expected) / Math.abs(expected);
  expect(err, `${a} vs ${expected} (relative error ${err})`).toBeLessThanOrEqual(tol);
}
