import { compute, ENGINE_VERSION, QueueError, type SweepResult } from '../../../shared/queue/index';
import type { BlockConfig, ChartConfig, StudyBlockResult } from '../../../shared/schemas/model-block';
import { jsonSafe } from './json-safe';
import { linkCautions } from './link-cautions';
import { resolveSpec, type Register, type ResolvedSpec } from './resolve-spec';

type Outcome = { result: Record<string, unknown>; error: null } | { result: null; error: { code: string; message: string; issues: { path: string; message: string }[] } };

/** Runs the engine on a resolved spec; engine refusals become the outcome's error, never a throw. */
function run(resolved: ResolvedSpec): Outcome {
  if (resolved.issues.length > 0) {
    return { result: null, error: { code: 'invalid_input', message: resolved.issues.map((i) => i.message).join('; '), issues: resolved.issues } };
  }
  try {
    return { result: jsonSafe(compute(resolved.spec)) as unknown as Record<string, unknown>, error: null };
  } catch (err) {
    if (!(err instanceof QueueError)) throw err;
    return { result: null, error: { code: err.code, message: err.message, issues: err.issues } };
  }
}

/** Long-format rows for the block's chart; points without a result get null values (a gap). */
function chartRows(spec: Record<string, unknown>, chart: ChartConfig): StudyBlockResult['chart'] {
  try {
    const sweep = compute({ model: 'sweep', base: spec, parameter: chart.parameter, from: chart.from, to: chart.to, steps: chart.steps, measures: chart.measures }) as SweepResult;
    const rows: NonNullable<StudyBlockResult['chart']> = sweep.rows.map((r) => ({ x: r.x, measure: r.measure, value: Number.isFinite(r.value) ? r.value : null }));
    for (const e of sweep.errors) for (const measure of chart.measures) rows.push({ x: e.x, measure, value: null });
    return rows.sort((a, b) => a.x - b.x);
  } catch (err) {
    if (err instanceof QueueError) return null;
    throw err;
  }
}

/**
 * Everything the server computes for one model block: links resolved into the block's units,
 * the engine's result or error, each scenario (the spec with its overrides) and the chart rows.
 * Pure and synchronous, so a save computes every block before its transaction opens.
 */
export function computeBlock(blockId: string, config: BlockConfig, register: Register, computedAt = new Date()): StudyBlockResult {
  const base = resolveSpec(config.spec, config.timeUnit, register);
  const main = run(base);
  const cautions = main.result ? linkCautions(config.spec, register) : [];
  if (cautions.length > 0) {
    const own = Array.isArray(main.result!.warnings) ? main.result!.warnings : [];
    main.result = { ...main.result, warnings: [...own, ...cautions] };
  }
  const ids = new Set(base.assumptionIds);
  const scenarios = config.scenarios.map((s) => {
    const resolved = resolveSpec({ ...config.spec, ...s.overrides, model: config.spec.model }, config.timeUnit, register);
    for (const id of resolved.assumptionIds) ids.add(id);
    const out = run(resolved);
    return { label: s.label, result: out.result, error: out.error && { code: out.error.code, message: out.error.message } };
  });
  return {
    blockId,
    status: main.error ? 'error' : 'ok',
    resolvedSpec: base.issues.length > 0 ? null : jsonSafe(base.spec),
    result: main.result,
    error: main.error,
    scenarios,
    chart: config.chart && !main.error ? chartRows(base.spec, config.chart) : null,
    assumptionIds: [...ids].sort((a, b) => a - b),
    engineVersion: ENGINE_VERSION,
    computedAt: computedAt.toISOString(),
  };
}
