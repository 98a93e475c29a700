import { useMemo } from 'react';
import type { CreateComment } from '#shared/schemas/revisions';
import { useAddComment, useResolveComment } from '../api/revision-mutations';

export interface CommentActions {
  canWrite: boolean;
  start: (anchor: Pick<CreateComment, 'anchorType' | 'anchorId'>, body: string) => Promise<unknown>;
  reply: (parentId: number, body: string) => Promise<unknown>;
  resolve: (id: number, resolved: boolean) => Promise<unknown>;
}

/** The comment mutations of one revision, shaped for the threads that use them. */
export function useCommentActions(revisionId: number, canWrite: boolean): CommentActions {
  const add = useAddComment(revisionId);
  const settle = useResolveComment(revisionId);
  const { mutateAsync: addAsync } = add;
  const { mutateAsync: settleAsync } = settle;
  return useMemo(
    () => ({
      canWrite,
      start: (anchor, body) => addAsync({ ...anchor, body }),
      reply: (parentId, body) => addAsync({ parentId, body }),
      resolve: (id, resolved) => settleAsync({ id, resolved }),
    }),
    [canWrite, addAsync, settleAsync],
  );
}
