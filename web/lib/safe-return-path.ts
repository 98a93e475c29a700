/**
 * Where to go after signing in. Only same-site paths are followed, so a crafted
 * `?next=https://elsewhere` link cannot bounce a person off the site.
 */
export function safeReturnPath(next: string | null | undefined, fallback = '/engagements'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  if (next.startsWith('/sign-in')) return fallback;
  return next;
}
