/**
 * Text nodes are plain text and the editor escapes them, but a study also leaves the app as PDF,
 * e-mail and HTML exports. Markup typed or pasted into text has no place in a report, so tags that
 * carry behaviour or structure are removed (script and style with their content). Ordinary
 * comparisons such as "n < c and c > 2" do not look like these tags and are kept.
 */
const WITH_CONTENT = /<\s*(script|style|iframe|object|template|noscript)\b[^>]*>[\s\S]*?<\s*\/\s*\1\s*>/gi;
const TAG =
  /<\s*\/?\s*(script|style|iframe|frame|frameset|object|embed|applet|svg|math|img|image|video|audio|source|link|meta|base|form|input|button|textarea|select|a|div|span|p|html|head|body|template|noscript)\b[^>]*>?/gi;
const COMMENT = /<!--[\s\S]*?-->/g;

export function stripMarkup(text: string): string {
  return text.replace(WITH_CONTENT, '').replace(COMMENT, '').replace(TAG, '');
}
