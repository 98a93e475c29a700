/**
 * Types of a study template: a TipTap document with model blocks plus the assumptions those
 * blocks link to. Inside a template, a link names an assumption by its template `key` (a string);
 * the server creates the assumptions in the engagement's register when a study is made from the
 * template and rewrites every `{ assumption: "<key>" }` to `{ assumption: <id> }`.
 */
import type { JSONContent } from '@tiptap/core';
import type { ChartConfig } from '../shared/schemas/model-block';
import type { ModelName } from '../shared/queue/spec';
import type { ASSUMPTION_SOURCES } from '../shared/schemas/assumptions';
import type { TimeUnit, UnitCode } from '../shared/units/units';

export type TemplateSourceKind = (typeof ASSUMPTION_SOURCES)[number];

export interface TemplateAssumption {
  /** Stable within the template; what block links name. */
  key: string;
  name: string;
  value: number;
  unit: UnitCode;
  sourceKind: TemplateSourceKind;
  sourceDetail: string;
  notes: string;
}

export interface StudyTemplate {
  key: string;
  title: string;
  description: string;
  /** Health, emergency or safety work: the study carries the cautions prominently. */
  safetyCritical: boolean;
  assumptions: TemplateAssumption[];
  /** TipTap document (validated against shared/editor/study-extensions.ts). */
  document: JSONContent;
}

/** A link from a block input to a template assumption, by key. */
export interface TemplateLink {
  assumption: string;
}

/** A value a template block input may hold. */
export type TemplateInput = number | string | number[] | TemplateLink;

/** A model block configuration as a template writes it (parsed by blockConfigSchema on use). */
export interface TemplateBlockConfig {
  title: string;
  timeUnit: TimeUnit;
  spec: { model: ModelName } & Record<string, TemplateInput>;
  scenarios: { label: string; overrides: Record<string, TemplateInput> }[];
  chart: ChartConfig | null;
  shownMeasures?: string[];
}

export const isTemplateLink = (v: unknown): v is TemplateLink =>
  typeof v === 'object' && v !== null && !Array.isArray(v) && typeof (v as { assumption?: unknown }).assumption === 'string';
