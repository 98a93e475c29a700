import { z } from 'zod';
import { TIME_UNITS } from '../units/units';

/**
 * A model block as stored in the study document (the `config` attribute of the `modelBlock`
 * node). `spec` is an engine spec (see shared/queue/spec.ts) in the block's `timeUnit`, except
 * that any top-level input may instead be a link `{ "assumption": <id> }` to the engagement's
 * register; the server resolves links (converting units) and recomputes. Results are never
 * stored in the document: the server keeps them per block (see StudyBlockResult).
 */
export const assumptionLinkSchema = z.object({ assumption: z.number().int().positive() });
export type AssumptionLink = z.infer<typeof assumptionLinkSchema>;

export const isAssumptionLink = (v: unknown): v is AssumptionLink =>
  typeof v === 'object' && v !== null && !Array.isArray(v) && typeof (v as { assumption?: unknown }).assumption === 'number';

export const BLOCK_TITLE_MAX = 200;
export const MAX_SCENARIOS = 8;

export const chartConfigSchema = z.object({
  /** The spec input varied along x (e.g. "servers", "arrivalRate"). */
  parameter: z.string().min(1).max(100),
  from: z.number(),
  to: z.number(),
  steps: z.number().int().min(2).max(200),
  /** Measures drawn as lines (e.g. ["serviceLevel", "Wq"]). */
  measures: z.array(z.string().min(1).max(50)).min(1).max(4),
});
export type ChartConfig = z.infer<typeof chartConfigSchema>;

export const scenarioSchema = z.object({
  label: z.string().trim().min(1).max(80),
  /** Inputs that differ from the block's spec (values or links). */
  overrides: z.record(z.string(), z.unknown()),
});

export const blockConfigSchema = z.object({
  title: z.string().trim().max(BLOCK_TITLE_MAX).default(''),
  timeUnit: z.enum(TIME_UNITS).default('hour'),
  spec: z.looseObject({ model: z.string().min(1).max(40) }),
  /** Side-by-side options (a scenario comparison); empty for a single calculation. */
  scenarios: z.array(scenarioSchema).max(MAX_SCENARIOS).default([]),
  chart: chartConfigSchema.nullable().default(null),
  /** Measures shown in the text's table (default: the model's main measures). */
  shownMeasures: z.array(z.string().max(50)).max(30).optional(),
});
export type BlockConfig = z.infer<typeof blockConfigSchema>;

/** What the server computed for one block of a study. */
export const studyBlockResultSchema = z.object({
  blockId: z.string(),
  status: z.enum(['ok', 'error']),
  /** The spec after links were resolved and units converted: what the engine actually ran. */
  resolvedSpec: z.record(z.string(), z.unknown()).nullable(),
  result: z.record(z.string(), z.unknown()).nullable(),
  error: z.object({ code: z.string(), message: z.string(), issues: z.array(z.object({ path: z.string(), message: z.string() })) }).nullable(),
  scenarios: z.array(z.object({ label: z.string(), result: z.record(z.string(), z.unknown()).nullable(), error: z.object({ code: z.string(), message: z.string() }).nullable() })),
  /** Long-format rows for vega-lite: {x, measure, value}. */
  chart: z.array(z.object({ x: z.number(), measure: z.string(), value: z.number().nullable() })).nullable(),
  assumptionIds: z.array(z.number().int()),
  engineVersion: z.string(),
  computedAt: z.string(),
});
export type StudyBlockResult = z.infer<typeof studyBlockResultSchema>;
