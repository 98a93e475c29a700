import type { ApiIssue } from '../../../shared/api-error';
import { MODEL_CATALOG } from '../../../shared/queue/index';
import { assumptionLinkSchema, type BlockConfig } from '../../../shared/schemas/model-block';

/** Catalog field kinds that hold one number, so one number or one assumption link. */
export const SCALAR_KINDS = new Set(['rate', 'duration', 'count', 'probability', 'scv', 'cost', 'number']);
const CONFIG_MAX_CHARS = 200_000;
const strictLink = assumptionLinkSchema.strict();

const looksLikeLink = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v) && 'assumption' in v;

/**
 * Structural checks of a model block's inputs beyond the zod schema: a scalar input holds a number
 * or a well-formed link. These are 400s with the input's path; values the engine refuses (a
 * negative rate, ρ ≥ 1) are not: they become the block's error and the save goes through.
 */
export function checkBlockConfig(config: BlockConfig, path: string): ApiIssue[] {
  const issues: ApiIssue[] = [];
  if (JSON.stringify(config).length > CONFIG_MAX_CHARS) return [{ path, message: `is larger than ${CONFIG_MAX_CHARS} characters` }];
  const entry = MODEL_CATALOG.find((e) => e.model === config.spec.model);
  const checkInputs = (inputs: Record<string, unknown>, at: string): void => {
    for (const [name, value] of Object.entries(inputs)) {
      if (name === 'model') continue;
      if (looksLikeLink(value)) {
        if (!strictLink.safeParse(value).success) {
          issues.push({ path: `${at}.${name}`, message: 'an assumption link is { "assumption": <id> }' });
        }
        continue;
      }
      const kind = entry?.inputs.find((f) => f.name === name)?.kind;
      if (kind && SCALAR_KINDS.has(kind) && typeof value !== 'number') {
        issues.push({ path: `${at}.${name}`, message: 'must be a number or an assumption link' });
      }
    }
  };
  checkInputs(config.spec, `${path}.spec`);
  config.scenarios.forEach((s, i) => checkInputs(s.overrides, `${path}.scenarios.${i}.overrides`));
  return issues;
}
