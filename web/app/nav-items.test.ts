import { describe, expect, it } from 'vitest';
import { navItemsFor } from './nav-items';

describe('navItemsFor', () => {
  it('gives an administrator every area', () => {
    expect(navItemsFor('admin').map((i) => i.label)).toEqual(['Engagements', 'People', 'Engagement admin', 'Audit trail', 'Mailbox']);
  });
  it.each([['partner'], ['consultant'], ['client']] as const)('gives a %s only the engagements', (role) => {
    expect(navItemsFor(role).map((i) => i.to)).toEqual(['/engagements']);
  });
});
