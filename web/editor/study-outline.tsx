import { useEditorState, type Editor } from '@tiptap/react';

interface Heading {
  pos: number;
  level: number;
  text: string;
}

/**
 * The study's sections beside the text. Each entry is a button: it moves the cursor to the
 * heading and scrolls it into view, so the outline works by keyboard as well as by mouse.
 */
export function StudyOutline({ editor }: { editor: Editor }) {
  const headings = useEditorState({
    editor,
    selector: ({ editor: e }) => {
      const out: Heading[] = [];
      e.state.doc.forEach((node, pos) => {
        if (node.type.name === 'heading') out.push({ pos, level: Number(node.attrs.level), text: node.textContent.trim() });
      });
      return out;
    },
    equalityFn: (a, b) => JSON.stringify(a) === JSON.stringify(b),
  });

  const jump = (pos: number) => {
    editor.chain().focus().setTextSelection(pos + 1).run();
    const dom = editor.view.nodeDOM(pos);
    if (dom instanceof HTMLElement) dom.scrollIntoView({ block: 'start', behavior: 'smooth' });
  };

  return (
    <nav aria-label="Sections of this study" className="font-sans text-sm">
      <p className="mb-2 text-xs font-semibold tracking-widest text-ink-faint uppercase">Sections</p>
      {headings.length === 0 ? (
        <p className="text-ink-faint">Headings you add appear here.</p>
      ) : (
        <ol className="space-y-0.5">
          {headings.map((h) => (
            <li key={h.pos} style={{ paddingLeft: `${(h.level - 1) * 0.75}rem` }}>
              <button type="button" onClick={() => jump(h.pos)} className="w-full rounded px-2 py-1 text-left text-ink-soft hover:bg-quiet-tint hover:text-ink">
                {h.text || <span className="italic text-ink-faint">Untitled section</span>}
              </button>
            </li>
          ))}
        </ol>
      )}
    </nav>
  );
}
