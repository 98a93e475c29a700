import { z } from 'zod';
import { shownName } from './shown-name';
import { ROLES } from './roles';

export const ENGAGEMENT_NAME_MAX = 160;
export const CLIENT_NAME_MAX = 160;
export const DESCRIPTION_MAX = 4000;

export const engagementSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  clientName: z.string(),
  description: z.string(),
  status: z.enum(['active', 'archived']),
  /** Whether the work touches health, emergency response or safety: the studies then lead with cautions. */
  safetyCritical: z.boolean(),
  createdAt: z.string(),
  updatedAt: z.string(),
  memberCount: z.number().int(),
  version: z.number().int(),
});

export const createEngagementSchema = z.object({
  name: shownName('Enter a name', ENGAGEMENT_NAME_MAX),
  clientName: shownName('Enter the client', CLIENT_NAME_MAX),
  description: z.string().trim().max(DESCRIPTION_MAX).default(''),
  safetyCritical: z.boolean().default(false),
});

export const updateEngagementSchema = z
  .object({
    name: shownName('Enter a name', ENGAGEMENT_NAME_MAX),
    clientName: shownName('Enter the client', CLIENT_NAME_MAX),
    description: z.string().trim().max(DESCRIPTION_MAX),
    safetyCritical: z.boolean(),
    status: z.enum(['active', 'archived']),
  })
  .partial()
  .extend({ version: z.number().int().optional() })
  .refine((v) => Object.keys(v).some((k) => k !== 'version'), { message: 'Nothing to change' });

export const memberSchema = z.object({
  userId: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  addedAt: z.string(),
});

export const addMemberSchema = z.object({
  userId: z.number({ message: 'Choose a person' }).int().positive(),
});

export type Engagement = z.infer<typeof engagementSchema>;
export type CreateEngagement = z.infer<typeof createEngagementSchema>;
export type UpdateEngagement = z.infer<typeof updateEngagementSchema>;
export type Member = z.infer<typeof memberSchema>;
export type AddMember = z.infer<typeof addMemberSchema>;
