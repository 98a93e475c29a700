/** One role per user; access to an engagement also needs membership (admins see all). */
export const ROLES = ['admin', 'partner', 'consultant', 'client'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  partner: 'Partner',
  consultant: 'Consultant',
  client: 'Client',
};
