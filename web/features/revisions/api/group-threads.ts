import type { RevisionComment } from '#shared/schemas/revisions';

export interface CommentThread {
  root: RevisionComment;
  replies: RevisionComment[];
}

/** Where a thread hangs: "general", "section:<sectionId>" or "block:<blockId>". */
export const anchorKey = (type: RevisionComment['anchorType'], id: string | null) => (type === 'general' ? 'general' : `${type}:${id ?? ''}`);

/**
 * Groups the flat comment list into threads by anchor: each first comment with its replies in
 * the order written. A reply whose first comment is missing is shown as its own thread rather
 * than lost.
 */
export function groupThreads(comments: readonly RevisionComment[]): Map<string, CommentThread[]> {
  const sorted = [...comments].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id - b.id);
  const byRoot = new Map<number, CommentThread>();
  const byAnchor = new Map<string, CommentThread[]>();
  const add = (thread: CommentThread) => {
    const key = anchorKey(thread.root.anchorType, thread.root.anchorId);
    byAnchor.set(key, [...(byAnchor.get(key) ?? []), thread]);
  };
  for (const c of sorted) {
    if (c.parentId === null) {
      const thread = { root: c, replies: [] };
      byRoot.set(c.id, thread);
      add(thread);
    }
  }
  for (const c of sorted) {
    if (c.parentId === null) continue;
    const thread = byRoot.get(c.parentId);
    if (thread) thread.replies.push(c);
    else add({ root: c, replies: [] });
  }
  return byAnchor;
}
