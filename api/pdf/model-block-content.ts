/**
 * A model block as printed: title, model and method (exact or approximation), the inputs it ran
 * with, a decimal-aligned table of its measures (scenarios side by side), solver option tables,
 * warnings as sentences, errors as such, and its chart.
 */
import type { Content } from 'pdfmake/interfaces';
import type { BlockConfig, StudyBlockResult } from '../../shared/schemas/model-block';
import { blockInputs, blockMeasureRows, modelLabel } from './block-measures';
import { blockOptionTables } from './block-option-tables';
import { sans, txt } from './inline-text';
import { formatRow } from './measure-format';
import { numberTable, type Column } from './number-table';
import { COLOURS } from './pdf-theme';

interface Method {
  name?: unknown;
  exact?: unknown;
}

function inputsLine(config: BlockConfig, block: StudyBlockResult): Content | null {
  const parts = blockInputs(block).map((i) => {
    if (typeof i.value === 'string') return `${i.label}: ${i.value}`;
    const row = formatRow(i.kind === 'duration' ? 'duration' : i.kind === 'rate' ? 'rate' : i.kind === 'probability' ? 'probability' : 'count', [i.value], config.timeUnit);
    return `${i.label}: ${row.cells[0] ?? '—'}${row.unit ? ` ${row.unit}` : ''}`;
  });
  return parts.length > 0 ? sans(`Inputs — ${parts.join(' · ')}`, { fontSize: 7.5, color: COLOURS.muted, margin: [0, 0, 0, 2] }) : null;
}

function warnings(block: StudyBlockResult): Content[] {
  const seen = new Set<string>();
  const out: Content[] = [];
  const collect = (result: Record<string, unknown> | null, scope: string | null) => {
    const list = Array.isArray(result?.warnings) ? (result.warnings as { message?: unknown }[]) : [];
    for (const w of list) {
      const message = String(w.message ?? '');
      if (!message || seen.has(message)) continue;
      seen.add(message);
      out.push(txt(`${scope ? `${scope}: ` : ''}${message}`, { style: 'warning', margin: [0, 1, 0, 1] }));
    }
  };
  collect(block.result, null);
  for (const s of block.scenarios) collect(s.result, s.label);
  if (out.length === 0) return [];
  return [sans('Cautions for this block', { bold: true, fontSize: 7.5, color: COLOURS.warning, margin: [0, 2, 0, 1] }), ...out];
}

function errorContent(block: StudyBlockResult): Content[] {
  const e = block.error;
  const lines: Content[] = [txt(`This block could not be computed: ${e?.message ?? 'no result was stored.'}`, { style: 'error', bold: true })];
  // The engine's message often is its only issue; print issues only when they add something.
  for (const issue of (e?.issues ?? []).filter((i) => i.message !== e?.message)) lines.push(txt(`${issue.path ? `${issue.path}: ` : ''}${issue.message}`, { style: 'error', margin: [10, 1, 0, 0] }));
  return lines;
}

/** Everything a block prints, as one unbreakable-where-possible stack. `svg` is its rendered chart. */
export function modelBlockContent(config: BlockConfig | null, block: StudyBlockResult | undefined, blockId: string, svg: string | null): Content {
  const title = config?.title?.trim() || 'Untitled model block';
  const head: Content[] = [txt(title, { style: 'blockTitle', margin: [0, 0, 0, 2] })];
  if (!block) {
    return { stack: [...head, txt(`No computed result is stored for block ${blockId}.`, { style: 'error' })], margin: [0, 8, 0, 10] };
  }
  const method = (block.result?.method ?? {}) as Method;
  const model = block.result?.model ?? config?.spec.model;
  const methodText = method.name ? ` · method: ${String(method.name)} (${method.exact === true ? 'exact' : 'approximation'})` : '';
  head.push(sans(`${modelLabel(model)}${methodText}`, { fontSize: 8, color: COLOURS.muted, margin: [0, 0, 0, 2] }));
  if (block.status === 'error' || !block.result) return { stack: [...head, ...errorContent(block)], margin: [0, 8, 0, 10] };

  const inputs = config ? inputsLine(config, block) : null;
  const timeUnit = config?.timeUnit ?? 'hour';
  const { columns, rows, distributions } = blockMeasureRows(config, block);
  const tableColumns: Column[] = [{ header: 'Measure', kind: 'text' }, { header: 'Unit', kind: 'text', width: 'auto' }, ...columns.map((c) => ({ header: c, kind: 'number' as const }))];
  const tableRows = rows.map((r) => {
    const f = formatRow(r.kind, r.values, timeUnit);
    return [r.label, f.unit, ...f.cells];
  });
  const body: Content[] = [...head];
  if (inputs) body.push(inputs);
  if (tableRows.length > 0) body.push(numberTable(tableColumns, tableRows));
  for (const d of distributions) {
    const shown = d.values.slice(0, 24).map((v) => formatRow('count', [v], timeUnit).cells[0]).join(', ');
    body.push(txt(`${d.label}: ${shown}${d.values.length > 24 ? `, … (${d.values.length} values)` : ''}`, { fontSize: 8.5, margin: [0, 0, 0, 4] }));
  }
  block.scenarios.forEach((s) => {
    if (s.error) body.push(txt(`Scenario "${s.label}" could not be computed: ${s.error.message}`, { style: 'error' }));
  });
  const optionTables = blockOptionTables(block.result, timeUnit);
  body.push(...warnings(block));
  const chart: Content[] = svg ? [{ svg, width: 440, margin: [0, 6, 0, 2] } as Content] : [];
  // Keep the heading, table and notes together; long option tables and charts may flow on.
  return { stack: [{ stack: body, unbreakable: tableRows.length < 25 }, ...optionTables, ...chart], margin: [0, 8, 0, 12] };
}
