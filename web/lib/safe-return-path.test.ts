import { describe, expect, it } from 'vitest';
import { safeReturnPath } from './safe-return-path';

describe('safeReturnPath', () => {
  it('keeps a path on this site', () => {
    expect(safeReturnPath('/engagements/4?tab=members')).toBe('/engagements/4?tab=members');
  });
  it.each([['https://elsewhere.example/'], ['//elsewhere.example'], ['/\\elsewhere.example'], ['engagements']])(
    'refuses %s and falls back',
    (next) => {
      expect(safeReturnPath(next)).toBe('/engagements');
    },
  );
  it('does not loop back to the sign-in page', () => {
    expect(safeReturnPath('/sign-in?next=/x')).toBe('/engagements');
  });
  it('falls back when nothing is given', () => {
    expect(safeReturnPath(null, '/home')).toBe('/home');
  });
});
