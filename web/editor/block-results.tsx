import type { ReactNode } from 'react';
import { MODEL_CATALOG } from '#shared/queue/index';
import type { BlockConfig, StudyBlockResult } from '#shared/schemas/model-block';
import type { TimeUnit } from '#shared/units/units';
import { DURATION_WORDS } from './format-measure';
import { BlockChart } from './block-chart';
import type { ChartRow } from './chart-spec';
import { IntervalTable } from './interval-table';
import { methodOf, ResultNotes, warningsOf } from './result-notes';
import { resultRows, type ResultColumn } from './result-rows';
import { ResultsTable } from './results-table';

export type BlockOutcome = Pick<StudyBlockResult, 'status' | 'result' | 'error' | 'scenarios' | 'chart'>;

interface BlockResultsProps {
  config: BlockConfig;
  outcome: BlockOutcome | null;
  /** Computed in the browser and not yet confirmed by the server. */
  preview: boolean;
  /** Room for a later server-side simulation cross-check of this block. */
  crossCheck?: ReactNode;
}

export const modelLabel = (model: string) => MODEL_CATALOG.find((m) => m.model === model)?.label ?? model;

/** The label of the input a chart varies, with its unit for its axis (“Arrival rate λ (per hour)”). */
export function inputLabel(model: string, name: string, timeUnit?: TimeUnit): string {
  const field = MODEL_CATALOG.find((m) => m.model === model)?.inputs.find((f) => f.name === name);
  if (!field) return name;
  if (timeUnit && (field.kind === 'rate' || field.kind === 'cost')) return `${field.label} (per ${timeUnit})`;
  if (timeUnit && field.kind === 'duration') return `${field.label} (${DURATION_WORDS[timeUnit]})`;
  return field.label;
}

/**
 * What a block says in the report: the results table (one column per option when options are
 * compared), the method and whether it is exact, the cautions, the chart. Shared by the editor's
 * block view and the reading view; it holds no editing controls.
 */
export function BlockResults({ config, outcome, preview, crossCheck }: BlockResultsProps) {
  const model = config.spec.model;
  const criterion = config.spec.criterion;
  if (!outcome) return <p className="font-sans text-sm text-ink-faint">Not computed yet: the server computes this block when the study is saved.</p>;

  const result = outcome.status === 'ok' ? outcome.result : null;
  const columns: ResultColumn[] = [{ label: outcome.scenarios.length ? 'Base' : 'Result', result }, ...outcome.scenarios.map((s) => ({ label: s.label, result: s.result }))];
  const rows = resultRows(model, columns, config.timeUnit, config.shownMeasures, criterion);
  const warnings = [
    ...warningsOf(result).map((w) => ({ message: w.message })),
    ...outcome.scenarios.flatMap((s) => [
      ...warningsOf(s.result).map((w) => ({ label: s.label, message: w.message })),
      ...(s.error ? [{ label: s.label, message: `no result — ${s.error.message}` }] : []),
    ]),
  ];
  const sweepRows = result?.model === 'sweep' ? (result.rows as ChartRow[]) : null;
  const chartRows = outcome.chart ?? sweepRows;
  const chartParameter = config.chart?.parameter ?? String((result as { parameter?: unknown } | null)?.parameter ?? '');
  const chartModel = model === 'sweep' ? String((config.spec.base as { model?: unknown } | undefined)?.model ?? '') : model;
  const intervals = model === 'interval-staffing' && Array.isArray(result?.intervals) ? (result.intervals as Parameters<typeof IntervalTable>[0]['intervals']) : null;

  return (
    <div aria-live="polite">
      {preview && (
        <p className="mb-2 inline-block rounded-full bg-quiet-tint px-2.5 py-0.5 font-sans text-xs font-semibold text-quiet">
          Preview — not yet confirmed by the server
        </p>
      )}
      {outcome.status === 'error' && outcome.error && (
        <p role="alert" className="mb-3 rounded-md border border-danger/40 bg-danger-tint px-3 py-2 font-sans text-sm text-danger">
          {outcome.scenarios.length ? 'No result for the base case' : 'No result'}: {outcome.error.message}
        </p>
      )}
      {/* Options may still have answers when the base case has none. */}
      {rows.length > 0 && columns.some((c) => c.result) && <ResultsTable caption={config.title || modelLabel(model)} columns={columns.map((c) => c.label)} rows={rows} />}
      {intervals && <IntervalTable intervals={intervals} timeUnit={config.timeUnit} criterion={criterion} />}
      {(result || warnings.length > 0) && <ResultNotes method={methodOf(result)} warnings={warnings} />}
      {chartRows && chartRows.length > 0 && (
        <BlockChart
          rows={chartRows}
          model={chartModel}
          parameter={chartParameter}
          parameterLabel={inputLabel(chartModel, chartParameter, config.timeUnit)}
          timeUnit={config.timeUnit}
          criterion={criterion}
          description={`Chart of ${chartRows.length} points against ${inputLabel(chartModel, chartParameter)}`}
        />
      )}
      {crossCheck}
    </div>
  );
}
