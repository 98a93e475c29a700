import { diffWords } from 'diff';
import type { MovedNumber, RevisionComparison, SectionChange } from '../../../shared/schemas/revisions';
import { movedMeasures } from '../studies/moved-numbers';
import type { RevisionRow } from './revision-access';
import { blockTitles, sectionOutline, type Section } from './section-outline';

const keyOf = (s: Section, i: number): string => s.sectionId ?? `untitled-${i === 0 ? 'opening' : i}`;

function sectionChanges(from: Section[], to: Section[]): SectionChange[] {
  const before = new Map(from.map((s, i) => [keyOf(s, i), s]));
  const seen = new Set<string>();
  const out: SectionChange[] = to.map((s, i) => {
    const k = keyOf(s, i);
    seen.add(k);
    const old = before.get(k);
    const full = s.title ? `${s.title}\n${s.text}` : s.text;
    if (!old) return { sectionId: s.sectionId, title: s.title, change: 'added', parts: [{ kind: 'added', text: full }] };
    const was = old.title ? `${old.title}\n${old.text}` : old.text;
    if (was === full) return { sectionId: s.sectionId, title: s.title, change: 'unchanged', parts: [{ kind: 'same', text: full }] };
    const parts = diffWords(was, full).map((p) => ({ kind: p.added ? ('added' as const) : p.removed ? ('removed' as const) : ('same' as const), text: p.value }));
    return { sectionId: s.sectionId, title: s.title, change: 'changed', parts };
  });
  from.forEach((s, i) => {
    if (!seen.has(keyOf(s, i))) out.push({ sectionId: s.sectionId, title: s.title, change: 'removed', parts: [{ kind: 'removed', text: s.title ? `${s.title}\n${s.text}` : s.text }] });
  });
  return out;
}

function movedNumbers(from: RevisionRow, to: RevisionRow, titles: Map<string, string>): MovedNumber[] {
  const out: MovedNumber[] = [];
  for (const [blockId, after] of Object.entries(to.snapshot.blocks)) {
    const before = from.snapshot.blocks[blockId];
    if (!before) continue;
    for (const m of movedMeasures(before, after)) {
      const change = m.before !== null && m.after !== null ? m.after - m.before : null;
      out.push({
        blockId,
        blockTitle: titles.get(blockId) ?? blockId,
        measure: m.measure,
        before: m.before,
        after: m.after,
        change,
        relativeChange: change !== null && m.before !== 0 && m.before !== null ? change / Math.abs(m.before) : null,
      });
    }
  }
  return out;
}

/**
 * What changed from revision `from` to revision `to`: a word-level diff of each section's plain
 * text (sections matched by their stable sectionId), every numeric model output that moved, and
 * the model blocks added or removed.
 */
export function compareRevisions(from: RevisionRow, to: RevisionRow): RevisionComparison {
  const titlesTo = blockTitles(to.snapshot.document);
  const titlesFrom = blockTitles(from.snapshot.document);
  const fromIds = Object.keys(from.snapshot.blocks);
  const toIds = Object.keys(to.snapshot.blocks);
  return {
    from: { id: from.id, number: from.number, status: from.status },
    to: { id: to.id, number: to.number, status: to.status },
    sections: sectionChanges(sectionOutline(from.snapshot.document), sectionOutline(to.snapshot.document)),
    movedNumbers: movedNumbers(from, to, titlesTo),
    addedBlocks: toIds.filter((id) => !(id in from.snapshot.blocks)).map((blockId) => ({ blockId, title: titlesTo.get(blockId) ?? blockId })),
    removedBlocks: fromIds.filter((id) => !(id in to.snapshot.blocks)).map((blockId) => ({ blockId, title: titlesFrom.get(blockId) ?? blockId })),
  };
}
