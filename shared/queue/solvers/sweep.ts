/**
 * Sweep: one input of a base spec varied over a range, returning long-format rows {x, measure,
 * value} ready for a vega-lite chart, with a per-point error where the model has no answer
 * (unstable, or the varied value is not a valid input).
 */
import { invalidInput, QueueError } from '../errors';
import type { QueueResult, QueueWarning, SweepPointError, SweepResult, SweepRow } from '../result';
import type { SweepSpec } from '../spec';

/** The x values of a sweep: the given values, or `steps` evenly spaced points from `from` to `to`. */
export function sweepValues(spec: Pick<SweepSpec, 'values' | 'from' | 'to' | 'steps'>): number[] {
  if (spec.values) return [...spec.values];
  const { from = 0, to = 0, steps = 2 } = spec;
  return Array.from({ length: steps }, (_, i) => (i === steps - 1 ? to : from + ((to - from) * i) / (steps - 1)));
}

/** A copy of `base` with the dotted `path` set to `value` (array indices must exist). */
export function withParameter(base: Record<string, unknown>, path: string, value: number): Record<string, unknown> {
  const copy = structuredClone(base);
  const keys = path.split('.');
  let node: unknown = copy;
  for (let i = 0; i < keys.length - 1; i++) {
    node = (node as Record<string, unknown>)[keys[i]];
    if (typeof node !== 'object' || node === null) throw invalidInput('parameter', `"${path}" does not name an input of the base spec`);
  }
  const last = keys[keys.length - 1];
  if (Array.isArray(node) && !(Number(last) >= 0 && Number(last) < node.length)) {
    throw invalidInput('parameter', `"${path}" is outside the array it indexes`);
  }
  if (keys[0] === 'model') throw invalidInput('parameter', 'the model itself cannot be swept');
  (node as Record<string, unknown>)[last] = value;
  return copy;
}

const SKIP = new Set(['model', 'method', 'warnings', 'target']);

/** Scalar numeric measures of a result (and of its `measures`, for solvers), by name. */
export function scalarMeasures(result: QueueResult): Record<string, number> {
  const out: Record<string, number> = {};
  const nested = (result as { measures?: unknown }).measures;
  if (nested && typeof nested === 'object' && !Array.isArray(nested)) {
    for (const [k, v] of Object.entries(nested)) if (typeof v === 'number' && Number.isFinite(v)) out[k] = v;
  }
  for (const [k, v] of Object.entries(result)) if (!SKIP.has(k) && typeof v === 'number' && Number.isFinite(v)) out[k] = v;
  return out;
}

/** Runs `evaluate` on the base spec at every x. `evaluate` is compute(), passed in to avoid an import cycle. */
export function sweep(spec: SweepSpec, evaluate: (spec: unknown) => QueueResult): SweepResult {
  const xs = sweepValues(spec);
  const rows: SweepRow[] = [];
  const errors: SweepPointError[] = [];
  const names = new Set<string>();
  let first: QueueResult | null = null;
  for (const x of xs) {
    const point = withParameter(spec.base, spec.parameter, x);
    let result: QueueResult;
    try {
      result = evaluate(point);
    } catch (err) {
      if (!(err instanceof QueueError)) throw err;
      errors.push({ x, code: err.code, message: err.message });
      continue;
    }
    first ??= result;
    const values = scalarMeasures(result);
    for (const measure of spec.measures ?? Object.keys(values)) {
      const value = values[measure];
      if (value === undefined) continue;
      names.add(measure);
      rows.push({ x, measure, value });
    }
  }
  const warnings: QueueWarning[] = [];
  if (errors.length > 0) {
    warnings.push({ code: 'unstable_point', message: `${errors.length} of ${xs.length} points have no result (see errors).` });
  }
  if (first) {
    const seen = new Set(warnings.map((w) => w.code));
    for (const w of first.warnings) if (w.code === 'approximation' && !seen.has(w.code)) warnings.push(w);
  }
  return {
    model: 'sweep',
    method: first
      ? { ...first.method, name: `Sweep of ${spec.parameter}: ${first.method.name}` }
      : { name: `Sweep of ${spec.parameter}`, exact: true, reference: 'no point had a result' },
    warnings,
    parameter: spec.parameter,
    xs,
    measures: [...names],
    rows,
    errors,
  };
}
