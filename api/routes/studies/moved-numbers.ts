import type { StudyBlockResult } from '../../../shared/schemas/model-block';

const SKIP = new Set(['target']);

/** Scalar numeric measures of a result and of its nested `measures` (solvers), by name. */
function scalars(result: Record<string, unknown> | null): Map<string, number> {
  const out = new Map<string, number>();
  if (!result) return out;
  const nested = result.measures;
  if (typeof nested === 'object' && nested !== null && !Array.isArray(nested)) {
    for (const [k, v] of Object.entries(nested)) if (typeof v === 'number') out.set(k, v);
  }
  for (const [k, v] of Object.entries(result)) if (!SKIP.has(k) && typeof v === 'number') out.set(k, v);
  return out;
}

const same = (a: number | null, b: number | null): boolean =>
  a === b || (a !== null && b !== null && Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(a), Math.abs(b)));

/**
 * The numbers of one block that differ between two computations: the main result's measures
 * under their own names, each scenario's as "<label>: <measure>". A measure that appears or
 * disappears (the block went into or out of error) moves from or to null.
 */
export function movedMeasures(before: StudyBlockResult | null, after: StudyBlockResult): { measure: string; before: number | null; after: number | null }[] {
  const pairs: [string, Record<string, unknown> | null, Record<string, unknown> | null][] = [['', before?.result ?? null, after.result]];
  for (const s of after.scenarios) pairs.push([`${s.label}: `, before?.scenarios.find((b) => b.label === s.label)?.result ?? null, s.result]);
  const moved: { measure: string; before: number | null; after: number | null }[] = [];
  for (const [prefix, b, a] of pairs) {
    const bs = scalars(b);
    const as = scalars(a);
    for (const name of new Set([...bs.keys(), ...as.keys()])) {
      const x = bs.get(name) ?? null;
      const y = as.get(name) ?? null;
      if (!same(x, y)) moved.push({ measure: `${prefix}${name}`, before: x, after: y });
    }
  }
  return moved;
}
