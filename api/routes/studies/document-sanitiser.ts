import { getSchema } from '@tiptap/core';
import type { Mark, Node as PmNode, Schema } from '@tiptap/pm/model';
import type { ApiIssue } from '../../../shared/api-error';
import { studyExtensions } from '../../../shared/editor/study-extensions';
import { blockConfigSchema, type BlockConfig } from '../../../shared/schemas/model-block';
import { MAX_BLOCKS_PER_STUDY } from '../../../shared/schemas/studies';
import { HttpError } from '../../http-error';
import { cleanAttrs } from './attribute-policy';
import { checkBlockConfig } from './block-config-check';
import { createIdKeeper } from './element-ids';
import { safeHref } from './safe-href';
import { stripMarkup } from './strip-markup';

/** A model block found in a saved document, in document order. */
export interface DocumentBlock {
  blockId: string;
  position: number;
  config: BlockConfig;
}

export interface SanitisedDocument {
  document: Record<string, unknown>;
  blocks: DocumentBlock[];
}

const MAX_DEPTH = 40;
let cached: Schema | null = null;
/** The ProseMirror schema of a study, built once from the same extensions the editor uses. */
export const studySchema = (): Schema => (cached ??= getSchema(studyExtensions()));

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);

/**
 * Cleans a TipTap document against the study schema: unknown nodes, marks and attributes are
 * dropped, text loses embedded markup, links keep only http/https/mailto targets, model-block
 * configs are validated (400 with the dotted path of every issue), block and section ids are
 * kept when well-formed and unique and replaced otherwise. The result passes `check()`.
 */
export function sanitiseDocument(input: unknown, path = 'document'): SanitisedDocument {
  const schema = studySchema();
  const issues: ApiIssue[] = [];
  const blocks: DocumentBlock[] = [];
  const blockId = createIdKeeper();
  const sectionId = createIdKeeper();

  const marksOf = (raw: unknown): Mark[] => {
    if (!Array.isArray(raw)) return [];
    const marks: Mark[] = [];
    for (const m of raw) {
      if (!isObject(m) || typeof m.type !== 'string') continue;
      const type = schema.marks[m.type];
      if (!type) continue;
      const attrs = cleanAttrs(m.type, type.spec.attrs ?? {}, m.attrs, path, issues, ['href']);
      if (m.type === 'link') {
        const href = safeHref(isObject(m.attrs) ? m.attrs.href : null);
        if (!href) continue;
        attrs.href = href;
      }
      marks.push(type.create(attrs));
    }
    return marks;
  };

  const build = (raw: unknown, at: string, depth: number): PmNode | null => {
    if (!isObject(raw) || typeof raw.type !== 'string') return null;
    if (depth > MAX_DEPTH) {
      issues.push({ path: at, message: `is nested more than ${MAX_DEPTH} levels deep` });
      return null;
    }
    if (raw.type === 'text') {
      const text = typeof raw.text === 'string' ? stripMarkup(raw.text) : '';
      return text ? schema.text(text, marksOf(raw.marks)) : null;
    }
    const type = schema.nodes[raw.type];
    if (!type || type === schema.topNodeType) return null;
    const attrs = cleanAttrs(raw.type, type.spec.attrs ?? {}, raw.attrs, at, issues, ['blockId', 'sectionId', 'config']);
    const rawAttrs = isObject(raw.attrs) ? raw.attrs : {};
    if (raw.type === 'heading') attrs.sectionId = sectionId(rawAttrs.sectionId);
    if (raw.type === 'modelBlock') {
      const parsed = blockConfigSchema.safeParse(rawAttrs.config);
      if (!parsed.success) {
        for (const i of parsed.error.issues) issues.push({ path: [`${at}.attrs.config`, ...i.path.map(String)].join('.'), message: i.message });
        return null;
      }
      const configIssues = checkBlockConfig(parsed.data, `${at}.attrs.config`);
      if (configIssues.length > 0) {
        issues.push(...configIssues);
        return null;
      }
      attrs.blockId = blockId(rawAttrs.blockId);
      attrs.config = parsed.data;
      blocks.push({ blockId: attrs.blockId as string, position: blocks.length, config: parsed.data });
    }
    const children = (Array.isArray(raw.content) ? raw.content : [])
      .map((c, i) => build(c, `${at}.content.${i}`, depth + 1))
      .filter((n): n is PmNode => n !== null);
    try {
      return type.createChecked(attrs, children);
    } catch {
      // Dropping unknown children can leave a node short of required content (an empty cell):
      // fill it. Children the node can never hold are the client's error.
      const filled = type.createAndFill(attrs, children);
      if (!filled) issues.push({ path: at, message: `a ${raw.type} cannot hold this content` });
      return filled;
    }
  };

  const root = isObject(input) ? input : {};
  const children = (Array.isArray(root.content) ? root.content : [])
    .map((c, i) => build(c, `${path}.content.${i}`, 1))
    .filter((n): n is PmNode => n !== null);
  if (blocks.length > MAX_BLOCKS_PER_STUDY) issues.push({ path, message: `has more than ${MAX_BLOCKS_PER_STUDY} model blocks` });
  const doc = schema.topNodeType.createAndFill(null, children);
  if (!doc) issues.push({ path, message: 'the top level of a study holds only blocks (paragraphs, headings, tables, model blocks)' });
  else {
    try {
      doc.check();
    } catch (err) {
      issues.push({ path, message: (err as Error).message });
    }
  }
  if (issues.length > 0 || !doc) {
    throw new HttpError(400, 'validation_failed', `${issues[0]?.path}: ${issues[0]?.message}`, issues);
  }
  return { document: doc.toJSON() as Json, blocks };
}
