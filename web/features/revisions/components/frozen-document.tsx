import type { RevisionSnapshot } from '#shared/schemas/revisions';
import { modelLabel } from '../../../editor/block-results';
import { ReaderDocument, type DocNode } from '../../study-reader/components/reader-document';
import { anchorKey, type CommentThread } from '../api/group-threads';
import { AnchorComments } from './anchor-comments';
import type { CommentActions } from './use-comment-actions';

interface FrozenDocumentProps {
  snapshot: RevisionSnapshot;
  threads: Map<string, CommentThread[]>;
  /** Without actions (a client, or comments not loaded) the text is shown bare. */
  actions: CommentActions | null;
}

const plain = (node: DocNode): string => node.text ?? (node.content ?? []).map(plain).join('');

/** What a top-level node can carry comments as: a section heading or a model block. */
function anchorOf(node: DocNode): { type: 'section' | 'block'; id: string; label: string } | null {
  const attrs = node.attrs ?? {};
  if (node.type === 'heading' && typeof attrs.sectionId === 'string' && attrs.sectionId) {
    return { type: 'section', id: attrs.sectionId, label: `section ${plain(node).trim() || 'without a title'}` };
  }
  if (node.type === 'modelBlock' && typeof attrs.blockId === 'string' && attrs.blockId) {
    const config = attrs.config as { title?: string; spec?: { model?: string } } | null;
    const name = config?.title || (config?.spec?.model ? modelLabel(config.spec.model) : 'without a title');
    return { type: 'block', id: attrs.blockId, label: `model block ${name}` };
  }
  return null;
}

/**
 * The revision's frozen text in the reader's rendering, one top-level node at a time so each
 * section heading and model block can carry its comment threads right under it.
 */
export function FrozenDocument({ snapshot, threads, actions }: FrozenDocumentProps) {
  const nodes = ((snapshot.document as DocNode).content ?? []) as DocNode[];
  return (
    // Each node is its own reader text, so the spacing the reader gives between siblings is set here.
    <div>
      {nodes.map((node, i) => {
        const anchor = actions ? anchorOf(node) : null;
        return (
          <div key={i} data-anchor={anchor ? `${anchor.type}:${anchor.id}` : undefined} className={i === 0 ? '' : node.type === 'heading' ? 'mt-10' : 'mt-4'}>
            <ReaderDocument doc={{ type: 'doc', content: [node] }} blocks={snapshot.blocks} />
            {anchor && actions && (
              <AnchorComments
                anchorLabel={anchor.label}
                threads={threads.get(anchorKey(anchor.type, anchor.id)) ?? []}
                actions={actions}
                onStart={(body) => actions.start({ anchorType: anchor.type, anchorId: anchor.id }, body)}
              />
            )}
          </div>
        );
      })}
    </div>
  );
}
