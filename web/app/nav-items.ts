import type { Role } from '#shared/schemas/roles';
import { paths } from './paths';

export interface NavItem {
  to: string;
  label: string;
  roles: readonly Role[];
}

/**
 * What each role may open. Hiding a link is not access control (the API checks every
 * request); it only spares people links that would answer "not allowed".
 */
export const NAV_ITEMS: readonly NavItem[] = [
  { to: paths.engagements, label: 'Engagements', roles: ['admin', 'partner', 'consultant', 'client'] },
  { to: paths.reviews, label: 'Waiting for review', roles: ['partner'] },
  { to: paths.deliverables, label: 'Deliverables', roles: ['partner', 'client'] },
  { to: paths.verify, label: 'Verify a copy', roles: ['client'] },
  { to: paths.adminUsers, label: 'People', roles: ['admin'] },
  { to: paths.adminEngagements, label: 'Engagement admin', roles: ['admin'] },
  { to: paths.audit, label: 'Audit trail', roles: ['admin'] },
  { to: paths.mailbox, label: 'Mailbox', roles: ['admin'] },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles.includes(role));
}
