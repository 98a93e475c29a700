import { ALLOWED_LINK_PROTOCOLS } from '../../../shared/editor/study-extensions';

const ALLOWED = new Set(ALLOWED_LINK_PROTOCOLS.map((p) => `${p}:`));

/**
 * The href if it is an absolute http, https or mailto address, else null. The URL parser drops
 * tabs and newlines the way browsers do, so "java\nscript:" is seen as javascript: and refused.
 */
export function safeHref(value: unknown): string | null {
  if (typeof value !== 'string' || value.length > 2000) return null;
  try {
    const url = new URL(value.trim());
    return ALLOWED.has(url.protocol) ? url.href : null;
  } catch {
    return null;
  }
}
