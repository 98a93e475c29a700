import { MODEL_CATALOG, type MeasureField } from '#shared/queue/index';
import type { TimeUnit } from '#shared/units/units';
import { alignDecimals } from './decimal-align';
import { formatList, formatMeasureRow, type MeasureKind } from './format-measure';

/** One column of a results table: the block's own result or one scenario's. */
export interface ResultColumn {
  label: string;
  result: Record<string, unknown> | null;
}

export interface ResultRow {
  name: string;
  label: string;
  unit: string;
  cells: string[];
  /** Lists (distributions, per-node values) are not decimal-aligned. */
  list: boolean;
}

/** Measures of the underlying queue that solvers report under `measures`. */
const NESTED = MODEL_CATALOG.find((m) => m.model === 'M/M/c+M')?.measures ?? [];

/** The measures a block of this model can show, with staffing's "achieved" typed by its criterion. */
export function measuresFor(model: string, criterion?: unknown): MeasureField[] {
  const own = MODEL_CATALOG.find((m) => m.model === model)?.measures ?? [];
  const typed = own.map((m): MeasureField => {
    if (m.name !== 'achieved') return m;
    const kind: MeasureKind = criterion === 'meanWait' ? 'duration' : 'probability';
    return { ...m, kind, label: achievedLabel(criterion) };
  });
  if (model !== 'staffing' && model !== 'cost-optimum') return typed;
  const names = new Set(typed.map((m) => m.name));
  return [...typed, ...NESTED.filter((m) => !names.has(m.name) && m.kind !== 'distribution')];
}

function achievedLabel(criterion: unknown): string {
  switch (criterion) {
    case 'serviceLevel':
      return 'Achieved service level';
    case 'meanWait':
      return 'Achieved mean wait';
    case 'blocking':
      return 'Achieved blocking probability';
    case 'abandonment':
      return 'Achieved abandonment probability';
    case 'utilization':
      return 'Achieved utilisation';
    default:
      return 'Achieved';
  }
}

/** A measure's value: on the result itself, or (for solvers) in its `measures`. */
export function measureValue(result: Record<string, unknown> | null, name: string): unknown {
  if (!result) return undefined;
  if (name in result) return result[name];
  const nested = result.measures;
  return nested && typeof nested === 'object' ? (nested as Record<string, unknown>)[name] : undefined;
}

/**
 * The rows of a block's results table. Each row is one measure in one unit across all columns;
 * rows with no value anywhere are left out unless the author chose them. Numeric cells of every
 * column are padded so their decimal points line up.
 */
export function resultRows(model: string, columns: readonly ResultColumn[], timeUnit: TimeUnit, shown?: readonly string[], criterion?: unknown): ResultRow[] {
  const all = measuresFor(model, criterion);
  const chosen = shown && shown.length ? shown.map((n) => all.find((m) => m.name === n)).filter((m): m is MeasureField => !!m) : all;
  const rows: ResultRow[] = [];
  for (const m of chosen) {
    const values = columns.map((c) => measureValue(c.result, m.name));
    if (m.kind === 'distribution' || values.some(Array.isArray)) {
      if (!values.some((v) => Array.isArray(v) && v.length > 0)) continue;
      rows.push({ name: m.name, label: m.label, unit: '', cells: values.map((v) => (Array.isArray(v) ? formatList(v as number[]) : '—')), list: true });
      continue;
    }
    const nums = values.map((v) => (typeof v === 'number' ? v : null));
    if (!shown?.length && nums.every((v) => v === null)) continue;
    const { unit, texts } = formatMeasureRow(m.name, m.kind, nums, timeUnit);
    rows.push({ name: m.name, label: m.label, unit, cells: texts, list: false });
  }
  // Align per column, over the numeric rows only.
  const numeric = rows.filter((r) => !r.list);
  columns.forEach((_, ci) => {
    const aligned = alignDecimals(numeric.map((r) => r.cells[ci]));
    numeric.forEach((r, ri) => (r.cells[ci] = aligned[ri]));
  });
  return rows;
}
