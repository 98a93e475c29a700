import type { ApiIssue } from '../../../shared/api-error';

const STRING_MAX = 2000;
/** Attributes with a closed set of values; anything else falls back to the schema default. */
const CHOICES: Record<string, readonly (string | null)[]> = {
  'tableCell.align': ['left', 'center', 'right', null],
  'tableHeader.align': ['left', 'center', 'right', null],
  'orderedList.type': ['1', 'a', 'A', 'i', 'I', null],
};
/** Attributes set by the server whatever the client sends. */
const FORCED = new Set(['link.rel', 'link.class']);

function plainValue(v: unknown): boolean {
  if (v === null || typeof v === 'boolean') return true;
  if (typeof v === 'number') return Number.isFinite(v);
  if (typeof v === 'string') return v.length <= STRING_MAX;
  // colwidth of table cells: a short list of pixel widths.
  return Array.isArray(v) && v.length <= 100 && v.every((x) => typeof x === 'number' && Number.isFinite(x));
}

/**
 * Keeps only attributes the schema declares for `type`, with plain JSON values (no objects, no
 * long strings). Attributes handled elsewhere (ids, model config, link href) are skipped here.
 */
export function cleanAttrs(
  type: string,
  declared: Record<string, unknown>,
  raw: unknown,
  path: string,
  issues: ApiIssue[],
  skip: readonly string[] = [],
): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return out;
  for (const [name, value] of Object.entries(raw)) {
    const key = `${type}.${name}`;
    if (!(name in declared) || skip.includes(name) || FORCED.has(key)) continue;
    if (key === 'heading.level') {
      if (value === 1 || value === 2 || value === 3) out[name] = value;
      else issues.push({ path: `${path}.attrs.level`, message: 'a section heading level is 1, 2 or 3' });
      continue;
    }
    if (key === 'link.target') {
      out[name] = value === '_blank' ? value : null;
      continue;
    }
    const choices = CHOICES[key];
    if (choices ? choices.includes(value as string | null) : plainValue(value)) out[name] = value;
  }
  return out;
}
