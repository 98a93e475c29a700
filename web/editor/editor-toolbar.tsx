import { useState, type KeyboardEvent } from 'react';
import { useEditorState, type Editor } from '@tiptap/react';
import { inputClass } from '../components/ui/field';
import { blockForModel, newBlockId } from './block-defaults';
import { freshBlocks } from './fresh-blocks';

function ToolButton({ label, active, onClick, disabled }: { label: string; active?: boolean; onClick: () => void; disabled?: boolean }) {
  return (
    <button
      type="button"
      aria-pressed={active}
      disabled={disabled}
      onMouseDown={(e) => e.preventDefault() /* keep the text selection while clicking */}
      onClick={onClick}
      className={`rounded-md px-2.5 py-1.5 text-sm whitespace-nowrap disabled:opacity-50 ${active ? 'bg-accent-tint font-semibold text-accent-strong' : 'text-ink-soft hover:bg-quiet-tint hover:text-ink'}`}
    >
      {label}
    </button>
  );
}

/** Arrow keys, Home and End move between the tools, as a toolbar is expected to; Tab still stops on each. */
function moveAlongToolbar(e: KeyboardEvent<HTMLDivElement>) {
  const step = { ArrowRight: 1, ArrowLeft: -1 }[e.key];
  if (step === undefined && e.key !== 'Home' && e.key !== 'End') return;
  if (!(e.target instanceof HTMLButtonElement)) return; // typing in the link box keeps its keys
  const tools = Array.from(e.currentTarget.querySelectorAll<HTMLButtonElement>('button:not(:disabled)'));
  const at = tools.indexOf(e.target);
  const next = e.key === 'Home' ? 0 : e.key === 'End' ? tools.length - 1 : (at + (step ?? 0) + tools.length) % tools.length;
  e.preventDefault();
  tools[next]?.focus();
}

/** Writing tools above the study: headings, emphasis, lists, tables, links and model blocks. */
export function EditorToolbar({ editor }: { editor: Editor }) {
  const [linking, setLinking] = useState<string | null>(null);
  const state = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      h1: e.isActive('heading', { level: 1 }),
      h2: e.isActive('heading', { level: 2 }),
      bold: e.isActive('bold'),
      italic: e.isActive('italic'),
      bullet: e.isActive('bulletList'),
      ordered: e.isActive('orderedList'),
      table: e.isActive('table'),
      link: e.isActive('link'),
    }),
  });
  const chain = () => editor.chain().focus();

  const insertBlock = () => {
    const blockId = newBlockId();
    freshBlocks.add(blockId);
    chain().insertModelBlock({ blockId, config: blockForModel('M/M/c') }).run();
  };

  const applyLink = (href: string) => {
    const url = href.trim();
    if (url === '') chain().extendMarkRange('link').unsetLink().run();
    else chain().extendMarkRange('link').setLink({ href: /^(https?:|mailto:)/i.test(url) ? url : `https://${url}` }).run();
    setLinking(null);
  };

  return (
    <div role="toolbar" aria-label="Writing tools" onKeyDown={moveAlongToolbar} className="sticky top-0 z-10 flex flex-wrap items-center gap-1 border-b border-rule bg-sheet/95 px-3 py-2 font-sans backdrop-blur">
      <ToolButton label="Section" active={state.h1} onClick={() => chain().toggleHeading({ level: 1 }).run()} />
      <ToolButton label="Subsection" active={state.h2} onClick={() => chain().toggleHeading({ level: 2 }).run()} />
      <span aria-hidden className="mx-1 h-5 w-px bg-rule" />
      <ToolButton label="Bold" active={state.bold} onClick={() => chain().toggleBold().run()} />
      <ToolButton label="Italic" active={state.italic} onClick={() => chain().toggleItalic().run()} />
      <ToolButton label="Bullets" active={state.bullet} onClick={() => chain().toggleBulletList().run()} />
      <ToolButton label="Numbered" active={state.ordered} onClick={() => chain().toggleOrderedList().run()} />
      <span aria-hidden className="mx-1 h-5 w-px bg-rule" />
      {state.table ? (
        <>
          <ToolButton label="Add row" onClick={() => chain().addRowAfter().run()} />
          <ToolButton label="Add column" onClick={() => chain().addColumnAfter().run()} />
          <ToolButton label="Remove table" onClick={() => chain().deleteTable().run()} />
        </>
      ) : (
        <ToolButton label="Table" onClick={() => chain().insertTable({ rows: 3, cols: 3, withHeaderRow: true }).run()} />
      )}
      {linking === null ? (
        <ToolButton label={state.link ? 'Edit link' : 'Link'} active={state.link} onClick={() => setLinking((editor.getAttributes('link').href as string | undefined) ?? '')} />
      ) : (
        <form
          className="flex items-center gap-1"
          onSubmit={(e) => {
            e.preventDefault();
            applyLink(linking);
          }}
        >
          <input
            autoFocus
            aria-label="Link address (empty removes the link)"
            placeholder="https://…"
            className={`${inputClass} w-56 py-1`}
            value={linking}
            onChange={(e) => setLinking(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === 'Escape') {
                setLinking(null);
                editor.commands.focus();
              }
            }}
          />
          <button type="submit" className="rounded-md px-2 py-1 text-sm text-accent hover:bg-accent-tint">
            Apply
          </button>
        </form>
      )}
      <span className="ml-auto" />
      <button type="button" onClick={insertBlock} className="rounded-md border border-accent bg-accent px-3 py-1.5 text-sm font-medium text-white hover:bg-accent-strong">
        Insert model block
      </button>
    </div>
  );
}
