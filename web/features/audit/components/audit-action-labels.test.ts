import { describe, expect, it } from 'vitest';
import { AUDIT_ACTIONS } from '#shared/schemas/audit';
import { auditActionLabel } from './audit-action-labels';

describe('auditActionLabel', () => {
  it('uses the written label for a known action', () => {
    expect(auditActionLabel('sign_in_failed')).toBe('Sign-in refused');
  });
  it('reads an action it has no label for as words', () => {
    expect(auditActionLabel('revision_released')).toBe('Revision released');
  });
  it('gives every recorded action a non-empty label', () => {
    for (const a of AUDIT_ACTIONS) expect(auditActionLabel(a)).toMatch(/^[A-Z]/);
  });
});
