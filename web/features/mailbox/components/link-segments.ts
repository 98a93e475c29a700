export type Segment = { kind: 'text'; text: string } | { kind: 'link'; href: string };

/**
 * Cuts a plain-text message into text and the links the server found in it, so the links can
 * be rendered clickable without treating the text as HTML. Only http(s) links become links.
 */
export function linkSegments(text: string, links: readonly string[]): Segment[] {
  const usable = [...new Set(links)].filter((l) => /^https?:\/\//i.test(l)).sort((a, b) => b.length - a.length);
  if (usable.length === 0) return text ? [{ kind: 'text', text }] : [];
  const pattern = new RegExp(usable.map((l) => l.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')).join('|'), 'g');
  const out: Segment[] = [];
  let last = 0;
  for (const m of text.matchAll(pattern)) {
    const at = m.index ?? 0;
    if (at > last) out.push({ kind: 'text', text: text.slice(last, at) });
    out.push({ kind: 'link', href: m[0] });
    last = at + m[0].length;
  }
  if (last < text.length) out.push({ kind: 'text', text: text.slice(last) });
  return out;
}
