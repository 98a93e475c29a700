/** Every screen's address in one place, so links and routes cannot drift apart. */
export const paths = {
  home: '/',
  signIn: '/sign-in',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  invitation: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  engagements: '/engagements',
  engagement: (id: number | string) => `/engagements/${id}`,
  assumptions: (engagementId: number | string) => `/engagements/${engagementId}/assumptions`,
  study: (id: number | string) => `/studies/${id}`,
  studyReader: (id: number | string) => `/studies/${id}/read`,
  adminUsers: '/admin/users',
  adminEngagements: '/admin/engagements',
  audit: '/admin/audit',
  mailbox: '/admin/mailbox',
} as const;
