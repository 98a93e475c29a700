import { Extension } from '@tiptap/core';
import { Plugin } from '@tiptap/pm/state';
import { newBlockId } from './block-defaults';

const newSectionId = () => `s-${crypto.randomUUID()}`;

/**
 * Keeps every section heading and model block uniquely named: new headings get a sectionId, and a
 * pasted or duplicated block gets a blockId of its own (two blocks sharing an id would share
 * one server result). Adds no schema; the document stays what studyExtensions() defines.
 */
export const StudyIds = Extension.create({
  name: 'studyIds',
  addProseMirrorPlugins() {
    return [
      new Plugin({
        appendTransaction: (transactions, _old, state) => {
          if (!transactions.some((t) => t.docChanged)) return null;
          const seen = new Set<string>();
          const tr = state.tr;
          state.doc.descendants((node, pos) => {
            const attr = node.type.name === 'heading' ? 'sectionId' : node.type.name === 'modelBlock' ? 'blockId' : null;
            if (!attr) return true;
            const current = node.attrs[attr] as string | null;
            if (!current || seen.has(current)) {
              const fresh = attr === 'sectionId' ? newSectionId() : newBlockId();
              tr.setNodeMarkup(pos, undefined, { ...node.attrs, [attr]: fresh });
              seen.add(fresh);
            } else seen.add(current);
            return false;
          });
          return tr.docChanged ? tr.setMeta('addToHistory', false) : null;
        },
      }),
    ];
  },
});
