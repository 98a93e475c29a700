import { compute, inputKind, MODEL_CATALOG, QueueError } from '#shared/queue/index';
import type { Assumption } from '#shared/schemas/assumptions';
import { isAssumptionLink, type BlockConfig, type StudyBlockResult } from '#shared/schemas/model-block';
import { toFieldValue, type TimeUnit } from '#shared/units/units';

type Issue = { path: string; message: string };
type Outcome = Pick<StudyBlockResult, 'status' | 'resolvedSpec' | 'result' | 'error' | 'scenarios' | 'chart'>;

/** The catalog kind of an input, with a solver's `target` typed by its criterion. */
export function fieldKind(model: string, name: string, criterion?: unknown): string {
  return inputKind({ name, kind: MODEL_CATALOG.find((m) => m.model === model)?.inputs.find((f) => f.name === name)?.kind ?? 'number' }, criterion);
}

/**
 * Replaces links to assumptions with their values in the block's time unit, as the server does,
 * so the browser can preview. Unknown assumptions or units that cannot meet become issues on
 * the input that holds the link.
 */
export function resolveLinks(spec: Record<string, unknown>, timeUnit: TimeUnit, assumptions: readonly Assumption[]): { spec: Record<string, unknown>; issues: Issue[] } {
  const out: Record<string, unknown> = {};
  const issues: Issue[] = [];
  for (const [name, value] of Object.entries(spec)) {
    if (!isAssumptionLink(value)) {
      out[name] = value;
      continue;
    }
    const a = assumptions.find((x) => x.id === value.assumption);
    if (!a) {
      issues.push({ path: name, message: 'is linked to an assumption that is not in this engagement’s register' });
      continue;
    }
    const v = toFieldValue(a.value, a.unit, fieldKind(String(spec.model), name, spec.criterion), timeUnit);
    if (v === null) issues.push({ path: name, message: `cannot use “${a.name}”: its unit does not fit this input` });
    else out[name] = v;
  }
  return { spec: out, issues };
}

function errorOf(err: unknown): NonNullable<Outcome['error']> {
  if (err instanceof QueueError) return { code: err.code, message: err.message, issues: err.issues };
  return { code: 'internal', message: err instanceof Error ? err.message : 'The calculation failed.', issues: [] };
}

function run(spec: Record<string, unknown>, timeUnit: TimeUnit, assumptions: readonly Assumption[]) {
  const resolved = resolveLinks(spec, timeUnit, assumptions);
  if (resolved.issues.length) {
    const first = resolved.issues[0];
    return { resolved: null, result: null, error: { code: 'invalid_input', message: `${first.path}: ${first.message}`, issues: resolved.issues } };
  }
  try {
    return { resolved: resolved.spec, result: compute(resolved.spec) as unknown as Record<string, unknown>, error: null };
  } catch (err) {
    return { resolved: resolved.spec, result: null, error: errorOf(err) };
  }
}

/**
 * What the server would answer for this block, computed in the browser with the same engine:
 * the base result, each scenario (base spec with its overrides) and the chart's sweep rows.
 * Shown as a preview only, until the server's own result arrives.
 */
export function previewBlock(config: BlockConfig, assumptions: readonly Assumption[]): Outcome {
  const base = run(config.spec, config.timeUnit, assumptions);
  const scenarios = config.scenarios.map((s) => {
    const r = run({ ...config.spec, ...s.overrides }, config.timeUnit, assumptions);
    return { label: s.label, result: r.result, error: r.error ? { code: r.error.code, message: r.error.message } : null };
  });
  let chart: Outcome['chart'] = null;
  if (config.chart && base.resolved && config.spec.model !== 'sweep') {
    try {
      const { parameter, from, to, steps, measures } = config.chart;
      const sweep = compute({ model: 'sweep', base: base.resolved, parameter, from, to, steps, measures });
      if ('rows' in sweep) chart = sweep.rows;
    } catch {
      // A chart that cannot be drawn leaves the table as it is; the panel names the problem.
      chart = null;
    }
  }
  return { status: base.error ? 'error' : 'ok', resolvedSpec: base.resolved, result: base.result, error: base.error, scenarios, chart };
}
