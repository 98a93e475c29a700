import { studyTemplateSchema, type TemplateSummary } from '../../../shared/schemas/studies';
import type { z } from 'zod';

export type ParsedTemplate = z.output<typeof studyTemplateSchema>;

// The templates live in templates/ (their own module, written by the templates' author); loaded
// lazily and validated once, so a broken template fails loudly at the first request, not silently.
const TEMPLATES_MODULE = new URL('../../../templates/index.ts', import.meta.url).href;
let loaded: Promise<ParsedTemplate[]> | null = null;

export function loadStudyTemplates(): Promise<ParsedTemplate[]> {
  loaded ??= import(/* @vite-ignore */ TEMPLATES_MODULE).then(
    (mod: { STUDY_TEMPLATES?: unknown }) => studyTemplateSchema.array().parse(mod.STUDY_TEMPLATES ?? []),
    (err: { code?: string }) => {
      if (err.code === 'ERR_MODULE_NOT_FOUND') return [];
      throw err;
    },
  );
  return loaded;
}

function count(node: unknown, type: string): number {
  if (typeof node !== 'object' || node === null) return 0;
  const n = node as { type?: unknown; content?: unknown };
  const own = n.type === type ? 1 : 0;
  return own + (Array.isArray(n.content) ? n.content.reduce((s: number, c) => s + count(c, type), 0) : 0);
}

export const summariseTemplate = (t: ParsedTemplate): TemplateSummary => ({
  key: t.key,
  title: t.title,
  description: t.description,
  sectionCount: count(t.document, 'heading'),
  blockCount: count(t.document, 'modelBlock'),
  assumptionCount: t.assumptions.length,
});
