import { useEffect, useId, useRef, type KeyboardEvent } from 'react';
import { EditorContent, useEditor, type JSONContent } from '@tiptap/react';
import { studyExtensions } from '#shared/editor/study-extensions';
import { EditorToolbar } from './editor-toolbar';
import { ModelBlockWithView } from './model-block-node';
import { StudyIds } from './study-ids';
import { StudyOutline } from './study-outline';

interface StudyEditorProps {
  initialContent: JSONContent;
  editable: boolean;
  /** Every change of the document (typing, a block's settings). */
  onChange: (doc: JSONContent) => void;
  /** Leaving the text: the screen saves at once rather than after the pause. */
  onBlur: () => void;
}

/**
 * The study as the author writes it: the outline of sections beside the text, the writing tools
 * above it, model blocks inside it. The extension list is the shared one the server validates
 * against, with the model block's React view and the id keeper added.
 */
export function StudyEditor({ initialContent, editable, onChange, onBlur }: StudyEditorProps) {
  // The editor keeps the callbacks it was created with; refs let it always call the latest ones.
  const handlers = useRef({ onChange, onBlur });
  useEffect(() => {
    handlers.current = { onChange, onBlur };
  }, [onChange, onBlur]);
  const hintId = useId();
  // Tab belongs to the text while in a table (next cell) or a list (indent); Escape, then Tab,
  // lets the browser move focus on, so the text is never a keyboard trap.
  const leaving = useRef(false);
  const keyDownCapture = (e: KeyboardEvent) => {
    if (!(e.target instanceof HTMLElement) || !e.target.classList.contains('ProseMirror')) return;
    if (e.key === 'Escape') leaving.current = true;
    else if (e.key === 'Tab' && leaving.current) {
      leaving.current = false;
      // Stopped before the editor sees it: the browser's own Tab moves focus out of the text.
      e.stopPropagation();
    } else if (e.key !== 'Shift') leaving.current = false;
  };
  const editor = useEditor({
    extensions: [...studyExtensions({ modelBlock: ModelBlockWithView }), StudyIds],
    content: initialContent,
    editable,
    shouldRerenderOnTransaction: false,
    editorProps: {
      attributes: { class: 'study-text', 'aria-label': 'Study text', 'aria-multiline': 'true', role: 'textbox', 'aria-describedby': hintId },
    },
    onUpdate: ({ editor: e }) => handlers.current.onChange(e.getJSON()),
    onBlur: () => handlers.current.onBlur(),
  });

  return (
    <div className="grid gap-8 lg:grid-cols-[13rem_minmax(0,1fr)]">
      <aside className="lg:sticky lg:top-4 lg:self-start">
        <StudyOutline editor={editor} />
      </aside>
      <div className="rounded-lg border border-rule bg-sheet">
        {editable && <EditorToolbar editor={editor} />}
        <p id={hintId} className="sr-only">
          In a table Tab moves to the next cell, in a list it indents. Press Escape, then Tab, to leave the text.
        </p>
        <EditorContent editor={editor} className="px-8 py-8 sm:px-12" onKeyDownCapture={keyDownCapture} />
      </div>
    </div>
  );
}
