import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import type { CommentThread } from '../api/group-threads';
import { CommentForm } from './comment-form';
import { CommentThreadView } from './comment-thread-view';
import type { CommentActions } from './use-comment-actions';

interface AnchorCommentsProps {
  /** Read out with the toggle, e.g. "section Demand" or "model block Desks at noon". */
  anchorLabel: string;
  threads: CommentThread[];
  actions: CommentActions;
  /** Starts a thread on this anchor. */
  onStart: (body: string) => Promise<unknown>;
}

/**
 * The comments hanging on one section heading or model block: a small toggle with the count of
 * open threads in the margin of the text, opening the threads and a box for a new one.
 */
export function AnchorComments({ anchorLabel, threads, actions, onStart }: AnchorCommentsProps) {
  const open = threads.filter((t) => t.root.resolvedAt === null).length;
  const [expanded, setExpanded] = useState(false);
  const panelId = useId();
  const summary = threads.length === 0 ? 'Comment' : open > 0 ? `${open} open ${open === 1 ? 'thread' : 'threads'}` : `${threads.length} settled`;

  return (
    <div className="my-2 font-sans">
      <Button
        size="sm"
        variant={open > 0 ? 'secondary' : 'quiet'}
        aria-expanded={expanded}
        aria-controls={panelId}
        aria-label={`${summary} on ${anchorLabel}`}
        onClick={() => setExpanded((e) => !e)}
      >
        <svg aria-hidden viewBox="0 0 16 16" className="size-3.5 fill-none stroke-current stroke-[1.5]">
          <path d="M2.5 3.5h11v7h-6l-3 2.5v-2.5h-2z" strokeLinejoin="round" />
        </svg>
        {summary}
      </Button>
      {expanded && (
        <div id={panelId} role="region" aria-label={`Comments on ${anchorLabel}`} className="mt-2 flex flex-col gap-3 rounded-md border border-accent/30 bg-accent-tint/40 p-3">
          {threads.length > 0 && (
            <ul className="flex flex-col gap-3">
              {threads.map((t) => (
                <CommentThreadView key={t.root.id} thread={t} canWrite={actions.canWrite} onReply={actions.reply} onResolve={actions.resolve} />
              ))}
            </ul>
          )}
          {actions.canWrite && <CommentForm label={`New comment on ${anchorLabel}`} submitLabel="Add comment" autoFocus={threads.length === 0} onSubmit={onStart} />}
        </div>
      )}
    </div>
  );
}
