/**
 * Templates link their own assumptions by key (`{ "assumption": "peak-arrivals" }`); a study made
 * from one links the engagement's assumptions by id. Returns a copy with every such link
 * rewritten; a key the template does not define is a bug in the template and throws.
 */
export function rewriteTemplateLinks(node: unknown, idByKey: ReadonlyMap<string, number>): unknown {
  if (Array.isArray(node)) return node.map((n) => rewriteTemplateLinks(n, idByKey));
  if (typeof node !== 'object' || node === null) return node;
  const entries = Object.entries(node);
  if (entries.length === 1 && entries[0][0] === 'assumption' && typeof entries[0][1] === 'string') {
    const id = idByKey.get(entries[0][1]);
    if (id === undefined) throw new Error(`The template links an assumption key it does not define: "${entries[0][1]}".`);
    return { assumption: id };
  }
  return Object.fromEntries(entries.map(([k, v]) => [k, rewriteTemplateLinks(v, idByKey)]));
}
