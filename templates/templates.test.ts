import { getSchema, type JSONContent } from '@tiptap/core';
import { describe, expect, it } from 'vitest';
import { sanitiseDocument } from '../api/routes/studies/document-sanitiser';
import { studyExtensions } from '../shared/editor/study-extensions';
import { compute, MODEL_CATALOG, type QueueResult, type StaffingResult, type SweepResult } from '../shared/queue/index';
import { scalarMeasures } from '../shared/queue/solvers/sweep';
import { assumptionLinkSchema, blockConfigSchema } from '../shared/schemas/model-block';
import { createAssumptionSchema } from '../shared/schemas/assumptions';
import { createStudySchema, templateSummarySchema } from '../shared/schemas/studies';
import { toFieldValue, type TimeUnit } from '../shared/units/units';
import { CAUTION_SENTENCES } from './doc-builders';
import { findTemplate, relinkDocument, STUDY_TEMPLATES, summarizeTemplate, templateBlocks, templateSections } from './index';
import { isTemplateLink, type StudyTemplate, type TemplateInput } from './template-types';

const ID = /^[A-Za-z0-9_-]{6,40}$/;
const schema = getSchema(studyExtensions());

function textOf(node: JSONContent): string {
  return (node.text ?? '') + (node.content ?? []).map(textOf).join(node.type === 'doc' ? '\n' : ' ');
}

function fieldKind(model: string, field: string): string {
  const entry = MODEL_CATALOG.find((e) => e.model === model);
  const input = entry?.inputs.find((f) => f.name === field);
  if (!input) throw new Error(`${model} has no input "${field}"`);
  return input.kind;
}

/** Resolves template links the way the server does once keys are ids: convert into the block's unit. */
function resolve(t: StudyTemplate, model: string, values: Record<string, TemplateInput>, timeUnit: TimeUnit): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [name, v] of Object.entries(values)) {
    if (!isTemplateLink(v)) {
      out[name] = v;
      continue;
    }
    const a = t.assumptions.find((x) => x.key === v.assumption);
    if (!a) throw new Error(`unknown assumption key "${v.assumption}"`);
    const converted = toFieldValue(a.value, a.unit, fieldKind(model, name), timeUnit);
    if (converted === null) throw new Error(`assumption "${a.key}" (${a.unit}) cannot feed ${model}.${name}`);
    out[name] = converted;
  }
  return out;
}

function computeBlock(t: StudyTemplate, blockId: string): { base: QueueResult; scenarios: QueueResult[]; spec: Record<string, unknown> } {
  const block = templateBlocks(t.document).find((x) => x.blockId === blockId);
  if (!block) throw new Error(`no block ${blockId}`);
  const { spec, timeUnit, scenarios } = block.config;
  const resolved = resolve(t, spec.model, spec, timeUnit);
  return {
    spec: resolved,
    base: compute(resolved),
    scenarios: scenarios.map((s) => compute({ ...resolved, ...resolve(t, spec.model, s.overrides, timeUnit) })),
  };
}

describe('STUDY_TEMPLATES', () => {
  it('has at least three templates with unique keys, found by findTemplate', () => {
    expect(STUDY_TEMPLATES.length).toBeGreaterThanOrEqual(3);
    const keys = STUDY_TEMPLATES.map((t) => t.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const t of STUDY_TEMPLATES) {
      expect(findTemplate(t.key)).toBe(t);
      expect(createStudySchema.parse({ title: t.title, templateKey: t.key }).templateKey).toBe(t.key);
      expect(t.description.length).toBeGreaterThan(20);
    }
    expect(findTemplate('no-such-template')).toBeUndefined();
    expect(STUDY_TEMPLATES.map((t) => t.key)).toEqual(expect.arrayContaining(['service-desk-staffing', 'clinic-intake-capacity', 'web-service-headroom']));
  });
});

