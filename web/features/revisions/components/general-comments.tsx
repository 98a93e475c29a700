import type { CommentThread } from '../api/group-threads';
import { CommentForm } from './comment-form';
import { CommentThreadView } from './comment-thread-view';
import type { CommentActions } from './use-comment-actions';

/** Comments about the revision as a whole, beside the text. */
export function GeneralComments({ threads, actions }: { threads: CommentThread[]; actions: CommentActions }) {
  return (
    <section aria-labelledby="general-comments-title" className="flex flex-col gap-3">
      <h2 id="general-comments-title" className="text-lg font-bold">
        General comments
      </h2>
      {threads.length === 0 ? (
        <p className="text-sm text-ink-soft">None yet. Comments on one section or model block sit under it in the text.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {threads.map((t) => (
            <CommentThreadView key={t.root.id} thread={t} canWrite={actions.canWrite} onReply={actions.reply} onResolve={actions.resolve} />
          ))}
        </ul>
      )}
      {actions.canWrite && <CommentForm label="New general comment" submitLabel="Add comment" onSubmit={(body) => actions.start({ anchorType: 'general', anchorId: null }, body)} />}
    </section>
  );
}
