import { Node, mergeAttributes } from '@tiptap/core';
import type { BlockConfig } from '../../schemas/model-block';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    modelBlock: {
      /** Inserts a model block with the given configuration at the selection. */
      insertModelBlock: (attrs: { blockId: string; config: BlockConfig }) => ReturnType;
    };
  }
}

/**
 * A queueing calculation embedded in the text: an atom whose attributes hold only its id and
 * configuration. Each attribute has explicit parseHTML/renderHTML (default parsing would turn
 * "007" into 7 and cannot carry JSON). The web app adds a React view with `.extend({ addNodeView })`.
 */
export const ModelBlock = Node.create({
  name: 'modelBlock',
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return {
      blockId: {
        default: null,
        parseHTML: (el: HTMLElement) => el.getAttribute('data-block-id'),
        renderHTML: (attrs: { blockId?: string | null }) => (attrs.blockId ? { 'data-block-id': attrs.blockId } : {}),
      },
      config: {
        default: null,
        parseHTML: (el: HTMLElement) => {
          try {
            return JSON.parse(el.getAttribute('data-config') ?? 'null') as unknown;
          } catch {
            return null;
          }
        },
        renderHTML: (attrs: { config?: unknown }) => ({ 'data-config': JSON.stringify(attrs.config ?? null) }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="model-block"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['div', mergeAttributes(HTMLAttributes, { 'data-type': 'model-block' })];
  },

  addCommands() {
    return {
      insertModelBlock:
        (attrs) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs }),
    };
  },
});
