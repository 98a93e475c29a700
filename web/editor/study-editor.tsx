import { useEffect, useRef } from 'react';
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
  const editor = useEditor({
    extensions: [...studyExtensions({ modelBlock: ModelBlockWithView }), StudyIds],
    content: initialContent,
    editable,
    shouldRerenderOnTransaction: false,
    editorProps: {
      attributes: { class: 'study-text', 'aria-label': 'Study text', 'aria-multiline': 'true', role: 'textbox' },
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
        <EditorContent editor={editor} className="px-8 py-8 sm:px-12" />
      </div>
    </div>
  );
}
