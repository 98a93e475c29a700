import { z } from 'zod';

/** Every kind of event the audit trail records. */
export const AUDIT_ACTIONS = [
  'sign_in',
  'sign_in_failed',
  'sign_out',
  'password_reset_requested',
  'password_reset_completed',
  'user_invited',
  'invitation_accepted',
  'user_role_changed',
  'user_deactivated',
  'user_reactivated',
  'user_renamed',
  'engagement_created',
  'engagement_updated',
  'member_added',
  'member_removed',
  'study_created',
  'assumption_created',
  'assumption_updated',
  'assumption_deleted',
  'dataset_uploaded',
  'dataset_mapped',
  'dataset_deleted',
  'revision_submitted',
  'revision_approved',
  'changes_requested',
  'revision_released',
  'release_failed',
  'deliverable_downloaded',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  action: z.string(),
  actorId: z.number().int().nullable(),
  actorEmail: z.string().nullable(),
  engagementId: z.number().int().nullable(),
  engagementName: z.string().nullable(),
  subject: z.string().nullable(),
  detail: z.record(z.string(), z.unknown()).nullable(),
  ip: z.string().nullable(),
});

export const auditQuerySchema = z.object({
  action: z.enum(AUDIT_ACTIONS).optional(),
  actorId: z.coerce.number().int().positive().optional(),
  engagementId: z.coerce.number().int().positive().optional(),
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
  q: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
  beforeId: z.coerce.number().int().positive().optional(),
});

export type AuditEntry = z.infer<typeof auditEntrySchema>;
export type AuditQuery = z.infer<typeof auditQuerySchema>;
