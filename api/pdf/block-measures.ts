/**
 * The rows of a model block's table: which measures, their labels and kinds (from the engine's
 * catalog) and one value per column (the base case, then each scenario).
 */
import { MODEL_CATALOG, type MeasureField } from '../../shared/queue/catalog';
import type { BlockConfig, StudyBlockResult } from '../../shared/schemas/model-block';
import type { MeasureKind } from './measure-format';

export interface MeasureRow {
  name: string;
  label: string;
  kind: MeasureKind;
  values: (number | null)[];
}

export interface DistributionRow {
  label: string;
  values: number[];
}

type Result = Record<string, unknown>;

const catalogEntry = (model: unknown) => MODEL_CATALOG.find((e) => e.model === model);
const MMC = catalogEntry('M/M/c');

/** Solvers report the chosen count at the top and the queue's measures underneath. */
const SOLVER_DETAIL = ['Wq', 'serviceLevel', 'probWait', 'probAbandon', 'probBlock'];

/** Flattens a result so every measure is a top-level key. */
function measuresOf(result: Result | null): Result {
  if (!result) return {};
  const nested = typeof result.measures === 'object' && result.measures !== null && !Array.isArray(result.measures) ? (result.measures as Result) : {};
  return { ...nested, ...result };
}

function kindOf(field: MeasureField | undefined, name: string, result: Result): MeasureKind {
  if (name === 'rho' || name === 'serverUtilization') return 'percent-ratio';
  if (name === 'achieved') {
    const criterion = result.criterion;
    if (criterion === 'meanWait') return 'duration';
    if (criterion === 'utilization') return 'percent-ratio';
    return 'probability';
  }
  return field?.kind ?? 'count';
}

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/**
 * Table rows of a block: the measures the author chose (or the model's own), kept where at
 * least one column has a number. Columns are the base case followed by each scenario.
 */
export function blockMeasureRows(config: BlockConfig | null, block: StudyBlockResult): { columns: string[]; rows: MeasureRow[]; distributions: DistributionRow[] } {
  const base = measuresOf(block.result);
  const results = [base, ...block.scenarios.map((s) => measuresOf(s.result))];
  const columns = block.scenarios.length > 0 ? ['Base case', ...block.scenarios.map((s) => s.label)] : ['Value'];
  const model = block.result?.model ?? config?.spec.model;
  const entry = catalogEntry(model);
  const fields = entry?.measures ?? [];
  const isSolver = model === 'staffing' || model === 'cost-optimum';
  const names = config?.shownMeasures?.length
    ? config.shownMeasures
    : [...fields.map((f) => f.name), ...(isSolver ? SOLVER_DETAIL : [])];
  const rows: MeasureRow[] = [];
  const distributions: DistributionRow[] = [];
  for (const name of [...new Set(names)]) {
    const field = fields.find((f) => f.name === name) ?? MMC?.measures.find((f) => f.name === name);
    const label = field?.label ?? name;
    if (Array.isArray(base[name])) {
      // Distributions print only when asked for: they can have hundreds of entries.
      if (config?.shownMeasures?.includes(name)) distributions.push({ label, values: (base[name] as unknown[]).map((v) => Number(v)) });
      continue;
    }
    const values = results.map((r) => num(r[name]));
    if (values.every((v) => v === null)) continue;
    rows.push({ name, label, kind: kindOf(field, name, block.result ?? {}), values });
  }
  return { columns, rows, distributions };
}

/** The block's scalar inputs as "label value" pairs (what the engine actually ran). */
export function blockInputs(block: StudyBlockResult): { label: string; kind: string; value: number | string }[] {
  const spec = block.resolvedSpec;
  if (!spec) return [];
  const entry = catalogEntry(spec.model);
  const out: { label: string; kind: string; value: number | string }[] = [];
  for (const field of entry?.inputs ?? []) {
    const v = spec[field.name];
    if (typeof v === 'number' && Number.isFinite(v)) out.push({ label: field.label, kind: field.kind, value: v });
    else if (typeof v === 'string' && field.kind === 'choice') out.push({ label: field.label, kind: field.kind, value: v });
    else if (Array.isArray(v) && v.length > 0 && v.every((x) => typeof x === 'number')) out.push({ label: field.label, kind: field.kind, value: `${v.length} values` });
  }
  return out;
}

/** The catalog's label of a model ("M/M/c — Erlang C"), or its name. */
export const modelLabel = (model: unknown): string => catalogEntry(model)?.label ?? String(model ?? 'unknown model');
