/**
 * Pure helpers over a template's document: list its sections and model blocks, summarise it for
 * the template list, and rewrite assumption links from template keys to register ids.
 */
import type { JSONContent } from '@tiptap/core';
import type { StudyTemplate, TemplateBlockConfig } from './template-types';
import { isTemplateLink } from './template-types';

export interface TemplateBlock {
  blockId: string;
  config: TemplateBlockConfig;
}

function walk(node: JSONContent, visit: (n: JSONContent) => void): void {
  visit(node);
  for (const child of node.content ?? []) walk(child, visit);
}

/** Every model block of a document, in document order. */
export function templateBlocks(document: JSONContent): TemplateBlock[] {
  const out: TemplateBlock[] = [];
  walk(document, (n) => {
    if (n.type === 'modelBlock') out.push({ blockId: String(n.attrs?.blockId), config: n.attrs?.config as TemplateBlockConfig });
  });
  return out;
}

/** Every section heading of a document: its id, level and title. */
export function templateSections(document: JSONContent): { sectionId: string; level: number; title: string }[] {
  const out: { sectionId: string; level: number; title: string }[] = [];
  walk(document, (n) => {
    if (n.type === 'heading') {
      out.push({ sectionId: String(n.attrs?.sectionId), level: Number(n.attrs?.level), title: (n.content ?? []).map((c) => c.text ?? '').join('') });
    }
  });
  return out;
}

/** The counts the template list shows (see templateSummarySchema). */
export function summarizeTemplate(t: StudyTemplate): { key: string; title: string; description: string; sectionCount: number; blockCount: number; assumptionCount: number } {
  return {
    key: t.key,
    title: t.title,
    description: t.description,
    sectionCount: templateSections(t.document).length,
    blockCount: templateBlocks(t.document).length,
    assumptionCount: t.assumptions.length,
  };
}

function relinkValues(values: Record<string, unknown>, idsByKey: ReadonlyMap<string, number>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [name, v] of Object.entries(values)) {
    if (isTemplateLink(v)) {
      const id = idsByKey.get(v.assumption);
      if (id === undefined) throw new Error(`no assumption id for template key "${v.assumption}"`);
      out[name] = { assumption: id };
    } else {
      out[name] = v;
    }
  }
  return out;
}

/**
 * A copy of `document` whose block links `{ assumption: "<key>" }` (in specs and scenario
 * overrides) become `{ assumption: <id> }`, given the ids the register gave each key.
 */
export function relinkDocument(document: JSONContent, idsByKey: ReadonlyMap<string, number>): JSONContent {
  const copy = structuredClone(document);
  walk(copy, (n) => {
    if (n.type !== 'modelBlock' || !n.attrs?.config) return;
    const config = n.attrs.config as Record<string, unknown> & { spec: Record<string, unknown>; scenarios?: { label: string; overrides: Record<string, unknown> }[] };
    config.spec = relinkValues(config.spec, idsByKey);
    if (config.scenarios) config.scenarios = config.scenarios.map((s) => ({ ...s, overrides: relinkValues(s.overrides, idsByKey) }));
  });
  return copy;
}
