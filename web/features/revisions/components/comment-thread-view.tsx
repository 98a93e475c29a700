import { useState } from 'react';
import type { RevisionComment } from '#shared/schemas/revisions';
import { Button } from '../../../components/ui/button';
import { formatDate } from '../../../lib/format-date';
import type { CommentThread } from '../api/group-threads';
import { CommentForm } from './comment-form';

function CommentBody({ comment }: { comment: RevisionComment }) {
  return (
    <>
      <p className="text-xs text-ink-faint">
        <span className="font-semibold text-ink-soft">{comment.authorName ?? 'A former member'}</span> · {formatDate(comment.createdAt)}
      </p>
      {/* Plain text as typed: React escapes it, and line breaks are kept. */}
      <p className="mt-1 text-sm whitespace-pre-line text-ink">{comment.body}</p>
    </>
  );
}

interface CommentThreadViewProps {
  thread: CommentThread;
  canWrite: boolean;
  onReply: (parentId: number, body: string) => Promise<unknown>;
  onResolve: (id: number, resolved: boolean) => Promise<unknown>;
}

/** One thread: the first comment, its replies, a reply box and the way to mark it settled. */
export function CommentThreadView({ thread, canWrite, onReply, onResolve }: CommentThreadViewProps) {
  const [replying, setReplying] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const resolved = thread.root.resolvedAt !== null;

  const toggle = async () => {
    setBusy(true);
    setError(null);
    try {
      await onResolve(thread.root.id, !resolved);
    } catch (err) {
      setError(err instanceof Error ? err.message : 'That did not work.');
    } finally {
      setBusy(false);
    }
  };

  return (
    <li className={`rounded-md border px-4 py-3 ${resolved ? 'border-rule bg-paper' : 'border-rule-strong bg-sheet'}`}>
      {resolved && (
        <p className="mb-2 text-xs font-semibold text-ok">
          Settled{thread.root.resolvedByName ? ` by ${thread.root.resolvedByName}` : ''} · {formatDate(thread.root.resolvedAt)}
        </p>
      )}
      <CommentBody comment={thread.root} />
      {thread.replies.length > 0 && (
        <ol aria-label="Replies" className="mt-3 flex flex-col gap-3 border-l-2 border-rule pl-4">
          {thread.replies.map((r) => (
            <li key={r.id}>
              <CommentBody comment={r} />
            </li>
          ))}
        </ol>
      )}
      {error && (
        <p role="alert" className="mt-2 text-sm text-danger">
          {error}
        </p>
      )}
      {canWrite && (
        <div className="mt-3">
          {replying ? (
            <CommentForm label="Your reply" submitLabel="Reply" autoFocus onSubmit={async (body) => {
              await onReply(thread.root.id, body);
              setReplying(false);
            }} onCancel={() => setReplying(false)} />
          ) : (
            <div className="flex gap-2">
              <Button size="sm" variant="quiet" onClick={() => setReplying(true)}>
                Reply
              </Button>
              <Button size="sm" variant="quiet" busy={busy} onClick={() => void toggle()}>
                {resolved ? 'Reopen' : 'Mark settled'}
              </Button>
            </div>
          )}
        </div>
      )}
    </li>
  );
}