describe.each(STUDY_TEMPLATES.map((t) => [t.key, t] as const))('template %s', (_key, t) => {
  const blocks = templateBlocks(t.document);
  const sections = templateSections(t.document);

  it('is a valid study document', () => {
    const node = schema.nodeFromJSON(t.document);
    expect(() => node.check()).not.toThrow();
    // Nothing is dropped or renamed on the way through the schema.
    expect(node.toJSON()).toEqual(expect.objectContaining({ type: 'doc' }));
    expect(templateBlocks(node.toJSON() as JSONContent)).toEqual(blocks);
  });

  it('has unique, well-formed section and block ids', () => {
    const ids = [...sections.map((s) => s.sectionId), ...blocks.map((b) => b.blockId)];
    for (const id of ids) expect(id).toMatch(ID);
    expect(new Set(ids).size).toBe(ids.length);
    for (const s of sections) {
      expect([1, 2, 3]).toContain(s.level);
      expect(s.title.trim().length).toBeGreaterThan(0);
    }
  });

  it('ends with "Assumptions and limits" then "Cautions"', () => {
    const titles = sections.map((s) => s.title);
    expect(titles.slice(-2)).toEqual(['Assumptions and limits', 'Cautions']);
  });

  it('carries the cautions', () => {
    const text = textOf(t.document);
    for (const sentence of CAUTION_SENTENCES) expect(text).toContain(sentence);
  });

  it('has assumptions the register accepts, with unique keys', () => {
    const keys = t.assumptions.map((a) => a.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const a of t.assumptions) {
      expect(a.key).toMatch(/^[a-z0-9_]{2,60}$/);
      expect(() => createAssumptionSchema.parse(a)).not.toThrow();
    }
  });

  it('has block configs that parse, linking only existing assumptions', () => {
    expect(blocks.length).toBeGreaterThanOrEqual(4);
    const keys = new Set(t.assumptions.map((a) => a.key));
    const used = new Set<string>();
    for (const { config } of blocks) {
      expect(() => blockConfigSchema.parse(config)).not.toThrow();
      expect(config.title.length).toBeGreaterThan(0);
      for (const values of [config.spec, ...config.scenarios.map((s) => s.overrides)]) {
        for (const v of Object.values(values)) {
          if (typeof v === 'object' && v !== null && !Array.isArray(v)) {
            expect(isTemplateLink(v)).toBe(true);
            expect(keys).toContain((v as { assumption: string }).assumption);
            used.add((v as { assumption: string }).assumption);
          }
        }
      }
    }
    // Every assumption in the template is used by some block.
    expect([...keys].filter((k) => !used.has(k))).toEqual([]);
  });

  it.each(blocks.map((b) => [b.blockId] as const))('block %s computes, with its scenarios, chart and shown measures', (blockId) => {
    const { config } = blocks.find((b) => b.blockId === blockId)!;
    const { base, scenarios, spec } = computeBlock(t, blockId);
    expect(base.model).toBe(config.spec.model);
    expect(scenarios).toHaveLength(config.scenarios.length);
    const available = scalarMeasures(base);
    for (const m of config.shownMeasures ?? []) expect(Object.keys(available)).toContain(m);
    if (config.chart) {
      const { parameter, from, to, steps, measures } = config.chart;
      expect(MODEL_CATALOG.find((e) => e.model === config.spec.model)?.inputs.map((f) => f.name)).toContain(parameter);
      const sweep = compute({ model: 'sweep', base: spec, parameter, from, to, steps, measures }) as SweepResult;
      expect(sweep.model).toBe('sweep');
      // Every measure is drawn, and most of the range has a result.
      expect([...sweep.measures].sort()).toEqual([...measures].sort());
      expect(sweep.errors.length).toBeLessThanOrEqual(Math.floor(steps / 4));
      for (const row of sweep.rows) expect(Number.isFinite(row.value)).toBe(true);
    }
  });

  it('relinks keys to register ids', () => {
    const ids = new Map(t.assumptions.map((a, k) => [a.key, 100 + k]));
    const relinked = relinkDocument(t.document, ids);
    for (const { config } of templateBlocks(relinked)) {
      for (const values of [config.spec, ...config.scenarios.map((s) => s.overrides)]) {
        for (const v of Object.values(values)) {
          if (typeof v === 'object' && v !== null && !Array.isArray(v)) expect(() => assumptionLinkSchema.parse(v)).not.toThrow();
        }
      }
    }
    // The server's save path keeps every id, block and section as written.
    const clean = sanitiseDocument(relinked);
    expect(clean.blocks.map((x) => x.blockId)).toEqual(blocks.map((x) => x.blockId));
    expect(templateSections(clean.document as JSONContent)).toEqual(sections);
    expect(textOf(clean.document as JSONContent)).toEqual(textOf(t.document));
    // The template itself is untouched.
    expect(JSON.stringify(t.document)).not.toContain('"assumption":100');
    expect(() => templateSummarySchema.parse(summarizeTemplate(t))).not.toThrow();
  });
});

describe('assumption names across templates', () => {
  it('are distinct, so one engagement can hold studies from several templates', () => {
    const names = STUDY_TEMPLATES.flatMap((t) => t.assumptions.map((a) => a.name));
    expect(new Set(names).size).toBe(names.length);
  });
});

describe('safety-critical templates', () => {
  const critical = STUDY_TEMPLATES.filter((t) => t.safetyCritical);

  it('include the clinic template', () => {
    expect(critical.map((t) => t.key)).toContain('clinic-intake-capacity');
  });

  it.each(critical.map((t) => [t.key, t] as const))('%s opens and closes with the cautions', (_key, t) => {
    const sections = templateSections(t.document);
    expect(sections[0].title).toBe('Cautions');
    expect(sections[sections.length - 1].title).toBe('Cautions');
    const text = textOf(t.document);
    for (const sentence of CAUTION_SENTENCES) expect(text.split(sentence).length - 1).toBeGreaterThanOrEqual(2);
    expect(text).toMatch(/law, regulators or collective agreements take precedence/);
    expect(text).toMatch(/licensed professionals/);
  });
});

describe('template numbers hang together', () => {
  it('service desk: the agents under study meet the target the staffing block finds', () => {
    const t = findTemplate('service-desk-staffing')!;
    const staffing = computeBlock(t, 'sd-peak-staffing').base as StaffingResult;
    const agents = t.assumptions.find((a) => a.key === 'agents_at_peak')!.value;
    expect(agents).toBeGreaterThanOrEqual(staffing.servers);
    expect(agents).toBeLessThanOrEqual(staffing.servers + 2);
  });

  it('web service: the proposed pool respects the utilisation cap', () => {
    const t = findTemplate('web-service-headroom')!;
    const cap = computeBlock(t, 'ws-cap-staffing').base as StaffingResult;
    const planned = t.assumptions.find((a) => a.key === 'planned_worker_slots')!.value;
    expect(planned).toBeGreaterThanOrEqual(cap.servers);
  });
});
