import { ReactNodeViewRenderer } from '@tiptap/react';
import { NodeSelection } from '@tiptap/pm/state';
import { ModelBlock } from '#shared/editor/nodes/model-block';
import { ModelBlockView } from './model-block-view';

/**
 * The shared model-block node with its React view: same schema as the server's, plus the UI.
 * Enter on a selected block (reached with the arrow keys) opens its settings, as "Edit block" does.
 */
export const ModelBlockWithView = ModelBlock.extend({
  addNodeView() {
    return ReactNodeViewRenderer(ModelBlockView);
  },

  addKeyboardShortcuts() {
    return {
      Enter: ({ editor }) => {
        const { selection } = editor.state;
        if (!editor.isEditable || !(selection instanceof NodeSelection) || selection.node.type.name !== this.name) return false;
        const dom = editor.view.nodeDOM(selection.from);
        const edit = dom instanceof HTMLElement ? dom.querySelector<HTMLButtonElement>('button[data-block-edit]') : null;
        if (!edit) return false;
        if (edit.getAttribute('aria-expanded') !== 'true') edit.click();
        return true;
      },
    };
  },
});
