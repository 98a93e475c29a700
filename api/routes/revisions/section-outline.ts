/** The loose shape of a stored TipTap node; every field is checked before use. */
export interface DocNode {
  type?: unknown;
  attrs?: Record<string, unknown>;
  content?: unknown;
  text?: unknown;
}

export interface Section {
  sectionId: string | null;
  title: string;
  /** Plain text of the section's body: paragraphs on their own lines, model blocks by title. */
  text: string;
  blockIds: string[];
}

const kids = (n: DocNode): DocNode[] => (Array.isArray(n.content) ? (n.content.filter((c) => typeof c === 'object' && c !== null) as DocNode[]) : []);

function plain(n: DocNode, blocks: string[]): string {
  if (typeof n.text === 'string') return n.text;
  if (n.type === 'hardBreak') return '\n';
  if (n.type === 'modelBlock') {
    const id = String(n.attrs?.blockId ?? '');
    blocks.push(id);
    const cfg = n.attrs?.config as { title?: unknown } | undefined;
    return `[Model block: ${typeof cfg?.title === 'string' && cfg.title ? cfg.title : id}]`;
  }
  const inner = kids(n).map((c) => plain(c, blocks));
  // Inline content joins directly; block content goes on separate lines.
  return inner.join(kids(n).every((c) => c.type === 'text' || c.type === 'hardBreak') ? '' : '\n');
}

/**
 * A study document cut into sections at every heading (as the outline shows them). Text before
 * the first heading forms an untitled opening section with sectionId null.
 */
export function sectionOutline(document: unknown): Section[] {
  const out: Section[] = [];
  let current: Section | null = null;
  for (const node of kids((document ?? {}) as DocNode)) {
    if (node.type === 'heading') {
      current = { sectionId: typeof node.attrs?.sectionId === 'string' ? node.attrs.sectionId : null, title: plain(node, []).trim(), text: '', blockIds: [] };
      out.push(current);
      continue;
    }
    if (!current) {
      current = { sectionId: null, title: '', text: '', blockIds: [] };
      out.push(current);
    }
    const t = plain(node, current.blockIds);
    current.text = current.text ? `${current.text}\n${t}` : t;
  }
  return out;
}

/** Title of every model block in a document, by blockId (the id when untitled). */
export function blockTitles(document: unknown, out = new Map<string, string>()): Map<string, string> {
  const n = (document ?? {}) as DocNode;
  if (n.type === 'modelBlock') {
    const id = String(n.attrs?.blockId ?? '');
    const title = (n.attrs?.config as { title?: unknown } | undefined)?.title;
    out.set(id, typeof title === 'string' && title ? title : id);
  }
  for (const c of kids(n)) blockTitles(c, out);
  return out;
}
