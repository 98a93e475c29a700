import { describe, expect, it } from 'vitest';
import type { RevisionComment } from '#shared/schemas/revisions';
import { groupThreads } from './group-threads';

const comment = (id: number, over: Partial<RevisionComment>): RevisionComment => ({
  id,
  revisionId: 1,
  anchorType: 'general',
  anchorId: null,
  parentId: null,
  authorId: 1,
  authorName: 'Reviewer',
  body: `comment ${id}`,
  createdAt: `2026-01-01T10:00:0${id}Z`,
  resolvedAt: null,
  resolvedByName: null,
  ...over,
});

describe('groupThreads', () => {
  it('hangs threads on their anchors with replies in order', () => {
    const threads = groupThreads([
      comment(3, { parentId: 1 }),
      comment(1, { anchorType: 'block', anchorId: 'b1' }),
      comment(2, {}),
      comment(4, { parentId: 1 }),
    ]);
    expect(threads.get('block:b1')?.[0]?.replies.map((r) => r.id)).toEqual([3, 4]);
    expect(threads.get('general')?.map((t) => t.root.id)).toEqual([2]);
  });

  it('keeps a reply whose first comment is missing as its own thread', () => {
    const threads = groupThreads([comment(5, { parentId: 99 })]);
    expect(threads.get('general')?.[0]?.root.id).toBe(5);
  });
});
