import { inputKind, MODEL_CATALOG, type QueueIssue } from '../../../shared/queue/index';
import type { FitWarning } from '../../../shared/queue/fit/index';
import type { TimeUnit, UnitCode } from '../../../shared/units/units';
import { UNIT_INFO, toFieldValue } from '../../../shared/units/units';
import { SCALAR_KINDS } from './block-config-check';

/** What a block needs to know of an assumption of the register. */
export interface RegisterEntry {
  id: number;
  name: string;
  value: number;
  unit: UnitCode;
  version: number;
  /** Warnings of the dataset fit the value came from (assumptions.cautions); none for other sources. */
  cautions?: FitWarning[];
}
export type Register = ReadonlyMap<number, RegisterEntry>;

export interface ResolvedSpec {
  spec: Record<string, unknown>;
  /** Assumptions the spec links that exist in the register. */
  assumptionIds: number[];
  /** One per link that could not be resolved, naming the input. */
  issues: QueueIssue[];
}

export const linkId = (v: unknown): number | null =>
  typeof v === 'object' && v !== null && !Array.isArray(v) && typeof (v as { assumption?: unknown }).assumption === 'number'
    ? (v as { assumption: number }).assumption
    : null;

/**
 * Replaces each `{ assumption: id }` input by the assumption's value in the unit the field needs
 * (the block's time unit for rates and durations; a duration feeding a rate is inverted). A link
 * that cannot be resolved leaves the input out and reports an issue at its name.
 */
export function resolveSpec(input: Record<string, unknown>, timeUnit: TimeUnit, register: Register): ResolvedSpec {
  const entry = MODEL_CATALOG.find((e) => e.model === input.model);
  const spec: Record<string, unknown> = {};
  const assumptionIds: number[] = [];
  const issues: QueueIssue[] = [];
  for (const [name, value] of Object.entries(input)) {
    const id = linkId(value);
    if (id === null) {
      spec[name] = value;
      continue;
    }
    const field = entry?.inputs.find((f) => f.name === name);
    const label = field?.label ?? name;
    const a = register.get(id);
    if (!a) {
      issues.push({ path: name, message: `${label}: the linked assumption no longer exists in this engagement` });
      continue;
    }
    assumptionIds.push(id);
    const kind = field ? inputKind(field, input.criterion) : null;
    if (!field || !kind || !SCALAR_KINDS.has(kind)) {
      issues.push({ path: name, message: `${label}: ${entry ? `${entry.model} has no single-number input here` : 'unknown model'}, so "${a.name}" cannot be linked` });
      continue;
    }
    const v = toFieldValue(a.value, a.unit, kind, timeUnit);
    if (v === null) {
      issues.push({ path: name, message: `${label}: "${a.name}" is in ${UNIT_INFO[a.unit].label}, which cannot feed a ${kind} input` });
      continue;
    }
    spec[name] = v;
  }
  return { spec, assumptionIds, issues };
}
