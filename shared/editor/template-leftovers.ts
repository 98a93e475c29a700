/**
 * What a study made from a template may still hold of the template's scaffolding: paragraphs of
 * guidance (they open with an italic "Guidance:") and placeholders for numbers still to write (a
 * bold "[Wq]", "[number]"…). Found before submission, so the author is told before the text goes
 * to a partner and, once released, to the client in the PDF.
 */
export interface TemplateLeftovers {
  /** Paragraphs that open with the template's italic "Guidance:". */
  guidance: number;
  /** Distinct bold bracketed placeholders, in document order. */
  placeholders: string[];
}

interface Node {
  type?: string;
  text?: string;
  marks?: { type?: string }[];
  content?: Node[];
}

const PLACEHOLDER = /^\[[^\]\n]{1,30}\]$/;
const has = (n: Node, mark: string): boolean => Boolean(n.marks?.some((m) => m.type === mark));

export function templateLeftovers(document: unknown): TemplateLeftovers {
  const out: TemplateLeftovers = { guidance: 0, placeholders: [] };
  const walk = (n: Node): void => {
    if (n.type === 'paragraph') {
      const first = n.content?.[0];
      if (first?.type === 'text' && has(first, 'italic') && first.text?.trimStart().startsWith('Guidance:')) out.guidance++;
    }
    if (n.type === 'text' && has(n, 'bold') && PLACEHOLDER.test(n.text?.trim() ?? '')) {
      const p = n.text!.trim();
      if (!out.placeholders.includes(p)) out.placeholders.push(p);
    }
    for (const c of n.content ?? []) walk(c);
  };
  if (document && typeof document === 'object') walk(document as Node);
  return out;
}
