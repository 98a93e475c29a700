import { describe, expect, it } from 'vitest';
import { toAuditQuery } from './audit-filters';

describe('toAuditQuery', () => {
  it('turns a day range into instants covering both whole days', () => {
    const q = toAuditQuery({ from: '2026-03-02', to: '2026-03-02' });
    expect(new Date(q.from as string).getTime()).toBe(new Date(2026, 2, 2).getTime());
    expect(new Date(q.to as string).getTime()).toBe(new Date(2026, 2, 2, 23, 59, 59, 999).getTime());
  });
  it('drops a malformed day and blank search text', () => {
    expect(toAuditQuery({ from: '2.3.2026', q: '   ' })).toMatchObject({ from: undefined, q: undefined });
  });
  it('passes ids and action through', () => {
    expect(toAuditQuery({ action: 'sign_in', actorId: 3, engagementId: 7 })).toMatchObject({ action: 'sign_in', actorId: 3, engagementId: 7 });
  });
});
