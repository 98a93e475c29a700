import type { AuditAction } from '#shared/schemas/audit';

/**
 * Plain words for recorded events. Partial on purpose: other features add actions to the
 * shared list, and an action without a label here still reads sensibly (see below) instead of
 * breaking the build.
 */
export const AUDIT_ACTION_LABELS: Partial<Record<AuditAction, string>> = {
  sign_in: 'Signed in',
  sign_in_failed: 'Sign-in refused',
  sign_out: 'Signed out',
  password_reset_requested: 'Password reset requested',
  password_reset_completed: 'Password reset completed',
  user_invited: 'Person invited',
  invitation_accepted: 'Invitation accepted',
  user_role_changed: 'Role changed',
  user_deactivated: 'Person deactivated',
  user_reactivated: 'Person reactivated',
  user_renamed: 'Person renamed',
  engagement_created: 'Engagement created',
  engagement_updated: 'Engagement updated',
  member_added: 'Member added',
  member_removed: 'Member removed',
  study_created: 'Study created',
  assumption_created: 'Assumption added',
  assumption_updated: 'Assumption changed',
  assumption_deleted: 'Assumption removed',
};

/** "study_released" → "Study released" when no label is set. */
export function auditActionLabel(action: string): string {
  const label = (AUDIT_ACTION_LABELS as Record<string, string | undefined>)[action];
  if (label) return label;
  const words = action.replaceAll('_', ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
