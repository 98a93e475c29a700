import { z } from 'zod';
import { shownName } from './shown-name';
import { ROLES } from './roles';
import { EMAIL_MAX } from './auth';

export const NAME_MAX = 120;

export const userSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  /** 'invited' until the invitation is accepted, then 'active'; 'deactivated' cannot sign in. */
  status: z.enum(['invited', 'active', 'deactivated']),
  createdAt: z.string(),
  lastSignInAt: z.string().nullable(),
});

export const inviteUserSchema = z.object({
  email: z.string().trim().toLowerCase().max(EMAIL_MAX).email('Enter a valid e-mail address'),
  name: shownName('Enter a name', NAME_MAX),
  role: z.enum(ROLES, { message: 'Choose a role' }),
});

export const updateUserSchema = z
  .object({
    name: shownName('Enter a name', NAME_MAX),
    role: z.enum(ROLES, { message: 'Choose a role' }),
    active: z.boolean(),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });

export type User = z.infer<typeof userSchema>;
export type InviteUser = z.infer<typeof inviteUserSchema>;
export type UpdateUser = z.infer<typeof updateUserSchema>;
