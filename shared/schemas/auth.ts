import { z } from 'zod';
import { shownName } from './shown-name';
import { ROLES } from './roles';

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 200;
export const EMAIL_MAX = 254;

const email = z.string().trim().toLowerCase().max(EMAIL_MAX).email('Enter a valid e-mail address');
const newPassword = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters`);

export const signInBodySchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password').max(PASSWORD_MAX),
});
export const passwordResetRequestSchema = z.object({ email });
export const passwordResetConfirmSchema = z.object({
  token: z.string().min(20).max(200),
  password: newPassword,
});
export const invitationAcceptSchema = z.object({
  name: shownName('Enter your name', 120),
  password: newPassword,
});

export const sessionUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
});

export type SignInBody = z.infer<typeof signInBodySchema>;
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;
export type PasswordResetConfirm = z.infer<typeof passwordResetConfirmSchema>;
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;
export type SessionUser = z.infer<typeof sessionUserSchema>;
