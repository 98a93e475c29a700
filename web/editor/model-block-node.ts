import { ReactNodeViewRenderer } from '@tiptap/react';
import { ModelBlock } from '#shared/editor/nodes/model-block';
import { ModelBlockView } from './model-block-view';

/** The shared model-block node with its React view: same schema as the server's, plus the UI. */
export const ModelBlockWithView = ModelBlock.extend({
  addNodeView() {
    return ReactNodeViewRenderer(ModelBlockView);
  },
});
