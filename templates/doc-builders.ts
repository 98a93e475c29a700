/**
 * Small builders for the TipTap JSON of a study template: section headings, paragraphs with
 * bold/italic runs, lists, quotes, simple tables and model blocks. They produce plain JSONContent
 * that the study schema (shared/editor/study-extensions.ts) accepts.
 */
import type { JSONContent } from '@tiptap/core';
import type { TemplateAssumption, TemplateBlockConfig, TemplateLink } from './template-types';

/** A run of text: a plain string, or text with marks (and an optional link). */
export type Inline = string | { text: string; bold?: boolean; italic?: boolean; href?: string };

const ID = /^[A-Za-z0-9_-]{6,40}$/;

function checkId(kind: string, id: string): string {
  if (!ID.test(id)) throw new Error(`${kind} id "${id}" must match ${String(ID)}`);
  return id;
}

function inline(parts: Inline[]): JSONContent[] {
  return parts
    .map((p) => (typeof p === 'string' ? { text: p } : p))
    .filter((p) => p.text.length > 0)
    .map((p) => {
      const marks: NonNullable<JSONContent['marks']> = [];
      if ('bold' in p && p.bold) marks.push({ type: 'bold' });
      if ('italic' in p && p.italic) marks.push({ type: 'italic' });
      if ('href' in p && p.href) marks.push({ type: 'link', attrs: { href: p.href } });
      return marks.length > 0 ? { type: 'text', text: p.text, marks } : { type: 'text', text: p.text };
    });
}

/** Bold text run. */
export const b = (text: string): Inline => ({ text, bold: true });
/** Italic text run. */
export const i = (text: string): Inline => ({ text, italic: true });

/** A section heading (level 1–3) with its stable section id. */
export function heading(level: 1 | 2 | 3, text: string, sectionId: string): JSONContent {
  return { type: 'heading', attrs: { level, sectionId: checkId('section', sectionId) }, content: inline([text]) };
}

/** A paragraph of text runs. */
export function para(...parts: Inline[]): JSONContent {
  const content = inline(parts);
  return content.length > 0 ? { type: 'paragraph', content } : { type: 'paragraph' };
}

/** An item is one paragraph (a string or a list of runs). */
type Item = string | Inline[];
const listItem = (item: Item): JSONContent => ({
  type: 'listItem',
  content: [typeof item === 'string' ? para(item) : para(...item)],
});

/** A bullet list, one paragraph per item. */
export function bullets(...items: Item[]): JSONContent {
  return { type: 'bulletList', content: items.map(listItem) };
}

/** A numbered list, one paragraph per item. */
export function numbered(...items: Item[]): JSONContent {
  return { type: 'orderedList', attrs: { start: 1 }, content: items.map(listItem) };
}

/** A block quote of one or more paragraphs. */
export function quote(...paragraphs: Item[]): JSONContent {
  return { type: 'blockquote', content: paragraphs.map((p) => (typeof p === 'string' ? para(p) : para(...p))) };
}

/** A table whose first row is a header row; every cell holds one paragraph. */
export function table(header: string[], rows: string[][]): JSONContent {
  const row = (cells: string[], type: 'tableHeader' | 'tableCell'): JSONContent => ({
    type: 'tableRow',
    content: cells.map((c) => ({ type, content: [para(c)] })),
  });
  return { type: 'table', content: [row(header, 'tableHeader'), ...rows.map((r) => row(r, 'tableCell'))] };
}

/** A model block atom. */
export function block(blockId: string, config: TemplateBlockConfig): JSONContent {
  return { type: 'modelBlock', attrs: { blockId: checkId('block', blockId), config } };
}

/** The top-level document. */
export function doc(...content: (JSONContent | JSONContent[])[]): JSONContent {
  return { type: 'doc', content: content.flat() };
}

/**
 * A link maker bound to a template's assumptions: `use("peak_arrival_rate")` gives
 * `{ assumption: "peak_arrival_rate" }` and throws at load time if no assumption has that key.
 */
export function linker(assumptions: readonly TemplateAssumption[]): (key: string) => TemplateLink {
  const keys = new Set(assumptions.map((a) => a.key));
  return (key) => {
    if (!keys.has(key)) throw new Error(`no template assumption with key "${key}"`);
    return { assumption: key };
  };
}

/**
 * The cautions every study carries (design: "Cautions"). Health, emergency and safety studies
 * show them at the top and at the end.
 */
export const CAUTION_SENTENCES = [
  'The results in this study are model estimates under the assumptions stated in it; they are not measurements and not guarantees.',
  'Check them against observed performance (waits, queue lengths, people turned away) before and after any change is made.',
  'Staffing rules set by law, regulators or collective agreements take precedence over any figure in this study.',
  "The decision belongs to the client's responsible, licensed professionals; this study informs that decision and does not make it.",
] as const;

/** The cautions as paragraphs, with a lead-in for the section. */
export function cautionsParagraphs(): JSONContent[] {
  return [para(b('Please read before using any figure. '), CAUTION_SENTENCES[0]), bullets(...CAUTION_SENTENCES.slice(1))];
}
