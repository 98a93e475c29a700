/**
 * User text → pdfmake inline runs. Text is only ever placed in pdfmake `text` nodes (nothing is
 * parsed as markup), so "<script>" prints as those characters. Characters the base font lacks go
 * to a fallback font (see pdf-fonts.ts).
 */
import type { Content } from 'pdfmake/interfaces';
import { fontRuns, type BaseFamily } from './pdf-fonts';
import { COLOURS } from './pdf-theme';

/** Runs of `value` in the base family's chain: a string when one font suffices. */
export function runs(value: string, base: BaseFamily = 'Serif'): string | { text: string; font?: string }[] {
  const parts = fontRuns(value, base);
  if (parts.length <= 1 && (parts[0]?.font ?? base) === base) return value;
  return parts.map((p) => (p.font === base ? { text: p.text } : { text: p.text, font: p.font }));
}

/** A text node with style properties, e.g. txt('Total', { bold: true }). */
export function txt(value: string, props: Record<string, unknown> = {}, base: BaseFamily = 'Serif'): Content {
  return { text: runs(value, base), ...props } as Content;
}

/** A text node in the small sans family. */
export const sans = (value: string, props: Record<string, unknown> = {}): Content => txt(value, { font: 'Sans', ...props }, 'Sans');

export interface Mark {
  type?: unknown;
  attrs?: Record<string, unknown>;
}

/** Style properties for TipTap marks; links are printed as text followed by the address. */
export function markProps(marks: Mark[] | undefined): { props: Record<string, unknown>; href: string | null } {
  const props: Record<string, unknown> = {};
  const decorations: string[] = [];
  let href: string | null = null;
  for (const m of marks ?? []) {
    if (m.type === 'bold') props.bold = true;
    else if (m.type === 'italic') props.italics = true;
    else if (m.type === 'underline') decorations.push('underline');
    else if (m.type === 'strike') decorations.push('lineThrough');
    else if (m.type === 'link' && typeof m.attrs?.href === 'string') href = m.attrs.href;
  }
  // pdfmake draws one decoration per run; underline wins over strike-through when both are set.
  if (decorations.length > 0) props.decoration = decorations[0];
  return { props, href };
}

/** One TipTap text node (with its marks) as inline runs. */
export function textNodeRuns(text: string, marks: Mark[] | undefined): Content[] {
  const { props, href } = markProps(marks);
  const out: Content[] = [txt(text, href ? { ...props, color: COLOURS.accent } : props)];
  if (href && href !== text) out.push(txt(` (${href})`, { color: COLOURS.muted, fontSize: 8 }, 'Serif'));
  return out;
}
