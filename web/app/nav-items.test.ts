import { describe, expect, it } from 'vitest';
import { navItemsFor } from './nav-items';

describe('navItemsFor', () => {
  it('gives an administrator every area', () => {
    expect(navItemsFor('admin').map((i) => i.label)).toEqual(['Engagements', 'People', 'Engagement admin', 'Audit trail', 'Mailbox']);
  });
  it('gives a partner the review list and the deliverables', () => {
    expect(navItemsFor('partner').map((i) => i.to)).toEqual(['/engagements', '/reviews', '/deliverables']);
  });
  it('gives a consultant only the engagements', () => {
    expect(navItemsFor('consultant').map((i) => i.to)).toEqual(['/engagements']);
  });
  it('gives a client the deliverables and the way to verify a copy', () => {
    expect(navItemsFor('client').map((i) => i.to)).toEqual(['/engagements', '/deliverables', '/verify']);
  });
});
