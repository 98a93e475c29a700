/** One heading of the study as the outline lists it. */
export interface OutlineItem {
  /** Position of the heading in the editor's document (for jumping to it). */
  pos: number;
  level: number;
  text: string;
  sectionId: string | null;
}

interface JsonNode {
  type?: string;
  text?: string;
  attrs?: Record<string, unknown>;
  content?: JsonNode[];
}

function textOf(node: JsonNode): string {
  if (node.text) return node.text;
  return (node.content ?? []).map(textOf).join('');
}

/** Leaf nodes of a study (no content, size 1). */
const LEAVES = new Set(['modelBlock', 'horizontalRule', 'hardBreak']);

/** ProseMirror's size of a JSON node (text: its length; leaf: 1; otherwise 2 + children). */
function sizeOf(node: JsonNode): number {
  if (node.type === 'text') return node.text?.length ?? 0;
  if (LEAVES.has(node.type ?? '')) return 1;
  if (!node.content || node.content.length === 0) return 2;
  return 2 + node.content.reduce((n, c) => n + sizeOf(c), 0);
}

/**
 * The sections of a study: its top-level headings in order, with the document position of each
 * so the outline can move the cursor there. Works on the stored JSON, so the reader (which has
 * no editor) can list sections too.
 */
export function outlineItems(doc: { content?: unknown[] }): OutlineItem[] {
  const items: OutlineItem[] = [];
  let pos = 0;
  for (const raw of (doc.content ?? []) as JsonNode[]) {
    if (raw.type === 'heading') {
      items.push({ pos, level: Number(raw.attrs?.level ?? 1), text: textOf(raw).trim(), sectionId: (raw.attrs?.sectionId as string | null) ?? null });
    }
    pos += sizeOf(raw);
  }
  return items;
}
