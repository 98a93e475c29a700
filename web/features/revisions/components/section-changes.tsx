import type { SectionChange } from '#shared/schemas/revisions';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const CHANGE_LOOK: Record<SectionChange['change'], { tone: StatusTone; word: string }> = {
  added: { tone: 'ok', word: 'New section' },
  removed: { tone: 'danger', word: 'Section removed' },
  changed: { tone: 'accent', word: 'Text changed' },
  unchanged: { tone: 'quiet', word: 'No change' },
};

/**
 * One section's word-level changes. Insertions and deletions are real <ins>/<del> elements
 * (underlined / struck through, with hidden words for screen readers), so colour is never the
 * only sign.
 */
export function SectionChanges({ section }: { section: SectionChange }) {
  const look = CHANGE_LOOK[section.change];
  return (
    <section aria-label={`Section ${section.title || 'without a title'}: ${look.word.toLowerCase()}`} className="border-b border-rule pb-6 last:border-b-0">
      <div className="mb-2 flex flex-wrap items-baseline gap-3">
        <h3 className="font-serif text-lg font-bold">{section.title || <span className="text-ink-faint italic">Before the first heading</span>}</h3>
        <StatusBadge tone={look.tone}>{look.word}</StatusBadge>
      </div>
      {section.change === 'unchanged' ? null : (
        <p className="font-serif leading-relaxed whitespace-pre-line">
          {section.parts.map((part, i) => {
            if (part.kind === 'added') {
              return (
                <ins key={i} className="bg-ok-tint text-ok decoration-2 underline-offset-2">
                  <span className="sr-only">[added: </span>
                  {part.text}
                  <span className="sr-only">]</span>
                </ins>
              );
            }
            if (part.kind === 'removed') {
              return (
                <del key={i} className="mr-0.5 bg-danger-tint text-danger decoration-2">
                  <span className="sr-only">[removed: </span>
                  {part.text}
                  <span className="sr-only">]</span>
                </del>
              );
            }
            return <span key={i}>{part.text}</span>;
          })}
        </p>
      )}
    </section>
  );
}
