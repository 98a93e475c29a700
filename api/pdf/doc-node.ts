/** The loose shape of a stored TipTap node as the PDF reads it (every field checked before use). */
export interface DocNode {
  type?: unknown;
  attrs?: Record<string, unknown>;
  content?: unknown;
  text?: unknown;
  marks?: { type?: unknown; attrs?: Record<string, unknown> }[];
}

/** The node's children that look like nodes. */
export function children(node: DocNode): DocNode[] {
  return Array.isArray(node.content) ? (node.content.filter((c) => typeof c === 'object' && c !== null) as DocNode[]) : [];
}

/** All text under a node, blocks separated by spaces (used for unknown nodes and heading titles). */
export function textContent(node: DocNode): string {
  if (typeof node.text === 'string') return node.text;
  if (node.type === 'hardBreak') return ' ';
  return children(node).map(textContent).join(children(node).some((c) => c.type !== 'text') ? ' ' : '');
}
