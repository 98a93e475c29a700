/**
 * Back matter: the assumptions the revision froze (value, unit, source, owner, notes) and the
 * method notes — every published formula the blocks used, whether exact or an approximation,
 * with its reference and the blocks that used it.
 */
import type { Content } from 'pdfmake/interfaces';
import type { StudyBlockResult } from '../../shared/schemas/model-block';
import type { FrozenAssumption } from '../../shared/schemas/revisions';
import { UNIT_INFO } from '../../shared/units/units';
import { sans, txt } from './inline-text';
import { formatRow } from './measure-format';
import { numberTable } from './number-table';
import { COLOURS } from './pdf-theme';

const h1 = (text: string): Content => ({ text, style: 'h1', tocItem: true, tocStyle: { bold: true }, tocMargin: [0, 5, 0, 0], headlineLevel: 1 }) as Content;

export function assumptionsAppendix(assumptions: FrozenAssumption[]): Content[] {
  const out: Content[] = [{ ...(h1('Appendix: assumptions') as object), pageBreak: 'before' } as Content];
  if (assumptions.length === 0) return [...out, txt('This revision uses no assumptions from the register.', { style: 'paragraph' })];
  out.push(txt('Every value from the engagement’s assumption register that this revision used, as frozen at submission.', { style: 'paragraph' }));
  const rows = assumptions.map((a) => {
    const value = formatRow('count', [a.value], 'hour').cells[0];
    const name: Content = { stack: [txt(a.name, { fontSize: 9 }), ...(a.notes ? [txt(a.notes, { fontSize: 7.5, color: COLOURS.muted, margin: [0, 1, 0, 0] })] : [])] };
    const source: Content = { stack: [sans(a.sourceKind, { fontSize: 7.5, bold: true }), txt(a.sourceDetail, { fontSize: 8 })] };
    return [{ content: name }, value, UNIT_INFO[a.unit]?.label ?? a.unit, { content: source }, a.ownerName ?? '—'];
  });
  out.push(
    numberTable(
      [
        { header: 'Assumption', kind: 'text', width: '*' },
        { header: 'Value', kind: 'number' },
        { header: 'Unit', kind: 'text', width: 55 },
        { header: 'Source', kind: 'text', width: 130 },
        { header: 'Owner', kind: 'text', width: 60 },
      ],
      rows,
      { fontSize: 8.5 },
    ),
  );
  return out;
}

interface MethodUse {
  name: string;
  exact: boolean;
  reference: string;
  note: string | null;
  blocks: string[];
}

/** Distinct methods over all block and scenario results, in order of first use. */
export function collectMethods(blocks: { title: string; result: StudyBlockResult }[]): MethodUse[] {
  const byKey = new Map<string, MethodUse>();
  for (const { title, result } of blocks) {
    for (const r of [result.result, ...result.scenarios.map((s) => s.result)]) {
      const m = r?.method as { name?: unknown; exact?: unknown; reference?: unknown; note?: unknown } | undefined;
      if (!m || typeof m.name !== 'string') continue;
      const exact = m.exact === true;
      const reference = typeof m.reference === 'string' ? m.reference : '';
      const key = `${m.name}|${reference}|${exact}`;
      const use = byKey.get(key) ?? { name: m.name, exact, reference, note: typeof m.note === 'string' ? m.note : null, blocks: [] };
      if (!use.blocks.includes(title)) use.blocks.push(title);
      byKey.set(key, use);
    }
  }
  return [...byKey.values()];
}

export function methodNotes(methods: MethodUse[]): Content[] {
  const out: Content[] = [h1('Method notes')];
  if (methods.length === 0) return [...out, txt('No model block of this revision produced a result.', { style: 'paragraph' })];
  out.push(txt('The published formulas behind the figures of this study. “Exact” means exact for the model as stated; an approximation is marked as such.', { style: 'paragraph' }));
  for (const m of methods) {
    out.push({
      stack: [
        txt(m.name, { bold: true, fontSize: 10 }),
        sans(m.exact ? 'Exact' : 'Approximation', { fontSize: 8, bold: true, color: m.exact ? COLOURS.accent : COLOURS.warning, margin: [0, 1, 0, 1] }),
        ...(m.reference ? [txt(`Reference: ${m.reference}`, { fontSize: 9 })] : []),
        ...(m.note ? [txt(m.note, { fontSize: 9, italics: true })] : []),
        sans(`Used in: ${m.blocks.join('; ')}`, { fontSize: 8, color: COLOURS.muted, margin: [0, 1, 0, 0] }),
      ],
      unbreakable: true,
      margin: [0, 4, 0, 8],
    } as Content);
  }
  return out;
}
