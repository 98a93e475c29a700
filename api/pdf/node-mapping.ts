/**
 * Study document (TipTap JSON) → pdfmake content, by a record of node handlers. A node type
 * without a handler prints its text content, so a document from a newer editor never loses words.
 * Text is only placed in text nodes: nothing the author typed is interpreted.
 */
import type { Content } from 'pdfmake/interfaces';
import { blockConfigSchema, type BlockConfig, type StudyBlockResult } from '../../shared/schemas/model-block';
import { children, textContent, type DocNode } from './doc-node';
import { docTable } from './doc-table';
import { runs, textNodeRuns, txt } from './inline-text';
import { modelBlockContent } from './model-block-content';
import { COLOURS } from './pdf-theme';

export interface MappingContext {
  blocks: Record<string, StudyBlockResult>;
  /** Rendered charts by block id (rendered once before the document is laid out). */
  charts: ReadonlyMap<string, string | null>;
}

type Handler = (node: DocNode, ctx: MappingContext) => Content[];

/** Inline children of a text block: text runs with marks, line breaks, and text of anything else. */
function inlines(node: DocNode): Content[] {
  return children(node).flatMap((c): Content[] => {
    if (c.type === 'text' && typeof c.text === 'string') return textNodeRuns(c.text, c.marks);
    if (c.type === 'hardBreak') return ['\n'];
    return [txt(textContent(c))];
  });
}

const blocks = (node: DocNode, ctx: MappingContext): Content[] => children(node).flatMap((c) => mapNode(c, ctx));

/** The block config stored on a modelBlock node, or null when it does not parse. */
export function parseBlockConfig(raw: unknown): BlockConfig | null {
  const parsed = blockConfigSchema.safeParse(raw);
  return parsed.success ? parsed.data : null;
}

const HANDLERS: Record<string, Handler> = {
  doc: blocks,
  paragraph: (node) => {
    const content = inlines(node);
    return content.length > 0 ? [{ text: content, style: 'paragraph' }] : [{ text: ' ', fontSize: 5 }];
  },
  heading: (node) => {
    const raw = Number(node.attrs?.level);
    const level = raw === 1 || raw === 2 || raw === 3 ? raw : 3;
    const title = textContent(node).trim() || 'Untitled section';
    return [
      {
        text: runs(title),
        style: `h${level}`,
        // Sections and subsections go into the contents; a heading never ends a page (see pageBreakBefore).
        ...(level <= 2 ? { outline: true, outlineText: title, tocItem: true, tocStyle: level === 1 ? { bold: true } : {}, tocMargin: [level === 1 ? 0 : 14, level === 1 ? 5 : 1, 0, 0] } : {}),
        headlineLevel: level,
      } as Content,
    ];
  },
  bulletList: (node, ctx) => [{ ul: children(node).map((item) => ({ stack: mapNode(item, ctx) })), margin: [6, 0, 0, 6], markerColor: COLOURS.accent } as Content],
  orderedList: (node, ctx) => {
    const start = Number(node.attrs?.start);
    return [{ ol: children(node).map((item) => ({ stack: mapNode(item, ctx) })), start: Number.isInteger(start) ? start : 1, margin: [6, 0, 0, 6] } as Content];
  },
  listItem: (node, ctx) => blocks(node, ctx).map((c) => (typeof c === 'object' && c !== null && 'style' in c && c.style === 'paragraph' ? { ...c, margin: [0, 0, 0, 2] } : c)) as Content[],
  blockquote: (node, ctx) => [
    {
      table: { widths: ['*'], body: [[{ stack: blocks(node, ctx), style: 'quote' }]] },
      layout: { vLineWidth: (i: number) => (i === 0 ? 2 : 0), vLineColor: () => COLOURS.accent, hLineWidth: () => 0, paddingLeft: () => 10 },
      margin: [0, 2, 0, 8],
    } as Content,
  ],
  horizontalRule: () => [{ canvas: [{ type: 'line', x1: 0, y1: 0, x2: 471, y2: 0, lineWidth: 0.5, lineColor: COLOURS.rule }], margin: [0, 6, 0, 10] } as Content],
  table: (node, ctx) => [docTable(node, (cell) => blocks(cell, ctx).map((c) => (typeof c === 'object' && c !== null && 'style' in c && c.style === 'paragraph' ? { ...c, margin: [0, 0, 0, 0] } : c)) as Content[])],
  modelBlock: (node, ctx) => {
    const blockId = String(node.attrs?.blockId ?? '');
    return [modelBlockContent(parseBlockConfig(node.attrs?.config), ctx.blocks[blockId], blockId, ctx.charts.get(blockId) ?? null)];
  },
  text: (node) => [{ text: textNodeRuns(String(node.text ?? ''), node.marks), style: 'paragraph' }],
  hardBreak: () => [],
};

/** Fallback: the text of an unknown node as a paragraph (nothing if it has none). */
function fallback(node: DocNode): Content[] {
  const text = textContent(node).trim();
  return text ? [txt(text, { style: 'paragraph' })] : [];
}

/** Maps one node (and its subtree) to pdfmake content. */
export function mapNode(node: DocNode, ctx: MappingContext): Content[] {
  const handler = typeof node.type === 'string' && Object.hasOwn(HANDLERS, node.type) ? HANDLERS[node.type] : fallback;
  return handler(node, ctx);
}
